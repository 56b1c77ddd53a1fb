package org.kinduct.solver.dynamics;

/**
 * Where the energy of a run went, joules. Supplied: work of the applied forces on free bodies,
 * work done to hold prescribed bodies on their paths against magnetic and spring forces, and the
 * work of the drives of AC source coils (Σ_k I_k·e_k with e_k the transformer EMF those coils
 * induce in loop k; the interaction energy of loop currents with sources is counted as work, not
 * stored). It must equal the Joule heat in the loops, the heat of viscous damping, and the changes
 * of kinetic energy, potential energy (springs, gravity) and magnetic energy ½·IᵀMI of the loop
 * currents; {@link #residualJ} is what is left, a check on the integration.
 */
public record EnergyAudit(double appliedJ, double holdingJ, double driveJ, double jouleJ, double dampingJ,
                          double deltaKineticJ, double deltaPotentialJ, double deltaMagneticJ) {

    /** Energy put in, joules. */
    public double suppliedJ() {
        return appliedJ + holdingJ + driveJ;
    }

    /** Supplied minus dissipated minus stored, joules; zero up to integration error. */
    public double residualJ() {
        return suppliedJ() - jouleJ - dampingJ - deltaKineticJ - deltaPotentialJ - deltaMagneticJ;
    }
}
