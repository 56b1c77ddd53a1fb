package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;

/** Edits as pure functions from one scene to the next; invalid results throw {@link IllegalArgumentException}. */
public final class SceneEdits {

    private SceneEdits() {
    }

    public static Scene addSource(Scene scene, Source source) {
        List<Source> all = new ArrayList<>(scene.sources());
        all.add(source);
        return scene.withSources(all);
    }

    public static Scene addConductor(Scene scene, Conductor conductor) {
        List<Conductor> all = new ArrayList<>(scene.conductors());
        all.add(conductor);
        return scene.withConductors(all);
    }

    public static Scene replaceSource(Scene scene, Source source) {
        List<Source> all = new ArrayList<>(scene.sources());
        all.replaceAll(s -> s.id().equals(source.id()) ? source : s);
        return scene.withSources(all);
    }

    public static Scene replaceConductor(Scene scene, Conductor conductor) {
        List<Conductor> all = new ArrayList<>(scene.conductors());
        all.replaceAll(c -> c.id().equals(conductor.id()) ? conductor : c);
        return scene.withConductors(all);
    }

    public static Scene delete(Scene scene, Collection<String> ids) {
        return scene.without(ids);
    }

    /** Moves the drawn geometry of the given objects by {@code d}. */
    public static Scene translate(Scene scene, Set<String> ids, Vec2 d) {
        return mapGeometry(scene, ids, p -> p.plus(d));
    }

    /**
     * Turns the given objects by {@code angleRad} (counter-clockwise) about {@code centerSeen} as
     * they are seen in {@code seen}, where bodies may have moved and turned since they were drawn.
     *
     * <p>Each drawn point turns about the drawn image of the centre on its own body: a placement P
     * is a rigid motion, and plane rotations commute, so turning the seen point P(p) by α about c
     * equals placing p turned by α about P⁻¹(c). Objects on different bodies, and conductor
     * vertices riding a body of their own, each map through their own body; magnets turn by α.
     */
    public static Scene rotateAsSeen(Scene scene, Set<String> ids, Placement seen, Vec2 centerSeen, double angleRad) {
        List<Source> sources = new ArrayList<>(scene.sources());
        sources.replaceAll(s -> ids.contains(s.id())
                ? Shapes.map(s, p -> turned(p, seen.drawn(s.body(), centerSeen), angleRad), angleRad) : s);
        List<Conductor> conductors = new ArrayList<>(scene.conductors());
        conductors.replaceAll(c -> ids.contains(c.id())
                ? Shapes.mapByBody(c, (body, p) -> turned(p, seen.drawn(body, centerSeen), angleRad)) : c);
        return scene.withSources(sources).withConductors(conductors);
    }

    /** Copies the given objects, shifted by {@code offset}, under fresh ids. */
    public static Scene duplicate(Scene scene, Set<String> ids, Vec2 offset) {
        Scene out = scene;
        for (Source s : scene.sources()) {
            if (ids.contains(s.id()) && Shapes.hasPlace(s)) {
                Source copy = Shapes.withId(Shapes.map(s, p -> p.plus(offset), 0), uniqueId(out, s.id()));
                out = addSource(out, copy);
            }
        }
        for (Conductor c : scene.conductors()) {
            if (ids.contains(c.id())) {
                Conductor copy = Shapes.withId(Shapes.map(c, p -> p.plus(offset)), uniqueId(out, c.id()));
                out = addConductor(out, copy);
            }
        }
        return out;
    }

    /** Moves vertex {@code index} of a conductor to the drawn position {@code at}. */
    public static Scene moveVertex(Scene scene, String conductorId, int index, Vec2 at) {
        Conductor c = scene.conductor(conductorId).orElseThrow(() -> unknown(conductorId));
        List<Conductor.Vertex> vs = new ArrayList<>(c.vertices());
        vs.set(index, new Conductor.Vertex(at, vs.get(index).body()));
        return replaceConductor(scene, Shapes.withVertices(c, vs));
    }

    /**
     * Gives the object's body the motion. An object on the fixed frame first gets a body of its
     * own, pivoting about {@code pivot}; other objects on a shared body move with it.
     */
    public static Scene setMotion(Scene scene, String objectId, Motion motion, Vec2 pivot) {
        String bodyId = bodyOf(scene, objectId);
        if (!Body.FIXED.equals(bodyId)) {
            Body old = scene.body(bodyId).orElseThrow(() -> unknown(bodyId));
            List<Body> bodies = new ArrayList<>(scene.bodies());
            bodies.replaceAll(b -> b.id().equals(bodyId) ? new Body(b.id(), b.name(), old.pivot(), motion) : b);
            return scene.withBodies(bodies);
        }
        if (motion instanceof Motion.Still) {
            return scene;
        }
        String newBody = uniqueId(scene, "body-" + objectId);
        List<Body> bodies = new ArrayList<>(scene.bodies());
        bodies.add(new Body(newBody, "carrier of " + objectId, pivot, motion));
        Scene withBody = scene.withBodies(bodies);
        return rehome(withBody, objectId, newBody);
    }

    /** The id of the body an object rides. */
    public static String bodyOf(Scene scene, String objectId) {
        return scene.source(objectId).map(Source::body)
                .or(() -> scene.conductor(objectId).map(Conductor::body))
                .orElseThrow(() -> unknown(objectId));
    }

    /** {@code base} if unused, else {@code base-2}, {@code base-3}, … */
    public static String uniqueId(Scene scene, String base) {
        String stem = base.replaceAll("-\\d+$", "");
        if (!taken(scene, base)) {
            return base;
        }
        for (int i = 2; ; i++) {
            String id = stem + "-" + i;
            if (!taken(scene, id)) {
                return id;
            }
        }
    }

    private static boolean taken(Scene scene, String id) {
        return scene.source(id).isPresent() || scene.conductor(id).isPresent() || scene.body(id).isPresent();
    }

    private static Scene rehome(Scene scene, String objectId, String bodyId) {
        List<Source> sources = new ArrayList<>(scene.sources());
        sources.replaceAll(s -> s.id().equals(objectId) ? Shapes.withBody(s, bodyId) : s);
        List<Conductor> conductors = new ArrayList<>(scene.conductors());
        conductors.replaceAll(c -> c.id().equals(objectId) ? Shapes.withBody(c, bodyId) : c);
        return scene.withSources(sources).withConductors(conductors);
    }

    private static Scene mapGeometry(Scene scene, Set<String> ids, UnaryOperator<Vec2> f) {
        List<Source> sources = new ArrayList<>(scene.sources());
        sources.replaceAll(s -> ids.contains(s.id()) ? Shapes.map(s, f, 0) : s);
        List<Conductor> conductors = new ArrayList<>(scene.conductors());
        conductors.replaceAll(c -> ids.contains(c.id()) ? Shapes.map(c, f) : c);
        return scene.withSources(sources).withConductors(conductors);
    }

    private static Vec2 turned(Vec2 p, Vec2 center, double angleRad) {
        return center.plus(p.minus(center).rotate(angleRad));
    }

    private static IllegalArgumentException unknown(String id) {
        return new IllegalArgumentException("no object with id '" + id + "'");
    }
}
