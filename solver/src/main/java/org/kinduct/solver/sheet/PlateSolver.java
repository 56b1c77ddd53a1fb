package org.kinduct.solver.sheet;

/**
 * Settings of the self-field plate solver, and the factory of prepared {@link Plate}s.
 *
 * @param relativeTolerance target ‖b − A·ψ‖₂/‖b‖₂ of each solve, in (0, 1)
 * @param maxIterations iteration budget of each solve (outer flexible-GMRES iterations)
 * @param restart Krylov vectors kept before a restart, at least 2
 * @param padding the FFT period as a multiple of the grid, at least 2 (exact linear
 *                convolution already at 2; larger only to measure that it changes nothing)
 */
public record PlateSolver(double relativeTolerance, int maxIterations, int restart, double padding) {

    /** Relative residual of {@link #standard()}. */
    public static final double DEFAULT_TOLERANCE = 1e-8;

    public PlateSolver {
        if (!(relativeTolerance > 0 && relativeTolerance < 1)) {
            throw new IllegalArgumentException("relative tolerance must lie in (0, 1), got " + relativeTolerance);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration budget must be at least 1, got " + maxIterations);
        }
        if (restart < 2) {
            throw new IllegalArgumentException("restart length must be at least 2, got " + restart);
        }
        if (!(padding >= 2) || !Double.isFinite(padding)) {
            throw new IllegalArgumentException("padding must be at least 2, got " + padding);
        }
    }

    /** Tolerance {@value #DEFAULT_TOLERANCE}, 400 iterations, restart 40, padding 2. */
    public static PlateSolver standard() {
        return new PlateSolver(DEFAULT_TOLERANCE, 400, 40, 2);
    }

    /** Prepares a plate: its mesh network and the FFT of its self-inductance kernel. */
    public Plate prepare(SheetGrid grid, SheetConductor conductor) {
        return new Plate(grid, conductor, this);
    }
}
