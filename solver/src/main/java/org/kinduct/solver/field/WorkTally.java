package org.kinduct.solver.field;

import java.util.function.Supplier;

/**
 * Field evaluations made on each thread so far — the integrand evaluations of edge integrals, the
 * source samples of plate and channel cells, and the iterations of their linear solves converted
 * at the cells that cost one evaluation: the cost of a run in units that do not depend on the
 * machine, so that a bound on work stops the same runs everywhere. Almost all of a run's time is
 * spent in this work (closed-form kernels of a few hundred nanoseconds each), and how much each
 * instant needs varies by orders of magnitude between scenes with the same number of integrator
 * steps.
 *
 * <p>A piece of work can be given an allowance ({@link #within}): the count is checked at every
 * addition (an edge integral's end, a plate's cell sample or solve iteration), so work that would
 * go on for hours stops within one integral of passing it.
 */
public final class WorkTally {

    /** Per thread: evaluations so far, and the count at which the current allowance runs out. */
    private static final ThreadLocal<long[]> EVALUATIONS = ThreadLocal.withInitial(() -> new long[] {0, Long.MAX_VALUE});

    private WorkTally() {
    }

    /** Counts {@code evaluations} made on the calling thread (edge integrals count their own; plates' and channels' cells and solves call this). */
    public static void add(int evaluations) {
        long[] tally = EVALUATIONS.get();
        tally[0] += evaluations;
        if (tally[0] > tally[1]) {
            tally[1] = Long.MAX_VALUE;
            throw new AllowanceExceededException();
        }
    }

    /** Evaluations made on the calling thread since it started. */
    public static long onThisThread() {
        return EVALUATIONS.get()[0];
    }

    /**
     * Does {@code work} on the calling thread, stopping it with {@link AllowanceExceededException}
     * once it has made more than {@code evaluations} (an allowance already running, of enclosing
     * work, still applies).
     */
    public static <T> T within(long evaluations, Supplier<T> work) {
        long[] tally = EVALUATIONS.get();
        long enclosing = tally[1];
        tally[1] = Math.min(enclosing, tally[0] + evaluations);
        try {
            return work.get();
        } finally {
            tally[1] = enclosing;
        }
    }

    /** Work given an allowance by {@link #within} went over it. */
    public static final class AllowanceExceededException extends RuntimeException {

        private static final long serialVersionUID = 1L;

        AllowanceExceededException() {
            super("the work went over its allowance of field evaluations");
        }
    }
}
