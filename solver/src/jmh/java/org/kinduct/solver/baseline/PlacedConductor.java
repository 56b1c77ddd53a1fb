package org.kinduct.solver.baseline;

/**
 * A conductor's vertices where they are at one instant and their velocities, metres and m/s.
 * Loops close from the last vertex back to the first.
 */
record PlacedConductor(double[] xs, double[] ys, double[] vx, double[] vy, boolean closed) {

    int edgeCount() {
        return closed ? xs.length : xs.length - 1;
    }

    /** Length of the shortest edge longer than zero (infinite if none), metres. */
    double shortestEdgeM() {
        double shortest = Double.POSITIVE_INFINITY;
        int n = xs.length;
        for (int i = 0; i < edgeCount(); i++) {
            double edge = Math.hypot(xs[(i + 1) % n] - xs[i], ys[(i + 1) % n] - ys[i]);
            if (edge > 0) {
                shortest = Math.min(shortest, edge);
            }
        }
        return shortest;
    }

    /** Speed of the fastest vertex, m/s. */
    double fastestVertexMPerS() {
        double fastest = 0;
        for (int i = 0; i < xs.length; i++) {
            fastest = Math.max(fastest, Math.hypot(vx[i], vy[i]));
        }
        return fastest;
    }

    /** Sum of the edge lengths, metres. */
    double lengthM() {
        double sum = 0;
        int n = xs.length;
        for (int i = 0; i < edgeCount(); i++) {
            sum += Math.hypot(xs[(i + 1) % n] - xs[i], ys[(i + 1) % n] - ys[i]);
        }
        return sum;
    }
}
