package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class CircularFilamentTest {

    private static final long SEED = 0x5EED_0200L;
    private static final double CURRENT = 2.5;
    private static final double RADIUS = 0.02;
    private static final double ULP_LEVEL = 1e-14;
    private static final double BRUTE_FORCE_LEVEL = 1e-11;

    @Test
    void centreFieldIsMu0IOverTwoA() {
        // Centre of a circular loop: B = μ0 I/(2a) (Griffiths ch. 5, Example 5.6).
        double expected = PhysicalConstants.MU_0 * CURRENT / (2 * RADIUS);
        assertEquals(expected, CircularFilament.bz(RADIUS, 0, CURRENT, 0), ULP_LEVEL * expected);
    }

    @RepeatedTest(20)
    void onAxisFieldMatchesTextbookForm(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        double z = new SplittableRandom(seed).nextDouble(-0.2, 0.2);
        // On the axis: B_z = μ0 I a²/(2(a² + z²)^{3/2}) (Griffiths ch. 5, Example 5.6).
        double expected = PhysicalConstants.MU_0 * CURRENT * RADIUS * RADIUS
                / (2 * Math.pow(RADIUS * RADIUS + z * z, 1.5));
        assertEquals(expected, CircularFilament.bz(RADIUS, z, CURRENT, 0), ULP_LEVEL * expected, "seed " + seed);
        assertEquals(expected, CircularFilament.bz(RADIUS, z, CURRENT, 1e-9 * RADIUS), ULP_LEVEL * expected,
                "seed " + seed + " just off the axis");
    }

    @RepeatedTest(100)
    void offAxisFieldMatchesNumericalBiotSavart(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double rho = r.nextDouble(0, 3 * RADIUS);
        double dz = (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.002, 0.05);
        // Biot–Savart around the circle, numerically (Griffiths ch. 5); the loop sits at −dz.
        double expected = NumericalReference.biotSavartBz(NumericalReference.circle(0, 0, RADIUS, -dz),
                CURRENT, rho, 0, 0, 2 * Math.PI, 200);
        double actual = CircularFilament.bz(RADIUS, dz, CURRENT, rho);
        assertEquals(expected, actual, BRUTE_FORCE_LEVEL * Math.abs(expected), "seed " + seed);
    }

    @RepeatedTest(100)
    void azimuthalPotentialMatchesNumericalIntegralOfDlOverR(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        // Log-uniform ρ reaches deep into the small-m series branch.
        double rho = RADIUS * Math.pow(10, r.nextDouble(-6, 0.5));
        double dz = (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.002, 0.05);
        // A_φ = (μ0 I a/4π)∫ cos φ dφ/√D, D = a² + ρ² + dz² − 2aρ cos φ (Jackson 3rd ed. §5.5),
        // numerically. 1/√D0 with D0 = D(ρ = 0) is subtracted first (its cos φ integral is 0), so
        // the quadrature does not cancel to O(ρ) at small ρ.
        double d0 = RADIUS * RADIUS + dz * dz;
        double expected = PhysicalConstants.MU_0_OVER_4PI * CURRENT * RADIUS * NumericalReference.integrate(phi -> {
            double cos = Math.cos(phi);
            double d = d0 + rho * rho - 2 * RADIUS * rho * cos;
            double sd = Math.sqrt(d);
            double sd0 = Math.sqrt(d0);
            return cos * (2 * RADIUS * rho * cos - rho * rho) / (sd * sd0 * (sd + sd0));
        }, 0, 2 * Math.PI, 200);
        double actual = CircularFilament.aPhi(RADIUS, dz, CURRENT, rho);
        assertEquals(expected, actual, BRUTE_FORCE_LEVEL * Math.abs(expected), "seed " + seed + " rho " + rho);
    }

    @RepeatedTest(50)
    void fluxThroughCoaxialCircleIsMaxwellMutualInductance(RepetitionInfo info) {
        long seed = SEED + 3000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double b = RADIUS * Math.pow(10, r.nextDouble(-1, 1));
        double h = r.nextDouble(0.001, 0.05);
        // Maxwell's formula (Rosa & Grover, Bull. Bur. Stand. 8, 1911):
        // M = μ0 √(ab)[(2/k − k)K(m) − (2/k)E(m)], m = k² = 4ab/((a + b)² + h²).
        double m = 4 * RADIUS * b / ((RADIUS + b) * (RADIUS + b) + h * h);
        double k = Math.sqrt(m);
        double mutual = PhysicalConstants.MU_0 * Math.sqrt(RADIUS * b)
                * ((2 / k - k) * LegendreEllipticIntegral.bigK(m) - 2 / k * LegendreEllipticIntegral.bigE(m));
        // Stokes: flux through the circle of radius b = 2πb·A_φ(b).
        double flux = 2 * Math.PI * b * CircularFilament.aPhi(RADIUS, h, CURRENT, b);
        // The reference's (2/k − k)K − (2/k)E cancels terms of size ~π/k to a result ~πk³/16, so
        // its own rounding is ~16ε/m²; the tolerance allows three times that.
        double tolerance = Math.max(1e-13, 1e-14 / (m * m));
        assertEquals(mutual * CURRENT, flux, Math.abs(mutual * CURRENT) * tolerance,
                "seed " + seed + " m " + m);
    }

    @Test
    void seriesAndEllipticFormsAgreeAtTheSwitch() {
        double m = CircularFilament.SERIES_BELOW_M;
        double kc = Math.sqrt(1 - m);
        // Both sides are checked against numerical integrals above; here the seam itself.
        assertEquals(EllipticIntegrals.cel(kc, 1, -1, 1), CircularFilament.smallParameterSeries(m),
                ULP_LEVEL * CircularFilament.smallParameterSeries(m) * 10);
    }
}
