package org.kinduct.solver.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.LongStream;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.kinduct.scene.Vec2;

class LoopInductanceTest {

    /** CODATA 2018 (NIST). */
    private static final double MU0 = 1.25663706212e-6;
    private static final double QUADRATURE_TOL = 1e-9;
    /** A 512-gon stands in for a circle: its perimeter and area differ from the circle's by ~1e-5. */
    private static final double POLYGON_AS_CIRCLE_TOL = 1e-4;
    private static final long SEED = 0xC01L;

    /**
     * Rectangle a×b of round wire radius ρ, g = √(a²+b²), assembled from Rosa's straight-wire
     * self-inductance and parallel-filament mutual inductance (Rosa, "The self and mutual
     * inductances of linear conductors", Bull. Bur. Stand. 4, 301–344, 1908; Grover, Inductance
     * Calculations, 1946): L = (μ0/π)[(a+b)ln(2ab/ρ) − a ln(a+g) − b ln(b+g) + 2g − (7/4)(a+b)].
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.05, 0.2, 1})
    void rectangleMatchesRosaAssembly(double b) {
        double a = 0.3;
        double rho = 5e-4;
        double expected = rosaRectangle(a, b, rho);
        assertEquals(expected, LoopInductance.self(rectangle(1, 2, a, b), rho, 1), QUADRATURE_TOL * expected);
    }

    private static double rosaRectangle(double a, double b, double rho) {
        double g = Math.hypot(a, b);
        return MU0 / Math.PI * ((a + b) * Math.log(2 * a * b / rho) - a * Math.log(a + g)
                - b * Math.log(b + g) + 2 * g - 1.75 * (a + b));
    }

    /** N coincident turns link N times the flux of N times the current: L = N²·L₁ (Grover 1946), here against Rosa. */
    @Test
    void turnsScaleSelfInductanceWithTheirSquare() {
        List<Vec2> r = rectangle(0, 0, 0.1, 0.07);
        double expected = 49 * rosaRectangle(0.1, 0.07, 2e-4);
        assertEquals(expected, LoopInductance.self(r, 2e-4, 7), QUADRATURE_TOL * expected);
    }

    /**
     * Circular loop of round wire, uniform current: L = μ0R[ln(8R/a) − 2 + 1/4] (Maxwell 1865;
     * Rosa &amp; Grover, Bull. Bur. Stand. 8, 1911). Regular polygons inscribed in the circle approach
     * it at second order, as their perimeter does (1 − (n/π)·sin(π/n) ≈ π²/(6n²); Archimedes' bound,
     * common practice): each doubling of the sides must divide the error by about four (measured
     * 3.82–3.85 from 16 to 256 sides), and 256 sides leave a few times the perimeter defect.
     */
    @Test
    void regularPolygonsApproachTheCircularLoop() {
        double radius = 0.1;
        double wire = 1e-5;
        double circle = MU0 * radius * (Math.log(8 * radius / wire) - 2 + 0.25);
        double previous = Double.NaN;
        for (int sides = 16; sides <= 256; sides *= 2) {
            double error = Math.abs(LoopInductance.self(regularPolygon(0, 0, radius, sides, 0), wire, 1) - circle) / circle;
            if (sides > 16) {
                assertEquals(4, previous / error, 0.25, sides + " sides: error " + error + " after " + previous);
            }
            previous = error;
        }
        // The error is of the order of the perimeter defect π²/(6n²) = 2.5e-5 (measured 1.9 times it).
        double perimeterDefect = Math.PI * Math.PI / (6 * 256 * 256);
        assertTrue(previous < 4 * perimeterDefect, "256 sides still off by " + previous);
    }

