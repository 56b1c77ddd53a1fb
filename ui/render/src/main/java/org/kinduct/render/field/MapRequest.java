package org.kinduct.render.field;

import org.kinduct.scene.Scene;
import org.kinduct.render.view.ViewTransform;

/**
 * A field map wanted for {@code scene} (at {@code revision}) at time {@code tS}, covering the
 * view with one sample every {@code stepPx} screen pixels.
 */
public record MapRequest(Scene scene, long revision, double tS, ViewTransform view, int stepPx) {

    public MapRequest {
        if (stepPx < 1) {
            throw new IllegalArgumentException("map step must be at least 1 pixel, got " + stepPx);
        }
    }
}
