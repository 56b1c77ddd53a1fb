package org.kinduct.ui.app;


import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.control.DialogPane;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;
import javafx.scene.control.ComboBox;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.ui.edit.EditorViewModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The export dialog opens with the remembered choices and refuses input it cannot use. */
@ExtendWith(ApplicationExtension.class)
class ExportDialogTest {

    @TempDir
    Path home;

    private Stage stage;
    private EditorViewModel vm;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        vm = new EditorViewModel(org.kinduct.demo.Demos.load("drive-sense-wire"), Runnable::run,
                Runnable::run);
        stage.setScene(new javafx.scene.Scene(new javafx.scene.layout.Pane(), 400, 300));
        stage.show();
    }

    /** Opens the dialog; it shows once the remembered choices are read. */
    private void open(FxRobot robot) throws TimeoutException {
        Platform.runLater(() -> ExportDialog.show(stage, vm, home, Runnable::run));
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#export-dialog").tryQuery().isPresent());
    }

    /**
     * Presses the dialog's Cancel button on the UI thread (a robot click found the button hidden
     * while the dialog's window was still opening on a loaded machine).
     */
    private static void cancel(FxRobot robot) throws Exception {
        DialogPane pane = robot.lookup("#export-dialog").queryAs(DialogPane.class);
        WaitForAsyncUtils.asyncFx(() -> ((javafx.scene.control.Button) pane.lookupButton(
                javafx.scene.control.ButtonType.CANCEL)).fire()).get(10, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#export-dialog").tryQuery().isEmpty()
                || !robot.lookup("#export-dialog").query().getScene().getWindow().isShowing());
    }

    @Test
    void dialogStartsFromTheRememberedChoices(FxRobot robot) throws Exception {
        new ExportPreferences(ExportPreferences.Format.SVG, 2222, 150, true, null).save(home);

        open(robot);

        assertEquals(ExportPreferences.Format.SVG, robot.lookup("#export-format").queryAs(ComboBox.class).getValue());
        assertEquals("2222", robot.lookup("#export-width").queryAs(TextField.class).getText());
        assertEquals("150", robot.lookup("#export-dpi").queryAs(TextField.class).getText());
        DialogPane pane = robot.lookup("#export-dialog").queryAs(DialogPane.class);
        WritableImage shot = WaitForAsyncUtils.asyncFx(() -> pane.snapshot(null, null)).get(10, TimeUnit.SECONDS);
        ImageIO.write(SwingFXUtils.fromFXImage(shot, null), "png", Path.of("target", "export-dialog.png").toFile());
        cancel(robot);
    }

    @Test
    void theTimeIsChosenFromTheCommandLinesChoicesOrTyped(FxRobot robot) throws Exception {
        open(robot);
        ComboBox<?> time = robot.lookup("#export-time").queryAs(ComboBox.class);
        assertTrue(time.isEditable(), "a time may be typed");
        java.util.List<String> offered = time.getItems().stream().map(Object::toString).toList();
        assertTrue(offered.get(0).startsWith("peak"), offered.toString());
        for (org.kinduct.scene.Conductor c : vm.scene().conductors()) {
            assertTrue(offered.contains("peak of " + c.id()), offered.toString());
        }
        assertTrue(offered.get(offered.size() - 1).startsWith("the time shown"), offered.toString());
        cancel(robot);
    }

    @Test
    void invalidWidthKeepsTheDialogOpenAndSaysWhy(FxRobot robot) throws Exception {
        open(robot);
        TextField width = robot.lookup("#export-width").queryAs(TextField.class);
        WaitForAsyncUtils.asyncFx(() -> width.setText("wide")).get(10, TimeUnit.SECONDS);

        robot.clickOn("Export…");
        WaitForAsyncUtils.waitForFxEvents();

        assertTrue(robot.lookup("#export-dialog").tryQuery().isPresent(), "dialog still open");
        assertTrue(vm.statusProperty().get().contains("whole numbers"), vm.statusProperty().get());
        cancel(robot);
    }
}
