package org.kinduct.ui.edit;

import org.kinduct.render.view.SceneBounds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.paint.SourcePainter;

/**
 * Turning a selection after t0 turns what is seen: the shape placed at the shown time after the
 * edit is the shape seen before it, turned about the seen centre. The expected points are the
 * seen points turned directly (plane rotation about a point), independent of how the edit maps
 * them back to the drawn frame.
 */
class SceneEditsRotationTest {

    /** Coordinates stay within a few metres, so a few ulps of rounding is some 1e-15 m. */
    private static final double GEOMETRY_TOL = 1e-12;
    private static final long MASTER_SEED = 20_261_207L;
    private static final int CASES = 200;
    private static final List<String> IDS = List.of("loop", "wire", "patch", "block", "disc", "coil-polygon",
            "coil-circle");

    static LongStream seeds() {
        return new SplittableRandom(MASTER_SEED).longs(CASES);
    }

    @Test
    void halfATurnSwapsTwoSquaresSideBySideAsSeen() {
        // Square A rides a body that has glided 1 m to the right by t = 1 s; square B is fixed.
        Body glider = new Body("glider", "glider", Vec2.ZERO, new Motion.Glide(new Vec2(1, 0)));
        Scene s = Scene.empty("two squares").withBodies(List.of(glider)).withConductors(List.of(
                square("a", "glider", 0), square("b", Body.FIXED, 2)));
        Placement seen = Placement.of(s, 1.0);
        Set<String> both = Set.of("a", "b");
        Vec2 center = SceneBounds.ofObjects(s, both, seen).center();
        assertTrue(center.eq(new Vec2(2, 0.5), GEOMETRY_TOL), "seen squares span x 1…3, y 0…1");

        Scene turned = SceneEdits.rotateAsSeen(s, both, seen, center, Math.PI);

        Placement after = Placement.of(turned, 1.0);
        SceneBounds a = SceneBounds.ofObjects(turned, Set.of("a"), after);
        SceneBounds b = SceneBounds.ofObjects(turned, Set.of("b"), after);
        assertBox(2, 0, 3, 1, a, "A is seen where B was");
        assertBox(1, 0, 2, 1, b, "B is seen where A was");
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void shapePlacedAfterTheTurnIsTheSeenShapeTurnedAboutTheSeenCentre(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene s = randomScene(r);
        Map<String, Pose> simulated = Map.of("free", new Pose(vec(r, 0.2), vec(r, 1), r.nextDouble(-4, 4),
                Vec2.ZERO, 0));
        double t = r.nextDouble(0, 2);
        double angle = r.nextDouble(-Math.PI, Math.PI);
        Set<String> chosen = randomSelection(r);
        Placement seen = Placement.of(s, t, simulated);
        Vec2 center = r.nextBoolean() ? SceneBounds.ofObjects(s, chosen, seen).center() : vec(r, 1);

        Scene turned = SceneEdits.rotateAsSeen(s, chosen, seen, center, angle);

        Placement after = Placement.of(turned, t, simulated);
        for (String id : IDS) {
            List<Vec2> before = seenPoints(s, id, seen);
            List<Vec2> now = seenPoints(turned, id, after);
            for (int i = 0; i < before.size(); i++) {
                Vec2 expected = chosen.contains(id)
                        ? center.plus(before.get(i).minus(center).rotate(angle)) : before.get(i);
                assertTrue(now.get(i).eq(expected, GEOMETRY_TOL), "seed " + seed + ", " + id + " point " + i
                        + (chosen.contains(id) ? " turned" : " untouched") + ": expected " + expected + ", got "
                        + now.get(i));
            }
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void atTheStartTheDrawnGeometryTurnsAboutTheSelectionCentreAsBefore(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene s = randomSceneAtRestAtZero(r);
        double angle = r.nextDouble(-Math.PI, Math.PI);
        Set<String> chosen = randomSelection(r);
        // The behaviour before turning after t0 was supported: the drawn points turned about the
        // centre of the selection's bounds at t = 0, magnets' own axes turning with them.
        Vec2 center = SceneBounds.ofObjects(s, chosen, 0).center();
        List<Source> sources = new ArrayList<>(s.sources());
        sources.replaceAll(src -> chosen.contains(src.id())
                ? Shapes.map(src, p -> center.plus(p.minus(center).rotate(angle)), angle) : src);
        List<Conductor> conductors = new ArrayList<>(s.conductors());
        conductors.replaceAll(c -> chosen.contains(c.id())
                ? Shapes.map(c, p -> center.plus(p.minus(center).rotate(angle))) : c);
        Scene expected = s.withSources(sources).withConductors(conductors);

        Placement atStart = Placement.of(s, 0);
        Scene turned = SceneEdits.rotateAsSeen(s, chosen, atStart, SceneBounds.ofObjects(s, chosen, atStart).center(),
                angle);

        for (String id : IDS) {
            List<Vec2> want = seenPoints(expected, id, Placement.of(expected, 0));
            List<Vec2> got = seenPoints(turned, id, Placement.of(turned, 0));
            for (int i = 0; i < want.size(); i++) {
                assertTrue(got.get(i).eq(want.get(i), GEOMETRY_TOL), "seed " + seed + ", " + id + " point " + i
                        + ": expected " + want.get(i) + ", got " + got.get(i));
            }
        }
    }

    // ---- random scenes ----

    /** Three moving bodies (one simulated) carrying every kind of object; a loop vertex rides a second body. */
    private static Scene randomScene(SplittableRandom r) {
        List<Body> bodies = List.of(new Body("a", "a", vec(r, 0.2), randomMotion(r)),
                new Body("b", "b", vec(r, 0.2), randomMotion(r)),
                new Body("free", "free", vec(r, 0.2), Motion.Free.ofMass(0.1)));
        return withObjects(r, Scene.empty("random").withBodies(bodies));
    }

    /** As {@link #randomScene}, with every body where it was drawn at t = 0. */
    private static Scene randomSceneAtRestAtZero(SplittableRandom r) {
        List<Body> bodies = List.of(new Body("a", "a", vec(r, 0.2), new Motion.Glide(vec(r, 1))),
                new Body("b", "b", vec(r, 0.2), new Motion.Spin(r.nextDouble(-5, 5), 0)),
                new Body("free", "free", vec(r, 0.2), Motion.Free.ofMass(0.1)));
        return withObjects(r, Scene.empty("random").withBodies(bodies));
    }

    private static Motion randomMotion(SplittableRandom r) {
        return switch (r.nextInt(5)) {
            case 0 -> new Motion.Glide(vec(r, 1));
            case 1 -> new Motion.Accelerate(vec(r, 1), vec(r, 2));
            case 2 -> new Motion.Oscillate(r.nextDouble(-0.1, 0.1), r.nextDouble(0.1, 5), r.nextDouble(-3, 3),
                    r.nextDouble(-3, 3));
            case 3 -> new Motion.Spin(r.nextDouble(-5, 5), r.nextDouble(-3, 3));
            default -> new Motion.Path(List.of(new Motion.Path.Key(0, Vec2.ZERO, 0),
                    new Motion.Path.Key(r.nextDouble(0.5, 1.5), vec(r, 0.5), r.nextDouble(-3, 3))),
                    r.nextBoolean() ? Motion.Path.Blend.LINEAR : Motion.Path.Blend.SMOOTH);
        };
    }

    private static Scene withObjects(SplittableRandom r, Scene s) {
        Vec2 o = vec(r, 0.1);
        Conductor.Loop loop = Conductor.Loop.simple("loop", "a", List.of(
                new Conductor.Vertex(o, null), new Conductor.Vertex(o.plus(new Vec2(0.04, 0)), null),
                new Conductor.Vertex(o.plus(new Vec2(0.04, 0.03)), "b"),
                new Conductor.Vertex(o.plus(new Vec2(0, 0.03)), Body.FIXED)), ShapeFactory.DEFAULT_WIRE);
        Conductor.Wire wire = new Conductor.Wire("wire", "b", List.of(new Conductor.Vertex(vec(r, 0.1), null),
                new Conductor.Vertex(vec(r, 0.1).plus(new Vec2(0.3, 0)), null)));
        Source.FieldPatch patch = new Source.FieldPatch("patch", "free", regularPolygon(r, 5), 0.1);
        Source.BlockMagnet block = new Source.BlockMagnet("block", "a", vec(r, 0.1), 0.02, 0.01, 0.005,
                r.nextDouble(-3, 3), 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Source.CylinderMagnet disc = new Source.CylinderMagnet("disc", Body.FIXED, vec(r, 0.1), 0.01, 0.005, 0.001,
                Source.Side.BELOW, 1.2, Source.Magnetization.MINUS_Z);
        Source.Drive dc = new Source.Drive(1, 0, 0, 0);
        Source.SourceCoil coilPolygon = new Source.SourceCoil("coil-polygon", "b",
                new Source.CoilShape.Polygon(regularPolygon(r, 4)), 10, -0.002, dc);
        Source.SourceCoil coilCircle = new Source.SourceCoil("coil-circle", "free",
                new Source.CoilShape.Circle(vec(r, 0.1), 0.02), 10, -0.002, dc);
        return s.withConductors(List.of(loop, wire)).withSources(List.of(patch, block, disc, coilPolygon, coilCircle));
    }

    private static List<Vec2> regularPolygon(SplittableRandom r, int n) {
        Vec2 c = vec(r, 0.1);
        double radius = r.nextDouble(0.01, 0.05);
        double start = r.nextDouble(0, 2 * Math.PI);
        List<Vec2> pts = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            pts.add(c.plus(Vec2.polar(radius, start + 2 * Math.PI * i / n)));
        }
        return pts;
    }

    private static Set<String> randomSelection(SplittableRandom r) {
        Set<String> chosen = new HashSet<>();
        for (String id : IDS) {
            if (r.nextInt(3) > 0) {
                chosen.add(id);
            }
        }
        if (chosen.isEmpty()) {
            chosen.add(IDS.get(r.nextInt(IDS.size())));
        }
        return chosen;
    }

    private static Vec2 vec(SplittableRandom r, double half) {
        return new Vec2(r.nextDouble(-half, half), r.nextDouble(-half, half));
    }

    private static Conductor.Loop square(String id, String body, double x) {
        return Conductor.Loop.simple(id, body, List.of(Conductor.Vertex.at(x, 0), Conductor.Vertex.at(x + 1, 0),
                Conductor.Vertex.at(x + 1, 1), Conductor.Vertex.at(x, 1)), ShapeFactory.DEFAULT_WIRE);
    }

    // ---- what is seen ----

    /**
     * Points that fix an object's seen shape: conductor vertices, outline corners (a block
     * magnet's corners carry its axis), and the centre of a round magnet or coil (the outline of a
     * circle is drawn from a fixed start angle, so its points do not follow a turn).
     */
    private static List<Vec2> seenPoints(Scene s, String id, Placement placement) {
        if (s.conductor(id).isPresent()) {
            return placement.vertices(s.conductor(id).orElseThrow());
        }
        Source src = s.source(id).orElseThrow();
        if (src instanceof Source.CylinderMagnet m) {
            return placement.place(m.body(), List.of(m.center()));
        }
        if (src instanceof Source.SourceCoil c && c.shape() instanceof Source.CoilShape.Circle circle) {
            return placement.place(c.body(), List.of(circle.center()));
        }
        return SourcePainter.outline(src, placement);
    }

    private static void assertBox(double x0, double y0, double x1, double y1, SceneBounds b, String what) {
        assertEquals(x0, b.minX(), GEOMETRY_TOL, what);
        assertEquals(y0, b.minY(), GEOMETRY_TOL, what);
        assertEquals(x1, b.maxX(), GEOMETRY_TOL, what);
        assertEquals(y1, b.maxY(), GEOMETRY_TOL, what);
    }
}
