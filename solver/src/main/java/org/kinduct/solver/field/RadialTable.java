package org.kinduct.solver.field;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A cylinder magnet's A_φ(ρ)/ρ and B_z(ρ) per tesla of remanence, by piecewise Chebyshev
 * interpolation in the distance ρ from its axis (A_φ/ρ rather than A_φ, which vanishes on the axis,
 * so that the error stays relative to A_φ there too): the field of an axisymmetric source in the plane
 * depends on ρ alone, and one magnet's field is asked at thousands of quadrature nodes an instant,
 * each costing three elliptic integrals per face; a cell's polynomial costs two dozen
 * multiply-adds.
 *
 * <p>Cells and accuracy. Both functions are analytic in ρ except at the faces' rims, ρ = ±a ± i·z_f
 * (complex ρ where the distance to the rim vanishes), at least the stand-off s = min |z_f| off the
 * real axis. The cells are [ρ, ρ + ½·max(s, |ρ − a|)): their width is half the distance to the
 * rim, or half the stand-off across it, so every singularity lies at least three half-widths from
 * its cell (four across the rim, five outside), and {@value #NODES}-point interpolation at the
 * Chebyshev points converges like (3 + √8)^−24 ≈ 5e-19 or faster (Trefethen, <i>Approximation
 * Theory and Approximation Practice</i>, SIAM 2013, Theorem 8.2). What is left is the closed
 * forms' own rounding, about 1e-14 of the cell's largest value. Cells reach out to
 * {@value #REACH_SIZES} times the magnet's size (radius plus its far face's height); beyond that
 * ρ is not covered and the closed forms are used.
 *
 * <p>Tables depend on the magnet's shape alone (radius, both face heights), not on where it stands or
 * its remanence, so they are shared: a magnet dragged in the editor keeps its table. At most
 * {@value #CACHED} shapes are kept.
 */
final class RadialTable {

    /** Interpolation points per cell. */
    static final int NODES = 24;
    static final double REACH_SIZES = 100;
    /** Cells beyond this many (a stand-off below about 1e-30 of the radius) leave the magnet without a table. */
    private static final int MOST_CELLS = 400;
    private static final int CACHED = 64;
    /** cos(π·(k + ½)·j/N): the Chebyshev points (j = 1) and the discrete cosine transform. */
    private static final double[][] COS = new double[NODES][NODES];

    static {
        for (int j = 0; j < NODES; j++) {
            for (int k = 0; k < NODES; k++) {
                COS[j][k] = Math.cos(Math.PI * (k + 0.5) * j / NODES);
            }
        }
    }

    private static final Map<List<Double>, RadialTable> SHARED = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<List<Double>, RadialTable> eldest) {
            return size() > CACHED;
        }
    };

    /** Cell boundaries, ascending from 0; cell c is [edges[c], edges[c + 1]). */
    private final double[] edges;
    /** Per cell, the A_φ/ρ coefficients then the B_z coefficients, as many of each as matter ({@link #truncated}). */
    private final double[][] coefficients;

    private RadialTable(double[] edges, double[][] coefficients) {
        this.edges = edges;
        this.coefficients = coefficients;
    }

    /**
     * The table of a magnet of this shape (remanence 1 T), made at the first request; null when a
     * face lies in the plane (the rim is then a singularity of the real function) or the stand-off
     * is too small for {@value #MOST_CELLS} cells.
     */
    static RadialTable of(double radiusM, double zLowM, double zHighM) {
        if (zLowM == 0 || zHighM == 0) {
            return null;
        }
        List<Double> shape = List.of(radiusM, zLowM, zHighM);
        synchronized (SHARED) {
            RadialTable known = SHARED.get(shape);
            if (known != null) {
                return known;
            }
        }
        RadialTable made = make(new CylinderMagnetField(0, 0, radiusM, zLowM, zHighM, 1, false), radiusM,
                Math.min(Math.abs(zLowM), Math.abs(zHighM)),
                REACH_SIZES * (radiusM + Math.max(Math.abs(zLowM), Math.abs(zHighM))));
        synchronized (SHARED) {
            SHARED.putIfAbsent(shape, made);
            return SHARED.get(shape);
        }
    }

    private static RadialTable make(CylinderMagnetField unit, double radiusM, double standoffM, double reachM) {
        List<Double> edges = new ArrayList<>();
        double rho = 0;
        edges.add(rho);
        while (rho < reachM) {
            if (edges.size() > MOST_CELLS) {
                return null;
            }
            rho += 0.5 * Math.max(standoffM, Math.abs(rho - radiusM));
            edges.add(rho);
        }
        double[][] coefficients = new double[edges.size() - 1][];
        double[] both = new double[2];
        double[] a = new double[NODES];
        double[] b = new double[NODES];
        for (int c = 0; c < coefficients.length; c++) {
            double centre = 0.5 * (edges.get(c) + edges.get(c + 1));
            double half = 0.5 * (edges.get(c + 1) - edges.get(c));
            for (int k = 0; k < NODES; k++) {
                unit.exactBoth(centre + half * COS[1][k], both);
                a[k] = both[0] / (centre + half * COS[1][k]);
                b[k] = both[1];
            }
            double[] cell = new double[2 * NODES];
            for (int j = 0; j < NODES; j++) {
                double sa = 0;
                double sb = 0;
                for (int k = 0; k < NODES; k++) {
                    sa += a[k] * COS[j][k];
                    sb += b[k] * COS[j][k];
                }
                double weight = (j == 0 ? 1.0 : 2.0) / NODES;
                cell[j] = weight * sa;
                cell[NODES + j] = weight * sb;
            }
            coefficients[c] = truncated(cell);
        }
        return new RadialTable(edges.stream().mapToDouble(Double::doubleValue).toArray(), coefficients);
    }

    /**
     * The cell's coefficients up to the last that matters: the A_φ/ρ series then the B_z series,
     * each cut after its last coefficient above 1e-17 of its largest (the cells outside the rim
     * need fewer terms than the 24 points give), the two series padded to one length.
     */
    private static double[] truncated(double[] cell) {
        int terms = Math.max(significant(cell, 0), significant(cell, NODES));
        double[] kept = new double[2 * terms];
        System.arraycopy(cell, 0, kept, 0, terms);
        System.arraycopy(cell, NODES, kept, terms, terms);
        return kept;
    }

    /** One more than the index of the last coefficient of the series at {@code from} above 1e-17 of its largest. */
    private static int significant(double[] cell, int from) {
        double largest = 0;
        for (int j = 0; j < NODES; j++) {
            largest = Math.max(largest, Math.abs(cell[from + j]));
        }
        int terms = NODES;
        while (terms > 1 && !(Math.abs(cell[from + terms - 1]) > 1e-17 * largest)) {
            terms--;
        }
        return terms;
    }

    /** Whether ρ lies within the cells. */
    boolean covers(double rho) {
        return rho < edges[edges.length - 1];
    }

    /** A_φ and B_z per tesla at ρ (covered) into out[0..1], by Clenshaw's recurrence. */
    void at(double rho, double[] out) {
        int c = cell(rho);
        double[] cell = coefficients[c];
        int terms = cell.length / 2;
        double lo = edges[c];
        double hi = edges[c + 1];
        double x = (2 * rho - lo - hi) / (hi - lo);
        double twoX = 2 * x;
        double a1 = 0;
        double a2 = 0;
        double b1 = 0;
        double b2 = 0;
        for (int j = terms - 1; j >= 1; j--) {
            double a0 = twoX * a1 - a2 + cell[j];
            a2 = a1;
            a1 = a0;
            double b0 = twoX * b1 - b2 + cell[terms + j];
            b2 = b1;
            b1 = b0;
        }
        out[0] = rho * (x * a1 - a2 + cell[0]);
        out[1] = x * b1 - b2 + cell[terms];
    }

    /** The cell holding ρ, by bisection over the edges. */
    private int cell(double rho) {
        int lo = 0;
        int hi = edges.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (edges[mid] <= rho) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
