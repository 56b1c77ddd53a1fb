package org.kinduct.solver.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class SegmentInductanceTest {

    /** CODATA 2018 (NIST). */
    private static final double MU0 = 1.25663706212e-6;
    /** The code's quadrature is asked for 1e-11; leave headroom for the reference's own error. */
    private static final double QUADRATURE_TOL = 1e-9;
    /** Brute-force product Gauss–Legendre reference on well-separated filaments. */
    private static final double BRUTE_FORCE_TOL = 1e-9;
    private static final double CONTINUITY_TOL = 1e-5;
    private static final long SEED = 0x5EED_1DL;

    /**
     * Rosa (1908) / Grover (1946): L = (μ0 l/2π)[ln(2l/ρ) − 3/4]. Cutting the wire into k pieces
     * and summing the pieces' own Rosa terms plus all their Neumann mutual terms (collinear pieces
     * through the general quadrature and, when touching, Grover's meeting formula) must give the
     * same number: the formula is exactly self-consistent under subdivision.
     */
    @ParameterizedTest
    @ValueSource(ints = {2, 3, 5, 8})
    void subdividedStraightWireReproducesRosa(int pieces) {
        double length = 0.4;
        double radius = 1e-4;
        double rosa = MU0 * length / (2 * Math.PI) * (Math.log(2 * length / radius) - 0.75);
        double dx = 0.6 * length / pieces;
        double dy = 0.8 * length / pieces;
        Filament[] part = new Filament[pieces];
        for (int i = 0; i < pieces; i++) {
            part[i] = Filament.inPlane(0.1 + i * dx, -0.2 + i * dy, 0.1 + (i + 1) * dx, -0.2 + (i + 1) * dy, 0);
        }
        double sum = 0;
        for (int i = 0; i < pieces; i++) {
            sum += SegmentInductance.roundWireSelf(part[i].length(), radius);
            for (int j = 0; j < pieces; j++) {
                if (i != j) {
                    sum += SegmentInductance.mutual(part[i], part[j]);
                }
            }
        }
        assertEquals(rosa, sum, QUADRATURE_TOL * rosa);
    }

    /** Rosa (1908), Grover (1946): two equal parallel filaments facing each other, M = (μ0 l/2π)[asinh(l/d) − √(1+d²/l²) + d/l]. */
    @ParameterizedTest
    @ValueSource(doubles = {1e-3, 0.01, 0.1, 1, 10})
    void parallelFilamentsMatchRosa(double distanceOverLength) {
        double l = 0.25;
        double d = distanceOverLength * l;
        double rosa = MU0 * l / (2 * Math.PI)
                * (asinh(l / d) - Math.sqrt(1 + d * d / (l * l)) + d / l);
        Filament a = Filament.inPlane(0, 0, l, 0, 0);
        Filament b = Filament.inPlane(0, d, l, d, 0);
        assertEquals(rosa, SegmentInductance.mutual(a, b), QUADRATURE_TOL * rosa);
        // Opposite currents: the sign follows û1·û2.
        Filament reversed = Filament.inPlane(l, d, 0, d, 0);
        assertEquals(-rosa, SegmentInductance.mutual(a, reversed), QUADRATURE_TOL * rosa);
    }

    /**
     * Neumann's formula M = (μ0/4π) û1·û2 ∫∫ ds1 ds2/r by brute force: a 40×40-point product
     * Gauss–Legendre rule on 1/r directly (no closed-form inner integral), for random filaments in
     * space whose distance is at least their lengths, where 1/r is smooth and the rule converges
     * far below the tolerance.
     */
    @ParameterizedTest
    @MethodSource("separatedPairs")
    void separatedFilamentsMatchBruteForceNeumann(long seed, Filament a, Filament b) {
        double reference = bruteForce(a, b);
        assertEquals(reference, SegmentInductance.mutual(a, b), BRUTE_FORCE_TOL * Math.abs(reference) + 1e-20,
                "seed " + seed);
    }

    /**
     * Grover's closed form for filaments meeting at a point against the general quadrature: moving
     * one filament a tiny distance off the shared end must change M only by a tiny amount
     * (Neumann's integral is continuous there).
     */
    @ParameterizedTest
    @ValueSource(doubles = {10, 45, 90.5, 120, 170})
    void meetingFormulaIsTheLimitOfTheGeneralQuadrature(double angleDeg) {
        double c = Math.cos(Math.toRadians(angleDeg));
        double s = Math.sin(Math.toRadians(angleDeg));
        Filament a = Filament.inPlane(-0.3, 0, 0, 0, 0);
        Filament b = Filament.inPlane(0, 0, 0.5 * c, 0.5 * s, 0);
        double shift = 1e-9;
        Filament bOff = new Filament(0, 0, shift, 0.5 * c, 0.5 * s, shift);
        double closed = SegmentInductance.mutual(a, b);
        assertEquals(closed, SegmentInductance.mutual(a, bOff), CONTINUITY_TOL * Math.abs(closed));
    }

    @Test
    void crossingFilamentsGiveTheFiniteLimitOfFilamentsPassingClose() {
        Filament a = Filament.inPlane(-0.2, 0, 0.3, 0, 0);
        Filament b = Filament.inPlane(0.1, -0.25, 0.05, 0.2, 0);
        Filament bOver = new Filament(0.1, -0.25, 1e-9, 0.05, 0.2, 1e-9);
        double crossing = SegmentInductance.mutual(a, b);
        assertTrue(Double.isFinite(crossing));
        assertEquals(SegmentInductance.mutual(a, bOver), crossing, CONTINUITY_TOL * Math.abs(crossing));
    }

    /**
     * The closed forms for filaments in one plane against Neumann's integral by brute force
     * (well separated) and against the general quadrature with one filament lifted 1e-9 m out of
     * the plane (any distance; the integral is continuous in the lift).
     */
    @ParameterizedTest
    @MethodSource("coplanarPairs")
    void coplanarClosedFormsMatchTheQuadrature(long seed, Filament a, Filament b) {
        double closed = SegmentInductance.mutual(a, b);
        Filament lifted = new Filament(b.ax(), b.ay(), b.az() + 1e-9, b.bx(), b.by(), b.bz() + 1e-9);
        assertEquals(SegmentInductance.mutual(a, lifted), closed, CONTINUITY_TOL * Math.abs(closed) + 1e-20,
                "seed " + seed);
        if (separated(a, b)) {
            assertEquals(bruteForce(a, b), closed, BRUTE_FORCE_TOL * Math.abs(closed) + 1e-20, "seed " + seed);
        }
    }

    @ParameterizedTest
    @MethodSource("randomPairs")
    void mutualIsSymmetric(long seed, Filament a, Filament b) {
        double ab = SegmentInductance.mutual(a, b);
        assertEquals(ab, SegmentInductance.mutual(b, a), QUADRATURE_TOL * Math.abs(ab) + 1e-20, "seed " + seed);
    }

    @Test
    void overlappingCollinearFilamentsAreRefused() {
        Filament a = Filament.inPlane(0, 0, 1, 0, 0);
        Filament b = Filament.inPlane(0.5, 0, 2, 0, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SegmentInductance.mutual(a, b));
        assertTrue(e.getMessage().contains("overlap"), e.getMessage());
    }

    @Test
    void filamentsFoldedBackOntoEachOtherAreRefused() {
        Filament a = Filament.inPlane(0, 0, 1, 0, 0);
        Filament back = Filament.inPlane(1, 0, 0.5, 0, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SegmentInductance.mutual(a, back));
        assertTrue(e.getMessage().contains("folded back"), e.getMessage());
    }

    @Test
    void wireShorterThanFourRadiiIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SegmentInductance.roundWireSelf(3e-3, 1e-3));
        assertTrue(e.getMessage().contains("wire radii"), e.getMessage());
    }

    static Stream<Arguments> separatedPairs() {
        return IntStream.range(0, 20).mapToObj(i -> {
            long seed = SEED + i;
            SplittableRandom rnd = new SplittableRandom(seed);
            Filament a = randomFilament(rnd, 0, 0, 0);
            double[] dir = unit(rnd);
            double far = 1.5 + rnd.nextDouble();
            Filament b = randomFilament(rnd, far * dir[0], far * dir[1], far * dir[2]);
            return Arguments.of(seed, a, b);
        });
    }

    /** Random filaments in the plane z = 0.2: inclined, parallel, collinear and crossing ones. */
    static Stream<Arguments> coplanarPairs() {
        return IntStream.range(0, 40).mapToObj(i -> {
            long seed = SEED * 7 + i;
            SplittableRandom rnd = new SplittableRandom(seed);
            double z = 0.2;
            Filament a = Filament.inPlane(rnd.nextDouble(-0.5, 0.5), rnd.nextDouble(-0.5, 0.5),
                    rnd.nextDouble(-0.5, 0.5), rnd.nextDouble(-0.5, 0.5), z);
            double cx = rnd.nextDouble(-1.5, 1.5);
            double cy = rnd.nextDouble(-1.5, 1.5);
            double h = rnd.nextDouble(0.05, 0.5);
            double angle;
            switch (i % 4) {
                case 0 -> angle = Math.atan2(a.by() - a.ay(), a.bx() - a.ax());
                case 1 -> angle = Math.atan2(a.by() - a.ay(), a.bx() - a.ax()) + Math.PI;
                default -> angle = rnd.nextDouble(0, 2 * Math.PI);
            }
            Filament b = Filament.inPlane(cx - h * Math.cos(angle), cy - h * Math.sin(angle),
                    cx + h * Math.cos(angle), cy + h * Math.sin(angle), z);
            return Arguments.of(seed, a, b);
        });
    }

    /** Distance between the filaments' midpoints at least their combined length: 1/r is smooth. */
    private static boolean separated(Filament a, Filament b) {
        double dx = (a.ax() + a.bx() - b.ax() - b.bx()) / 2;
        double dy = (a.ay() + a.by() - b.ay() - b.by()) / 2;
        return Math.hypot(dx, dy) > 1.5 * (a.length() + b.length());
    }

    static Stream<Arguments> randomPairs() {
        return IntStream.range(0, 20).mapToObj(i -> {
            long seed = SEED * 31 + i;
            SplittableRandom rnd = new SplittableRandom(seed);
            return Arguments.of(seed, randomFilament(rnd, 0, 0, 0),
                    randomFilament(rnd, rnd.nextDouble(-0.3, 0.3), rnd.nextDouble(-0.3, 0.3), rnd.nextDouble(-0.3, 0.3)));
        });
    }

    /** A filament of length up to 1 m (at least 0.1 m) centred at (cx, cy, cz), in any direction. */
    private static Filament randomFilament(SplittableRandom rnd, double cx, double cy, double cz) {
        double[] u = unit(rnd);
        double h = rnd.nextDouble(0.05, 0.5);
        return new Filament(cx - h * u[0], cy - h * u[1], cz - h * u[2], cx + h * u[0], cy + h * u[1], cz + h * u[2]);
    }

    private static double[] unit(SplittableRandom rnd) {
        double z = rnd.nextDouble(-1, 1);
        double phi = rnd.nextDouble(0, 2 * Math.PI);
        double r = Math.sqrt(1 - z * z);
        return new double[] {r * Math.cos(phi), r * Math.sin(phi), z};
    }

    private static double bruteForce(Filament a, Filament b) {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(40, 0, 1);
        double sum = 0;
        for (int i = 0; i < rule.getNumberOfPoints(); i++) {
            double s = rule.getPoint(i);
            double px = a.ax() + s * (a.bx() - a.ax());
            double py = a.ay() + s * (a.by() - a.ay());
            double pz = a.az() + s * (a.bz() - a.az());
            for (int j = 0; j < rule.getNumberOfPoints(); j++) {
                double t = rule.getPoint(j);
                double qx = b.ax() + t * (b.bx() - b.ax());
                double qy = b.ay() + t * (b.by() - b.ay());
                double qz = b.az() + t * (b.bz() - b.az());
                sum += rule.getWeight(i) * rule.getWeight(j)
                        / Math.sqrt((px - qx) * (px - qx) + (py - qy) * (py - qy) + (pz - qz) * (pz - qz));
            }
        }
        return MU0 / (4 * Math.PI) * a.cosAngleTo(b) * sum * a.length() * b.length();
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }
}
