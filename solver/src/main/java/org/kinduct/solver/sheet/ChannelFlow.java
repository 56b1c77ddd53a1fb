package org.kinduct.solver.sheet;

import java.util.List;
import java.util.function.DoubleBinaryOperator;
import org.kinduct.scene.Vec2;

/**
 * Liquid metal flowing in a straight channel with insulating walls: centreline from A to B, width
 * w, flow along A → B with mean speed v̄ and a profile u(s) across the width (s measured from the
 * centreline towards the left wall, |s| ≤ w/2). Beyond the walls the velocity is zero; along the
 * channel it does not change, so the channel's ends are cut through a longer flow.
 *
 * <p>The flow across a segment, ∫ u ds between the segment's ends' s (clamped to the walls), is
 * exact from each profile's integral, so that a uniform field's EMF is exact for every profile
 * (see {@link SheetDrive#flowAcrossM2PerS}).
 *
 * <p>Electrodes sit on the two walls at a station along the channel. With a uniform B_z over the
 * whole channel the voltage between them is U = B·w·v̄ whatever the profile (Shercliff, <i>The
 * Theory of Electromagnetic Flow-Measurement</i>, Cambridge, 1962): {@link #idealVoltageV}. A
 * field of finite length lets the current close through the unmagnetized liquid beyond it and the
 * voltage falls below that ("end shorting"); {@link #endShortingRatio} is the computed voltage
 * over the ideal one.
 *
 * @param startM A, where the centreline starts
 * @param endM B, where it ends
 * @param widthM w
 * @param meanSpeedMPerS v̄, positive from A to B
 * @param profile the shape of u across the width
 */
public record ChannelFlow(Vec2 startM, Vec2 endM, double widthM, double meanSpeedMPerS, Profile profile) {

    /** Velocity profiles across the width; ξ = 2s/w. */
    public enum Profile {
        /** Uniform, u = v̄. */
        PLUG,
        /**
         * Plane Poiseuille flow between two walls, u = 1.5·v̄·(1 − ξ²) (White, <i>Fluid Mechanics</i>,
         * ch. 4, flow between parallel plates; from memory).
         */
        LAMINAR,
        /**
         * The one-seventh power law from each wall, u = (8/7)·v̄·(1 − |ξ|)^(1/7) (Prandtl's fit to
         * pipe data; White, <i>Fluid Mechanics</i>, ch. 6, from memory) — common practice, a fit
         * rather than a solution; its slope is infinite at the wall.
         */
        TURBULENT
    }

    public ChannelFlow {
        if (startM == null || endM == null || profile == null) {
            throw new IllegalArgumentException("a channel needs both centreline ends and a profile");
        }
        if (startM.equals(endM)) {
            throw new IllegalArgumentException("the channel's centreline must have length; both ends are at " + startM);
        }
        if (!(widthM > 0) || !Double.isFinite(widthM)) {
            throw new IllegalArgumentException("channel width must be positive and finite, got " + widthM + " m");
        }
        if (!Double.isFinite(meanSpeedMPerS)) {
            throw new IllegalArgumentException("mean speed must be finite, got " + meanSpeedMPerS + " m/s");
        }
    }

    /** Unit vector from A to B. */
    private Vec2 along() {
        Vec2 d = endM.minus(startM);
        return d.times(1 / d.length());
    }

    /** The channel's liquid as a rectangle. */
    public SheetShape shape() {
        Vec2 t = along();
        Vec2 side = t.perp().times(0.5 * widthM);
        return SheetShape.of(List.of(startM.minus(side), endM.minus(side), endM.plus(side), startM.plus(side)));
    }

    /** Speed along A → B at distance s from the centreline (positive to the left), m/s; zero beyond the walls. */
    public double speedMPerS(double sM) {
        double xi = 2 * sM / widthM;
        if (Math.abs(xi) > 1) {
            return 0;
        }
        return switch (profile) {
            case PLUG -> meanSpeedMPerS;
            case LAMINAR -> 1.5 * meanSpeedMPerS * (1 - xi * xi);
            case TURBULENT -> 8.0 / 7 * meanSpeedMPerS * Math.pow(1 - Math.abs(xi), 1.0 / 7);
        };
    }

    /** ∫₀^s u ds', m²/s, constant beyond the walls. */
    double flowFromCentreM2PerS(double sM) {
        double xi = Math.max(-1, Math.min(1, 2 * sM / widthM));
        double half = 0.5 * widthM * meanSpeedMPerS;
        return switch (profile) {
            case PLUG -> half * xi;
            case LAMINAR -> 1.5 * half * (xi - xi * xi * xi / 3);
            case TURBULENT -> Math.signum(xi) * half * (1 - Math.pow(1 - Math.abs(xi), 8.0 / 7));
        };
    }

    /** Distance of (x, y) from the centreline, positive to the left of A → B. */
    private double across(double x, double y) {
        Vec2 t = along();
        return -t.y() * (x - startM.x()) + t.x() * (y - startM.y());
    }

    /** Velocity at (x, y), m/s, to {@code out[0..1]}. */
    public void velocity(double x, double y, double[] out) {
        Vec2 t = along();
        double u = speedMPerS(across(x, y));
        out[0] = u * t.x();
        out[1] = u * t.y();
    }

    /**
     * Flow across the segment a → b to its right, m²/s: with v = u(s)·t̂ and n the right normal,
     * v·n ds = u ds along the segment, so the flow is the difference of ∫ u ds at its ends.
     */
    public double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
        return flowFromCentreM2PerS(across(bx, by)) - flowFromCentreM2PerS(across(ax, ay));
    }

    /** This flow under the field {@code bzT}(x, y), no induced field. */
    public SheetDrive drive(DoubleBinaryOperator bzT) {
        return new SheetDrive() {
            @Override
            public double bzT(double x, double y) {
                return bzT.applyAsDouble(x, y);
            }

            @Override
            public void velocity(double x, double y, double[] out) {
                ChannelFlow.this.velocity(x, y, out);
            }

            @Override
            public double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
                return ChannelFlow.this.flowAcrossM2PerS(ax, ay, bx, by);
            }
        };
    }

    /** Electrodes "left" and "right" on the two walls at {@code stationM} along the channel from A. */
    public List<Electrode> electrodes(double stationM) {
        double length = endM.minus(startM).length();
        if (!(stationM >= 0 && stationM <= length)) {
            throw new IllegalArgumentException("electrode station must lie along the channel, 0 to " + length
                    + " m, got " + stationM + " m");
        }
        Vec2 t = along();
        Vec2 centre = startM.plus(t.times(stationM));
        Vec2 side = t.perp().times(0.5 * widthM);
        return List.of(new Electrode("left", centre.plus(side)), new Electrode("right", centre.minus(side)));
    }

    /**
     * Voltage between the electrodes, φ(right) − φ(left), volts: positive for B_z &gt; 0 and flow
     * from A to B, since v × B then pushes positive charge to the right wall.
     */
    public static double voltageV(SheetSolution solution) {
        return solution.electrodePotentialV("right") - solution.electrodePotentialV("left");
    }

    /** B·w·v̄, the voltage of a uniform field over the whole channel, volts (Shercliff 1962). */
    public double idealVoltageV(double bzT) {
        return bzT * widthM * meanSpeedMPerS;
    }

    /** Computed voltage over the ideal one for a field of peak {@code bzT}. */
    public double endShortingRatio(SheetSolution solution, double bzT) {
        return voltageV(solution) / idealVoltageV(bzT);
    }
}
