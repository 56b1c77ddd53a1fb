package org.kinduct.solver;

import org.kinduct.solver.field.PlaneField;

/**
 * Line integrals along a conductor that follow exactly from the B_z moments M0 = ∫ B_z ds,
 * M1 = ∫ s·B_z ds of its straight edges d = b − a, with the velocity varying linearly along each
 * edge between its end vertices (exact for rigid motion; for an edge whose ends ride different
 * bodies it is the velocity of the straight edge itself, which is what the flux rule needs):
 * <ul>
 *   <li>motional EMF ∫ (v × B)·dl = Σ [(d × v_a)·M0 + (d × (v_b − v_a))·M1], since for in-plane
 *       v and dl only B_z enters: (v × B)·dl = B_z (v_y dx − v_x dy) (Griffiths, <i>Introduction to
 *       Electrodynamics</i>, 4th ed., 2013, §7.1.3);</li>
 *   <li>force per ampere ∫ dl × B = Σ M0·(d_y, −d_x), in-plane part (Griffiths §5.1.3,
 *       F = I ∫ dl × B).</li>
 * </ul>
 * Per turn; exact to the accuracy of the moments.
 */
record EdgeSums(double motionalV, double forceXNPerA, double forceYNPerA) {

    static EdgeSums along(PlaneField field, PlacedConductor conductor) {
        double[] xs = conductor.xs();
        double[] ys = conductor.ys();
        double[] vx = conductor.vx();
        double[] vy = conductor.vy();
        int n = xs.length;
        double[] moments = new double[2];
        double motional = 0;
        double fx = 0;
        double fy = 0;
        for (int a = 0; a < conductor.edgeCount(); a++) {
            int b = (a + 1) % n;
            double dx = xs[b] - xs[a];
            double dy = ys[b] - ys[a];
            field.bzMoments(xs[a], ys[a], xs[b], ys[b], moments);
            motional += (dx * vy[a] - dy * vx[a]) * moments[0]
                    + (dx * (vy[b] - vy[a]) - dy * (vx[b] - vx[a])) * moments[1];
            fx += moments[0] * dy;
            fy -= moments[0] * dx;
        }
        return new EdgeSums(motional, fx, fy);
    }
}
