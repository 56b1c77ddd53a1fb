package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link Arctangent} against the JDK's {@link StrictMath} (fdlibm, the reference it claims to
 * match): the same bits for seeded random arguments over most of the exponent range (the two of atan2
 * within 2^±70 of each other), near the
 * reduction's interval ends and the atan2 ratio cut-offs of 2^±60, and for every pair of special
 * values (signed zeros, infinities, NaN, the smallest and largest doubles).
 */
class ArctangentTest {

    private static final long SEED = 0x5A7A_2026L;
    private static final int CASES = 400_000;

    @Test
    void atanAndAtan2GiveStrictMathsBitsForRandomArguments() {
        SplittableRandom r = new SplittableRandom(SEED);
        for (int c = 0; c < CASES; c++) {
            int exponent = r.nextInt(-1000, 1000);
            double y = randomDouble(r, exponent);
            double x = randomDouble(r, exponent + r.nextInt(-70, 70));
            String where = "seed " + SEED + " case " + c + ": (" + y + ", " + x + ")";
            assertSameBits(StrictMath.atan2(y, x), Arctangent.atan2(y, x), where);
            assertSameBits(StrictMath.atan(y), Arctangent.atan(y), where);
        }
    }

    @Test
    void theReductionsIntervalEndsAndTheRatioCutOffsGiveStrictMathsBits() {
        double[] ends = {0x1p-27, 0.4375, 0.6875, 1.1875, 2.4375, 0x1p66};
        for (double end : ends) {
            for (double v = Math.nextDown(Math.nextDown(end)); v <= Math.nextUp(Math.nextUp(end)); v = Math.nextUp(v)) {
                assertSameBits(StrictMath.atan(v), Arctangent.atan(v), "atan " + v);
                assertSameBits(StrictMath.atan(-v), Arctangent.atan(-v), "atan " + -v);
            }
        }
        SplittableRandom r = new SplittableRandom(SEED);
        for (int c = 0; c < 10_000; c++) {
            double x = (r.nextBoolean() ? 1 : -1) * (1 + r.nextDouble());
            for (int e = 58; e <= 63; e++) {
                double y = (1 + r.nextDouble()) * Math.scalb(1.0, e);
                assertSameBits(StrictMath.atan2(y, x), Arctangent.atan2(y, x), "atan2(" + y + ", " + x + ")");
                assertSameBits(StrictMath.atan2(x, y * -1), Arctangent.atan2(x, y * -1), "atan2(" + x + ", " + -y + ")");
                double small = Math.scalb(1 + r.nextDouble(), -e);
                assertSameBits(StrictMath.atan2(small, x), Arctangent.atan2(small, x), "atan2(" + small + ", " + x + ")");
            }
        }
    }

    @Test
    void specialValuesGiveStrictMathsBits() {
        double[] special = {0.0, -0.0, 1.0, -1.0, 0.5, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NaN,
            Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE, 1e-300, -1e300};
        for (double y : special) {
            assertSameBits(StrictMath.atan(y), Arctangent.atan(y), "atan " + y);
            for (double x : special) {
                assertSameBits(StrictMath.atan2(y, x), Arctangent.atan2(y, x), "atan2(" + y + ", " + x + ")");
            }
        }
    }

    /** A random sign and mantissa with the given binary exponent. */
    private static double randomDouble(SplittableRandom r, int exponent) {
        double magnitude = Math.scalb(1 + r.nextDouble(), exponent);
        return r.nextBoolean() ? magnitude : -magnitude;
    }

    private static void assertSameBits(double expected, double actual, String where) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                where + ": expected " + expected + ", got " + actual);
    }
}
