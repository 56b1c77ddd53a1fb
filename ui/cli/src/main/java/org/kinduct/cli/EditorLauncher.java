package org.kinduct.cli;

import java.nio.file.Path;

/**
 * The editor, as the command line sees it: a service the editor module provides
 * ({@code META-INF/services/org.kinduct.cli.EditorLauncher}), so that this module needs no JavaFX.
 */
public interface EditorLauncher {

    /**
     * Opens the editor and returns when its window closes.
     *
     * @param sceneFileOrNull a scene file to open, or null
     * @param demoResourceOrNull a class-path resource such as {@code /org/kinduct/demo/x.json}, or null
     */
    void open(Path sceneFileOrNull, String demoResourceOrNull);
}
