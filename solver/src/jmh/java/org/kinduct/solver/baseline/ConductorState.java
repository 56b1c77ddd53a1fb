package org.kinduct.solver.baseline;

import java.util.List;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Vec2;

/**
 * Everything computed for one conductor at one instant. EMF and current are positive along the
 * conductor's vertex order; for loops, flux is positive with the normal given by that order
 * (right-hand rule), so a counter-clockwise loop in B_z &gt; 0 has positive flux.
 *
 * @param vertices the conductor's vertices where they are at this instant, metres
 * @param fluxWb flux through one turn (NaN for wires)
 * @param linkageWb flux linkage N·Φ (NaN for wires)
 * @param emfFluxV −dλ/dt (NaN for wires)
 * @param emfMotionalV ∮ or ∫ (v × B − ∂A/∂t)·dl, times turns for loops
 * @param emfV the EMF reported (motional method; the flux method is its check)
 * @param disagreement |emfFlux − emfMotional| / max(|emfFlux|, |emfMotional|, floor); 0 for wires;
 *        NaN at an instant where the flux has a kink (a loop edge crossing a field-patch edge, a
 *        key of a linear path), where −dλ/dt is not defined and so is no check
 * @param noiseV the reporting threshold: an |EMF| at or below it is rounding noise, shown as 0 with
 *        no + end, and a current at or below noiseV/R gets no sense
 * @param positiveEnd + terminal for wires and open loops; NONE for closed loops
 * @param currentA current along the vertex order (0 for wires and open loops)
 * @param direction current sense on screen for closed loops
 * @param forceN magnetic force on the conductor in the plane, N (I ∮ dl × B, times turns)
 * @param resistanceOhm total series resistance (winding + load); NaN for wires
 * @param inductanceH self-inductance of a closed loop where it is now, H; NaN for wires, open
 *        loops, and loops whose inductance could not be computed
 * @param inducedFieldIncluded false when an idealized source varies in time, so −∂A/∂t along a
 *        wire could not be included (closed loops always include it through the flux change)
 */
public record ConductorState(String id, Kind kind, List<Vec2> vertices, double fluxWb, double linkageWb,
                             double emfFluxV, double emfMotionalV, double emfV, double disagreement, double noiseV,
                             Terminal positiveEnd, double currentA, Circulation direction, Vec2 forceN,
                             double resistanceOhm, double inductanceH, boolean inducedFieldIncluded) {

    public ConductorState {
        vertices = List.copyOf(vertices);
    }

    public enum Kind { WIRE, LOOP }

    /** This state with a closed loop's current and force as a circuit model computed them; the sense follows the one rule. */
    public ConductorState withCurrent(double newCurrentA, Vec2 newForceN) {
        Circulation sense = Circulation.of(newCurrentA, Polygons.signedArea(vertices), noiseV / resistanceOhm);
        return new ConductorState(id, kind, vertices, fluxWb, linkageWb, emfFluxV, emfMotionalV, emfV, disagreement,
                noiseV, positiveEnd, newCurrentA, sense, newForceN, resistanceOhm, inductanceH, inducedFieldIncluded);
    }

    /** This state with its self-inductance, henries. */
    public ConductorState withInductance(double henries) {
        return new ConductorState(id, kind, vertices, fluxWb, linkageWb, emfFluxV, emfMotionalV, emfV, disagreement,
                noiseV, positiveEnd, currentA, direction, forceN, resistanceOhm, henries, inducedFieldIncluded);
    }
}
