package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.DialogPane;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.kinduct.scene.Source;
import org.kinduct.ui.edit.EditorViewModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Edit ▸ Earth's field…: the preview follows the entries, Add puts the field in the scene as one
 * undoable edit. Expected B_z from X = F·cos I·cos D, Z = F·sin I (the standard geomagnetic element
 * relations; Campbell, Introduction to Geomagnetic Fields, 2nd ed., 2003, §1.2; from memory).
 */
@ExtendWith(ApplicationExtension.class)
class EarthFieldDialogTest {

    private Stage stage;
    private EditorViewModel vm;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        vm = new EditorViewModel(org.kinduct.demo.Demos.load("drive-sense-wire"), Runnable::run, Runnable::run);
        stage.setScene(new javafx.scene.Scene(new javafx.scene.layout.Pane(), 400, 300));
        stage.show();
    }

    @Test
    void previewFollowsTheEntriesAndAddIsUndoable(FxRobot robot) throws Exception {
        int before = vm.scene().sources().size();
        Platform.runLater(() -> EarthFieldDialog.show(stage, vm.document()));
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#earth-dialog").tryQuery().isPresent());
        List<String> typed = List.of("50 uT", "60 deg", "0 deg", "30 deg", "90 deg");
        WaitForAsyncUtils.asyncFx(() -> {
            for (int i = 0; i < typed.size(); i++) {
                robot.lookup("#earth-" + i).queryAs(TextField.class).setText(typed.get(i));
            }
        }).get(10, TimeUnit.SECONDS);
        // Heading 90° (+x east), north edge raised 30°: the normal points against the field, B_z = −F.
        assertEquals("B_z normal to the board: −50.0 µT (+ out of the screen)",
                robot.lookup("#earth-preview").queryAs(Label.class).getText());

        DialogPane pane = robot.lookup("#earth-dialog").queryAs(DialogPane.class);
        ButtonType add = pane.getButtonTypes().stream()
                .filter(b -> b.getButtonData() == ButtonBar.ButtonData.OK_DONE).findFirst().orElseThrow();
        WaitForAsyncUtils.asyncFx(() -> ((Button) pane.lookupButton(add)).fire()).get(10, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> vm.scene().sources().size() == before + 1);

        Source.UniformField earth = (Source.UniformField) vm.scene().source("earth").orElseThrow();
        assertEquals(-50e-6, earth.bzT(), 1e-12 * 50e-6);
        assertTrue(earth.earth().isPresent());
        WaitForAsyncUtils.asyncFx(() -> vm.document().undo()).get(10, TimeUnit.SECONDS);
        assertFalse(vm.scene().source("earth").isPresent(), "one undo removes it");
    }
}
