package org.kinduct.solver.baseline.field;

/**
 * B_z the same everywhere in the plane.
 *
 * <p>Flux through a closed polygon is B·(shoelace signed area), which is the winding-weighted
 * area ∬ w dA for any polygon, self-crossing or not (Green's theorem; O'Rourke, <i>Computational
 * Geometry in C</i>, 2nd ed., 1998, §1.3). The area is taken about the polygon's first vertex
 * so that a small loop far from the origin loses no digits. The potential A = ½B(−y, x) has
 * curl B_z, but a uniform field is an idealization whose induced electric field depends on where
 * its change is centred, so {@link #hasPhysicalPotential()} is false. Exact to rounding.
 */
public final class UniformField implements PlaneField {

    private final double bzT;

    /** @param bzT B_z in tesla, + out of the screen */
    public UniformField(double bzT) {
        if (!Double.isFinite(bzT)) {
            throw new IllegalArgumentException("B_z must be a finite number, got " + bzT);
        }
        this.bzT = bzT;
    }

    @Override
    public double bz(double x, double y) {
        return bzT;
    }

    @Override
    public boolean hasPhysicalPotential() {
        return false;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        out[0] = -0.5 * bzT * y;
        out[1] = 0.5 * bzT * x;
    }

    @Override
    public double flux(double[] xs, double[] ys) {
        return bzT * Polylines.signedArea(xs, ys);
    }

    @Override
    public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        out[0] = bzT;
        out[1] = 0.5 * bzT;
    }
}
