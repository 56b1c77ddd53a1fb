package org.kinduct.solver.dynamics;

/**
 * Where the energy of a run went, joules. Supplied: work of the applied forces on free bodies,
 * work done to hold prescribed bodies on their paths against magnetic and spring forces (and to
 * keep channel flows going against the field's force on the liquid), and the work of the drives of
 * AC source coils (Σ_k I_k·e_k with e_k the transformer EMF those coils induce in loop k, and
 * likewise in the plates and channels; the interaction energy of loop currents with sources is
 * counted as work, not stored). It must equal the Joule heat in the loops, the Joule heat of the
 * eddy currents in plates and channels that can move a free body, the heat of viscous damping,
 * and the changes of kinetic energy, potential energy (springs, gravity) and magnetic energy
 * ½·IᵀMI of the loop currents; {@link #residualJ} is what is left, a check on the integration.
 */
public record EnergyAudit(double appliedJ, double holdingJ, double driveJ, double jouleJ, double eddyJ,
                          double dampingJ, double deltaKineticJ, double deltaPotentialJ, double deltaMagneticJ) {

    /** Energy put in, joules. */
    public double suppliedJ() {
        return appliedJ + holdingJ + driveJ;
    }

    /** Heat made: Joule heat in loops and in plates and channels, and damping heat, joules. */
    public double heatJ() {
        return jouleJ + eddyJ + dampingJ;
    }

    /** Supplied minus dissipated minus stored, joules; zero up to integration error. */
    public double residualJ() {
        return suppliedJ() - heatJ() - deltaKineticJ - deltaPotentialJ - deltaMagneticJ;
    }

    /** The energy turned over, max(|supplied|, heat), joules: the scale the residual is read against. */
    public double turnedOverJ() {
        return Math.max(Math.abs(suppliedJ()), heatJ());
    }
}
