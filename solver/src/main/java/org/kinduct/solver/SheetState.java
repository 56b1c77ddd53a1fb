package org.kinduct.solver;

import java.util.List;
import java.util.Optional;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.sheet.EddyModel;

/**
 * Everything computed for one plate or channel at one instant: the eddy currents' force and
 * torque on it, their Joule power, the electrodes' potentials and the pairs' voltages, and which
 * model made them ({@code model}). The extended-conductor counterpart of {@link ConductorState};
 * see {@code org.kinduct.solver.plate} for the models and when each is used.
 *
 * @param forceN force of the field on the conductor's currents, N (the drag on a moving plate)
 * @param torqueNm its z torque about {@code pivotM}, N·m
 * @param pivotM the body's pivot where it is at this instant, metres
 * @param reachM the largest distance from the pivot to the outline, metres: |F|·reach bounds the
 *        torque forces of that size exert, the scale a torque's rounding noise is read against
 * @param joulePowerW d·∫|J|²/σ dA, W
 * @param peakCurrentDensityAPerM2 largest cell |J|, A/m²
 * @param magneticReynolds μ0·σ·d·v (plate) or μ0·σ·w·v (channel) with the fastest speed: the
 *        currents' own field relative to the applied one; the resistive limit holds for Rm ≪ 1
 * @param model the resistive limit, or the plate's own field included
 * @param cellM side of the grid's cells, metres
 * @param meanVelocityMPerS a channel's mean flow v̄ at this instant; NaN for a plate
 * @param electrodes potential of each electrode, in the order declared
 * @param pairs voltage of each declared pair
 * @param inducedFieldIncluded false when a moving field patch's induced electric field enters the
 *        electrode potentials (its gradient part is unknown from B_z alone); currents, force and
 *        power are exact either way
 * @param streamFunction ψ for drawing the eddy currents, coarsened (see {@link StreamLattice})
 */
public record SheetState(String id, Kind kind, Vec2 forceN, double torqueNm, Vec2 pivotM, double reachM,
                         double joulePowerW,
                         double peakCurrentDensityAPerM2, double magneticReynolds, EddyModel model, double cellM,
                         double meanVelocityMPerS, List<Electrode> electrodes, List<Pair> pairs,
                         boolean inducedFieldIncluded, StreamLattice streamFunction) {

    /**
     * Above this magnetic Reynolds number the resistive limit no longer holds: a plate is solved
     * with its own field where that model applies, and outputs warn where it does not. At Rm = 0.1
     * the own field lowers the drag of a magnet over a sheet by 0.2 % ((3/4)(Rm/2)², Reitz 1970).
     */
    public static final double REYNOLDS_WARNING = 0.1;

    public enum Kind { PLATE, CHANNEL }

    public SheetState {
        electrodes = List.copyOf(electrodes);
        pairs = List.copyOf(pairs);
    }

    /**
     * True when these results neglect an own field that matters: the resistive limit was used and
     * Rm exceeds {@value #REYNOLDS_WARNING}.
     */
    public boolean beyondResistiveLimit() {
        return model == EddyModel.RESISTIVE_LIMIT && magneticReynolds > REYNOLDS_WARNING;
    }

    /**
     * An electrode's potential, volts, on a zero common to the conductor's electrodes but otherwise
     * arbitrary, and where the electrode is at this instant.
     */
    public record Electrode(String name, Vec2 atM, double potentialV) {
    }

    /**
     * The voltage φ(plus) − φ(minus) of a declared pair, volts.
     *
     * @param noiseV at or below this |voltage| no electrode is named positive (rounding noise)
     * @param idealVoltageV for a channel pair across the two walls, B·w·v̄ signed as the voltage,
     *        with B_z at the electrodes' midpoint (Shercliff's value for a field uniform over the
     *        whole channel); NaN for plates and for electrodes on one wall
     * @param endShortingRatio voltage over idealVoltageV: below 1 where current closes through
     *        liquid outside the field; NaN where the ideal is NaN or zero
     */
    public record Pair(String plus, String minus, double voltageV, double noiseV, double idealVoltageV,
                       double endShortingRatio) {

        /** The electrode at the higher potential, or empty when |voltage| is noise. */
        public Optional<String> positive() {
            return voltageV > noiseV ? Optional.of(plus) : voltageV < -noiseV ? Optional.of(minus) : Optional.empty();
        }
    }
}
