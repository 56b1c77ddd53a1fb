package org.kinduct.solver.field;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * A field map placed at a body pose: the {@link BicubicMap} of its samples, evaluated in the map's
 * own coordinates. A scene point q is at map coordinates R(−θ)·(q − c) + k, with θ the body's
 * angle, c where its pivot is now and k its drawn pivot less the map's offset (the inverse of
 * {@link Pose#place}); rotation keeps areas and their orientation, so flux and line moments are
 * computed on the transformed points unchanged, and the potential is rotated back.
 *
 * <p>A map is measured B_z alone: its induced electric field when it moves is unknown, so
 * {@link #hasPhysicalPotential()} is false (as for field patches) and the potential is the gauge
 * A = (0, ∫_{x₀}^{x} B_z dx') in the map's frame, whose loop integral is the flux.
 */
public final class MapField implements PlaneField {

    private final BicubicMap map;
    private final String id;
    private final boolean strict;
    private final double cos;
    private final double sin;
    private final double cx;
    private final double cy;
    private final double kx;
    private final double ky;

    /** {@code map} as its body stands at {@code pose}. */
    public MapField(Source.FieldMap map, Pose pose) {
        this.map = BicubicMap.of(map.grid());
        this.id = map.id();
        this.strict = map.outside() == Source.FieldMap.Outside.ERROR;
        this.cos = Math.cos(pose.angleRad());
        this.sin = Math.sin(pose.angleRad());
        Vec2 c = pose.pivot().plus(pose.offset());
        Vec2 k = pose.pivot().minus(map.offsetM());
        this.cx = c.x();
        this.cy = c.y();
        this.kx = k.x();
        this.ky = k.y();
    }

    private double localX(double x, double y) {
        return cos * (x - cx) + sin * (y - cy) + kx;
    }

    private double localY(double x, double y) {
        return -sin * (x - cx) + cos * (y - cy) + ky;
    }

    @Override
    public double bz(double x, double y) {
        return map.bz(localX(x, y), localY(x, y));
    }

    @Override
    public boolean hasPhysicalPotential() {
        return false;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        double ay = map.integralAlongX(localX(x, y), localY(x, y));
        out[0] = -sin * ay;
        out[1] = cos * ay;
    }

    @Override
    public double flux(double[] xs, double[] ys) {
        Polylines.requireClosed(xs, ys);
        double[] lx = new double[xs.length];
        double[] ly = new double[ys.length];
        for (int k = 0; k < xs.length; k++) {
            lx[k] = localX(xs[k], ys[k]);
            ly[k] = localY(xs[k], ys[k]);
            requireCovered(lx[k], ly[k]);
        }
        return map.flux(lx, ly);
    }

    @Override
    public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        double lax = localX(ax, ay);
        double lay = localY(ax, ay);
        double lbx = localX(bx, by);
        double lby = localY(bx, by);
        requireCovered(lax, lay);
        requireCovered(lbx, lby);
        map.bzMoments(lax, lay, lbx, lby, out);
    }

    /** Under the "error" rule a conductor must stay on the map (its rectangle is convex, so vertices suffice). */
    private void requireCovered(double lx, double ly) {
        if (strict && !map.covers(lx, ly)) {
            throw new IllegalArgumentException("a conductor reaches beyond field map '" + id + "' (its \"outside\" is"
                    + " \"error\"): point (" + lx + ", " + ly + ") m in the map's coordinates lies off the samples");
        }
    }
}
