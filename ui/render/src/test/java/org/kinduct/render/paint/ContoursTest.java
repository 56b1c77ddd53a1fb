package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ContoursTest {

    private static final double POSITION_TOL = 1e-6;

    /** B_z = a·x + b·y sampled exactly at cell centres. */
    private static FieldRaster linear(double a, double b, int cols, int rows, double cell) {
        float[] v = new float[cols * rows];
        FieldRaster probe = new FieldRaster(-0.5, 0.5, cell, cols, rows, v, 0, 0, 0, 0);
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                v[r * cols + c] = (float) (a * probe.centerX(c) + b * probe.centerY(r));
            }
        }
        return probe;
    }

    @Test
    void contourOfALinearFieldLiesOnTheExactIsoline() {
        // Linear interpolation reproduces a linear field exactly, so every segment end of the
        // level-L contour of B_z = 2x + y must satisfy 2x + y = L (up to float rounding).
        FieldRaster r = linear(2, 1, 40, 30, 0.025);
        double level = 0.3;
        List<double[]> ends = new ArrayList<>();
        Contours.trace(r, level, (x1, y1, x2, y2) -> {
            ends.add(new double[] {x1, y1});
            ends.add(new double[] {x2, y2});
        });
        assertTrue(ends.size() > 20, "the line crosses many cells");
        for (double[] p : ends) {
            assertEquals(level, 2 * p[0] + p[1], POSITION_TOL);
        }
    }

    @Test
    void levelOutsideTheDataGivesNoSegments() {
        FieldRaster r = linear(1, 0, 10, 10, 0.1);
        int[] count = {0};
        Contours.trace(r, 5, (x1, y1, x2, y2) -> count[0]++);
        assertEquals(0, count[0]);
    }

    @Test
    void decimatedRasterKeepsEachKeptSampleAtItsOwnPosition() {
        FieldRaster r = linear(3, -2, 17, 11, 0.01);
        FieldRaster d = r.decimated(3);
        for (int row = 0; row < d.rows(); row++) {
            for (int col = 0; col < d.cols(); col++) {
                assertEquals(r.centerX(3 * col), d.centerX(col), POSITION_TOL);
                assertEquals(r.centerY(3 * row), d.centerY(row), POSITION_TOL);
                assertEquals(r.bzT()[3 * row * r.cols() + 3 * col], d.bzT()[row * d.cols() + col]);
            }
        }
    }

    @Test
    void closedContourOfARadialFieldIsJoinedIntoOneClosedLine() {
        // B_z = x² + y² has circles as contours; the level r² = 0.04 is a circle of radius 0.2 m.
        int n = 60;
        float[] v = new float[n * n];
        FieldRaster r = new FieldRaster(-0.3, 0.3, 0.01, n, n, v, 0, 0, 0, 0);
        for (int row = 0; row < n; row++) {
            for (int col = 0; col < n; col++) {
                v[row * n + col] = (float) (Math.pow(r.centerX(col), 2) + Math.pow(r.centerY(row), 2));
            }
        }
        int[] segments = {0};
        Contours.trace(r, 0.04, (x1, y1, x2, y2) -> segments[0]++);
        List<double[][]> lines = new ArrayList<>();
        Contours.lines(r, 0.04, (xs, ys, k) -> lines.add(new double[][] {
            java.util.Arrays.copyOf(xs, k), java.util.Arrays.copyOf(ys, k)}));
        assertEquals(1, lines.size(), "one circle, one line");
        double[] xs = lines.get(0)[0];
        double[] ys = lines.get(0)[1];
        assertEquals(segments[0] + 1, xs.length, "every segment once, first point repeated at the end");
        assertEquals(xs[0], xs[xs.length - 1]);
        assertEquals(ys[0], ys[ys.length - 1]);
        for (int k = 0; k < xs.length; k++) {
            // Linear interpolation of r² on a 10 mm grid stays within a millimetre of the circle.
            assertEquals(0.2, Math.hypot(xs[k], ys[k]), 1e-3);
        }
    }

    @Test
    void openContoursEndAtTheRasterBorder() {
        FieldRaster r = linear(1, 1, 30, 20, 0.02);
        List<Integer> sizes = new ArrayList<>();
        int[] segments = {0};
        Contours.trace(r, 0.1, (x1, y1, x2, y2) -> segments[0]++);
        Contours.lines(r, 0.1, (xs, ys, k) -> sizes.add(k));
        assertEquals(List.of(segments[0] + 1), sizes, "a straight isoline is a single open line");
    }
}
