package org.kinduct.ui.app;

import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.EditorViewModel;

/** The JavaFX editor application. */
public final class KinductApp extends Application {

    static final double WIDTH = 1280;
    static final double HEIGHT = 800;

    private ExecutorService work;
    private EditorWindow window;

    @Override
    public void start(Stage stage) {
        work = Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "kinduct-worker");
            t.setDaemon(true);
            return t;
        });
        EditorViewModel vm = new EditorViewModel(Scene.empty("untitled"), work, Platform::runLater);
        window = new EditorWindow(stage, vm, new JsonSceneStore(), AppHome.standard());
        Thread.setDefaultUncaughtExceptionHandler((thread, e) -> {
            e.printStackTrace();
            Platform.runLater(() -> {
                window.autosave();
                vm.say("Internal error (" + e + "); your scene is kept and autosaved. Please save and report it.");
            });
        });
        javafx.scene.Scene fx = new javafx.scene.Scene(window.root(), WIDTH, HEIGHT);
        stage.setScene(fx);
        stage.setOnCloseRequest(e -> {
            if (!window.confirmDiscard()) {
                e.consume();
            }
        });
        stage.show();
        Path file = GuiLauncher.initialFile();
        String demo = GuiLauncher.initialDemo();
        if (file != null) {
            window.open(file);
        } else if (demo != null) {
            window.openDemo(demo);
        } else {
            window.offerRecovery();
        }
        window.canvas().zoomToFit();
        window.canvas().requestFocus();
    }

    @Override
    public void stop() {
        if (window != null) {
            window.clearAutosave();
        }
        if (work != null) {
            work.shutdownNow();
        }
    }
}
