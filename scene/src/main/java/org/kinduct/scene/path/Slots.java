package org.kinduct.scene.path;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;
import java.util.function.Function;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;

/**
 * The named numeric values of one object, in the order the scene file lists them. Names join
 * with '.', list items with [i]: {@code center.x}, {@code vertices[3].y}. Parts are records,
 * read and copied by component name ({@link RecordComponents}).
 */
final class Slots {

    private final Map<String, Slot> byName = new LinkedHashMap<>();

    Map<String, Slot> all() {
        return Collections.unmodifiableMap(byName);
    }

    /** A real-valued component. */
    Slots number(String name, Dimension d, String component) {
        return put(name, new Slot(d, false, o -> (Double) RecordComponents.get(o, component),
                (o, v) -> RecordComponents.with(o, component, v)));
    }

    /** An integer component (a count). */
    Slots whole(String name, String component) {
        return put(name, new Slot(Dimension.DIMENSIONLESS, true,
                o -> ((Integer) RecordComponents.get(o, component)).doubleValue(),
                (o, v) -> RecordComponents.with(o, component, (int) Math.rint(v))));
    }

    /** A value that is not a plain component (it keeps other fields consistent when written). */
    Slots custom(String name, Dimension d, Function<Object, Double> get, BiFunction<Object, Double, Object> set) {
        return put(name, new Slot(d, false, get, set));
    }

    /** A point component: {@code name.x} and {@code name.y}. */
    Slots point(String name, Dimension d, String component) {
        return nest(name, component, new Slots().number("x", d, "x").number("y", d, "y"));
    }

    /** The values of a record component, under {@code name}. */
    Slots nest(String name, String component, Slots inner) {
        inner.byName.forEach((n, s) -> put(join(name, n), s.through(o -> RecordComponents.get(o, component),
                (o, part) -> RecordComponents.with(o, component, part))));
        return this;
    }

    /** The values of an {@link Optional} record component that is present, under {@code name}. */
    Slots present(String name, String component, Slots inner) {
        inner.byName.forEach((n, s) -> put(join(name, n), s.through(
                o -> ((Optional<?>) RecordComponents.get(o, component)).orElseThrow(),
                (o, part) -> RecordComponents.with(o, component, Optional.of(part)))));
        return this;
    }

    /** The values of each item of a list component, under {@code name[i]}. */
    <U> Slots list(String name, String component, List<U> items, Function<U, Slots> item) {
        for (int i = 0; i < items.size(); i++) {
            int index = i;
            item.apply(items.get(i)).byName.forEach((n, s) -> put(join(name + "[" + index + "]", n), s.through(
                    o -> list(o, component).get(index),
                    (o, part) -> RecordComponents.with(o, component, replaced(list(o, component), index, part)))));
        }
        return this;
    }

    /** The point values of each item of a list of points, {@code name[i].x} and {@code name[i].y}. */
    Slots points(String name, Dimension d, String component, List<Vec2> items) {
        return list(name, component, items, p -> new Slots().number("x", d, "x").number("y", d, "y"));
    }

    private static List<?> list(Object o, String component) {
        return (List<?>) RecordComponents.get(o, component);
    }

    private static List<Object> replaced(List<?> items, int index, Object item) {
        List<Object> copy = new ArrayList<>(items);
        copy.set(index, item);
        return copy;
    }

    private static String join(String outer, String inner) {
        if (outer.isEmpty()) {
            return inner;
        }
        return inner.startsWith("[") ? outer + inner : outer + "." + inner;
    }

    private Slots put(String name, Slot slot) {
        if (byName.putIfAbsent(name, slot) != null) {
            throw new IllegalStateException("two values are named '" + name + "'");
        }
        return this;
    }
}
