package org.kinduct.solver.run;

import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * Bounds the work of a coupled run: once {@value #PROJECT_AFTER_STEPS} integrator steps are done,
 * the steps still to come are projected from the fraction of the window covered; a run projected
 * to need more than {@link TimeSpan#MAX_STEPS} steps (as many as a window may have samples) is
 * stopped at once instead of running for hours. A stiff free body or circuit (a response much
 * faster than the sampling step) makes the explicit integrator take tiny steps throughout, so the
 * projection is reliable early. Passes progress and stop requests on to the caller's monitor.
 */
final class StepBudget implements RunMonitor {

    /** Steps taken before the projection is trusted. */
    static final int PROJECT_AFTER_STEPS = 10_000;

    private final RunMonitor caller;
    private final long maxSteps;
    private long steps;
    private double fraction;
    private volatile boolean exceeded;

    StepBudget(RunMonitor caller) {
        this(caller, TimeSpan.MAX_STEPS);
    }

    StepBudget(RunMonitor caller, long maxSteps) {
        this.caller = caller;
        this.maxSteps = maxSteps;
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

    long steps() {
        return steps;
    }

    /** The steps the whole run would take at the pace so far. */
    double projectedSteps() {
        return fraction > 0 ? steps / fraction : Double.POSITIVE_INFINITY;
    }
}
