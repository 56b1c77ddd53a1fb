package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.TableView;
import javafx.scene.image.PixelReader;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.render.paint.Quantities;
import org.kinduct.report.Labels;
import org.kinduct.render.view.ViewTransform;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Plays a loop gliding into a region of field and checks, at the paused time, the table against
 * the solver, the EMF against B·w·v, and the drawn induced-field symbol against Lenz's law.
 */
@ExtendWith(ApplicationExtension.class)
class PlaybackTest {

    /** B_z of the region, tesla (into the screen). */
    private static final double B = -0.5;
    private static final double WIDTH_M = 0.02;
    private static final double SPEED = 0.1;
    private static final double EMF_REL_TOL = 1e-6;

    @TempDir
    static Path home;

    private EditorViewModel vm;
    private EditorWindow window;

    /**
     * A 40 mm × 20 mm loop, leading edge at x = −10 mm, gliding at +0.1 m/s into B_z = −0.5 T for
     * x ≥ 0: between t = 0.1 s and 0.5 s one edge is inside.
     */
    static Scene enteringLoop() {
        Source.FieldPatch patch = new Source.FieldPatch("region", Body.FIXED, List.of(new Vec2(0, -0.1),
                new Vec2(0.3, -0.1), new Vec2(0.3, 0.1), new Vec2(0, 0.1)), B);
        Conductor.Loop loop = Conductor.Loop.simple("loop", "cart", List.of(Conductor.Vertex.at(-0.05, -0.01),
                Conductor.Vertex.at(-0.01, -0.01), Conductor.Vertex.at(-0.01, 0.01), Conductor.Vertex.at(-0.05, 0.01)),
                ShapeFactory.DEFAULT_WIRE);
        Body cart = new Body("cart", "cart", new Vec2(-0.03, 0), new Motion.Glide(new Vec2(SPEED, 0)));
        return new Scene("entering", "", List.of(cart), List.of(patch), List.of(loop), new TimeSpan(0, 1, 0.01));
    }

    @Start
    void start(Stage stage) {
        vm = new EditorViewModel(enteringLoop(), Runnable::run, Platform::runLater);
        window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), Runnable::run);
        stage.setScene(new javafx.scene.Scene(window.root(), 1100, 760));
        stage.show();
        vm.view().viewProperty().set(new ViewTransform(0, 0, 2500, window.canvas().getWidth(), window.canvas().getHeight()));
    }

    @Test
    void playingShowsTheSolverValuesAndTheInducedFieldOpposingTheChange(FxRobot robot) throws Exception {
        interact(() -> vm.clock().speedProperty().set(0.1));
        robot.clickOn("#play");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> vm.clock().time() > 0.2);
        robot.clickOn("#play");
        WaitForAsyncUtils.waitForFxEvents();
        double t = vm.clock().time();
        assertTrue(t > 0.1 && t < 0.5, "paused while one edge is inside: t = " + t);
        // Snapshots are solved off the UI thread; the one for the paused time follows shortly.
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS,
                () -> vm.results().snapshot() != null && vm.results().snapshot().tS() == t);

        Snapshot expected = new SceneRun(vm.scene()).instant(t);
        ConductorState st = expected.conductor("loop").orElseThrow();
        assertEquals(expected, vm.results().snapshot(), "the editor shows the run's instant t, as solve --at does");
        // Rod or edge of length w moving at v across B: |EMF| = B·w·v (Griffiths, Introduction to
        // Electrodynamics, ch. 7). Flux into the screen grows, so the induced current runs
        // counter-clockwise, making its own field out of the screen (Lenz).
        assertEquals(Math.abs(B) * WIDTH_M * SPEED, st.emfV(), EMF_REL_TOL * Math.abs(B) * WIDTH_M * SPEED);
        assertEquals(Circulation.CCW, st.direction());

        TableView<?> table = robot.lookup("#readouts").queryAs(TableView.class);
        String shownEmf = (String) table.getColumns().get(3).getCellData(0);
        assertEquals(Quantities.voltage(st.emfMotionalV()), shownEmf);
        assertEquals(Labels.agreement(st), table.getColumns().get(4).getCellData(0));
        assertTrue(Labels.agreement(st).startsWith("yes"), Labels.agreement(st));
        assertEquals("↺ counter-clockwise", table.getColumns().get(6).getCellData(0));

        // The ⊙ of the induced field is drawn at the loop's centre: a dark dot there.
        Vec2 centre = st.vertices().stream().reduce(Vec2.ZERO, Vec2::plus).times(0.25);
        PixelReader px = WaitForAsyncUtils.asyncFx(() -> {
            window.canvas().paint();
            return window.canvas().snapshot(null, null).getPixelReader();
        }).get(20, TimeUnit.SECONDS);
        ViewTransform v = vm.view().view();
        int argb = px.getArgb((int) Math.round(v.screenX(centre.x())), (int) Math.round(v.screenY(centre.y())));
        double lum = 0.299 * ((argb >> 16) & 0xFF) + 0.587 * ((argb >> 8) & 0xFF) + 0.114 * (argb & 0xFF);
        assertTrue(lum < 90, "⊙ dot at the loop centre, got " + Integer.toHexString(argb));
    }

    private static void interact(Runnable r) throws Exception {
        WaitForAsyncUtils.asyncFx(r).get(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
    }
}
