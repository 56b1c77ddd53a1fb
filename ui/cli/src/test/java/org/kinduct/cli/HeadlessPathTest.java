package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line must run without a display and without JavaFX. Maven's enforcer keeps JavaFX
 * out of this module's dependencies; these checks look at what actually ends up on the class
 * path: no JavaFX jar, no Kinduct class that names a JavaFX class (every class a class file
 * refers to is named in its constant pool), and an export run in a JVM started with that path.
 */
class HeadlessPathTest {

    @TempDir
    Path dir;

    private static List<String> classPath() {
        String full = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        return List.of(full.split(File.pathSeparator));
    }

    @Test
    void noJavaFxJarIsOnTheCommandLinesClassPath() {
        List<String> javafx = classPath().stream().filter(e -> e.contains("openjfx") || e.contains("javafx")).toList();
        assertEquals(List.of(), javafx);
    }

    @Test
    void noKinductClassOnTheClassPathRefersToJavaFx() throws IOException {
        List<String> offenders = new ArrayList<>();
        int checked = 0;
        for (String entry : classPath()) {
            Path p = Path.of(entry);
            if (entry.endsWith("test-classes") || !p.getFileName().toString().startsWith("kinduct-") && !entry.endsWith("classes")) {
                continue;
            }
            for (ClassBytes c : classesIn(p)) {
                checked++;
                if (new String(c.bytes(), StandardCharsets.ISO_8859_1).contains("javafx/")) {
                    offenders.add(c.name());
                }
            }
        }
        assertTrue(checked > 150, "found the compiled classes of every module below the editor (" + checked + ")");
        assertEquals(List.of(), offenders, "classes on the command line's path that refer to JavaFX");
    }

    /** Runs {@code kinduct export} in a fresh JVM with this module's class path. */
    @Test
    void commandLineExportRunsInAJvmWithoutJavaFx() throws Exception {
        Path png = dir.resolve("headless.png");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true", "-cp", String.join(File.pathSeparator, classPath()),
                "org.kinduct.cli.KinductMain", "export", "--demo", "rail-sled", "--at", "80 ms", "--width", "400",
                "--png", png.toString()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "export finished");
        assertEquals(0, p.exitValue(), out);
        assertTrue(Files.size(png) > 0, "PNG written");
    }

    private record ClassBytes(String name, byte[] bytes) {
    }

    private static List<ClassBytes> classesIn(Path entry) throws IOException {
        List<ClassBytes> out = new ArrayList<>();
        if (Files.isDirectory(entry)) {
            try (Stream<Path> files = Files.walk(entry)) {
                for (Path f : files.filter(f -> f.toString().endsWith(".class")).toList()) {
                    out.add(new ClassBytes(entry.relativize(f).toString(), Files.readAllBytes(f)));
                }
            }
        } else if (Files.isRegularFile(entry)) {
            try (JarFile jar = new JarFile(entry.toFile())) {
                for (JarEntry e : jar.stream().filter(e -> e.getName().endsWith(".class")).toList()) {
                    try (InputStream in = jar.getInputStream(e)) {
                        out.add(new ClassBytes(e.getName(), in.readAllBytes()));
                    }
                }
            }
        }
        return out;
    }
}
