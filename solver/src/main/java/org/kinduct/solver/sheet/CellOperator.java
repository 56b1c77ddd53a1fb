package org.kinduct.solver.sheet;

/**
 * The five-point conductance operator of one grid level, (A·φ)_P = Σ_faces g_f·(φ_P − φ_nb), with
 * g_f the face's conductance relative to σ·d (on the finest level its aperture fraction: the
 * conductance σ·d·a_f/h of a face of open length a_f between centres h apart). Symmetric,
 * positive semidefinite, singular: constants on the connected cells are its null space.
 *
 * <p>Vectors carry a ring of ghost cells around the grid so that the loops need no bounds
 * checks: cell (i, j) is at index (i + 1) + (j + 1)·stride; ghost entries stay zero, and so do
 * those of cells without conductance (left out, or outside the sheet).
 *
 * <p>The loops visit each row only from its first to its last cell with conductance: a sheet
 * that fills a small part of its bounding box (a thin strip on the diagonal, a disc with a long
 * spike) costs in proportion to its cells, not to the box. What they skip is zero both ways, so
 * the numbers are the same as over the whole box ({@link Multigrid} passes no residual on from a
 * cell without conductance, so that a coarse cell cut off inside its 2 × 2 block counts the same
 * whether a span covers it or not).
 */
final class CellOperator {

    final int nx;
    final int ny;
    final int stride;
    /** Conductance between a cell and its neighbour at index + 1. */
    final double[] east;
    /** Conductance between a cell and its neighbour at index + stride. */
    final double[] north;
    final double[] diagonal;
    final double[] inverseDiagonal;
    /** Per row j, the first cell with conductance and one past the last (equal for a row without any). */
    private final int[] rowStart;
    private final int[] rowEnd;
    private int activeCount;
    /** Cells the loops visit: the rows' spans. */
    private int visitedCount;

    CellOperator(int nx, int ny) {
        this.nx = nx;
        this.ny = ny;
        stride = nx + 2;
        int size = stride * (ny + 2);
        east = new double[size];
        north = new double[size];
        diagonal = new double[size];
        inverseDiagonal = new double[size];
        rowStart = new int[ny];
        rowEnd = new int[ny];
    }

    /** The finest level: conductances are the grid's aperture fractions. */
    static CellOperator of(SheetGrid grid) {
        CellOperator a = new CellOperator(grid.nx(), grid.ny());
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                int k = a.index(i, j);
                a.east[k] = grid.apertureX(i + 1, j);
                a.north[k] = grid.apertureY(i, j + 1);
            }
        }
        a.completeDiagonal();
        return a;
    }

    int index(int i, int j) {
        return i + 1 + (j + 1) * stride;
    }

    int size() {
        return stride * (ny + 2);
    }

    /** Cells with any conductance, the unknowns of this level. */
    int activeCount() {
        return activeCount;
    }

    void completeDiagonal() {
        activeCount = 0;
        visitedCount = 0;
        for (int j = 0; j < ny; j++) {
            rowStart[j] = nx;
            rowEnd[j] = 0;
            for (int i = 0; i < nx; i++) {
                int k = index(i, j);
                double d = east[k] + east[k - 1] + north[k] + north[k - stride];
                diagonal[k] = d;
                inverseDiagonal[k] = d > 0 ? 1 / d : 0;
                if (d > 0) {
                    activeCount++;
                    rowStart[j] = Math.min(rowStart[j], i);
                    rowEnd[j] = i + 1;
                }
            }
            rowStart[j] = Math.min(rowStart[j], rowEnd[j]);
            visitedCount += rowEnd[j] - rowStart[j];
        }
    }

    /** Cells a pass over this level visits (those with conductance and the gaps between them in a row). */
    int visitedCount() {
        return visitedCount;
    }

    /** The first cell of row j with conductance (equal to {@link #rowEnd} for a row without any). */
    int rowStart(int j) {
        return rowStart[j];
    }

    /** One past the last cell of row j with conductance. */
    int rowEnd(int j) {
        return rowEnd[j];
    }

    /**
     * The next coarser level: cells merged two by two in each direction (one left over at an odd
     * end), each coarse face's conductance half the sum of the fine faces it covers. That is what
     * the same scheme gives on cells twice the size (open length summed, centres 2h apart), and
     * equals the Galerkin product PᵀAP of piecewise-constant prolongation P scaled by ½: an
     * over-correction by 2 that makes aggregation multigrid work for the Laplacian (Braess,
     * "Towards algebraic multigrid for elliptic problems of second order", Computing 55, 1995,
     * from memory).
     */
    CellOperator coarsened() {
        CellOperator c = new CellOperator((nx + 1) / 2, (ny + 1) / 2);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = index(i, j);
                int coarse = c.index(i >> 1, j >> 1);
                if ((i & 1) == 1) {
                    c.east[coarse] += 0.5 * east[k];
                }
                if ((j & 1) == 1) {
                    c.north[coarse] += 0.5 * north[k];
                }
            }
        }
        c.completeDiagonal();
        return c;
    }

    /** y = A·x. */
    void apply(double[] x, double[] y) {
        for (int j = 0; j < ny; j++) {
            int k = index(rowStart[j], j);
            for (int end = index(rowEnd[j], j); k < end; k++) {
                y[k] = diagonal[k] * x[k] - east[k] * x[k + 1] - east[k - 1] * x[k - 1] - north[k] * x[k + stride]
                        - north[k - stride] * x[k - stride];
            }
        }
    }

    /** r = b − A·x. */
    void residual(double[] b, double[] x, double[] r) {
        for (int j = 0; j < ny; j++) {
            int k = index(rowStart[j], j);
            for (int end = index(rowEnd[j], j); k < end; k++) {
                r[k] = b[k] - diagonal[k] * x[k] + east[k] * x[k + 1] + east[k - 1] * x[k - 1]
                        + north[k] * x[k + stride] + north[k - stride] * x[k - stride];
            }
        }
    }

    /** One Gauss–Seidel pass over the cells of one colour ((i + j) mod 2 = colour) of A·x = b. */
    void sweep(double[] b, double[] x, int colour) {
        for (int j = 0; j < ny; j++) {
            int start = rowStart[j];
            int k = index(start + ((start + j + colour) & 1), j);
            for (int end = index(rowEnd[j], j); k < end; k += 2) {
                x[k] = inverseDiagonal[k] * (b[k] + east[k] * x[k + 1] + east[k - 1] * x[k - 1]
                        + north[k] * x[k + stride] + north[k - stride] * x[k - stride]);
            }
        }
    }

    /** a·b over this level's vectors (zero outside the cells with conductance). */
    double dot(double[] a, double[] b) {
        double sum = 0;
        for (int j = 0; j < ny; j++) {
            for (int k = index(rowStart[j], j), end = index(rowEnd[j], j); k < end; k++) {
                sum += a[k] * b[k];
            }
        }
        return sum;
    }
}
