package org.kinduct.solver.dynamics;

/**
 * How {@link CoupledSimulation} treats the currents of closed loops.
 *
 * <ul>
 *   <li>{@link #INDUCTIVE}: each loop's total linkage Ψ_k is a state; the current lags the EMF
 *       by the loops' time constants L/R and the loops act on one another through their mutual
 *       inductances.</li>
 *   <li>{@link #QUASI_STATIC}: no circuit states; I_k = EMF_k/R_k at the present state of
 *       motion, the L → 0 limit of L·dI/dt + R·I = EMF (Griffiths, <i>Introduction to
 *       Electrodynamics</i>, 4th ed., 2013, §7.2.2). The bodies still feel the braking force of
 *       these currents; stored magnetic energy and loop–loop forces, both of order L·I², are
 *       left out. Its error is of order L/R against the motion's time scale.</li>
 *   <li>{@link #AUTO}: {@link #INDUCTIVE} when the largest L/R of the closed loops (as drawn, at
 *       the start) exceeds {@value #AUTO_STEP_FRACTION_DENOMINATOR}th of the sampling step,
 *       else {@link #QUASI_STATIC}. Below that the current settles to EMF/R within a fiftieth of
 *       a step, so sampled currents differ from the inductive ones by about L/R·dI/dt, at most
 *       a few per cent of their change over one step, while the explicit integrator would need
 *       steps of a few L/R: millions of them for a 200-turn pickup into 10 kΩ (L/R ≈ 0.1 µs)
 *       over a one-second run.</li>
 * </ul>
 */
public enum CircuitModel {
    AUTO, INDUCTIVE, QUASI_STATIC;

    /** AUTO picks INDUCTIVE when max L/R &gt; dt / this. */
    public static final int AUTO_STEP_FRACTION_DENOMINATOR = 50;

    /** The model to run: this one, or for AUTO the choice by the largest time constant. */
    CircuitModel resolve(double largestTimeConstantS, double dtS) {
        if (this != AUTO) {
            return this;
        }
        return largestTimeConstantS > dtS / AUTO_STEP_FRACTION_DENOMINATOR ? INDUCTIVE : QUASI_STATIC;
    }
}
