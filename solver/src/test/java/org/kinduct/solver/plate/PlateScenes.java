package org.kinduct.solver.plate;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.SceneRun;

/** Scenes with plates and channels for the end-to-end tests, built as a scene file would build them. */
final class PlateScenes {

    static final double SIGMA_S_PER_M = 3.5e7;

    private PlateScenes() {
    }

    /** A regular polygon of {@code sides} vertices on the circle of radius {@code radiusM}. */
    static List<Vec2> circle(Vec2 centre, double radiusM, int sides) {
        List<Vec2> pts = new ArrayList<>();
        for (int k = 0; k < sides; k++) {
            pts.add(centre.plus(Vec2.polar(radiusM, 2 * Math.PI * k / sides)));
        }
        return pts;
    }

    static List<Vec2> rectangle(double x0, double y0, double x1, double y1) {
        return List.of(new Vec2(x0, y0), new Vec2(x1, y0), new Vec2(x1, y1), new Vec2(x0, y1));
    }

    static Conductor.Plate plate(String id, String body, List<Vec2> outline, List<List<Vec2>> holes,
                                 double thicknessM, List<Conductor.Electrode> electrodes,
                                 List<Conductor.ElectrodePair> pairs, OptionalDouble cellM) {
        return new Conductor.Plate(id, body, outline, holes, thicknessM, new Conductivity.Given(SIGMA_S_PER_M),
                electrodes, pairs, cellM);
    }

    static Body glide(String id, Vec2 velocity) {
        return new Body(id, id, Vec2.ZERO, new Motion.Glide(velocity));
    }

    static Scene scene(List<Body> bodies, List<Source> sources, List<Conductor> conductors) {
        return new Scene("test", "", bodies, sources, conductors, new TimeSpan(0, 0.01, 0.001));
    }

    /** The scene's state at {@code tS}, as every output gets it. */
    static Snapshot at(Scene scene, double tS) {
        return new SceneRun(scene, new RunRequest(scene.time(), CircuitModel.AUTO, List.of()), RunMonitor.NONE,
                false).instant(tS);
    }

    static SheetState sheet(Scene scene, double tS, String id) {
        return at(scene, tS).sheet(id).orElseThrow();
    }

    static SheetState.Pair pair(SheetState state, String plus) {
        return state.pairs().stream().filter(p -> p.plus().equals(plus)).findFirst().orElseThrow();
    }
}
