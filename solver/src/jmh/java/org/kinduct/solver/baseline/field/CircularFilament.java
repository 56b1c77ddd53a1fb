package org.kinduct.solver.baseline.field;

import static org.kinduct.solver.baseline.field.PhysicalConstants.MU_0;

/**
 * Closed forms for a circular current filament of radius a, coaxial with z, at axial offset
 * dz = z_field − z_loop from the field point, which lies at distance ρ from the axis. Current
 * I &gt; 0 circulates counter-clockwise seen from +z.
 *
 * <p>B_z: Simpson, Lane, Immer &amp; Youngquist, "Simple analytic expressions for the magnetic
 * field of a circular current loop", NASA technical report 20010038494 (2001): with C = μ0 I/π,
 * α² = (a − ρ)² + dz², β² = (a + ρ)² + dz², m = 1 − α²/β²,
 * B_z = C/(2α²β)·[(a² − ρ² − dz²)E(m) + α²K(m)]. Written as one Bulirsch integral,
 * B_z = C·a/(α²β)·cel(kc, 1, a − ρ, (a + ρ)kc²) with kc = α/β. The form is regular on the axis
 * (m = 0 gives μ0 I a²/(2(a² + dz²)^{3/2})), so no separate axis branch is needed.
 *
 * <p>A_φ: J. D. Jackson, <i>Classical Electrodynamics</i>, 3rd ed. (1999), eq. 5.37, in the
 * parameter m = k² = 4aρ/β²: A_φ = (μ0 I a/(πβ))·2[(1 − m/2)K(m) − E(m)]/m
 * = (μ0 I a/(πβ))·cel(kc, 1, −1, 1). For small m the bracket cancels to O(m²), so below
 * {@value #SERIES_BELOW_M} it is summed from the power series of K and E (Abramowitz &amp; Stegun,
 * <i>Handbook of Mathematical Functions</i>, 17.3.11–12), whose coefficients
 * c_n = a_n·2n/(2n − 1) − a_{n−1}/2, a_n = [(2n − 1)!!/(2n)!!]², give
 * 2[(1 − m/2)K − E]/m = π Σ_{n≥2} c_n m^{n−1}.
 *
 * <p>Accuracy: a few ulp relative, except within ~1e-8·a of the filament itself (α → 0), where
 * both quantities diverge logarithmically or as 1/α.
 */
public final class CircularFilament {

    /** Below this m the series is used for A_φ; the cel form loses about ε/m relative there. */
    static final double SERIES_BELOW_M = 0.05;
    /** 0.05^14 ≈ 6e-19: the series is exhausted well before this many terms. */
    private static final int MAX_SERIES_TERMS = 40;

    private CircularFilament() {
    }

    /** B_z, tesla, of a loop of radius {@code radiusM} carrying {@code currentA}; see class doc. */
    public static double bz(double radiusM, double dzM, double currentA, double rhoM) {
        double a = radiusM;
        double sum = a + rhoM;
        double diff = a - rhoM;
        double alpha2 = diff * diff + dzM * dzM;
        double beta2 = sum * sum + dzM * dzM;
        double beta = Math.sqrt(beta2);
        double kc2 = alpha2 / beta2;
        return MU_0 / Math.PI * currentA * a / (alpha2 * beta)
                * EllipticIntegrals.cel(Math.sqrt(kc2), 1, diff, sum * kc2);
    }

    /** Azimuthal vector potential A_φ, T·m, of the same loop; A_φ &gt; 0 along φ̂ (counter-clockwise). */
    public static double aPhi(double radiusM, double dzM, double currentA, double rhoM) {
        double a = radiusM;
        double sum = a + rhoM;
        double diff = a - rhoM;
        double beta2 = sum * sum + dzM * dzM;
        double m = 4 * a * rhoM / beta2;
        double bracket = m < SERIES_BELOW_M
                ? smallParameterSeries(m)
                : EllipticIntegrals.cel(Math.sqrt((diff * diff + dzM * dzM) / beta2), 1, -1, 1);
        return MU_0 / Math.PI * currentA * a / Math.sqrt(beta2) * bracket;
    }

    /** 2[(1 − m/2)K(m) − E(m)]/m by its power series; see the class documentation. */
    static double smallParameterSeries(double m) {
        double previousA = 0.25;
        double power = m;
        double sum = 0;
        for (int n = 2; n < MAX_SERIES_TERMS; n++) {
            double ratio = (2.0 * n - 1) / (2.0 * n);
            double an = previousA * ratio * ratio;
            double term = (an * 2 * n / (2 * n - 1) - previousA / 2) * power;
            sum += term;
            if (Math.abs(term) <= 1e-17 * Math.abs(sum)) {
                break;
            }
            previousA = an;
            power *= m;
        }
        return Math.PI * sum;
    }
}
