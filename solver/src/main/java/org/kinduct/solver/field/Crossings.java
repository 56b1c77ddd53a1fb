package org.kinduct.solver.field;

import java.util.Arrays;

/**
 * Where a segment a → b crosses the outline of a magnet's footprint, as parameters s in (0, 1)
 * of p(s) = a + s·(b − a), ascending and distinct: the points where the field of a magnet whose
 * face lies in the plane jumps (B_z) or kinks (A). A segment running along an outline side has
 * no isolated crossing with it.
 */
final class Crossings {

    private Crossings() {
    }

    /** Crossings with the closed polygon (px, py). */
    static double[] ofPolygon(double ax, double ay, double bx, double by, double[] px, double[] py) {
        double dx = bx - ax;
        double dy = by - ay;
        double[] found = new double[px.length];
        int count = 0;
        for (int i = 0; i < px.length; i++) {
            int j = (i + 1) % px.length;
            double ex = px[j] - px[i];
            double ey = py[j] - py[i];
            double denominator = dx * ey - dy * ex;
            if (denominator == 0) {
                continue;
            }
            double wx = px[i] - ax;
            double wy = py[i] - ay;
            double s = (wx * ey - wy * ex) / denominator;
            double u = (wx * dy - wy * dx) / denominator;
            if (u >= 0 && u <= 1) {
                found[count++] = s;
            }
        }
        return inside(found, count);
    }

    /** Crossings with the circle of centre (cx, cy) and radius r. */
    static double[] ofCircle(double ax, double ay, double bx, double by, double cx, double cy, double r) {
        double dx = bx - ax;
        double dy = by - ay;
        double fx = ax - cx;
        double fy = ay - cy;
        double a = dx * dx + dy * dy;
        double half = fx * dx + fy * dy;
        double c = fx * fx + fy * fy - r * r;
        double discriminant = half * half - a * c;
        if (!(discriminant > 0)) {
            return new double[0];
        }
        // The root of larger size first, the other from the product of the roots (no cancellation).
        double q = -(half + Math.copySign(Math.sqrt(discriminant), half));
        return inside(new double[] {q / a, c / q}, 2);
    }

    /** The first {@code count} values that lie strictly inside (0, 1), sorted, without repeats. */
    private static double[] inside(double[] s, int count) {
        return Arrays.stream(s, 0, count).filter(v -> v > 0 && v < 1).sorted().distinct().toArray();
    }
}
