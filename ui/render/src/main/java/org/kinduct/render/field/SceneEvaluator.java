package org.kinduct.render.field;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.kinduct.scene.Pose;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.RunMonitor;

/** What the editor asks of the solver for one scene. */
public interface SceneEvaluator {

    /** Solved values of every conductor at {@code tS}. */
    Snapshot at(double tS);

    /** Snapshots at t0, t0 + dt, … up to t1. */
    List<Snapshot> series(double t0S, double t1S, double dtS);

    /** The total B_z in the drawing plane at {@code tS}. */
    BzField fieldAt(double tS);

    /**
     * B_z of the sources named in {@code sourceIds} only, placed as in {@link #fieldAt}: the field
     * map computes still and moving sources apart. Sources on bodies that move as prescribed or
     * not at all are placed without waiting for a simulation.
     */
    BzField fieldOf(double tS, Set<String> sourceIds);

    /** Poses of the bodies that are not placed by their prescribed motion (free bodies) at {@code tS}; empty if none. */
    default Map<String, Pose> posesAt(double tS) {
        return Map.of();
    }

    /** Where the energy of the simulated run went, for scenes whose motion is simulated. */
    default Optional<EnergyAudit> audit() {
        return Optional.empty();
    }

    /**
     * Long work of this evaluator (the simulation of free bodies) reports its progress to
     * {@code monitor} and stops when it asks, also when it is already under way; replaces the
     * previous monitor. Callers waiting for stopped work get
     * {@link org.kinduct.solver.dynamics.SimulationCancelledException}; a later call starts it
     * anew. Evaluators without long work ignore it.
     */
    default void monitor(RunMonitor monitor) {
    }

    /** B_z at a point of the plane, tesla; implementations must allow calls from several threads. */
    @FunctionalInterface
    interface BzField {
        double bz(double x, double y);
    }
}
