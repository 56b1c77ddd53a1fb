package org.kinduct.solver.field;

import org.kinduct.scene.FieldGrid;

/**
 * The C¹ interpolant of a field map's samples, in the map's own coordinates, with exact line
 * and area integrals. Zero outside the outermost samples.
 *
 * <p><b>Interpolant.</b> Cubic convolution with a = −1/2 in x and in y (Keys, "Cubic convolution
 * interpolation for digital image processing", IEEE Trans. ASSP 29(6), 1153–1160, 1981, eqs. 15
 * and 25): in each cell the tensor product of Hermite cubics whose slopes are central differences,
 * p(s) = ½[2f₀ + s(f₁ − f₋₁) + s²(2f₋₁ − 5f₀ + 4f₁ − f₂) + s³(−f₋₁ + 3f₀ − 3f₁ + f₂)] along each
 * axis. It passes through every sample, is C¹, and its error is O(h³) for a smooth field (Keys §IV).
 * Beyond the edges the samples are extended by Keys' boundary condition f₋₁ = 3f₀ − 3f₁ + f₂ (his
 * eq. 19), which keeps the third order up to the edge.
 *
 * <p><b>Flux.</b> With F(x, y) = ∫_{x₀}^{x} p(x', y) dx', Green's theorem gives
 * ∬ w·p dA = ∮ F dy over any closed polygon, w its winding number. Each polygon edge is cut where
 * it crosses a grid line; on each piece F is one cell's polynomial, of degree ≤ 7 in the edge
 * parameter, which four-point Gauss–Legendre integrates exactly (Abramowitz &amp; Stegun, <i>Handbook
 * of Mathematical Functions</i>, 1964, 25.4.29 and Table 25.4). F at a point is the cumulative
 * integral of whole cells to its left, kept per sample row ({@code rowIntegral}), plus the part
 * of its own cell: the exact integral of the interpolant over the polygon clipped to every cell,
 * computed along the polygon's edges instead of cell by cell (see DEVELOPERS.md, Decisions).
 * Line moments of B_z are the same cut-and-integrate along one segment (degree ≤ 7 again).
 */
final class BicubicMap {

    /** Four-point Gauss–Legendre on [0, 1]: nodes and weights (Abramowitz &amp; Stegun Table 25.4). */
    private static final double[] NODES = {
        0.5 - 0.5 * 0.8611363115940526, 0.5 - 0.5 * 0.3399810435848563,
        0.5 + 0.5 * 0.3399810435848563, 0.5 + 0.5 * 0.8611363115940526};
    private static final double[] WEIGHTS = {
        0.5 * 0.3478548451374538, 0.5 * 0.6521451548625461, 0.5 * 0.6521451548625461, 0.5 * 0.3478548451374538};

    private final FieldGrid grid;
    private final int nx;
    private final int ny;
    private final double x0;
    private final double y0;
    private final double hx;
    private final double hy;
    /** rowIntegral[j·nx + i] = ∫ from x₀ to x_i of row j's interpolant, T·m. */
    private final double[] rowIntegral;

    private BicubicMap(FieldGrid grid) {
        this.grid = grid;
        nx = grid.nx();
        ny = grid.ny();
        x0 = grid.x0M();
        y0 = grid.y0M();
        hx = grid.dxM();
        hy = grid.dyM();
        rowIntegral = new double[nx * ny];
        double[] f = new double[4];
        for (int j = 0; j < ny; j++) {
            double sum = 0;
            for (int i = 0; i < nx - 1; i++) {
                gatherRow(j, i, f);
                // ∫₀¹ p(s) ds = (−f₋₁ + 13f₀ + 13f₁ − f₂)/24, from the cubic above.
                sum += hx * (-f[0] + 13 * f[1] + 13 * f[2] - f[3]) / 24;
                rowIntegral[j * nx + i + 1] = sum;
            }
        }
    }

    /** The interpolant of {@code grid}, made once per grid. */
    static BicubicMap of(FieldGrid grid) {
        return grid.derived(BicubicMap.class, BicubicMap::new);
    }

    /** True when (x, y) lies on the sampled rectangle. */
    boolean covers(double x, double y) {
        return x >= x0 && x <= grid.x1M() && y >= y0 && y <= grid.y1M();
    }

    double bz(double x, double y) {
        if (!covers(x, y)) {
            return 0;
        }
        int i = cell((x - x0) / hx, nx);
        int j = cell((y - y0) / hy, ny);
        return value(i, j, (x - x0) / hx - i, (y - y0) / hy - j);
    }

    /** F(x, y) = ∫_{x₀}^{x} B_z(x', y) dx', T·m: the y component of this map's potential gauge. */
    double integralAlongX(double x, double y) {
        if (x < x0 || y < y0 || y > grid.y1M()) {
            return 0;
        }
        double u = (x - x0) / hx;
        int j = cell((y - y0) / hy, ny);
        if (u >= nx - 1) {
            return antiderivative(nx - 2, j, 1, (y - y0) / hy - j);
        }
        int i = cell(u, nx);
        return antiderivative(i, j, u - i, (y - y0) / hy - j);
    }

