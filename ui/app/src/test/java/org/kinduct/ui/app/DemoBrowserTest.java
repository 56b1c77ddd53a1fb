package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.DemoBrowserModel;
import org.kinduct.ui.edit.EditorViewModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** File ▸ Open demo… in the real window: pick a demo, see it loaded and its description shown. */
@ExtendWith(ApplicationExtension.class)
class DemoBrowserTest {

    private static final String PICK = "rail-sled";

    @TempDir
    static Path home;

    private EditorViewModel vm;

    @Start
    void start(Stage stage) {
        vm = new EditorViewModel(Scene.empty("test"), Runnable::run, Platform::runLater);
        EditorWindow window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), Runnable::run);
        stage.setScene(new javafx.scene.Scene(window.root(), 1100, 760));
        stage.show();
    }

    @Test
    @SuppressWarnings("unchecked")
    void pickingADemoInTheBrowserLoadsItAndShowsItsDescription(FxRobot robot) throws Exception {
        robot.clickOn("File").clickOn("Open demo…");
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#demo-list").tryQuery().isPresent());
        ListView<DemoBrowserModel.Entry> list = robot.lookup("#demo-list").queryAs(ListView.class);
        int index = Demos.names().indexOf(PICK);
        robot.interact(() -> {
            list.getSelectionModel().select(index);
            list.scrollTo(index);
        });
        robot.clickOn("Open");
        WaitForAsyncUtils.waitForFxEvents();
        Scene expected = Demos.load(PICK);
        assertEquals(expected.name(), vm.scene().name());
        assertEquals(expected.conductors(), vm.scene().conductors());
        Label description = robot.lookup("#scene-description").queryAs(Label.class);
        assertEquals(expected.description(), description.getText());
        assertTrue(description.isVisible() && robot.lookup("#description-strip").query().isVisible());
    }
}
