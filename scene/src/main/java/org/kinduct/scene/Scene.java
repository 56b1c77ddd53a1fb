package org.kinduct.scene;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * A whole arrangement: bodies, field sources and conductors, with a default time window.
 * Immutable; edits make new scenes ({@code withXxx}).
 *
 * <p>Sign conventions (used throughout Kinduct): SI units; x right, y up, z out of the screen;
 * B_z &gt; 0 points out of the screen; loops are positive counter-clockwise (normal +z).
 *
 * @param gravity gravitational acceleration in the drawing plane, m/s² (zero when the plane is
 *        horizontal; e.g. (0, −9.81) for a vertical plane with y up); acts on free bodies only
 */
public record Scene(String name, String description, List<Body> bodies, List<Source> sources,
                    List<Conductor> conductors, TimeSpan time, Vec2 gravity) {

    /** File format name written in every scene file. */
    public static final String FORMAT = "kinduct-scene";
    /** Current file format version. */
    public static final int VERSION = 1;

    public Scene {
        name = name == null ? "" : name;
        description = description == null ? "" : description;
        bodies = withFixedFrame(Checks.nonNull(bodies, "bodies"));
        sources = List.copyOf(Checks.nonNull(sources, "sources"));
        conductors = List.copyOf(Checks.nonNull(conductors, "conductors"));
        Checks.nonNull(time, "time");
        gravity = gravity == null ? Vec2.ZERO : gravity;
        checkReferences(bodies, sources, conductors);
    }

    /** A scene without gravity in its plane (a horizontal drawing plane). */
    public Scene(String name, String description, List<Body> bodies, List<Source> sources,
                 List<Conductor> conductors, TimeSpan time) {
        this(name, description, bodies, sources, conductors, time, Vec2.ZERO);
    }

    public static Scene empty(String name) {
        return new Scene(name, "", List.of(), List.of(), List.of(), new TimeSpan(0, 1, 0.01));
    }

    public Map<String, Body> bodiesById() {
        Map<String, Body> map = new LinkedHashMap<>();
        bodies.forEach(b -> map.put(b.id(), b));
        return map;
    }

    public Optional<Body> body(String id) {
        return bodies.stream().filter(b -> b.id().equals(id)).findFirst();
    }

    public Optional<Source> source(String id) {
        return sources.stream().filter(s -> s.id().equals(id)).findFirst();
    }

    public Optional<Conductor> conductor(String id) {
        return conductors.stream().filter(c -> c.id().equals(id)).findFirst();
    }

    public Scene withSources(List<Source> newSources) {
        return new Scene(name, description, bodies, newSources, conductors, time, gravity);
    }

    public Scene withConductors(List<Conductor> newConductors) {
        return new Scene(name, description, bodies, sources, newConductors, time, gravity);
    }

    public Scene withBodies(List<Body> newBodies) {
        return new Scene(name, description, newBodies, sources, conductors, time, gravity);
    }

    public Scene withTime(TimeSpan newTime) {
        return new Scene(name, description, bodies, sources, conductors, newTime, gravity);
    }

    public Scene withText(String newName, String newDescription) {
        return new Scene(newName, newDescription, bodies, sources, conductors, time, gravity);
    }

    /** This scene without the sources and conductors whose ids are in {@code ids}. */
    public Scene without(java.util.Collection<String> ids) {
        List<Source> keptSources = new ArrayList<>(sources);
        keptSources.removeIf(s -> ids.contains(s.id()));
        List<Conductor> keptConductors = new ArrayList<>(conductors);
        keptConductors.removeIf(c -> ids.contains(c.id()));
        return withSources(keptSources).withConductors(keptConductors);
    }

    public Scene withGravity(Vec2 newGravity) {
        return new Scene(name, description, bodies, sources, conductors, time, newGravity);
    }

    private static List<Body> withFixedFrame(List<Body> given) {
        List<Body> all = new ArrayList<>();
        all.add(Body.fixed());
        for (Body b : given) {
            if (!Body.FIXED.equals(b.id())) {
                all.add(b);
            }
        }
        return List.copyOf(all);
    }

    private static void checkReferences(List<Body> bodies, List<Source> sources, List<Conductor> conductors) {
        Set<String> bodyIds = new HashSet<>();
        for (Body b : bodies) {
            if (!bodyIds.add(b.id())) {
                throw new IllegalArgumentException("body id '" + b.id() + "' is used twice");
            }
            if (b.motion() instanceof Motion.Free free) {
                for (Motion.Free.Spring s : free.springs()) {
                    if (s.otherBody() != null && !bodies.stream().anyMatch(o -> o.id().equals(s.otherBody()))) {
                        throw new IllegalArgumentException("body '" + b.id() + "' has a spring to unknown body '"
                                + s.otherBody() + "'");
                    }
                }
            }
        }
        Set<String> objectIds = new HashSet<>();
        for (Source s : sources) {
            if (!objectIds.add(s.id())) {
                throw new IllegalArgumentException("id '" + s.id() + "' is used twice");
            }
            requireBody(bodyIds, s.body(), "source '" + s.id() + "'");
        }
        for (Conductor c : conductors) {
            if (!objectIds.add(c.id())) {
                throw new IllegalArgumentException("id '" + c.id() + "' is used twice");
            }
            requireBody(bodyIds, c.body(), "conductor '" + c.id() + "'");
            for (Conductor.Vertex v : c.vertices()) {
                if (v.body() != null) {
                    requireBody(bodyIds, v.body(), "a vertex of conductor '" + c.id() + "'");
                }
            }
        }
    }

    private static void requireBody(Set<String> bodyIds, String id, String who) {
        if (!bodyIds.contains(id)) {
            throw new IllegalArgumentException(who + " rides unknown body '" + id + "'");
        }
    }
}
