package org.kinduct.solver.field;

/**
 * Field evaluations made on each thread so far — the integrand evaluations of edge integrals, the
 * source samples of plate and channel cells, and the iterations of their linear solves converted
 * at the cells that cost one evaluation: the cost of a run in units that do not depend on the
 * machine, so that a bound on work stops the same runs everywhere. Almost all of a run's time is
 * spent in this work (closed-form kernels of a few hundred nanoseconds each), and how much each
 * instant needs varies by orders of magnitude between scenes with the same number of integrator
 * steps.
 */
public final class WorkTally {

    private static final ThreadLocal<long[]> EVALUATIONS = ThreadLocal.withInitial(() -> new long[1]);

    private WorkTally() {
    }

    /** Counts {@code evaluations} made on the calling thread (edge integrals count their own; plates' and channels' cells and solves call this). */
    public static void add(int evaluations) {
        EVALUATIONS.get()[0] += evaluations;
    }

    /** Evaluations made on the calling thread since it started. */
    public static long onThisThread() {
        return EVALUATIONS.get()[0];
    }
}
