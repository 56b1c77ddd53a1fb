package org.kinduct.render.plot;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.paint.Contours;
import org.kinduct.render.paint.DivergingScale;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.view.NiceSteps;

/**
 * One metric over two varied values: colours interpolated linearly between the points (in each
 * axis' own scale, linear or logarithmic), contour lines at round levels (marching squares,
 * {@link Contours}), and a colour bar. Colours run light to dark for values of one sign and
 * diverge about zero for values of both ({@link DivergingScale}). Missing values stay white.
 *
 * @param z z[i][j] at (xs[i], ys[j]), NaN where there is none
 */
public record MapPlot(String title, PlotAxis x, PlotAxis y, PlotAxis value, double[] xs, double[] ys, double[][] z)
        implements Plot {

    private static final double RIGHT = 150;
    private static final double BAR_WIDTH = 18;
    private static final int CONTOUR_INK = 0xB3000000;

    @Override
    public void draw(Surface s) {
        ChartFrame.draw(s, title, x, y, RIGHT);
        double w = s.width() - ChartFrame.LEFT - RIGHT;
        double h = s.height() - ChartFrame.TOP - ChartFrame.BOTTOM;
        double[] range = range();
        int cols = (int) Math.ceil(w / 2);
        int rows = (int) Math.ceil(h / 2);
        int[] pixels = new int[cols * rows];
        for (int r = 0; r < rows; r++) {
            double fy = 1 - (r + 0.5) / rows;
            for (int c = 0; c < cols; c++) {
                pixels[r * cols + c] = colour(interpolate(index(xs, x, (c + 0.5) / cols), index(ys, y, fy)), range);
            }
        }
        s.image(pixels, cols, rows, ChartFrame.LEFT, ChartFrame.TOP, w, h);
        contours(s, w, h, range);
        s.stroke(ChartFrame.INK);
        s.lineWidth(1);
        s.strokeRect(ChartFrame.LEFT, ChartFrame.TOP, w, h);
        colourBar(s, h, range);
    }

    /** Smallest and largest value, widened to be symmetric when they differ in sign. */
    private double[] range() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] column : z) {
            for (double v : column) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (lo < 0 && hi > 0) {
            double m = Math.max(-lo, hi);
            return new double[] {-m, m};
        }
        return new double[] {lo, hi};
    }

    private static int colour(double v, double[] range) {
        if (!Double.isFinite(v)) {
            return 0xFFFFFFFF;
        }
        if (range[0] < 0 && range[1] > 0) {
            return DivergingScale.argb(v, range[1]);
        }
        double span = range[1] - range[0];
        double f = span > 0 ? (v - range[0]) / span : 0.5;
        // One half of the diverging scale: light at the small end, dark at the large one.
        return range[1] <= 0 ? DivergingScale.argbAt(-(1 - f)) : DivergingScale.argbAt(f);
    }

    /** The fractional point index at position {@code f} ∈ [0, 1] along an axis (piecewise linear in the axis' scale). */
    private static double index(double[] values, PlotAxis axis, double f) {
        int n = values.length;
        if (n == 1) {
            return 0;
        }
        for (int i = 0; i + 1 < n; i++) {
            double a = axis.fraction(values[i]);
            double b = axis.fraction(values[i + 1]);
            if ((f >= Math.min(a, b) && f <= Math.max(a, b)) && a != b) {
                return i + (f - a) / (b - a);
            }
        }
        return Math.abs(f - axis.fraction(values[0])) < Math.abs(f - axis.fraction(values[n - 1])) ? 0 : n - 1;
    }

    /** Bilinear interpolation of z at fractional indices. */
    private double interpolate(double fi, double fj) {
        int i = (int) Math.min(Math.floor(fi), Math.max(0, xs.length - 2));
        int j = (int) Math.min(Math.floor(fj), Math.max(0, ys.length - 2));
        double u = xs.length == 1 ? 0 : fi - i;
        double v = ys.length == 1 ? 0 : fj - j;
        double z00 = z[i][j];
        double z10 = xs.length == 1 ? z00 : z[i + 1][j];
        double z01 = ys.length == 1 ? z00 : z[i][j + 1];
        double z11 = xs.length == 1 ? z01 : ys.length == 1 ? z10 : z[i + 1][j + 1];
        return (1 - u) * (1 - v) * z00 + u * (1 - v) * z10 + (1 - u) * v * z01 + u * v * z11;
    }

    /** Contour lines at round levels, traced over the points' index grid and mapped to the plot. */
    private void contours(Surface s, double w, double h, double[] range) {
        if (xs.length < 2 || ys.length < 2 || !(range[1] > range[0])) {
            return;
        }
        int cols = xs.length;
        int rows = ys.length;
        float[] grid = new float[cols * rows];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                grid[r * cols + c] = (float) z[c][rows - 1 - r];
            }
        }
        // Cell (c, r) centred on index (c, rows − 1 − r): contour coordinates are point indices.
        FieldRaster raster = new FieldRaster(-0.5, rows - 0.5, 1, cols, rows, grid, 0, 0, 0, 0);
        double step = NiceSteps.atLeast((range[1] - range[0]) / 8);
        s.stroke(CONTOUR_INK);
        s.lineWidth(1);
        for (double level = Math.ceil(range[0] / step) * step; level <= range[1]; level += step) {
            List<double[]> lines = new ArrayList<>();
            Contours.lines(raster, level, (lx, ly, n) -> {
                double[] pts = new double[2 * n];
                for (int k = 0; k < n; k++) {
                    pts[2 * k] = ChartFrame.LEFT + position(xs, x, lx[k]) * w;
                    pts[2 * k + 1] = ChartFrame.TOP + h - position(ys, y, ly[k]) * h;
                }
                lines.add(pts);
            });
            for (double[] pts : lines) {
                s.beginPath();
                s.moveTo(pts[0], pts[1]);
                for (int k = 1; k < pts.length / 2; k++) {
                    s.lineTo(pts[2 * k], pts[2 * k + 1]);
                }
                s.strokePath();
            }
        }
    }

    /** Axis fraction of fractional point index {@code fi}. */
    private static double position(double[] values, PlotAxis axis, double fi) {
        int i = (int) Math.max(0, Math.min(Math.floor(fi), values.length - 2));
        double t = fi - i;
        return axis.fraction(values[i]) * (1 - t) + axis.fraction(values[i + 1]) * t;
    }

    private void colourBar(Surface s, double h, double[] range) {
        double left = s.width() - RIGHT + 30;
        int n = 256;
        int[] bar = new int[n];
        for (int k = 0; k < n; k++) {
            bar[k] = colour(range[1] - (range[1] - range[0]) * (k + 0.5) / n, range);
        }
        s.image(bar, 1, n, left, ChartFrame.TOP, BAR_WIDTH, h);
        s.stroke(ChartFrame.INK);
        s.lineWidth(1);
        s.strokeRect(left, ChartFrame.TOP, BAR_WIDTH, h);
        s.fill(ChartFrame.INK);
        for (double v : value.ticks()) {
            double f = range[1] > range[0] ? (v - range[0]) / (range[1] - range[0]) : 0.5;
            if (f >= -1e-9 && f <= 1 + 1e-9) {
                double py = ChartFrame.TOP + h - f * h;
                ChartFrame.line(s, left + BAR_WIDTH, py, left + BAR_WIDTH + 4, py);
                s.text(value.tickText(v), left + BAR_WIDTH + 7, py, ChartFrame.TEXT, false, Surface.Anchor.LEFT);
            }
        }
        s.save();
        s.translate(s.width() - 14, ChartFrame.TOP + h / 2);
        s.rotate(-Math.PI / 2);
        s.text(value.label(), 0, 0, ChartFrame.TEXT, false, Surface.Anchor.CENTER);
        s.restore();
    }
}
