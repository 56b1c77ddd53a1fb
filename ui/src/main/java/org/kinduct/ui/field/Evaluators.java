package org.kinduct.ui.field;

import java.util.function.Function;
import org.kinduct.scene.Scene;

/** Where the editor gets its numbers from. */
public final class Evaluators {

    private Evaluators() {
    }

    /** The solver for a scene. */
    public static Function<Scene, SceneEvaluator> solver() {
        return scene -> {
            throw new IllegalStateException("the solver is not part of this build yet");
        };
    }
}
