package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.view.NiceSteps;

/**
 * How B_z maps to a colour: a symmetric scale of top {@code limitT}, linear or logarithmic.
 *
 * <p>The logarithmic scale is symmetric-logarithmic: f = sign(B)·log(1 + |B|/c)/log(1 + limit/c)
 * with c = limit·10^−{@value #DECADES}, linear through zero and logarithmic beyond c, so the core
 * of a magnet and its weak surroundings {@value #DECADES} decades down both read (the transform of
 * Webber, Meas. Sci. Technol. 24, 027001, 2013; from memory). Field strengths above the limit are
 * saturated and drawn in a darker end colour, so saturation shows as such.
 */
public record ColourScale(Kind kind, double limitT) {

    public enum Kind { LINEAR, LOG }

    /** Decades a logarithmic scale spans below its top. */
    static final int DECADES = 3;
    private static final int MAX_LINEAR_LEVELS_PER_SIDE = 5;

    public ColourScale {
        if (!(limitT > 0) || !Double.isFinite(limitT)) {
            throw new IllegalArgumentException("colour limit must be positive, got " + limitT + " T");
        }
    }

    /** Position of {@code bzT} on the scale: −1 … +1 within it, beyond ±1 when saturated. */
    public double fraction(double bzT) {
        if (kind == Kind.LINEAR) {
            return bzT / limitT;
        }
        double c = limitT * Math.pow(10, -DECADES);
        return Math.signum(bzT) * Math.log1p(Math.abs(bzT) / c) / Math.log1p(limitT / c);
    }

    /** The B_z at fraction {@code f} of the scale, the inverse of {@link #fraction}. */
    public double valueAt(double f) {
        if (kind == Kind.LINEAR) {
            return f * limitT;
        }
        double c = limitT * Math.pow(10, -DECADES);
        return Math.signum(f) * c * Math.expm1(Math.abs(f) * Math.log1p(limitT / c));
    }

    /** Colour of {@code bzT}; transparent for NaN (no value). */
    public int argb(double bzT) {
        double f = fraction(bzT);
        if (Double.isNaN(f)) {
            return 0x00000000;
        }
        return Math.abs(f) > 1 ? DivergingScale.saturated(f > 0) : DivergingScale.argbAt(f);
    }

    /**
     * The positive levels marked on the legend and drawn as contours (their negatives too): on a
     * logarithmic scale one per decade from the top, on a linear one round steps, at most five.
     */
    public List<Double> levels() {
        List<Double> out = new ArrayList<>();
        if (kind == Kind.LOG) {
            for (int k = 0; k < DECADES; k++) {
                out.add(limitT * Math.pow(10, -k));
            }
            return out;
        }
        double step = NiceSteps.atLeast(limitT / MAX_LINEAR_LEVELS_PER_SIDE);
        for (double v = step; v <= limitT * (1 + 1e-9); v += step) {
            out.add(v);
        }
        return out;
    }

    /** What the legend says about the scale, e.g. "log scale, 3 decades" or "linear scale". */
    public String description() {
        return kind == Kind.LOG ? "log scale, " + DECADES + " decades" : "linear scale";
    }
}
