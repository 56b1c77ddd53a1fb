package org.kinduct.report.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The whole cycles at a window's end, and the steady mean over them, on sampled sines. */
class SteadyCyclesTest {

    private static final double F = 50;
    private static final double PHASE = 0.3;
    private static final double DT = 1e-4;

    private static double[] times(double t1) {
        double[] t = new double[(int) Math.round(t1 / DT) + 1];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * DT;
        }
        return t;
    }

    /** sin(2πF·t + PHASE) at each of {@code t}. */
    private static double[] sine(double[] t) {
        double[] out = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            out[k] = Math.sin(2 * Math.PI * F * t[k] + PHASE);
        }
        return out;
    }

    @Test
    void theCyclesAreTheWholePeriodsBetweenUpwardCrossingsInTheLastQuarter() {
        double[] t = times(1);
        double[] i = sine(t);
        SteadyCycles c = SteadyCycles.of(t, i).orElseThrow();
        // Upward crossings at (n − PHASE/2π)/F; the first at or after 0.75 s is n = 38, the last before 1 s n = 50.
        double first = (38 - PHASE / (2 * Math.PI)) / F;
        assertEquals(first, c.startS(), 1e-6, c.toString());
        assertEquals(first + 12 / F, c.endS(), 1e-6, c.toString());
        assertEquals(12, c.count());
        // ⟨sin²⟩ over whole periods is 1/2 (common practice); the linear interpolant between samples
        // departs from sin² by at most (ωΔt)²/8 = 1.2e-4 of the peak, and only in the part intervals
        // at the window's two ends (a whole-period trapezoid sum of sin² is exact), so far less on the mean.
        double[] p = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            p[k] = i[k] * i[k];
        }
        assertEquals(0.5, c.mean(t, p), 1e-5);
        assertEquals(0, c.changePerCycle(t, p), 1e-5, "a steady sine does not change from cycle to cycle");
    }

    @Test
    void aBuildUpLeftBeforeTheLastQuarterIsNotAveragedAndAGrowingOneIsSaidToGrow() {
        // Amplitude 1 − e^{−t/τ}: by 0.75 s with τ = 0.1 s the build-up is over to 5.5e-4.
        double[] t = times(1);
        double[] i = new double[t.length];
        double[] p = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            i[k] = (1 - Math.exp(-t[k] / 0.1)) * Math.sin(2 * Math.PI * F * t[k] + PHASE);
            p[k] = i[k] * i[k];
        }
        SteadyCycles c = SteadyCycles.of(t, i).orElseThrow();
        assertEquals(0.5, c.mean(t, p), 0.5 * 2 * Math.exp(-7.5), "steady within the build-up left");
        assertTrue(Window.timeAverage(t, p) < 0.5 * 0.9, "the whole window's mean holds the build-up");
        // The power grows as (1 − e^{−t/τ})²: from one cycle to the next by about 2·e^{−t/τ}·(1/F)/τ.
        double growth = c.changePerCycle(t, p);
        assertTrue(growth > 0 && growth < 2 * Math.exp(-7.5) / F / 0.1 * 1.01, "growth per cycle " + growth);
    }

    @Test
    void lessThanOneWholeCycleInTheLastQuarterGivesNone() {
        double[] t = times(0.05);
        assertTrue(SteadyCycles.of(t, sine(t)).isEmpty(), "2.5 cycles in all, 0.6 in the last quarter");
    }
}
