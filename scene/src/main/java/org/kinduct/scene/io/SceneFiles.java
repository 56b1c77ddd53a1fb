package org.kinduct.scene.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryIteratorException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.List;
import java.util.concurrent.ThreadLocalRandom;
import java.util.regex.Pattern;
import org.kinduct.scene.Scene;

/**
 * Scene files on disk: UTF-8 JSON as {@link SceneJson} reads and writes it.
 *
 * <p>Saving is atomic where the file system allows: the text goes to a temporary file in the
 * target's folder ({@code .NAME.<hex>.tmp}), is forced to disk, and is renamed over the target, so
 * a crash or a failed write leaves either the old file or the new one, never a mix. A write that
 * fails removes its temporary file; one that is killed cannot, so every write first removes the
 * temporary files of earlier writes to the same target whose writer is gone (each writer holds a
 * lock on its own temporary file while it lives; the operating system drops the lock when the
 * process dies). Where the file system cannot rename atomically the file is replaced by a plain
 * move, and a warning is logged. A target that is not a regular file (a device, a named pipe), or
 * that is reached through {@code /dev} or {@code /proc} (a stream such as {@code /dev/stdout},
 * whichever file or pipe the stream goes to), is written through in place, appending: it cannot
 * be replaced, renaming over a device would put a regular file where it was, and a stream
 * redirected to a log with {@code >>} keeps what the log held.
 */
public final class SceneFiles {

    /** Scene files are small; anything larger is surely not one and would only exhaust memory. */
    static final long MAX_BYTES = 64L * 1024 * 1024;

    private static final System.Logger LOG = System.getLogger(SceneFiles.class.getName());
    private static final int TEMP_NAME_ATTEMPTS = 16;

    private SceneFiles() {
    }

    /** Writes the content of a file to a stream; {@link #write(Scene, Path)} uses it to stream the text. */
    @FunctionalInterface
    interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * The scene in {@code file}; problems are reported against the file name as given. Field maps
     * are read from their files relative to {@code file}'s folder.
     *
     * @throws IOException with the path and the reason when the file is missing, a folder,
     *         unreadable or too large
     * @throws SceneFormatException when the content is not a valid scene (including text that is not UTF-8)
     */
    public static Scene read(Path file) throws IOException, SceneFormatException {
        return readWithUnits(file).scene();
    }

    /**
     * The scene in {@code file} with the texts its values were given in (see {@link UnitTexts}).
     *
     * @throws IOException as {@link #read} does
     * @throws SceneFormatException as {@link #read} does
     */
    public static SceneWithUnits readWithUnits(Path file) throws IOException, SceneFormatException {
        String text = decode(readBytes(file), file.toString());
        return SceneJson.readWithUnits(text, file.toString(), SceneFolder.ofSceneFile(file));
    }

    /**
     * Saves {@code scene} to {@code file} atomically (see the class comment). A scene the reader
     * would refuse (a number beyond the file format's limits, a loop whose wire has no room) is
     * not saved: what is saved can be opened again.
     *
     * @throws IOException saying which file could not be saved and why; the previous content of
     *         {@code file}, if any, is then unchanged and no temporary file is left behind
     */
    public static void write(Scene scene, Path file) throws IOException {
        write(SceneWithUnits.of(scene), file);
    }

