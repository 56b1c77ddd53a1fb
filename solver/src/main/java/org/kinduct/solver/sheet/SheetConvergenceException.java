package org.kinduct.solver.sheet;

/** The linear solver did not reach its tolerance within its iteration budget. */
public final class SheetConvergenceException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final double reachedResidual;

    SheetConvergenceException(String method, double tolerance, int iterations, double reachedResidual) {
        super(method + " did not reach relative residual " + tolerance + " within " + iterations
                + " iterations (reached " + reachedResidual + "); raise the budget or the tolerance, or check"
                + " the grid for cells hanging on nearly closed faces");
        this.reachedResidual = reachedResidual;
    }

    /** Relative residual ‖b − A·φ‖₂/‖b‖₂ when the budget ran out. */
    public double reachedResidual() {
        return reachedResidual;
    }
}
