package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneWithUnits;

/** Autosaves per window, and which ones a start may offer: files only, no toolkit. */
class AutosaveTest {

    private static final SceneStore STORE = new JsonSceneStore();
    private static final Instant NOW = Instant.parse("2026-12-01T12:00:00Z");

    @TempDir
    Path home;

    /** What a session that ended without a clean exit leaves: autosave, origin, and a lock nobody holds. */
    static Path orphan(Path dir, String id, Scene scene, Path origin, Instant savedAt) throws Exception {
        Path json = dir.resolve("autosave-" + id + ".json");
        STORE.write(SceneWithUnits.of(scene), json);
        Files.writeString(dir.resolve("autosave-" + id + ".origin"), origin == null ? "" : origin.toString(),
                StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("autosave-" + id + ".lock"), "");
        Files.setLastModifiedTime(json, FileTime.from(savedAt));
        return json;
    }

    private static List<Path> offered(Path dir) throws IOException {
        return Autosave.recoverable(dir).stream().map(Autosave.Orphan::file).toList();
    }

    @Test
    void twoWindowsWriteTwoFilesAndNeitherIsOfferedWhileTheyLive() throws Exception {
        Autosave a = new Autosave(home);
        Autosave b = new Autosave(home);
        a.write(STORE, SceneWithUnits.of(Scene.empty("a")), null);
        b.write(STORE, SceneWithUnits.of(Scene.empty("b")), null);
        assertNotEquals(a.file(), b.file());
        assertEquals("a", STORE.read(a.file()).scene().name());
        assertEquals("b", STORE.read(b.file()).scene().name());
        assertTrue(offered(home).isEmpty(), "a window's autosave is not work left behind");
        a.release();
        b.release();
    }

    @Test
    void aCleanReleaseRemovesOnlyItsOwnAutosave() throws Exception {
        Autosave a = new Autosave(home);
        Autosave b = new Autosave(home);
        a.write(STORE, SceneWithUnits.of(Scene.empty("a")), null);
        b.write(STORE, SceneWithUnits.of(Scene.empty("b")), null);
        Path left = orphan(home, "left", Scene.empty("left"), null, NOW);

        a.release();

        assertFalse(Files.exists(a.file()));
        assertTrue(Files.exists(b.file()), "the other window's autosave stays");
        assertTrue(Files.exists(left), "work left by an ended session stays until it is offered");
        assertEquals(List.of(left), offered(home));
        b.release();
    }

    @Test
    void anOrphanIsOfferedWhenNewerThanItsFileOrWithoutOne() throws Exception {
        Path saved = home.resolve("saved.json");
        STORE.write(SceneWithUnits.of(Scene.empty("saved")), saved);
        Files.setLastModifiedTime(saved, FileTime.from(NOW));
        Path newer = orphan(home, "newer", Scene.empty("newer"), saved, NOW.plusSeconds(60));
        Path older = orphan(home, "older", Scene.empty("older"), saved, NOW.minusSeconds(60));
        Path untitled = orphan(home, "untitled", Scene.empty("untitled"), null, NOW.minusSeconds(3600));
        Path moved = orphan(home, "moved", Scene.empty("moved"), home.resolve("gone.json"), NOW.minusSeconds(7200));

        assertEquals(List.of(newer, untitled, moved), offered(home), "newest first; not the one the file has caught up with");
        assertTrue(Files.exists(older), "not offered, so not removed either");
        Autosave.Orphan first = Autosave.recoverable(home).get(0);
        assertEquals(saved.toAbsolutePath().normalize(), first.origin().toAbsolutePath().normalize());
        assertNull(Autosave.recoverable(home).get(1).origin());
    }

    @Test
    void anAutosaveWhoseLockIsHeldIsNotOffered() throws Exception {
        Path live = orphan(home, "live", Scene.empty("live"), null, NOW);
        try (FileChannel c = FileChannel.open(home.resolve("autosave-live.lock"), StandardOpenOption.WRITE)) {
            c.lock();
            assertFalse(offered(home).contains(live), "another window holds it");
        }
    }

    @Test
    void theSingleAutosaveOfEarlierVersionsIsOfferedAsWorkWithoutAFile() throws Exception {
        Path legacy = home.resolve("autosave.json");
        STORE.write(SceneWithUnits.of(Scene.empty("legacy")), legacy);
        List<Autosave.Orphan> offered = Autosave.recoverable(home);
        assertEquals(List.of(legacy), offered.stream().map(Autosave.Orphan::file).toList());
        assertNull(offered.get(0).origin());
    }

    @Test
    void aDiscardedOrphanIsGoneWithItsOriginAndLock() throws Exception {
        orphan(home, "old", Scene.empty("old"), null, NOW);
        Autosave.discard(Autosave.recoverable(home).get(0));
        try (var files = Files.list(home)) {
            assertEquals(0, files.count());
        }
    }

    @Test
    void theAutosaveRecordsTheFileItsWorkBelongsTo() throws Exception {
        Path file = home.resolve("doc.json");
        Autosave a = new Autosave(home);
        a.write(STORE, SceneWithUnits.of(Scene.empty("doc")), file);
        // As a crash leaves it: the lock is the process's until it ends; read the record directly.
        Path origin = home.resolve(a.file().getFileName().toString().replace(".json", ".origin"));
        assertEquals(file.toAbsolutePath().normalize().toString(), Files.readString(origin).strip());
        a.clear();
        assertFalse(Files.exists(a.file()));
        assertFalse(Files.exists(origin));
    }
}
