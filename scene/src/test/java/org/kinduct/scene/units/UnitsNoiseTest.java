package org.kinduct.scene.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.VELOCITY;
import static org.kinduct.scene.units.Dimension.VOLTAGE;

import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The rounding-noise rule: values that are zero in exact arithmetic but not in floating point read
 * as zero beside the magnitudes they came from, and small values are kept when nothing larger
 * stands beside them. The noise is produced here by arithmetic whose exact result is zero, and its
 * size is bounded by the floating-point error analysis in Higham, <i>Accuracy and Stability of
 * Numerical Algorithms</i>, 2nd ed., SIAM 2002 (unit roundoff u = 2⁻⁵³, §2.2; recursive summation
 * error at most γₙ₋₁·Σ|xᵢ|, γₙ = n·u/(1 − n·u), §4.2; from memory).
 */
class UnitsNoiseTest {

    private static final long MASTER_SEED = 44_017L;
    private static final int CASES = 300;
    /** Unit roundoff of IEEE 754 double precision, 2⁻⁵³ (Higham §2.2). */
    private static final double UNIT_ROUNDOFF = Math.ulp(1.0) / 2;

    static LongStream seeds() {
        return new SplittableRandom(MASTER_SEED).longs(CASES);
    }

    @Test
    void sidewaysComponentOfAVectorTurnedAQuarterTurnReadsAsZero() {
        // cos(π/2) in double precision is about 6.1e-17, not 0: π/2 is not representable.
        double speed = 0.299;
        double sideways = speed * Math.cos(Math.PI / 2);
        assertTrue(sideways != 0, "the arithmetic leaves noise to remove");

        assertEquals("0.00 m/s", Units.format(Units.withoutNoise(sideways, speed), VELOCITY));
        assertEquals("299 mm/s", Units.format(Units.withoutNoise(speed, speed), VELOCITY));
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void sumsThatCancelInExactArithmeticReadAsZeroBesideTheirTerms(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        int n = 2 + r.nextInt(2000);
        double scale = Math.pow(10, r.nextDouble(-20, 20));
        double[] terms = new double[n];
        double forward = 0;
        double magnitudes = 0;
        for (int i = 0; i < n; i++) {
            terms[i] = scale * r.nextDouble(-1, 1);
            forward += terms[i];
            magnitudes += Math.abs(terms[i]);
        }
        double backward = 0;
        for (int i = n - 1; i >= 0; i--) {
            backward += terms[i];
        }
        // Both orders err by at most γₙ₋₁·Σ|xᵢ| (Higham §4.2), so their difference by twice that.
        double difference = forward - backward;
        double bound = 2 * (n - 1) * UNIT_ROUNDOFF / (1 - (n - 1) * UNIT_ROUNDOFF) * magnitudes;
        assertTrue(Math.abs(difference) <= bound, "seed " + seed + ": the error analysis holds");

        assertEquals(0.0, Units.withoutNoise(difference, magnitudes), "seed " + seed + ": " + difference
                + " beside terms of total size " + magnitudes);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void theRuleHasNoFixedAmountOnlyARatio(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double reference = Math.pow(10, r.nextDouble(-6, 6));
        double ratio = Math.pow(10, r.nextDouble(-14, -4));
        // Powers of two rescale without rounding, so the comparison sees exactly the same ratio.
        double rescale = Math.scalb(1.0, r.nextInt(-80, 80));

        boolean noise = Units.withoutNoise(ratio * reference, reference) == 0;
        boolean rescaledNoise = Units.withoutNoise(ratio * reference * rescale, reference * rescale) == 0;

        assertEquals(noise, rescaledNoise, "seed " + seed + ": ratio " + ratio + ", rescaled by " + rescale);
        assertEquals(ratio < Units.NOISE_FRACTION, noise, "seed " + seed + ": ratio " + ratio);
    }

    @Test
    void aNanovoltEmfIsKeptWhenNothingLargeStandsBesideIt() {
        double emf = 1e-9;
        assertEquals("1.00 nV", Units.format(Units.withoutNoise(emf, emf), VOLTAGE), "alone");
        assertEquals("1.00 nV", Units.format(Units.withoutNoise(emf, 0.5), VOLTAGE), "beside half a volt");
        assertEquals("−1.00 nV", Units.format(Units.withoutNoise(-emf, 0.5), VOLTAGE), "sign kept");
        assertEquals("0.00 V", Units.format(Units.withoutNoise(emf, 1e5), VOLTAGE), "beside 100 kV it is noise");
    }

    @Test
    void negativeNoiseReadsAsPlainZeroAndNanStays() {
        assertEquals("0.00 m", Units.format(Units.withoutNoise(-3e-18, 0.04), LENGTH));
        assertTrue(Double.isNaN(Units.withoutNoise(Double.NaN, 1)), "a value that does not apply stays NaN");
        assertEquals(3e-18, Units.withoutNoise(3e-18, Double.NaN), "a NaN reference hides nothing");
        assertEquals(3e-18, Units.withoutNoise(3e-18, 0), "nothing beside it");
    }
}
