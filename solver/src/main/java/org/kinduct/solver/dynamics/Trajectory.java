package org.kinduct.solver.dynamics;

import java.util.List;

/**
 * A simulated run: samples at the requested times, the energy audit over the whole run, and the
 * circuit model it used (INDUCTIVE or QUASI_STATIC, never AUTO).
 */
public record Trajectory(List<Sample> samples, EnergyAudit audit, CircuitModel circuitModel) {

    public Trajectory {
        samples = List.copyOf(samples);
        if (circuitModel == CircuitModel.AUTO) {
            throw new IllegalArgumentException("a run uses a resolved circuit model, not AUTO");
        }
    }
}
