package org.kinduct.solver.run;

import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * Bounds the work of a coupled run: once {@value #PROJECT_AFTER_STEPS} integrator steps are done,
 * the steps still to come are projected from the fraction of the window covered; a run projected
 * to need more than {@link TimeSpan#MAX_STEPS} steps (as many as a window may have samples), or
 * more than {@value #MAX_STEPS_PER_SAMPLE} per sample but at least {@value #LEAST_STEPS} (a short
 * window of a fast circuit still runs), is stopped at once instead of running for
 * hours. A stiff free body or circuit (a response much faster than the sampling step), or a
 * prescribed motion far faster than the samples can show, makes the integrator take tiny steps
 * throughout, so the projection is reliable early (well-sampled runs take a few steps per
 * sample: the demos at most 8). Passes progress and stop requests on to the caller's monitor.
 */
final class StepBudget implements RunMonitor {

    /** Steps taken before the projection is trusted. */
    static final int PROJECT_AFTER_STEPS = 1000;
    /** Most integrator steps per sample. */
    static final int MAX_STEPS_PER_SAMPLE = 1000;
    /** Steps any run may take, however few its samples. */
    static final int LEAST_STEPS = 100_000;

    private final RunMonitor caller;
    private final double maxSteps;
    private long steps;
    private double fraction;
    private volatile boolean exceeded;

    /** @param samples the samples the run makes */
    StepBudget(RunMonitor caller, int samples) {
        this.caller = caller;
        this.maxSteps = Math.min(TimeSpan.MAX_STEPS, Math.max(LEAST_STEPS, (double) MAX_STEPS_PER_SAMPLE * samples));
    }

    @Override
    public void progress(double fractionDone) {
        steps++;
        fraction = fractionDone;
        if (steps >= PROJECT_AFTER_STEPS && projectedSteps() > maxSteps) {
            exceeded = true;
        }
        caller.progress(fractionDone);
    }

    @Override
    public boolean cancelled() {
        return exceeded || caller.cancelled();
    }

    /** True when this budget, not the caller, stopped the run. */
    boolean exceeded() {
        return exceeded;
    }

    /** The steps the whole run would take at the pace so far. */
    double projectedSteps() {
        return fraction > 0 ? steps / fraction : Double.POSITIVE_INFINITY;
    }

    /** The most steps the run may take. */
    double maxSteps() {
        return maxSteps;
    }
}
