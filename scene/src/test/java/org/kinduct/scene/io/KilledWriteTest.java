package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A writer killed at random moments (SIGKILL: no clean-up runs) leaves the target either as it
 * was or as one complete new content, never a mix; the temporary file a kill leaves behind is
 * removed by the next write to the same target. {@code -Dkinduct.kills=N} sets the number of
 * kills.
 */
class KilledWriteTest {

    private static final int KILLS = Integer.getInteger("kinduct.kills", 8);
    private static final long SEED = 0x4b11_0001L;
    /** Longest wait for a writer's first save, seconds. */
    private static final long START_S = 60;

    @TempDir
    Path dir;

    @Test
    void killedWritersLeaveCompleteFilesAndTheNextWriteRemovesTheirTemporaries() throws Exception {
        Path target = dir.resolve("results.json");
        SplittableRandom r = new SplittableRandom(SEED);
        int leftBehind = 0;
        int removed = 0;
        int complete = 0;
        List<String> before = List.of();
        for (int kill = 0; kill < KILLS; kill++) {
            Process writer = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-cp", System.getProperty("java.class.path"), AtomicWriteLoop.class.getName(), target.toString())
                    .redirectError(ProcessBuilder.Redirect.INHERIT).start();
            BufferedReader out = new BufferedReader(new InputStreamReader(writer.getInputStream(),
                    StandardCharsets.US_ASCII));
            String first = out.readLine();
            assertTrue(first != null && first.startsWith("wrote"), "the writer did not start: " + first);
            // Its first save has swept the temporaries earlier kills left.
            List<String> still = temporaries();
            still.retainAll(before);
            assertEquals(List.of(), still, "temporary files of killed writes survived the next write");
            removed += before.size();
            Thread.sleep(r.nextInt(300));
            writer.destroyForcibly().waitFor();
            complete += AtomicWriteLoop.complete(Files.readAllBytes(target)) ? 1 : 0;
            before = temporaries();
            leftBehind += before.size();
        }
        SceneFiles.writeAtomically(target, AtomicWriteLoop.content(-1));
        removed += before.size();
        assertEquals(List.of(), temporaries(), "the last kill's temporary file survived a write");
        System.out.printf("killed writes: %d kills, %d of %d targets complete, %d temporary files left behind,"
                + " %d removed by the next write%n", KILLS, complete, KILLS, leftBehind, removed);
        assertEquals(KILLS, complete, "a kill left an incomplete target");
    }

    private List<String> temporaries() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return new java.util.ArrayList<>(files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".tmp"))
                    .toList());
        }
    }
}
