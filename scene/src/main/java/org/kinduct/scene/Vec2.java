package org.kinduct.scene;

/**
 * A point or vector in the drawing plane, in metres (or metres per second for velocities).
 *
 * <p>Scene coordinates: x to the right, y up, z out of the screen. Screen coordinates (y down)
 * appear only in the UI's view transform.
 */
public record Vec2(double x, double y) {

    public static final Vec2 ZERO = new Vec2(0, 0);

    public Vec2 {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("Coordinates must be finite: (" + x + ", " + y + ")");
        }
    }

    public static Vec2 of(double x, double y) {
        return new Vec2(x, y);
    }

    /** Unit vector at {@code angleRad} counter-clockwise from +x. */
    public static Vec2 polar(double length, double angleRad) {
        return new Vec2(length * Math.cos(angleRad), length * Math.sin(angleRad));
    }

    public Vec2 plus(Vec2 o) {
        return new Vec2(x + o.x, y + o.y);
    }

    public Vec2 minus(Vec2 o) {
        return new Vec2(x - o.x, y - o.y);
    }

    public Vec2 times(double s) {
        return new Vec2(x * s, y * s);
    }

    public double dot(Vec2 o) {
        return x * o.x + y * o.y;
    }

    /** z component of this × o. */
    public double cross(Vec2 o) {
        return x * o.y - y * o.x;
    }

    public double length() {
        return Math.hypot(x, y);
    }

    /** This vector rotated counter-clockwise by {@code angleRad}. */
    public Vec2 rotate(double angleRad) {
        double c = Math.cos(angleRad);
        double s = Math.sin(angleRad);
        return new Vec2(c * x - s * y, s * x + c * y);
    }

    /** ẑ × this: this vector turned a quarter counter-clockwise. */
    public Vec2 perp() {
        return new Vec2(-y, x);
    }

    /** Exact comparison is {@link #equals}; this one allows {@code tol} in each coordinate. */
    public boolean eq(Vec2 o, double tol) {
        return Math.abs(x - o.x) <= tol && Math.abs(y - o.y) <= tol;
    }
}