    /**
     * Saves {@code scene} atomically as {@link #write(Scene, Path)} does, with its values in the
     * units they were given in ({@link SceneJson#write(SceneWithUnits)}).
     *
     * @throws IOException as {@link #write(Scene, Path)} does
     */
    public static void write(SceneWithUnits scene, Path file) throws IOException {
        String text = SceneJson.write(scene);
        try {
            SceneJson.read(text, file.toString(), SceneFolder.ofSceneFile(file));
        } catch (SceneFormatException e) {
            throw new IOException("cannot save to " + file + ": the scene would not open again:\n" + e.getMessage(), e);
        }
        writeAtomically(file, text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Writes {@code bytes} to {@code file} with the same atomic replace as {@link #write(Scene, Path)};
     * exports and result files use it so a failed write never leaves a partial file.
     */
    public static void writeAtomically(Path file, byte[] bytes) throws IOException {
        writeAtomically(file, out -> out.write(bytes));
    }

    static void writeAtomically(Path file, Content content) throws IOException {
        if (Files.exists(file) && !Files.isDirectory(file) && (!Files.isRegularFile(file) || isStream(file))) {
            writeInPlace(file, content);
            return;
        }
        // Saving through a link updates the file it points to and keeps the link.
        Path target = Files.isSymbolicLink(file) && Files.exists(file) ? file.toRealPath() : file.toAbsolutePath();
        Path folder = target.getParent();
        if (folder == null) {
            throw new IOException("cannot save to " + target + ": not a file path");
        }
        if (Files.isDirectory(target)) {
            throw new IOException("cannot save to " + target + ": it is a folder");
        }
        String name = target.getFileName().toString();
        removeAbandonedTemps(folder, name);
        Temp temp = null;
        boolean moved = false;
        try {
            temp = createTemp(folder, name);
            // The lock lives as long as the channel, or this process: it tells later writers the file is in use.
            try (FileChannel channel = temp.channel()) {
                channel.lock();
                OutputStream out = Channels.newOutputStream(channel);
                content.writeTo(out);
                out.flush();
                channel.force(true);
            }
            copyPermissions(target, temp.path());
            moveIntoPlace(temp.path(), target);
            moved = true;
        } catch (IOException e) {
            String where = temp == null ? "cannot create a file in folder " + folder + " (" + reason(e) + ")"
                    : reason(e) + "; the file was not changed";
            throw new IOException("cannot save to " + target + ": " + where, e);
        } finally {
            if (!moved && temp != null) {
                deleteTemp(temp.path());
            }
        }
        syncFolder(folder);
    }

    /** A path through the system's device or process folders: {@code /dev/stdout}, {@code /proc/self/fd/1}. */
    private static boolean isStream(Path file) {
        Path absolute = file.toAbsolutePath().normalize();
        return absolute.startsWith("/dev") || absolute.startsWith("/proc");
    }

    /** A device, pipe or stream: written through, since it cannot be replaced. */
    private static void writeInPlace(Path file, Content content) throws IOException {
        try (OutputStream out = Files.newOutputStream(file, StandardOpenOption.WRITE, StandardOpenOption.APPEND)) {
            content.writeTo(out);
        } catch (IOException e) {
            throw new IOException("cannot write to " + file + ": " + reason(e), e);
        }
    }

    /**
     * Removes temporary files of earlier writes to {@code name} whose writers are gone: nobody
     * holds their lock. A file another live writer is using stays.
     */
    private static void removeAbandonedTemps(Path folder, String name) {
        Pattern ours = Pattern.compile("\\." + Pattern.quote(name) + "\\.[0-9a-f]{1,16}\\.tmp");
        try (DirectoryStream<Path> temps = Files.newDirectoryStream(folder,
                p -> ours.matcher(p.getFileName().toString()).matches())) {
            for (Path temp : temps) {
                removeIfAbandoned(temp);
            }
        } catch (IOException | DirectoryIteratorException e) {
            LOG.log(System.Logger.Level.DEBUG, "cannot look for abandoned temporary files in " + folder, e);
        }
    }

    private static void removeIfAbandoned(Path temp) {
        try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
            FileLock lock = channel.tryLock();
            if (lock != null) {
                Files.deleteIfExists(temp);
            }
        } catch (OverlappingFileLockException inUseHere) {
            // Another thread of this program is writing it.
        } catch (IOException e) {
            LOG.log(System.Logger.Level.DEBUG, "cannot remove abandoned temporary file " + temp, e);
        }
    }

    private static byte[] readBytes(Path file) throws IOException {
        try {
            if (Files.isDirectory(file)) {
                throw new IOException(file + ": is a folder, not a scene file");
            }
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new IOException(file + ": too large for a scene file (" + size + " bytes; the limit is "
                        + MAX_BYTES + ")");
            }
            return Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "no such file");
        } catch (AccessDeniedException e) {
            throw new AccessDeniedException(file.toString(), null, "permission denied: cannot read this file");
        } catch (FileSystemException e) {
            throw new IOException(file + ": cannot read (" + reason(e) + ")", e);
        }
    }

    /** Strict UTF-8; the first invalid byte becomes a problem at its line and column. */
    private static String decode(byte[] bytes, String sourceName) throws SceneFormatException {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (result.isError()) {
            out.flip();
            // Lines end at \r\n, \r or \n, as the JSON parser counts them for other problems.
            String[] lines = out.toString().split("\r\n|\r|\n", -1);
            int line = lines.length;
            int column = lines[lines.length - 1].length() + 1;
            throw new SceneFormatException(sourceName, List.of(new Problem("", line, column,
                    "not UTF-8 text: invalid byte 0x" + String.format("%02x", bytes[in.position()] & 0xff)
                            + " at byte offset " + in.position())));
        }
        return out.flip().toString();
    }

    /** A temporary file and the channel writing it. */
    private record Temp(Path path, FileChannel channel) {
    }

    /** A new empty file next to the target, created with the folder's default permissions, open for writing. */
    private static Temp createTemp(Path folder, String name) throws IOException {
        for (int attempt = 1; ; attempt++) {
            Path temp = folder.resolve("." + name + "." + Long.toHexString(ThreadLocalRandom.current().nextLong())
                    + ".tmp");
            try {
                return new Temp(temp, FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE));
            } catch (FileAlreadyExistsException e) {
                if (attempt == TEMP_NAME_ATTEMPTS) {
                    throw e;
                }
            }
        }
    }

    /** Saving over a file keeps its permissions (a file shared read-only stays so). */
    private static void copyPermissions(Path from, Path to) throws IOException {
        if (Files.exists(from) && Files.getFileStore(to).supportsFileAttributeView(PosixFileAttributeView.class)) {
            Files.setPosixFilePermissions(to, Files.getPosixFilePermissions(from));
        }
    }

    private static void moveIntoPlace(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            LOG.log(System.Logger.Level.WARNING, "atomic rename is not supported for {0}; replacing it with a"
                    + " plain move, so a crash during the move could damage it", target);
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void deleteTemp(Path temp) {
        try {
            Files.deleteIfExists(temp);
        } catch (IOException e) {
            // The save has already failed with its own message; this one only adds the stray file.
            LOG.log(System.Logger.Level.WARNING, "could not delete temporary file " + temp, e);
        }
    }

    /**
     * Forces the rename itself to disk. POSIX systems allow this on a folder opened for reading;
     * others (Windows) refuse to open a folder, and their rename is durable on its own.
     */
    private static void syncFolder(Path folder) {
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException e) {
            LOG.log(System.Logger.Level.DEBUG, "folder sync not supported for " + folder, e);
        }
    }

    private static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return "the folder does not exist";
        }
        if (e instanceof FileSystemException fse && fse.getReason() != null) {
            return fse.getReason();
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }
}
