package org.kinduct.scene.path;

import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * One numeric value of a scene, found by its path ({@link SceneValues}). It reads the value of,
 * and writes it into, this scene and any scene made from it by writing values (numeric writes
 * never change which objects there are or their kinds).
 */
public final class SceneValue {

    /** Largest count a whole-numbered value takes (they are Java ints). */
    private static final double LARGEST_COUNT = Integer.MAX_VALUE;

    private final String path;
    private final Slot slot;

    SceneValue(String path, Slot slot) {
        this.path = path;
        this.slot = slot;
    }

    /** The path as {@link SceneValues#paths()} spells it. */
    public String path() {
        return path;
    }

    /** What the value measures; it is read and written in SI (temperatures in °C). */
    public Dimension dimension() {
        return slot.dimension();
    }

    /** True for counts (turns), which take whole numbers only. */
    public boolean whole() {
        return slot.whole();
    }

    /** The value in {@code scene}, SI. */
    public double read(Scene scene) {
        return slot.get().apply(scene);
    }

    /**
     * {@code scene} with this value set to {@code si}; the new scene is validated as a scene read
     * from a file is.
     *
     * @throws IllegalArgumentException naming the path, the value and the rule it breaks
     */
    public Scene write(Scene scene, double si) {
        String given = path + " = " + show(si);
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException(given + ": the value must be finite");
        }
        if (whole() && (si != Math.rint(si) || Math.abs(si) > LARGEST_COUNT)) {
            throw new IllegalArgumentException(given + ": " + path + " takes a whole number");
        }
        try {
            return (Scene) slot.set().apply(scene, si);
        } catch (IllegalArgumentException broken) {
            throw new IllegalArgumentException(given + ": " + broken.getMessage(), broken);
        }
    }

    /**
     * {@code text} read as this value: a number with a unit of its dimension, or a bare number in
     * SI ("2 mm", "0.002"); counts take plain whole numbers.
     *
     * @throws IllegalArgumentException naming the path, what was expected and what was given
     */
    public double parse(String text) {
        double si;
        try {
            si = Units.parse(text, dimension());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(path + ": " + e.getMessage(), e);
        }
        if (whole() && si != Math.rint(si)) {
            throw new IllegalArgumentException(path + " takes a whole number, got '" + text.strip() + "'");
        }
        return si;
    }

    /** {@code si} as people read this value: "1.50 mm", "200". */
    public String show(double si) {
        if (whole() || dimension() == Dimension.DIMENSIONLESS) {
            return Double.isFinite(si) && si == Math.rint(si) && Math.abs(si) < 1e15
                    ? Long.toString((long) si) : Double.toString(si);
        }
        return Units.format(si, dimension());
    }

    @Override
    public String toString() {
        return path;
    }
}
