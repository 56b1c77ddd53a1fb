package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class EllipticIntegralsTest {

    private static final long SEED = 0x5EED_0001L;
    private static final double ULP_LEVEL = 1e-14;
    private static final double QUADRATURE_LEVEL = 1e-12;

    /** m in (0, 1), half the draws piled up towards 1 where K diverges. */
    private static double drawParameter(SplittableRandom random) {
        return random.nextBoolean() ? random.nextDouble(0, 1) : 1 - Math.pow(10, -random.nextDouble(1, 12));
    }

    @RepeatedTest(200)
    void celOfUnitArgumentsIsCompleteIntegralOfFirstKind(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        double m = drawParameter(new SplittableRandom(seed));
        double kc = Math.sqrt(1 - m);
        // Reference: Hipparchus' K(m), parameter convention (K(1/2) = 1.8540746773, A&S Table 17.1).
        double expected = LegendreEllipticIntegral.bigK(m);
        assertEquals(expected, EllipticIntegrals.cel(kc, 1, 1, 1), ULP_LEVEL * expected, "seed " + seed + ", m " + m);
    }

    @RepeatedTest(200)
    void celWithKcSquaredIsCompleteIntegralOfSecondKind(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        double m = drawParameter(new SplittableRandom(seed));
        double kc = Math.sqrt(1 - m);
        double expected = LegendreEllipticIntegral.bigE(m);
        assertEquals(expected, EllipticIntegrals.cel(kc, 1, 1, kc * kc), ULP_LEVEL * expected,
                "seed " + seed + ", m " + m);
    }

    @RepeatedTest(100)
    void celMatchesNumericalQuadratureOfItsDefinition(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom random = new SplittableRandom(seed);
        double kc = random.nextDouble(0.05, 2);
        double p = Math.pow(10, random.nextDouble(-1.5, 1.5));
        double c = random.nextDouble(-2, 2);
        double s = random.nextDouble(-2, 2);
        // Definition: Bulirsch (1969); DLMF §19.2(iii).
        double expected = NumericalReference.integrate(phi -> {
            double cos2 = Math.cos(phi) * Math.cos(phi);
            double sin2 = 1 - cos2;
            return (c * cos2 + s * sin2) / ((cos2 + p * sin2) * Math.sqrt(cos2 + kc * kc * sin2));
        }, 0, Math.PI / 2, 64);
        double scale = Math.abs(c) + Math.abs(s);
        assertEquals(expected, EllipticIntegrals.cel(kc, p, c, s), QUADRATURE_LEVEL * scale,
                "seed " + seed + " kc " + kc + " p " + p + " c " + c + " s " + s);
    }

    @RepeatedTest(100)
    void celWithCharacteristicIsCompleteIntegralOfThirdKind(RepetitionInfo info) {
        long seed = SEED + 3000 + info.getCurrentRepetition();
        SplittableRandom random = new SplittableRandom(seed);
        double m = random.nextDouble(0, 0.999);
        double n = random.nextDouble(-3, 0.95);
        // Π(n|m) = cel(kc, 1 − n, 1, 1), DLMF 19.2.11 with 19.2(iii); Hipparchus takes (n, m).
        double expected = LegendreEllipticIntegral.bigPi(n, m);
        assertEquals(expected, EllipticIntegrals.cel(Math.sqrt(1 - m), 1 - n, 1, 1), ULP_LEVEL * 10 * expected,
                "seed " + seed + " n " + n + " m " + m);
    }

    @Test
    void zeroCharacteristicTakesTheTransformationBranchCorrectly() {
        // With p = 0 and s = 0 the integrand reduces to 1/√(cos² + kc² sin²): K(m) again.
        double m = 0.7;
        double expected = LegendreEllipticIntegral.bigK(m);
        assertEquals(expected, EllipticIntegrals.cel(Math.sqrt(1 - m), 0, 1, 0), ULP_LEVEL * expected);
    }

    @RepeatedTest(200)
    void celBasesGiveTheCompleteIntegralsOfAllThreeKinds(RepetitionInfo info) {
        long seed = SEED + 4000 + info.getCurrentRepetition();
        SplittableRandom random = new SplittableRandom(seed);
        double m = drawParameter(random);
        double kc = Math.sqrt(1 - m);
        double n = 1 - Math.pow(10, random.nextDouble(-2, 1));
        double[] bases = new double[4];
        EllipticIntegrals.celBases(kc, 1 - n, bases);
        // References: Hipparchus' K(m), E(m) and Π(n|m), parameter convention; cel(kc, 1, 1, 1) = K,
        // cel(kc, 1, 1, kc²) = E, cel(kc, 1 − n, 1, 1) = Π(n|m) (DLMF §19.2(iii)).
        String at = "seed " + seed + ", m " + m + ", n " + n;
        double bigK = LegendreEllipticIntegral.bigK(m);
        assertEquals(bigK, bases[2] + bases[3], ULP_LEVEL * bigK, at);
        double bigE = LegendreEllipticIntegral.bigE(m);
        assertEquals(bigE, bases[2] + kc * kc * bases[3], ULP_LEVEL * bigE, at);
        double bigPi = LegendreEllipticIntegral.bigPi(n, m);
        assertEquals(bigPi, bases[0] + bases[1], ULP_LEVEL * Math.abs(bigPi), at);
    }

    @RepeatedTest(50)
    void celBasesFollowBulirschsTransformationForNonPositiveP(RepetitionInfo info) {
        long seed = SEED + 5000 + info.getCurrentRepetition();
        SplittableRandom random = new SplittableRandom(seed);
        double kc = random.nextDouble(0.05, 2);
        // p = 0 is a cylinder magnet's rim (ρ = a); p < 0 the principal value.
        double p = info.getCurrentRepetition() == 1 ? 0 : -Math.pow(10, random.nextDouble(-2, 1));
        double c = random.nextDouble(-2, 2);
        double s = random.nextDouble(-2, 2);
        double[] bases = new double[4];
        EllipticIntegrals.celBases(kc, p, bases);
        double expected = EllipticIntegrals.cel(kc, p, c, s);
        assertEquals(expected, c * bases[0] + s * bases[1], ULP_LEVEL * (Math.abs(c) + Math.abs(s)) * 10,
                "seed " + seed + " kc " + kc + " p " + p);
    }

    @Test
    void divergentModulusGivesNaN() {
        assertTrue(Double.isNaN(EllipticIntegrals.cel(0, 1, 1, 1)));
    }
}
