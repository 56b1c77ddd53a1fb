package org.kinduct.render.paint;

import java.util.List;
import org.kinduct.scene.Vec2;

/** The axis-aligned box around some scene points, metres. */
public record Extent(double minX, double minY, double maxX, double maxY) {

    /** The box around {@code pts}, which must not be empty. */
    public static Extent of(List<Vec2> pts) {
        if (pts.isEmpty()) {
            throw new IllegalArgumentException("no points to bound");
        }
        double x0 = Double.POSITIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (Vec2 p : pts) {
            x0 = Math.min(x0, p.x());
            y0 = Math.min(y0, p.y());
            x1 = Math.max(x1, p.x());
            y1 = Math.max(y1, p.y());
        }
        return new Extent(x0, y0, x1, y1);
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }
}
