package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.solver.TestScenes.points;
import static org.kinduct.solver.TestScenes.scene;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** The solver's public API: sampling, placement, kinematics and what it reports for simple scenes. */
class SceneSolverTest {

    private static final double B = 0.5;
    private static final double SPEED = 2;

    /** A unit square loop gliding +x into a patch filling x ≥ 1 (B out of the screen). */
    private static Scene squareEnteringPatch(boolean open) {
        Conductor.Loop loop = new Conductor.Loop("square", "cart", TestScenes.vertices(points(0, 0, 1, 0, 1, 1, 0, 1)),
                1, TestScenes.COPPER_1MM, open, 0, 20);
        return scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)))),
                List.of(TestScenes.rectanglePatch("field", Body.FIXED, 1, -1, 10, 2, B)), List.of(loop));
    }

    @Test
    void seriesRunsFromFirstToLastTimeInclusive() {
        List<Snapshot> series = new SceneSolver(squareEnteringPatch(false)).series(0, 1, 0.1);
        assertEquals(11, series.size());
        assertEquals(0, series.get(0).tS());
        assertEquals(1, series.get(10).tS(), 1e-12);
    }

    @Test
    void seriesHoldsExactlyTheInstantsSolvedOneByOneInTimeOrder() {
        SceneSolver solver = new SceneSolver(squareEnteringPatch(false));
        List<Snapshot> series = solver.series(0, 1, 0.05);
        for (int i = 0; i < series.size(); i++) {
            assertEquals(solver.at(i * 0.05), series.get(i), "instant " + i);
        }
        assertEquals(series, solver.series(0, 1, 0.05, false), "one core or all, the same states");
    }

    @Test
    void seriesStopsAtTheLastWholeStepBeforeTheEnd() {
        List<Snapshot> series = new SceneSolver(squareEnteringPatch(false)).series(0, 1, 0.3);
        assertEquals(4, series.size());
        assertEquals(0.9, series.get(3).tS(), 1e-12);
    }

    @Test
    void seriesRejectsBackwardTimeAndNonPositiveSteps() {
        SceneSolver solver = new SceneSolver(squareEnteringPatch(false));
        IllegalArgumentException backward = assertThrows(IllegalArgumentException.class, () -> solver.series(1, 0, 0.1));
        assertEquals("t1 must not be before t0, got t0 = 1.0 s, t1 = 0.0 s", backward.getMessage());
        IllegalArgumentException step = assertThrows(IllegalArgumentException.class, () -> solver.series(0, 1, 0));
        assertEquals("dt must be positive, got 0.0", step.getMessage());
    }

    @Test
    void loopEnteringFieldDrivesClockwiseCurrentByLenz() {
        // At t = 0.25 s the right edge is at x = 1.5: flux B·0.5 m², growing at B·1 m·v.
        ConductorState state = new SceneSolver(squareEnteringPatch(false)).at(0.25).conductor("square").orElseThrow();
        assertEquals(B * 0.5, state.fluxWb(), 1e-15);
        assertEquals(-B * SPEED, state.emfV(), 1e-12);
        assertEquals(Circulation.CW, state.direction());
        assertEquals(Terminal.NONE, state.positiveEnd());
    }

    @Test
    void openLoopHasItsGapPolarityAndNoCurrent() {
        // EMF < 0 along the vertex order pushes charge backwards, from the last vertex to the first:
        // the first vertex, at the start of the gap's closing edge, is +.
        ConductorState state = new SceneSolver(squareEnteringPatch(true)).at(0.25).conductor("square").orElseThrow();
        assertEquals(-B * SPEED, state.emfV(), 1e-12);
        assertEquals(Terminal.FIRST, state.positiveEnd());
        assertEquals(0, state.currentA());
        assertEquals(Circulation.NONE, state.direction());
    }

    @Test
    void stillSceneHasExactlyNoEmf() {
        Scene still = scene(List.of(), List.of(TestScenes.rectanglePatch("field", Body.FIXED, 0.5, -1, 10, 2, B)),
                List.of(TestScenes.loop("square", Body.FIXED, points(0, 0, 1, 0, 1, 1, 0, 1))));
        ConductorState state = new SceneSolver(still).at(0.4).conductor("square").orElseThrow();
        assertEquals(0, state.emfV());
        assertEquals(0, state.emfFluxV());
        assertEquals(0, state.disagreement());
        assertEquals(Circulation.NONE, state.direction());
    }

    @Test
    void verticesRideTheirOwnBodies() {
        Conductor.Loop loop = Conductor.Loop.simple("strap", Body.FIXED, List.of(
                new Conductor.Vertex(new Vec2(0, 0), null),
                new Conductor.Vertex(new Vec2(1, 0), "cart"),
                new Conductor.Vertex(new Vec2(1, 1), "cart")), TestScenes.COPPER_1MM);
        Scene scene = scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)))),
                List.of(), List.of(loop));
        List<Vec2> placed = new SceneSolver(scene).placedVertices(loop, 0.5);
        assertEquals(List.of(new Vec2(0, 0), new Vec2(2, 0), new Vec2(2, 1)), placed);
    }

    @Test
    void freeBodyStaysAtItsDrawnPoseWithoutADynamicsSolver() {
        Body free = new Body("puck", "puck", Vec2.ZERO, new Motion.Free(1, 0, new Vec2(5, 0), 0, 0, Vec2.ZERO,
                Vec2.ZERO, 0, List.of()));
        Conductor.Wire rod = TestScenes.wire("rod", "puck", 0, 0, 0, 1);
        Scene scene = scene(List.of(free), List.of(new Source.UniformField("field", B)), List.of(rod));
        SceneSolver solver = new SceneSolver(scene);
        assertEquals(List.of(new Vec2(0, 0), new Vec2(0, 1)), solver.placedVertices(rod, 2));
        assertEquals(0, solver.at(2).conductor("rod").orElseThrow().emfV());
    }

    @Test
    void suppliedKinematicsMoveFreeBodies() {
        Body free = new Body("puck", "puck", Vec2.ZERO, Motion.Free.ofMass(1));
        Conductor.Wire rod = TestScenes.wire("rod", "puck", 0, 0, 0, 1);
        Scene scene = scene(List.of(free), List.of(new Source.UniformField("field", -B)), List.of(rod));
        // A stand-in for integrated dynamics: the puck coasts at +x.
        Kinematics coasting = (body, t) -> body.equals("puck")
                ? new Pose(Vec2.ZERO, new Vec2(SPEED * t, 0), 0, new Vec2(SPEED, 0), 0) : Pose.rest(Vec2.ZERO);
        ConductorState state = new SceneSolver(scene, coasting).at(1).conductor("rod").orElseThrow();
        // Rod along +y moving +x in B into the screen: EMF = B·L·v, upper end + (Griffiths ch. 7).
        assertEquals(B * 1 * SPEED, state.emfV(), 1e-12);
        assertEquals(Terminal.LAST, state.positiveEnd());
        assertEquals(List.of(new Vec2(SPEED, 0), new Vec2(SPEED, 1)), state.vertices());
    }

    @Test
    void fieldMapSumsAllSources() {
        Scene scene = scene(List.of(), List.of(TestScenes.rectanglePatch("field", Body.FIXED, 0, 0, 1, 1, B),
                new Source.UniformField("earth", 50e-6)), List.of());
        SceneField field = new SceneSolver(scene).fieldAt(0);
        assertEquals(B + 50e-6, field.bz(0.5, 0.5), 1e-15);
        assertEquals(50e-6, field.bz(2, 0.5), 1e-15);
        assertEquals(2, field.size());
    }

    /**
     * Superposition: B is linear in its sources (Griffiths, Introduction to Electrodynamics, 4th
     * ed., 2013, ch. 5; section from memory), so the parts add up to the whole.
     */
    @Test
    void fieldsOfDisjointSourceSetsAddUpToTheWholeField() {
        Scene scene = scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)))),
                List.of(TestScenes.rectanglePatch("field", Body.FIXED, 0, 0, 1, 1, B),
                        new Source.UniformField("earth", 50e-6),
                        new Source.CylinderMagnet("disc", "cart", new Vec2(0.2, 0.3), 0.01, 0.005, 0.002,
                                Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z)), List.of());
        SceneSolver solver = new SceneSolver(scene);
        double t = 0.01;
        SceneField still = solver.fieldOf(t, Set.of("field", "earth"));
        SceneField moving = solver.fieldOf(t, Set.of("disc", "not-in-scene"));
        SceneField whole = solver.fieldAt(t);
        assertEquals(2, still.size());
        assertEquals(1, moving.size());
        for (double[] p : new double[][] {{0.5, 0.5}, {2, 0.5}, {0.2 + SPEED * t, 0.3}, {0.21 + SPEED * t, 0.305}}) {
            double sum = still.bz(p[0], p[1]) + moving.bz(p[0], p[1]);
            assertEquals(whole.bz(p[0], p[1]), sum, 1e-12 * Math.max(1, Math.abs(sum)), "at " + p[0] + ", " + p[1]);
        }
        // The magnet rides the cart: over its placed centre its field is the on-axis closed form
        // B_z = (Br/2)[(L+s)/√(R²+(L+s)²) − s/√(R²+s²)] (Camacho & Sosa, Rev. Mex. Fís. E 59, 8–17, 2013),
        // R = 10 mm, L = 5 mm, s = 2 mm, Br = 1.2 T, magnetized +z (so +z on its axis, above or below).
        double onAxis = 0.6 * (0.007 / Math.hypot(0.01, 0.007) - 0.002 / Math.hypot(0.01, 0.002));
        assertEquals(onAxis, moving.bz(0.2 + SPEED * t, 0.3), 1e-12 * onAxis);
    }
}
