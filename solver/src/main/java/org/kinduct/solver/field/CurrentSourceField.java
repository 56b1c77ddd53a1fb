package org.kinduct.solver.field;

/**
 * The common part of the fields of real currents (source coils, and magnets through their
 * equivalent surface currents): their vector potential is physical, the flux through a polygon
 * is Φ = ∮ A·dl (Stokes' theorem), and the B_z moments along a segment are line integrals of B_z;
 * both by {@link EdgeQuadrature#STANDARD}. Stokes' theorem over the polygon's edges counts each
 * region with its winding number, as {@link PlaneField#flux} requires.
 */
abstract sealed class CurrentSourceField implements PlaneField
        permits PolygonCoilField, CircleCoilField, BlockMagnetField, CylinderMagnetField {

    @Override
    public final boolean hasPhysicalPotential() {
        return true;
    }

    /** ∮ A·dl around the polygon; accuracy as delivered by {@link EdgeQuadrature#STANDARD}. */
    @Override
    public final double flux(double[] xs, double[] ys) {
        if (xs.length != ys.length || xs.length < 3) {
            throw new IllegalArgumentException("a flux polygon needs matching coordinate arrays of at least 3 "
                    + "vertices, got " + xs.length + " x and " + ys.length + " y");
        }
        double[] a = new double[2];
        return EdgeQuadrature.STANDARD.closedPath((x, y, dx, dy) -> {
            potential(x, y, a);
            return a[0] * dx + a[1] * dy;
        }, xs, ys).value();
    }

    @Override
    public final void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        EdgeQuadrature.Estimate moments =
                EdgeQuadrature.STANDARD.segment((x, y, dx, dy) -> bz(x, y), ax, ay, bx, by);
        out[0] = moments.value();
        out[1] = moments.firstMoment();
    }

    static double requireFinite(double v, String what) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number, got " + v);
        }
        return v;
    }

    static double requirePositive(double v, String what) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive, got " + v);
        }
        return v;
    }

    /** A magnet's z range must be ordered and must not reach through the drawing plane. */
    static void requireOffPlane(double zLowM, double zHighM) {
        requireFinite(zLowM, "magnet bottom z");
        requireFinite(zHighM, "magnet top z");
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
