package org.kinduct.solver.circuit;

import static org.kinduct.solver.field.PhysicalConstants.MU_0;
import static org.kinduct.solver.field.PhysicalConstants.MU_0_OVER_4PI;

import org.kinduct.scene.WireClearance;

/**
 * Inductance of straight conductors at low frequency (μr = 1).
 *
 * <p><b>Self-inductance</b> of a straight round wire of length l and radius ρ with uniform current:
 * L = (μ0·l/2π)·[ln(2l/ρ) − 3/4] (Rosa, "The self and mutual inductances of linear conductors",
 * Bull. Bur. Stand. 4, 1908; Grover, <i>Inductance Calculations</i>, 1946). It assumes l ≫ ρ;
 * the terms dropped are of relative order ρ/l, so segments shorter than
 * {@link WireClearance#MIN_SIDE_RADII} radii are refused.
 *
 * <p><b>Mutual inductance</b> of two straight filaments, Neumann's formula
 * M = (μ0/4π)·(û1·û2)·∫∫ ds1 ds2 / r. The inner integral over filament 2 is closed form,
 * ∫ ds2/r = ln[(R1 + R2 + L2)/(R1 + R2 − L2)] with R1, R2 the distances from the point on
 * filament 1 to the ends of filament 2 (the potential of a straight segment, e.g. Griffiths,
 * <i>Introduction to Electrodynamics</i>); R1 + R2 − L2 is evaluated without cancellation as
 * h²/(R + t) or R − t per end (h the distance from the line, t the projection). The outer
 * integral is adaptive Gauss–Legendre ({@link AdaptiveGauss}) to relative accuracy
 * {@value #REL_TOL}, split at the point of filament 1 nearest filament 2 so that a crossing's
 * log singularity sits at an interval end. Filaments sharing an end use Grover's closed form for
 * filaments meeting at a point (Grover 1946, "filaments meeting at a point"):
 * M = (μ0/2π)·cos ε·[l·atanh(m/(l + n)) + m·atanh(l/(m + n))], l, m the lengths, n the distance
 * between the free ends, ε the angle between the current directions. Filaments in one plane
 * z = const (all loop–loop pairs) use closed forms of the double integral for inclined and
 * parallel lines (see {@code coplanarIntegral}), except at crossing angles with sine between
 * {@value #PARALLEL_SIN} and {@value #PLANAR_MIN_SIN}, where the quadrature is better conditioned.
 *
 * <p>Any relative position in space works (same plane, parallel planes). Not trusted — and
 * refused — when the filaments overlap along a stretch (collinear and overlapping, or folded
 * back onto each other), where Neumann's integral diverges.
 */
public final class SegmentInductance {

    /** Below this |sin| between coplanar filaments the closed form gives way to the quadrature. */
    static final double PLANAR_MIN_SIN = 0.05;

    /**
     * Filaments whose directions differ by rounding only (|sin| below this) are taken as
     * parallel; the error is of that relative order.
     */
    static final double PARALLEL_SIN = 1e-12;

    /** Relative accuracy of the numerical outer Neumann integral. */
    static final double REL_TOL = 1e-11;

    private SegmentInductance() {
    }

    /** Rosa's self-inductance of a straight round wire, henries. */
    public static double roundWireSelf(double lengthM, double radiusM) {
        if (!(radiusM > 0) || !(lengthM >= WireClearance.MIN_SIDE_RADII * radiusM) || !Double.isFinite(lengthM)) {
            throw new IllegalArgumentException("a straight wire piece must be at least " + WireClearance.MIN_SIDE_RADII
                    + " wire radii long for Rosa's formula, got length " + lengthM + " m, radius " + radiusM + " m");
        }
        return MU_0 * lengthM / (2 * Math.PI) * (Math.log(2 * lengthM / radiusM) - 0.75);
    }

    /** Neumann mutual inductance of two straight filaments, henries (symmetric in its arguments). */
    public static double mutual(Filament a, Filament b) {
        double cos = a.cosAngleTo(b);
        if (cos == 0) {
            return 0;
        }
        double integral = sharedEndIntegral(a, b);
        if (Double.isNaN(integral)) {
            integral = coplanarIntegral(a, b);
        }
        if (Double.isNaN(integral)) {
            integral = neumannIntegral(a, b);
        }
        return MU_0_OVER_4PI * cos * integral;
    }

