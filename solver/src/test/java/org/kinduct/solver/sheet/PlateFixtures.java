package org.kinduct.solver.sheet;

import org.kinduct.solver.field.PhysicalConstants;

/** Helpers of the self-field plate tests; each formula here is independent of the solver. */
final class PlateFixtures {

    private PlateFixtures() {
    }

    /**
     * Vertical force on a plate in z = 0 from a point dipole m ẑ at (0, 0, h), summed over the
     * solution's filaments: a filament of current I along +x in the field's in-plane part feels
     * I·h·(x̂ × B)_z = I·h·B_y, along +y −I·h·B_x (Griffiths, <i>Introduction to Electrodynamics</i>,
     * 4th ed., 2013, §5.1.3). In the plane z = 0 the dipole's in-plane field is
     * B_ρ = −3μ0·m·h·ρ/(4π·r⁵), r² = ρ² + h² (the dipole field μ0/(4π)·(3(m·r̂)r̂ − m)/r³ with
     * r = (x, y, −h)). The force on the dipole is minus this (Newton's third law for steady currents).
     */
    static double verticalForceOnPlateN(PlateSolution s, double momentAm2, double heightM) {
        SheetGrid g = s.grid();
        double h = g.cellM();
        double k = -3 * PhysicalConstants.MU_0_OVER_4PI * momentAm2 * heightM;
        double fz = 0;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 1; i < g.nx(); i++) {
                double x = g.originXM() + i * h;
                double y = g.originYM() + (j + 0.5) * h;
                double by = k * y / Math.pow(x * x + y * y + heightM * heightM, 2.5);
                fz += s.faceCurrentXA(i, j) * h * by;
            }
        }
        for (int j = 1; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                double x = g.originXM() + (i + 0.5) * h;
                double y = g.originYM() + j * h;
                double bx = k * x / Math.pow(x * x + y * y + heightM * heightM, 2.5);
                fz -= s.faceCurrentYA(i, j) * h * bx;
            }
        }
        return fz;
    }

    /** B_z at (x, y, z) of a point dipole m ẑ at (0, 0, h): μ0·m·(2(z − h)² − ρ²)/(4π·((z − h)² + ρ²)^{5/2}). */
    static double dipoleBz(double momentAm2, double heightM, double x, double y, double z) {
        double dz = z - heightM;
        double rho2 = x * x + y * y;
        return PhysicalConstants.MU_0_OVER_4PI * momentAm2 * (2 * dz * dz - rho2) / Math.pow(dz * dz + rho2, 2.5);
    }
}
