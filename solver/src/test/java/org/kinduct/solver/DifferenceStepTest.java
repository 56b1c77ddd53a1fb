package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The five-point central difference f'(t) ≈ [−f(t+2h) + 8f(t+h) − 8f(t−h) + f(t−2h)]/(12h):
 * exact for polynomials of degree ≤ 4, error h⁴·f⁽⁵⁾/30 otherwise (Abramowitz &amp; Stegun,
 * <i>Handbook of Mathematical Functions</i>, 1964, eq. 25.3.6; from memory).
 */
class DifferenceStepTest {

    private static double negativeDerivative(DoubleUnaryOperator f, double t, double h) {
        double[] values = new double[DifferenceStep.OFFSETS.length];
        for (int k = 0; k < values.length; k++) {
            values[k] = f.applyAsDouble(t + DifferenceStep.OFFSETS[k] * h);
        }
        return DifferenceStep.negativeDerivative(values, h);
    }

    @Test
    void isExactForQuarticPolynomials() {
        DoubleUnaryOperator quartic = t -> 3 - 2 * t + 0.5 * t * t - 4 * t * t * t + 1.25 * t * t * t * t;
        double t = 0.75;
        double derivative = -2 + t - 12 * t * t + 5 * t * t * t;
        assertEquals(-derivative, negativeDerivative(quartic, t, 0.125), 1e-13);
    }

    @Test
    void errorFallsSixteenfoldWhenTheStepHalves() {
        double t = 0.3;
        // d/dt e^t = e^t; error ≈ h⁴·e^t/30, so halving h divides it by 2⁴.
        double coarse = Math.abs(negativeDerivative(Math::exp, t, 0.1) + Math.exp(t));
        double fine = Math.abs(negativeDerivative(Math::exp, t, 0.05) + Math.exp(t));
        assertEquals(Math.pow(0.1, 4) * Math.exp(t) / 30, coarse, 0.1 * coarse);
        assertTrue(Math.abs(coarse / fine - 16) < 0.5, "ratio " + coarse / fine);
    }

    @Test
    void vanishesExactlyWhenNothingChanges() {
        assertEquals(0, DifferenceStep.negativeDerivative(new double[] {0.1, 0.1, 0.1, 0.1}, 1e-9));
    }
}