    /**
     * Coaxial circles (Maxwell; Rosa &amp; Grover 1911):
     * M = μ0√(ab)[(2/k − k)K(m) − (2/k)E(m)], m = k² = 4ab/((a+b)² + h²).
     * Checked three ways: circle coil to a fine polygon loop (elliptic potential path), polygon coil
     * to polygon loop in parallel planes (Neumann filament path), both against the formula.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.002, 0.02, 0.1})
    void coaxialCirclesMatchMaxwell(double height) {
        double a = 0.05;
        double b = 0.08;
        double maxwell = maxwell(a, b, height);
        List<Vec2> loop = regularPolygon(0.3, -0.1, b, 512, 0.1);
        double viaCircle = LoopInductance.mutualToCircleCoil(loop, 1, new Vec2(0.3, -0.1), a, height, 1);
        double viaPolygons = LoopInductance.mutualToPolygonCoil(loop, 1,
                regularPolygon(0.3, -0.1, a, 512, 0), height, 1);
        assertEquals(maxwell, viaCircle, POLYGON_AS_CIRCLE_TOL * maxwell);
        assertEquals(maxwell, viaPolygons, POLYGON_AS_CIRCLE_TOL * maxwell);
        // Turns multiply, and a coil below the plane links the same as one above (mirror symmetry).
        assertEquals(3 * 5 * viaCircle,
                LoopInductance.mutualToCircleCoil(loop, 3, new Vec2(0.3, -0.1), a, -height, 5),
                QUADRATURE_TOL * 15 * viaCircle);
    }

    /** Coplanar concentric circles: Maxwell's formula with h = 0, approached by two polygon loops in the plane. */
    @Test
    void coplanarConcentricPolygonsApproachMaxwell() {
        double a = 0.05;
        double b = 0.07;
        double maxwell = maxwell(a, b, 0);
        double m = LoopInductance.mutual(regularPolygon(0, 0, a, 512, 0), 1e-4, 1,
                regularPolygon(0, 0, b, 512, 0.003), 1e-4, 1);
        assertEquals(maxwell, m, POLYGON_AS_CIRCLE_TOL * maxwell);
    }

