package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code kinduct export --json} writes the very document {@code kinduct solve --format json} prints. */
class ExportJsonTest {

    @TempDir
    Path dir;

    @Test
    void resultsJsonIsTheSameDocumentAsTheSolveCommand() throws IOException {
        Path fromSolve = dir.resolve("solve.json");
        Path fromExport = dir.resolve("export.json");
        assertEquals(KinductMain.OK, KinductMain.run("solve", "--demo", "pcb-harvester", "--format", "json",
                "--out", fromSolve.toString()));
        assertEquals(KinductMain.OK, KinductMain.run("export", "--demo", "pcb-harvester", "--json",
                fromExport.toString()));

        assertEquals(Files.readString(fromSolve), Files.readString(fromExport));
    }
}
