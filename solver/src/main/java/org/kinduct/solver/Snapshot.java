package org.kinduct.solver;

import java.util.List;
import java.util.Optional;

/** The solved state of a scene at time {@code tS}, seconds. */
public record Snapshot(double tS, List<ConductorState> conductors) {

    public Snapshot {
        conductors = List.copyOf(conductors);
    }

    public Optional<ConductorState> conductor(String id) {
        return conductors.stream().filter(c -> c.id().equals(id)).findFirst();
    }
}
