package org.kinduct.solver.field;

import static org.kinduct.solver.field.PhysicalConstants.MU_0_OVER_4PI;

/**
 * Closed forms for a straight current filament from (ax, ay, z0) to (bx, by, z0), evaluated at a
 * field point (x, y, 0) of the drawing plane. Current I &gt; 0 flows from a to b.
 *
 * <p>Biot–Savart for a finite segment (D. J. Griffiths, <i>Introduction to Electrodynamics</i>,
 * ch. 5, the straight-wire example): B = (μ0 I / 4π d)(cos θ1 − cos θ2) along û × d̂, d the
 * distance from the field point to the filament's line. Its vector potential, the integral
 * (μ0 I / 4π)∫ dl/r of Griffiths ch. 5 (vector potential), is A = (μ0 I / 4π) û · ln[(R1 + R2 + L)/(R1 + R2 − L)]
 * = (μ0 I / 4π) û · [asinh(t1/d) − asinh(t2/d)], with t1, t2 the field point's coordinates
 * along û measured from a and from b.
 *
 * <p>Numerics: both are evaluated in forms free of cancellation (difference of cosines and of
 * asinh rewritten as a quotient or log1p when t1 and t2 have the same sign), so the relative
 * accuracy is a few ulp everywhere, including far out along the filament's line. The
 * field is singular only on the filament itself, which z0 ≠ 0 keeps off the plane.
 */
public final class StraightFilament {

    private StraightFilament() {
    }

    /** B_z at (x, y, 0), tesla, of current {@code currentA} from (ax, ay, z0M) to (bx, by, z0M). */
    public static double bz(double ax, double ay, double bx, double by, double z0M, double currentA,
                            double x, double y) {
        double len = Math.hypot(bx - ax, by - ay);
        return bz(ax, ay, (bx - ax) / len, (by - ay) / len, len, z0M, currentA, x, y);
    }

    /**
     * Adds the vector potential (A_x, A_y) at (x, y, 0), T·m, of current {@code currentA} from
     * (ax, ay, z0M) to (bx, by, z0M) to {@code out[0..1]}.
     */
    public static void addPotential(double ax, double ay, double bx, double by, double z0M, double currentA,
                                    double x, double y, double[] out) {
        double len = Math.hypot(bx - ax, by - ay);
        double ux = (bx - ax) / len;
        double uy = (by - ay) / len;
        double a = potentialAlong(ax, ay, ux, uy, len, z0M, currentA, x, y);
        out[0] += a * ux;
        out[1] += a * uy;
    }

    /** B_z for a segment given by its start, unit direction (ux, uy) and length, metres. */
    static double bz(double ax, double ay, double ux, double uy, double len, double z0M, double currentA,
                     double x, double y) {
        double rx = x - ax;
        double ry = y - ay;
        double cross = ux * ry - uy * rx;
        double t1 = ux * rx + uy * ry;
        double t2 = t1 - len;
        double d2 = cross * cross + z0M * z0M;
        double r1 = Math.sqrt(t1 * t1 + d2);
        double r2 = Math.sqrt(t2 * t2 + d2);
        // (cos θ1 − cos θ2)/d² with cos θ1 = t1/R1, cos θ2 = t2/R2; the quotient form avoids
        // the cancellation of two nearly equal cosines when the foot lies outside the segment.
        double cosDifferenceOverD2 = t1 * t2 > 0
                ? len * (t1 + t2) / (r1 * r2 * (t1 * r2 + t2 * r1))
                : (t1 / r1 - t2 / r2) / d2;
        return MU_0_OVER_4PI * currentA * cross * cosDifferenceOverD2;
    }

