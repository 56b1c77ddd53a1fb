package org.kinduct.report.metrics;

import java.util.List;
import org.kinduct.scene.Pose;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.Snapshot;

/**
 * A free body's speed |v| (of its pivot) over a window, and the rules that read a terminal speed
 * and a settling time from it.
 */
final class BodySpeeds {

    /** Fraction of the final speed within which the speed counts as settled (the 2 % criterion). */
    static final double SETTLED_BAND = 0.02;
    /** The terminal-speed rule reads the speed this fraction of the window apart. */
    static final double TERMINAL_SPACING = 0.1;

    private final double[] times;
    private final double[] speeds;

    BodySpeeds(List<Snapshot> window, String bodyId) {
        times = new double[window.size()];
        speeds = new double[window.size()];
        for (int i = 0; i < speeds.length; i++) {
            Pose p = window.get(i).freeBody(bodyId);
            times[i] = window.get(i).tS();
            speeds[i] = p.velocity().length();
        }
    }

    double last() {
        return speeds[speeds.length - 1];
    }

    /**
     * The speed approached at the end: Aitken's Δ² extrapolation v∞ = v₃ − (v₃ − v₂)²/((v₃ − v₂) − (v₂ − v₁))
     * of the speeds v₁, v₂, v₃ at the samples a tenth of the window apart that end at its last
     * sample. It is exact for an exponential approach v∞ + A·e^{−t/τ} (Aitken 1926; any numerical
     * analysis text). The last speed when the speed no longer changes (both changes within
     * {@link Units#NOISE_FRACTION} of it, rounding noise); NaN (not reached) when the three speeds
     * do not approach a limit (the changes differ in sign or do not shrink), or the window has
     * fewer than three samples; 0 when the extrapolation passes zero (the body comes to rest).
     */
    double terminal() {
        int n = speeds.length;
        int step = (int) Math.max(1, Math.round((n - 1) * TERMINAL_SPACING));
        if (n - 1 - 2 * step < 0) {
            return Double.NaN;
        }
        double v1 = speeds[n - 1 - 2 * step];
        double v2 = speeds[n - 1 - step];
        double v3 = speeds[n - 1];
        double d1 = v2 - v1;
        double d2 = v3 - v2;
        double noise = Units.NOISE_FRACTION * Math.abs(v3);
        if (Math.abs(d1) <= noise && Math.abs(d2) <= noise) {
            return v3;
        }
        if (Math.signum(d1) != Math.signum(d2) || Math.abs(d2) >= Math.abs(d1)) {
            return Double.NaN;
        }
        // A speed has no value below zero: an extrapolation past zero is a body coming to rest.
        return Math.max(0, v3 - d2 * d2 / (d2 - d1));
    }

    /**
     * Time from {@code startS} to the first sample after which the speed stays within
     * {@value #SETTLED_BAND} of the final speed (of the largest speed when the final speed is 0):
     * the 2 % settling criterion of control engineering (common practice).
     */
    double settlingTime(double startS) {
        double fin = last();
        double reference = fin;
        if (fin == 0) {
            reference = ConductorSeries.largestMagnitude(speeds);
        }
        double band = SETTLED_BAND * reference;
        int settled = speeds.length - 1;
        while (settled > 0 && Math.abs(speeds[settled - 1] - fin) <= band) {
            settled--;
        }
        return times[settled] - startS;
    }
}
