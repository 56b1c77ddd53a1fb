package org.kinduct.solver.sheet;

import java.util.function.DoubleBinaryOperator;
import org.kinduct.scene.Vec2;

/**
 * What drives the eddy currents at one instant, as callbacks at points of the plane; where to
 * sample them is the solver's business ({@link SheetSolver} takes one sample per cell face, at
 * the midpoint of the segment joining the two cell centres).
 */
public interface SheetDrive {

    /** B_z at (x, y, 0), tesla (&gt; 0 out of the screen). */
    double bzT(double x, double y);

    /**
     * The B_z the solver takes for the segment a → b between two cell centres, tesla: by default
     * at its midpoint. A drive whose field jumps (a field patch's rim) may give its mean along the
     * segment instead, which moves continuously with the conductor: sampled at a point, the drag
     * would jump each time a cell centre crossed the rim, and a coupled run's integrator would
     * shrink its steps at every jump.
     */
    default double bzAlongT(double ax, double ay, double bx, double by) {
        return bzT(0.5 * (ax + bx), 0.5 * (ay + by));
    }

    /** Velocity of the conducting material at (x, y), m/s, written to {@code out[0..1]}. */
    void velocity(double x, double y, double[] out);

    /**
     * Volume flow per unit thickness across the straight segment a → b, ∫ v·n ds with n the unit
     * normal to the right of a → b, m²/s. The solver's EMF along a segment is −B_z(mid)·(this): in
     * the plane (v × B)·dl = B_z (v_y dx − v_x dy) = −B_z v·n ds (Griffiths, <i>Introduction to
     * Electrodynamics</i>, 4th ed., 2013, §7.1.3). The default takes the velocity at the midpoint,
     * exact where v varies linearly along the segment (rigid motion); a flow that knows its stream
     * function gives the exact difference, so that a uniform field's EMF is exact for any profile.
     */
    default double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
        double[] v = new double[2];
        velocity(0.5 * (ax + bx), 0.5 * (ay + by), v);
        return v[0] * (by - ay) - v[1] * (bx - ax);
    }

    /**
     * The induced electric field −∂A/∂t of sources that move or alternate, in-plane, V/m, written to
     * {@code out[0..1]}; zero unless overridden. The solver asks for it at a segment's midpoint
     * right after {@link #bzAlongT} for that segment, so a drive may take a moving source's
     * −w × B with the B_z it gave there.
     */
    default void inducedField(double x, double y, double[] out) {
        out[0] = 0;
        out[1] = 0;
    }

    /**
     * A rigid body's motion under a field: v = V + ω ẑ × (r − pivot), no induced field.
     *
     * @param bzT B_z(x, y), tesla
     * @param velocityMPerS velocity V of the pivot
     * @param omegaRadPerS angular velocity about +z
     * @param pivotM the point the body turns about
     */
    static SheetDrive rigid(DoubleBinaryOperator bzT, Vec2 velocityMPerS, double omegaRadPerS, Vec2 pivotM) {
        return new RigidDrive(bzT, velocityMPerS.x(), velocityMPerS.y(), omegaRadPerS, pivotM.x(), pivotM.y());
    }
}
