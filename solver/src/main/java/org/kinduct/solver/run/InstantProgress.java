package org.kinduct.solver.run;

import java.util.concurrent.CancellationException;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * A monitor's view of quasi-static instants solved on several threads: each finished instant
 * reports the fraction done, never two reports at once and never a smaller fraction after a
 * larger one; a stop request is honoured before the next instant is begun.
 */
final class InstantProgress {

    private final RunMonitor monitor;
    private final int count;
    private int done;

    InstantProgress(RunMonitor monitor, int count) {
        this.monitor = monitor;
        this.count = count;
    }

    /**
     * @throws CancellationException when the monitor asks the run to stop (the coupled run's own
     *         {@link org.kinduct.solver.dynamics.SimulationCancelledException} cannot be made here)
     */
    void checkCancelled() {
        if (monitor.cancelled()) {
            throw new CancellationException("stopped after " + doneSoFar() + " of " + count + " instants");
        }
    }

    synchronized void done() {
        done++;
        monitor.progress((double) done / count);
    }

    private synchronized int doneSoFar() {
        return done;
    }
}
