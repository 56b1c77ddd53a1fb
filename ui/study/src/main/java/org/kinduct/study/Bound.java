package org.kinduct.study;

import org.kinduct.scene.path.SceneValue;
import org.kinduct.scene.path.SceneValues;

/**
 * A value an optimisation may choose within [lower, upper], from {@code PATH=LO..HI} (or
 * {@code PATH=LO..HI:log} to search it on a logarithmic scale, for values spanning decades).
 * The search runs on u ∈ [0, 1], mapped linearly or geometrically onto the bounds.
 */
public record Bound(SceneValue value, double lower, double upper, boolean log) {

    public Bound {
        if (!(upper > lower)) {
            throw new IllegalArgumentException(value.path() + ": the upper bound must exceed the lower one");
        }
        if (log && !(lower > 0)) {
            throw new IllegalArgumentException(value.path() + ": a log scale needs positive bounds");
        }
        if (value.whole()) {
            throw new IllegalArgumentException(value.path() + " takes whole numbers; an optimiser searches real values"
                    + " (sweep it instead)");
        }
    }

    /** Reads {@code PATH=LO..HI[:log]}. */
    public static Bound parse(String text, SceneValues scene) {
        int eq = text.indexOf('=');
        String spec = eq < 0 ? "" : text.substring(eq + 1).strip();
        boolean log = spec.endsWith(":log");
        String[] ends = (log ? spec.substring(0, spec.length() - 4) : spec).split("\\.\\.", -1);
        if (eq < 0 || ends.length != 2) {
            throw new IllegalArgumentException("'" + text + "': expected PATH=LO..HI or PATH=LO..HI:log");
        }
        SceneValue value = scene.find(text.substring(0, eq).strip());
        return new Bound(value, value.parse(ends[0]), value.parse(ends[1]), log);
    }

    /** The value at search coordinate u ∈ [0, 1]. */
    public double at(double u) {
        double v = log ? lower * Math.pow(upper / lower, u) : lower + (upper - lower) * u;
        return Math.max(lower, Math.min(upper, v));
    }
}
