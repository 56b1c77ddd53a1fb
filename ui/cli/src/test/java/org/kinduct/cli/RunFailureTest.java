package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.cli.CliRun.Result;

/**
 * A scene that loads but cannot be run as asked gets exit code 1 and a message naming the scene
 * and the reason, from {@code solve}, {@code solve --at} and {@code export} alike; never an
 * internal error with a stack trace.
 */
class RunFailureTest {

    /**
     * A 1 g frame of 1000 turns of 2 mm wire (about 15 Ω) half in a 100 T patch, held by a spring
     * that pulls it in: taken quasi-statically its magnetic damping (N·B·w)²/(R·m) is about 7e9 /s,
     * and the spring keeps it creeping, so an explicit integrator must keep its steps below a
     * nanosecond: about a billion for the window.
     */
    private static final String STIFF = """
            {"format": "kinduct-scene", "version": 1, "name": "stiff brake",
             "time": {"t0": 0, "t1": "1 s", "dt": "1 ms"},
             "bodies": [{"id": "frame", "motion": {"kind": "free", "mass": "1 g",
               "springs": [{"anchor": ["1 m", 0], "stiffness": "10 N/m"}]}}],
             "sources": [{"kind": "field-patch", "id": "gap", "bz": "100 T",
               "outline": [[0.05, -1], [10, -1], [10, 1], [0.05, 1]]}],
             "conductors": [{"kind": "loop", "id": "coil", "body": "frame",
               "vertices": [[0, -0.05], [0.1, -0.05], [0.1, 0.05], [0, 0.05]],
               "turns": 1000, "wire": {"diameter": "2 mm"}, "load": "1 ohm"}]}
            """;

    @TempDir
    Path dir;

    @Test
    void aRunTooStiffToIntegrateIsReportedWithTheSceneAndTheReason() throws IOException {
        Path scene = Files.writeString(dir.resolve("stiff.json"), STIFF);
        Path out = dir.resolve("out.json");

        Result r = CliRun.run("solve", scene.toString(), "--circuit", "quasi-static", "--out", out.toString());

        assertEquals(KinductMain.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().startsWith("kinduct: " + scene + ": the coupled run would take about"), r.err());
        assertTrue(r.err().contains("integrator steps (at most 1001000 are taken here"), r.err());
        assertFalse(r.err().contains("internal error"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void anInstantBeforeTheStartIsABadInputForSolveAtAndExport() throws IOException {
        Result solve = CliRun.run("solve", "--demo", "frame-brake", "--at", "-1 s");
        Result export = CliRun.run("export", "--demo", "frame-brake", "--at", "-1 s", "--json",
                dir.resolve("r.json").toString());

        for (Result r : new Result[] {solve, export}) {
            assertEquals(KinductMain.BAD_INPUT, r.code(), r.err());
            assertTrue(r.err().contains("t = -1.0 s lies before the run's start, t0 = 0.0 s"), r.err());
            assertFalse(r.err().contains("internal error"), r.err());
        }
    }
}
