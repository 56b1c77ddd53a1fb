package org.kinduct.solver.dynamics;

/**
 * Thrown by a {@link CoupledSimulation} run whose {@link RunMonitor} asked it to stop: a stopped
 * run has no result, never a shortened trajectory.
 */
public final class SimulationCancelledException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    SimulationCancelledException(double tS, double t0S, double t1S) {
        super("simulation cancelled at t = " + tS + " s of [" + t0S + ", " + t1S + "] s");
    }
}
