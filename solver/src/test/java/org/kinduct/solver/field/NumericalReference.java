package org.kinduct.solver.field;

import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Brute-force reference integrals for the tests: composite Gauss–Legendre on uniform panels,
 * deliberately simple and independent of the production quadrature and closed forms.
 */
final class NumericalReference {

    private static final int POINTS = 20;
    private static final double[] NODES = new double[POINTS];
    private static final double[] WEIGHTS = new double[POINTS];

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(POINTS, 0, 1);
        for (int i = 0; i < POINTS; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    /** A function of two variables for the 2-D rules. */
    @FunctionalInterface
    interface Surface {
        double at(double x, double y);
    }

    private NumericalReference() {
    }

    /** ∫_a^b f with {@code panels} equal panels of 20-point Gauss–Legendre. */
    static double integrate(DoubleUnaryOperator f, double a, double b, int panels) {
        double h = (b - a) / panels;
        double sum = 0;
        for (int p = 0; p < panels; p++) {
            double lo = a + p * h;
            for (int k = 0; k < POINTS; k++) {
                sum += WEIGHTS[k] * f.applyAsDouble(lo + h * NODES[k]);
            }
        }
        return sum * h;
    }

    /** ∬ f over the rectangle [x0, x1] × [y0, y1], {@code panels} × {@code panels} panels. */
    static double integrateRectangle(Surface f, double x0, double x1, double y0, double y1, int panels) {
        return integrate(x -> integrate(y -> f.at(x, y), y0, y1, panels), x0, x1, panels);
    }

    /**
     * Signed ∬ f dA over the polygon, as a fan of triangles from vertex 0 (a convex polygon, or
     * any polygon star-shaped from vertex 0); each triangle by the collapsed-square (Duffy) map
     * P0 + u(P1 − P0) + uv(P2 − P1), Jacobian u·(P1 − P0)×(P2 − P1).
     */
    static double integratePolygon(Surface f, double[] xs, double[] ys, int panels) {
        double total = 0;
        for (int i = 1; i + 1 < xs.length; i++) {
            double x0 = xs[0];
            double y0 = ys[0];
            double ex = xs[i] - x0;
            double ey = ys[i] - y0;
            double fx = xs[i + 1] - xs[i];
            double fy = ys[i + 1] - ys[i];
            double cross = ex * fy - ey * fx;
            total += cross * integrate(u -> u * integrate(
                    v -> f.at(x0 + u * ex + u * v * fx, y0 + u * ey + u * v * fy), 0, 1, panels), 0, 1, panels);
        }
        return total;
    }

    /**
     * B_z at (x, y, 0) of a current path r(τ), τ ∈ [τ0, τ1], by numerical Biot–Savart:
     * (μ0 I/4π)∫ (dl × (r_P − r))_z / |r_P − r|³ (Griffiths ch. 5, eq. of the Biot–Savart law).
     */
    static double biotSavartBz(Path path, double currentA, double x, double y, double t0, double t1, int panels) {
        double[] p = new double[6];
        return PhysicalConstants.MU_0_OVER_4PI * currentA * integrate(t -> {
            path.at(t, p);
            double rx = x - p[0];
            double ry = y - p[1];
            double rz = -p[2];
            double r = Math.sqrt(rx * rx + ry * ry + rz * rz);
            return (p[3] * ry - p[4] * rx) / (r * r * r);
        }, t0, t1, panels);
    }

    /** (A_x, A_y) at (x, y, 0) of a current path: (μ0 I/4π)∫ dl/|r_P − r|. */
    static double[] potential(Path path, double currentA, double x, double y, double t0, double t1, int panels) {
        double[] p = new double[6];
        double[] out = new double[2];
        for (int component = 0; component < 2; component++) {
            int c = component;
            out[c] = PhysicalConstants.MU_0_OVER_4PI * currentA * integrate(t -> {
                path.at(t, p);
                double rx = x - p[0];
                double ry = y - p[1];
                double rz = -p[2];
                return p[3 + c] / Math.sqrt(rx * rx + ry * ry + rz * rz);
            }, t0, t1, panels);
        }
        return out;
    }

    /** A parametrized current path: writes position (0..2) and tangent dr/dτ (3..5). */
    @FunctionalInterface
    interface Path {
        void at(double t, double[] out);
    }

    static Path segment(double ax, double ay, double bx, double by, double z) {
        return (t, out) -> {
            out[0] = ax + t * (bx - ax);
            out[1] = ay + t * (by - ay);
            out[2] = z;
            out[3] = bx - ax;
            out[4] = by - ay;
            out[5] = 0;
        };
    }

    static Path circle(double cx, double cy, double radius, double z) {
        return (t, out) -> {
            out[0] = cx + radius * Math.cos(t);
            out[1] = cy + radius * Math.sin(t);
            out[2] = z;
            out[3] = -radius * Math.sin(t);
            out[4] = radius * Math.cos(t);
            out[5] = 0;
        };
    }
}
