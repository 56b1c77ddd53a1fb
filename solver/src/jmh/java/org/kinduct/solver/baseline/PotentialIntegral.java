package org.kinduct.solver.baseline;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.kinduct.solver.baseline.field.PlaneField;

/**
 * ∫ A·dl along a conductor by Gauss–Legendre quadrature: every edge is cut into pieces no longer
 * than a given length and each piece is integrated with {@value #NODES} nodes, exact for
 * polynomials of degree 2·{@value #NODES} − 1 (Abramowitz &amp; Stegun, <i>Handbook of
 * Mathematical Functions</i>, 1964, eq. 25.4.29; from memory). The potential of a magnet or coil is
 * analytic away from its currents and varies on the scale of the distance to them, so with pieces
 * no longer than the source's smallest length (dimension plus stand-off, or plane distance) the
 * relative error is far below 1e-9; it is not trusted for a wire passing closer to a filament
 * or magnet edge than a tenth of that length. At most {@value #MAX_PIECES} pieces per edge.
 */
final class PotentialIntegral {

    static final int NODES = 8;
    static final int MAX_PIECES = 64;
    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(NODES, 0, 1);

    private PotentialIntegral() {
    }

    static double along(PlaneField field, PlacedConductor conductor, double pieceM) {
        double[] xs = conductor.xs();
        double[] ys = conductor.ys();
        int n = xs.length;
        double[] a = new double[2];
        double sum = 0;
        for (int e = 0; e < conductor.edgeCount(); e++) {
            int f = (e + 1) % n;
            double dx = xs[f] - xs[e];
            double dy = ys[f] - ys[e];
            int pieces = (int) Math.min(MAX_PIECES, Math.max(1, Math.ceil(Math.hypot(dx, dy) / pieceM)));
            double edgeSum = 0;
            for (int p = 0; p < pieces; p++) {
                for (int k = 0; k < NODES; k++) {
                    double s = (p + RULE.getPoint(k)) / pieces;
                    field.potential(xs[e] + s * dx, ys[e] + s * dy, a);
                    edgeSum += RULE.getWeight(k) * (a[0] * dx + a[1] * dy);
                }
            }
            sum += edgeSum / pieces;
        }
        return sum;
    }
}
