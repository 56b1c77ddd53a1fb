package org.kinduct.render.export;

import java.util.Map;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.view.ViewTransform;

/** Which part of the plane a snapshot or field map shows. */
public sealed interface ViewChoice {

    /** Free space around the scene when fitting it, as a fraction of its size on each side. */
    double FIT_PAD = 0.08;

    /** Everything the scene holds over its time window and at the snapshot time. */
    record Fit() implements ViewChoice {
    }

    /** A box of the plane, corners in metres. */
    record Box(double x0, double y0, double x1, double y1) implements ViewChoice {
        public Box {
            if (!Double.isFinite(x0) || !Double.isFinite(y0) || !Double.isFinite(x1) || !Double.isFinite(y1)) {
                throw new IllegalArgumentException("view corners must be finite");
            }
            if (!(x1 > x0) || !(y1 > y0)) {
                throw new IllegalArgumentException("view box needs x0 < x1 and y0 < y1, got x " + x0 + " … " + x1
                        + " m, y " + y0 + " … " + y1 + " m");
            }
        }
    }

    /** What the editor shows now (its visible box). */
    record Current(ViewTransform view) implements ViewChoice {
        public Current {
            if (!(view.widthPx() > 0) || !(view.heightPx() > 0)) {
                throw new IllegalArgumentException("the editor's view has no area");
            }
        }
    }

    /** The box shown, metres: {x0, y0, x1, y1}. */
    static Box box(ViewChoice choice, Scene scene, double tS) {
        return box(choice, scene, tS, Map.of());
    }

    /** As {@link #box(ViewChoice, Scene, double)}; a fitted box also holds the free bodies where {@code poses} put them at {@code tS}. */
    static Box box(ViewChoice choice, Scene scene, double tS, Map<String, Pose> poses) {
        if (choice instanceof Box b) {
            return b;
        }
        if (choice instanceof Current c) {
            ViewTransform v = c.view();
            return new Box(v.minX(), v.minY(), v.maxX(), v.maxY());
        }
        double t0 = scene.time().t0S();
        double t1 = scene.time().t1S();
        SceneBounds b = SceneBounds.of(scene, Placement.of(scene, tS, poses)).union(SceneBounds.of(scene, t0))
                .union(SceneBounds.of(scene, t1)).union(SceneBounds.of(scene, (t0 + t1) / 2));
        double w = Math.max(b.maxX() - b.minX(), 1e-3);
        double h = Math.max(b.maxY() - b.minY(), 1e-3);
        double pad = FIT_PAD * Math.max(w, h);
        return new Box(b.minX() - pad, b.minY() - pad, b.maxX() + pad, b.maxY() + pad);
    }
}
