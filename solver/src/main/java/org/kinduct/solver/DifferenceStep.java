package org.kinduct.solver;

import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;

/**
 * Time derivatives by the five-point central difference
 * f'(t) ≈ [−f(t+2h) + 8f(t+h) − 8f(t−h) + f(t−2h)] / (12h), truncation error h⁴·f⁽⁵⁾/30
 * (Abramowitz &amp; Stegun, <i>Handbook of Mathematical Functions</i>, 1964, eq. 25.3.6; from
 * memory), and the choice of h for a scene at time t.
 *
 * <p><b>Choice of h.</b> Let T be the time over which the scene changes appreciably, the shortest
 * of: the scene's time window; 1/(2πf) of every oscillating body and AC-driven coil; the
 * shortest interval between keys of a keyframed path; 1/|ω| of the fastest-turning body at t; and
 * ℓ/v, with ℓ the shortest length in the scene (a patch or coil edge, a magnet's smallest
 * dimension plus its stand-off, a coil's distance from the plane, and a conductor edge at t
 * where B_z jumps across edges in the plane, since the flux then kinks each time a vertex
 * crosses one) and v the fastest speed of a conductor vertex or source at t. In fields smooth in
 * the plane the flux through a loop is as smooth as the field, however short the loop's edges:
 * letting a 3000-gon's edges set ℓ made h 500 times smaller than needed, and the flux rule's
 * rounding, ε·Φ/h, 500 times larger. Then f⁽⁵⁾ ~ f'/T⁴, and a flux value carries
 * an absolute rounding error δf ~ k·ε·|f'|·T (ε = 2.2e-16, k a modest count of summed terms), so
 * the relative error of the derivative is about (h/T)⁴/30 + 1.5·k·ε·T/h. With h = 1e-5·T that is
 * 3e-22 + 3e-11·k: rounding dominates and stays far below the 1e-6 the two EMF methods must agree
 * to, with room for T being overestimated tenfold.
 *
 * <p><b>Ideal patches.</b> Flux through a field patch is piecewise polynomial in time (for
 * translation, piecewise quadratic), and the formula is exact for polynomials of degree ≤ 4, so
 * only rounding remains, except when a breakpoint (a loop vertex crossing the patch outline or
 * the reverse) lies within 2h of t: then the error is of order h/T relative. The small ratio
 * keeps the chance of that at about 4e-5 per breakpoint per time T. Measured on 5000 random
 * loops moving through patches: with h = 1e-4·T three cases disagreed by more than 1e-6 (up to
 * 1.3e-4, all breakpoint hits), with 1e-5·T none (largest 4e-8); with 1e-3·T, 11 of 2000.
 * The same holds within 2h of a key of a keyframed path, where the acceleration (smooth blend)
 * or the velocity (linear blend) jumps: there the flux method is off by O(h/T) and the reported
 * disagreement shows it.
 *
 * <p>h is rounded down to a power of two and kept at least 2^26·ulp(t), so that t ± h and t ± 2h
 * are exactly representable (or off by at most 2^-26·h when crossing a binade), which keeps the
 * stencil symmetric even late in a long run.
 */
final class DifferenceStep {

    /** h / T; see the class comment for the error budget it gives. */
    static final double STEP_PER_TIME_SCALE = 1e-5;
    /** Stencil offsets in units of h, in the order the frames are kept: −2, −1, +1, +2. */
    static final int[] OFFSETS = {-2, -1, 1, 2};

    private final double fixedScaleS;

    DifferenceStep(Scene scene) {
        double scale = scene.time().t1S() - scene.time().t0S();
        for (Body body : scene.bodies()) {
            scale = Math.min(scale, motionScaleS(body.motion()));
        }
        for (Source source : scene.sources()) {
            if (source instanceof Source.SourceCoil coil && coil.alternates()) {
                scale = Math.min(scale, 1 / (2 * Math.PI * coil.drive().frequencyHz()));
            }
        }
        fixedScaleS = scale;
    }

    /** How fast the scene changes at one instant: the time scale T and the difference step h, seconds. */
    record Pace(double timeScaleS, double stepS) {
    }


    /**
     * −df/dt from f at t−2h, t−h, t+h, t+2h (in {@link #OFFSETS} order). Differences of
     * symmetric pairs come first: they are exact for nearby values (Sterbenz) and vanish exactly
     * when f does not change.
     */
    static double negativeDerivative(double[] f, double h) {
        return ((f[3] - f[0]) - 8 * (f[2] - f[1])) / (12 * h);
    }

