package org.kinduct.solver.dynamics;

import java.util.List;
import org.kinduct.solver.Snapshot;

/**
 * A simulated run: samples on the grid t0 + k·dt, samples at the further instants asked for (in
 * time order), the energy audit over the whole run, and the circuit model it used (INDUCTIVE or
 * QUASI_STATIC, never AUTO).
 */
public record CoupledRun(List<Snapshot> samples, List<Snapshot> extras, EnergyAudit audit, CircuitModel circuitModel) {

    public CoupledRun {
        samples = List.copyOf(samples);
        extras = List.copyOf(extras);
        if (circuitModel == CircuitModel.AUTO) {
            throw new IllegalArgumentException("a run uses a resolved circuit model, not AUTO");
        }
    }
}
