package org.kinduct.solver.dynamics;

import org.kinduct.scene.Scene;
import org.kinduct.solver.circuit.InductanceAtStart;

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
 *   <li>{@link #AUTO}: {@link #INDUCTIVE} when the largest L/R of the closed loops (where they
 *       are at the start) exceeds 1/{@value #AUTO_STEP_FRACTION_DENOMINATOR} of the sampling step dt,
 *       else {@link #QUASI_STATIC}. The sampling step stands for the time scale the user wants
 *       resolved: below that bound the current settles to EMF/R within a tenth of a step, and the
 *       quasi-static current differs from the inductive one by about L/R·dI/dt, under a tenth of
 *       its change over one step (a relative error ωL/R under 3 % for a signal sampled 20 times
 *       a period, far less for finer sampling). Above it the lag matters and the explicit
 *       integrator's steps of a few L/R are no more than a few per sample. Below it those steps
 *       would be many per sample: a rotor coil with L/R = 10 µs sampled every 0.25 ms over 0.1 s
 *       costs minutes inductively, seconds quasi-static, for a lag error ωL/R ≈ 1e-3; a 200-turn
 *       pickup into 10 kΩ (L/R ≈ 0.1 µs) would need millions of steps. (A stricter bound such as
 *       dt/50 makes such everyday runs slow for errors of a few tenths of a per cent.)</li>
 * </ul>
 */
public enum CircuitModel {
    AUTO, INDUCTIVE, QUASI_STATIC;

    /** AUTO picks INDUCTIVE when max L/R &gt; dt / this. */
    public static final int AUTO_STEP_FRACTION_DENOMINATOR = 10;

    /**
     * The model to run {@code scene} with, sampled every {@code dtS} from {@code t0S}: this one,
     * or for AUTO the choice by the largest L/R of its closed loops where they are at t0
     * ({@link InductanceAtStart}). The one place the choice is made, for every run.
     *
     * @throws IllegalArgumentException for AUTO when a closed loop's inductance cannot be computed
     */
    public CircuitModel resolveFor(Scene scene, double t0S, double dtS) {
        return this == AUTO ? resolve(InductanceAtStart.of(scene, t0S).largestTimeConstantS(), dtS) : this;
    }

    /** The model to run: this one, or for AUTO the choice by the largest time constant. */
    public CircuitModel resolve(double largestTimeConstantS, double dtS) {
        if (this != AUTO) {
            return this;
        }
        return largestTimeConstantS > dtS / AUTO_STEP_FRACTION_DENOMINATOR ? INDUCTIVE : QUASI_STATIC;
    }
}
