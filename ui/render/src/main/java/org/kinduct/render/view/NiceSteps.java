package org.kinduct.render.view;

/** Round step sizes (1, 2 or 5 times a power of ten) for grids, scale bars and contour levels. */
public final class NiceSteps {

    private NiceSteps() {
    }

    /** The smallest 1·10ⁿ, 2·10ⁿ or 5·10ⁿ that is at least {@code min} (which must be positive). */
    public static double atLeast(double min) {
        if (!(min > 0) || !Double.isFinite(min)) {
            throw new IllegalArgumentException("step must be positive and finite, got " + min);
        }
        double decade = Math.pow(10, Math.floor(Math.log10(min)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * decade >= min * (1 - 1e-12)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    /** The largest 1·10ⁿ, 2·10ⁿ or 5·10ⁿ that is at most {@code max}. */
    public static double atMost(double max) {
        double up = atLeast(max);
        if (up <= max * (1 + 1e-12)) {
            return up;
        }
        double decade = Math.pow(10, Math.floor(Math.log10(max)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * decade <= max * (1 + 1e-12)) {
                return m * decade;
            }
        }
        return decade;
    }
}
