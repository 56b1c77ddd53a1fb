package org.kinduct.scene;

/**
 * Where a body is at one instant, relative to where it was drawn: a point drawn at {@code p}
 * is at {@code pivot + offset + R(angle)·(p − pivot)}.
 *
 * @param offset displacement of the pivot, metres
 * @param angleRad rotation about the pivot, counter-clockwise positive (about +z)
 * @param velocity velocity of the pivot, m/s
 * @param omegaRadPerS angular velocity about +z, rad/s
 */
public record Pose(Vec2 pivot, Vec2 offset, double angleRad, Vec2 velocity, double omegaRadPerS) {

    public static Pose rest(Vec2 pivot) {
        return new Pose(pivot, Vec2.ZERO, 0, Vec2.ZERO, 0);
    }

    /** Where the point drawn at {@code drawn} is now. */
    public Vec2 place(Vec2 drawn) {
        return pivot.plus(offset).plus(drawn.minus(pivot).rotate(angleRad));
    }

    /** Where the point now at {@code now} was drawn: the inverse of {@link #place}. */
    public Vec2 unplace(Vec2 now) {
        return pivot.plus(now.minus(pivot.plus(offset)).rotate(-angleRad));
    }

    /** Velocity of the material point that is now at {@code now}: v = v_pivot + ω ẑ × (r − r_pivot). */
    public Vec2 velocityAt(Vec2 now) {
        Vec2 arm = now.minus(pivot.plus(offset));
        return velocity.plus(arm.perp().times(omegaRadPerS));
    }
}
