package org.kinduct.solver.run;

import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;

/**
 * A result that is not a number is an error, never a value: NaN or infinity where a quantity
 * applies would be written as "does not apply" (JSON null) or printed as "NaN V". The quantities
 * that may be NaN by design are left alone: a wire's flux, the disagreement at a kink of the
 * flux, an inductance that could not be computed (each with its stated reason).
 */
final class FiniteResults {

    private FiniteResults() {
    }

    /** {@code s}, after checking every quantity that applies is finite. */
    static Snapshot require(Snapshot s) {
        for (ConductorState c : s.conductors()) {
            check(s, c, "EMF", c.emfV());
            check(s, c, "motional EMF", c.emfMotionalV());
            check(s, c, "current", c.currentA());
            check(s, c, "reporting threshold", c.noiseV());
            if (c.kind() == ConductorState.Kind.LOOP) {
                check(s, c, "flux", c.fluxWb());
                check(s, c, "flux-rule EMF", c.emfFluxV());
                check(s, c, "resistance", c.resistanceOhm());
            }
        }
        return s;
    }

    /** {@code audit}, after checking every entry is finite; null stays null (quasi-static instants have none). */
    static EnergyAudit require(EnergyAudit audit) {
        if (audit != null && !Double.isFinite(audit.suppliedJ() + audit.heatJ()
                + audit.deltaKineticJ() + audit.deltaPotentialJ() + audit.deltaMagneticJ())) {
            throw new RunFailedException("the energy audit of the run came out as " + audit + " instead of numbers;"
                    + " the scene lies outside what the solver can compute");
        }
        return audit;
    }

    private static void check(Snapshot s, ConductorState c, String quantity, double value) {
        if (!Double.isFinite(value)) {
            throw new RunFailedException("conductor '" + c.id() + "': the " + quantity + " at t = " + s.tS()
                    + " s came out as " + value + " instead of a number; the scene lies outside what the solver"
                    + " can compute");
        }
    }
}
