package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;

/** Where the drawn geometry of a scene is at one instant: the bodies' poses, applied to points. */
public final class Placement {

    private final Map<String, Pose> poses = new HashMap<>();

    private Placement(Scene scene, double tS, Map<String, Pose> integrated) {
        for (Body b : scene.bodies()) {
            Pose given = integrated.get(b.id());
            poses.put(b.id(), given != null ? given : b.poseAt(tS));
        }
    }

    public static Placement of(Scene scene, double tS) {
        return new Placement(scene, tS, Map.of());
    }

    /** Bodies named in {@code integrated} (free bodies, as simulated) there, the others by their prescribed motion. */
    public static Placement of(Scene scene, double tS, Map<String, Pose> integrated) {
        return new Placement(scene, tS, integrated);
    }

    public List<Vec2> place(String bodyId, List<Vec2> drawn) {
        Pose pose = poses.get(bodyId);
        List<Vec2> out = new ArrayList<>(drawn.size());
        for (Vec2 p : drawn) {
            out.add(pose.place(p));
        }
        return out;
    }

    /** Body {@code bodyId}'s pose now. */
    public Pose pose(String bodyId) {
        return poses.get(bodyId);
    }

    /** Where a point now at {@code now} on body {@code bodyId} was drawn: the inverse of {@link Pose#place}. */
    public Vec2 drawn(String bodyId, Vec2 now) {
        return poses.get(bodyId).unplace(now);
    }

    /** A displacement seen now, expressed in body {@code bodyId}'s drawn frame. */
    public Vec2 drawnShift(String bodyId, Vec2 shiftNow) {
        return shiftNow.rotate(-poses.get(bodyId).angleRad());
    }

    /** A conductor's vertices where they are now; each vertex rides its own body when it names one. */
    public List<Vec2> vertices(Conductor c) {
        List<Vec2> out = new ArrayList<>(c.vertices().size());
        for (Conductor.Vertex v : c.vertices()) {
            out.add(poses.get(v.bodyOr(c.body())).place(v.at()));
        }
        return out;
    }
}
