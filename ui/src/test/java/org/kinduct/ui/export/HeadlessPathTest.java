package org.kinduct.ui.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command-line export must run without a display and without JavaFX: it runs in a JVM whose
 * class path has no JavaFX, and nothing on its path refers to JavaFX in the compiled classes'
 * constant pools, where every referenced class is named.
 */
class HeadlessPathTest {

    /** Packages the export reaches, and classes of other packages it uses. */
    private static final List<String> HEADLESS = List.of("org/kinduct/ui/export", "org/kinduct/ui/paint",
            "org/kinduct/ui/view", "org/kinduct/ui/field", "org/kinduct/ui/edit/SceneBounds.class",
            "org/kinduct/ui/edit/SceneEdits.class", "org/kinduct/cli/ExportCommand.class",
            "org/kinduct/report");
    /** The GUI's export dialog lives in the export package but runs only inside the editor. */
    private static final String GUI_ONLY = "ExportDialog";

    @TempDir
    Path dir;

    /** Runs {@code kinduct export} in a fresh JVM whose class path lacks every JavaFX jar. */
    @Test
    void commandLineExportRunsWithoutJavaFxOnTheClassPath() throws Exception {
        String full = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> kept = new ArrayList<>();
        for (String entry : full.split(File.pathSeparator)) {
            if (!entry.contains("openjfx") && !entry.contains("testfx") && !entry.contains("javafx")) {
                kept.add(entry);
            }
        }
        Path png = dir.resolve("headless.png");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true", "-cp", String.join(File.pathSeparator, kept), "org.kinduct.cli.KinductMain",
                "export", "--demo", "rail-sled", "--at", "80 ms", "--width", "400", "--png", png.toString())
                .redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "export finished");
        assertEquals(0, p.exitValue(), out);
        assertTrue(Files.size(png) > 0, "PNG written");
    }

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
