package org.kinduct.cli;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.plot.LinePlot;
import org.kinduct.render.plot.MapPlot;
import org.kinduct.render.plot.Plot;
import org.kinduct.render.plot.PlotAxis;
import org.kinduct.study.Header;
import org.kinduct.study.Row;
import org.kinduct.study.StudyTable;

/**
 * The plot of a study: its metrics against the first varied value (one varied value, or values
 * paired), or one metric as a map over two varied values taken in a grid. The command line's
 * {@code --png}/{@code --svg} and the editor's sweep window draw the same plot.
 */
public final class StudyPlots {

    /** Room above and below the plotted values, as a fraction of their range. */
    private static final double MARGIN = 0.05;

    private StudyPlots() {
    }

    /**
     * The plot of {@code table}'s rows.
     *
     * @param chosen metric expressions as given to {@code --metric} (spaces ignored); empty for
     *        the first metric and those in its unit
     * @throws IllegalArgumentException when the study or the choice cannot be plotted, saying why
     */
    public static Plot of(StudyTable table, List<String> chosen) {
        List<Integer> metrics = check(table.header(), chosen);
        return isMap(table.header()) ? map(table, metrics.get(0)) : lines(table, metrics);
    }

    /**
     * The metrics to plot, by index, when such a study can be plotted.
     *
     * @throws IllegalArgumentException when it cannot, saying why
     */
    static List<Integer> check(Header h, List<String> chosen) {
        List<Integer> metrics = choose(h, chosen);
        boolean map = isMap(h);
        if (!map && h.varied().size() > 1 && !h.mode().equals("paired")) {
            throw new IllegalArgumentException("a plot shows metrics against one varied value, or one metric over two"
                    + " in a grid; this study varies " + h.varied().size() + " values in a grid");
        }
        if (map && metrics.size() > 1 && !chosen.isEmpty()) {
            throw new IllegalArgumentException("a map over two varied values shows one metric; --plot names "
                    + metrics.size());
        }
        return metrics;
    }

    private static boolean isMap(Header h) {
        return h.varied().size() == 2 && h.mode().equals("grid");
    }

    private static List<Integer> choose(Header h, List<String> chosen) {
        List<Integer> out = new ArrayList<>();
        if (chosen.isEmpty()) {
            String unit = h.metrics().get(0).unit();
            for (int m = 0; m < h.metrics().size(); m++) {
                if (h.metrics().get(m).unit().equals(unit)) {
                    out.add(m);
                }
            }
            return out;
        }
        for (String c : chosen) {
            int found = -1;
            for (int m = 0; m < h.metrics().size(); m++) {
                if (squeeze(h.metrics().get(m).metric()).equals(squeeze(c))) {
                    found = m;
                }
            }
            if (found < 0) {
                throw new IllegalArgumentException("'" + c + "' is not a metric of this study; its metrics: "
                        + String.join("; ", h.metrics().stream().map(Header.Read::metric).toList()));
            }
            if (!h.metrics().get(found).unit().equals(h.metrics().get(out.isEmpty() ? found : out.get(0)).unit())) {
                throw new IllegalArgumentException("metrics on one chart share a unit: '" + c + "' is in "
                        + h.metrics().get(found).unit() + ", '" + h.metrics().get(out.get(0)).metric() + "' in "
                        + h.metrics().get(out.get(0)).unit());
            }
            out.add(found);
        }
        return out;
    }

    private static Plot lines(StudyTable table, List<Integer> metrics) {
        Header h = table.header();
        Header.Varied along = h.varied().get(0);
        List<Row> rows = table.rows();
        double[] xs = new double[rows.size()];
        List<LinePlot.Series> series = new ArrayList<>();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < xs.length; i++) {
            xs[i] = rows.get(i).values()[0];
        }
        for (int m : metrics) {
            double[] ys = new double[rows.size()];
            for (int i = 0; i < ys.length; i++) {
                ys[i] = rows.get(i).metrics()[m];
                if (Double.isFinite(ys[i])) {
                    lo = Math.min(lo, ys[i]);
                    hi = Math.max(hi, ys[i]);
                }
            }
            series.add(new LinePlot.Series(h.metrics().get(m).metric(), ys));
        }
        if (!(hi >= lo)) {
            throw new IllegalArgumentException("no point has a value of the metrics plotted");
        }
        double xlo = java.util.Arrays.stream(xs).min().orElseThrow();
        double xhi = java.util.Arrays.stream(xs).max().orElseThrow();
        String what = metrics.size() == 1 ? h.metrics().get(metrics.get(0)).metric() : "metrics";
        return new LinePlot(h.scene() + ": " + what + " against " + along.path(),
                new PlotAxis(along.path(), along.unit(), along.log(), xlo, xhi),
                new PlotAxis(metrics.size() == 1 ? what : "value", h.metrics().get(metrics.get(0)).unit(), false,
                        lo - MARGIN * (hi - lo), hi + MARGIN * (hi - lo)),
                xs, series);
    }

    private static Plot map(StudyTable table, int metric) {
        Header h = table.header();
        Header.Varied vx = h.varied().get(0);
        Header.Varied vy = h.varied().get(1);
        double[] xs = vx.values().stream().mapToDouble(Double::doubleValue).toArray();
        double[] ys = vy.values().stream().mapToDouble(Double::doubleValue).toArray();
        double[][] z = new double[xs.length][ys.length];
        for (double[] column : z) {
            java.util.Arrays.fill(column, Double.NaN);
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Row r : table.rows()) {
            double v = r.metrics()[metric];
            z[r.point() / ys.length][r.point() % ys.length] = v;
            if (Double.isFinite(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        if (!(hi >= lo)) {
            throw new IllegalArgumentException("no point has a value of " + h.metrics().get(metric).metric());
        }
        Header.Read m = h.metrics().get(metric);
        return new MapPlot(h.scene() + ": " + m.metric(), axis(vx, xs), axis(vy, ys),
                new PlotAxis(m.metric(), m.unit(), false, lo < 0 && hi > 0 ? -Math.max(-lo, hi) : lo,
                        lo < 0 && hi > 0 ? Math.max(-lo, hi) : hi), xs, ys, z);
    }

    private static PlotAxis axis(Header.Varied v, double[] values) {
        return new PlotAxis(v.path(), v.unit(), v.log(), java.util.Arrays.stream(values).min().orElseThrow(),
                java.util.Arrays.stream(values).max().orElseThrow());
    }

    private static String squeeze(String metric) {
        return metric.replaceAll("\\s+", "");
    }
}
