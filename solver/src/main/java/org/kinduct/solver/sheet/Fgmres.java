package org.kinduct.solver.sheet;

/**
 * Restarted flexible GMRES, matrix-free (Saad, "A flexible inner-outer preconditioned GMRES
 * algorithm", SIAM J. Sci. Comput. 14, 461, 1993; Saad, <i>Iterative Methods for Sparse Linear
 * Systems</i>, 2nd ed., 2003, Algorithm 9.6): right preconditioning, modified Gram–Schmidt,
 * Givens rotations, the preconditioned directions kept so that the preconditioner may change from
 * one iteration to the next (ours is an inner conjugate-gradient solve, not a fixed matrix).
 *
 * <p>Why not Hipparchus: its iterative solvers ({@code ConjugateGradient}, {@code SymmLQ}) need
 * a symmetric operator, and the steady plate's operator is not (the motion term is skew), nor is
 * a preconditioner built from an inner iteration a fixed linear map. Stops when the true
 * residual ‖b − A·x‖₂ ≤ tolerance·‖b‖₂ (checked at each restart and at the end), or throws
 * {@link SheetConvergenceException} when the iteration budget is spent.
 */
final class Fgmres {

    /** y = A·x on vectors of one length. */
    interface Operator {
        void apply(double[] x, double[] y);
    }

    /** How a solve ended. */
    record Outcome(int iterations, double relativeResidual) {
    }

    private Fgmres() {
    }

    /**
     * Solves A·x = b from the given x (overwritten).
     *
     * @param restart Krylov vectors kept between restarts
     */
    static Outcome solve(Operator a, Operator preconditioner, double[] b, double[] x, double tolerance,
                         int maxIterations, int restart, String method) {
        return solve(a, preconditioner, b, x, tolerance, maxIterations, new Workspace(b.length, restart), method);
    }

    /** The Krylov vectors of one size and restart length, kept between solves (they are most of the memory). */
    static final class Workspace {
        final int n;
        final int restart;
        final double[][] v;
        final double[][] z;

        Workspace(int n, int restart) {
            this.n = n;
            this.restart = restart;
            v = new double[restart + 1][n];
            z = new double[restart][n];
        }
    }

    static Outcome solve(Operator a, Operator preconditioner, double[] b, double[] x, double tolerance,
                         int maxIterations, Workspace space, String method) {
        int n = b.length;
        int restart = space.restart;
        if (space.n != n) {
            throw new IllegalArgumentException("workspace for " + space.n + " unknowns, system has " + n);
        }
        double bNorm = norm(b);
        if (bNorm == 0) {
            java.util.Arrays.fill(x, 0);
            return new Outcome(0, 0);
        }
        double target = tolerance * bNorm;
        double[][] v = space.v;
        double[][] z = space.z;
        double[][] h = new double[restart + 1][restart];
        double[] cs = new double[restart];
        double[] sn = new double[restart];
        double[] g = new double[restart + 1];
        double[] r = new double[n];
        double[] w = new double[n];
        int iterations = 0;
        while (true) {
            a.apply(x, w);
            for (int k = 0; k < n; k++) {
                r[k] = b[k] - w[k];
            }
            double beta = norm(r);
            if (beta <= target) {
                return new Outcome(iterations, beta / bNorm);
            }
            if (iterations >= maxIterations) {
                throw new SheetConvergenceException(method, tolerance, maxIterations, beta / bNorm);
            }
            for (int k = 0; k < n; k++) {
                v[0][k] = r[k] / beta;
            }
            java.util.Arrays.fill(g, 0);
            g[0] = beta;
            int used = 0;
            for (int j = 0; j < restart && iterations < maxIterations; j++) {
                iterations++;
                preconditioner.apply(v[j], z[j]);
                a.apply(z[j], w);
                for (int i = 0; i <= j; i++) {
                    double dot = dot(w, v[i]);
                    h[i][j] = dot;
                    double[] vi = v[i];
                    for (int k = 0; k < n; k++) {
                        w[k] -= dot * vi[k];
                    }
                }
                double wNorm = norm(w);
                h[j + 1][j] = wNorm;
                for (int i = 0; i < j; i++) {
                    double t = cs[i] * h[i][j] + sn[i] * h[i + 1][j];
                    h[i + 1][j] = -sn[i] * h[i][j] + cs[i] * h[i + 1][j];
                    h[i][j] = t;
                }
                double rho = Math.hypot(h[j][j], h[j + 1][j]);
                cs[j] = h[j][j] / rho;
                sn[j] = h[j + 1][j] / rho;
                h[j][j] = rho;
                h[j + 1][j] = 0;
                g[j + 1] = -sn[j] * g[j];
                g[j] = cs[j] * g[j];
                used = j + 1;
                if (Math.abs(g[j + 1]) <= target || wNorm == 0) {
                    break;
                }
                for (int k = 0; k < n; k++) {
                    v[j + 1][k] = w[k] / wNorm;
                }
            }
            double[] y = new double[used];
            for (int i = used - 1; i >= 0; i--) {
                double s = g[i];
                for (int k = i + 1; k < used; k++) {
                    s -= h[i][k] * y[k];
                }
                y[i] = s / h[i][i];
            }
            for (int i = 0; i < used; i++) {
                double[] zi = z[i];
                double yi = y[i];
                for (int k = 0; k < n; k++) {
                    x[k] += yi * zi[k];
                }
            }
        }
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * b[k];
        }
        return s;
    }

    static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }
}
