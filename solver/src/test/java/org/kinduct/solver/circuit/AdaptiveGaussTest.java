package org.kinduct.solver.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import org.junit.jupiter.api.Test;

/** Adaptive quadrature: accurate at logarithmic end singularities (Neumann's integral), bounded work elsewhere. */
class AdaptiveGaussTest {

    private static final double TOL = 1e-11;

    @Test
    void logarithmicEndSingularityToTheTolerance() {
        // ∫₀¹ ln s ds = −1 (common practice).
        assertEquals(-1, AdaptiveGauss.integrate(Math::log, 0, 1, TOL, 0), 2 * TOL);
        // ∫₀¹ ln(1 − s) ds = −1: the singularity at the upper end.
        assertEquals(-1, AdaptiveGauss.integrate(s -> Math.log(1 - s), 0, 1, TOL, 0), 2 * TOL);
    }

    @Test
    void anIntegrandThatNeverSettlesIsRefusedQuickly() {
        // A trillion radians of oscillation: no rule agrees with its halves until the pieces are
        // far smaller than the budget allows. Bisecting depth first to depth 40 took up to 2^40 steps.
        IllegalArgumentException e = assertTimeoutPreemptively(Duration.ofSeconds(5), () -> assertThrows(
                IllegalArgumentException.class, () -> AdaptiveGauss.integrate(s -> Math.sin(1e12 * s), 0, 1, TOL, 0)));
        assertTrue(e.getMessage().startsWith("a line integral did not converge: relative error"), e.getMessage());
    }
}
