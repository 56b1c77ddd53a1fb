package org.kinduct.render.field;

import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Scene;
import org.kinduct.solver.run.SceneRun;

/**
 * A field map wanted for the scene of {@code run} (at {@code revision}) at time {@code tS},
 * covering the view with one sample every {@code stepPx} screen pixels. Sources on free bodies
 * are placed where the run has them.
 */
public record MapRequest(SceneRun run, long revision, double tS, ViewTransform view, int stepPx) {

    public MapRequest {
        if (stepPx < 1) {
            throw new IllegalArgumentException("map step must be at least 1 pixel, got " + stepPx);
        }
    }

    public Scene scene() {
        return run.scene();
    }
}
