package org.kinduct.scene.path;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.io.Suggestions;
import org.kinduct.scene.units.Dimension;

/**
 * Every numeric value of a scene, addressed by a short path: the id of a source, conductor or
 * body, then the field names of the scene file joined with '.', list items by their index from
 * 0 in brackets. Examples: {@code magnet-2.standoff}, {@code pickup.turns},
 * {@code pickup.vertices[3].x}, {@code pickup.wire.diameter}, {@code carriage.motion.velocity.x},
 * {@code flexure.motion.springs[0].stiffness}, {@code coil.current.frequency}; the scene's own
 * values are {@code time.t0}, {@code time.t1}, {@code time.dt}, {@code gravity.x} and
 * {@code gravity.y}. Field names follow docs/scene-format.md, with {@code size.x}, {@code size.y},
 * {@code size.z} for a block's edges and height, and {@code polygon[i]} / {@code circle} for a
 * source coil's outline. A body and a source or conductor may share an id: their field names
 * differ, so every path names one value. Ids may contain '.'; paths are matched whole.
 */
public final class SceneValues {

    private static final int SUGGESTIONS = 3;

    private final Scene scene;
    private final Map<String, SceneValue> byPath = new LinkedHashMap<>();
    /** Ids and scene-level names, each with the paths under it, for messages. */
    private final Map<String, List<String>> byOwner = new LinkedHashMap<>();

    private SceneValues(Scene scene) {
        this.scene = scene;
        for (Source s : scene.sources()) {
            add(s.id(), SourceSlots.of(s), sc -> ((Scene) sc).source(s.id()).orElseThrow(() -> missing("source", s.id())),
                    (sc, v) -> ((Scene) sc).withSources(replaced(((Scene) sc).sources(), Source::id, (Source) v)));
        }
        for (Conductor c : scene.conductors()) {
            add(c.id(), ConductorSlots.of(c),
                    sc -> ((Scene) sc).conductor(c.id()).orElseThrow(() -> missing("conductor", c.id())),
                    (sc, v) -> ((Scene) sc).withConductors(replaced(((Scene) sc).conductors(), Conductor::id,
                            (Conductor) v)));
        }
        for (Body b : scene.bodies()) {
            if (!Body.FIXED.equals(b.id())) {
                add(b.id(), BodySlots.of(b), sc -> ((Scene) sc).body(b.id()).orElseThrow(() -> missing("body", b.id())),
                        (sc, v) -> ((Scene) sc).withBodies(replaced(((Scene) sc).bodies(), Body::id, (Body) v)));
            }
        }
        Slots own = new Slots().nest("time", "time", new Slots().number("t0", Dimension.TIME, "t0S")
                .number("t1", Dimension.TIME, "t1S").number("dt", Dimension.TIME, "dtS"))
                .point("gravity", Dimension.ACCELERATION, "gravity");
        own.all().forEach((name, slot) -> put(name.substring(0, name.indexOf('.')), name, slot));
    }

    /** The values of {@code scene}. */
    public static SceneValues of(Scene scene) {
        return new SceneValues(scene);
    }

    /** Every path of this scene, in the order of the scene file. */
    public List<String> paths() {
        return List.copyOf(byPath.keySet());
    }

    /**
     * The value at {@code path}.
     *
     * @throws IllegalArgumentException naming the path and the nearest valid ones, or what the
     *         object it names has
     */
    public SceneValue find(String path) {
        SceneValue v = byPath.get(path == null ? "" : path.strip());
        if (v == null) {
            throw new IllegalArgumentException(unknown(path == null ? "" : path.strip()));
        }
        return v;
    }

    /** The value at {@code path}, SI. */
    public double read(String path) {
        return find(path).read(scene);
    }

    /** This scene with the value at {@code path} set to {@code si}; see {@link SceneValue#write}. */
    public Scene write(String path, double si) {
        return find(path).write(scene, si);
    }

    private String unknown(String path) {
        List<String> near = Suggestions.nearest(path, byPath.keySet(), SUGGESTIONS);
        String start = "no value '" + path + "' in scene '" + scene.name() + "'";
        if (!near.isEmpty()) {
            return start + "; nearest: " + String.join(", ", near);
        }
        String owner = byOwner.keySet().stream().filter(id -> path.startsWith(id + ".") || path.startsWith(id + "["))
                .reduce((a, b) -> a.length() >= b.length() ? a : b).orElse(null);
        if (owner != null) {
            return start + "; '" + owner + "' has " + summary(owner);
        }
        List<String> nearIds = Suggestions.nearest(path.split("[.\\[]", 2)[0], byOwner.keySet(), SUGGESTIONS);
        return start + (nearIds.isEmpty() ? "; ids here: " + String.join(", ", byOwner.keySet())
                : "; nearest ids: " + String.join(", ", nearIds));
    }

    /** The fields under {@code owner}, list indices written [i]: "turns, load, vertices[i].x, …". */
    private String summary(String owner) {
        Set<String> fields = new LinkedHashSet<>();
        for (String p : byOwner.get(owner)) {
            fields.add(p.substring(owner.length() + 1).replaceAll("\\[\\d+]", "[i]"));
        }
        return fields.isEmpty() ? "no numeric values" : String.join(", ", fields);
    }

    private void add(String id, Slots slots, java.util.function.Function<Object, Object> get,
                     java.util.function.BiFunction<Object, Object, Object> set) {
        slots.all().forEach((name, slot) -> put(id, id + (name.startsWith("[") ? "" : ".") + name,
                slot.through(get, set)));
        byOwner.putIfAbsent(id, new ArrayList<>());
    }

    private void put(String owner, String path, Slot slot) {
        if (byPath.putIfAbsent(path, new SceneValue(path, slot)) != null) {
            throw new IllegalStateException("two values of scene '" + scene.name() + "' have the path '" + path + "'");
        }
        byOwner.computeIfAbsent(owner, k -> new ArrayList<>()).add(path);
    }

    private static IllegalArgumentException missing(String what, String id) {
        return new IllegalArgumentException("the scene has no " + what + " '" + id + "'");
    }

    private static <T> List<T> replaced(List<T> items, java.util.function.Function<T, String> id, T item) {
        List<T> copy = new ArrayList<>(items);
        for (int i = 0; i < copy.size(); i++) {
            if (id.apply(copy.get(i)).equals(id.apply(item))) {
                copy.set(i, item);
                return copy;
            }
        }
        throw missing("object", id.apply(item));
    }
}
