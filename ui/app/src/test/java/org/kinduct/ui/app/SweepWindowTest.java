package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.image.ImageView;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.kinduct.demo.Demos;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.ui.edit.EditorViewModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Vary a value in the editor: the rail sled's gap field over three values, the points and the
 * plot arriving while the UI stays free, and a point loaded back into the editor as one edit.
 */
@ExtendWith(ApplicationExtension.class)
class SweepWindowTest {

    private Stage stage;
    private EditorViewModel vm;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        vm = new EditorViewModel(Demos.load("rail-sled"), Runnable::run, Runnable::run);
        stage.setScene(new javafx.scene.Scene(new javafx.scene.layout.Pane(), 400, 300));
        stage.show();
    }

    @Test
    void aSweptPointLoadsIntoTheEditorAndUndoes(FxRobot robot) throws Exception {
        Platform.runLater(() -> SweepWindow.show(stage, vm, "gap"));
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#sweep-range").tryQuery().isPresent());
        @SuppressWarnings("unchecked")
        ComboBox<String> path = robot.lookup("#sweep-path").queryAs(ComboBox.class);
        TextField range = robot.lookup("#sweep-range").queryAs(TextField.class);
        WaitForAsyncUtils.asyncFx(() -> {
            path.setValue("gap.bz");
            range.setText("0.25 T..0.75 T:3");
        }).get(10, TimeUnit.SECONDS);
        Button run = robot.lookup("#sweep-run").queryAs(Button.class);
        WaitForAsyncUtils.asyncFx(run::fire).get(10, TimeUnit.SECONDS);

        ListView<?> points = robot.lookup("#sweep-points").queryAs(ListView.class);
        Label status = robot.lookup("#sweep-status").queryAs(Label.class);
        try {
            WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> points.getItems().size() == 3);
        } catch (java.util.concurrent.TimeoutException e) {
            fail("the points did not arrive; the window says: " + status.getText());
        }
        // B·L·v with rails 20 mm apart at 0.5 m/s (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, eq. 7.13).
        assertEquals("gap.bz = 750 mT   →   peak_emf:rail-circuit = 7.50 mV", points.getItems().get(2));
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS,
                () -> robot.lookup(n -> n instanceof ImageView v && v.getImage() != null).tryQuery().isPresent());

        WaitForAsyncUtils.asyncFx(() -> points.getSelectionModel().select(2)).get(10, TimeUnit.SECONDS);
        javafx.scene.Scene window = points.getScene();
        javafx.scene.image.WritableImage shot = WaitForAsyncUtils.asyncFx(() -> window.snapshot(null))
                .get(10, TimeUnit.SECONDS);
        javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(shot, null), "png",
                java.nio.file.Path.of("target", "sweep-window.png").toFile());
        Button load = robot.lookup("#sweep-load").queryAs(Button.class);
        WaitForAsyncUtils.asyncFx(load::fire).get(10, TimeUnit.SECONDS);
        assertEquals(0.75, SceneValues.of(vm.scene()).read("gap.bz"), 1e-15);
        WaitForAsyncUtils.asyncFx(() -> vm.document().undo()).get(10, TimeUnit.SECONDS);
        assertEquals(0.5, SceneValues.of(vm.scene()).read("gap.bz"), 1e-15);
    }
}
