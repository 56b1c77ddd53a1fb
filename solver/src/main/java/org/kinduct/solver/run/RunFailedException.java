package org.kinduct.solver.run;

/**
 * A scene that loaded but whose run could not be completed as asked: the integrator could not
 * keep up (a response far faster than the sampling step), the solver produced a value that is
 * not a number, a loop's shape left what the model can compute during the run. The message names
 * the conductor or body, the time and the reason; no part of a result is returned.
 */
public final class RunFailedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    RunFailedException(String message) {
        super(message);
    }

    RunFailedException(String message, Throwable cause) {
        super(message, cause);
    }
}
