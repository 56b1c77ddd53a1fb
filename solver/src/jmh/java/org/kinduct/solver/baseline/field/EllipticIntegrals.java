package org.kinduct.solver.baseline.field;

/**
 * Bulirsch's generalized complete elliptic integral
 * <pre>
 *   cel(kc, p, c, s) = ∫₀^{π/2} (c·cos²φ + s·sin²φ) / [(cos²φ + p·sin²φ)·√(cos²φ + kc²·sin²φ)] dφ
 * </pre>
 * computed by Bulirsch's descending Landen (AGM-type) iteration: R. Bulirsch, "Numerical
 * calculation of elliptic integrals and elliptic functions. III", Numer. Math. 13, 305–315
 * (1969), algorithm {@code cel}; in the form printed in N. Derby &amp; S. Olbert, "Cylindrical
 * magnets and ideal solenoids", Am. J. Phys. 78(3), 229–235 (2010), appendix.
 *
 * <p>Special cases with the parameter m = k² = 1 − kc²: K(m) = cel(kc, 1, 1, 1),
 * E(m) = cel(kc, 1, 1, kc²), Π(n|m) = cel(kc, 1 − n, 1, 1) (DLMF §19.2(iii)). Being linear in
 * (c, s), one call evaluates any combination a·K + b·E.
 *
 * <p>Accuracy: the iteration converges quadratically and stops when the relative change falls
 * below √ε, so the result is good to a few ulp for kc ≠ 0 and p &gt; 0. p ≤ 0 takes Bulirsch's
 * transformation branch (Cauchy principal value for p &lt; 0). kc = 0 (k = 1) diverges and
 * returns NaN.
 */
public final class EllipticIntegrals {

    /** √ε: with quadratic convergence the next step after this relative change is exact to ε. */
    private static final double RELATIVE_STOP = Math.sqrt(Math.ulp(1.0));
    /** Quadratic convergence needs fewer than 10 steps for any double kc; a hard stop for safety. */
    private static final int MAX_STEPS = 60;

    private EllipticIntegrals() {
    }

    /** Bulirsch's cel(kc, p, c, s); see the class documentation. */
    public static double cel(double kc, double p, double c, double s) {
        if (kc == 0) {
            return Double.NaN;
        }
        double k = Math.abs(kc);
        double pp;
        double cc = c;
        double ss = s;
        if (p > 0) {
            pp = Math.sqrt(p);
            ss = s / pp;
        } else {
            double f = kc * kc;
            double q = 1 - f;
            double g = 1 - p;
            f -= p;
            q *= s - c * p;
            pp = Math.sqrt(f / g);
            cc = (c - s) / g;
            ss = -q / (g * g * pp) + cc * pp;
        }
        double em = 1;
        double f = cc;
        cc += ss / pp;
        double g = k / pp;
        ss = 2 * (ss + f * g);
        pp += g;
        g = em;
        em += k;
        double kk = k;
        for (int step = 0; Math.abs(g - k) > g * RELATIVE_STOP && step < MAX_STEPS; step++) {
            k = 2 * Math.sqrt(kk);
            kk = k * em;
            f = cc;
            cc += ss / pp;
            g = kk / pp;
            ss = 2 * (ss + f * g);
            pp += g;
            g = em;
            em += k;
        }
        return Math.PI / 2 * (ss + cc * em) / (em * (em + pp));
    }
}
