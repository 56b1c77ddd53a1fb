package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.view.NiceSteps;
import org.kinduct.solver.StreamLattice;

/**
 * The eddy currents of a plate or channel as streamlines: contours of the stream function ψ at
 * equal steps, so that every band between neighbouring lines carries the same current d·Δψ (a
 * round amount), dense where the current is strong. J = ∇ψ × ẑ circulates counter-clockwise round a
 * maximum of ψ and clockwise round a minimum, so lines of ψ &gt; 0 are drawn in one colour and
 * those of ψ &lt; 0 in another: loops that circulate in opposite senses, ahead of and behind a pole,
 * read apart at a glance (Lenz's law). Every other line carries an arrow in the current's
 * direction at its rightmost point, so that an eddy's arrows stand in a row on its right flank,
 * pointing up for counter-clockwise and down for clockwise.
 */
final class Streamlines {

    /** Counter-clockwise circulation (ψ &gt; 0), own field out of the screen. */
    static final int CCW = 0xFF9C1D6E;
    /** Clockwise circulation (ψ &lt; 0), own field into the screen. */
    static final int CW = 0xFF1B7A3E;
    /** About this many lines on the stronger sign's side. */
    private static final int LINES = 7;
    /** A line shorter than this on screen gets no arrow. */
    private static final double ARROW_MIN_PX = 50;

    private Streamlines() {
    }

    /** The current between neighbouring streamlines, amperes: a round step giving about {@value #LINES} lines. */
    static double currentStepA(StreamLattice psi, double thicknessM) {
        return NiceSteps.atLeast(psi.largestAPerM() * thicknessM / LINES);
    }

    /** Draws the streamlines of {@code psi} (thickness {@code thicknessM}) with one arrow per long line. */
    static void draw(Surface s, SheetFrame frame, StreamLattice psi, double thicknessM) {
        if (!(psi.largestAPerM() > 0)) {
            return;
        }
        double step = currentStepA(psi, thicknessM) / thicknessM;
        FieldRaster raster = raster(psi);
        int most = (int) Math.floor(psi.largestAPerM() / step);
        for (int k = -most; k <= most; k++) {
            if (k == 0) {
                continue;
            }
            int colour = k > 0 ? CCW : CW;
            List<double[]> lines = new ArrayList<>();
            Contours.lines(raster, k * step, (xs, ys, n) -> {
                double[] screen = new double[2 * n];
                int rightmost = 0;
                for (int i = 0; i < n; i++) {
                    screen[2 * i] = frame.screenX(xs[i], ys[i]);
                    screen[2 * i + 1] = frame.screenY(xs[i], ys[i]);
                    if (screen[2 * i] > screen[2 * rightmost]) {
                        rightmost = i;
                    }
                }
                lines.add(screen);
                lines.add(new double[] {xs[rightmost], ys[rightmost]});
            });
            for (int pass = 0; pass < 2; pass++) {
                s.stroke(pass == 0 ? Palette.HALO : colour);
                s.lineWidth(pass == 0 ? 3.2 : 1.4);
                s.dash();
                s.beginPath();
                for (int l = 0; l < lines.size(); l += 2) {
                    double[] p = lines.get(l);
                    s.moveTo(p[0], p[1]);
                    for (int i = 2; i < p.length; i += 2) {
                        s.lineTo(p[i], p[i + 1]);
                    }
                }
                s.strokePath();
            }
            s.fill(colour);
            for (int l = 0; l < lines.size() && k % 2 != 0; l += 2) {
                arrow(s, frame, psi, lines.get(l), lines.get(l + 1));
            }
        }
    }

    /** An arrowhead on a line at {@code at} (frame coordinates), along J = (∂ψ/∂y, −∂ψ/∂x) there. */
    private static void arrow(Surface s, SheetFrame frame, StreamLattice psi, double[] screen, double[] at) {
        double length = 0;
        for (int i = 2; i < screen.length; i += 2) {
            length += Math.hypot(screen[i] - screen[i - 2], screen[i + 1] - screen[i - 1]);
        }
        if (length < ARROW_MIN_PX) {
            return;
        }
        double[] g = new double[2];
        SheetFrame.gradient(psi, at[0], at[1], g);
        double[] d = new double[2];
        frame.screenDirection(g[1], -g[0], d);
        if (d[0] == 0 && d[1] == 0) {
            return;
        }
        double x = frame.screenX(at[0], at[1]);
        double y = frame.screenY(at[0], at[1]);
        Glyphs.arrowHead(s, x + 4.5 * d[0], y + 4.5 * d[1], d[0], d[1], 9);
    }

    /** The lattice as a raster for {@link Contours}: nodes as cell centres, row 0 the top. */
    private static FieldRaster raster(StreamLattice psi) {
        int cols = psi.nx();
        int rows = psi.ny();
        float[] values = new float[cols * rows];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                values[r * cols + c] = (float) psi.psiAPerM(c, rows - 1 - r);
            }
        }
        double h = psi.stepM();
        return new FieldRaster(psi.x0M() - h / 2, psi.y0M() + (rows - 0.5) * h, h, cols, rows, values,
                psi.largestAPerM(), psi.largestAPerM(), 0, 0);
    }
}
