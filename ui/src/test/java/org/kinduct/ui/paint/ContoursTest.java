package org.kinduct.ui.paint;

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
        FieldRaster probe = new FieldRaster(-0.5, 0.5, cell, cols, rows, v, 0, 0, 0);
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
}
