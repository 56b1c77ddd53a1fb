package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class StraightFilamentTest {

    private static final long SEED = 0x5EED_0100L;
    private static final double CURRENT = 3.0;
    /** Composite 20-point G–L on 400 panels resolves integrands peaked on the scale of |z0| ≥ 1 mm. */
    private static final double BRUTE_FORCE_LEVEL = 1e-11;
    private static final double ULP_LEVEL = 1e-13;

    private record Case(double ax, double ay, double bx, double by, double z0, double x, double y) {
        static Case draw(SplittableRandom r) {
            return new Case(r.nextDouble(-0.05, 0.05), r.nextDouble(-0.05, 0.05), r.nextDouble(-0.05, 0.05),
                    r.nextDouble(-0.05, 0.05), (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.001, 0.02),
                    r.nextDouble(-0.08, 0.08), r.nextDouble(-0.08, 0.08));
        }
    }

    @RepeatedTest(100)
    void bzMatchesNumericalBiotSavart(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        Case c = Case.draw(new SplittableRandom(seed));
        // Reference: Biot–Savart law integrated numerically along the segment (Griffiths ch. 5).
        double expected = NumericalReference.biotSavartBz(NumericalReference.segment(c.ax, c.ay, c.bx, c.by, c.z0),
                CURRENT, c.x, c.y, 0, 1, 400);
        double actual = StraightFilament.bz(c.ax, c.ay, c.bx, c.by, c.z0, CURRENT, c.x, c.y);
        assertEquals(expected, actual, BRUTE_FORCE_LEVEL * Math.abs(expected) + 1e-18, "seed " + seed + " " + c);
    }

    @RepeatedTest(100)
    void potentialMatchesNumericalIntegralOfDlOverR(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        Case c = Case.draw(new SplittableRandom(seed));
        // Reference: A = (μ0 I/4π)∫ dl/r integrated numerically (Griffiths ch. 5, vector potential).
        double[] expected = NumericalReference.potential(NumericalReference.segment(c.ax, c.ay, c.bx, c.by, c.z0),
                CURRENT, c.x, c.y, 0, 1, 400);
        double[] actual = new double[2];
        StraightFilament.addPotential(c.ax, c.ay, c.bx, c.by, c.z0, CURRENT, c.x, c.y, actual);
        double scale = Math.hypot(expected[0], expected[1]);
        assertEquals(expected[0], actual[0], BRUTE_FORCE_LEVEL * scale, "seed " + seed + " " + c);
        assertEquals(expected[1], actual[1], BRUTE_FORCE_LEVEL * scale, "seed " + seed + " " + c);
    }

    @RepeatedTest(20)
    void stableFormsHoldFarOutAlongTheFilamentLine(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double far = Math.pow(10, r.nextDouble(2, 5)) * (r.nextBoolean() ? 1 : -1);
        double offset = r.nextDouble(-0.01, 0.01);
        double z0 = 0.003;
        // Segment along x of length 1 cm; the point lies near its line, 1e2..1e5 lengths away, where
        // the textbook cos θ1 − cos θ2 and ln-ratio forms lose most digits. The numerical integral
        // of a smooth integrand is the reference.
        double x = 0.01 * far;
        double expectedBz = NumericalReference.biotSavartBz(NumericalReference.segment(0, 0, 0.01, 0, z0),
                CURRENT, x, offset, 0, 1, 4);
        double[] expectedA = NumericalReference.potential(NumericalReference.segment(0, 0, 0.01, 0, z0),
                CURRENT, x, offset, 0, 1, 4);
        double[] actualA = new double[2];
        StraightFilament.addPotential(0, 0, 0.01, 0, z0, CURRENT, x, offset, actualA);
        assertEquals(expectedBz, StraightFilament.bz(0, 0, 0.01, 0, z0, CURRENT, x, offset),
                ULP_LEVEL * Math.abs(expectedBz), "seed " + seed);
        assertEquals(expectedA[0], actualA[0], ULP_LEVEL * Math.abs(expectedA[0]), "seed " + seed);
        assertEquals(0, actualA[1], 0, "seed " + seed);
    }

    @Test
    void longSegmentApproachesInfiniteWireField() {
        double d = 0.002;
        double z0 = 0.001;
        double halfLength = 1e4;
        double y = Math.sqrt(d * d - z0 * z0);
        // Infinite straight wire: |B| = μ0 I/(2π d) (Griffiths ch. 5); the finite segment's
        // cos θ1 − cos θ2 = 2L/√(L² + d²) differs by (d/L)²/2 ≈ 2e-14. B lies along û × d̂, whose
        // z component is the in-plane share y/d of that magnitude.
        double infinite = PhysicalConstants.MU_0 * CURRENT / (2 * Math.PI * d) * (y / d);
        double actual = StraightFilament.bz(-halfLength, 0, halfLength, 0, z0, CURRENT, 0, y);
        assertEquals(infinite, actual, ULP_LEVEL * infinite);
    }

    @Test
    void currentAlongPlusXMakesPositiveBzOnItsLeft() {
        // Right-hand rule (Griffiths ch. 5): current along +x, field circles counter-clockwise
        // seen from +x, so at +y (left of the current, seen from +z) B points out of the screen.
        double left = StraightFilament.bz(-1, 0, 1, 0, 0.001, CURRENT, 0, 0.01);
        double right = StraightFilament.bz(-1, 0, 1, 0, 0.001, CURRENT, 0, -0.01);
        assertEquals(1, Math.signum(left));
        assertEquals(-1, Math.signum(right));
    }

    /** The fast ln(1 + x) against the library's {@link Math#log1p} (Goldberg 1991, Theorem 4: a few ulp). */
    @org.junit.jupiter.api.Test
    void log1pThroughLogIsWithinAFewUlpOfTheLibrary() {
        java.util.SplittableRandom r = new java.util.SplittableRandom(0x1091_9L);
        for (int i = 0; i < 100_000; i++) {
            double x = Math.scalb(r.nextDouble(1, 2), r.nextInt(-60, 8));
            double expected = Math.log1p(x);
            assertEquals(expected, StraightFilament.log1p(x), 8 * Math.ulp(expected), "x = " + x);
        }
        assertEquals(0.0, StraightFilament.log1p(0.0));
    }
}
