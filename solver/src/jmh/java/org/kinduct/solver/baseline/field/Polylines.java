package org.kinduct.solver.baseline.field;

/** Measures of polygons given as coordinate arrays, shared by the field implementations. */
final class Polylines {

    private Polylines() {
    }

    /**
     * Shoelace signed area of the closed polygon (xs, ys), m², positive counter-clockwise; for a
     * self-crossing polygon, the winding-weighted area. Summed about the first vertex to keep the
     * digits of small polygons far from the origin.
     */
    static double signedArea(double[] xs, double[] ys) {
        int n = requireClosed(xs, ys);
        double ox = xs[0];
        double oy = ys[0];
        double twice = 0;
        for (int i = 1; i < n - 1; i++) {
            twice += (xs[i] - ox) * (ys[i + 1] - oy) - (xs[i + 1] - ox) * (ys[i] - oy);
        }
        return 0.5 * twice;
    }

    /** Checks that (xs, ys) describe a polygon of at least three vertices; returns the count. */
    static int requireClosed(double[] xs, double[] ys) {
        if (xs.length != ys.length) {
            throw new IllegalArgumentException("polygon needs as many y as x coordinates, got "
                    + xs.length + " and " + ys.length);
        }
        if (xs.length < 3) {
            throw new IllegalArgumentException("polygon needs at least 3 vertices, got " + xs.length);
        }
        return xs.length;
    }
}
