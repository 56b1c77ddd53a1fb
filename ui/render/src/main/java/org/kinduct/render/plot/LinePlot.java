package org.kinduct.render.plot;

import java.util.List;
import org.kinduct.render.paint.Surface;

/**
 * Metrics against one varied value: one line with point markers per series, broken where a
 * value is missing (NaN), a legend naming the series in the corner the lines leave clearest.
 */
public record LinePlot(String title, PlotAxis x, PlotAxis y, double[] xs, List<Series> series) implements Plot {

    /** Colour-blind-safe line colours (Okabe &amp; Ito, "Color Universal Design", 2008; common practice). */
    private static final int[] COLOURS = {0xFF0072B2, 0xFFD55E00, 0xFF009E73, 0xFFCC79A7, 0xFFE69F00, 0xFF56B4E9,
        0xFF000000};
    private static final double RIGHT = 30;
    /** Samples taken along each line segment to see whether it crosses a corner's box. */
    private static final int SAMPLES_PER_SEGMENT = 16;

    /** One line: its name and a value per x (NaN where there is none). */
    public record Series(String name, double[] ys) {
    }

    public LinePlot {
        series = List.copyOf(series);
    }

    @Override
    public void draw(Surface s) {
        ChartFrame.draw(s, title, x, y, RIGHT);
        double w = s.width() - ChartFrame.LEFT - RIGHT;
        double h = s.height() - ChartFrame.TOP - ChartFrame.BOTTOM;
        for (int k = 0; k < series.size(); k++) {
            int colour = COLOURS[k % COLOURS.length];
            double[] ys = series.get(k).ys();
            s.stroke(colour);
            s.fill(colour);
            s.lineWidth(2);
            boolean drawing = false;
            s.beginPath();
            for (int i = 0; i < xs.length; i++) {
                if (!Double.isFinite(ys[i])) {
                    drawing = false;
                    continue;
                }
                double px = ChartFrame.LEFT + x.fraction(xs[i]) * w;
                double py = ChartFrame.TOP + h - y.fraction(ys[i]) * h;
                if (drawing) {
                    s.lineTo(px, py);
                } else {
                    s.moveTo(px, py);
                }
                drawing = true;
            }
            s.strokePath();
            for (int i = 0; i < xs.length; i++) {
                if (Double.isFinite(ys[i])) {
                    s.fillOval(ChartFrame.LEFT + x.fraction(xs[i]) * w, ChartFrame.TOP + h - y.fraction(ys[i]) * h, 3);
                }
            }
        }
        legend(s, w, h);
    }

    /** The series' names with their colours, on a light box in the corner of the plot the lines cross least. */
    private void legend(Surface s, double w, double h) {
        double widest = 0;
        for (Series one : series) {
            widest = Math.max(widest, s.textWidth(one.name(), ChartFrame.TEXT, false));
        }
        double boxW = widest + 46;
        double boxH = 18 * series.size() + 6;
        // The box as drawn, with its insets from the plot's sides.
        Corner corner = clearestCorner((boxW + 10) / w, (boxH + 6) / h);
        double lx = ChartFrame.LEFT + (corner.right ? w - 10 - boxW : 10);
        double top = ChartFrame.TOP + (corner.bottom ? h - 6 - boxH : 6);
        s.fill(0xE6FFFFFF);
        s.fillRect(lx, top, boxW, boxH);
        for (int k = 0; k < series.size(); k++) {
            double ly = top + 12 + 18 * k;
            s.stroke(COLOURS[k % COLOURS.length]);
            s.lineWidth(2);
            ChartFrame.line(s, lx + 6, ly, lx + 30, ly);
            s.fill(ChartFrame.INK);
            s.text(series.get(k).name(), lx + 36, ly, ChartFrame.TEXT, false, Surface.Anchor.LEFT);
        }
    }

    /** A corner of the plot box, in the order tried: top left first. */
    enum Corner {
        TOP_LEFT(false, false), TOP_RIGHT(true, false), BOTTOM_RIGHT(true, true), BOTTOM_LEFT(false, true);

        final boolean right;
        final boolean bottom;

        Corner(boolean right, boolean bottom) {
            this.right = right;
            this.bottom = bottom;
        }
    }

    /**
     * The corner whose box, {@code width} by {@code height} as fractions of the plot box, covers the
     * fewest points of the lines (markers and samples along each segment); the first in
     * {@link Corner} order among equals.
     */
    Corner clearestCorner(double width, double height) {
        Corner best = Corner.TOP_LEFT;
        int fewest = Integer.MAX_VALUE;
        for (Corner c : Corner.values()) {
            double x0 = c.right ? 1 - width : 0;
            double y0 = c.bottom ? 0 : 1 - height;
            int covered = 0;
            for (Series one : series) {
                double[] ys = one.ys();
                for (int i = 0; i < xs.length; i++) {
                    if (!Double.isFinite(ys[i])) {
                        continue;
                    }
                    boolean joined = i + 1 < xs.length && Double.isFinite(ys[i + 1]);
                    for (int k = 0; k < (joined ? SAMPLES_PER_SEGMENT : 1); k++) {
                        double t = (double) k / SAMPLES_PER_SEGMENT;
                        double fx = x.fraction(xs[i]) + (joined ? t * (x.fraction(xs[i + 1]) - x.fraction(xs[i])) : 0);
                        double fy = y.fraction(ys[i]) + (joined ? t * (y.fraction(ys[i + 1]) - y.fraction(ys[i])) : 0);
                        if (fx >= x0 && fx <= x0 + width && fy >= y0 && fy <= y0 + height) {
                            covered++;
                        }
                    }
                }
            }
            if (covered < fewest) {
                fewest = covered;
                best = c;
            }
        }
        return best;
    }
}
