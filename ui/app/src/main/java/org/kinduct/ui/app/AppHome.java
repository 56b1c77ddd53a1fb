package org.kinduct.ui.app;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The editor's own files under {@code ~/.kinduct} (or {@code -Dkinduct.home=DIR}): the
 * windows' autosaves for crash recovery ({@link Autosave}) and the recent-files list. Reads and
 * writes files: call it off the UI thread.
 */
final class AppHome {

    static final int MAX_RECENT = 8;

    private final Path dir;

    AppHome(Path dir) {
        this.dir = dir;
    }

    static AppHome standard() {
        String override = System.getProperty("kinduct.home");
        return new AppHome(override != null ? Path.of(override) : Path.of(System.getProperty("user.home"), ".kinduct"));
    }

    Path dir() {
        return dir;
    }

    List<Path> recent() {
        Path f = dir.resolve("recent.txt");
        List<Path> out = new ArrayList<>();
        if (Files.isReadable(f)) {
            try {
                for (String line : Files.readAllLines(f, StandardCharsets.UTF_8)) {
                    if (!line.isBlank()) {
                        out.add(Path.of(line.strip()));
                    }
                }
            } catch (IOException e) {
                System.err.println("Kinduct: could not read the recent-files list " + f + ": " + e.getMessage());
            }
        }
        return out;
    }

    /** Puts {@code file} first in the recent list (keeping {@link #MAX_RECENT}). */
    List<Path> remember(Path file) {
        List<Path> list = recent();
        Path abs = file.toAbsolutePath().normalize();
        list.remove(abs);
        list.add(0, abs);
        while (list.size() > MAX_RECENT) {
            list.remove(list.size() - 1);
        }
        try {
            Files.createDirectories(dir);
            List<String> lines = new ArrayList<>();
            list.forEach(p -> lines.add(p.toString()));
            Files.write(dir.resolve("recent.txt"), lines, StandardCharsets.UTF_8);
        } catch (IOException e) {
            System.err.println("Kinduct: could not update the recent-files list in " + dir + ": " + e.getMessage());
        }
        return list;
    }
}