    /**
     * ∫∫ ds1 ds2 / r by Grover's closed form when the filaments share an end; NaN when they do
     * not. Throws when they are folded back onto each other (the integral diverges).
     */
    private static double sharedEndIntegral(Filament a, Filament b) {
        double[] freeA;
        double[] freeB;
        if (same(a.bx(), a.by(), a.bz(), b.ax(), b.ay(), b.az())) {
            freeA = new double[] {a.ax(), a.ay(), a.az()};
            freeB = new double[] {b.bx(), b.by(), b.bz()};
        } else if (same(a.ax(), a.ay(), a.az(), b.bx(), b.by(), b.bz())) {
            freeA = new double[] {a.bx(), a.by(), a.bz()};
            freeB = new double[] {b.ax(), b.ay(), b.az()};
        } else if (same(a.ax(), a.ay(), a.az(), b.ax(), b.ay(), b.az())) {
            freeA = new double[] {a.bx(), a.by(), a.bz()};
            freeB = new double[] {b.bx(), b.by(), b.bz()};
        } else if (same(a.bx(), a.by(), a.bz(), b.bx(), b.by(), b.bz())) {
            freeA = new double[] {a.ax(), a.ay(), a.az()};
            freeB = new double[] {b.ax(), b.ay(), b.az()};
        } else {
            return Double.NaN;
        }
        double l = a.length();
        double m = b.length();
        double n = Math.sqrt(sq(freeA[0] - freeB[0]) + sq(freeA[1] - freeB[1]) + sq(freeA[2] - freeB[2]));
        if (!(m < l + n) || !(l < m + n)) {
            throw new IllegalArgumentException("filaments meeting at a point are folded back onto each other;"
                    + " their mutual inductance diverges");
        }
        return 2 * (l * atanh(m / (l + n)) + m * atanh(l / (m + n)));
    }

    /**
     * ∫∫ ds1 ds2 / r in closed form for filaments in one plane z = const, as the double difference
     * F(s2,t2) − F(s1,t2) − F(s2,t1) + F(s1,t1) of an antiderivative with ∂²F/∂s∂t = 1/r (the
     * route of Grover 1946 and Campbell 1915 for inclined and parallel filaments; each F is
     * checked here against the numerical Neumann integral in the tests):
     * <ul>
     *   <li>lines crossing at O at angle ε, s and t measured from O, r² = s² + t² − 2st·cos ε:
     *       F = s·ln(t − s·cos ε + r) + t·ln(s − t·cos ε + r);</li>
     *   <li>parallel lines a distance d apart, s and t along the common direction:
     *       F = −h(s − t), h(u) = u·asinh(u/d) − √(u² + d²), and for collinear filaments that do
     *       not overlap h(u) = |u|·ln|u| (the dropped terms are linear in u and cancel).</li>
     * </ul>
     * NaN when the filaments are not in one plane, or their lines cross at an angle whose sine is
     * between {@value #PARALLEL_SIN} and {@value #PLANAR_MIN_SIN} (the crossing lies far away and the four terms cancel
     * badly): the quadrature takes those.
     */
    private static double coplanarIntegral(Filament a, Filament b) {
        double z = a.az();
        if (a.bz() != z || b.az() != z || b.bz() != z) {
            return Double.NaN;
        }
        double la = a.length();
        double lb = b.length();
        double ux = (a.bx() - a.ax()) / la;
        double uy = (a.by() - a.ay()) / la;
        double vx = (b.bx() - b.ax()) / lb;
        double vy = (b.by() - b.ay()) / lb;
        double wx = b.ax() - a.ax();
        double wy = b.ay() - a.ay();
        double sin = ux * vy - uy * vx;
        double cos = ux * vx + uy * vy;
        if (Math.abs(sin) >= PLANAR_MIN_SIN) {
            // The crossing O = a0 + σ·u = b0 + τ·v.
            double sigma = (wx * vy - wy * vx) / sin;
            double tau = (wx * uy - wy * ux) / sin;
            double s1 = -sigma;
            double s2 = la - sigma;
            double t1 = -tau;
            double t2 = lb - tau;
            return inclined(s2, t2, cos, sin) - inclined(s1, t2, cos, sin) - inclined(s2, t1, cos, sin)
                    + inclined(s1, t1, cos, sin);
        }
        if (Math.abs(sin) > PARALLEL_SIN) {
            return Double.NaN;
        }
        double d = Math.abs(wx * uy - wy * ux);
        double tStart = wx * ux + wy * uy;
        double t1 = cos > 0 ? tStart : tStart - lb;
        double t2 = t1 + lb;
        if (d == 0 && t1 < la && t2 > 0) {
            throw new IllegalArgumentException("filaments overlap along a stretch; their mutual inductance diverges");
        }
        return -(parallel(la - t2, d) - parallel(-t2, d) - parallel(la - t1, d) + parallel(-t1, d));
    }

    /** F(s, t) for crossing lines; s·ln(…) → 0 as s → 0, and t − s·cos ε + r is formed without cancellation. */
    private static double inclined(double s, double t, double cos, double sin) {
        double r = Math.sqrt(s * s + t * t - 2 * s * t * cos);
        return xLog(s, sumWithRoot(t - s * cos, r, s * sin)) + xLog(t, sumWithRoot(s - t * cos, r, t * sin));
    }

    /** q + r where r = √(q² + p²), stable when q is negative. */
    private static double sumWithRoot(double q, double r, double p) {
        return q >= 0 ? q + r : p * p / (r - q);
    }

    private static double xLog(double x, double y) {
        return x == 0 ? 0 : x * Math.log(y);
    }

    private static double parallel(double u, double d) {
        if (d == 0) {
            return u == 0 ? 0 : Math.abs(u) * Math.log(Math.abs(u));
        }
        double x = Math.abs(u) / d;
        // u·asinh(u/d) is even in u; asinh from its logarithm for x ≥ 0 has no cancellation.
        return Math.abs(u) * Math.log(x + Math.sqrt(x * x + 1)) - Math.sqrt(u * u + d * d);
    }

