package org.kinduct.solver;

import org.kinduct.scene.Pose;
import org.kinduct.solver.field.EdgeQuadrature;
import org.kinduct.solver.field.GradientField;

/**
 * A closed loop whose vertices all ride one body and a source of constant strength (magnet, coil
 * with steady current) riding another, at one instant: the flux, its rate of change and the
 * motional EMF, all from line integrals round the loop as it is now, in one quadrature pass
 * that evaluates the source once per node ({@link GradientField#jet}).
 *
 * <p>Relative to the source the loop moves rigidly, with the in-plane velocity field
 * u(r) = v_loop(r) − w_source(r) = U + Ω ẑ × r (Ω the difference of the bodies' angular
 * velocities). The source carries its potential along (∂A/∂t = −L_w A) and the contour moves with
 * v, so the flux Φ = ∮ A·dl changes at the rate (Reynolds transport of a line integral of a
 * 1-form; T. Frankel, <i>The Geometry of Physics</i>, 3rd ed., 2011, §4.3; from memory)
 * <pre>
 *   dΦ/dt = ∮ L_u A·dl,   (L_u A)_x = u·∇A_x + Ω·A_y,   (L_u A)_y = u·∇A_y − Ω·A_x,
 * </pre>
 * the flux rule without a time difference: the exact derivative of the same integral Φ is,
 * node by node, from A and its gradient. The motional method, ∮ (v × B)·dl plus the induced
 * −∮ ∂A/∂t·dl = −∮ (w × B)·dl of the moving source ({@link RigidInduction}; the end terms cancel
 * round a closed loop), is ∮ (u × B)·dl = ∮ B_z (u_y dx − u_x dy) from the source's own B_z
 * formula. The two agree by Cartan's formula L_u A = i_u dA + d(i_u A), whose exact part
 * integrates to zero round the loop (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed.,
 * 2013, §7.1.3 for the flux rule); numerically they share nothing but the quadrature nodes, so
 * their agreement checks A's gradient against B_z, and the kinematics, as the time difference did.
 * The force per ampere-turn is ∮ B_z (dy, −dx) ({@link EdgeSums}).
 *
 * <p>Accuracy: each of the five integrals to {@link EdgeQuadrature#STANDARD}'s tolerance (about
 * 1e-10 relative, or 1e-13 of the sum of its parts' magnitudes when it cancels), free of the
 * rounding a time difference amplifies. Per turn.
 *
 * @param fluxWb Φ, webers
 * @param fluxRateWbPerS dΦ/dt, webers per second
 * @param motionalV ∮ (u × B)·dl, volts
 * @param forceXNPerA x component of ∮ dl × B, newtons per ampere
 * @param forceYNPerA y component
 */
record RigidPair(double fluxWb, double fluxRateWbPerS, double motionalV, double forceXNPerA,
                 double forceYNPerA) {

    static RigidPair of(GradientField source, Pose sourcePose, PlacedConductor loop, Pose loopPose) {
        double omega = loopPose.omegaRadPerS() - sourcePose.omegaRadPerS();
        // u(r) = U + Ω ẑ × r with each body's v(r) = v_pivot + ω ẑ × (r − pivot).
        double ux0 = velocityX(loopPose) - velocityX(sourcePose);
        double uy0 = velocityY(loopPose) - velocityY(sourcePose);
        double[] jet = new double[GradientField.JET_SIZE];
        double[] sums = new double[5];
        EdgeQuadrature.STANDARD.closedPath((x, y, dx, dy, out) -> {
            source.jet(x, y, jet);
            double ux = ux0 - omega * y;
            double uy = uy0 + omega * x;
            double bz = jet[6];
            out[0] = jet[0] * dx + jet[1] * dy;
            out[1] = (ux * jet[2] + uy * jet[3] + omega * jet[1]) * dx + (ux * jet[4] + uy * jet[5] - omega * jet[0]) * dy;
            out[2] = bz * (uy * dx - ux * dy);
            out[3] = bz * dy;
            out[4] = -bz * dx;
        }, loop.xs(), loop.ys(), sums, source.breaks());
        return new RigidPair(sums[0], sums[1], sums[2], sums[3], sums[4]);
    }

    /** x of v(r) − ω ẑ × r, the part of the body's velocity field that does not depend on r. */
    private static double velocityX(Pose pose) {
        return pose.velocity().x() + pose.omegaRadPerS() * (pose.pivot().y() + pose.offset().y());
    }

    private static double velocityY(Pose pose) {
        return pose.velocity().y() - pose.omegaRadPerS() * (pose.pivot().x() + pose.offset().x());
    }
}
