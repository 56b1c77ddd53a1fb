package org.kinduct.scene.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** A closed set of names a field may take, each standing for a value ("below" → {@code Side.BELOW}). */
final class Choices<E> {

    private final Map<String, E> byName = new LinkedHashMap<>();

    @SafeVarargs
    static <E> Choices<E> of(Map.Entry<String, E>... entries) {
        Choices<E> c = new Choices<>();
        for (Map.Entry<String, E> e : entries) {
            c.byName.put(e.getKey(), e.getValue());
        }
        return c;
    }

    Optional<E> value(String name) {
        return Optional.ofNullable(byName.get(name));
    }

    /** The name of {@code value}, for writing. */
    String name(E value) {
        return byName.entrySet().stream().filter(e -> e.getValue().equals(value)).map(Map.Entry::getKey)
                .findFirst().orElseThrow(() -> new IllegalArgumentException("no name for " + value));
    }

    List<String> names() {
        return new ArrayList<>(byName.keySet());
    }
}