    /** The component of A along the segment's direction, T·m (A itself is parallel to it). */
    static double potentialAlong(double ax, double ay, double ux, double uy, double len, double z0M,
                                 double currentA, double x, double y) {
        double rx = x - ax;
        double ry = y - ay;
        double cross = ux * ry - uy * rx;
        double t1 = ux * rx + uy * ry;
        double t2 = t1 - len;
        double d2 = cross * cross + z0M * z0M;
        double r1 = Math.sqrt(t1 * t1 + d2);
        double r2 = Math.sqrt(t2 * t2 + d2);
        return MU_0_OVER_4PI * currentA * asinhDifference(t1, t2, r1, r2, d2, len);
    }

    /**
     * Adds the filament's share of {@link GradientField#jet} at (x, y, 0) to {@code out[0..6]}, for
     * a segment given as in {@link #bz(double, double, double, double, double, double, double, double, double)}.
     * With A = a·û: ∂a/∂t = (μ0 I/4π)(1/R1 − 1/R2) along û (t1 and t2 move together) and ∂a/∂n =
     * −B_z across it (n̂ = ẑ × û, the derivative of the asinh difference through d, which is the
     * Biot–Savart form above), so ∂A_i/∂x_j = û_i·∂a/∂x_j.
     */
    static void addJet(double ax, double ay, double ux, double uy, double len, double z0M, double currentA,
                       double x, double y, double[] out) {
        double rx = x - ax;
        double ry = y - ay;
        double cross = ux * ry - uy * rx;
        double t1 = ux * rx + uy * ry;
        double t2 = t1 - len;
        double d2 = cross * cross + z0M * z0M;
        double r1 = Math.sqrt(t1 * t1 + d2);
        double r2 = Math.sqrt(t2 * t2 + d2);
        double k = MU_0_OVER_4PI * currentA;
        double a = k * asinhDifference(t1, t2, r1, r2, d2, len);
        double cosDifferenceOverD2 = t1 * t2 > 0
                ? len * (t1 + t2) / (r1 * r2 * (t1 * r2 + t2 * r1))
                : (t1 / r1 - t2 / r2) / d2;
        double bz = k * cross * cosDifferenceOverD2;
        // 1/R1 − 1/R2 = (R2 − R1)/(R1·R2), R2 − R1 = (t2² − t1²)/(R1 + R2) = −len·(t1 + t2)/(R1 + R2).
        double along = -k * len * (t1 + t2) / ((r1 + r2) * r1 * r2);
        double ddx = along * ux + bz * uy;
        double ddy = along * uy - bz * ux;
        out[0] += a * ux;
        out[1] += a * uy;
        out[2] += ux * ddx;
        out[3] += ux * ddy;
        out[4] += uy * ddx;
        out[5] += uy * ddy;
        out[6] += bz;
    }

    /**
     * asinh(t1/d) − asinh(t2/d) for t1 − t2 = len &gt; 0, R_i = √(t_i² + d²): the log of a ratio near 1
     * goes through log1p when t1, t2 share a sign, otherwise the two asinh add without cancelling.
     */
    static double asinhDifference(double t1, double t2, double r1, double r2, double d2, double len) {
        if (t2 >= 0) {
            return log1p(len * (1 + (t1 + t2) / (r1 + r2)) / (t2 + r2));
        }
        if (t1 <= 0) {
            return log1p(len * (1 - (t1 + t2) / (r1 + r2)) / (r1 - t1));
        }
        return Math.log((t1 + r1) * (r2 - t2) / d2);
    }

    /**
     * ln(1 + x) for x ≥ 0 through the intrinsic {@link Math#log}: with u = 1 + x rounded,
     * ln(u)·x/(u − 1) is within a few ulp of ln(1 + x) (D. Goldberg, "What every computer scientist
     * should know about floating-point arithmetic", ACM Comput. Surv. 23(1), 1991, Theorem 4), and
     * x itself when u rounds to 1. {@link Math#log1p} gives the same accuracy several times slower,
     * and the closed-form potentials call it in every ribbon and filament term.
     */
    static double log1p(double x) {
        double u = 1 + x;
        return u == 1 ? x : Math.log(u) * x / (u - 1);
    }
}
