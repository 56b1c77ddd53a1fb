package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Pose;
import org.kinduct.solver.field.PlaneField;

/**
 * Every body's pose and every source's placed field at one instant, indexed as in
 * {@link SceneIndex}.
 */
final class PlacedInstant {

    private final double tS;
    private final Pose[] poses;
    private final PlaneField[] fields;

    PlacedInstant(double tS, Pose[] poses, PlaneField[] fields) {
        this.tS = tS;
        this.poses = poses;
        this.fields = fields;
    }

    double tS() {
        return tS;
    }

    Pose pose(int body) {
        return poses[body];
    }

    PlaneField field(int source) {
        return fields[source];
    }

    /** The largest |ω| of any body, rad/s. */
    double fastestTurnRadPerS() {
        double fastest = 0;
        for (Pose pose : poses) {
            fastest = Math.max(fastest, Math.abs(pose.omegaRadPerS()));
        }
        return fastest;
    }

    /** The sum of all sources. */
    SceneField all() {
        return new SceneField(List.of(fields));
    }

    /** The sum of the sources whose {@code mask} entry is true. */
    SceneField only(boolean[] mask) {
        List<PlaneField> chosen = new ArrayList<>();
        for (int s = 0; s < fields.length; s++) {
            if (mask[s]) {
                chosen.add(fields[s]);
            }
        }
        return new SceneField(chosen);
    }
}
