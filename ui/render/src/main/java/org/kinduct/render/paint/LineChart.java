package org.kinduct.render.paint;

import java.util.List;
import org.kinduct.render.plot.PlotAxis;
import org.kinduct.scene.units.Dimension;

/**
 * A compact line chart inside a box of a page: one or more series of y against x, axes with
 * round ticks ({@link PlotAxis}, as the study plots use), a key naming each line in its colour,
 * and an optional marker at one x (the instant a picture shows). The y axis is symmetric about
 * zero when the data change sign (an EMF that reverses reads at a glance), else it starts at
 * zero; it reaches {@value #HEADROOM} of the range past the data, so a flat top is not drawn on
 * the frame. Stateless; every surface draws the same chart.
 */
public final class LineChart {

    /** Distinct line colours, dark enough on paper; cycled. */
    private static final int[] COLOURS = {0xFF1F5FA8, 0xFFC2410C, 0xFF2E7D32, 0xFF7B1FA2, 0xFF8D6E00, 0xFF00838F};
    private static final int MARKER = 0xFFD6007A;
    private static final double FONT = 11;
    private static final double LEFT = 46;
    private static final double BOTTOM = 34;
    private static final double TOP = 20;
    private static final double RIGHT = 10;
    /** Room above (and below, when symmetric) the data, as a fraction of their range. */
    private static final double HEADROOM = 0.06;

    /** One line: its name and its values at the x's (NaN leaves a gap). */
    public record Series(String label, double[] x, double[] y) {
        public Series {
            if (x.length != y.length) {
                throw new IllegalArgumentException("a series needs as many y as x values, got " + x.length + " and "
                        + y.length);
            }
        }
    }

    /**
     * What a chart shows: series, the names and dimensions of both axes, a title, and a marker at
     * {@code markerX} (NaN: none).
     */
    public record Content(String title, List<Series> series, String xName, Dimension xUnit, String yName,
                          Dimension yUnit, double markerX) {
        public Content {
            series = List.copyOf(series);
        }
    }

    private LineChart() {
    }

    /** Draws {@code c} into the box at (x, y) of size w × h, screen units. */
    public static void draw(Surface s, double x, double y, double w, double h, Content c) {
        double px = x + LEFT;
        double py = y + TOP;
        double pw = w - LEFT - RIGHT;
        double ph = h - TOP - BOTTOM;
        if (pw < 20 || ph < 20) {
            return;
        }
        double[] xr = range(c.series(), true);
        double[] yr = range(c.series(), false);
        double yLow = yr[0] < 0 ? -Math.max(-yr[0], yr[1]) : 0;
        double yHigh = yr[0] < 0 ? -yLow : yr[1];
        if (!(yHigh > yLow)) {
            yLow = -1;
            yHigh = 1;
        }
        double room = HEADROOM * (yHigh - yLow);
        yHigh += room;
        yLow -= yLow < 0 ? room : 0;
        double xLow = xr[0];
        double xHigh = xr[1] > xr[0] ? xr[1] : xr[0] + 1;
        PlotAxis xAxis = new PlotAxis(c.xName(), c.xUnit().siUnit().symbol(), false, xLow, xHigh);
        PlotAxis yAxis = new PlotAxis(c.yName(), c.yUnit().siUnit().symbol(), false, yLow, yHigh);
        s.save();
        // The value axis is named above its tick labels, the title beside it.
        s.fill(Palette.MUTED);
        s.text(yAxis.label(), x, y + TOP / 2, FONT, false, Surface.Anchor.LEFT);
        s.fill(Palette.INK);
        s.text(c.title(), x + s.textWidth(yAxis.label(), FONT, false) + 16, y + TOP / 2, FONT, true,
                Surface.Anchor.LEFT);
        ticks(s, px, py, pw, ph, xAxis, true);
        ticks(s, px, py, pw, ph, yAxis, false);
        s.fill(Palette.MUTED);
        s.text(xAxis.label(), px + pw, py + ph + 4 + FONT, FONT, false, Surface.Anchor.TOP_RIGHT);
        s.stroke(Palette.LABEL_EDGE);
        s.lineWidth(1);
        s.dash();
        s.strokeRect(px, py, pw, ph);
        s.clipRect(px, py, pw, ph);
        for (int k = 0; k < c.series().size(); k++) {
            line(s, c.series().get(k), COLOURS[k % COLOURS.length], px, py, pw, ph, xLow, xHigh, yLow, yHigh);
        }
        if (Double.isFinite(c.markerX())) {
            double mx = px + (c.markerX() - xLow) / (xHigh - xLow) * pw;
            s.stroke(MARKER);
            s.lineWidth(1.5);
            s.beginPath();
            s.moveTo(mx, py);
            s.lineTo(mx, py + ph);
            s.strokePath();
        }
        s.restore();
        key(s, c.series(), px + pw, y + TOP / 2);
    }

    /** Smallest and largest finite x (or y) over all series; {0, 0} without data. */
    private static double[] range(List<Series> series, boolean ofX) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (Series line : series) {
            for (double v : ofX ? line.x() : line.y()) {
                if (Double.isFinite(v)) {
                    low = Math.min(low, v);
                    high = Math.max(high, v);
                }
            }
        }
        return low <= high ? new double[] {low, high} : new double[] {0, 0};
    }

    private static void ticks(Surface s, double px, double py, double pw, double ph, PlotAxis axis, boolean alongX) {
        s.lineWidth(1);
        s.dash();
        for (double value : axis.ticks()) {
            double at = axis.fraction(value) * (alongX ? pw : ph);
            s.stroke(value == 0 ? Palette.AXIS : Palette.GRID_MINOR);
            s.beginPath();
            if (alongX) {
                s.moveTo(px + at, py);
                s.lineTo(px + at, py + ph);
            } else {
                s.moveTo(px, py + ph - at);
                s.lineTo(px + pw, py + ph - at);
            }
            s.strokePath();
            s.fill(Palette.MUTED);
            if (alongX) {
                s.text(axis.tickText(value), px + at, py + ph + 4, FONT, false, Surface.Anchor.TOP_CENTER);
            } else {
                s.text(axis.tickText(value), px - 4, py + ph - at, FONT, false, Surface.Anchor.RIGHT);
            }
        }
    }

    private static void line(Surface s, Series line, int colour, double px, double py, double pw, double ph,
                             double xLow, double xHigh, double yLow, double yHigh) {
        s.stroke(colour);
        s.lineWidth(1.6);
        s.beginPath();
        boolean drawing = false;
        for (int i = 0; i < line.x().length; i++) {
            double v = line.y()[i];
            if (!Double.isFinite(v) || !Double.isFinite(line.x()[i])) {
                drawing = false;
                continue;
            }
            double sx = px + (line.x()[i] - xLow) / (xHigh - xLow) * pw;
            double sy = py + ph - (v - yLow) / (yHigh - yLow) * ph;
            if (drawing) {
                s.lineTo(sx, sy);
            } else {
                s.moveTo(sx, sy);
                drawing = true;
            }
        }
        s.strokePath();
    }

    /** Each series' name in its colour, right-aligned along the top, last first. */
    private static void key(Surface s, List<Series> series, double right, double centreY) {
        double x = right;
        for (int k = series.size() - 1; k >= 0; k--) {
            String label = series.get(k).label();
            double w = s.textWidth(label, FONT, false);
            s.fill(COLOURS[k % COLOURS.length]);
            s.fillRect(x - w - 14, centreY - 1.5, 10, 3);
            s.text(label, x, centreY, FONT, false, Surface.Anchor.RIGHT);
            x -= w + 24;
        }
    }
}
