package org.kinduct.solver.dynamics;

import org.kinduct.solver.field.PlaneField;

/**
 * Uniform B_z below the line y = yEdge and none above: the textbook "field region" with an
 * ideal edge. Flux is exact (the polygon clipped to the half-plane, shoelace area); the moments
 * integrate the step exactly.
 */
final class LowerHalfPlaneField implements PlaneField {

    private final double yEdge;
    private final double bzT;

    LowerHalfPlaneField(double yEdge, double bzT) {
        this.yEdge = yEdge;
        this.bzT = bzT;
    }

    @Override
    public double bz(double x, double y) {
        return y < yEdge ? bzT : 0;
    }

    @Override
    public boolean hasPhysicalPotential() {
        return false;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        throw new UnsupportedOperationException("an ideal field region has no physical potential");
    }

    @Override
    public double flux(double[] xs, double[] ys) {
        // Sutherland–Hodgman clipping against one half-plane, summing the shoelace terms on the fly.
        int n = xs.length;
        double twice = 0;
        double firstX = Double.NaN;
        double firstY = Double.NaN;
        double prevX = Double.NaN;
        double prevY = Double.NaN;
        for (int i = 0; i < n; i++) {
            double ax = xs[i];
            double ay = ys[i];
            double bx = xs[(i + 1) % n];
            double by = ys[(i + 1) % n];
            boolean aIn = ay < yEdge;
            boolean bIn = by < yEdge;
            if (aIn != bIn) {
                double s = (yEdge - ay) / (by - ay);
                double cx = ax + s * (bx - ax);
                if (Double.isNaN(firstX)) {
                    firstX = cx;
                    firstY = yEdge;
                } else {
                    twice += prevX * yEdge - prevY * cx;
                }
                prevX = cx;
                prevY = yEdge;
            }
            if (bIn) {
                if (Double.isNaN(firstX)) {
                    firstX = bx;
                    firstY = by;
                } else {
                    twice += prevX * by - prevY * bx;
                }
                prevX = bx;
                prevY = by;
            }
        }
        if (Double.isNaN(firstX)) {
            return 0;
        }
        twice += prevX * firstY - prevY * firstX;
        return bzT * twice / 2;
    }

    @Override
    public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        boolean aIn = ay < yEdge;
        boolean bIn = by < yEdge;
        double s0 = 0;
        double s1 = aIn && bIn ? 1 : 0;
        if (aIn != bIn) {
            double cross = (yEdge - ay) / (by - ay);
            s0 = aIn ? 0 : cross;
            s1 = aIn ? cross : 1;
        }
        out[0] = bzT * (s1 - s0);
        out[1] = bzT * (s1 * s1 - s0 * s0) / 2;
    }
}
