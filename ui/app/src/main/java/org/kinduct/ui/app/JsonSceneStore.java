package org.kinduct.ui.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.io.SceneFolder;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;

/** Scene files in Kinduct's JSON format, through {@link SceneFiles} (atomic save). */
final class JsonSceneStore implements SceneStore {

    @Override
    public Scene read(Path file) throws LoadFailure {
        try {
            return SceneFiles.read(file);
        } catch (SceneFormatException e) {
            throw new LoadFailure(e.getMessage(), e);
        } catch (IOException e) {
            throw new LoadFailure("Cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    @Override
    public Scene readResource(String resource) throws LoadFailure {
        try (InputStream in = JsonSceneStore.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new LoadFailure("No demo scene " + resource + " on the class path", null);
            }
            return SceneJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8), resource,
                    SceneFolder.ofResource(JsonSceneStore.class, resource));
        } catch (SceneFormatException e) {
            throw new LoadFailure(e.getMessage(), e);
        } catch (IOException e) {
            throw new LoadFailure("Cannot read " + resource + ": " + e.getMessage(), e);
        }
    }

    @Override
    public void write(Scene scene, Path file) throws LoadFailure {
        try {
            SceneFiles.write(scene, file);
        } catch (IOException e) {
            throw new LoadFailure("Cannot write " + file + ": " + e.getMessage(), e);
        }
    }
}
