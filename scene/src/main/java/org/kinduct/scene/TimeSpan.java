package org.kinduct.scene;

/**
 * Default time window and sampling step of a scene, seconds. The window is sampled on the grid
 * t0 + k·dt, k = 0 … {@link #steps()}.
 */
public record TimeSpan(double t0S, double t1S, double dtS) {

    /** Most steps a window may have. */
    public static final int MAX_STEPS = 10_000_000;
    /**
     * The window's times must be resolved to this fraction of dt: a double near t holds t only to
     * ulp(t) (2 s at t = 1e16 s), and grid instants closer than that are not distinct.
     */
    public static final double STEP_RESOLUTION = 1e-6;

    public TimeSpan {
        Checks.finite(t0S, "t0");
        Checks.finite(t1S, "t1");
        Checks.positive(dtS, "dt");
        if (!(t1S > t0S)) {
            throw new IllegalArgumentException("t1 must be after t0, got t0 = " + t0S + " s, t1 = " + t1S + " s");
        }
        if ((t1S - t0S) / dtS > MAX_STEPS) {
            throw new IllegalArgumentException("more than 10 million time steps: (t1 − t0)/dt = " + (t1S - t0S) / dtS);
        }
        double resolution = STEP_RESOLUTION * dtS;
        double farthest = Math.max(Math.abs(t0S), Math.abs(t1S));
        if (Math.ulp(farthest) > resolution) {
            throw new IllegalArgumentException("times as large as " + farthest + " s are resolved only to "
                    + Math.ulp(farthest) + " s, too coarse for dt = " + dtS + " s: keep t0 and t1 below "
                    + Math.scalb(1.0, Math.getExponent(resolution) + 53) + " s in size, or take a longer dt");
        }
    }

    /** The number of whole steps in the window, {@link #stepsBetween}. */
    public int steps() {
        return stepsBetween(t0S, t1S, dtS);
    }

    /** The k-th grid instant, t0 + k·dt, computed from k (adding dt up would drift off the grid). */
    public double at(int k) {
        return t0S + k * dtS;
    }

    /**
     * The largest n with t0 + n·dt ≤ t1, where ≤ allows for the rounding of t0, t1 and dt and of
     * the quotient (t1 − t0)/dt: a window written in decimal as t0 + n·dt counts n steps however its
     * numbers round. A fixed slack in the quotient would not do: at ten million steps its rounding
     * alone is a few 1e-9, and more where t0 is large beside the window.
     *
     * @throws IllegalArgumentException unless t0 and t1 are finite, t1 ≥ t0 and dt &gt; 0
     */
    public static int stepsBetween(double t0S, double t1S, double dtS) {
        Checks.finite(t0S, "t0");
        Checks.finite(t1S, "t1");
        Checks.positive(dtS, "dt");
        if (t1S < t0S) {
            throw new IllegalArgumentException("t1 must not be before t0, got t0 = " + t0S + " s, t1 = " + t1S + " s");
        }
        double quotient = (t1S - t0S) / dtS;
        // Each input is within half an ulp of what was meant, each operation adds half an ulp of
        // its result; twice that bound is the slack.
        double slack = (Math.ulp(t0S) + Math.ulp(t1S)) / dtS + 4 * Math.ulp(quotient);
        double steps = Math.floor(quotient + slack);
        if (steps > MAX_STEPS) {
            throw new IllegalArgumentException("more than 10 million time steps: (t1 − t0)/dt = " + quotient);
        }
        return (int) steps;
    }
}
