package org.kinduct.ui.app;

import java.nio.file.Path;
import org.kinduct.scene.Scene;

/** Scene files in Kinduct's JSON format. */
final class JsonSceneStore implements SceneStore {

    @Override
    public Scene read(Path file) throws LoadFailure {
        throw new LoadFailure("reading scene files is not part of this build yet", null);
    }

    @Override
    public Scene readResource(String resource) throws LoadFailure {
        throw new LoadFailure("reading scene files is not part of this build yet", null);
    }

    @Override
    public void write(Scene scene, Path file) throws LoadFailure {
        throw new LoadFailure("writing scene files is not part of this build yet", null);
    }
}
