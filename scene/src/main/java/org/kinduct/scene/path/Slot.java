package org.kinduct.scene.path;

import java.util.function.BiFunction;
import java.util.function.Function;
import org.kinduct.scene.units.Dimension;

/**
 * One numeric value inside an object: how to read it and how to make a copy of the object with
 * it replaced. Slots compose: {@link #through} reaches the same value from an enclosing object.
 *
 * @param whole true for counts (turns), which take whole numbers only
 */
record Slot(Dimension dimension, boolean whole, Function<Object, Double> get, BiFunction<Object, Double, Object> set) {

    /** This value as seen from an object that holds the one this slot reads in a part. */
    Slot through(Function<Object, Object> part, BiFunction<Object, Object, Object> replacePart) {
        return new Slot(dimension, whole, outer -> get.apply(part.apply(outer)),
                (outer, v) -> replacePart.apply(outer, set.apply(part.apply(outer), v)));
    }
}
