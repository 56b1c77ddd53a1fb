package org.kinduct.ui.field;

import java.util.List;
import java.util.function.Function;
import org.kinduct.scene.Scene;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;

/** Where the editor gets its numbers from: the {@link SceneSolver}. */
public final class Evaluators {

    private Evaluators() {
    }

    /** A solver per scene; {@link SceneSolver} is immutable, so the evaluator may be shared by threads. */
    public static Function<Scene, SceneEvaluator> solver() {
        return scene -> {
            SceneSolver solver = new SceneSolver(scene);
            return new SceneEvaluator() {
                @Override
                public Snapshot at(double tS) {
                    return solver.at(tS);
                }

                @Override
                public List<Snapshot> series(double t0S, double t1S, double dtS) {
                    return solver.series(t0S, t1S, dtS);
                }

                @Override
                public BzField fieldAt(double tS) {
                    SceneField field = solver.fieldAt(tS);
                    return field::bz;
                }
            };
        };
    }
}
