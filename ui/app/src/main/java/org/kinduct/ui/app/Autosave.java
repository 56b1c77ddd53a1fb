package org.kinduct.ui.app;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.io.SceneWithUnits;

/**
 * One editor window's autosave, and the autosaves that ended sessions left behind.
 *
 * <p>Each window writes a file of its own in the editor's home, {@code autosave-ID.json}, beside
 * {@code autosave-ID.origin} naming the document's file (empty for a new scene or a demo), and
 * holds an exclusive lock on {@code autosave-ID.lock} from its first write until it releases the
 * autosave; the operating system drops the lock when the process ends, however it ends. An
 * autosave whose lock is free was therefore left by a session that did not end cleanly (an
 * orphan); one whose lock is held belongs to a window still open, and is never offered nor
 * touched. An orphan is worth offering when it is newer than its document's file, or there is no
 * such file. The single {@code autosave.json} of earlier versions counts as an orphan without a
 * file.
 *
 * <p>Every method reads or writes files: call them off the UI thread, from one thread at a time.
 */
final class Autosave {

    private static final String PREFIX = "autosave";
    private static final String SCENE = ".json";
    private static final String ORIGIN = ".origin";
    private static final String LOCK = ".lock";

    /** An autosave left by a session that did not end cleanly; {@code origin} is its document's file, or null. */
    record Orphan(Path file, Path origin, FileTime savedAt) {

        /** Whether it may hold work its document's file lacks: it was written after the file, or there is no file. */
        boolean newerThanItsFile() throws IOException {
            return origin == null || !Files.exists(origin)
                    || savedAt.compareTo(Files.getLastModifiedTime(origin)) > 0;
        }
    }

    /**
     * Lock files this process holds. They are never probed with a channel of their own: closing
     * any channel on a file may release every lock the process holds on it (FileLock javadoc).
     */
    private static final Set<Path> HELD_HERE = ConcurrentHashMap.newKeySet();

    private final Path dir;
    private final String name;
    private FileChannel lockChannel;
    private FileLock lock;

    /** This window's autosave in {@code dir}; nothing is written or locked before the first {@link #write}. */
    Autosave(Path dir) {
        this.dir = dir;
        this.name = PREFIX + "-" + UUID.randomUUID();
    }

    /** This window's autosave file. */
    Path file() {
        return dir.resolve(name + SCENE);
    }

    /**
     * Writes {@code scene}, the work of {@code origin} (null for a new scene or a demo), atomically,
     * in the units its file gave (so recovered work keeps them).
     */
    void write(SceneStore store, SceneWithUnits scene, Path origin) throws IOException, SceneStore.LoadFailure {
        if (lock == null) {
            Files.createDirectories(dir);
            lockChannel = FileChannel.open(lockFile(), StandardOpenOption.CREATE,
                    StandardOpenOption.WRITE);
            lock = lockChannel.lock();
            HELD_HERE.add(lockFile());
        }
        String from = origin == null ? "" : origin.toAbsolutePath().normalize().toString();
        SceneFiles.writeAtomically(dir.resolve(name + ORIGIN), from.getBytes(StandardCharsets.UTF_8));
        store.write(scene, file());
    }

    /** Removes this window's autosave (the work is saved, or there is none); the window keeps its lock. */
    void clear() throws IOException {
        Files.deleteIfExists(file());
        Files.deleteIfExists(dir.resolve(name + ORIGIN));
    }

    /** Removes this window's autosave and gives up its lock: the window closes cleanly. */
    void release() throws IOException {
        clear();
        if (lock != null) {
            Files.deleteIfExists(lockFile());
            lockChannel.close();
            lock = null;
            HELD_HERE.remove(lockFile());
        }
    }

    private Path lockFile() {
        return dir.resolve(name + LOCK).toAbsolutePath().normalize();
    }

    /** The orphans in {@code dir} worth offering ({@link Orphan#newerThanItsFile()}), newest first. */
    static List<Orphan> recoverable(Path dir) throws IOException {
        List<Orphan> out = new ArrayList<>();
        if (!Files.isDirectory(dir)) {
            return out;
        }
        try (DirectoryStream<Path> files = Files.newDirectoryStream(dir, PREFIX + "*" + SCENE)) {
            for (Path f : files) {
                String base = stem(f);
                if (!held(dir.resolve(base + LOCK))) {
                    Orphan o = new Orphan(f, origin(dir.resolve(base + ORIGIN)), Files.getLastModifiedTime(f));
                    if (o.newerThanItsFile()) {
                        out.add(o);
                    }
                }
            }
        } catch (NoSuchFileException e) {
            // Gone meanwhile (its owner cleared it): nothing to offer.
        }
        out.sort(Comparator.comparing(Orphan::savedAt).reversed());
        return out;
    }

    /** Removes an orphan the user declined. */
    static void discard(Orphan o) throws IOException {
        String base = stem(o.file());
        Path d = o.file().getParent();
        Files.deleteIfExists(o.file());
        Files.deleteIfExists(d.resolve(base + ORIGIN));
        Files.deleteIfExists(d.resolve(base + LOCK));
    }

    private static String stem(Path f) {
        String n = f.getFileName().toString();
        return n.substring(0, n.length() - SCENE.length());
    }

    /** Whether a window still open holds this lock (a live window always has its lock file). */
    private static boolean held(Path lockFile) throws IOException {
        if (HELD_HERE.contains(lockFile.toAbsolutePath().normalize())) {
            return true;
        }
        if (!Files.exists(lockFile)) {
            return false;
        }
        try (FileChannel c = FileChannel.open(lockFile, StandardOpenOption.WRITE)) {
            FileLock probe = c.tryLock();
            if (probe == null) {
                return true;
            }
            probe.release();
            return false;
        } catch (OverlappingFileLockException e) {
            // Held by a window of this very process.
            return true;
        } catch (NoSuchFileException e) {
            return false;
        }
    }

    private static Path origin(Path originFile) throws IOException {
        if (!Files.isRegularFile(originFile)) {
            return null;
        }
        String text = Files.readString(originFile, StandardCharsets.UTF_8).strip();
        return text.isEmpty() ? null : Path.of(text);
    }
}
