package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.ui.edit.CanvasGestures.Button;
import org.kinduct.ui.edit.CanvasGestures.Key;

/** Mouse and keys on the canvas, without a toolkit: screen pixels in, edits, selection and view out. */
class CanvasGesturesTest {

    private static final Executor SAME_THREAD = Runnable::run;
    /** 2000 px per metre: grid snapping is then 10 mm, reach 3.5 mm. */
    private static final ViewTransform VIEW = new ViewTransform(0, 0, 2000, 800, 600);
    private static final double GEOMETRY_TOL = 1e-9;

    private final AtomicInteger viewMoves = new AtomicInteger();

    private static Scene twoWires() {
        Scene s = Scene.empty("gestures").withConductors(List.of(
                new Conductor.Wire("a", Body.FIXED, List.of(Conductor.Vertex.at(-0.05, 0), Conductor.Vertex.at(0.05, 0))),
                new Conductor.Wire("b", Body.FIXED, List.of(Conductor.Vertex.at(-0.05, 0.05),
                        Conductor.Vertex.at(0.05, 0.05)))));
        return s.withSources(List.of(new Source.UniformField("background", 1e-3)));
    }

    private EditorViewModel vm(Scene s) {
        EditorViewModel vm = new EditorViewModel(s, SAME_THREAD, SAME_THREAD);
        vm.view().viewProperty().set(VIEW);
        // The field maps are not what these tests are about.
        vm.view().layers().clear();
        return vm;
    }

    private CanvasGestures gestures(EditorViewModel vm) {
        return new CanvasGestures(vm, viewMoves::incrementAndGet);
    }

    private static double sx(EditorViewModel vm, double x) {
        return vm.view().view().screenX(x);
    }

    private static double sy(EditorViewModel vm, double y) {
        return vm.view().view().screenY(y);
    }

    /** Press at scene point (x0, y0), drag to (x1, y1) (screen points as the view is at the press), release. */
    private static void drag(EditorViewModel vm, CanvasGestures g, Button b, double x0, double y0, double x1, double y1) {
        double[] screen = {sx(vm, x0), sy(vm, y0), sx(vm, (x0 + x1) / 2), sy(vm, (y0 + y1) / 2), sx(vm, x1), sy(vm, y1)};
        g.pressed(screen[0], screen[1], b, false);
        g.dragged(screen[2], screen[3]);
        g.dragged(screen[4], screen[5]);
        g.released();
    }

    /** A click in place at scene point (x, y). */
    private static void click(EditorViewModel vm, CanvasGestures g, double x, double y, int count) {
        g.pressed(sx(vm, x), sy(vm, y), Button.PRIMARY, false);
        g.released();
        g.clicked(sx(vm, x), sy(vm, y), Button.PRIMARY, count);
    }

    private static Vec2 firstVertex(Scene s, String id) {
        return s.conductor(id).orElseThrow().vertices().get(0).at();
    }

    @Test
    void draggingAnObjectPreviewsTheMoveAndReleaseAppliesItAsOneEdit() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        Scene before = vm.scene();
        g.pressed(sx(vm, 0.01), sy(vm, 0), Button.PRIMARY, false);
        assertEquals(Set.of("a"), vm.document().selection(), "pressing on a wire selects it");
        g.dragged(sx(vm, 0.03), sy(vm, 0.02));

        Picture preview = g.frame("");
        assertSame(before, vm.scene(), "nothing is edited while dragging");
        assertTrue(firstVertex(preview.scene(), "a").eq(new Vec2(-0.03, 0.02), GEOMETRY_TOL), "the preview moved");
        assertSame(preview.scene(), vm.dragged().solvedProperty().get().scene(), "the preview was solved");

