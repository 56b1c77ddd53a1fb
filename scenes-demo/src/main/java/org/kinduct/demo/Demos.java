package org.kinduct.demo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFolder;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;

/**
 * The demo scenes shipped with Kinduct, as JSON resources under {@code /org/kinduct/demo/}.
 * The first one is what Kinduct opens when started without a file.
 */
public final class Demos {

    /** Demo names in the order they are listed; the file is {@code NAME.json}. */
    private static final List<String> NAMES = List.of(
            "carriage-pickup",
            "pcb-harvester",
            "frame-brake",
            "flow-electrodes",
            "plate-brake",
            "fin-brake",
            "disc-spin-down",
            "gradiometer",
            "spinning-coil-generator",
            "rail-sled",
            "drive-sense-wire",
            "scanned-head",
            "earth-rail-loop");

    private Demos() {
    }

    public static List<String> names() {
        return NAMES;
    }

    public static String defaultName() {
        return NAMES.get(0);
    }

    /** Classpath resource path of demo {@code name}, if there is such a demo. */
    public static Optional<String> resource(String name) {
        return NAMES.contains(name) ? Optional.of("/org/kinduct/demo/" + name + ".json") : Optional.empty();
    }

    /** Loads a demo; the demo files are part of the build, so a failure here is a packaging bug. */
    public static Scene load(String name) {
        String path = resource(name).orElseThrow(() -> new IllegalArgumentException(
                "no demo named '" + name + "'; known demos: " + String.join(", ", NAMES)));
        try (InputStream in = Demos.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("demo resource missing from the build: " + path);
            }
            return SceneJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8), name + ".json",
                    SceneFolder.ofResource(Demos.class, path));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read demo " + path, e);
        } catch (SceneFormatException e) {
            throw new IllegalStateException("demo " + path + " is not a valid scene: " + e.getMessage(), e);
        }
    }
}
