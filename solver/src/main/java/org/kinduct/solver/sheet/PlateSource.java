package org.kinduct.solver.sheet;

import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;
import org.kinduct.scene.Vec2;

/**
 * The sources' field as the plate sees it, for {@link PlateTransient}: B_z at a point of the
 * plate, given in the plate's own coordinates (the coordinates its {@link SheetShape} is drawn
 * in), at time t. Motion of the plate and alternating or switched sources are both expressed
 * here; the plate's own field is not part of it.
 */
@FunctionalInterface
public interface PlateSource {

    /** B_z at plate point (x, y), metres, at time t, seconds; tesla, &gt; 0 out of the screen. */
    double bzT(double xM, double yM, double tS);

    /**
     * A plate moving rigidly through a steady field: at time t its point p sits at
     * pivot + V·t + Rot(ω·t)·(p − pivot) in the scene.
     *
     * @param sceneField B_z(x, y) in scene coordinates, tesla
     * @param velocityMPerS the pivot's velocity
     * @param omegaRadPerS angular velocity about +z
     * @param pivotM the point the plate turns about, at its drawn position at t = 0
     */
    static PlateSource rigidMotion(DoubleBinaryOperator sceneField, Vec2 velocityMPerS, double omegaRadPerS,
                                   Vec2 pivotM) {
        return (x, y, t) -> {
            double angle = omegaRadPerS * t;
            double c = Math.cos(angle);
            double s = Math.sin(angle);
            double dx = x - pivotM.x();
            double dy = y - pivotM.y();
            return sceneField.applyAsDouble(pivotM.x() + velocityMPerS.x() * t + c * dx - s * dy,
                    pivotM.y() + velocityMPerS.y() * t + s * dx + c * dy);
        };
    }

    /**
     * A still plate under a field of fixed shape whose strength follows a waveform, e.g. an
     * AC-driven coil (field per ampere times the current) or a field switched on at t = 0.
     *
     * @param shape B_z(x, y) at unit strength, tesla
     * @param strength the multiplier at time t
     */
    static PlateSource scaled(DoubleBinaryOperator shape, DoubleUnaryOperator strength) {
        return (x, y, t) -> strength.applyAsDouble(t) * shape.applyAsDouble(x, y);
    }
}