        g.released();
        assertTrue(firstVertex(vm.scene(), "a").eq(new Vec2(-0.03, 0.02), GEOMETRY_TOL));
        assertEquals(firstVertex(before, "b"), firstVertex(vm.scene(), "b"), "the other wire stays");
        assertSame(vm.scene(), g.frame("").scene(), "the preview ends with the drag");
        assertNull(vm.dragged().solvedProperty().get(), "and so do its numbers");
        vm.document().undo();
        assertEquals(before, vm.scene(), "one undo takes the whole drag back");
    }

    /** A fixed magnet and a square loop beside it; with a free body, the magnet rides a sprung cart. */
    private static Scene loopBesideAMagnet(boolean freeMagnet) {
        Conductor.Loop loop = Conductor.Loop.simple("loop", Body.FIXED, List.of(Conductor.Vertex.at(0.02, -0.01),
                Conductor.Vertex.at(0.04, -0.01), Conductor.Vertex.at(0.04, 0.01), Conductor.Vertex.at(0.02, 0.01)),
                ShapeFactory.DEFAULT_WIRE);
        Source magnet = new Source.CylinderMagnet("magnet", freeMagnet ? "cart" : Body.FIXED, Vec2.ZERO, 0.008,
                0.005, 0.002, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Scene s = Scene.empty("drag numbers").withTime(new TimeSpan(0, 0.01, 0.001));
        if (freeMagnet) {
            Motion.Free cart = new Motion.Free(0.02, 0, Vec2.ZERO, 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                    List.of(new Motion.Free.Spring(new Vec2(-0.1, 0), null, 2, 0.1)));
            s = s.withBodies(List.of(new Body("cart", "cart", Vec2.ZERO, cart)));
        }
        return s.withSources(List.of(magnet)).withConductors(List.of(loop));
    }

    private static double flux(org.kinduct.solver.Snapshot s) {
        return s.conductor("loop").orElseThrow().fluxWb();
    }

    @Test
    void aDragShowsTheNumbersOfTheSceneUnderTheMouseBeforeRelease() {
        EditorViewModel vm = vm(loopBesideAMagnet(false));
        CanvasGestures g = gestures(vm);
        double before = flux(vm.results().snapshot());
        g.pressed(sx(vm, 0.04), sy(vm, 0), Button.PRIMARY, false);
        g.dragged(sx(vm, 0.02), sy(vm, 0));

        Picture frame = g.frame("");
        // The loop now straddles the magnet's edge: the same instant of the moved scene, solved on its own.
        double moved = flux(new org.kinduct.solver.run.SceneRun(frame.scene()).instant(frame.tS()));
        assertEquals(moved, flux(frame.snapshot()), 0, "the preview's own numbers");
        assertNotEquals(before, moved, "the drag changed the flux");
    }

    @Test
    void onReleaseTheDragsNumbersStayUntilTheRevisionsOwnArrive() {
        java.util.ArrayDeque<Runnable> queued = new java.util.ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(loopBesideAMagnet(false), queued::add, SAME_THREAD);
        vm.view().viewProperty().set(VIEW);
        vm.view().layers().clear();
        CanvasGestures g = gestures(vm);
        while (!queued.isEmpty()) {
            queued.poll().run();
        }
        double before = flux(vm.results().snapshot());
        g.pressed(sx(vm, 0.04), sy(vm, 0), Button.PRIMARY, false);
        g.dragged(sx(vm, 0.02), sy(vm, 0));
        queued.poll().run(); // the drag position's solve
        double dragged = flux(g.frame("").snapshot());
        g.released();
        // The revision's own solve is still queued: the table and canvas keep the drag's numbers, not the old ones.
        assertEquals(dragged, flux(vm.numbersShown()), 0);
        assertEquals(dragged, flux(g.frame("").snapshot()), 0);
        assertNotEquals(before, dragged);
    }

    @Test
    void aMoveThatLeavesTheDraggedSceneAsItWasAsksNoSolve() {
        java.util.concurrent.atomic.AtomicInteger previewRuns = new java.util.concurrent.atomic.AtomicInteger();
        Scene initial = loopBesideAMagnet(false);
        EditorViewModel vm = new EditorViewModel(initial, (scene, monitor) -> {
            if (!scene.equals(initial)) {
                previewRuns.incrementAndGet();
            }
            return EditorViewModel.run(scene, monitor);
        }, SAME_THREAD, SAME_THREAD, System::nanoTime);
        vm.view().viewProperty().set(VIEW);
        vm.view().layers().clear();
        CanvasGestures g = gestures(vm);
        g.pressed(sx(vm, 0.04), sy(vm, 0), Button.PRIMARY, false);
        g.dragged(sx(vm, 0.02), sy(vm, 0));
        g.dragged(sx(vm, 0.02), sy(vm, 0));
        assertEquals(1, previewRuns.get(), "the second move left the preview as it was");
        g.dragged(sx(vm, 0.03), sy(vm, 0));
        assertEquals(2, previewRuns.get(), "a move that changes it is solved");
    }

    @Test
    void aDragOfASceneWithFreeBodiesShowsNoNumbersUntilItsRunIsIn() {
        EditorViewModel vm = vm(loopBesideAMagnet(true));
        CanvasGestures g = gestures(vm);
        g.pressed(sx(vm, 0.04), sy(vm, 0), Button.PRIMARY, false);
        g.dragged(sx(vm, 0.02), sy(vm, 0));
        // Its instant is a sample of a run from t0: the frame never shows the numbers of the scene before.
        assertNull(g.frame("").snapshot());
        g.released();
        assertEquals(flux(new org.kinduct.solver.run.SceneRun(vm.scene()).result().samples().get(0)),
                flux(vm.results().snapshot()), 0, "the released scene's run");
    }

    @Test
    void shiftTogglesObjectsInAndOutOfTheSelectionAndMovesThemTogether() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        g.pressed(sx(vm, 0), sy(vm, 0), Button.PRIMARY, false);
        g.released();
        g.pressed(sx(vm, 0), sy(vm, 0.05), Button.PRIMARY, true);
        assertEquals(Set.of("a", "b"), vm.document().selection());
        g.dragged(sx(vm, 0.01), sy(vm, 0.05));
        g.released();
        assertTrue(firstVertex(vm.scene(), "a").eq(new Vec2(-0.04, 0), GEOMETRY_TOL));
        assertTrue(firstVertex(vm.scene(), "b").eq(new Vec2(-0.04, 0.05), GEOMETRY_TOL));
        g.pressed(sx(vm, 0.01), sy(vm, 0.05), Button.PRIMARY, true);
        g.released();
        assertEquals(Set.of("a"), vm.document().selection(), "Shift on a selected object takes it out");
    }

    @Test
    void aBandOnEmptyGroundSelectsWhatLiesWhollyInsideIt() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        vm.document().select(Set.of("b"));
        g.pressed(sx(vm, -0.06), sy(vm, 0.02), Button.PRIMARY, false);
        assertTrue(vm.document().selection().isEmpty(), "a press on empty ground clears the selection");
        g.dragged(sx(vm, 0.06), sy(vm, -0.02));
        assertEquals(4, g.frame("").marks().preview().size(), "the band is drawn while dragging");
        g.released();
        assertEquals(Set.of("a"), vm.document().selection(), "not b (outside), not the uniform field (everywhere)");
        assertTrue(g.frame("").marks().preview().isEmpty());
    }

    @Test
    void draggingAVertexHandleOfASelectedLoopMovesThatVertexOntoTheGrid() {
        Scene s = Scene.empty("square").withConductors(List.of(Conductor.Loop.simple("sq", Body.FIXED, List.of(
                Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.04),
                Conductor.Vertex.at(0, 0.04)), ShapeFactory.DEFAULT_WIRE)));
        EditorViewModel vm = vm(s);
        CanvasGestures g = gestures(vm);
        vm.document().select(Set.of("sq"));
        drag(vm, g, Button.PRIMARY, 0.04, 0.04, 0.0612, 0.0497);
        List<Conductor.Vertex> vs = vm.scene().conductor("sq").orElseThrow().vertices();
        assertEquals(new Vec2(0.06, 0.05), vs.get(2).at(), "snapped to the 10 mm grid");
        assertEquals(new Vec2(0.04, 0), vs.get(1).at(), "the other vertices stay");
        assertEquals("Move vertex", vm.statusProperty().get());
    }

    @Test
    void theMiddleButtonOrSpaceWithThePrimaryOnePansWithoutEditing() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        Scene before = vm.scene();
        drag(vm, g, Button.MIDDLE, 0, 0, 0.01, 0);
        assertEquals(VIEW.centerX() - 0.01, vm.view().view().centerX(), GEOMETRY_TOL, "the ground moved with the mouse");
        g.keyPressed(Key.SPACE);
        double x = vm.view().view().centerX();
        drag(vm, g, Button.PRIMARY, 0, 0, 0.01, 0);
        g.keyReleased(Key.SPACE);
        assertTrue(vm.view().view().centerX() < x);
        assertSame(before, vm.scene());
        assertTrue(viewMoves.get() >= 2, "the canvas heard of the moving view");
    }

    @Test
    void theWheelZoomsAboutThePointUnderTheCursor() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        double px = 600;
        double py = 100;
        Vec2 under = vm.view().view().toScene(px, py);
        assertTrue(g.scrolled(px, py, 40));
        assertTrue(vm.view().view().pxPerM() > VIEW.pxPerM());
        assertTrue(vm.view().view().toScene(px, py).eq(under, GEOMETRY_TOL));
        assertFalse(g.scrolled(px, py, 0), "a scroll without a turn does nothing");
    }

    @Test
    void aRectangularLoopIsDrawnWithTwoClicksAndIsSelected() {
        EditorViewModel vm = vm(Scene.empty("draw"));
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.RECT_LOOP);
        assertTrue(g.isDrawing());
        click(vm, g, -0.05, -0.02, 1);
        click(vm, g, 0.04, 0.03, 1);
        Conductor.Loop loop = assertInstanceOf(Conductor.Loop.class, vm.scene().conductors().get(0));
        List<Vec2> pts = loop.vertices().stream().map(Conductor.Vertex::at).toList();
        // Counter-clockwise, on the clicked grid points.
        assertEquals(0.09 * 0.05, Polygons.signedArea(pts), GEOMETRY_TOL);
        assertEquals(Set.of(loop.id()), vm.document().selection());
    }

    @Test
    void aClickThatMovedTooFarPlacesNoPoint() {
        EditorViewModel vm = vm(Scene.empty("draw"));
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.WIRE);
        g.pressed(100, 100, Button.PRIMARY, false);
        g.released();
        g.clicked(110, 100, Button.PRIMARY, 1);
        g.keyPressed(Key.ENTER);
        g.clicked(100, 100, Button.PRIMARY, 1);
        g.keyPressed(Key.ENTER);
        assertTrue(vm.scene().conductors().isEmpty(), "one point so far: no wire yet");
    }

    @Test
    void aPolygonIsClosedWithEnterOrADoubleClickAndEscapeCancelsItThenLeavesTheTool() {
        EditorViewModel vm = vm(Scene.empty("draw"));
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.LOOP);
        for (double[] p : new double[][] {{0, 0}, {0.06, 0}, {0.03, 0.05}}) {
            click(vm, g, p[0], p[1], 1);
        }
        g.keyPressed(Key.ENTER);
        assertEquals(3, vm.scene().conductors().get(0).vertices().size());

        for (double[] p : new double[][] {{0.1, 0}, {0.16, 0}, {0.13, 0.05}}) {
            click(vm, g, p[0], p[1], 1);
        }
        click(vm, g, 0.13, 0.05, 2);
        assertEquals(2, vm.scene().conductors().size(), "the double click closed the second loop");

        click(vm, g, -0.1, 0, 1);
        g.keyPressed(Key.ESCAPE);
        g.keyPressed(Key.ENTER);
        assertEquals(2, vm.scene().conductors().size(), "Escape dropped the started shape");
        g.keyPressed(Key.ESCAPE);
        assertEquals(ToolKind.SELECT, vm.view().toolProperty().get());
        assertFalse(g.isDrawing());
        assertTrue(vm.document().selection().isEmpty());
    }

    @Test
    void aTypedLengthPlacesTheNextVertexTowardsTheCursor() {
        EditorViewModel vm = vm(Scene.empty("draw"));
        CanvasGestures g = gestures(vm);
        assertEquals("Pick a drawing tool first", g.typed("25 mm"));
        vm.view().toolProperty().set(ToolKind.WIRE);
        click(vm, g, 0, 0, 1);
        g.moved(sx(vm, 0.05), sy(vm, 0));
        assertEquals("", g.typed("25 mm"));
        assertFalse(g.typed("25 parsecs").isEmpty(), "an unknown unit is refused with the reason");
        g.keyPressed(Key.ENTER);
        List<Vec2> pts = vm.scene().conductors().get(0).vertices().stream().map(Conductor.Vertex::at).toList();
        assertEquals(2, pts.size());
        assertTrue(pts.get(1).eq(new Vec2(0.025, 0), GEOMETRY_TOL), "typed 25 mm towards the cursor: " + pts);
    }

    @Test
    void keysDeleteThePlayAndStepTheTimeAndFitTheView() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        vm.document().select(Set.of("a"));
        g.keyPressed(Key.DELETE);
        assertTrue(vm.scene().conductor("a").isEmpty());
        g.keyPressed(Key.PERIOD);
        g.keyPressed(Key.PERIOD);
        g.keyPressed(Key.COMMA);
        assertEquals(vm.scene().time().dtS(), vm.clock().time(), GEOMETRY_TOL);
        g.keyPressed(Key.K);
        assertTrue(vm.clock().isPlaying());
        g.keyPressed(Key.HOME);
        assertFalse(vm.clock().isPlaying());
        assertEquals(0, vm.clock().time(), 0);
        g.keyPressed(Key.F);
        assertNotEquals(VIEW, vm.view().view(), "fitted to the wire left");
    }

    @Test
    void duplicatesLandAFewPixelsAwayOnScreen() {
        EditorViewModel vm = vm(twoWires());
        CanvasGestures g = gestures(vm);
        vm.document().select(Set.of("a"));
        g.duplicateSelection();
        Conductor copy = vm.scene().conductors().get(2);
        Vec2 shift = copy.vertices().get(0).at().minus(firstVertex(vm.scene(), "a"));
        assertTrue(shift.eq(new Vec2(20 / VIEW.pxPerM(), -20 / VIEW.pxPerM()), GEOMETRY_TOL), "shift " + shift);
    }

    /** Clicks the points in turn, then the first one again. */
    private static void outline(EditorViewModel vm, CanvasGestures g, double[][] pts) {
        for (double[] p : pts) {
            click(vm, g, p[0], p[1], 1);
        }
        click(vm, g, pts[0][0], pts[0][1], 1);
    }

    private static Conductor.Plate plate(EditorViewModel vm) {
        return assertInstanceOf(Conductor.Plate.class, vm.scene().conductors().get(0));
    }

    @Test
    void aPlateIsClosedOnItsFirstPointThenTheHoleAndElectrodeToolsWorkOnItAndAMissIsRefusedLosingNothing() {
        EditorViewModel vm = vm(Scene.empty("plate").withTime(new TimeSpan(0, 0.01, 0.01)));
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.PLATE);
        outline(vm, g, new double[][] {{-0.04, -0.02}, {0.04, -0.02}, {0.04, 0.02}, {-0.04, 0.02}});
        Conductor.Plate plate = plate(vm);
        assertEquals(0.08 * 0.04, Polygons.signedArea(plate.outline()), GEOMETRY_TOL);
        assertEquals(ShapeFactory.PLATE_THICKNESS_M, plate.thicknessM());
        assertEquals(Set.of(plate.id()), vm.document().selection(), "the new plate is selected");

        vm.view().toolProperty().set(ToolKind.HOLE);
        outline(vm, g, new double[][] {{-0.01, -0.01}, {0.01, -0.01}, {0.01, 0.01}, {-0.01, 0.01}});
        assertEquals(1, plate(vm).holes().size());
        assertEquals(0.02 * 0.02, Polygons.signedArea(plate(vm).holes().get(0)), GEOMETRY_TOL);
        assertEquals(Set.of(plate.id()), vm.document().selection(), "the plate stays selected for its electrodes");

        vm.view().toolProperty().set(ToolKind.ELECTRODE);
        // 1 mm and 1.5 mm off the edges (2 and 3 px), not on the grid: they land on the edges.
        click(vm, g, 0.0003, 0.021, 1);
        click(vm, g, 0.0003, -0.0215, 1);
        List<Conductor.Electrode> electrodes = plate(vm).electrodes();
        assertTrue(electrodes.get(0).at().eq(new Vec2(0.0003, 0.02), GEOMETRY_TOL), "" + electrodes);
        assertTrue(electrodes.get(1).at().eq(new Vec2(0.0003, -0.02), GEOMETRY_TOL), "" + electrodes);
        assertEquals(List.of(new Conductor.ElectrodePair("e1", "e2")), plate(vm).pairs());

        Scene before = vm.scene();
        // 15 mm (30 px) from the outline and the hole alike.
        click(vm, g, 0.025, 0, 1);
        assertSame(before, vm.scene(), "a miss changes nothing");
        assertTrue(vm.statusProperty().get().startsWith("Add electrode refused: click on the edge"),
                vm.statusProperty().get());
        vm.view().toolProperty().set(ToolKind.HOLE);
        outline(vm, g, new double[][] {{0.03, 0}, {0.05, 0}, {0.05, 0.01}});
        assertSame(before, vm.scene(), "a hole across the outline changes nothing");
        assertTrue(vm.statusProperty().get().startsWith("Add hole refused: a hole must lie strictly inside"),
                vm.statusProperty().get());
        vm.document().undo();
        assertTrue(plate(vm).pairs().isEmpty() && plate(vm).electrodes().size() == 1, "each electrode is one edit");
    }

    @Test
    void onAMovedPlateAnElectrodeLandsWhereTheClickIsOnScreenAndTheHoleToolWantsAPlate() {
        Conductor.Plate drawn = new Conductor.Plate("p", "cart", List.of(new Vec2(0, 0), new Vec2(0.06, 0),
                new Vec2(0.06, 0.04), new Vec2(0, 0.04)), List.of(), 0.002, ShapeFactory.PLATE_CONDUCTIVITY, List.of(),
                List.of(), java.util.OptionalDouble.empty());
        Scene s = Scene.empty("moving plate").withTime(new TimeSpan(0, 0.2, 0.1))
                .withBodies(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(0.1, 0)))))
                .withConductors(List.of(drawn));
        EditorViewModel vm = vm(s);
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.HOLE);
        outline(vm, g, new double[][] {{0.02, 0.01}, {0.04, 0.01}, {0.03, 0.03}});
        assertTrue(vm.statusProperty().get().contains("select one plate first"), vm.statusProperty().get());

        vm.clock().seek(0.1);
        vm.document().select(Set.of("p"));
        vm.view().toolProperty().set(ToolKind.ELECTRODE);
        // Seen 10 mm to the right of where it was drawn.
        click(vm, g, 0.05, 0.0405, 1);
        Vec2 at = ((Conductor.Plate) vm.scene().conductor("p").orElseThrow()).electrodes().get(0).at();
        assertTrue(at.eq(new Vec2(0.04, 0.04), GEOMETRY_TOL), "drawn on the plate's top edge: " + at);
    }

    @Test
    void quickClicksAtSeparateSpotsThatCountAsADoubleClickStillPlaceTheirPoints() {
        EditorViewModel vm = vm(Scene.empty("draw"));
        CanvasGestures g = gestures(vm);
        vm.view().toolProperty().set(ToolKind.LOOP);
        click(vm, g, 0, 0, 1);
        click(vm, g, 0.06, 0, 2);
        assertTrue(vm.scene().conductors().isEmpty(), "a double click away from the last point is a click");
        click(vm, g, 0.03, 0.05, 1);
        click(vm, g, 0.03, 0.05, 2);
        assertEquals(3, vm.scene().conductors().get(0).vertices().size());
    }
}
