package org.kinduct.solver.field;

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

    /**
     * cel(kc, p, 1, 0), cel(kc, p, 0, 1), cel(kc, 1, 1, 0) and cel(kc, 1, 0, 1) into out[0..3], in
     * one iteration. The iteration's sequence in kc is the same for every p, and each step is linear
     * in (c, s), so any cel(kc, p, c, s) = c·out[0] + s·out[1] and cel(kc, 1, c, s) = c·out[2] +
     * s·out[3]: a cylinder magnet's field and potential need three integrals at one kc, made here
     * for the square roots of one.
     */
    public static void celBases(double kc, double p, double[] out) {
        if (kc == 0) {
            java.util.Arrays.fill(out, 0, 4, Double.NaN);
            return;
        }
        double k = Math.abs(kc);
        // Bulirsch's start for (c, s) = (1, 0) and (0, 1) at p, and at p = 1 (where pp = 1, ss = s).
        double pp;
        double c1;
        double s1;
        double c2;
        double s2;
        if (p > 0) {
            pp = Math.sqrt(p);
            c1 = 1;
            s1 = 0;
            c2 = 0;
            s2 = 1 / pp;
        } else {
            double f = kc * kc;
            double q = 1 - f;
            double g = 1 - p;
            f -= p;
            pp = Math.sqrt(f / g);
            c1 = 1 / g;
            s1 = q * p / (g * g * pp) + c1 * pp;
            c2 = -1 / g;
            s2 = -q / (g * g * pp) + c2 * pp;
        }
        double c3 = 1;
        double s3 = 0;
        double c4 = 0;
        double s4 = 1;
        double pu = 1;
        double em = 1;
        double kk = k;
        // Bulirsch's step for both p at once; its first pass has kk = k (the loop's update comes after).
        for (int step = 0; ; step++) {
            double inv = 1 / pp;
            double g = kk * inv;
            double f = c1;
            c1 += s1 * inv;
            s1 = 2 * (s1 + f * g);
            f = c2;
            c2 += s2 * inv;
            s2 = 2 * (s2 + f * g);
            pp += g;
            double invU = 1 / pu;
            double gu = kk * invU;
            f = c3;
            c3 += s3 * invU;
            s3 = 2 * (s3 + f * gu);
            f = c4;
            c4 += s4 * invU;
            s4 = 2 * (s4 + f * gu);
            pu += gu;
            double previous = em;
            em += k;
            if (!(Math.abs(previous - k) > previous * RELATIVE_STOP) || step == MAX_STEPS) {
                break;
            }
            k = 2 * Math.sqrt(kk);
            kk = k * em;
        }
        double scale = Math.PI / 2 / (em * (em + pp));
        out[0] = scale * (s1 + c1 * em);
        out[1] = scale * (s2 + c2 * em);
        double scaleU = Math.PI / 2 / (em * (em + pu));
        out[2] = scaleU * (s3 + c3 * em);
        out[3] = scaleU * (s4 + c4 * em);
    }
}
