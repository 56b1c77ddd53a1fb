package org.kinduct.solver;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PlaneField;

/**
 * The scene's bodies, sources and conductor vertices resolved to array indices once, so that
 * each instant only looks up poses by index. Bodies are numbered as in {@link Scene#bodies()},
 * sources as in {@link Scene#sources()}, conductors as in {@link Scene#conductors()}; a pose
 * array {@code Pose[]} holds one pose per body in that order. Public for the coupled simulation
 * ({@code org.kinduct.solver.dynamics}), which places the same conductors and sources from the
 * poses it integrates.
 */
public final class SceneIndex {

    private final Scene scene;
    private final String[] bodyIds;
    private final Map<String, Integer> bodyIndex = new HashMap<>();
    private final int[] sourceBody;
    private final SourceReach[] reach;
    private final int[][] vertexBody;
    private final Vec2[][] drawn;

    public SceneIndex(Scene scene) {
        this.scene = scene;
        List<Body> bodies = scene.bodies();
        bodyIds = new String[bodies.size()];
        for (int b = 0; b < bodyIds.length; b++) {
            bodyIds[b] = bodies.get(b).id();
            bodyIndex.put(bodyIds[b], b);
        }
        List<Source> sources = scene.sources();
        sourceBody = new int[sources.size()];
        reach = new SourceReach[sources.size()];
        for (int s = 0; s < sourceBody.length; s++) {
            sourceBody[s] = bodyIndex.get(sources.get(s).body());
            reach[s] = SourceReach.of(sources.get(s));
        }
        List<Conductor> conductors = scene.conductors();
        vertexBody = new int[conductors.size()][];
        drawn = new Vec2[conductors.size()][];
        for (int c = 0; c < vertexBody.length; c++) {
            Conductor conductor = conductors.get(c);
            List<Conductor.Vertex> vertices = conductor.vertices();
            vertexBody[c] = new int[vertices.size()];
            drawn[c] = new Vec2[vertices.size()];
            for (int i = 0; i < vertices.size(); i++) {
                vertexBody[c][i] = bodyIndex.get(vertices.get(i).bodyOr(conductor.body()));
                drawn[c][i] = vertices.get(i).at();
            }
        }
    }

    public Scene scene() {
        return scene;
    }

    public int bodyCount() {
        return bodyIds.length;
    }

    /**
     * The index of body {@code bodyId}.
     *
     * @throws IllegalArgumentException when the scene has no such body
     */
    public int body(String bodyId) {
        Integer b = bodyIndex.get(bodyId);
        if (b == null) {
            throw new IllegalArgumentException("no body '" + bodyId + "'");
        }
        return b;
    }

    public int sourceCount() {
        return sourceBody.length;
    }

    /** Sum of the sources' field scales, tesla: a bound on |B_z| up to a modest factor. */
    double fieldScaleT() {
        double sum = 0;
        for (SourceReach r : reach) {
            sum += r.fieldT();
        }
        return sum;
    }

    /** True when some source's B_z jumps across edges in the plane ({@link SourceReach#jumps()}). */
    public boolean fieldJumpsInPlane() {
        for (SourceReach r : reach) {
            if (r.jumps()) {
                return true;
            }
        }
        return false;
    }

    /** The source's reach. */
    SourceReach reach(int source) {
        return reach[source];
    }

    /** The index of the body source {@code source} rides. */
    public int sourceBody(int source) {
        return sourceBody[source];
    }

    public int vertexCount(int conductor) {
        return drawn[conductor].length;
    }

    /** The index of the body vertex {@code i} of conductor {@code conductor} rides. */
    public int vertexBody(int conductor, int i) {
        return vertexBody[conductor][i];
    }

    /** Vertex {@code i} of conductor {@code conductor} as drawn, in its body's frame, metres. */
    public Vec2 drawn(int conductor, int i) {
        return drawn[conductor][i];
    }

    PlacedInstant frame(Kinematics kinematics, double tS) {
        Pose[] poses = new Pose[bodyIds.length];
        for (int b = 0; b < poses.length; b++) {
            poses[b] = kinematics.poseAt(bodyIds[b], tS);
        }
        return new PlacedInstant(tS, poses, fields(poses, tS));
    }

    /** Every source's field at {@code tS}, each placed by the pose of its body in {@code poses}. */
    public PlaneField[] fields(Pose[] poses, double tS) {
        List<Source> sources = scene.sources();
        PlaneField[] fields = new PlaneField[sources.size()];
        for (int s = 0; s < fields.length; s++) {
            fields[s] = SourceFields.place(sources.get(s), poses[sourceBody[s]], tS);
        }
        return fields;
    }

    /** Writes conductor {@code c}'s vertices at {@code frame} into xs, ys. */
    void place(int c, PlacedInstant frame, double[] xs, double[] ys) {
        for (int i = 0; i < xs.length; i++) {
            Vec2 p = frame.pose(vertexBody[c][i]).place(drawn[c][i]);
            xs[i] = p.x();
            ys[i] = p.y();
        }
    }

    /** Writes conductor {@code c}'s vertices, each placed by the pose of its body in {@code poses}, into xs, ys. */
    public void place(int c, Pose[] poses, double[] xs, double[] ys) {
        for (int i = 0; i < xs.length; i++) {
            Vec2 p = poses[vertexBody[c][i]].place(drawn[c][i]);
            xs[i] = p.x();
            ys[i] = p.y();
        }
    }

    /** Writes the velocities of conductor {@code c}'s vertices, now at xs, ys, into vx, vy. */
    void velocities(int c, PlacedInstant frame, double[] xs, double[] ys, double[] vx, double[] vy) {
        for (int i = 0; i < xs.length; i++) {
            Vec2 v = frame.pose(vertexBody[c][i]).velocityAt(new Vec2(xs[i], ys[i]));
            vx[i] = v.x();
            vy[i] = v.y();
        }
    }
}
