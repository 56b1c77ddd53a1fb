package org.kinduct.solver.run;

import java.util.List;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.CircuitModel;

/**
 * What a run covers: the window sampled at t0 + k·dt, the circuit model asked for (AUTO lets
 * {@link RunPlan} choose), and further instants to sample exactly (within the window).
 */
public record RunRequest(TimeSpan window, CircuitModel circuit, List<Double> extraInstantsS) {

    public RunRequest {
        Checks.nonNull(window, "window");
        Checks.nonNull(circuit, "circuit model");
        extraInstantsS = List.copyOf(extraInstantsS);
        for (double t : extraInstantsS) {
            if (!(t >= window.t0S() && t <= window.t1S())) {
                throw new IllegalArgumentException("instant " + t + " s lies outside the window [" + window.t0S()
                        + " s, " + window.t1S() + " s]");
            }
        }
    }

    /** The scene's own window, the circuit model chosen automatically, no further instants. */
    public static RunRequest of(Scene scene) {
        return new RunRequest(scene.time(), CircuitModel.AUTO, List.of());
    }

    /**
     * This request with {@code tS} sampled too; the window grows to reach it (it must not lie
     * before the window's start, where a run has no state).
     */
    public RunRequest alsoAt(double tS) {
        Checks.finite(tS, "time");
        if (tS < window.t0S()) {
            throw new IllegalArgumentException("t = " + tS + " s lies before the run's start, t0 = " + window.t0S()
                    + " s");
        }
        TimeSpan reach = tS > window.t1S() ? new TimeSpan(window.t0S(), tS, window.dtS()) : window;
        List<Double> extra = new java.util.ArrayList<>(extraInstantsS);
        extra.add(tS);
        return new RunRequest(reach, circuit, extra);
    }
}
