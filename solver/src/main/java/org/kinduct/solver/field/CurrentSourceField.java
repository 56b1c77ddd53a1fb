package org.kinduct.solver.field;

import org.kinduct.scene.Checks;

/**
 * The common part of the fields of real currents (source coils, and magnets through their
 * equivalent surface currents): their vector potential is physical, the flux through a polygon
 * is Φ = ∮ A·dl (Stokes' theorem), and the B_z moments along a segment are line integrals of B_z;
 * both by {@link EdgeQuadrature#STANDARD}. Stokes' theorem over the polygon's edges counts each
 * region with its winding number, as {@link PlaneField#flux} requires. Their potentials' gradients
 * are closed form ({@link GradientField}).
 */
abstract sealed class CurrentSourceField implements GradientField
        permits PolygonCoilField, CircleCoilField, BlockMagnetField, CylinderMagnetField {

    @Override
    public final boolean hasPhysicalPotential() {
        return true;
    }

    /**
     * ∮ A·dl around the polygon by {@link EdgeQuadrature#STANDARD}: estimated relative error below
     * 1e-10 (or 1e-13 of Σ|∫A·dl| over the edges when the flux cancels) within its budget of
     * 20 000 potential evaluations; a typical 4-edge loop takes 92–500, a loop whose edges run along
     * the footprint of a magnet touching the plane a few thousand. If the budget runs out the
     * best estimate is returned; call {@link EdgeQuadrature} directly to see its error estimate.
     */
    @Override
    public final double flux(double[] xs, double[] ys) {
        requirePolygon(xs, ys, "a flux polygon");
        double[] a = new double[2];
        return EdgeQuadrature.STANDARD.closedPath((x, y, dx, dy) -> {
            potential(x, y, a);
            return a[0] * dx + a[1] * dy;
        }, xs, ys, breaks()).value();
    }

    @Override
    public final void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        EdgeQuadrature.Estimate moments =
                EdgeQuadrature.STANDARD.segment((x, y, dx, dy) -> bz(x, y), ax, ay, bx, by, breaks());
        out[0] = moments.value();
        out[1] = moments.firstMoment();
    }

    /**
     * Where B_z jumps and A kinks along a segment in the plane: the edge of a magnet's face lying
     * in the plane (stand-off 0). Quadrature panels start and end there, which keeps the flux
     * accurate, and smooth in time as a loop moves, to a few ulp instead of the 1e-5 a singularity
     * inside a panel left. Fields smooth in the plane have none, and state their clearance from a
     * segment instead ({@link EdgeQuadrature.Breaks#clearanceM}).
     */
    @Override
    public abstract EdgeQuadrature.Breaks breaks();

    static void requirePolygon(double[] xs, double[] ys, String what) {
        if (xs.length != ys.length || xs.length < 3) {
            throw new IllegalArgumentException(what + " needs matching coordinate arrays of at least 3 vertices, got "
                    + xs.length + " x and " + ys.length + " y");
        }
    }

    /** A coil filament in the drawing plane would have a singular field there. */
    static double requireCoilOffPlane(double z0M) {
        Checks.finite(z0M, "coil plane z");
        if (z0M == 0) {
            throw new IllegalArgumentException("a coil must sit off the drawing plane (z ≠ 0)");
        }
        return z0M;
    }

    /** A magnet's z range must be ordered and must not reach through the drawing plane. */
    static void requireOffPlane(double zLowM, double zHighM) {
        Checks.finite(zLowM, "magnet bottom z");
        Checks.finite(zHighM, "magnet top z");
        if (!(zLowM < zHighM)) {
            throw new IllegalArgumentException("magnet bottom z must lie below its top z, got " + zLowM
                    + " and " + zHighM);
        }
        if (zLowM < 0 && zHighM > 0) {
            throw new IllegalArgumentException("a magnet must not cross the drawing plane z = 0, got z from "
                    + zLowM + " to " + zHighM);
        }
    }
}
