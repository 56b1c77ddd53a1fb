package org.kinduct.solver.field;

import org.kinduct.scene.Checks;

/**
 * A circular filament coil of radius a centred at (cx, cy) in the plane z = z0 (z0 ≠ 0), current
 * (ampere-turns N·I) positive counter-clockwise seen from +z. B_z by Simpson et al. (NASA TR
 * 20010038494, 2001) and A_φ by Jackson (Classical Electrodynamics, 3rd ed., eq. 5.37); see
 * {@link CircularFilament} for the formulas and their accuracy.
 */
public final class CircleCoilField extends CurrentSourceField {

    private final double cx;
    private final double cy;
    private final double radiusM;
    private final double z0M;
    private final double ampereTurns;

    /**
     * @param cx centre x, metres
     * @param cy centre y, metres
     * @param radiusM radius, metres
     * @param z0M height of the coil plane, metres, non-zero
     * @param ampereTurns N·I, amperes, positive counter-clockwise
     */
    public CircleCoilField(double cx, double cy, double radiusM, double z0M, double ampereTurns) {
        this.cx = Checks.finite(cx, "coil centre x");
        this.cy = Checks.finite(cy, "coil centre y");
        this.radiusM = Checks.positive(radiusM, "coil radius");
        this.z0M = requireCoilOffPlane(z0M);
        this.ampereTurns = Checks.finite(ampereTurns, "ampere-turns");
    }

    /** No break in the plane; the filament keeps at least |z0| off it, and its circle's distance in it. */
    @Override
    public EdgeQuadrature.Breaks breaks() {
        return Clearance.aroundDisc(cx, cy, radiusM, Math.abs(z0M));
    }

    @Override
    public double bz(double x, double y) {
        return CircularFilament.bz(radiusM, z0M, ampereTurns, Axisymmetric.distance(x - cx, y - cy));
    }

    @Override
    public void potential(double x, double y, double[] out) {
        double dx = x - cx;
        double dy = y - cy;
        double rho = Axisymmetric.distance(dx, dy);
        if (rho == 0) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        Axisymmetric.potential(dx, dy, rho, CircularFilament.aPhi(radiusM, z0M, ampereTurns, rho), out);
    }

    /** A, its gradient from A_φ and B_z ({@link Axisymmetric#jet}), and B_z. */
    @Override
    public void jet(double x, double y, double[] out) {
        double dx = x - cx;
        double dy = y - cy;
        double rho = Axisymmetric.distance(dx, dy);
        double aPhi = rho == 0 ? 0 : CircularFilament.aPhi(radiusM, z0M, ampereTurns, rho);
        Axisymmetric.jet(dx, dy, rho, aPhi, CircularFilament.bz(radiusM, z0M, ampereTurns, rho), out);
    }
}
