package org.kinduct.render.paint;

/**
 * B_z sampled at cell centres of a regular grid over a scene rectangle, for display only (numbers
 * for EMF and flux come from the solver, never from here). Row 0 is the top row (largest y).
 *
 * @param minX left edge of the covered rectangle, metres
 * @param maxY top edge, metres
 * @param cellM cell size, metres
 * @param bzT B_z per cell, tesla, row-major
 * @param autoLimitT symmetric colour limit suggested by the data for a linear scale (a high
 *        percentile of |B_z|, so one hot spot does not wash out the rest)
 * @param peakT the largest |B_z| of the map, tesla: the top of a logarithmic scale, which shows
 *        the hot spot and its weak surroundings at once
 * @param revision scene revision the map was computed for
 * @param tS time the map was computed for
 */
public record FieldRaster(double minX, double maxY, double cellM, int cols, int rows, float[] bzT,
                          double autoLimitT, double peakT, long revision, double tS) {

    public FieldRaster {
        if (cols < 1 || rows < 1 || bzT.length != cols * rows) {
            throw new IllegalArgumentException("raster of " + cols + " × " + rows + " needs "
                    + cols * rows + " values, got " + bzT.length);
        }
        if (!(cellM > 0)) {
            throw new IllegalArgumentException("cell size must be positive, got " + cellM);
        }
    }

    public double maxX() {
        return minX + cols * cellM;
    }

    public double minY() {
        return maxY - rows * cellM;
    }

    /** B_z of the cell containing (x, y), or NaN outside. */
    public double sample(double x, double y) {
        int c = (int) Math.floor((x - minX) / cellM);
        int r = (int) Math.floor((maxY - y) / cellM);
        if (c < 0 || r < 0 || c >= cols || r >= rows) {
            return Double.NaN;
        }
        return bzT[r * cols + c];
    }

    /**
     * Every {@code k}-th sample in both directions (cells k times larger), for drawing where fine
     * detail is not needed; this raster itself when k ≤ 1.
     */
    public FieldRaster decimated(int k) {
        if (k <= 1) {
            return this;
        }
        int c2 = (cols + k - 1) / k;
        int r2 = (rows + k - 1) / k;
        float[] v = new float[c2 * r2];
        for (int r = 0; r < r2; r++) {
            for (int c = 0; c < c2; c++) {
                v[r * c2 + c] = bzT[(r * k) * cols + c * k];
            }
        }
        // Sample (r·k, c·k) sits at the centre of the new, k times larger cell (r, c) when the new
        // grid starts half a new cell minus half an old cell before the old one.
        double shift = (k - 1) * cellM / 2;
        return new FieldRaster(minX - shift, maxY + shift, cellM * k, c2, r2, v, autoLimitT, peakT, revision, tS);
    }

    public double centerX(int col) {
        return minX + (col + 0.5) * cellM;
    }

    public double centerY(int row) {
        return maxY - (row + 0.5) * cellM;
    }
}