    /** ∫_a ∫_b ds1 ds2 / r with the inner integral closed form and the outer one adaptive. */
    private static double neumannIntegral(Filament a, Filament b) {
        double la = a.length();
        double lb = b.length();
        double ux = (b.bx() - b.ax()) / lb;
        double uy = (b.by() - b.ay()) / lb;
        double uz = (b.bz() - b.az()) / lb;
        double dx = a.bx() - a.ax();
        double dy = a.by() - a.ay();
        double dz = a.bz() - a.az();
        java.util.function.DoubleUnaryOperator inner = s -> {
            double px = a.ax() + s * dx - b.ax();
            double py = a.ay() + s * dy - b.ay();
            double pz = a.az() + s * dz - b.az();
            double t1 = px * ux + py * uy + pz * uz;
            double t2 = lb - t1;
            double cx = py * uz - pz * uy;
            double cy = pz * ux - px * uz;
            double cz = px * uy - py * ux;
            double h2 = cx * cx + cy * cy + cz * cz;
            double r1 = Math.sqrt(px * px + py * py + pz * pz);
            double r2 = Math.sqrt(h2 + t2 * t2);
            double gap = (t1 > 0 ? h2 / (r1 + t1) : r1 - t1) + (t2 > 0 ? h2 / (r2 + t2) : r2 - t2);
            return Math.log((r1 + r2 + lb) / gap);
        };
        double split = nearestParameter(a, b);
        if (Double.isNaN(split)) {
            throw new IllegalArgumentException("filaments overlap along a stretch; their mutual inductance diverges");
        }
        double absTol = REL_TOL * 1e-6 * lb;
        double sum = 0;
        if (split > 0) {
            sum += AdaptiveGauss.integrate(inner, 0, split, REL_TOL, absTol);
        }
        if (split < 1) {
            sum += AdaptiveGauss.integrate(inner, split, 1, REL_TOL, absTol);
        }
        return sum * la;
    }

    /**
     * Parameter s ∈ [0, 1] of the point of {@code a} nearest to {@code b} (Ericson,
     * <i>Real-Time Collision Detection</i>, 2005, §5.1.9); NaN when the filaments are parallel
     * and touch along a stretch.
     */
    static double nearestParameter(Filament a, Filament b) {
        double d1x = a.bx() - a.ax();
        double d1y = a.by() - a.ay();
        double d1z = a.bz() - a.az();
        double d2x = b.bx() - b.ax();
        double d2y = b.by() - b.ay();
        double d2z = b.bz() - b.az();
        double rx = a.ax() - b.ax();
        double ry = a.ay() - b.ay();
        double rz = a.az() - b.az();
        double aa = d1x * d1x + d1y * d1y + d1z * d1z;
        double ee = d2x * d2x + d2y * d2y + d2z * d2z;
        double f = d2x * rx + d2y * ry + d2z * rz;
        double c = d1x * rx + d1y * ry + d1z * rz;
        double bb = d1x * d2x + d1y * d2y + d1z * d2z;
        double denom = aa * ee - bb * bb;
        boolean parallel = denom <= 1e-24 * aa * ee;
        double s = parallel ? 0 : clamp((bb * f - c * ee) / denom);
        double t = (bb * s + f) / ee;
        if (t < 0) {
            t = 0;
            s = clamp(-c / aa);
        } else if (t > 1) {
            t = 1;
            s = clamp((bb - c) / aa);
        }
        if (parallel) {
            double ox = rx + s * d1x - t * d2x;
            double oy = ry + s * d1y - t * d2y;
            double oz = rz + s * d1z - t * d2z;
            double overlapEnds = overlapLength(a, b);
            if (ox * ox + oy * oy + oz * oz == 0 && overlapEnds > 0) {
                return Double.NaN;
            }
        }
        return s;
    }

    /** Length of the common stretch of two parallel filaments' projections onto filament b's line. */
    private static double overlapLength(Filament a, Filament b) {
        double lb = b.length();
        double ux = (b.bx() - b.ax()) / lb;
        double uy = (b.by() - b.ay()) / lb;
        double uz = (b.bz() - b.az()) / lb;
        double s0 = (a.ax() - b.ax()) * ux + (a.ay() - b.ay()) * uy + (a.az() - b.az()) * uz;
        double s1 = (a.bx() - b.ax()) * ux + (a.by() - b.ay()) * uy + (a.bz() - b.az()) * uz;
        return Math.min(Math.max(s0, s1), lb) - Math.max(Math.min(s0, s1), 0);
    }

    private static boolean same(double x1, double y1, double z1, double x2, double y2, double z2) {
        return x1 == x2 && y1 == y2 && z1 == z2;
    }

    private static double clamp(double v) {
        return Math.max(0, Math.min(1, v));
    }

    private static double atanh(double x) {
        return 0.5 * Math.log((1 + x) / (1 - x));
    }

    private static double sq(double v) {
        return v * v;
    }
}
