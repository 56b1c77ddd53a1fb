package org.kinduct.render.plot;

import java.util.List;
import org.kinduct.render.paint.Surface;

/**
 * Metrics against one varied value: one line with point markers per series, broken where a
 * value is missing (NaN), a legend naming the series.
 */
public record LinePlot(String title, PlotAxis x, PlotAxis y, double[] xs, List<Series> series) implements Plot {

    /** Colour-blind-safe line colours (Okabe &amp; Ito, "Color Universal Design", 2008; common practice). */
    private static final int[] COLOURS = {0xFF0072B2, 0xFFD55E00, 0xFF009E73, 0xFFCC79A7, 0xFFE69F00, 0xFF56B4E9,
        0xFF000000};
    private static final double RIGHT = 30;

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
        legend(s);
    }

    /** The series' names with their colours, on a light box in the plot's top left corner. */
    private void legend(Surface s) {
        double widest = 0;
        for (Series one : series) {
            widest = Math.max(widest, s.textWidth(one.name(), ChartFrame.TEXT, false));
        }
        double lx = ChartFrame.LEFT + 10;
        s.fill(0xE6FFFFFF);
        s.fillRect(lx, ChartFrame.TOP + 6, widest + 46, 18 * series.size() + 6);
        for (int k = 0; k < series.size(); k++) {
            double ly = ChartFrame.TOP + 18 + 18 * k;
            s.stroke(COLOURS[k % COLOURS.length]);
            s.lineWidth(2);
            ChartFrame.line(s, lx + 6, ly, lx + 30, ly);
            s.fill(ChartFrame.INK);
            s.text(series.get(k).name(), lx + 36, ly, ChartFrame.TEXT, false, Surface.Anchor.LEFT);
        }
    }
}
