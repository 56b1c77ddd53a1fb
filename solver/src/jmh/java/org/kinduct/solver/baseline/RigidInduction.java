package org.kinduct.solver.baseline;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.baseline.field.PlaneField;

/**
 * The induced EMF −∫ ∂A/∂t·dl along a conductor held where it is, due to one source of constant
 * strength (a magnet, a coil with steady current) whose body moves rigidly, in closed form.
 *
 * <p>Such a source carries its potential along: A(r, t) is A at rest moved by the body's motion,
 * whose velocity field in the plane is w(r) = v + ω ẑ × (r − p). So ∂A/∂t = −L_w A, the Lie
 * derivative along w, and by Cartan's formula L_w A = ∇(w·A) − w × B (T. Frankel, <i>The
 * Geometry of Physics</i>, 3rd ed., 2011, §4.2; from memory; for a translation it is the product
 * rule ∇(u·A) = (u·∇)A + u × (∇ × A), Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed.,
 * 2013, inside front cover). Hence
 * <pre>
 *   −∫_a^b ∂A/∂t·dl = [w·A]_a^b − ∫_a^b (w × B)·dl,
 * </pre>
 * the same as a conductor moving with −w past the still source, except for the end term, which
 * is zero round a closed loop. With in-plane w and dl, (w × B)·dl = B_z (w_y dx − w_x dy); since w
 * varies linearly along a straight edge, the edge's B_z moments give it exactly
 * ({@link EdgeSums#motional}). Accuracy: that of the moments (about 1e-10 relative, see
 * {@link org.kinduct.solver.baseline.field.EdgeQuadrature}) and of the closed-form potential at the ends,
 * free of the rounding a time difference brings.
 */
final class RigidInduction {

    private RigidInduction() {
    }

    /** −∫ ∂A/∂t·dl along {@code conductor}, volts per turn, for {@code source} moving with {@code pose}. */
    static double emf(PlaneField source, Pose pose, PlacedConductor conductor) {
        double[] xs = conductor.xs();
        double[] ys = conductor.ys();
        int n = xs.length;
        double[] wx = new double[n];
        double[] wy = new double[n];
        for (int i = 0; i < n; i++) {
            Vec2 w = pose.velocityAt(new Vec2(xs[i], ys[i]));
            wx[i] = w.x();
            wy[i] = w.y();
        }
        double[] moments = new double[2];
        double emf = 0;
        for (int a = 0; a < conductor.edgeCount(); a++) {
            int b = (a + 1) % n;
            source.bzMoments(xs[a], ys[a], xs[b], ys[b], moments);
            emf -= EdgeSums.motional(xs[b] - xs[a], ys[b] - ys[a], wx[a], wy[a], wx[b], wy[b], moments);
        }
        if (!conductor.closed()) {
            double[] potential = new double[2];
            source.potential(xs[n - 1], ys[n - 1], potential);
            emf += wx[n - 1] * potential[0] + wy[n - 1] * potential[1];
            source.potential(xs[0], ys[0], potential);
            emf -= wx[0] * potential[0] + wy[0] * potential[1];
        }
        return emf;
    }
}