    /** ∬ w·B_z dA over the closed polygon, webers. */
    double flux(double[] xs, double[] ys) {
        double minY = Double.POSITIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < xs.length; k++) {
            minX = Math.min(minX, xs[k]);
            maxX = Math.max(maxX, xs[k]);
            minY = Math.min(minY, ys[k]);
            maxY = Math.max(maxY, ys[k]);
        }
        if (maxX <= x0 || minX >= grid.x1M() || maxY <= y0 || minY >= grid.y1M()) {
            return 0;
        }
        FluxPieces sum = new FluxPieces();
        int n = xs.length;
        for (int k = 0; k < n; k++) {
            int next = (k + 1) % n;
            sum.dy = ys[next] - ys[k];
            if (sum.dy != 0) {
                pieces(xs[k], ys[k], xs[next], ys[next], sum);
            }
        }
        return sum.total;
    }

    /** ∫ B_z ds and ∫ s·B_z ds along a → b, s from 0 to 1 (see {@link PlaneField#bzMoments}). */
    void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        MomentPieces sum = new MomentPieces();
        pieces(ax, ay, bx, by, sum);
        out[0] = sum.m0;
        out[1] = sum.m1;
    }

    /** What is done with each piece of a segment that lies in one cell column and one cell row. */
    private abstract static class Pieces {
        double ax;
        double ay;
        double dx;
        double dy;

        /** @param i cell column, nx − 1 right of the map; j cell row, inside the map */
        abstract void piece(double t0, double t1, int i, int j);
    }

    /** Σ ∫ F dy over pieces. */
    private final class FluxPieces extends Pieces {
        double total;

        @Override
        void piece(double t0, double t1, int i, int j) {
            double len = t1 - t0;
            double part = 0;
            for (int q = 0; q < 4; q++) {
                double t = t0 + NODES[q] * len;
                double u = (ax + t * dx - x0) / hx;
                double v = (ay + t * dy - y0) / hy - j;
                part += WEIGHTS[q] * (i == nx - 1 ? antiderivative(nx - 2, j, 1, v) : antiderivative(i, j, u - i, v));
            }
            total += part * len * dy;
        }
    }

    /** Σ ∫ B_z dt and ∫ t·B_z dt over pieces inside the map. */
    private final class MomentPieces extends Pieces {
        double m0;
        double m1;

        @Override
        void piece(double t0, double t1, int i, int j) {
            if (i == nx - 1) {
                return;
            }
            double len = t1 - t0;
            for (int q = 0; q < 4; q++) {
                double t = t0 + NODES[q] * len;
                double b = value(i, j, (ax + t * dx - x0) / hx - i, (ay + t * dy - y0) / hy - j);
                m0 += WEIGHTS[q] * len * b;
                m1 += WEIGHTS[q] * len * t * b;
            }
        }
    }

    /**
     * Cuts segment a → b where it crosses the grid's lines x = x_i and y = y_j and hands each
     * piece over the map's rows (and not left of it) to {@code sink}, with the cell it lies in.
     */
    private void pieces(double ax, double ay, double bx, double by, Pieces sink) {
        sink.ax = ax;
        sink.ay = ay;
        sink.dx = bx - ax;
        sink.dy = by - ay;
        double ua = (ax - x0) / hx;
        double ub = (bx - x0) / hx;
        double va = (ay - y0) / hy;
        double vb = (by - y0) / hy;
        Crossings cx = new Crossings(ua, ub, nx);
        Crossings cy = new Crossings(va, vb, ny);
        double t0 = 0;
        while (true) {
            double t1 = Math.min(1, Math.min(cx.next, cy.next));
            if (t1 > t0) {
                double mid = 0.5 * (t0 + t1);
                double u = ua + mid * (ub - ua);
                double v = va + mid * (vb - va);
                if (u >= 0 && v >= 0 && v <= ny - 1) {
                    sink.piece(t0, t1, u >= nx - 1 ? nx - 1 : cell(u, nx), cell(v, ny));
                }
            }
            if (t1 >= 1) {
                return;
            }
            if (cx.next <= cy.next) {
                cx.advance();
            } else {
                cy.advance();
            }
            t0 = t1;
        }
    }

    /** Parameters in (0, 1), increasing, where a segment from grid coordinate a to b crosses the lines 0 … n − 1. */
    private static final class Crossings {
        private final double a;
        private final double step;
        private int line;
        private final int last;
        private final int direction;
        double next;

        Crossings(double a, double b, int n) {
            this.a = a;
            this.step = b - a;
            if (b > a) {
                direction = 1;
                line = Math.max(0, (int) Math.floor(a) + 1);
                last = Math.min(n - 1, (int) Math.ceil(b) - 1);
            } else if (b < a) {
                direction = -1;
                line = Math.min(n - 1, (int) Math.ceil(a) - 1);
                last = Math.max(0, (int) Math.floor(b) + 1);
            } else {
                direction = 0;
                line = 0;
                last = -1;
            }
            update();
        }

        void advance() {
            line += direction;
            update();
        }

        private void update() {
            boolean more = direction > 0 ? line <= last : direction < 0 && line >= last;
            next = more ? (line - a) / step : Double.POSITIVE_INFINITY;
        }
    }

    /** The cell index of grid coordinate u in [0, n − 1]: the last cell holds its right edge. */
    private static int cell(double u, int n) {
        return Math.min(n - 2, Math.max(0, (int) Math.floor(u)));
    }

    /** The interpolant in cell (i, j) at local (s, t) ∈ [0, 1]². */
    private double value(int i, int j, double s, double t) {
        double[] ws = weights(s);
        double[] f = new double[4];
        double sum = 0;
        double[] wt = weights(t);
        for (int b = 0; b < 4; b++) {
            gatherRow(j - 1 + b, i, f);
            sum += wt[b] * (ws[0] * f[0] + ws[1] * f[1] + ws[2] * f[2] + ws[3] * f[3]);
        }
        return sum;
    }

    /** F in cell (i, j) at local (s, t): whole cells to the left plus ∫₀^s of this one, T·m. */
    private double antiderivative(int i, int j, double s, double t) {
        double s2 = s * s;
        double s3 = s2 * s;
        double s4 = s3 * s;
        // ∫₀^s of the cubic's four weights (the Keys cubic above, integrated term by term).
        double w0 = 0.5 * (-s2 / 2 + 2 * s3 / 3 - s4 / 4);
        double w1 = 0.5 * (2 * s - 5 * s3 / 3 + 3 * s4 / 4);
        double w2 = 0.5 * (s2 / 2 + 4 * s3 / 3 - 3 * s4 / 4);
        double w3 = 0.5 * (-s3 / 3 + s4 / 4);
        double[] wt = weights(t);
        double[] f = new double[4];
        double sum = 0;
        for (int b = 0; b < 4; b++) {
            int r = j - 1 + b;
            gatherRow(r, i, f);
            sum += wt[b] * (rowIntegralAt(r, i) + hx * (w0 * f[0] + w1 * f[1] + w2 * f[2] + w3 * f[3]));
        }
        return sum;
    }

    /** The four cubic weights at s for samples −1, 0, 1, 2. */
    private static double[] weights(double s) {
        double s2 = s * s;
        double s3 = s2 * s;
        return new double[] {
            0.5 * (-s + 2 * s2 - s3), 0.5 * (2 - 5 * s2 + 3 * s3), 0.5 * (s + 4 * s2 - 3 * s3), 0.5 * (-s2 + s3)};
    }

    /** Samples i − 1 … i + 2 of row r (r from −1 to ny), extended past the edges by Keys' rule. */
    private void gatherRow(int r, int i, double[] f) {
        if (r < 0) {
            gatherRealRow(0, i, f, 3);
            addRow(1, i, f, -3);
            addRow(2, i, f, 1);
        } else if (r >= ny) {
            gatherRealRow(ny - 1, i, f, 3);
            addRow(ny - 2, i, f, -3);
            addRow(ny - 3, i, f, 1);
        } else {
            gatherRealRow(r, i, f, 1);
        }
    }

    private void addRow(int r, int i, double[] f, double weight) {
        double[] g = new double[4];
        gatherRealRow(r, i, g, weight);
        for (int k = 0; k < 4; k++) {
            f[k] += g[k];
        }
    }

    private void gatherRealRow(int r, int i, double[] f, double weight) {
        for (int k = 0; k < 4; k++) {
            f[k] = weight * sample(r, i - 1 + k);
        }
    }

    /** Sample k of row r, k from −1 to nx, extended by Keys' rule. */
    private double sample(int r, int k) {
        if (k < 0) {
            return 3 * grid.at(0, r) - 3 * grid.at(1, r) + grid.at(2, r);
        }
        if (k >= nx) {
            return 3 * grid.at(nx - 1, r) - 3 * grid.at(nx - 2, r) + grid.at(nx - 3, r);
        }
        return grid.at(k, r);
    }

    /** ∫ from x₀ to x_i of row r's interpolant (rows −1 and ny by Keys' rule, which is linear). */
    private double rowIntegralAt(int r, int i) {
        if (r < 0) {
            return 3 * rowIntegral[i] - 3 * rowIntegral[nx + i] + rowIntegral[2 * nx + i];
        }
        if (r >= ny) {
            return 3 * rowIntegral[(ny - 1) * nx + i] - 3 * rowIntegral[(ny - 2) * nx + i]
                    + rowIntegral[(ny - 3) * nx + i];
        }
        return rowIntegral[r * nx + i];
    }
}
