package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.EditorViewModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real window, started as the launcher starts it (with a demo), finds work a crashed session
 * left and offers it; Recover brings it back, unsaved.
 */
@ExtendWith(ApplicationExtension.class)
class RecoveryOfferTest {

    @TempDir
    static Path home;

    private static final Scene LEFT = Scene.empty("left by a crash").withConductors(List.of(new Conductor.Wire(
            "unsaved", Body.FIXED, List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.03, 0.01)))));

    private EditorViewModel vm;
    private Stage stage;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        AutosaveTest.orphan(home, "crashed", LEFT, null, Instant.now());
        vm = new EditorViewModel(Scene.empty("untitled"), Runnable::run, Platform::runLater);
        EditorWindow window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), Runnable::run);
        stage.setScene(new javafx.scene.Scene(window.root(), 1100, 760));
        stage.show();
        window.files().start(null, Demos.resource("rail-sled").orElseThrow());
    }

    @Test
    void workACrashLeftIsOfferedOnAStartWithADemoAndRecoveredUnsaved(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> robot.lookup("#recovery-offer").tryQuery().isPresent());
        assertEquals(Demos.load("rail-sled").name(), vm.scene().name(), "the demo opened first");

        robot.clickOn("Recover");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> vm.scene().equals(LEFT));

        assertTrue(vm.document().isDirty());
        assertTrue(stage.getTitle().startsWith("• "), stage.getTitle());
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> !Files.exists(home.resolve("autosave-crashed.json")));
        try (var files = Files.list(home)) {
            assertEquals(1, files.filter(f -> f.getFileName().toString().endsWith(".json")).count(),
                    "taken over into the window's own autosave");
        }
    }
}
