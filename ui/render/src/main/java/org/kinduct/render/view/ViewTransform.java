package org.kinduct.render.view;

import org.kinduct.scene.Vec2;

/**
 * The one place where scene coordinates (metres, y up) and screen coordinates (pixels, y down)
 * meet. The scene point {@code (centerX, centerY)} sits in the middle of a {@code widthPx ×
 * heightPx} view, magnified by {@code pxPerM}.
 */
public record ViewTransform(double centerX, double centerY, double pxPerM, double widthPx, double heightPx) {

    /** Zoom limits, pixels per metre: from a 100 km view down to micrometres. */
    public static final double MIN_PX_PER_M = 1e-2;
    public static final double MAX_PX_PER_M = 1e8;

    public ViewTransform {
        if (!Double.isFinite(centerX) || !Double.isFinite(centerY)) {
            throw new IllegalArgumentException("view centre must be finite");
        }
        if (!(pxPerM > 0) || !Double.isFinite(pxPerM)) {
            throw new IllegalArgumentException("zoom must be positive, got " + pxPerM);
        }
        if (!(widthPx >= 0) || !(heightPx >= 0)) {
            throw new IllegalArgumentException("view size must be zero or positive");
        }
    }

    /** A 1 m wide default view around the origin. */
    public static ViewTransform initial(double widthPx, double heightPx) {
        return new ViewTransform(0, 0, Math.max(widthPx, 1) / 0.25, widthPx, heightPx);
    }

    public double screenX(double x) {
        return widthPx / 2 + (x - centerX) * pxPerM;
    }

    public double screenY(double y) {
        return heightPx / 2 - (y - centerY) * pxPerM;
    }

    public double sceneX(double sx) {
        return centerX + (sx - widthPx / 2) / pxPerM;
    }

    public double sceneY(double sy) {
        return centerY - (sy - heightPx / 2) / pxPerM;
    }

    public Vec2 toScene(double sx, double sy) {
        return new Vec2(sceneX(sx), sceneY(sy));
    }

    /** Left edge of the visible scene, metres. */
    public double minX() {
        return sceneX(0);
    }

    public double maxX() {
        return sceneX(widthPx);
    }

    /** Bottom edge of the visible scene, metres (screen y = height). */
    public double minY() {
        return sceneY(heightPx);
    }

    public double maxY() {
        return sceneY(0);
    }

    public ViewTransform resized(double newWidthPx, double newHeightPx) {
        return new ViewTransform(centerX, centerY, pxPerM, newWidthPx, newHeightPx);
    }

    /** Moves the content by the given screen distance (drag direction). */
    public ViewTransform pannedBy(double dxPx, double dyPx) {
        return new ViewTransform(centerX - dxPx / pxPerM, centerY + dyPx / pxPerM, pxPerM, widthPx, heightPx);
    }

    /** Zooms by {@code factor}, keeping the scene point under the screen point (sx, sy) fixed. */
    public ViewTransform zoomedAt(double sx, double sy, double factor) {
        double s = Math.max(MIN_PX_PER_M, Math.min(MAX_PX_PER_M, pxPerM * factor));
        double x = sceneX(sx);
        double y = sceneY(sy);
        double cx = x - (sx - widthPx / 2) / s;
        double cy = y + (sy - heightPx / 2) / s;
        return new ViewTransform(cx, cy, s, widthPx, heightPx);
    }

    /** Shows the scene box [minX, maxX] × [minY, maxY] with {@code marginPx} free around it. */
    public ViewTransform fitting(double minX, double minY, double maxX, double maxY, double marginPx) {
        return fitting(minX, minY, maxX, maxY, marginPx, 0);
    }

    /**
     * As {@link #fitting(double, double, double, double, double)}, keeping the rightmost {@code
     * rightReservedPx} of the view free (where the colour legend sits) and centring the box in the rest.
     */
    public ViewTransform fitting(double minX, double minY, double maxX, double maxY, double marginPx,
                                 double rightReservedPx) {
        double w = Math.max(maxX - minX, 1e-6);
        double h = Math.max(maxY - minY, 1e-6);
        double reserved = Math.min(Math.max(rightReservedPx, 0), widthPx / 2);
        double availW = Math.max(widthPx - reserved - 2 * marginPx, 10);
        double availH = Math.max(heightPx - 2 * marginPx, 10);
        double s = Math.max(MIN_PX_PER_M, Math.min(MAX_PX_PER_M, Math.min(availW / w, availH / h)));
        return new ViewTransform((minX + maxX) / 2 + reserved / 2 / s, (minY + maxY) / 2, s, widthPx, heightPx);
    }
}
