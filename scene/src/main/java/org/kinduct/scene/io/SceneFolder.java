package org.kinduct.scene.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/**
 * Where the files a scene names (field maps) are found: beside a scene file on disk, beside a
 * scene shipped as a class-path resource, or nowhere for a scene read from text alone.
 */
public interface SceneFolder {

    /** Opens {@code relative}, a file name as the scene writes it (relative to the scene's folder). */
    InputStream open(String relative) throws IOException;

    /** How messages name {@code relative}: its full path or resource name. */
    String describe(String relative);

    /** No folder: a scene read from text alone cannot name other files. */
    SceneFolder NONE = new SceneFolder() {
        @Override
        public InputStream open(String relative) throws IOException {
            throw new IOException("this scene was not read from a file, so '" + relative
                    + "' has no folder to be found in; save the scene beside it and open it from there");
        }

        @Override
        public String describe(String relative) {
            return relative;
        }
    };

    /** Files in the folder {@code folder}; a name may also be absolute. */
    static SceneFolder of(Path folder) {
        return new SceneFolder() {
            @Override
            public InputStream open(String relative) throws IOException {
                Path file = folder.resolve(relative);
                if (Files.isDirectory(file)) {
                    throw new IOException(file + " is a folder, not a file");
                }
                try {
                    return Files.newInputStream(file);
                } catch (NoSuchFileException e) {
                    throw new NoSuchFileException(file.toString(), null, "no such file");
                }
            }

            @Override
            public String describe(String relative) {
                return folder.resolve(relative).toString();
            }
        };
    }

    /** The folder of a scene file (the working folder for a bare file name). */
    static SceneFolder ofSceneFile(Path sceneFile) {
        Path parent = sceneFile.toAbsolutePath().getParent();
        return of(parent == null ? Path.of("") : parent);
    }

    /**
     * Class-path resources beside the scene resource {@code sceneResource} (an absolute resource
     * name such as {@code /org/kinduct/demo/pickup.json}), found through {@code anchor}'s loader.
     */
    static SceneFolder ofResource(Class<?> anchor, String sceneResource) {
        String folder = sceneResource.substring(0, sceneResource.lastIndexOf('/') + 1);
        return new SceneFolder() {
            @Override
            public InputStream open(String relative) throws IOException {
                InputStream in = anchor.getResourceAsStream(folder + relative);
                if (in == null) {
                    throw new NoSuchFileException(folder + relative, null, "no such resource on the class path");
                }
                return in;
            }

            @Override
            public String describe(String relative) {
                return folder + relative;
            }
        };
    }
}
