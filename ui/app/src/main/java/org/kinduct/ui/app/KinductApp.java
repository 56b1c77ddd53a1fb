package org.kinduct.ui.app;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
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
    private ExecutorService files;

    @Override
    public void start(Stage stage) {
        work = Executors.newFixedThreadPool(2, daemon("kinduct-worker"));
        files = Executors.newSingleThreadExecutor(daemon("kinduct-files"));
        EditorViewModel vm = new EditorViewModel(Scene.empty("untitled"), work, Platform::runLater);
        EditorWindow window = new EditorWindow(stage, vm, new JsonSceneStore(), AppHome.standard(), files);
        Thread.setDefaultUncaughtExceptionHandler((thread, e) -> {
            e.printStackTrace();
            Platform.runLater(() -> {
                window.files().autosave();
                vm.say("Internal error (" + e + "); your scene is kept and autosaved. Please save and report it.");
            });
        });
        stage.setScene(new javafx.scene.Scene(window.root(), WIDTH, HEIGHT));
        // Closing asks about unsaved work first; the window closes itself once that is settled.
        stage.setOnCloseRequest(e -> {
            e.consume();
            window.files().quit(stage::close);
        });
        stage.show();
        vm.zoomToFit();
        var unused = window.files().start(GuiLauncher.initialFile(), GuiLauncher.initialDemo()); // watched by its own chain
        window.canvas().requestFocus();
    }

    private static ThreadFactory daemon(String name) {
        return r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            return t;
        };
    }

    @Override
    public void stop() {
        if (work != null) {
            work.shutdownNow();
        }
        if (files != null) {
            // Lets a write under way (the autosave's release on quitting) finish.
            files.shutdown();
        }
    }
}
