package org.kinduct.solver.sheet;

import java.util.Arrays;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;

/**
 * The plate's self-inductance between grid nodes, dimensionless: L(Δi, Δj) = μ0·h·ℓ(Δi, Δj) is the
 * flux, weighted by the bilinear hat of one node, of the field of a unit stream function (1 A)
 * spread as the bilinear hat of a node Δ = (Δi, Δj) cells away, h the cell size.
 *
 * <p>Derivation. A sheet current K = ∇ψ × ẑ in z = 0 has, in its plane, B̂_z = (μ0/2)|k|ψ̂
 * (see {@link PlateSolver}), so with ψ = Σ ψ_m N_m (N_m the hat of node m, N(x, y) =
 * t(x/h)·t(y/h), t(s) = max(0, 1 − |s|)) the hat-weighted flux is Φ_n = ∫ N_n B_z dA = Σ L_nm ψ_m,
 * L_nm = (μ0/2)⟨N_n, Λ N_m⟩ with Λ = (−∇²)^{1/2}. In cell units this is (μ0·h/2)·(Λf)(Δ) with f the
 * hat's autocorrelation, f(x, y) = B(x)·B(y), B the centred cubic B-spline (support [−2, 2]).
 * Λ = −∇²∘Λ⁻¹ and Λ⁻¹ has the kernel 1/(2π|r|) in the plane (the 2-D Fourier transform of 1/|r|
 * is 2π/|k|; e.g. Stein, <i>Singular Integrals</i>, 1970, ch. V), so
 * ℓ(Δ) = −(1/4π)·∇²U(Δ), U(r) = ∫ f(a)/|r − a| d²a, and moving the Laplacian onto the C² density,
 * ∇²U(r) = ∫ g(a)/|r − a| d²a with g = ∇²f = B''(x)B(y) + B(x)B''(y).
 *
 * <p>Evaluation. Near offsets (both |Δi|, |Δj| ≤ {@value #NEAR}): in polar coordinates about r the
 * singularity cancels, ∇²U(r) = ∫₀^{2π} dθ ∫₀^∞ g(r + ρ(cos θ, sin θ)) dρ; along a ray g is a
 * polynomial of degree ≤ 4 between the grid lines it crosses, integrated exactly by 3-point
 * Gauss–Legendre, and the angle is split at the directions to the 25 nodes of the support, between
 * which the ray integral is smooth (Gauss–Legendre, {@value #ANGLE_POINTS} points per piece;
 * doubling them changes ℓ by less than 1e-14). Far offsets: outside the support
 * ∇²U = ∫ f(a)·|r − a|⁻³ d²a (∇²(1/r) = 1/r³ in the plane), expanded in the moments of f
 * (per axis ⟨x²⟩ = 1/3, ⟨x⁴⟩ = 3/10): K + ½⟨x²⟩∇²K + (1/24)[⟨x⁴⟩(K_xxxx + K_yyyy) + 6⟨x²⟩²K_xxyy]
 * with K = |r|⁻³, truncation error about 8|r|⁻⁹ (below 3e-10 of the largest term where it takes
 * over). The far tail makes L ≈ −μ0·h⁴/(4π·r³): the field of a dipole ψ·h² in its own plane.
 * Checked by {@code PlateKernelTest}: the lattice sum is zero (a planar current sends no net flux
 * through its plane), near and far forms agree where both hold.
 */
final class PlateKernel {

    /** Offsets with both components at most this are integrated numerically. */
    static final int NEAR = 12;
    /** Gauss–Legendre points per angular piece. */
    static final int ANGLE_POINTS = 20;

    private static final double SECOND_MOMENT = 1.0 / 3;
    private static final double FOURTH_MOMENT = 0.3;

    private PlateKernel() {
    }

    /** ℓ(Δi, Δj), dimensionless; L = μ0·h·ℓ in henries. */
    static double value(int di, int dj) {
        int a = Math.abs(di);
        int b = Math.abs(dj);
        if (a < b) {
            int t = a;
            a = b;
            b = t;
        }
        if (a <= NEAR) {
            return NearTable.VALUES[a * (NEAR + 1) + b];
        }
        return far(a, b);
    }

    /** The multipole form, valid outside the support (max(|Δi|, |Δj|) &gt; 2). */
    static double far(double x, double y) {
        double rho = x * x + y * y;
        double r2 = 1 / rho;
        double k = Math.pow(rho, -1.5);
        double k5 = k * r2;
        double k7 = k5 * r2;
        double k9 = k7 * r2;
        double k11 = k9 * r2;
        double laplacian = 9 * k5;
        double xxxx = 45 * k7 - 630 * x * x * k9 + 945 * x * x * x * x * k11;
        double yyyy = 45 * k7 - 630 * y * y * k9 + 945 * y * y * y * y * k11;
        double xxyy = -90 * k7 + 945 * x * x * y * y * k11;
        double lapU = k + 0.5 * SECOND_MOMENT * laplacian
                + (FOURTH_MOMENT * (xxxx + yyyy) + 6 * SECOND_MOMENT * SECOND_MOMENT * xxyy) / 24;
        return -lapU / (4 * Math.PI);
    }

