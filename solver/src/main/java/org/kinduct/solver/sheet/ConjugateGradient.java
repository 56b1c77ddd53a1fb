package org.kinduct.solver.sheet;

import java.util.Arrays;
import org.kinduct.solver.field.WorkTally;

/**
 * Preconditioned conjugate gradients (Hestenes &amp; Stiefel 1952; Saad, <i>Iterative Methods for
 * Sparse Linear Systems</i>, 2nd ed., 2003, Algorithm 9.1) for the singular, consistent system of a
 * {@link CellOperator}: with b orthogonal to the constants every iterate's residual stays so, and
 * the constant part of x, which A does not see, is the caller's to fix. Stops when
 * ‖b − A·x‖₂ ≤ tolerance·‖b‖₂, confirmed on the recomputed residual. Vectors are zero outside the
 * operator's cells, so the updates, like A's loops, visit only each row's span of cells.
 */
final class ConjugateGradient {

    /**
     * Cells of one multigrid-preconditioned iteration that cost about one field evaluation, for
     * {@link WorkTally}: on a disc with a long spike (22 000 cells) a run made 4.5e8 cell
     * iterations at about 30 ns and 4.6e7 field evaluations at about 170 ns; four rather than
     * five or six, since a V-cycle costs more per cell on small grids.
     */
    static final int CELLS_PER_EVALUATION = 4;
    /**
     * What a pass pays for each row besides its cells, in cells: a row starts a cache line in each
     * of the operator's and the solve's arrays. A thin strip across the rows shows it: 64 000 cells
     * on 44 642 rows of 17 took 31 ms an iteration, where 22 000 cells in wide rows took under 1 ms.
     */
    static final int ROW_CELLS = 8;

    /** z = M⁻¹·r for a symmetric positive definite M that approximates A. */
    interface Preconditioner {
        void apply(double[] r, double[] z);
    }

    /** Diagonal scaling, the baseline. */
    static Preconditioner jacobi(CellOperator a) {
        return (r, z) -> {
            for (int k = 0; k < r.length; k++) {
                z[k] = a.inverseDiagonal[k] * r[k];
            }
        };
    }

    /** How a solve ended. */
    record Outcome(int iterations, double relativeResidual) {
    }

    private ConjugateGradient() {
    }

    /** The field evaluations one iteration on {@code a} counts as. */
    private static int work(CellOperator a) {
        return Math.max(1, (a.visitedCount() + ROW_CELLS * a.ny) / CELLS_PER_EVALUATION);
    }

    /**
     * Solves A·x = b from x = 0 (x is overwritten).
     *
     * @throws SheetConvergenceException when {@code maxIterations} pass without reaching the tolerance
     */
    static Outcome solve(CellOperator a, double[] b, double[] x, Preconditioner m, double tolerance,
                         int maxIterations, String method) {
        Arrays.fill(x, 0);
        return solveFrom(a, b, x, m, tolerance, maxIterations, method);
    }

    /**
     * Solves A·x = b starting from the x given (overwritten with the solution): a warm start from
     * a nearby problem's solution saves the iterations its residual is below ‖b‖. The stopping
     * test is the same, so the result is as good as from x = 0.
     *
     * @throws SheetConvergenceException when {@code maxIterations} pass without reaching the tolerance
     */
    static Outcome solveFrom(CellOperator a, double[] b, double[] x, Preconditioner m, double tolerance,
                             int maxIterations, String method) {
        int n = b.length;
        double bNorm = Math.sqrt(a.dot(b, b));
        if (bNorm == 0) {
            Arrays.fill(x, 0);
            return new Outcome(0, 0);
        }
        double target = tolerance * bNorm;
        double[] r = new double[n];
        a.residual(b, x, r);
        double rNorm = Math.sqrt(a.dot(r, r));
        if (rNorm <= target) {
            return new Outcome(0, rNorm / bNorm);
        }
        double[] z = new double[n];
        double[] p = new double[n];
        double[] q = new double[n];
        m.apply(r, z);
        System.arraycopy(z, 0, p, 0, n);
        double rz = a.dot(r, z);
        int work = work(a);
        for (int iteration = 1; iteration <= maxIterations; iteration++) {
            WorkTally.add(work);
            a.apply(p, q);
            double alpha = rz / a.dot(p, q);
            for (int j = 0; j < a.ny; j++) {
                for (int k = a.index(a.rowStart(j), j), end = a.index(a.rowEnd(j), j); k < end; k++) {
                    x[k] += alpha * p[k];
                    r[k] -= alpha * q[k];
                }
            }
            rNorm = Math.sqrt(a.dot(r, r));
            if (rNorm <= target) {
                // The recurrence drifts from the true residual by rounding; check and restart if needed.
                a.residual(b, x, r);
                rNorm = Math.sqrt(a.dot(r, r));
                if (rNorm <= target) {
                    return new Outcome(iteration, rNorm / bNorm);
                }
                m.apply(r, z);
                System.arraycopy(z, 0, p, 0, n);
                rz = a.dot(r, z);
                continue;
            }
            m.apply(r, z);
            double rzNext = a.dot(r, z);
            double beta = rzNext / rz;
            rz = rzNext;
            for (int j = 0; j < a.ny; j++) {
                for (int k = a.index(a.rowStart(j), j), end = a.index(a.rowEnd(j), j); k < end; k++) {
                    p[k] = z[k] + beta * p[k];
                }
            }
        }
        throw new SheetConvergenceException(method, tolerance, maxIterations, rNorm / bNorm);
    }
}
