package org.kinduct.ui.edit;

import java.util.List;
import org.kinduct.scene.Vec2;

/**
 * Snapping of a cursor position while drawing. An existing vertex within reach wins; otherwise,
 * when continuing from a previous point, the direction snaps to multiples of 15° and the length
 * to the grid step; otherwise the point snaps to the grid.
 *
 * @param gridM grid step, metres (0 turns grid snapping off)
 * @param reachM how close a vertex must be to attract the cursor, metres
 * @param angles whether directions snap to multiples of {@link #ANGLE_STEP_RAD}
 */
public record Snapper(double gridM, double reachM, boolean angles) {

    public static final double ANGLE_STEP_RAD = Math.toRadians(15);
    private static final double AXIS_EPS = 1e-12;

    /** Result: the snapped point and what it snapped to ("vertex", "15°", "grid" or ""). */
    public record Snap(Vec2 point, String to) {
    }

    public Snap snap(Vec2 raw, Vec2 previous, List<Vec2> vertices) {
        Vec2 nearest = null;
        double best = reachM;
        for (Vec2 v : vertices) {
            double d = v.minus(raw).length();
            if (d <= best) {
                best = d;
                nearest = v;
            }
        }
        if (nearest != null) {
            return new Snap(nearest, "vertex");
        }
        if (angles && previous != null) {
            Vec2 d = raw.minus(previous);
            double len = d.length();
            if (len > 0) {
                double a = Math.round(Math.atan2(d.y(), d.x()) / ANGLE_STEP_RAD) * ANGLE_STEP_RAD;
                double l = gridM > 0 ? Math.max(gridM, Math.round(len / gridM) * gridM) : len;
                // cos 90° is 6e-17, not 0: axis directions exactly, so axis-parallel edges stay exact.
                double c = Math.abs(Math.cos(a)) < AXIS_EPS ? 0 : Math.cos(a);
                double sn = Math.abs(Math.sin(a)) < AXIS_EPS ? 0 : Math.sin(a);
                return new Snap(previous.plus(new Vec2(l * c, l * sn)), "15°");
            }
        }
        if (gridM > 0) {
            return new Snap(new Vec2(Math.round(raw.x() / gridM) * gridM, Math.round(raw.y() / gridM) * gridM), "grid");
        }
        return new Snap(raw, "");
    }
}
