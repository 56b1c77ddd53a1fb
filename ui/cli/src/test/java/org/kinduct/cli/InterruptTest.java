package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ctrl-C (SIGINT) during a long run stops it cleanly: exit status 130, a message, no output file
 * and no temporary file, for quasi-static instants and a coupled run alike.
 */
class InterruptTest {

    /**
     * Time for the command's JVM to start and get well into its run, milliseconds; a 600 s window
     * takes either demo 20 s or more on one core.
     */
    private static final long RUNNING_MS = 6_000;
    private static final long STOP_S = 30;

    @TempDir
    Path dir;

    @ParameterizedTest
    @ValueSource(strings = {"carriage-pickup", "frame-brake"}) // instants; a coupled run (free body)
    void ctrlCStopsALongRunAndWritesNothing(String demo) throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/kill")) || Files.isExecutable(Path.of("/usr/bin/kill")),
                "sending SIGINT needs kill");
        Path out = dir.resolve("results.json");
        Process solve = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), KinductMain.class.getName(), "solve", "--demo", demo,
                "--t1", "600 s", "--format", "json", "--out", out.toString()).start();
        Thread.sleep(RUNNING_MS);
        assertTrue(solve.isAlive(), "the run ended before it could be interrupted");

        assertEquals(0, new ProcessBuilder("kill", "-INT", Long.toString(solve.pid())).start().waitFor());

        assertTrue(solve.waitFor(STOP_S, TimeUnit.SECONDS), "the run did not stop");
        String err = new String(solve.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(KinductMain.INTERRUPTED, solve.exitValue(), err);
        assertTrue(err.contains("kinduct: stopped by Ctrl-C before the run finished; nothing was written"), err);
        assertFalse(Files.exists(out));
        assertEquals(List.of(), names());
    }

    private List<String> names() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).toList();
        }
    }
}
