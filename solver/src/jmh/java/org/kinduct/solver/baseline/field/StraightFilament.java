package org.kinduct.solver.baseline.field;

import static org.kinduct.solver.baseline.field.PhysicalConstants.MU_0_OVER_4PI;

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
     * asinh(t1/d) − asinh(t2/d) for t1 − t2 = len &gt; 0, R_i = √(t_i² + d²): the log of a ratio near 1
     * goes through log1p when t1, t2 share a sign, otherwise the two asinh add without cancelling.
     */
    static double asinhDifference(double t1, double t2, double r1, double r2, double d2, double len) {
        if (t2 >= 0) {
            return Math.log1p(len * (1 + (t1 + t2) / (r1 + r2)) / (t2 + r2));
        }
        if (t1 <= 0) {
            return Math.log1p(len * (1 - (t1 + t2) / (r1 + r2)) / (r1 - t1));
        }
        return Math.log((t1 + r1) * (r2 - t2) / d2);
    }
}
