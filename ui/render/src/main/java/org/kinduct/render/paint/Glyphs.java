package org.kinduct.render.paint;

/** Small pictograms drawn geometrically so they look alike on every surface. */
final class Glyphs {

    private Glyphs() {
    }

    /** ⊙ (field out of the screen) when {@code out}, else ⊗ (into the screen). */
    static void fieldSymbol(Surface s, double x, double y, double r, boolean out, int colour) {
        s.stroke(colour);
        s.lineWidth(Math.max(1, r / 4));
        s.dash();
        s.strokeOval(x, y, r);
        if (out) {
            s.fill(colour);
            s.fillOval(x, y, Math.max(1.2, r * 0.28));
        } else {
            double d = r * 0.7071;
            s.beginPath();
            s.moveTo(x - d, y - d);
            s.lineTo(x + d, y + d);
            s.moveTo(x + d, y - d);
            s.lineTo(x - d, y + d);
            s.strokePath();
        }
    }

    /** A thin line from the nearest point of a placed label's box to the anchor (ax, ay) it names. */
    static void leader(Surface s, LabelPlacer.Box b, double ax, double ay) {
        s.stroke(Palette.LABEL_EDGE);
        s.lineWidth(1);
        s.dash();
        s.beginPath();
        s.moveTo(b.nearestX(ax), b.nearestY(ay));
        s.lineTo(ax, ay);
        s.strokePath();
    }

    /** Filled arrowhead with its tip at (x, y) pointing along (dx, dy) (a unit vector, screen). */
    static void arrowHead(Surface s, double x, double y, double dx, double dy, double size) {
        double bx = x - dx * size;
        double by = y - dy * size;
        double w = size * 0.55;
        s.beginPath();
        s.moveTo(x, y);
        s.lineTo(bx - dy * w, by + dx * w);
        s.lineTo(bx + dy * w, by - dx * w);
        s.closePath();
        s.fillPath();
    }

    /** A polarity disc: dark with a white "+" or light with a dark "−", readable without colour. */
    static void terminal(Surface s, double x, double y, double r, boolean positive) {
        s.fill(positive ? Palette.INK : 0xFFFFFFFF);
        s.fillOval(x, y, r);
        s.stroke(Palette.INK);
        s.lineWidth(1.5);
        s.dash();
        s.strokeOval(x, y, r);
        s.stroke(positive ? 0xFFFFFFFF : Palette.INK);
        s.lineWidth(Math.max(1.5, r / 4));
        double a = r * 0.55;
        s.beginPath();
        s.moveTo(x - a, y);
        s.lineTo(x + a, y);
        if (positive) {
            s.moveTo(x, y - a);
            s.lineTo(x, y + a);
        }
        s.strokePath();
    }
}
