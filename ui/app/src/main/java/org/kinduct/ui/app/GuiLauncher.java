package org.kinduct.ui.app;

import java.nio.file.Path;
import java.util.logging.Level;
import java.util.logging.Logger;
import javafx.application.Application;
import org.kinduct.cli.EditorLauncher;

/**
 * Starts the editor from a plain main (the command line), optionally with a file or a demo scene
 * open; the command line finds it as its {@link EditorLauncher} service.
 */
public final class GuiLauncher implements EditorLauncher {

    /**
     * JavaFX's own logger, kept reachable: Kinduct ships JavaFX on the class path inside one jar,
     * which JavaFX warns about at every start ("Unsupported JavaFX configuration"); the all-in-one
     * jar is how Kinduct is meant to run, so only JavaFX's errors are shown.
     */
    private static final Logger JAVAFX_LOG = Logger.getLogger("javafx");

    private static volatile Path initialFile;
    private static volatile String initialDemo;

    @Override
    public void open(Path sceneFileOrNull, String demoResourceOrNull) {
        launch(sceneFileOrNull, demoResourceOrNull);
    }

    /**
     * Launches the JavaFX editor and returns when its window closes.
     *
     * @param sceneFileOrNull a scene file to open, or null
     * @param demoResourceOrNull a class-path resource such as {@code /org/kinduct/demo/x.json}, or null
     */
    public static void launch(Path sceneFileOrNull, String demoResourceOrNull) {
        initialFile = sceneFileOrNull;
        initialDemo = demoResourceOrNull;
        JAVAFX_LOG.setLevel(Level.SEVERE);
        ShippedFonts.use();
        Application.launch(KinductApp.class);
    }

    static Path initialFile() {
        return initialFile;
    }

    static String initialDemo() {
        return initialDemo;
    }
}
