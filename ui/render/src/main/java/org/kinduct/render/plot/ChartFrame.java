package org.kinduct.render.plot;

import org.kinduct.render.paint.Surface;

/** The parts every plot shares: title, plot box, axes with ticks and labels. */
final class ChartFrame {

    static final int INK = 0xFF1E1E1E;
    static final int GRID = 0x1F000000;
    static final double TEXT = 13;
    static final double LEFT = 90;
    static final double TOP = 60;
    static final double BOTTOM = 70;

    private ChartFrame() {
    }

    /** Title, white page, the box, grid lines and tick labels of both axes. */
    static void draw(Surface s, String title, PlotAxis x, PlotAxis y, double right) {
        s.fill(0xFFFFFFFF);
        s.fillRect(0, 0, s.width(), s.height());
        s.fill(INK);
        s.text(title, s.width() / 2, TOP / 2, TEXT + 3, true, Surface.Anchor.CENTER);
        double w = s.width() - LEFT - right;
        double h = s.height() - TOP - BOTTOM;
        s.lineWidth(1);
        for (double v : x.ticks()) {
            double px = LEFT + x.fraction(v) * w;
            s.stroke(GRID);
            line(s, px, TOP, px, TOP + h);
            s.fill(INK);
            s.text(x.tickText(v), px, TOP + h + 6, TEXT, false, Surface.Anchor.TOP_CENTER);
        }
        for (double v : y.ticks()) {
            double py = TOP + h - y.fraction(v) * h;
            s.stroke(GRID);
            line(s, LEFT, py, LEFT + w, py);
            s.fill(INK);
            s.text(y.tickText(v), LEFT - 6, py, TEXT, false, Surface.Anchor.RIGHT);
        }
        s.stroke(INK);
        s.strokeRect(LEFT, TOP, w, h);
        s.fill(INK);
        s.text(x.label(), LEFT + w / 2, s.height() - 22, TEXT, false, Surface.Anchor.CENTER);
        s.save();
        s.translate(22, TOP + h / 2);
        s.rotate(-Math.PI / 2);
        s.text(y.label(), 0, 0, TEXT, false, Surface.Anchor.CENTER);
        s.restore();
    }

    static void line(Surface s, double x0, double y0, double x1, double y1) {
        s.beginPath();
        s.moveTo(x0, y0);
        s.lineTo(x1, y1);
        s.strokePath();
    }
}
