package org.kinduct.solver.baseline.field;

import java.util.Arrays;

/**
 * An ideal region of uniform B_z bounded by a simple polygon (already placed), zero outside.
 *
 * <p><b>Flux.</b> Fan-triangulating a closed polygon from its first vertex writes its winding
 * number as a signed sum of triangle indicators, w(x) = Σ s_i·1[T_i](x) almost everywhere, for
 * self-crossing polygons too (the signed-triangle form of the shoelace formula; O'Rourke,
 * <i>Computational Geometry in C</i>, 2nd ed., 1998, §1.3). With the patch as ±(its own fan) this gives
 * Φ = B·σ_P·Σ_e Σ_q s_e·s_q·area(T_e ∩ T_q), where σ_P is the patch's orientation. Each
 * triangle–triangle overlap is convex and is clipped with Sutherland–Hodgman (Sutherland &amp;
 * Hodgman, "Reentrant polygon clipping", Comm. ACM 17(1), 1974), which is exact for convex
 * clip regions, needs no precision context that would snap near-degenerate overlaps, and runs
 * in fixed scratch buffers; a general Boolean-region library would allocate a tree per
 * overlap. Cost O(n_loop·n_patch); exact to rounding, computed about the loop's first vertex.
 *
 * <p><b>Line moments.</b> A segment is cut at its crossings with the outline and the pieces whose
 * midpoints lie inside contribute exactly ∫ ds and ∫ s ds. <b>Potential.</b> Any gauge with
 * curl A = B_z will do, since an idealized patch says nothing about its induced electric field
 * ({@link #hasPhysicalPotential()} is false); this one is A_x = 0,
 * A_y(x, y) = ∫_{−∞}^{x} B_z(x', y) dx', so ∮ A·dl gives the flux of any closed loop.
 *
 * <p>On the outline itself {@link #bz} follows the half-open crossing rule (points on it count
 * inside or outside consistently); the boundary has no area, so flux is unaffected.
 */
public final class PatchField implements PlaneField {

    /** Crossings this close outside an edge's ends are kept: an extra cut is harmless, a lost one is not. */
    private static final double END_SLACK = 1e-12;
    /**
     * Room for a triangle clipped by three half-planes: one vertex more per cut in exact
     * arithmetic, at worst twice the vertices per cut if rounding bends the piece (3 → 6 → 12 → 24).
     */
    private static final int CLIP_CAPACITY = 2 * 24;

    private final double[] xs;
    private final double[] ys;
    private final double bzT;
    private final double orientation;
    private final double minX;
    private final double maxX;
    private final double minY;
    private final double maxY;

    /**
     * @param xs outline x coordinates, metres (a simple polygon, as {@code Source.FieldPatch} checks)
     * @param ys outline y coordinates, metres
     * @param bzT B_z inside, tesla
     */
    public PatchField(double[] xs, double[] ys, double bzT) {
        Polylines.requireClosed(xs, ys);
        if (!Double.isFinite(bzT)) {
            throw new IllegalArgumentException("B_z must be a finite number, got " + bzT);
        }
        this.xs = xs.clone();
        this.ys = ys.clone();
        this.bzT = bzT;
        double area = Polylines.signedArea(this.xs, this.ys);
        if (area == 0) {
            throw new IllegalArgumentException("field patch outline encloses no area");
        }
        this.orientation = Math.signum(area);
        this.minX = Arrays.stream(xs).min().orElseThrow();
        this.maxX = Arrays.stream(xs).max().orElseThrow();
        this.minY = Arrays.stream(ys).min().orElseThrow();
        this.maxY = Arrays.stream(ys).max().orElseThrow();
    }

    @Override
    public double bz(double x, double y) {
        return contains(x, y) ? bzT : 0;
    }

