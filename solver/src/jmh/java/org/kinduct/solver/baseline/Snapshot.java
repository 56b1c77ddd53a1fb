package org.kinduct.solver.baseline;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.kinduct.scene.Pose;

/**
 * The solved state of a scene at time {@code tS}, seconds: every conductor, and the pose of
 * every free body (bodies that move under forces, as the run integrated them; empty when every
 * body follows a prescribed motion, whose pose at tS its motion gives).
 */
public record Snapshot(double tS, List<ConductorState> conductors, Map<String, Pose> freeBodies) {

    public Snapshot {
        conductors = List.copyOf(conductors);
        freeBodies = Map.copyOf(freeBodies);
    }

    /** A state without free bodies. */
    public Snapshot(double tS, List<ConductorState> conductors) {
        this(tS, conductors, Map.of());
    }

    /**
     * The pose of free body {@code bodyId}.
     *
     * @throws IllegalArgumentException when that body is not simulated in this state
     */
    public Pose freeBody(String bodyId) {
        Pose pose = freeBodies.get(bodyId);
        if (pose == null) {
            throw new IllegalArgumentException("no free body '" + bodyId + "' in this state");
        }
        return pose;
    }

    public Optional<ConductorState> conductor(String id) {
        return conductors.stream().filter(c -> c.id().equals(id)).findFirst();
    }
}
