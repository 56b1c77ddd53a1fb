package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Data flows one way (scene → solver → ui): the model and the solver must not import JavaFX or
 * any higher layer, so the headless command line and the solver stay free of the UI toolkit.
 */
class LayeringTest {

    private static final Path SCENE_SOURCES = Path.of("../scene/src/main/java");
    private static final Path SOLVER_SOURCES = Path.of("src/main/java");

    @Test
    void sceneImportsNeitherSolverNorUi() throws IOException {
        assertEquals(List.of(), offending(SCENE_SOURCES, "import javafx.", "import org.kinduct.solver.",
                "import org.kinduct.ui.", "import org.kinduct.cli."));
    }

    @Test
    void solverImportsNoUi() throws IOException {
        assertEquals(List.of(), offending(SOLVER_SOURCES, "import javafx.", "import org.kinduct.ui.",
                "import org.kinduct.cli.", "import java.awt."));
    }

    private static List<String> offending(Path root, String... forbidden) throws IOException {
        assertTrue(Files.isDirectory(root), "source folder not found: " + root.toAbsolutePath());
        try (Stream<Path> files = Files.walk(root)) {
            return files.filter(p -> p.toString().endsWith(".java"))
                    .flatMap(p -> lines(p).stream()
                            .filter(line -> Stream.of(forbidden).anyMatch(line.strip()::startsWith))
                            .map(line -> root.relativize(p) + ": " + line.strip()))
                    .collect(Collectors.toList());
        }
    }

    private static List<String> lines(Path p) {
        try {
            return Files.readAllLines(p);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
