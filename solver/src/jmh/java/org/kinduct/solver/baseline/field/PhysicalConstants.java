package org.kinduct.solver.baseline.field;

/** Physical constants in SI units, each with its source. */
public final class PhysicalConstants {

    /**
     * Vacuum magnetic permeability μ0, N/A² (CODATA 2018 recommended value, NIST). Measured since
     * the 2019 SI redefinition; it differs from 4π·1e-7 by about 5.4e-10 relative.
     */
    public static final double MU_0 = 1.25663706212e-6;

    /** μ0/(4π), the prefactor of the Biot–Savart law, T·m/A. */
    public static final double MU_0_OVER_4PI = MU_0 / (4 * Math.PI);

    private PhysicalConstants() {
    }
}
