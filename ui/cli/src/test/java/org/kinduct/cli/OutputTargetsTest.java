package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.cli.CliRun.Result;
import org.kinduct.demo.Demos;
import org.kinduct.scene.io.SceneJson;

/**
 * Outputs never replace the scene being read or each other, whatever the spelling of the path;
 * a device or a pipe is written through, never replaced by a regular file.
 */
class OutputTargetsTest {

    private static final long RUN_S = 120;

    @TempDir
    Path dir;

    private Path scene() throws IOException {
        return Files.writeString(dir.resolve("scene.json"), SceneJson.write(Demos.load("drive-sense-wire")));
    }

    @Test
    void outOntoTheInputIsRefusedUnderAnySpelling() throws IOException {
        Path scene = scene();
        byte[] before = Files.readAllBytes(scene);
        Path link = Files.createSymbolicLink(dir.resolve("link.json"), scene);
        Path hard = Files.createLink(dir.resolve("hard.json"), scene);
        Path relative = Path.of("").toAbsolutePath().relativize(scene);
        Path roundabout = dir.resolve("sub").resolve("..").resolve("scene.json");
        for (Path out : new Path[] {scene, link, hard, relative, roundabout}) {
            Result r = CliRun.run("solve", scene.toString(), "--out", out.toString());

            assertEquals(KinductMain.BAD_INPUT, r.code(), out + ": " + r.err());
            assertTrue(r.err().contains("--out " + out + " is the scene file being read (" + scene + ")"), r.err());
            assertArrayEquals(before, Files.readAllBytes(scene), "the scene was changed through " + out);
        }
    }

    @Test
    void exportOutputsNamingOneFileAreRefused() throws IOException {
        Path scene = scene();
        Path picture = dir.resolve("snapshot.png");

        Result r = CliRun.run("export", scene.toString(), "--png", picture.toString(), "--svg",
                dir.resolve(".").resolve("snapshot.png").toString());

        assertEquals(KinductMain.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("--png and --svg name the same file"), r.err());
        assertFalse(Files.exists(picture));
        Result onto = CliRun.run("export", scene.toString(), "--json", scene.toString());
        assertEquals(KinductMain.BAD_INPUT, onto.code(), onto.err());
        assertTrue(onto.err().contains("--json " + scene + " is the scene file being read"), onto.err());
    }

    @Test
    void outToStandardOutputWorksForAPipeAndAppendsToARedirectedFile() throws Exception {
        Path scene = scene();
        Process piped = kinduct("solve", scene.toString(), "--out", "/dev/stdout").start();
        String table = new String(piped.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(piped.waitFor(RUN_S, TimeUnit.SECONDS));
        assertEquals(0, piped.exitValue());
        assertTrue(table.startsWith("Scene: Sense trace in an actuator gap"), table);

        Path log = Files.writeString(dir.resolve("log.txt"), "earlier lines\n");
        Process appended = kinduct("solve", scene.toString(), "--out", "/dev/stdout")
                .redirectOutput(ProcessBuilder.Redirect.appendTo(log.toFile())).start();
        assertTrue(appended.waitFor(RUN_S, TimeUnit.SECONDS));
        assertEquals(0, appended.exitValue());
        assertEquals("earlier lines\n" + table, Files.readString(log), "the log keeps what it held");
        assertTrue(Files.isRegularFile(log));
    }

    @Test
    void outToADeviceKeepsTheDevice() throws Exception {
        Path device = dir.resolve("null");
        assumeTrue(new ProcessBuilder("mknod", device.toString(), "c", "1", "3").start().waitFor() == 0,
                "making device nodes needs the superuser");

        Result r = CliRun.run("solve", scene().toString(), "--out", device.toString());

        assertEquals(KinductMain.OK, r.code(), r.err());
        assertFalse(Files.isRegularFile(device), "the device was replaced by a regular file");
    }

    /** The command in a JVM of its own, so that its standard output is a real one. */
    private static ProcessBuilder kinduct(String... args) {
        String[] command = new String[args.length + 4];
        command[0] = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        command[1] = "-cp";
        command[2] = System.getProperty("java.class.path");
        command[3] = KinductMain.class.getName();
        System.arraycopy(args, 0, command, 4, args.length);
        return new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.INHERIT);
    }
}