    @Override
    public boolean hasPhysicalPotential() {
        return false;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        // ∫_{−∞}^{x} w(x', y) dx' with w = Σ over edges crossing the line at x_c > x' of ±1
        // (+1 upward) gives Σ ±(min(x, x_c) − x_ref); the ±1 sum to zero, so x_ref is free.
        double sum = 0;
        int m = xs.length;
        for (int i = 0, j = m - 1; i < m; j = i++) {
            if ((ys[i] > y) != (ys[j] > y)) {
                double xc = xs[j] + (y - ys[j]) * (xs[i] - xs[j]) / (ys[i] - ys[j]);
                double dir = ys[i] > ys[j] ? 1 : -1;
                sum += dir * (Math.min(x, xc) - xs[0]);
            }
        }
        out[0] = 0;
        out[1] = bzT * orientation * sum;
    }

    @Override
    public double flux(double[] lx, double[] ly) {
        int n = Polylines.requireClosed(lx, ly);
        if (!overlapsBox(lx, ly)) {
            return 0;
        }
        double ox = lx[0];
        double oy = ly[0];
        double[] clip = new double[6];
        double[] bufA = new double[CLIP_CAPACITY];
        double[] bufB = new double[CLIP_CAPACITY];
        double sum = 0;
        int m = xs.length;
        double p0x = xs[0] - ox;
        double p0y = ys[0] - oy;
        for (int q = 1; q < m - 1; q++) {
            double sq = orientedTriangle(p0x, p0y, xs[q] - ox, ys[q] - oy, xs[q + 1] - ox, ys[q + 1] - oy, clip);
            if (sq == 0) {
                continue;
            }
            double cMinX = Math.min(clip[0], Math.min(clip[2], clip[4]));
            double cMaxX = Math.max(clip[0], Math.max(clip[2], clip[4]));
            double cMinY = Math.min(clip[1], Math.min(clip[3], clip[5]));
            double cMaxY = Math.max(clip[1], Math.max(clip[3], clip[5]));
            for (int e = 1; e < n - 1; e++) {
                double ax = lx[e] - ox;
                double ay = ly[e] - oy;
                double bx = lx[e + 1] - ox;
                double by = ly[e + 1] - oy;
                double se = Math.signum(ax * by - ay * bx);
                if (se == 0 || Math.max(0, Math.max(ax, bx)) < cMinX || Math.min(0, Math.min(ax, bx)) > cMaxX
                        || Math.max(0, Math.max(ay, by)) < cMinY || Math.min(0, Math.min(ay, by)) > cMaxY) {
                    continue;
                }
                sum += se * sq * clippedArea(ax, ay, bx, by, clip, bufA, bufB);
            }
        }
        return bzT * orientation * sum;
    }

