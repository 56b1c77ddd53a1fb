package org.kinduct.solver.dynamics;

import java.util.List;

/** A simulated run: samples at the requested times and the energy audit over the whole run. */
public record Trajectory(List<Sample> samples, EnergyAudit audit) {

    public Trajectory {
        samples = List.copyOf(samples);
    }
}
