package org.kinduct.ui.paint;

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

    private Placement(Scene scene, double tS) {
        for (Body b : scene.bodies()) {
            poses.put(b.id(), b.poseAt(tS));
        }
    }

    public static Placement of(Scene scene, double tS) {
        return new Placement(scene, tS);
    }

    public Pose pose(String bodyId) {
        return poses.get(bodyId);
    }

    public Vec2 place(String bodyId, Vec2 drawn) {
        return poses.get(bodyId).place(drawn);
    }

    public List<Vec2> place(String bodyId, List<Vec2> drawn) {
        Pose pose = poses.get(bodyId);
        List<Vec2> out = new ArrayList<>(drawn.size());
        for (Vec2 p : drawn) {
            out.add(pose.place(p));
        }
        return out;
    }

    /** A conductor's vertices where they are now; each vertex rides its own body when it names one. */
    public List<Vec2> vertices(Conductor c) {
        List<Vec2> out = new ArrayList<>(c.vertices().size());
        for (Conductor.Vertex v : c.vertices()) {
            out.add(poses.get(v.bodyOr(c.body())).place(v.at()));
        }
        return out;
    }

    /** Rotation of a body at this instant, radians. */
    public double angle(String bodyId) {
        return poses.get(bodyId).angleRad();
    }
}
