package org.kinduct.ui.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.io.SceneFolder;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.scene.io.SceneWithUnits;

/** Scene files in Kinduct's JSON format, through {@link SceneFiles} (atomic save). */
final class JsonSceneStore implements SceneStore {

    @Override
    public SceneWithUnits read(Path file) throws LoadFailure {
        try {
            return SceneFiles.readWithUnits(file);
        } catch (SceneFormatException e) {
            throw new LoadFailure(e.getMessage(), e);
        } catch (IOException e) {
            throw new LoadFailure("Cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    @Override
    public SceneWithUnits readResource(String resource) throws LoadFailure {
        try (InputStream in = JsonSceneStore.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new LoadFailure("No demo scene " + resource + " on the class path", null);
            }
            return SceneJson.readWithUnits(new String(in.readAllBytes(), StandardCharsets.UTF_8), resource,
                    SceneFolder.ofResource(JsonSceneStore.class, resource));
        } catch (SceneFormatException e) {
            throw new LoadFailure(e.getMessage(), e);
        } catch (IOException e) {
            throw new LoadFailure("Cannot read " + resource + ": " + e.getMessage(), e);
        }
    }

    @Override
    public void write(SceneWithUnits scene, Path file) throws LoadFailure {
        try {
            SceneFiles.write(scene, file);
        } catch (IOException e) {
            throw new LoadFailure("Cannot write " + file + ": " + e.getMessage(), e);
        }
    }
}