    /**
     * Off-axis circle coil: the elliptic-potential path and the Neumann path on a 1024-gon coil are
     * independent computations of the same flux; they must agree for random placements.
     */
    @ParameterizedTest
    @MethodSource("seeds")
    void circleCoilAgreesWithFinePolygonCoilOffAxis(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Vec2> loop = randomConvexLoop(rnd, 0, 0, 0.1);
        Vec2 c = new Vec2(rnd.nextDouble(-0.1, 0.1), rnd.nextDouble(-0.1, 0.1));
        double r = rnd.nextDouble(0.02, 0.1);
        double z = rnd.nextDouble(0.005, 0.05) * (rnd.nextBoolean() ? 1 : -1);
        double viaCircle = LoopInductance.mutualToCircleCoil(loop, 1, c, r, z, 1);
        double viaPolygon = LoopInductance.mutualToPolygonCoil(loop, 1, regularPolygon(c.x(), c.y(), r, 1024, 0), z, 1);
        assertEquals(viaCircle, viaPolygon, 1e-4 * Math.abs(viaCircle) + 1e-12, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void mutualInductanceIsSymmetric(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Vec2> a = randomConvexLoop(rnd, 0, 0, 0.1);
        List<Vec2> b = randomConvexLoop(rnd, rnd.nextDouble(0.25, 0.4), rnd.nextDouble(-0.2, 0.2), 0.1);
        double ab = LoopInductance.mutual(a, 1e-4, 2, b, 3e-4, 3);
        assertEquals(ab, LoopInductance.mutual(b, 3e-4, 3, a, 1e-4, 2), QUADRATURE_TOL * Math.abs(ab), "seed " + seed);
    }

    /** Energy ½IᵀMI ≥ 0 for any currents, so M12² ≤ L1·L2 (e.g. Grover 1946, coupling coefficient ≤ 1). */
    @ParameterizedTest
    @MethodSource("seeds")
    void couplingCoefficientNeverExceedsOne(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Vec2> a = randomConvexLoop(rnd, 0, 0, 0.1);
        // Overlapping or nested placements give the strongest coupling.
        List<Vec2> b = randomConvexLoop(rnd, rnd.nextDouble(-0.05, 0.05), rnd.nextDouble(-0.05, 0.05), 0.1);
        double l1 = LoopInductance.self(a, 1e-4, 1);
        double l2 = LoopInductance.self(b, 1e-4, 1);
        double m = LoopInductance.mutual(a, 1e-4, 1, b, 1e-4, 1);
        assertTrue(m * m <= l1 * l2, "seed " + seed + ": M = " + m + ", L1 = " + l1 + ", L2 = " + l2);
    }

    @Test
    void sidesRunningSideBySideCloserThanTheWireAreRefused() {
        List<Vec2> a = rectangle(0, 0, 0.1, 0.1);
        List<Vec2> b = rectangle(0.1 + 1e-4, 0, 0.1, 0.1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LoopInductance.mutual(a, 1e-3, 1, b, 1e-3, 1));
        assertTrue(e.getMessage().contains("closer than the wire radii"), e.getMessage());
    }

    @Test
    void hairpinFoldIsRefused() {
        List<Vec2> hairpin = List.of(new Vec2(0, 0), new Vec2(0.2, 0), new Vec2(0, 5e-4), new Vec2(-0.1, 0.05));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LoopInductance.self(hairpin, 1e-3, 1));
        assertTrue(e.getMessage().contains("closer than the wire radii"), e.getMessage());
    }

    /** Crossing sides (a figure-eight) are finite in Neumann's integral and must not be refused as "too close". */
    @Test
    void figureEightWithCrossingSidesIsAccepted() {
        List<Vec2> eight = List.of(new Vec2(0, 0), new Vec2(0.1, 0.1), new Vec2(0.1, 0), new Vec2(0, 0.1),
                new Vec2(-0.1, 0.1), new Vec2(-0.1, 0));
        double l = LoopInductance.self(eight, 1e-4, 1);
        assertTrue(l > 0 && Double.isFinite(l), "L = " + l);
    }

    static LongStream seeds() {
        return LongStream.range(0, 10).map(i -> SEED + i);
    }

    private static double maxwell(double a, double b, double h) {
        double m = 4 * a * b / ((a + b) * (a + b) + h * h);
        double k = Math.sqrt(m);
        return MU0 * Math.sqrt(a * b) * ((2 / k - k) * LegendreEllipticIntegral.bigK(m)
                - 2 / k * LegendreEllipticIntegral.bigE(m));
    }

    private static List<Vec2> rectangle(double x, double y, double a, double b) {
        return List.of(new Vec2(x, y), new Vec2(x + a, y), new Vec2(x + a, y + b), new Vec2(x, y + b));
    }

    private static List<Vec2> regularPolygon(double cx, double cy, double radius, int sides, double phase) {
        List<Vec2> out = new ArrayList<>();
        IntStream.range(0, sides).forEach(i -> out.add(new Vec2(cx + radius * Math.cos(phase + 2 * Math.PI * i / sides),
                cy + radius * Math.sin(phase + 2 * Math.PI * i / sides))));
        return out;
    }

    /** A counter-clockwise convex polygon of 3–8 vertices on a jittered circle of about {@code size}. */
    private static List<Vec2> randomConvexLoop(SplittableRandom rnd, double cx, double cy, double size) {
        int n = rnd.nextInt(3, 9);
        List<Vec2> out = new ArrayList<>();
        double r = size * rnd.nextDouble(0.5, 1);
        for (int i = 0; i < n; i++) {
            double angle = 2 * Math.PI * (i + rnd.nextDouble(-0.3, 0.3)) / n;
            out.add(new Vec2(cx + r * Math.cos(angle), cy + r * Math.sin(angle)));
        }
        return out;
    }
}
