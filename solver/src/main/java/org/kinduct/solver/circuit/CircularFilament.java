package org.kinduct.solver.circuit;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;

/**
 * Vector potential of a circular current filament of radius a (axis along z), per ampere:
 * A_φ(ρ, z) = (μ0·a/π)·[(2 − m)·K(m) − 2·E(m)] / (m·√((a + ρ)² + z²)),
 * m = 4aρ/((a + ρ)² + z²) (Jackson, <i>Classical Electrodynamics</i>, 3rd ed., 1999, eq. 5.37;
 * Smythe, <i>Static and Dynamic Electricity</i>, 1950). K and E take the parameter m = k²
 * (Hipparchus' convention). {@link #aPhiOverRho} returns A_φ/ρ, which stays finite on the axis:
 * the bracket is replaced by its series (π/16)·m²·[1 + 3m/4 + 75m²/128] for m &lt; {@value #SERIES_M}
 * (from the series of K and E, DLMF 19.5.1–2), where the closed form loses digits to cancellation.
 * Singular on the filament itself (z = 0, ρ = a); callers keep z ≠ 0.
 */
final class CircularFilament {

    static final double SERIES_M = 1e-3;

    private CircularFilament() {
    }

    /** A_φ/ρ at cylindrical radius ρ and height z relative to the loop centre, T per ampere. */
    static double aPhiOverRho(double radiusM, double rho, double z) {
        double d2 = (radiusM + rho) * (radiusM + rho) + z * z;
        double d = Math.sqrt(d2);
        // m/ρ without dividing by ρ (finite on the axis).
        double mOverRho = 4 * radiusM / d2;
        double m = mOverRho * rho;
        double bracketOverM2;
        if (m < SERIES_M) {
            bracketOverM2 = Math.PI / 16 * (1 + 0.75 * m + 75.0 / 128 * m * m);
        } else {
            double k = LegendreEllipticIntegral.bigK(m);
            double e = LegendreEllipticIntegral.bigE(m);
            bracketOverM2 = ((2 - m) * k - 2 * e) / (m * m);
        }
        // A_φ/ρ = (μ0 a/π)·bracket/(m·d·ρ) = (μ0 a/π)·(bracket/m²)·(m/ρ)/d.
        return SegmentInductance.MU0 * radiusM / Math.PI * bracketOverM2 * mOverRho / d;
    }
}
