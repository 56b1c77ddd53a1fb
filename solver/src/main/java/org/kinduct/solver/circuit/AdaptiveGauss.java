package org.kinduct.solver.circuit;

import java.util.PriorityQueue;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Globally adaptive Gauss–Legendre quadrature by bisection (the scheme of QUADPACK's QAG:
 * Piessens, de Doncker-Kapenga, Überhuber &amp; Kahaner, <i>QUADPACK</i>, Springer 1983): each
 * interval carries the {@value #ORDER}-point rule on its halves and, as its error estimate, their
 * difference from the rule on the whole; the interval with the largest estimate is bisected
 * until the estimates sum to at most {@code max(absTol, relTol·|integral|)}. Integrable end-point
 * singularities (logarithmic, as in Neumann's integral where filaments touch) are resolved by
 * bisection toward them, a few intervals per halving of the error. The work is bounded: after
 * {@value #MAX_EVALUATIONS} evaluations of the integrand the integral is refused with the
 * accuracy it reached, instead of bisecting on (a depth-first bisection to depth 40 could take
 * 2^40 steps on an integrand that does not settle).
 */
final class AdaptiveGauss {

    static final int ORDER = 8;
    /** Evaluation budget of one integral: about 1250 intervals. */
    static final int MAX_EVALUATIONS = 20_000;

    private static final double[] NODES = new double[ORDER];
    private static final double[] WEIGHTS = new double[ORDER];

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER, 0, 1);
        for (int i = 0; i < ORDER; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    /** An interval with the rule on its halves (left, right) and the error estimate of their sum. */
    private record Piece(double a, double b, double left, double right, double error) {
        double value() {
            return left + right;
        }
    }

    private AdaptiveGauss() {
    }

    /**
     * ∫_a^b f, to {@code relTol} of the result (or {@code absTol} when the result is near zero).
     *
     * @throws IllegalArgumentException when the tolerance is not met within the evaluation budget,
     *         saying what accuracy was reached
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, double relTol, double absTol) {
        PriorityQueue<Piece> pieces = new PriorityQueue<>((p, q) -> Double.compare(q.error(), p.error()));
        Piece whole = split(f, a, b, rule(f, a, b));
        int evaluations = 3 * ORDER;
        pieces.add(whole);
        double sum = whole.value();
        double error = whole.error();
        while (error > Math.max(absTol, relTol * Math.abs(sum))) {
            if (evaluations + 4 * ORDER > MAX_EVALUATIONS) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT, "a line integral did not"
                        + " converge: relative error %.1e after %d evaluations (%.0e asked for)",
                        error / Math.abs(sum), evaluations, relTol));
            }
            Piece worst = pieces.poll();
            double m = 0.5 * (worst.a() + worst.b());
            Piece left = split(f, worst.a(), m, worst.left());
            Piece right = split(f, m, worst.b(), worst.right());
            evaluations += 4 * ORDER;
            pieces.add(left);
            pieces.add(right);
            sum += left.value() + right.value() - worst.value();
            error += left.error() + right.error() - worst.error();
        }
        // The running sums may drift by rounding; add the pieces afresh.
        double total = 0;
        for (Piece p : pieces) {
            total += p.value();
        }
        return total;
    }

    /** [a, b] with the rule on its halves; {@code whole} is the rule on all of it. */
    private static Piece split(DoubleUnaryOperator f, double a, double b, double whole) {
        double m = 0.5 * (a + b);
        double left = rule(f, a, m);
        double right = rule(f, m, b);
        return new Piece(a, b, left, right, Math.abs(left + right - whole));
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
