package org.kinduct.ui;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The view models may use only JavaFX's observable properties (javafx.beans, javafx.collections),
 * never its scene graph, so they are tested without a toolkit. (The painter, view transform and
 * field maps live in the render module, which Maven keeps free of JavaFX altogether.) Checked on
 * the compiled classes: a reference to a class appears in the class file as its internal name
 * ("javafx/scene/...").
 */
class ViewModelIndependenceTest {

    private static List<Path> classes(String pkg) throws IOException, URISyntaxException {
        // The main classes' directory, not the test classes' (which share package names).
        Path root = Path.of(org.kinduct.ui.edit.EditorViewModel.class.getProtectionDomain().getCodeSource().getLocation()
                .toURI());
        Path dir = root.resolve("org/kinduct/ui/" + pkg);
        try (Stream<Path> files = Files.list(dir)) {
            return files.filter(p -> p.toString().endsWith(".class")).toList();
        }
    }

    private static String text(Path classFile) throws IOException {
        return new String(Files.readAllBytes(classFile), StandardCharsets.ISO_8859_1);
    }

    @ParameterizedTest
    @ValueSource(strings = {"edit"})
    void viewModelsUseOnlyObservableProperties(String pkg) throws Exception {
        for (Path f : classes(pkg)) {
            String t = text(f);
            for (String banned : List.of("javafx/scene/", "javafx/stage/", "javafx/application/")) {
                assertFalse(t.contains(banned), f.getFileName() + " refers to " + banned);
            }
        }
        assertTrue(text(classes(pkg).stream().filter(p -> p.getFileName().toString().equals("EditorViewModel.class"))
                .findFirst().orElseThrow()).contains("javafx/beans/"), "the check can see JavaFX references");
    }
}
