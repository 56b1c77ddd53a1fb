package org.kinduct.ui.app;

import java.nio.file.Path;
import org.kinduct.scene.io.SceneWithUnits;

/**
 * Reading and writing scene files for the editor, each scene with the units its file gave values
 * in (so saving keeps them); failures carry a message fit to show the user.
 */
interface SceneStore {

    SceneWithUnits read(Path file) throws LoadFailure;

    /** A scene shipped as a class-path resource (a demo). */
    SceneWithUnits readResource(String resource) throws LoadFailure;

    void write(SceneWithUnits scene, Path file) throws LoadFailure;

    /** Why a file could not be read or written; the message names the file and the places at fault. */
    final class LoadFailure extends Exception {
        LoadFailure(String message, Throwable cause) {
            super(message, cause);
        }
    }
}
