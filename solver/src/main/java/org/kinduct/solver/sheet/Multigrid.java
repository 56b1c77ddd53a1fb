package org.kinduct.solver.sheet;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;

/**
 * One symmetric multigrid V-cycle as a preconditioner for conjugate gradients: red–black
 * Gauss–Seidel smoothing (red then black before, black then red after, so that the cycle is a
 * symmetric operator, as conjugate gradients need),
 * restriction by summing the residuals of the four fine cells of a coarse cell, prolongation by
 * copying the coarse correction to them, coarse levels from {@link CellOperator#coarsened()} down
 * to at most {@value #COARSEST_CELLS} cells, solved there directly. Aggregating cells keeps the
 * cut-cell geometry in the conductances of every level, so the cycle needs no interpolation across
 * the edge; conjugate gradients make up for what piecewise-constant transfer loses. Work per cycle
 * is proportional to the number of cells.
 */
final class Multigrid implements ConjugateGradient.Preconditioner {

    /** Coarsening stops at or below this many cells; the last level is solved by a dense inverse. */
    static final int COARSEST_CELLS = 64;
    /**
     * Red–black pairs of sweeps before and after the coarse correction. Two rather than one: eight
     * iterations instead of thirteen to 1e-10 on a disc with a hole, for about a quarter less work.
     */
    static final int SWEEPS = 2;

    private final CellOperator[] levels;
    private final double[][] x;
    private final double[][] b;
    private final double[][] r;
    /** Indices of the coarsest level's cells and the inverse of its regularized matrix. */
    private final int[] coarseCells;
    private final double[] coarseInverse;

    Multigrid(CellOperator fine) {
        List<CellOperator> list = new ArrayList<>();
        list.add(fine);
        CellOperator level = fine;
        while (level.activeCount() > COARSEST_CELLS && (level.nx > 1 || level.ny > 1)) {
            level = level.coarsened();
            list.add(level);
        }
        levels = list.toArray(new CellOperator[0]);
        x = new double[levels.length][];
        b = new double[levels.length][];
        r = new double[levels.length][];
        for (int l = 0; l < levels.length; l++) {
            r[l] = new double[levels[l].size()];
            if (l > 0) {
                x[l] = new double[levels[l].size()];
                b[l] = new double[levels[l].size()];
            }
        }
        CellOperator coarsest = levels[levels.length - 1];
        coarseCells = activeCells(coarsest);
        coarseInverse = regularizedInverse(coarsest, coarseCells);
    }

    int levelCount() {
        return levels.length;
    }

    @Override
    public void apply(double[] residual, double[] out) {
        cycle(0, residual, out);
    }

    private void cycle(int l, double[] rhs, double[] sol) {
        CellOperator a = levels[l];
        if (l == levels.length - 1) {
            coarseSolve(rhs, sol);
            return;
        }
        Arrays.fill(sol, 0);
        for (int s = 0; s < SWEEPS; s++) {
            a.sweep(rhs, sol, 0);
            a.sweep(rhs, sol, 1);
        }
        a.residual(rhs, sol, r[l]);
        CellOperator c = levels[l + 1];
        restrict(a, r[l], c, b[l + 1]);
        cycle(l + 1, b[l + 1], x[l + 1]);
        prolongAdd(c, x[l + 1], a, sol);
        for (int s = 0; s < SWEEPS; s++) {
            a.sweep(rhs, sol, 1);
            a.sweep(rhs, sol, 0);
        }
    }

    private static void restrict(CellOperator fine, double[] residual, CellOperator coarse, double[] out) {
        Arrays.fill(out, 0);
        for (int j = 0; j < fine.ny; j++) {
            int k = fine.index(fine.rowStart(j), j);
            int row = coarse.index(0, j >> 1);
            for (int i = fine.rowStart(j); i < fine.rowEnd(j); i++, k++) {
                if (fine.diagonal[k] > 0) {
                    out[row + (i >> 1)] += residual[k];
                }
            }
        }
    }

    private static void prolongAdd(CellOperator coarse, double[] correction, CellOperator fine, double[] out) {
        for (int j = 0; j < fine.ny; j++) {
            int k = fine.index(fine.rowStart(j), j);
            int row = coarse.index(0, j >> 1);
            for (int i = fine.rowStart(j); i < fine.rowEnd(j); i++, k++) {
                if (fine.diagonal[k] > 0) {
                    out[k] += correction[row + (i >> 1)];
                }
            }
        }
    }

    /** The solution with zero sum of A·x = b − mean(b) on the coarsest level. */
    private void coarseSolve(double[] rhs, double[] sol) {
        Arrays.fill(sol, 0);
        int m = coarseCells.length;
        if (m == 0) {
            return;
        }
        double mean = 0;
        for (int cell : coarseCells) {
            mean += rhs[cell];
        }
        mean /= m;
        for (int p = 0; p < m; p++) {
            double sum = 0;
            for (int q = 0; q < m; q++) {
                sum += coarseInverse[p * m + q] * (rhs[coarseCells[q]] - mean);
            }
            sol[coarseCells[p]] = sum;
        }
    }

    private static int[] activeCells(CellOperator a) {
        int[] cells = new int[a.activeCount()];
        int n = 0;
        for (int j = 0; j < a.ny; j++) {
            for (int i = 0; i < a.nx; i++) {
                int k = a.index(i, j);
                if (a.diagonal[k] > 0) {
                    cells[n++] = k;
                }
            }
        }
        return cells;
    }

    /**
     * (A + c·11ᵀ)⁻¹ over the given cells, c the mean diagonal over m: adding the null vector's
     * projector makes the singular matrix of a connected grid invertible without changing its
     * solutions orthogonal to constants (Hipparchus LU, dense; m ≤ {@value #COARSEST_CELLS}).
     */
    private static double[] regularizedInverse(CellOperator a, int[] cells) {
        int m = cells.length;
        if (m == 0) {
            return new double[0];
        }
        int[] position = new int[a.size()];
        Arrays.fill(position, -1);
        double meanDiagonal = 0;
        for (int p = 0; p < m; p++) {
            position[cells[p]] = p;
            meanDiagonal += a.diagonal[cells[p]];
        }
        double shift = meanDiagonal / m / m;
        RealMatrix matrix = new Array2DRowRealMatrix(m, m);
        for (int p = 0; p < m; p++) {
            int k = cells[p];
            for (int q = 0; q < m; q++) {
                matrix.setEntry(p, q, shift);
            }
            matrix.addToEntry(p, p, a.diagonal[k]);
            link(matrix, p, position[k + 1], a.east[k]);
            link(matrix, p, position[k - 1], a.east[k - 1]);
            link(matrix, p, position[k + a.stride], a.north[k]);
            link(matrix, p, position[k - a.stride], a.north[k - a.stride]);
        }
        RealMatrix inverse = new LUDecomposition(matrix).getSolver().getInverse();
        double[] flat = new double[m * m];
        for (int p = 0; p < m; p++) {
            for (int q = 0; q < m; q++) {
                flat[p * m + q] = inverse.getEntry(p, q);
            }
        }
        return flat;
    }

    private static void link(RealMatrix matrix, int p, int q, double conductance) {
        if (q >= 0 && conductance > 0) {
            matrix.addToEntry(p, q, -conductance);
        }
    }
}