    /** One-sided slopes may differ by this fraction of the EMF scale before f counts as kinked. */
    static final double KINK_TOLERANCE = 1e-6;

    /**
     * False when f has a kink within 2h of t (a loop edge crossing a field-patch edge, a key of a
     * linear path): the backward and forward second-order one-sided slopes
     * (3f₀ − 4f₋₁ + f₋₂)/(2h) and (−3f₀ + 4f₊₁ − f₊₂)/(2h) (Abramowitz &amp; Stegun 1964, eq. 25.3.4
     * family; from memory) then differ by the jump in slope, while for smooth f they differ by
     * only O(h²·f‴). There the derivative, and so the flux-rule EMF, is not defined to the accuracy
     * the check needs.
     *
     * @param f0 f(t); {@code f} holds f at t−2h, t−h, t+h, t+2h
     * @param slopeScale the size of slope that counts as large (an EMF scale per turn)
     */
    static boolean smooth(double f0, double[] f, double slopeScale, double h) {
        double backward = (3 * f0 - 4 * f[1] + f[0]) / (2 * h);
        double forward = (-3 * f0 + 4 * f[2] - f[3]) / (2 * h);
        return Math.abs(forward - backward) <= KINK_TOLERANCE * Math.max(slopeScale, Math.abs(forward) + Math.abs(backward));
    }

    /** The pace of the scene at {@code now}, given every conductor as placed there. */
    Pace pace(SceneIndex index, PlacedInstant now, List<PlacedConductor> conductors) {
        double shortest = Double.POSITIVE_INFINITY;
        double fastest = 0;
        double turn = now.fastestTurnRadPerS();
        boolean kinks = index.fieldJumpsInPlane();
        for (PlacedConductor conductor : conductors) {
            if (kinks) {
                shortest = Math.min(shortest, conductor.shortestEdgeM());
            }
            fastest = Math.max(fastest, conductor.fastestVertexMPerS());
        }
        for (int s = 0; s < index.sourceCount(); s++) {
            SourceReach reach = index.reach(s);
            Pose pose = now.pose(index.sourceBody(s));
            shortest = Math.min(shortest, reach.lengthM());
            if (reach.lengthM() < Double.POSITIVE_INFINITY) {
                fastest = Math.max(fastest, pose.velocityAt(pose.place(reach.anchor())).length()
                        + Math.abs(pose.omegaRadPerS()) * reach.extentM());
            }
        }
        double scale = fixedScaleS;
        if (fastest > 0 && shortest < Double.POSITIVE_INFINITY) {
            scale = Math.min(scale, shortest / fastest);
        }
        if (turn > 0) {
            scale = Math.min(scale, 1 / turn);
        }
        double h = Math.scalb(1.0, Math.getExponent(STEP_PER_TIME_SCALE * scale));
        return new Pace(scale, Math.max(h, Math.scalb(Math.ulp(Math.abs(now.tS())), 26)));
    }

    /** The time over which a prescribed motion changes appreciably (infinite for steady or no motion). */
    private static double motionScaleS(Motion motion) {
        return motion.match(new Motion.Cases<>() {
            @Override
            public Double still(Motion.Still still) {
                return Double.POSITIVE_INFINITY;
            }

            @Override
            public Double glide(Motion.Glide glide) {
                return Double.POSITIVE_INFINITY;
            }

            @Override
            public Double accelerate(Motion.Accelerate accelerate) {
                return Double.POSITIVE_INFINITY;
            }

            @Override
            public Double oscillate(Motion.Oscillate oscillate) {
                return 1 / (2 * Math.PI * oscillate.frequencyHz());
            }

            @Override
            public Double spin(Motion.Spin spin) {
                return spin.omegaRadPerS() != 0 ? 1 / Math.abs(spin.omegaRadPerS()) : Double.POSITIVE_INFINITY;
            }

            @Override
            public Double path(Motion.Path path) {
                double shortest = Double.POSITIVE_INFINITY;
                for (int i = 1; i < path.keys().size(); i++) {
                    shortest = Math.min(shortest, path.keys().get(i).tS() - path.keys().get(i - 1).tS());
                }
                return shortest;
            }

            @Override
            public Double free(Motion.Free free) {
                // A free body's motion is not known in advance; ℓ/v at each instant covers it.
                return Double.POSITIVE_INFINITY;
            }
        });
    }
}
