package org.kinduct.solver.circuit;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Adaptive Gauss–Legendre quadrature by bisection: an interval is accepted when the
 * {@value #ORDER}-point rule on it and the sum of the rules on its halves agree to
 * {@code max(absTol, relTol·|estimate|)}. Integrable end-point singularities (logarithmic, as in
 * Neumann's integral where filaments touch) are handled by bisection toward them; the depth
 * budget {@value #MAX_DEPTH} bounds the work (an interval at that depth is accepted as is, which
 * at a log singularity leaves an error of order 2^-MAX_DEPTH of the interval length).
 */
final class AdaptiveGauss {

    static final int ORDER = 8;
    static final int MAX_DEPTH = 40;

    private static final double[] NODES = new double[ORDER];
    private static final double[] WEIGHTS = new double[ORDER];

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER, 0, 1);
        for (int i = 0; i < ORDER; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    private AdaptiveGauss() {
    }

    /** ∫_a^b f, to {@code relTol} of the result (or {@code absTol} when the result is near zero). */
    static double integrate(DoubleUnaryOperator f, double a, double b, double relTol, double absTol) {
        double whole = rule(f, a, b);
        return refine(f, a, b, whole, relTol, Math.max(absTol, relTol * Math.abs(whole)), 0);
    }

    private static double refine(DoubleUnaryOperator f, double a, double b, double whole, double relTol,
                                 double tol, int depth) {
        double m = 0.5 * (a + b);
        double left = rule(f, a, m);
        double right = rule(f, m, b);
        double sum = left + right;
        if (Math.abs(sum - whole) <= tol || depth >= MAX_DEPTH) {
            return sum;
        }
        // Each half gets half the tolerance so the errors add up to at most tol.
        return refine(f, a, m, left, relTol, 0.5 * tol, depth + 1)
                + refine(f, m, b, right, relTol, 0.5 * tol, depth + 1);
    }

    private static double rule(DoubleUnaryOperator f, double a, double b) {
        double h = b - a;
        double s = 0;
        for (int i = 0; i < ORDER; i++) {
            s += WEIGHTS[i] * f.applyAsDouble(a + h * NODES[i]);
        }
        return s * h;
    }
}
