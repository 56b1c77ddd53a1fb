package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.solver.field.PlaneField;

/**
 * Gauss–Legendre line integrals of a potential. A gradient field A = ∇φ has a path-independent
 * line integral φ(end) − φ(start) (fundamental theorem for gradients; Griffiths, <i>Introduction
 * to Electrodynamics</i>, 4th ed., 2013, §1.3.3), which gives exact references for integrands
 * that are not polynomials.
 */
class PotentialIntegralTest {

    /** A = ∇ ln|r − r0| with r0 = (X0, Y0): smooth, varying on the scale of the distance to r0. */
    private static final double X0 = 0.3;
    private static final double Y0 = 0.4;

    private static final PlaneField LOG_GRADIENT = new PlaneField() {
        @Override
        public double bz(double x, double y) {
            return 0;
        }

        @Override
        public boolean hasPhysicalPotential() {
            return true;
        }

        @Override
        public void potential(double x, double y, double[] out) {
            double dx = x - X0;
            double dy = y - Y0;
            double r2 = dx * dx + dy * dy;
            out[0] = dx / r2;
            out[1] = dy / r2;
        }

        @Override
        public double flux(double[] xs, double[] ys) {
            return 0;
        }

        @Override
        public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
            out[0] = 0;
            out[1] = 0;
        }
    };

    private static double phi(double x, double y) {
        return 0.5 * Math.log((x - X0) * (x - X0) + (y - Y0) * (y - Y0));
    }

    private static PlacedConductor wire(double... xy) {
        int n = xy.length / 2;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = xy[2 * i];
            ys[i] = xy[2 * i + 1];
        }
        return new PlacedConductor(xs, ys, new double[n], new double[n], false);
    }

    @Test
    void lineIntegralOfAGradientIsTheChangeOfItsPotential() {
        // The wire passes 0.1 m from r0 at its closest; pieces of 0.1 m keep 8 nodes within reach.
        PlacedConductor w = wire(-1, 0.3, 2, 0.3, 2, 1.5, -0.5, 2);
        double expected = phi(-0.5, 2) - phi(-1, 0.3);
        assertEquals(expected, PotentialIntegral.along(LOG_GRADIENT, w, 0.1), 1e-10);
    }

    @Test
    void accuracyImprovesWithShorterPieces() {
        PlacedConductor w = wire(-1, 0.3, 2, 0.3);
        double expected = phi(2, 0.3) - phi(-1, 0.3);
        double coarse = Math.abs(PotentialIntegral.along(LOG_GRADIENT, w, 3) - expected);
        double fine = Math.abs(PotentialIntegral.along(LOG_GRADIENT, w, 0.1) - expected);
        assertEquals(0, fine, 1e-10);
        assertTrue(coarse > 1e3 * fine, "one piece over 3 m " + coarse + ", 0.1 m pieces " + fine);
    }
}
