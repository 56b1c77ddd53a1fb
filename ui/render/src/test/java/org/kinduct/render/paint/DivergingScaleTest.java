package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DivergingScaleTest {

    private static final int CHANNEL_TOL = 1;
    private static final double LIGHTNESS_TOL = 1e-9;

    private static int r(int argb) {
        return (argb >> 16) & 0xFF;
    }

    private static int g(int argb) {
        return (argb >> 8) & 0xFF;
    }

    private static int b(int argb) {
        return argb & 0xFF;
    }

    @Test
    void labConversionMatchesPublishedSrgbPrimaries() {
        // CIELAB (D65) of sRGB white and red: L*=100 for white; red = (53.24, 80.09, 67.20)
        // (B. Lindbloom's colour calculator, brucelindbloom.com; from memory).
        int white = DivergingScale.labToArgb(new double[] {100, 0, 0});
        assertEquals(255, r(white), CHANNEL_TOL);
        assertEquals(255, g(white), CHANNEL_TOL);
        assertEquals(255, b(white), CHANNEL_TOL);
        int red = DivergingScale.labToArgb(new double[] {53.24, 80.09, 67.20});
        assertEquals(255, r(red), CHANNEL_TOL);
        assertEquals(0, g(red), CHANNEL_TOL);
        assertEquals(0, b(red), CHANNEL_TOL);
    }

    @Test
    void lightnessFallsMonotonicallyAndEquallyOnBothSides() {
        for (int i = 1; i <= 100; i++) {
            double f = i / 100.0;
            double prev = (i - 1) / 100.0;
            assertTrue(DivergingScale.lightnessAt(f) < DivergingScale.lightnessAt(prev), "positive side at " + f);
            assertTrue(DivergingScale.lightnessAt(-f) < DivergingScale.lightnessAt(-prev), "negative side at " + f);
        }
        // Equal lightness drop per unit of |B| on both sides keeps the two halves reading as equal steps.
        double dropPos = DivergingScale.lightnessAt(0) - DivergingScale.lightnessAt(0.5);
        double dropNeg = DivergingScale.lightnessAt(0) - DivergingScale.lightnessAt(-0.5);
        assertEquals(dropPos / (DivergingScale.lightnessAt(0) - DivergingScale.lightnessAt(1)),
                dropNeg / (DivergingScale.lightnessAt(0) - DivergingScale.lightnessAt(-1)), LIGHTNESS_TOL);
    }

    @Test
    void positiveFieldIsWarmNegativeIsCoolZeroIsNearWhite() {
        int out = DivergingScale.argb(0.8, 1);
        int in = DivergingScale.argb(-0.8, 1);
        int zero = DivergingScale.argb(0, 1);
        assertTrue(r(out) > b(out) + 40, "out of the screen reads amber");
        assertTrue(b(in) > r(in) + 40, "into the screen reads blue");
        assertTrue(Math.min(r(zero), Math.min(g(zero), b(zero))) > 235, "zero is near white");
    }

    @Test
    void valuesBeyondTheLimitTakeTheEndColour() {
        assertEquals(DivergingScale.argb(1, 1), DivergingScale.argb(7, 1));
        assertEquals(DivergingScale.argb(-1, 1), DivergingScale.argb(-7, 1));
    }
}
