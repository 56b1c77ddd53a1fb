package org.kinduct.cli;

import java.io.IOException;
import java.nio.file.Path;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.io.SceneFormatException;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The scene a headless command works on: a file, or a demo by name. */
final class SceneInput {

    @ArgGroup(exclusive = true, multiplicity = "1")
    Choice choice;

    static final class Choice {
        @Parameters(paramLabel = "SCENE.json", description = "Scene file.")
        Path file;

        @Option(names = "--demo", paramLabel = "NAME", description = "Use a demo scene instead of a file.")
        String demo;
    }

    /** What to call the scene in messages: the file as given, or the demo. */
    String name() {
        return choice.file != null ? choice.file.toString() : "demo " + choice.demo;
    }

    /** The scene file, or null for a demo. */
    Path file() {
        return choice.file;
    }

    Scene load() {
        if (choice.demo != null) {
            if (Demos.resource(choice.demo).isEmpty()) {
                throw new BadInputException("no demo named '" + choice.demo + "'; known demos: "
                        + String.join(", ", Demos.names()));
            }
            return Demos.load(choice.demo);
        }
        try {
            return SceneFiles.read(choice.file);
        } catch (SceneFormatException e) {
            throw new BadInputException(e.getMessage());
        } catch (IOException e) {
            throw new BadInputException("cannot read " + choice.file + ": " + e.getMessage());
        }
    }
}
