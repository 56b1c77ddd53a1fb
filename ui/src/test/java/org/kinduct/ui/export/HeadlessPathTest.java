package org.kinduct.ui.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The command-line export must run without a display, so nothing on its path may refer to
 * JavaFX: checked in the compiled classes' constant pools, where every referenced class is named.
 */
class HeadlessPathTest {

    /** Packages the export reaches, and classes of other packages it uses. */
    private static final List<String> HEADLESS = List.of("org/kinduct/ui/export", "org/kinduct/ui/paint",
            "org/kinduct/ui/view", "org/kinduct/ui/field", "org/kinduct/ui/edit/SceneBounds.class",
            "org/kinduct/ui/edit/SceneEdits.class", "org/kinduct/cli/ExportCommand.class",
            "org/kinduct/report");
    /** The GUI's export dialog lives in the export package but runs only inside the editor. */
    private static final String GUI_ONLY = "ExportDialog";

    @Test
    void exportPathRefersToNoJavaFxClass() throws IOException, URISyntaxException {
        Path classes = Path.of(Exporter.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        List<String> offenders = new ArrayList<>();
        int checked = 0;
        for (String entry : HEADLESS) {
            try (Stream<Path> files = Files.walk(classes.resolve(entry))) {
                for (Path f : files.filter(p -> p.toString().endsWith(".class")).toList()) {
                    if (f.getFileName().toString().startsWith(GUI_ONLY)) {
                        continue;
                    }
                    checked++;
                    if (new String(Files.readAllBytes(f), StandardCharsets.ISO_8859_1).contains("javafx/")) {
                        offenders.add(classes.relativize(f).toString());
                    }
                }
            }
        }
        assertTrue(checked > 20, "found the compiled classes (" + checked + ")");
        assertEquals(List.of(), offenders, "classes on the headless export path that refer to JavaFX");
    }
}
