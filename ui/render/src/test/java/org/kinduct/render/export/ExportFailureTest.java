package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Writing where no file can be made fails with a message naming the place, and leaves nothing
 * behind. The folder is a regular file, which stops root too (tests run as root in CI).
 */
class ExportFailureTest {

    @TempDir
    Path dir;

    @Test
    void exportUnderARegularFileFailsClearlyAndLeavesNoFile() throws IOException {
        Path blocker = Files.writeString(dir.resolve("not-a-folder"), "x");
        Path target = blocker.resolve("snapshot.png");
        Exporter export = new Exporter(ExportFixtures.rodInUniformField(),
                ExportFixtures.options(0.05, 600, 96, new ViewChoice.Fit()));

        IOException e = assertThrows(IOException.class,
                () -> export.write(Exporter.Targets.none().withPng(target)));

        assertTrue(e.getMessage().contains("snapshot.png") && e.getMessage().contains("cannot"), e.getMessage());
        assertFalse(Files.exists(target));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(blocker), files.toList(), "no temporary or partial file left");
        }
        assertEquals("x", Files.readString(blocker), "the blocking file is untouched");
    }
}
