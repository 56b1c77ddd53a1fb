package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import javafx.application.Platform;
import javafx.geometry.Point2D;
import javafx.scene.control.TableColumn;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.render.paint.SheetTexts;
import org.kinduct.report.Labels;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneEdits;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.ui.edit.ToolKind;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The whole story in the real window: draw a plate with a hole over a magnet, put two
 * electrodes on it, make it glide past the magnet, and read the voltage, the + electrode and the
 * drag in the readout.
 */
@ExtendWith(ApplicationExtension.class)
class PlateEditingTest {

    /** μ0 = 4π × 10⁻⁷ H/m (the pre-2019 exact value; the 2019 SI differs by 1e-10 relative). */
    private static final double MU0 = 4e-7 * Math.PI;

    @TempDir
    static Path home;

    private EditorViewModel vm;
    private EditorWindow window;

    /** A 20 mm square magnet 2 mm below the plane at the origin, its north pole up (B_z > 0 over it). */
    private static Scene magnet() {
        Source.BlockMagnet m = new Source.BlockMagnet("magnet", Body.FIXED, Vec2.ZERO, 0.02, 0.02, 0.01, 0, 0.002,
                Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        return Scene.empty("plate over a magnet").withSources(List.of(m)).withTime(new TimeSpan(0, 0.01, 0.01));
    }

    @Start
    void start(Stage stage) {
        vm = new EditorViewModel(magnet(), Runnable::run, Platform::runLater);
        window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), Runnable::run);
        stage.setScene(new javafx.scene.Scene(window.root(), 1280, 800));
        stage.show();
        vm.view().viewProperty().set(new ViewTransform(0, 0, 2000, window.canvas().getWidth(),
                window.canvas().getHeight()));
    }

    private Point2D screenOf(FxRobot robot, double x, double y) {
        ViewTransform v = vm.view().view();
        return robot.point(window.canvas()).atOffset(new Point2D(v.screenX(x) - window.canvas().getWidth() / 2,
                v.screenY(y) - window.canvas().getHeight() / 2)).query();
    }

    /** Picks a tool from the tool bar and checks it is the one drawing now. */
    private void pick(FxRobot robot, String id, ToolKind kind) {
        robot.clickOn(id);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(kind, vm.view().toolProperty().get(), id);
    }

    private void clickAll(FxRobot robot, double[][] pts) {
        for (double[] p : pts) {
            robot.clickOn(screenOf(robot, p[0], p[1]));
        }
    }

    /** Waits for a snapshot of the current scene whose plate state passes {@code ready}. */
    private SheetState shown(Predicate<SheetState> ready) throws Exception {
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> {
            Snapshot s = vm.results().snapshot();
            return s != null && s.sheet("plate").filter(ready).isPresent();
        });
        WaitForAsyncUtils.waitForFxEvents();
        return vm.results().snapshot().sheet("plate").orElseThrow();
    }

    private static String cell(SheetReadoutTable table, String heading) {
        for (TableColumn<SheetReadoutTable.Row, ?> c : table.getColumns()) {
            if (((javafx.scene.control.Label) c.getGraphic()).getText().replace('\n', ' ').equals(heading)) {
                return String.valueOf(c.getCellData(0));
            }
        }
        throw new AssertionError("no column " + heading);
    }

    @Test
    void aPlateWithAHoleAndTwoElectrodesGlidingPastTheMagnetReadsItsVoltagePlusElectrodeAndDrag(FxRobot robot)
            throws Exception {
        pick(robot, "#tool-plate", ToolKind.PLATE);
        clickAll(robot, new double[][] {{-0.04, -0.02}, {0.04, -0.02}, {0.04, 0.02}, {-0.04, 0.02}, {-0.04, -0.02}});
        WaitForAsyncUtils.waitForFxEvents();
        Conductor.Plate plate = (Conductor.Plate) vm.scene().conductors().get(0);
        assertEquals("plate", plate.id());
        assertEquals(1, vm.scene().conductors().size(), vm.statusProperty().get());
        pick(robot, "#tool-hole", ToolKind.HOLE);
        // A slot beside the magnet, symmetric about y = 0 like the plate.
        clickAll(robot, new double[][] {{0.02, -0.01}, {0.03, -0.01}, {0.03, 0.01}, {0.02, 0.01}, {0.02, -0.01}});
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, ((Conductor.Plate) vm.scene().conductor("plate").orElseThrow()).holes().size(),
                vm.statusProperty().get());
        pick(robot, "#tool-electrode", ToolKind.ELECTRODE);
        clickAll(robot, new double[][] {{0, 0.0205}, {0, -0.0205}});
        robot.type(KeyCode.ESCAPE);
        WaitForAsyncUtils.waitForFxEvents();
        plate = (Conductor.Plate) vm.scene().conductor("plate").orElseThrow();
        assertEquals(1, plate.holes().size(), vm.statusProperty().get());
        assertEquals(List.of(new Conductor.ElectrodePair("e1", "e2")), plate.pairs());

        double speed = 0.5;
        interact(() -> vm.document().apply("Glide", s -> SceneEdits.setMotion(s, "plate",
                new Motion.Glide(new Vec2(speed, 0)), Vec2.ZERO)));
        SheetState st = shown(s -> s.forceN().length() > 0);
        SheetReadoutTable table = robot.lookup("#sheet-readouts").queryAs(SheetReadoutTable.class);
        assertTrue(table.isVisible());
        SheetState.Pair pair = st.pairs().get(0);
        // v × B = (0, −v·B_z) over the magnet pushes charge to −y: the lower electrode, e2, is + (Griffiths §7.1.3).
        assertEquals(Optional.of("e2"), pair.positive());
        assertEquals(Labels.positiveElectrode(Optional.of("e2")), cell(table, "+ electrode"));
        assertTrue(pair.voltageV() < 0, "φ(e1) − φ(e2) < 0: " + pair.voltageV());
        assertEquals(SheetTexts.voltage(st, pair, vm.results().scalesNow()), cell(table, "Voltage"));
        assertEquals("e1 − e2", cell(table, "Electrodes"));
        // Lenz: the drag opposes the glide along +x; the plate and its slot are symmetric about y = 0.
        String drag = cell(table, "Drag, angle");
        assertTrue(drag.endsWith(" ∠ 180°"), drag);
        assertEquals(SheetTexts.drag(st, vm.results().scalesNow()), drag);
        // Rm = μ0·σ·d·v of 2 mm aluminium at 20 °C (README "Resistive limit").
        double rm = MU0 * ShapeFactory.PLATE_CONDUCTIVITY.sigmaSPerM() * ShapeFactory.PLATE_THICKNESS_M * speed;
        assertEquals(String.format(java.util.Locale.ROOT, "%.2g", rm), cell(table, "Rm"));
        // Joule heat = drag power with a still magnet (energy conservation, Griffiths §8.1).
        assertEquals(st.joulePowerW(), -st.forceN().dot(new Vec2(speed, 0)), 1e-6 * st.joulePowerW());

        interact(() -> vm.document().apply("Faster", s -> SceneEdits.setMotion(s, "plate",
                new Motion.Glide(new Vec2(10 * speed, 0)), Vec2.ZERO)));
        SheetState fast = shown(SheetState::beyondResistiveLimit);
        assertEquals(SheetTexts.reynolds(fast) + "  " + Labels.reynoldsWarning(fast.magneticReynolds()),
                cell(table, "Rm"));
    }

    private static void interact(Runnable r) {
        try {
            WaitForAsyncUtils.asyncFx(r).get(60, TimeUnit.SECONDS);
        } catch (Exception e) {
            throw new AssertionError("FX action failed", e);
        }
        WaitForAsyncUtils.waitForFxEvents();
    }
}
