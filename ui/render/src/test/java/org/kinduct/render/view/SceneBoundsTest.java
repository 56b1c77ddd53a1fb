package org.kinduct.render.view;


import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Material;
import org.kinduct.scene.WireSpec;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.paint.SourcePainter;

/** Zoom-to-fit bounds over a time window contain free bodies along their simulated path. */
class SceneBoundsTest {

    private static final double GEOMETRY_TOL = 1e-12;
    private static final long MASTER_SEED = 20_261_208L;
    private static final int CASES = 100;

    static LongStream seeds() {
        return new SplittableRandom(MASTER_SEED).longs(CASES);
    }

    @Test
    void aFallingFrameStaysInView() {
        // A 0.1 m frame on a free body that the run has fallen 2 m by the end of a 1 s window.
        Body free = new Body("frame-body", "frame", Vec2.ZERO, Motion.Free.ofMass(0.05));
        Scene s = Scene.empty("falling").withBodies(List.of(free)).withConductors(List.of(Conductor.Loop.simple(
                "frame", "frame-body", List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.1, 0),
                        Conductor.Vertex.at(0.1, 0.1), Conductor.Vertex.at(0, 0.1)), WireSpec.awg(Material.COPPER, 24))));
        List<Snapshot> series = new ArrayList<>();
        for (int i = 0; i <= 10; i++) {
            double t = i / 10.0;
            // Free fall from rest, y = −g·t²/2 with g = 4 m/s² (any value will do).
            series.add(new Snapshot(t, List.of(), Map.of("frame-body",
                    new Pose(Vec2.ZERO, new Vec2(0, -2 * t * t), 0, Vec2.ZERO, 0))));
        }

        SceneBounds withoutRun = SceneBounds.ofWindow(s, List.of());
        SceneBounds withRun = SceneBounds.ofWindow(s, series);

        assertEquals(0, withoutRun.minY(), GEOMETRY_TOL, "by its drawn (initial) pose alone the frame never falls");
        assertEquals(-2, withRun.minY(), GEOMETRY_TOL, "the frame's bottom edge at the end of the fall");
        assertEquals(0.1, withRun.maxY(), GEOMETRY_TOL, "the frame's top edge at the start");
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void boundsOverARunContainEveryPlacedVertexOfEverySample(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene s = randomScene(r);
        int samples = 2 + r.nextInt(30);
        TimeSpan w = s.time();
        List<Snapshot> series = new ArrayList<>();
        for (int i = 0; i < samples; i++) {
            series.add(new Snapshot(w.t0S() + (w.t1S() - w.t0S()) * i / (samples - 1), List.of(),
                    Map.of("free", new Pose(new Vec2(0.1, 0), vec(r, 3), r.nextDouble(-4, 4), Vec2.ZERO, 0))));
        }

        SceneBounds b = SceneBounds.ofWindow(s, series);

        // Every point that matters at every sample lies inside; the box's edges are reached by some point.
        double[] reached = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.NEGATIVE_INFINITY};
        List<Placement> placements = new ArrayList<>();
        for (double t : new double[] {w.t0S(), (w.t0S() + w.t1S()) / 2, w.t1S()}) {
            placements.add(Placement.of(s, t));
        }
        for (int i = 0; i < samples; i++) {
            placements.add(Placement.of(s, series.get(i).tS(), series.get(i).freeBodies()));
        }
        for (int k = 0; k < placements.size(); k++) {
            for (Vec2 p : placedPoints(s, placements.get(k))) {
                assertTrue(p.x() >= b.minX() && p.x() <= b.maxX() && p.y() >= b.minY() && p.y() <= b.maxY(),
                        "seed " + seed + ": placement " + k + " puts " + p + " outside " + b);
                reached[0] = Math.min(reached[0], p.x());
                reached[1] = Math.min(reached[1], p.y());
                reached[2] = Math.max(reached[2], p.x());
                reached[3] = Math.max(reached[3], p.y());
            }
        }
        assertEquals(reached[0], b.minX(), GEOMETRY_TOL, "seed " + seed + ": left edge");
        assertEquals(reached[1], b.minY(), GEOMETRY_TOL, "seed " + seed + ": bottom edge");
        assertEquals(reached[2], b.maxX(), GEOMETRY_TOL, "seed " + seed + ": right edge");
        assertEquals(reached[3], b.maxY(), GEOMETRY_TOL, "seed " + seed + ": top edge");
    }

    /** A free body and a prescribed one, carrying a loop (one vertex on the fixed frame), a patch and a magnet. */
    private static Scene randomScene(SplittableRandom r) {
        List<Body> bodies = List.of(new Body("free", "free", new Vec2(0.1, 0), Motion.Free.ofMass(0.1)),
                new Body("spun", "spun", vec(r, 0.2), new Motion.Spin(r.nextDouble(-5, 5), r.nextDouble(-3, 3))));
        Vec2 o = vec(r, 0.2);
        Conductor.Loop loop = Conductor.Loop.simple("loop", "free", List.of(new Conductor.Vertex(o, null),
                new Conductor.Vertex(o.plus(new Vec2(0.05, 0)), null),
                new Conductor.Vertex(o.plus(new Vec2(0.05, 0.02)), Body.FIXED)), WireSpec.awg(Material.COPPER, 24));
        Vec2 c = vec(r, 0.2);
        Source.FieldPatch patch = new Source.FieldPatch("patch", "free", List.of(c, c.plus(new Vec2(0.03, 0)),
                c.plus(new Vec2(0.03, 0.03)), c.plus(new Vec2(0, 0.03))), 0.2);
        Source.BlockMagnet magnet = new Source.BlockMagnet("magnet", "spun", vec(r, 0.2), 0.02, 0.01, 0.005,
                r.nextDouble(-3, 3), 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        double t0 = r.nextDouble(-1, 1);
        return Scene.empty("random").withBodies(bodies).withConductors(List.of(loop))
                .withSources(List.of(patch, magnet)).withTime(new TimeSpan(t0, t0 + r.nextDouble(0.1, 3), 0.01));
    }

    /**
     * The points zoom-to-fit must hold: every conductor vertex, and the outline of every source
     * within two conductor sizes of the conductors and at most four times their size (the rule
     * stated in {@link SceneBounds#of(Scene, Placement)}).
     */
    private static List<Vec2> placedPoints(Scene s, Placement placement) {
        List<Vec2> pts = new ArrayList<>();
        s.conductors().forEach(c -> pts.addAll(placement.vertices(c)));
        double[] box = box(pts);
        double size = Math.max(box[2] - box[0], box[3] - box[1]);
        for (Source src : s.sources()) {
            List<Vec2> outline = SourcePainter.outline(src, placement);
            double[] o = box(outline);
            double gap = Math.hypot(Math.max(0, Math.max(o[0] - box[2], box[0] - o[2])),
                    Math.max(0, Math.max(o[1] - box[3], box[1] - o[3])));
            if (gap <= 2 * size && Math.max(o[2] - o[0], o[3] - o[1]) <= 4 * size) {
                pts.addAll(outline);
            }
        }
        return pts;
    }

    private static double[] box(List<Vec2> pts) {
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (Vec2 p : pts) {
            b[0] = Math.min(b[0], p.x());
            b[1] = Math.min(b[1], p.y());
            b[2] = Math.max(b[2], p.x());
            b[3] = Math.max(b[3], p.y());
        }
        return b;
    }

    /** A 20 mm pickup inside a metre-wide source coil, with a small magnet beside it: the view is the pickup and the magnet. */
    @Test
    void aPickupInsideAHugeCoilIsFittedWithWhatIsNearItNotTheCoil() {
        Conductor.Loop pickup = Conductor.Loop.simple("pickup", Body.FIXED, List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.02, 0), Conductor.Vertex.at(0.02, 0.02), Conductor.Vertex.at(0, 0.02)),
                WireSpec.awg(Material.COPPER, 30));
        Source.SourceCoil mains = new Source.SourceCoil("mains", Body.FIXED,
                new Source.CoilShape.Circle(new Vec2(0.01, 0.01), 0.5), 10, -0.3, Source.Drive.dc(1));
        Source.CylinderMagnet near = new Source.CylinderMagnet("near", Body.FIXED, new Vec2(0.03, 0.01), 0.003, 0.003,
                0.005, Source.Side.ABOVE, 1.3, Source.Magnetization.PLUS_Z);
        Scene s = Scene.empty("g").withConductors(List.of(pickup)).withSources(List.of(mains, near));

        SceneBounds b = SceneBounds.of(s, 0);

        assertEquals(0, b.minX(), GEOMETRY_TOL);
        assertEquals(0, b.minY(), GEOMETRY_TOL);
        assertEquals(0.033, b.maxX(), 1e-4, "the magnet's far edge (its outline is a 72-gon)");
        assertEquals(0.02, b.maxY(), GEOMETRY_TOL);
    }

    private static Vec2 vec(SplittableRandom r, double half) {
        return new Vec2(r.nextDouble(-half, half), r.nextDouble(-half, half));
    }
}
