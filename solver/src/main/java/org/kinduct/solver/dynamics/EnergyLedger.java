package org.kinduct.solver.dynamics;

import org.kinduct.solver.dynamics.StateLayout.AuditTerm;

/**
 * The energy audit's bookkeeping: the powers of one evaluation written as the rates of the
 * running energy integrals in the state ({@link StateLayout.AuditTerm}), and at the end of a run
 * the {@link EnergyAudit} from those integrals and the changes of the stored energies between
 * the first and the last state. The integrals ride on the steps the state needs: the integrator
 * does not control their error.
 */
final class EnergyLedger {

    /** Kinetic, potential and magnetic energy at one state, joules. */
    record Stored(double kineticJ, double potentialJ, double magneticJ) {
    }

    private final StateLayout layout;

    EnergyLedger(StateLayout layout) {
        this.layout = layout;
    }

    /** Writes {@code powerW}, watts, as the rate of the integral of {@code term}. */
    void book(double[] derivative, AuditTerm term, double powerW) {
        derivative[layout.audit(term)] = powerW;
    }

    /** The audit of a run that ended in state {@code end} with stored energies {@code first} and {@code last}. */
    EnergyAudit audit(double[] end, Stored first, Stored last) {
        return new EnergyAudit(end[layout.audit(AuditTerm.APPLIED)], end[layout.audit(AuditTerm.HOLDING)],
                end[layout.audit(AuditTerm.DRIVE)], end[layout.audit(AuditTerm.JOULE)],
                end[layout.audit(AuditTerm.EDDY)], end[layout.audit(AuditTerm.DAMPING)], last.kineticJ() - first.kineticJ(),
                last.potentialJ() - first.potentialJ(), last.magneticJ() - first.magneticJ());
    }
}
