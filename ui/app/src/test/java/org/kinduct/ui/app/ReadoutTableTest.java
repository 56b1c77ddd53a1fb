package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.kinduct.report.Labels;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ShapeFactory;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The readout table in a narrow window: a loop at rest beside an AC coil (all its EMF is induced
 * field) and a rod gliding past it. Headings say what the columns sum, the words are the report's,
 * and no text is cut short.
 */
@ExtendWith(ApplicationExtension.class)
class ReadoutTableTest {

    private EditorViewModel vm;
    private ReadoutTable table;

    static Scene coilLoopAndRod() {
        Source.SourceCoil coil = new Source.SourceCoil("coil", Body.FIXED,
                new Source.CoilShape.Circle(Vec2.ZERO, 0.02), 10, 0.002, new Source.Drive(0, 1, 50, 0));
        Conductor.Loop loop = Conductor.Loop.simple("pickup", Body.FIXED, List.of(Conductor.Vertex.at(0.04, -0.01),
                Conductor.Vertex.at(0.06, -0.01), Conductor.Vertex.at(0.06, 0.01), Conductor.Vertex.at(0.04, 0.01)),
                ShapeFactory.DEFAULT_WIRE);
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(Conductor.Vertex.at(-0.01, 0.03),
                Conductor.Vertex.at(0.01, 0.03)));
        Body cart = new Body("cart", "cart", new Vec2(0, 0.03), new Motion.Glide(new Vec2(0, -0.5)));
        return new Scene("coil, loop and rod", "", List.of(cart), List.of(coil), List.of(loop, rod),
                new TimeSpan(0, 0.02, 0.001));
    }

    @Start
    void start(Stage stage) {
        vm = new EditorViewModel(coilLoopAndRod(), Runnable::run, Platform::runLater);
        table = new ReadoutTable(vm);
        stage.setScene(new javafx.scene.Scene(table, 520, 200));
        stage.show();
    }

    private Snapshot shown() throws Exception {
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> vm.results().snapshot() != null);
        WaitForAsyncUtils.waitForFxEvents();
        return vm.results().snapshot();
    }

    private static boolean shown(Node n) {
        for (Node at = n; at != null; at = at.getParent()) {
            if (!at.isVisible()) {
                return false;
            }
        }
        return true;
    }

    private static String heading(javafx.scene.control.TableColumn<?, ?> c) {
        return ((Label) c.getGraphic()).getText();
    }

    @Test
    void theMotionalColumnSaysItHoldsTheInducedFieldTooAndItsValueIsTheStillLoopsWholeEmf() throws Exception {
        ConductorState loop = shown().conductor("pickup").orElseThrow();
        javafx.scene.control.TableColumn<ReadoutTable.Row, ?> motional = table.getColumns().get(3);
        assertEquals("EMF, motion + induced field", heading(motional).replace('\n', ' '));
        String tip = ((Label) motional.getGraphic()).getTooltip().getText();
        assertTrue(tip.contains("∂A/∂t"), tip);
        assertTrue(loop.emfMotionalV() != 0, "a still loop beside an AC coil has an EMF");
        assertEquals(org.kinduct.render.paint.Quantities.voltage(vm.results().scalesNow().emf(loop.emfMotionalV())),
                motional.getCellData(0));
    }

    @Test
    void polarityAgreementAndSenseAreTheReportsWords() throws Exception {
        Snapshot snap = shown();
        ConductorState loop = snap.conductor("pickup").orElseThrow();
        ConductorState rod = snap.conductor("rod").orElseThrow();
        assertEquals(Labels.sense(loop.direction()), table.getColumns().get(6).getCellData(0));
        assertEquals(Labels.polarity(rod.positiveEnd(), false), table.getColumns().get(6).getCellData(1));
        assertEquals(Labels.agreement(loop.disagreement()), table.getColumns().get(4).getCellData(0));
        assertEquals(Labels.ONE_METHOD, table.getColumns().get(4).getCellData(1));
        assertEquals(Labels.NOT_APPLICABLE, table.getColumns().get(1).getCellData(1), "a wire has no flux linkage");
    }

    @Test
    void noHeadingOrValueIsCutShortAndEveryCellTellsItsTextInATooltip() throws Exception {
        shown();
        List<Text> texts = table.lookupAll(".text").stream().filter(Text.class::isInstance).map(Text.class::cast)
                .filter(t -> t.getText() != null && !t.getText().isEmpty() && shown(t)).toList();
        assertTrue(texts.size() >= 8 + 2 * 8, "headings and two rows of cells: " + texts.size());
        for (Text t : texts) {
            assertFalse(t.getText().endsWith("...") || t.getText().endsWith("…"), "cut short: " + t.getText());
        }
        for (Node n : table.lookupAll(".table-cell")) {
            if (n instanceof TableCell<?, ?> cell && cell.getText() != null && !cell.getText().isEmpty()) {
                assertNotNull(cell.getTooltip(), cell.getText());
                assertEquals(cell.getText(), cell.getTooltip().getText());
            }
        }
    }

    /** Plates and channels have no rows here: with them alone the table steps aside for theirs, never "solving" for good. */
    @Test
    void aSceneOfPlatesAloneLeavesTheWireTableToTheirOwn() throws Exception {
        Conductor.Plate plate = new Conductor.Plate("plate", Body.FIXED, List.of(new Vec2(-0.02, -0.01),
                new Vec2(0.02, -0.01), new Vec2(0.02, 0.01), new Vec2(-0.02, 0.01)), List.of(), 0.002,
                new org.kinduct.scene.Conductivity.OfMaterial(org.kinduct.scene.Material.ALUMINIUM, 20), List.of(),
                List.of(), java.util.OptionalDouble.empty());
        Platform.runLater(() -> vm.load(new Scene("plate", "", List.of(), List.of(), List.of(plate),
                new TimeSpan(0, 0.01, 0.01)), null, false));
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> vm.scene().conductor("plate").isPresent()
                && vm.results().snapshot() != null);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(table.getItems().isEmpty());
        assertFalse(table.isVisible(), "the plate's own table shows its figures");
    }
}
