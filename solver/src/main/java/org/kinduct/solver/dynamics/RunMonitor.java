package org.kinduct.solver.dynamics;

/**
 * Watches a long {@link CoupledSimulation} run: it is told how far the run has got and may ask it
 * to stop. Both methods are called on the thread that runs the simulation.
 */
public interface RunMonitor {

    /** A monitor that ignores progress and never stops a run. */
    RunMonitor NONE = new RunMonitor() {
    };

    /**
     * Called after every accepted integrator step with the fraction of the time window integrated
     * and sampled so far: non-decreasing within a run, within [0, 1], and exactly 1 once a run is
     * complete.
     */
    default void progress(double fractionDone) {
    }

    /**
     * Polled before the run starts and before every evaluation of the equations' right-hand side
     * (about a dozen per integrator step); once it answers true the run throws
     * {@link SimulationCancelledException} at that poll.
     */
    default boolean cancelled() {
        return false;
    }
}
