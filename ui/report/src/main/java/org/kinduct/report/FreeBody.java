package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;

/**
 * A free body at one time as reports print it: where its pivot is, its angle, its pivot's
 * velocity and its angular speed (SI).
 */
public record FreeBody(String id, Vec2 positionM, double angleRad, Vec2 velocityMps, double omegaRadPerS) {

    /** The free bodies of {@code s}, in scene order. */
    public static List<FreeBody> of(Scene scene, Snapshot s) {
        List<FreeBody> out = new ArrayList<>();
        for (Body b : scene.bodies()) {
            Pose p = s.freeBodies().get(b.id());
            if (p != null) {
                out.add(new FreeBody(b.id(), p.pivot().plus(p.offset()), p.angleRad(), p.velocity(), p.omegaRadPerS()));
            }
        }
        return out;
    }
}
