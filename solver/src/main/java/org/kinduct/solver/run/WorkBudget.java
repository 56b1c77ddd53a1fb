package org.kinduct.solver.run;

import java.util.Locale;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.field.WorkTally;

/**
 * Bounds the work of a coupled run in integrator steps and in field evaluations
 * ({@link WorkTally}, counted on the run's thread). Once {@value #PROJECT_AFTER_STEPS} steps or
 * {@value #PROJECT_AFTER_EVALUATIONS} evaluations are done, the whole run's work is projected from
 * the fraction of the window covered; a run projected to need more steps or evaluations than its
 * samples allow is stopped at once instead of running for hours.
 *
 * <p>Steps: at most {@value #MAX_STEPS_PER_SAMPLE} per sample, but at least {@value #LEAST_STEPS}
 * (a short window of a fast circuit still runs), and at most {@link TimeSpan#MAX_STEPS}. A stiff
 * free body or circuit (a response much faster than the sampling step), or a prescribed motion far
 * faster than the samples can show, makes the integrator take tiny steps throughout, so the
 * projection is reliable early (well-sampled runs take a few steps per sample: the demos at most 8).
 *
 * <p>Evaluations: at most {@value #MAX_EVALUATIONS_PER_SAMPLE} per sample, but at least
 * {@value #LEAST_EVALUATIONS} (about half a minute at a few hundred nanoseconds each), and at most
 * {@value #MAX_EVALUATIONS}. The coupled demos need at most about 400 000 per sample (the spinning
 * disc, its plate's solves counted; the harvester 26 000); a huge loop sweeping
 * over a magnet at a small stand-off needed 100 000 per step and would have run for minutes within
 * its step budget. Passes progress and stop requests on to the caller's monitor.
 */
final class WorkBudget implements RunMonitor {

    /** Steps taken before the projection is trusted. */
    static final int PROJECT_AFTER_STEPS = 1000;
    /** Evaluations made before the projection is trusted, whatever the steps. */
    static final long PROJECT_AFTER_EVALUATIONS = 10_000_000L;
    /** Most integrator steps per sample. */
    static final int MAX_STEPS_PER_SAMPLE = 1000;
    /** Steps any run may take, however few its samples. */
    static final int LEAST_STEPS = 100_000;
    /** Most field evaluations per sample. */
    static final long MAX_EVALUATIONS_PER_SAMPLE = 10_000_000L;
    /** Field evaluations any run may make, however few its samples. */
    static final long LEAST_EVALUATIONS = 100_000_000L;
    /** Field evaluations no run may exceed: some hours. */
    static final long MAX_EVALUATIONS = 100_000_000_000L;

    private final RunMonitor caller;
    private final double maxSteps;
    private final double maxEvaluations;
    private final long firstEvaluation;
    private long steps;
    private double fraction;
    private volatile boolean exceeded;
    /** Whether the evaluations, not the steps, went over. */
    private boolean overEvaluations;

    /** @param samples the samples the run makes; call on the thread that runs the integrator */
    WorkBudget(RunMonitor caller, int samples) {
        this.caller = caller;
        this.maxSteps = Math.min(TimeSpan.MAX_STEPS, Math.max(LEAST_STEPS, (double) MAX_STEPS_PER_SAMPLE * samples));
        this.maxEvaluations = Math.min(MAX_EVALUATIONS,
                Math.max(LEAST_EVALUATIONS, (double) MAX_EVALUATIONS_PER_SAMPLE * samples));
        this.firstEvaluation = WorkTally.onThisThread();
    }

    @Override
    public void progress(double fractionDone) {
        steps++;
        fraction = fractionDone;
        long evaluations = WorkTally.onThisThread() - firstEvaluation;
        double projectedEvaluations = fraction > 0 ? evaluations / fraction : Double.POSITIVE_INFINITY;
        if (steps >= PROJECT_AFTER_STEPS || evaluations >= PROJECT_AFTER_EVALUATIONS) {
            overEvaluations = projectedEvaluations > maxEvaluations;
            exceeded = overEvaluations || projectedSteps() > maxSteps;
        }
        caller.progress(fractionDone);
    }

    /**
     * Also polled at every evaluation of the equations: a run whose first step alone spends its
     * whole allowance (a plate of millions of cells solved at each of a step's twelve evaluations)
     * stops then, before any progress gives a pace to project from.
     */
    @Override
    public boolean cancelled() {
        if (!exceeded && WorkTally.onThisThread() - firstEvaluation > maxEvaluations) {
            overEvaluations = true;
            exceeded = true;
        }
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

    /** Why the run was stopped, for a run of sampling step {@code dtS}. */
    String reason(double dtS) {
        if (!overEvaluations) {
            return String.format(Locale.ROOT, "the coupled run would take about %.3g integrator steps (at most %.0f"
                    + " are taken here: %d per sample, at least %d, at most %d): the scene changes far faster than the"
                    + " sampling step dt = %s s can follow (a stiff spring, strong damping or a light free body, a"
                    + " loop's L/R much shorter than dt with --circuit inductive, or a prescribed motion much faster"
                    + " than dt)", projectedSteps(), maxSteps, MAX_STEPS_PER_SAMPLE, LEAST_STEPS, TimeSpan.MAX_STEPS,
                    dtS);
        }
        return String.format(Locale.ROOT, "the coupled run would need more than the %.3g field evaluations allowed"
                + " here (%.0e per sample, at least %.0e, at most %.0e; %.3g per integrator step so far): the"
                + " conductors are very costly to solve at this geometry (a conductor far larger than the sources"
                + " passing close to them, sources touching the conductors' plane, or a plate or channel of very many"
                + " cells); shorten the window, or reshape the conductors or coarsen their cells", maxEvaluations,
                (double) MAX_EVALUATIONS_PER_SAMPLE, (double) LEAST_EVALUATIONS, (double) MAX_EVALUATIONS,
                (WorkTally.onThisThread() - firstEvaluation) / (double) Math.max(1, steps));
    }
}
