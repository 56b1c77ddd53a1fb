package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import javafx.application.Platform;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneEdits;
import org.kinduct.render.paint.Quantities;
import org.kinduct.render.view.ViewTransform;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Drives the real window headless: drawing, undo, properties, files. */
@ExtendWith(ApplicationExtension.class)
class EditorWindowTest {

    private static final double GEOMETRY_TOL = 1e-9;

    @TempDir
    static Path home;

    private EditorViewModel vm;
    private EditorWindow window;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        vm = new EditorViewModel(Scene.empty("test"), Runnable::run, Platform::runLater);
        window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), Runnable::run);
        stage.setScene(new javafx.scene.Scene(window.root(), 1100, 760));
        stage.show();
        vm.view().viewProperty().set(new ViewTransform(0, 0, 2000, window.canvas().getWidth(), window.canvas().getHeight()));
    }

    private javafx.geometry.Point2D screenOf(FxRobot robot, double x, double y) {
        ViewTransform v = vm.view().view();
        return robot.point(window.canvas()).atOffset(new javafx.geometry.Point2D(
                v.screenX(x) - window.canvas().getWidth() / 2, v.screenY(y) - window.canvas().getHeight() / 2)).query();
    }

    @Test
    void drawingARectangularLoopWithTheMouseAddsACounterClockwiseLoopThatUndoRemoves(FxRobot robot) {
        robot.clickOn("#tool-rect-loop");
        robot.clickOn(screenOf(robot, -0.05, -0.02));
        robot.clickOn(screenOf(robot, 0.04, 0.03));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, vm.scene().conductors().size());
        Conductor.Loop loop = assertInstanceOf(Conductor.Loop.class, vm.scene().conductors().get(0));
        List<Vec2> pts = loop.vertices().stream().map(Conductor.Vertex::at).toList();
        // Grid snapping at this zoom is 10 mm, so the corners land exactly on the clicked grid points.
        assertEquals(0.09 * 0.05, Polygons.signedArea(pts), GEOMETRY_TOL);
        robot.press(KeyCode.CONTROL).type(KeyCode.Z).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(vm.scene().conductors().isEmpty(), "undo removes the loop");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT).type(KeyCode.Z).release(KeyCode.SHIFT, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, vm.scene().conductors().size(), "redo brings it back");
    }

    @Test
    void polygonLoopIsDrawnClickByClickAndClosedWithEnter(FxRobot robot) {
        robot.clickOn("#tool-loop");
        for (double[] p : new double[][] {{0, 0}, {0.06, 0}, {0.03, 0.05}}) {
            robot.clickOn(screenOf(robot, p[0], p[1]));
        }
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, vm.scene().conductors().size());
        assertEquals(3, vm.scene().conductors().get(0).vertices().size());
        assertTrue(vm.document().selection().contains(vm.scene().conductors().get(0).id()), "the new loop is selected");
    }

    @Test
    void draggingASelectedObjectMovesItAsOneUndoableEdit(FxRobot robot) {
        interact(() -> vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("w", Body.FIXED,
                List.of(Conductor.Vertex.at(-0.05, 0), Conductor.Vertex.at(0.05, 0))))));
        robot.drag(screenOf(robot, 0.01, 0), MouseButton.PRIMARY).dropTo(screenOf(robot, 0.03, 0.02));
        WaitForAsyncUtils.waitForFxEvents();
        Vec2 first = vm.scene().conductor("w").orElseThrow().vertices().get(0).at();
        assertTrue(first.eq(new Vec2(-0.03, 0.02), 1e-3), "moved by the drag: " + first);
        interact(vm.document()::undo);
        assertTrue(vm.scene().conductor("w").orElseThrow().vertices().get(0).at().eq(new Vec2(-0.05, 0), 0));
    }

    @Test
    void draggingAVertexHandleOfTheSelectedLoopReshapesIt(FxRobot robot) {
        interact(() -> {
            vm.document().apply("add", s -> SceneEdits.addConductor(s, Conductor.Loop.simple("sq", Body.FIXED, List.of(
                    Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.04),
                    Conductor.Vertex.at(0, 0.04)), org.kinduct.ui.edit.ShapeFactory.DEFAULT_WIRE)));
            vm.document().select(java.util.Set.of("sq"));
        });
        robot.drag(screenOf(robot, 0.04, 0.04), MouseButton.PRIMARY).dropTo(screenOf(robot, 0.06, 0.05));
        WaitForAsyncUtils.waitForFxEvents();
        // Grid snapping (10 mm at this zoom) puts the vertex exactly on the drop point.
        assertEquals(new Vec2(0.06, 0.05), vm.scene().conductor("sq").orElseThrow().vertices().get(2).at());
        assertEquals(new Vec2(0.04, 0), vm.scene().conductor("sq").orElseThrow().vertices().get(1).at());
    }

    @Test
    void wheelZoomKeepsThePointUnderTheCursor(FxRobot robot) {
        javafx.geometry.Point2D at = screenOf(robot, 0.03, -0.02);
        robot.moveTo(at);
        double before = vm.view().view().pxPerM();
        robot.scroll(3, javafx.geometry.VerticalDirection.UP);
        WaitForAsyncUtils.waitForFxEvents();
        ViewTransform v = vm.view().view();
        assertTrue(v.pxPerM() != before, "the wheel zooms");
        javafx.geometry.Point2D local = window.canvas().screenToLocal(at);
        assertEquals(0.03, v.sceneX(local.getX()), 2 / v.pxPerM());
        assertEquals(-0.02, v.sceneY(local.getY()), 2 / v.pxPerM());
    }

    @Test
    void theNumericEntryAppearsOnlyOnceTheUserTypes(FxRobot robot) {
        robot.clickOn("#tool-wire");
        robot.clickOn(screenOf(robot, 0, 0));
        javafx.scene.Node entry = robot.lookup("#numeric-entry").query();
        assertFalse(entry.isVisible(), "no box where the next click may go");
        robot.write("2");
        assertTrue(entry.isVisible(), "typing a number opens it");
        robot.type(KeyCode.ESCAPE);
        assertFalse(entry.isVisible(), "Escape puts it away");
    }

    /** A loop dropped from rest falls g·t²/2 = 4.9 m in 1 s (free fall): the fitted view follows it there once the run is in. */
    @Test
    void aFittedViewTakesInWhereAFreeBodyFallsOnceItsRunIsDone() throws Exception {
        Body cage = new Body("cage", "cage", Vec2.ZERO, Motion.Free.ofMass(0.1));
        Conductor.Loop loop = Conductor.Loop.simple("loop", "cage", List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.1, 0), Conductor.Vertex.at(0.1, 0.1), Conductor.Vertex.at(0, 0.1)),
                org.kinduct.ui.edit.ShapeFactory.DEFAULT_WIRE);
        Scene drop = Scene.empty("drop").withBodies(List.of(cage)).withConductors(List.of(loop))
                .withGravity(new Vec2(0, -9.81)).withTime(new org.kinduct.scene.TimeSpan(0, 1, 0.01));
        interact(() -> {
            vm.load(drop, null, false);
            vm.zoomToFit();
        });
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> vm.results().currentResult().map(org.kinduct.solver.run.RunResult::hasFreeBodies).orElse(false));
        WaitForAsyncUtils.waitForFxEvents();
        ViewTransform v = vm.view().view();
        assertTrue(v.minY() < -4.8 && v.maxY() > 0.1, "view " + v.minY() + " … " + v.maxY() + " m holds the fall");
    }

    @Test
    void typedLengthWhileDrawingPlacesTheNextVertex(FxRobot robot) {
        robot.clickOn("#tool-wire");
        robot.clickOn(screenOf(robot, 0, 0));
        robot.moveTo(screenOf(robot, 0.05, 0));
        robot.write("25 mm").type(KeyCode.ENTER);
        interact(window.canvas()::requestFocus);
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        List<Vec2> pts = vm.scene().conductors().get(0).vertices().stream().map(Conductor.Vertex::at).toList();
        assertEquals(2, pts.size());
        assertTrue(pts.get(1).eq(new Vec2(0.025, 0), GEOMETRY_TOL), "typed 25 mm towards the cursor: " + pts);
    }

    @Test
    void rubberBandSelectsEverythingInsideIt(FxRobot robot) {
        interact(() -> {
            vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("a", Body.FIXED,
                    List.of(Conductor.Vertex.at(-0.02, 0), Conductor.Vertex.at(0, 0.01)))));
            vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("b", Body.FIXED,
                    List.of(Conductor.Vertex.at(0.01, -0.01), Conductor.Vertex.at(0.02, 0.01)))));
            vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("outside", Body.FIXED,
                    List.of(Conductor.Vertex.at(0.08, 0), Conductor.Vertex.at(0.09, 0)))));
        });
        robot.drag(screenOf(robot, -0.03, 0.03), MouseButton.PRIMARY).dropTo(screenOf(robot, 0.03, -0.03));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(java.util.Set.of("a", "b"), vm.document().selection());
    }

    @Test
    void motionIsSetInThePropertiesPanel(FxRobot robot) {
        interact(() -> {
            vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("rod", Body.FIXED,
                    List.of(Conductor.Vertex.at(0, -0.02), Conductor.Vertex.at(0, 0.02)))));
            vm.document().select(java.util.Set.of("rod"));
        });
        ComboBox<String> motion = robot.lookup("#prop-motion").queryComboBox();
        interact(() -> motion.getSelectionModel().select("glide"));
        WaitForAsyncUtils.waitForFxEvents();
        TextField velocity = robot.lookup("#prop-velocity-x-y").queryAs(TextField.class);
        robot.doubleClickOn(velocity);
        interact(velocity::clear);
        robot.write("0.5 m/s, 0").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        String body = SceneEdits.bodyOf(vm.scene(), "rod");
        assertNotEquals(Body.FIXED, body);
        assertEquals(new Motion.Glide(new Vec2(0.5, 0)), vm.scene().body(body).orElseThrow().motion());
    }

    @Test
    void aRefusedEntryGoesBackToTheLastValidValueAndTheStatusLineSaysWhy(FxRobot robot) {
        interact(() -> vm.document().select(java.util.Set.of()));
        Scene before = vm.scene();
        TextField end = robot.lookup("#prop-end-time").queryAs(TextField.class);
        String valid = end.getText();
        robot.doubleClickOn(end);
        interact(end::clear);
        robot.write("12 mm").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(valid, end.getText(), "the field shows the value the scene still has");
        String status = robot.lookup("#status").queryAs(Label.class).getText();
        assertTrue(status.contains("time") && status.contains("kept " + valid), status);
        assertSame(before, vm.scene());
    }

    @Test
    void negativeTurnsAreRefusedWhenTheFieldIsLeft(FxRobot robot) {
        interact(() -> {
            vm.document().apply("add", s -> SceneEdits.addConductor(s, Conductor.Loop.simple("sq", Body.FIXED, List.of(
                    Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.04),
                    Conductor.Vertex.at(0, 0.04)), org.kinduct.ui.edit.ShapeFactory.DEFAULT_WIRE)));
            vm.document().select(java.util.Set.of("sq"));
        });
        Scene before = vm.scene();
        TextField turns = robot.lookup("#prop-turns").queryAs(TextField.class);
        robot.doubleClickOn(turns);
        interact(turns::clear);
        robot.write("-5");
        interact(window.canvas()::requestFocus);
        assertEquals("1", turns.getText());
        String status = robot.lookup("#status").queryAs(Label.class).getText();
        assertTrue(status.startsWith("Turns: ") && status.contains("-5") && status.endsWith("kept 1"), status);
        assertSame(before, vm.scene());
    }

    @Test
    void malformedFileShowsWhereItIsWrongAndKeepsTheCurrentScene(FxRobot robot) throws Exception {
        interact(() -> vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("keep", Body.FIXED,
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.01, 0))))));
        Scene before = vm.scene();
        Path bad = home.resolve("bad.json");
        Files.writeString(bad, "{\n  \"format\": \"kinduct-scene\",\n  \"version\": 1,\n  \"bodies\": 7\n}\n");
        assertFalse(onFx(() -> window.files().open(bad)), "the malformed file is not opened");
        assertSame(before, vm.scene(), "the user's scene stays");
        TextArea details = robot.lookup("#error-details").queryAs(TextArea.class);
        // The reader names file, line and column, and the JSON path at fault.
        assertTrue(details.getText().contains("bad.json:4:") && details.getText().contains("bodies"), details.getText());
        interact(() -> details.getScene().getWindow().hide());
    }

    @Test
    void savedFileOpensAgainUnchanged(FxRobot robot) throws Exception {
        interact(() -> vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire("w", Body.FIXED,
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.012, 0.003))))));
        Path file = home.resolve("saved.json");
        assertTrue(onFx(() -> window.files().saveTo(file)));
        assertFalse(vm.document().isDirty());
        Scene saved = vm.scene();
        interact(() -> vm.load(Scene.empty("other"), null, false));
        assertTrue(onFx(() -> window.files().open(file)));
        assertEquals(saved, vm.scene());
    }

    @Test
    void theWindowTitleFollowsOpenEditSaveNewAndOpenAgain() throws Exception {
        assertTrue(onFx(() -> window.files().openDemo(org.kinduct.demo.Demos.resource("rail-sled").orElseThrow())));
        assertEquals("Sled on rails crossing a pole gap — Kinduct", stage.getTitle());
        interact(() -> vm.document().apply("Rename", s -> s.withText("sled", s.description())));
        assertEquals("• sled — Kinduct", stage.getTitle());
        Path file = home.resolve("sled.json");
        assertTrue(onFx(() -> window.files().saveTo(file)));
        assertEquals("sled — sled.json — Kinduct", stage.getTitle());
        interact(() -> window.files().newScene());
        assertEquals("untitled — Kinduct", stage.getTitle());
        assertTrue(onFx(() -> window.files().open(file)));
        assertEquals("sled — sled.json — Kinduct", stage.getTitle());
    }

    /** With the mouse resting over a magnet, turning its poles round flips the B_z the readout shows. */
    @Test
    void theCursorReadoutFollowsAnEditUnderAStillMouse(FxRobot robot) {
        Source.BlockMagnet magnet = new Source.BlockMagnet("m", Body.FIXED, new Vec2(0.02, 0.01), 0.02, 0.02, 0.005,
                0, 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        interact(() -> vm.document().apply("add", s -> SceneEdits.addSource(s, magnet)));
        javafx.geometry.Point2D at = screenOf(robot, 0.02, 0.01);
        robot.moveTo(at);
        WaitForAsyncUtils.waitForFxEvents();
        Label readout = robot.lookup("#cursor-readout").queryAs(Label.class);
        assertTrue(readout.getText().endsWith("⊙"), readout.getText());

        interact(() -> vm.document().apply("Poles", s -> SceneEdits.replaceSource(s, new Source.BlockMagnet("m",
                Body.FIXED, magnet.center(), 0.02, 0.02, 0.005, 0, 0.001, Source.Side.BELOW, 1.2,
                Source.Magnetization.MINUS_Z))));

        assertTrue(readout.getText().endsWith("⊗"), "after the edit: " + readout.getText());
        interact(vm::zoomToFit);
        javafx.geometry.Point2D mouse = window.canvas().screenToLocal(
                robot.robotContext().getBaseRobot().retrieveMouse());
        assertTrue(readout.getText().startsWith("x " + Quantities.length(
                vm.view().view().toScene(mouse.getX(), mouse.getY()).x())), "after zooming: " + readout.getText());
    }

    @Test
    void theSignsDialogFitsA1280By800ScreenAndShowsItsWholeText(FxRobot robot) {
        javafx.scene.control.MenuBar bar = robot.lookup("#menu-bar").queryAs(javafx.scene.control.MenuBar.class);
        javafx.scene.control.MenuItem signs = bar.getMenus().stream().filter(m -> "help-menu".equals(m.getId()))
                .findFirst().orElseThrow().getItems().stream().filter(i -> i.getText().startsWith("Signs"))
                .findFirst().orElseThrow();
        interact(signs::fire);
        javafx.scene.control.DialogPane pane = robot.lookup(".dialog-pane")
                .queryAs(javafx.scene.control.DialogPane.class);
        javafx.stage.Window dialog = pane.getScene().getWindow();
        assertTrue(dialog.getWidth() <= 1280 && dialog.getHeight() <= 800,
                "dialog " + dialog.getWidth() + " × " + dialog.getHeight());
        Label body = (Label) pane.getContent();
        assertTrue(body.getText().contains("CHECK"), "the table's word for a disagreement");
        assertTrue(body.getHeight() >= body.prefHeight(body.getWidth()) - 1, "every wrapped line shown");
        interact(dialog::hide);
    }

    /** Starts a file action on the UI thread and waits for its outcome. */
    private static boolean onFx(Supplier<CompletableFuture<Boolean>> action) throws Exception {
        return WaitForAsyncUtils.asyncFx(action::get).get(20, TimeUnit.SECONDS).get(20, TimeUnit.SECONDS);
    }

    private static void interact(Runnable r) {
        try {
            WaitForAsyncUtils.asyncFx(r).get(20, TimeUnit.SECONDS);
        } catch (Exception e) {
            throw new AssertionError("FX action failed", e);
        }
        WaitForAsyncUtils.waitForFxEvents();
    }
}
