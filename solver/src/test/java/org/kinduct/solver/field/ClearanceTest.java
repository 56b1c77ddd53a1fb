package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.geometry.euclidean.twod.Lines;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.apache.commons.numbers.core.Precision;
import org.junit.jupiter.api.Test;

/**
 * {@link Clearance}: the segment distance against Apache Commons Geometry's closest point on a
 * segment, and the clearance as a true lower bound on the distance between the segment's points
 * and a source's (seeded random points of both: a cylinder of the disc's radius between the
 * plane distance and twice it).
 */
class ClearanceTest {

    private static final long SEED = 0xC1EA_2026L;
    private static final Precision.DoubleEquivalence PRECISION = Precision.doubleEquivalenceOfEpsilon(1e-15);

    @Test
    void segmentDistanceMatchesTheClosestPointOfCommonsGeometry() {
        SplittableRandom r = new SplittableRandom(SEED);
        for (int c = 0; c < 10_000; c++) {
            Vector2D a = Vector2D.of(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
            Vector2D b = Vector2D.of(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
            Vector2D p = Vector2D.of(r.nextDouble(-2, 2), r.nextDouble(-2, 2));
            double expected = Lines.segmentFromPoints(a, b, PRECISION).closest(p).distance(p);
            assertEquals(expected, Clearance.segmentDistance(a.getX(), a.getY(), b.getX(), b.getY(), p.getX(), p.getY()),
                    1e-14, "seed " + SEED + " case " + c);
        }
    }

    @Test
    void theClearanceNeverExceedsADistanceBetweenSegmentAndSource() {
        SplittableRandom r = new SplittableRandom(SEED);
        for (int c = 0; c < 2_000; c++) {
            double cx = r.nextDouble(-0.05, 0.05);
            double cy = r.nextDouble(-0.05, 0.05);
            double radius = r.nextDouble(0.001, 0.02);
            double plane = r.nextDouble(0.0001, 0.01);
            double ax = r.nextDouble(-0.1, 0.1);
            double ay = r.nextDouble(-0.1, 0.1);
            double bx = r.nextDouble(-0.1, 0.1);
            double by = r.nextDouble(-0.1, 0.1);
            double clearance = Clearance.aroundDisc(cx, cy, radius, plane).clearanceM(ax, ay, bx, by);
            double nearest = Double.POSITIVE_INFINITY;
            for (int k = 0; k < 400; k++) {
                double s = r.nextDouble();
                double angle = r.nextDouble(0, 2 * Math.PI);
                double rho = radius * Math.sqrt(r.nextDouble());
                double dx = ax + s * (bx - ax) - (cx + rho * Math.cos(angle));
                double dy = ay + s * (by - ay) - (cy + rho * Math.sin(angle));
                double dz = plane * (1 + r.nextDouble());
                nearest = Math.min(nearest, Math.sqrt(dx * dx + dy * dy + dz * dz));
            }
            assertTrue(clearance <= nearest, "seed " + SEED + " case " + c + ": clearance " + clearance + " > " + nearest);
        }
    }

    /**
     * Coils state their clearance through {@link CurrentSourceField#breaks}: never more than the
     * distance from a point of a random segment to a point of the filament (a circle, and a
     * pentagon, at their coil plane).
     */
    @Test
    void aCoilsClearanceNeverExceedsADistanceToItsFilament() {
        double[] px = {-0.01, 0.012, 0.015, 0.0, -0.014};
        double[] py = {-0.012, -0.01, 0.008, 0.016, 0.004};
        CircleCoilField circle = new CircleCoilField(0.002, -0.001, 0.012, -0.005, 7);
        PolygonCoilField pentagon = new PolygonCoilField(px, py, 0.004, 10);
        SplittableRandom r = new SplittableRandom(SEED);
        for (int c = 0; c < 2_000; c++) {
            double ax = r.nextDouble(-0.1, 0.1);
            double ay = r.nextDouble(-0.1, 0.1);
            double bx = r.nextDouble(-0.1, 0.1);
            double by = r.nextDouble(-0.1, 0.1);
            double circleClearance = circle.breaks().clearanceM(ax, ay, bx, by);
            double pentagonClearance = pentagon.breaks().clearanceM(ax, ay, bx, by);
            for (int k = 0; k < 400; k++) {
                double s = r.nextDouble();
                double x = ax + s * (bx - ax);
                double y = ay + s * (by - ay);
                double angle = r.nextDouble(0, 2 * Math.PI);
                double toCircle = Math.sqrt(Math.pow(x - 0.002 - 0.012 * Math.cos(angle), 2)
                        + Math.pow(y + 0.001 - 0.012 * Math.sin(angle), 2) + 0.005 * 0.005);
                int i = r.nextInt(px.length);
                int j = (i + 1) % px.length;
                double t = r.nextDouble();
                double toPentagon = Math.sqrt(Math.pow(x - px[i] - t * (px[j] - px[i]), 2)
                        + Math.pow(y - py[i] - t * (py[j] - py[i]), 2) + 0.004 * 0.004);
                String where = "seed " + SEED + " case " + c;
                assertTrue(circleClearance <= toCircle, where + ": circle " + circleClearance + " > " + toCircle);
                assertTrue(pentagonClearance <= toPentagon, where + ": pentagon " + pentagonClearance + " > " + toPentagon);
            }
        }
    }

    /**
     * Where the nearest points are known, the bound is the distance: a segment across the x axis
     * at x = 0.05 from a disc of radius 0.02 at the origin, 0.003 below the plane, is nearest to its
     * rim point (0.02, 0, −0.003).
     */
    @Test
    void theClearanceIsTheDistanceWhereTheNearestPointsAreKnown() {
        double clearance = Clearance.aroundDisc(0, 0, 0.02, 0.003).clearanceM(0.05, -1, 0.05, 1);
        assertEquals(Math.hypot(0.03, 0.003), clearance, 1e-17);
    }
}
