package org.kinduct.solver.dynamics;

import java.util.List;
import java.util.Map;
import org.kinduct.scene.Pose;
import org.kinduct.solver.ConductorState;

/**
 * The coupled state at time {@code tS}: every body's pose (free bodies as integrated), every
 * conductor's state with the current of the coupled circuit equations, and the self-inductance
 * of every closed loop, henries.
 */
public record Sample(double tS, Map<String, Pose> poses, List<ConductorState> conductors,
                     Map<String, Double> selfInductanceH) {

    public Sample {
        poses = Map.copyOf(poses);
        conductors = List.copyOf(conductors);
        selfInductanceH = Map.copyOf(selfInductanceH);
    }

    public Pose pose(String bodyId) {
        Pose pose = poses.get(bodyId);
        if (pose == null) {
            throw new IllegalArgumentException("no body '" + bodyId + "'");
        }
        return pose;
    }

    public ConductorState conductor(String id) {
        return conductors.stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no conductor '" + id + "'"));
    }
}
