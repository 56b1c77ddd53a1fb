package org.kinduct.solver.field;

/**
 * The clearance of a segment in the plane from a source that lies within a disc's radius of an
 * axis and at least a given distance off the plane (a magnet's body): a lower bound on the 3-D
 * distance from any point of the segment to any point of the source,
 * √(max(0, d − r)² + h²), d the in-plane distance from the segment to the axis, r the radius and h
 * the distance from the plane. What {@link EdgeQuadrature.Breaks#clearanceM} asks of a field that is
 * analytic off its source. Square roots of sums of squares rather than {@link Math#hypot}: scene
 * lengths lie far from where the squares over- or underflow, and the quadrature asks for every edge.
 */
final class Clearance {

    private Clearance() {
    }

    /** Breaks with no trouble points on a segment, and this clearance. */
    static EdgeQuadrature.Breaks aroundDisc(double cx, double cy, double radiusM, double planeDistanceM) {
        return new EdgeQuadrature.Breaks() {
            @Override
            public double[] along(double ax, double ay, double bx, double by) {
                return EdgeQuadrature.Breaks.NONE.along(ax, ay, bx, by);
            }

            @Override
            public double clearanceM(double ax, double ay, double bx, double by) {
                double outside = Math.max(0, segmentDistance(ax, ay, bx, by, cx, cy) - radiusM);
                return Math.sqrt(outside * outside + planeDistanceM * planeDistanceM);
            }
        };
    }

    /** Distance from the point (px, py) to the segment from (ax, ay) to (bx, by). */
    static double segmentDistance(double ax, double ay, double bx, double by, double px, double py) {
        double dx = bx - ax;
        double dy = by - ay;
        double lengthSquared = dx * dx + dy * dy;
        double t = lengthSquared > 0 ? ((px - ax) * dx + (py - ay) * dy) / lengthSquared : 0;
        t = Math.max(0, Math.min(1, t));
        double ex = px - (ax + t * dx);
        double ey = py - (ay + t * dy);
        return Math.sqrt(ex * ex + ey * ey);
    }
}
