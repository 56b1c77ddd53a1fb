package org.kinduct.solver.baseline;

import java.util.Map;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;

/**
 * Where every body is, and how fast it moves, at a given time. The solver asks for nothing else,
 * so a dynamics integrator can drive it with the poses of free bodies it has integrated.
 *
 * <p>Implementations must give exact velocities with each pose (the motional EMF uses them) and
 * must be safe to call repeatedly for nearby times: the flux method samples t ± h and t ± 2h.
 */
@FunctionalInterface
public interface Kinematics {

    /** The pose of body {@code bodyId} at {@code tS}, seconds. */
    Pose poseAt(String bodyId, double tS);

    /**
     * The bodies' prescribed motions ({@link Body#poseAt}). A {@link Motion.Free} body has no
     * prescribed motion, so here it stays at its drawn pose with zero velocity: its initial velocity
     * only takes effect when a dynamics solver supplies the poses.
     */
    static Kinematics prescribed(Scene scene) {
        Map<String, Body> bodies = scene.bodiesById();
        return (bodyId, tS) -> {
            Body body = bodies.get(bodyId);
            if (body == null) {
                throw new IllegalArgumentException("scene '" + scene.name() + "' has no body '" + bodyId + "'");
            }
            return body.motion() instanceof Motion.Free ? Pose.rest(body.pivot()) : body.poseAt(tS);
        };
    }
}