    /** The ray-quadrature form, valid everywhere; {@code points} Gauss points per angular piece. */
    static double near(int di, int dj, int points) {
        GaussIntegrator unit = new GaussIntegratorFactory().legendre(points, -1, 1);
        double[] breaks = new double[29];
        int n = 0;
        for (int p = -2; p <= 2; p++) {
            for (int q = -2; q <= 2; q++) {
                if (p != di || q != dj) {
                    breaks[n++] = normalized(Math.atan2(q - dj, p - di));
                }
            }
        }
        for (int k = 0; k < 4; k++) {
            breaks[n++] = k * 0.5 * Math.PI;
        }
        double[] sorted = Arrays.copyOf(breaks, n);
        Arrays.sort(sorted);
        double sum = 0;
        for (int s = 0; s < n; s++) {
            double lo = sorted[s];
            double hi = s + 1 < n ? sorted[s + 1] : sorted[0] + 2 * Math.PI;
            if (hi - lo < 1e-15) {
                continue;
            }
            double mid = 0.5 * (lo + hi);
            double half = 0.5 * (hi - lo);
            for (int g = 0; g < unit.getNumberOfPoints(); g++) {
                double theta = mid + half * unit.getPoint(g);
                sum += half * unit.getWeight(g) * ray(di, dj, Math.cos(theta), Math.sin(theta));
            }
        }
        return -sum / (4 * Math.PI);
    }

    private static double normalized(double angle) {
        return angle < 0 ? angle + 2 * Math.PI : angle;
    }

    /** 3-point Gauss–Legendre on [−1, 1]. */
    private static final double[] GAUSS_X = {-Math.sqrt(0.6), 0, Math.sqrt(0.6)};
    private static final double[] GAUSS_W = {5.0 / 9, 8.0 / 9, 5.0 / 9};

    /** ∫₀^∞ g(r + ρ·e) dρ, piecewise exact. */
    private static double ray(double x0, double y0, double ex, double ey) {
        double[] cuts = new double[12];
        int n = 0;
        cuts[n++] = 0;
        for (int line = -2; line <= 2; line++) {
            if (Math.abs(ex) > 1e-300) {
                double t = (line - x0) / ex;
                if (t > 0) {
                    cuts[n++] = t;
                }
            }
            if (Math.abs(ey) > 1e-300) {
                double t = (line - y0) / ey;
                if (t > 0) {
                    cuts[n++] = t;
                }
            }
        }
        Arrays.sort(cuts, 0, n);
        double sum = 0;
        for (int k = 0; k + 1 < n; k++) {
            double a = cuts[k];
            double b = cuts[k + 1];
            if (b - a <= 0) {
                continue;
            }
            double mx = x0 + 0.5 * (a + b) * ex;
            double my = y0 + 0.5 * (a + b) * ey;
            if (Math.abs(mx) >= 2 || Math.abs(my) >= 2) {
                continue;
            }
            double piece = 0;
            for (int g = 0; g < 3; g++) {
                double t = 0.5 * (a + b) + 0.5 * (b - a) * GAUSS_X[g];
                piece += GAUSS_W[g] * density(x0 + t * ex, y0 + t * ey);
            }
            sum += 0.5 * (b - a) * piece;
        }
        return sum;
    }

    /** g = ∇²(B(x)B(y)). */
    static double density(double x, double y) {
        return spline2(x) * spline(y) + spline(x) * spline2(y);
    }

    /** Centred cubic B-spline, the autocorrelation of the hat max(0, 1 − |s|). */
    static double spline(double s) {
        double a = Math.abs(s);
        if (a >= 2) {
            return 0;
        }
        if (a >= 1) {
            double c = 2 - a;
            return c * c * c / 6;
        }
        return 2.0 / 3 - a * a + 0.5 * a * a * a;
    }

    /** Its second derivative. */
    static double spline2(double s) {
        double a = Math.abs(s);
        if (a >= 2) {
            return 0;
        }
        if (a >= 1) {
            return 2 - a;
        }
        return -2 + 3 * a;
    }

    /** ℓ for 0 ≤ dj ≤ di ≤ NEAR, row-major in di, computed once on first use (about 0.1 s). */
    private static final class NearTable {
        static final double[] VALUES = nearTable(ANGLE_POINTS);
    }

    private static double[] nearTable(int points) {
        double[] table = new double[(NEAR + 1) * (NEAR + 1)];
        for (int a = 0; a <= NEAR; a++) {
            for (int b = 0; b <= a; b++) {
                table[a * (NEAR + 1) + b] = near(a, b, points);
            }
        }
        return table;
    }
}
