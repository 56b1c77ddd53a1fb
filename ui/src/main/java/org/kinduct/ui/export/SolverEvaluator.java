package org.kinduct.ui.export;

import java.util.List;
import org.kinduct.scene.Scene;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.field.SceneEvaluator;

/** The solver seen as the editor's {@link SceneEvaluator}, so exports map the field exactly as the editor does. */
final class SolverEvaluator implements SceneEvaluator {

    private final SceneSolver solver;

    SolverEvaluator(Scene scene) {
        this.solver = new SceneSolver(scene);
    }

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
        return solver.fieldAt(tS)::bz;
    }
}
