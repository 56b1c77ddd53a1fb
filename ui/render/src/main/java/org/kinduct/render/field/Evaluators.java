package org.kinduct.render.field;

import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import org.kinduct.scene.Scene;
import org.kinduct.solver.SceneSolver;

/** Where the editor gets its numbers from: the {@link SceneSolver}. */
public final class Evaluators {

    private Evaluators() {
    }

    /**
     * A solver per scene; {@link SceneSolver} is immutable, so the evaluator may be shared by threads.
     * A scene with free bodies gets a {@link TrajectoryEvaluator}; the last one made is handed out
     * again for an equal scene, so the view model and the field map share one simulation.
     */
    public static Function<Scene, SceneEvaluator> solver() {
        AtomicReference<TrajectoryEvaluator> last = new AtomicReference<>();
        return scene -> {
            if (TrajectoryEvaluator.needsSimulation(scene)) {
                return last.updateAndGet(e -> e != null && e.scene().equals(scene) ? e : new TrajectoryEvaluator(scene));
            }
            return new SolverEvaluator(scene);
        };
    }
}
