package org.kinduct.render.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;

class NiceStepsTest {

    private static final double REL_TOL = 1e-12;
    private static final SplittableRandom SEEDS = new SplittableRandom(20261202L);

    @Test
    void roundsUpToOneTwoOrFiveTimesAPowerOfTen() {
        assertEquals(0.002, NiceSteps.atLeast(0.0013), 0.002 * REL_TOL);
        assertEquals(5, NiceSteps.atLeast(2.01), 5 * REL_TOL);
        assertEquals(10, NiceSteps.atLeast(7), 10 * REL_TOL);
        assertEquals(0.05, NiceSteps.atMost(0.099), 0.05 * REL_TOL);
        assertEquals(1, NiceSteps.atMost(1), REL_TOL);
    }

    @RepeatedTest(40)
    void resultBracketsTheRequestWithinAFactorOfTwoAndAHalf() {
        long seed = SEEDS.nextLong();
        double x = Math.pow(10, new SplittableRandom(seed).nextDouble(-9, 9));
        double up = NiceSteps.atLeast(x);
        double down = NiceSteps.atMost(x);
        assertTrue(up >= x * (1 - REL_TOL) && up <= 2.5 * x, "seed " + seed);
        assertTrue(down <= x * (1 + REL_TOL) && down >= x / 2.5, "seed " + seed);
    }

    @Test
    void rejectsNonPositiveSteps() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NiceSteps.atLeast(0));
        assertTrue(e.getMessage().contains("positive"));
    }
}
