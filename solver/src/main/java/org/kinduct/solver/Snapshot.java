package org.kinduct.solver;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;

/**
 * The solved state of a scene at time {@code tS}, seconds: every wire and loop, every plate and
 * channel ({@code sheets}, in scene order), and the pose of every free body (bodies that move
 * under forces, as the run integrated them; empty when every body follows a prescribed motion,
 * whose pose at tS its motion gives).
 */
public record Snapshot(double tS, List<ConductorState> conductors, Map<String, Pose> freeBodies,
                       List<SheetState> sheets) {

    public Snapshot {
        conductors = List.copyOf(conductors);
        freeBodies = Map.copyOf(freeBodies);
        sheets = List.copyOf(sheets);
    }

    /** A state without plates or channels. */
    public Snapshot(double tS, List<ConductorState> conductors, Map<String, Pose> freeBodies) {
        this(tS, conductors, freeBodies, List.of());
    }

    /** A state without free bodies, plates or channels. */
    public Snapshot(double tS, List<ConductorState> conductors) {
        this(tS, conductors, Map.of());
    }

    /** This state with the plates and channels solved at its instant. */
    public Snapshot withSheets(List<SheetState> solved) {
        return new Snapshot(tS, conductors, freeBodies, solved);
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

    /** This state of a scene moved by {@code by} in the plane: conductors' vertices and bodies' pivots move. */
    public Snapshot movedBy(Vec2 by) {
        Map<String, Pose> moved = new java.util.HashMap<>();
        freeBodies.forEach((id, p) -> moved.put(id, new Pose(p.pivot().plus(by), p.offset(), p.angleRad(), p.velocity(),
                p.omegaRadPerS())));
        return new Snapshot(tS, conductors.stream().map(c -> c.movedBy(by)).toList(), moved);
    }

    public Optional<ConductorState> conductor(String id) {
        return conductors.stream().filter(c -> c.id().equals(id)).findFirst();
    }

    public Optional<SheetState> sheet(String id) {
        return sheets.stream().filter(c -> c.id().equals(id)).findFirst();
    }
}