    @Override
    public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        out[0] = 0;
        out[1] = 0;
        if (Math.max(ax, bx) < minX || Math.min(ax, bx) > maxX || Math.max(ay, by) < minY || Math.min(ay, by) > maxY) {
            return;
        }
        int m = xs.length;
        double dx = bx - ax;
        double dy = by - ay;
        double[] cuts = new double[m + 2];
        int k = 0;
        cuts[k++] = 0;
        for (int i = 0, j = m - 1; i < m; j = i++) {
            double ex = xs[i] - xs[j];
            double ey = ys[i] - ys[j];
            double denom = dx * ey - dy * ex;
            if (denom == 0) {
                continue;
            }
            double wx = xs[j] - ax;
            double wy = ys[j] - ay;
            double s = (wx * ey - wy * ex) / denom;
            double u = (wx * dy - wy * dx) / denom;
            if (s > 0 && s < 1 && u >= -END_SLACK && u <= 1 + END_SLACK) {
                cuts[k++] = s;
            }
        }
        cuts[k++] = 1;
        Arrays.sort(cuts, 1, k - 1);
        double inside0 = 0;
        double inside1 = 0;
        for (int i = 0; i + 1 < k; i++) {
            double s0 = cuts[i];
            double s1 = cuts[i + 1];
            double mid = 0.5 * (s0 + s1);
            if (s1 > s0 && contains(ax + mid * dx, ay + mid * dy)) {
                inside0 += s1 - s0;
                inside1 += 0.5 * (s1 - s0) * (s1 + s0);
            }
        }
        out[0] = bzT * inside0;
        out[1] = bzT * inside1;
    }

    /** Crossing-number point-in-polygon test (half-open in y), valid for the simple outline. */
    private boolean contains(double x, double y) {
        if (x < minX || x > maxX || y < minY || y > maxY) {
            return false;
        }
        boolean inside = false;
        int m = xs.length;
        for (int i = 0, j = m - 1; i < m; j = i++) {
            if ((ys[i] > y) != (ys[j] > y)
                    && x < xs[j] + (y - ys[j]) * (xs[i] - xs[j]) / (ys[i] - ys[j])) {
                inside = !inside;
            }
        }
        return inside;
    }

    private boolean overlapsBox(double[] lx, double[] ly) {
        double lMinX = Double.POSITIVE_INFINITY;
        double lMaxX = Double.NEGATIVE_INFINITY;
        double lMinY = Double.POSITIVE_INFINITY;
        double lMaxY = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < lx.length; i++) {
            lMinX = Math.min(lMinX, lx[i]);
            lMaxX = Math.max(lMaxX, lx[i]);
            lMinY = Math.min(lMinY, ly[i]);
            lMaxY = Math.max(lMaxY, ly[i]);
        }
        return lMaxX >= minX && lMinX <= maxX && lMaxY >= minY && lMinY <= maxY;
    }

    /**
     * Writes triangle (a, b, c) counter-clockwise into {@code out} and returns the sign of its
     * original orientation (0 when degenerate).
     */
    private static double orientedTriangle(double ax, double ay, double bx, double by, double cx, double cy,
                                           double[] out) {
        double s = Math.signum((bx - ax) * (cy - ay) - (by - ay) * (cx - ax));
        out[0] = ax;
        out[1] = ay;
        out[2] = s >= 0 ? bx : cx;
        out[3] = s >= 0 ? by : cy;
        out[4] = s >= 0 ? cx : bx;
        out[5] = s >= 0 ? cy : by;
        return s;
    }

    /**
     * Area of triangle (origin, a, b) ∩ the counter-clockwise triangle {@code clip}, by clipping
     * the first against the three half-planes of the second.
     */
    private static double clippedArea(double ax, double ay, double bx, double by, double[] clip,
                                      double[] bufA, double[] bufB) {
        double[] in = bufA;
        double[] out = bufB;
        in[0] = 0;
        in[1] = 0;
        in[2] = ax;
        in[3] = ay;
        in[4] = bx;
        in[5] = by;
        int count = 3;
        for (int k = 0; k < 3 && count > 0; k++) {
            double cx = clip[2 * k];
            double cy = clip[2 * k + 1];
            double ex = clip[(2 * k + 2) % 6] - cx;
            double ey = clip[(2 * k + 3) % 6] - cy;
            int outCount = 0;
            double px = in[2 * count - 2];
            double py = in[2 * count - 1];
            double dp = ex * (py - cy) - ey * (px - cx);
            for (int i = 0; i < count; i++) {
                double qx = in[2 * i];
                double qy = in[2 * i + 1];
                double dq = ex * (qy - cy) - ey * (qx - cx);
                if ((dp > 0 && dq < 0) || (dp < 0 && dq > 0)) {
                    double f = dp / (dp - dq);
                    out[2 * outCount] = px + f * (qx - px);
                    out[2 * outCount + 1] = py + f * (qy - py);
                    outCount++;
                }
                if (dq >= 0) {
                    out[2 * outCount] = qx;
                    out[2 * outCount + 1] = qy;
                    outCount++;
                }
                px = qx;
                py = qy;
                dp = dq;
            }
            double[] swap = in;
            in = out;
            out = swap;
            count = outCount;
        }
        double twice = 0;
        for (int i = 0, j = count - 1; i < count; j = i++) {
            twice += in[2 * j] * in[2 * i + 1] - in[2 * i] * in[2 * j + 1];
        }
        return Math.abs(0.5 * twice);
    }
}
