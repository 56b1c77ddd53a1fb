package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Scene;
import org.kinduct.scene.WireSpec;

class SceneFilesTest {

    private static final byte[] OLD_CONTENT = "{\"format\": \"kinduct-scene\", \"version\": 1}\n"
            .getBytes(StandardCharsets.UTF_8);

    @TempDir
    Path dir;

    private List<String> namesIn(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
        }
    }

    private boolean posix() throws IOException {
        return Files.getFileStore(dir).supportsFileAttributeView(PosixFileAttributeView.class);
    }

    @Test
    void savedSceneReadsBackEqual() throws IOException, SceneFormatException {
        Scene scene = SampleScenes.withoutFiles();
        Path file = dir.resolve("every.json");

        SceneFiles.write(scene, file);

        assertEquals(scene, SceneFiles.read(file));
        assertEquals(List.of("every.json"), namesIn(dir));
        assertEquals(SceneJson.write(scene), Files.readString(file, StandardCharsets.UTF_8));
    }

    @Test
    void savingOverAFileReplacesItAndKeepsItsPermissions() throws IOException, SceneFormatException {
        assumeTrue(posix(), "POSIX permissions");
        Path file = dir.resolve("scene.json");
        Files.write(file, OLD_CONTENT);
        Set<PosixFilePermission> shared = PosixFilePermissions.fromString("rw-r-----");
        Files.setPosixFilePermissions(file, shared);

        SceneFiles.write(SampleScenes.withoutFiles(), file);

        assertEquals(SampleScenes.withoutFiles(), SceneFiles.read(file));
        assertEquals(shared, Files.getPosixFilePermissions(file));
        assertEquals(List.of("scene.json"), namesIn(dir));
    }

    @Test
    void savingThroughALinkUpdatesTheLinkedFileAndKeepsTheLink() throws IOException, SceneFormatException {
        Path real = Files.createDirectory(dir.resolve("real")).resolve("scene.json");
        Files.write(real, OLD_CONTENT);
        Path link = dir.resolve("link.json");
        try {
            Files.createSymbolicLink(link, real);
        } catch (UnsupportedOperationException | IOException e) {
            assumeTrue(false, "symbolic links not available: " + e);
        }

        SceneFiles.write(SampleScenes.withoutFiles(), link);

        assertTrue(Files.isSymbolicLink(link));
        assertEquals(SampleScenes.withoutFiles(), SceneFiles.read(real));
        assertEquals(List.of("scene.json"), namesIn(real.getParent()));
    }

    @Test
    void failureWhileWritingLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path file = dir.resolve("scene.json");
        Files.write(file, OLD_CONTENT);

        IOException e = assertThrows(IOException.class, () -> SceneFiles.writeAtomically(file, out -> {
            out.write("{\"format\": \"kinduct-sc".getBytes(StandardCharsets.UTF_8));
            throw new IOException("No space left on device");
        }));

        assertEquals("cannot save to " + file.toAbsolutePath() + ": No space left on device; the file was not changed",
                e.getMessage());
        assertArrayEquals(OLD_CONTENT, Files.readAllBytes(file));
        assertEquals(List.of("scene.json"), namesIn(dir));
    }

    @Test
    void savingIntoAnUnwritableFolderFailsClearlyAndChangesNothing() throws IOException {
        assumeTrue(posix(), "POSIX permissions");
        Path folder = Files.createDirectory(dir.resolve("locked"));
        Path file = folder.resolve("scene.json");
        Files.write(file, OLD_CONTENT);
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            assumeFalse(Files.isWritable(folder), "the superuser may write into any folder");

            IOException e = assertThrows(IOException.class, () -> SceneFiles.write(Scene.empty("x"), file));

            assertEquals("cannot save to " + file.toAbsolutePath() + ": cannot create a file in folder "
                    + folder.toAbsolutePath() + " (permission denied)", e.getMessage());
            assertArrayEquals(OLD_CONTENT, Files.readAllBytes(file));
            assertEquals(List.of("scene.json"), namesIn(folder));
        } finally {
            Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void savingIntoAMissingFolderFailsClearly() {
        Path file = dir.resolve("no-such-folder").resolve("scene.json");

        IOException e = assertThrows(IOException.class, () -> SceneFiles.write(Scene.empty("x"), file));

        assertEquals("cannot save to " + file.toAbsolutePath() + ": cannot create a file in folder "
                + file.getParent().toAbsolutePath() + " (the folder does not exist)", e.getMessage());
        assertFalse(Files.exists(file.getParent()));
    }

    @Test
    void savingBelowARegularFileFailsClearly() throws IOException {
        // Works for any user, even one who may write everywhere: a file cannot hold files.
        Path notAFolder = dir.resolve("plain.txt");
        Files.write(notAFolder, OLD_CONTENT);
        Path file = notAFolder.resolve("scene.json");

        IOException e = assertThrows(IOException.class, () -> SceneFiles.write(Scene.empty("x"), file));

        assertTrue(e.getMessage().startsWith("cannot save to " + file.toAbsolutePath()
                + ": cannot create a file in folder " + notAFolder.toAbsolutePath()), e.getMessage());
        assertArrayEquals(OLD_CONTENT, Files.readAllBytes(notAFolder));
        assertEquals(List.of("plain.txt"), namesIn(dir));
    }

    @Test
    void savingOverAFolderIsRefused() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("scene.json"));

        IOException e = assertThrows(IOException.class, () -> SceneFiles.write(Scene.empty("x"), folder));

        assertEquals("cannot save to " + folder.toAbsolutePath() + ": it is a folder", e.getMessage());
        assertTrue(Files.isDirectory(folder));
        assertEquals(List.of("scene.json"), namesIn(dir));
    }

    @Test
    void aSceneTheReaderWouldRefuseIsNotSavedAndTheOldFileStays() throws IOException {
        Path file = dir.resolve("scene.json");
        Files.write(file, OLD_CONTENT);
        // A valid model, but its 1 mm wire has no room along 1 mm sides.
        Scene cramped = Scene.empty("cramped").withConductors(List.of(new Conductor.Loop("tiny", Body.FIXED,
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(1e-3, 0), Conductor.Vertex.at(0, 1e-3)), 1,
                WireSpec.of(Material.COPPER, 1e-3), false, 0, 20)));

        IOException e = assertThrows(IOException.class, () -> SceneFiles.write(cramped, file));

        assertTrue(e.getMessage().startsWith("cannot save to " + file + ": the scene would not open again:\n" + file
                + ":"), e.getMessage());
        assertTrue(e.getMessage().contains("conductors[0]: side 0 is 0.001 m long, shorter than 4.0 wire radii"),
                e.getMessage());
        assertArrayEquals(OLD_CONTENT, Files.readAllBytes(file));
        assertEquals(List.of("scene.json"), namesIn(dir));
    }

    @Test
    void aTemporaryFileLeftByAKilledWriteIsRemovedByTheNextWrite() throws IOException {
        Path file = dir.resolve("scene.json");
        Path abandoned = Files.write(dir.resolve(".scene.json.5eed0fdead.tmp"), "{\"format\": \"kin".getBytes(
                StandardCharsets.UTF_8));
        Path otherTarget = Files.write(dir.resolve(".other.json.5eed0fdead.tmp"), OLD_CONTENT);

        SceneFiles.writeAtomically(file, OLD_CONTENT);

        assertFalse(Files.exists(abandoned));
        assertTrue(Files.exists(otherTarget), "another target's temporary file is not this write's business");
    }

    @Test
    void aTemporaryFileAnotherWriterHoldsIsLeftAlone() throws IOException {
        Path file = dir.resolve("scene.json");
        Path inUse = dir.resolve(".scene.json.0123456789abcdef.tmp");
        try (FileChannel writer = FileChannel.open(inUse, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
             FileLock held = writer.lock()) {
            SceneFiles.writeAtomically(file, OLD_CONTENT);

            assertTrue(held.isValid());
            assertTrue(Files.exists(inUse));
        }
        assertArrayEquals(OLD_CONTENT, Files.readAllBytes(file));
    }

    @Test
    void writingToADeviceWritesThroughItAndKeepsTheDevice() throws IOException, InterruptedException {
        // A device node of our own in the test folder, of the kind /dev/null is (character device 1, 3).
        Path device = dir.resolve("null");
        assumeTrue(run("mknod", device.toString(), "c", "1", "3"), "making device nodes needs the superuser");

        SceneFiles.writeAtomically(device, OLD_CONTENT);

        assertTrue(Files.exists(device));
        assertFalse(Files.isRegularFile(device), "the device was replaced by a regular file");
        assertEquals(0020000, (int) Files.getAttribute(device, "unix:mode") & 0170000, "still a character device");
        assertEquals(List.of("null"), namesIn(dir));
    }

    @Test
    void writingToANamedPipeStreamsThroughIt() throws IOException, InterruptedException, ExecutionException,
            TimeoutException {
        Path pipe = dir.resolve("results.pipe");
        assumeTrue(run("mkfifo", pipe.toString()), "named pipes need mkfifo");
        // A daemon: should the pipe be replaced, its reader would wait for a writer forever.
        ExecutorService reader = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "pipe-reader");
            t.setDaemon(true);
            return t;
        });
        try {
            Future<byte[]> received = reader.submit(() -> Files.readAllBytes(pipe));

            SceneFiles.writeAtomically(pipe, OLD_CONTENT);

            assertArrayEquals(OLD_CONTENT, received.get(10, TimeUnit.SECONDS));
            assertFalse(Files.isRegularFile(pipe), "the pipe was replaced by a regular file");
        } finally {
            reader.shutdownNow();
        }
    }

    /** True when the command ran and succeeded. */
    private static boolean run(String... command) throws InterruptedException {
        try {
            return new ProcessBuilder(command).inheritIO().start().waitFor() == 0;
        } catch (IOException e) {
            return false;
        }
    }

    @Test
    void readingAMissingFileNamesIt() {
        Path file = dir.resolve("missing.json");

        NoSuchFileException e = assertThrows(NoSuchFileException.class, () -> SceneFiles.read(file));

        assertEquals(file + ": no such file", e.getMessage());
    }

    @Test
    void readingAFolderSaysSo() {
        IOException e = assertThrows(IOException.class, () -> SceneFiles.read(dir));

        assertEquals(dir + ": is a folder, not a scene file", e.getMessage());
    }

    @Test
    void readingAnUnreadableFileSaysPermissionDenied() throws IOException {
        assumeTrue(posix(), "POSIX permissions");
        Path file = dir.resolve("secret.json");
        Files.write(file, OLD_CONTENT);
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("---------"));
        assumeFalse(Files.isReadable(file), "the superuser may read any file");

        AccessDeniedException e = assertThrows(AccessDeniedException.class, () -> SceneFiles.read(file));

        assertEquals(file + ": permission denied: cannot read this file", e.getMessage());
    }

    @Test
    void readingAnOversizedFileFailsWithoutLoadingIt() throws IOException {
        Path file = dir.resolve("huge.json");
        try (RandomAccessFile f = new RandomAccessFile(file.toFile(), "rw")) {
            f.setLength(SceneFiles.MAX_BYTES + 1); // sparse: no disk space used
        }

        IOException e = assertThrows(IOException.class, () -> SceneFiles.read(file));

        assertEquals(file + ": too large for a scene file (" + (SceneFiles.MAX_BYTES + 1)
                + " bytes; the limit is " + SceneFiles.MAX_BYTES + ")", e.getMessage());
    }

    @Test
    void invalidUtf8IsAFormatErrorAtTheBadByte() throws IOException {
        Path file = dir.resolve("latin1.json");
        byte[] text = "{\"format\": \"kinduct-scene\",\r\n \"name\": \"Gr\u00fcn\"}".getBytes(StandardCharsets.ISO_8859_1);
        Files.write(file, text);

        SceneFormatException e = assertThrows(SceneFormatException.class, () -> SceneFiles.read(file));

        // "ü" in ISO-8859-1 is the single byte 0xFC, which never occurs in UTF-8 (RFC 3629 §1).
        assertEquals(file + ":2:13: not UTF-8 text: invalid byte 0xfc at byte offset 41", e.getMessage());
    }

    @Test
    void formatErrorsAreReportedAgainstTheFilePath() throws IOException {
        Path file = dir.resolve("bad.json");
        Files.writeString(file, "{\"format\": \"kinduct-scene\", \"version\": 1, \"nmae\": \"x\"}");

        SceneFormatException e = assertThrows(SceneFormatException.class, () -> SceneFiles.read(file));

        assertEquals(file + ":1:43: nmae: unknown field 'nmae' (did you mean 'name'?)", e.getMessage());
    }
}
