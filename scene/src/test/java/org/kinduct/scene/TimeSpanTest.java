package org.kinduct.scene;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A window written in decimal as t0 + n·dt (plus part of a step) has n steps, however its three
 * numbers round to doubles, up to the 10-million-step limit; its grid instants are distinct and
 * rising. Exact decimal arithmetic (BigDecimal) decides what the user wrote.
 */
class TimeSpanTest {

    private static final int WINDOWS_PER_CASE = 20_000;

    static LongStream seeds() {
        SplittableRandom r = new SplittableRandom(0x7135_0001L);
        return LongStream.range(0, 10).map(i -> r.nextLong());
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void decimalWindowsCountTheirStepsUpToTheLimit(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int i = 0; i < WINDOWS_PER_CASE; i++) {
            BigDecimal dt = BigDecimal.valueOf(1 + r.nextInt(999)).scaleByPowerOfTen(-1 - r.nextInt(8));
            int n = r.nextBoolean() ? 1 + r.nextInt(TimeSpan.MAX_STEPS) : TimeSpan.MAX_STEPS - r.nextInt(1000);
            BigDecimal t0 = r.nextBoolean() ? BigDecimal.ZERO
                    : BigDecimal.valueOf(r.nextInt(10_000)).scaleByPowerOfTen(-r.nextInt(4));
            // Half of the windows end on the grid, the others part of a step after it.
            BigDecimal part = r.nextBoolean() ? BigDecimal.ZERO : BigDecimal.valueOf(1 + r.nextInt(98), 2);
            BigDecimal t1 = t0.add(dt.multiply(BigDecimal.valueOf(n).add(part)));
            TimeSpan w;
            try {
                w = new TimeSpan(t0.doubleValue(), t1.doubleValue(), dt.doubleValue());
            } catch (IllegalArgumentException refused) {
                continue; // more than 10 million steps after rounding, or times too coarse for dt
            }
            assertEquals(n, w.steps(), () -> "seed " + seed + ": t0 = " + t0 + ", t1 = " + t1 + ", dt = " + dt);
        }
    }

    @Test
    void aTenMillionStepGridRisesStepByStepToItsEnd() {
        // 10 s to 40 s in 3 µs: 10^7 steps.
        TimeSpan w = new TimeSpan(10, 40, 3e-6);
        assertEquals(TimeSpan.MAX_STEPS, w.steps());
        double before = Double.NEGATIVE_INFINITY;
        for (int k = 0; k <= w.steps(); k++) {
            double t = w.at(k);
            assertTrue(t > before, "instant " + k + " does not rise");
            before = t;
        }
        assertEquals(40, w.at(w.steps()), Math.ulp(40.0) * 4);
    }

    @Test
    void timesTooCoarseForTheStepAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new TimeSpan(1e16, 1e16 + 4, 1e-3));
        assertEquals("times as large as 1.0000000000000004E16 s are resolved only to 2.0 s, too coarse for"
                + " dt = 0.001 s: keep t0 and t1 below 8388608.0 s in size, or take a longer dt", e.getMessage());
    }
}
