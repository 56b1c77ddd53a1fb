package org.kinduct.solver.baseline;

import org.kinduct.solver.baseline.field.PlaneField;

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
 *       F = I ∫ dl × B);</li>
 *   <li>torque per ampere about a point p, ∫ (r − p) × (dl × B) = −Σ [((a − p)·d)·M0 + (d·d)·M1]
 *       (z component; the same force density with the lever arm a − p + s·d/|d|).</li>
 * </ul>
 * Per turn; exact to the accuracy of the moments. The per-edge formulas are public so that the
 * coupled simulation, which books each edge's force on its own body, uses the same ones.
 */
public record EdgeSums(double motionalV, double forceXNPerA, double forceYNPerA) {

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
            motional += motional(dx, dy, vx[a], vy[a], vx[b], vy[b], moments);
            fx += forceXPerAmpere(dy, moments);
            fy += forceYPerAmpere(dx, moments);
        }
        return new EdgeSums(motional, fx, fy);
    }

    /**
     * ∫ (v × B)·dl along one edge d = (dx, dy) whose ends move at (vax, vay) and (vbx, vby),
     * volts per turn; {@code moments} = {M0, M1} of the edge.
     */
    public static double motional(double dx, double dy, double vax, double vay, double vbx, double vby,
                                  double[] moments) {
        return (dx * vay - dy * vax) * moments[0] + (dx * (vby - vay) - dy * (vbx - vax)) * moments[1];
    }

    /** x component of ∫ dl × B along one edge, newtons per ampere-turn: M0·d_y. */
    public static double forceXPerAmpere(double dy, double[] moments) {
        return moments[0] * dy;
    }

    /** y component of ∫ dl × B along one edge, newtons per ampere-turn: −M0·d_x. */
    public static double forceYPerAmpere(double dx, double[] moments) {
        return -moments[0] * dx;
    }

    /**
     * z torque of ∫ dl × B along one edge about p, given the edge's start relative to p
     * (ax, ay) = a − p: −[((a − p)·d)·M0 + (d·d)·M1], newton-metres per ampere-turn.
     */
    public static double torquePerAmpere(double ax, double ay, double dx, double dy, double[] moments) {
        return -((ax * dx + ay * dy) * moments[0] + (dx * dx + dy * dy) * moments[1]);
    }
}
