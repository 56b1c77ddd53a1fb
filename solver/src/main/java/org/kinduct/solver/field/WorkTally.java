package org.kinduct.solver.field;

/**
 * Integrand evaluations of edge integrals made on each thread so far: the cost of a run in units
 * that do not depend on the machine, so that a bound on work stops the same runs everywhere.
 * Almost all of a run's time is spent in these evaluations (closed-form kernels of a few hundred
 * nanoseconds each), and how many each instant needs varies by orders of magnitude between scenes
 * with the same number of integrator steps.
 */
public final class WorkTally {

    private static final ThreadLocal<long[]> EVALUATIONS = ThreadLocal.withInitial(() -> new long[1]);

    private WorkTally() {
    }

    static void add(int evaluations) {
        EVALUATIONS.get()[0] += evaluations;
    }

    /** Evaluations made on the calling thread since it started. */
    public static long onThisThread() {
        return EVALUATIONS.get()[0];
    }
}
