package org.kinduct.solver.field;

/**
 * The potential of an axisymmetric source (circular filament, cylinder magnet), A = A_φ(ρ)·φ̂,
 * and its gradient from A_φ and B_z alone: with g = A_φ/ρ, A = g·(−dy, dx), and from
 * B_z = (1/ρ)·d(ρA_φ)/dρ (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, curl in
 * cylindrical coordinates, inside back cover) g′(ρ) = (B_z − 2g)/ρ, so that
 * ∂A_x/∂x = −g′·dx·dy/ρ, ∂A_x/∂y = −g − g′·dy²/ρ, ∂A_y/∂x = g + g′·dx²/ρ, ∂A_y/∂y = g′·dx·dy/ρ.
 * On the axis A = 0 and the gradient is B_z/2 times the rotation by a right angle.
 */
final class Axisymmetric {

    private Axisymmetric() {
    }

    /**
     * |(dx, dy)| as √(dx² + dy²): scene lengths lie far from where the squares over- or underflow,
     * so the care (and cost) of {@link Math#hypot} buys nothing here; within an ulp of it.
     */
    static double distance(double dx, double dy) {
        return Math.sqrt(dx * dx + dy * dy);
    }

    /** (A_x, A_y) at offset (dx, dy) from the axis, ρ = |(dx, dy)| &gt; 0, into out[0..1]. */
    static void potential(double dx, double dy, double rho, double aPhi, double[] out) {
        double g = aPhi / rho;
        out[0] = -g * dy;
        out[1] = g * dx;
    }

    /** {@link GradientField#jet} at offset (dx, dy) from the axis, given A_φ and B_z there. */
    static void jet(double dx, double dy, double rho, double aPhi, double bz, double[] out) {
        out[6] = bz;
        if (rho == 0) {
            out[0] = 0;
            out[1] = 0;
            out[2] = 0;
            out[3] = -bz / 2;
            out[4] = bz / 2;
            out[5] = 0;
            return;
        }
        double g = aPhi / rho;
        double slopeOverRho = (bz - 2 * g) / (rho * rho);
        out[0] = -g * dy;
        out[1] = g * dx;
        out[2] = -slopeOverRho * dx * dy;
        out[3] = -g - slopeOverRho * dy * dy;
        out[4] = g + slopeOverRho * dx * dx;
        out[5] = slopeOverRho * dx * dy;
    }
}
