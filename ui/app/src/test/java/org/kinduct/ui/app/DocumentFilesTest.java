package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import java.util.Queue;
import java.util.concurrent.Executor;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.scene.io.SceneWithUnits;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneEdits;

/**
 * Open, save, the question before unsaved work is dropped, autosave and recovery, without a
 * toolkit: the dialogs answer from a script, files go through the real store.
 */
class DocumentFilesTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final SceneStore STORE = new JsonSceneStore();
    private static final String DEMO = Demos.resource("drive-sense-wire").orElseThrow();
    private static final Instant NOW = Instant.parse("2026-12-01T12:00:00Z");

    @TempDir
    Path home;

    /** Scripted answers; records what was asked. */
    private static final class Script implements FileDialogs {
        final Deque<Object> answers = new ArrayDeque<>();
        final List<String> asked = new ArrayList<>();
        final List<String> errors = new ArrayList<>();

        Script answer(Object... a) {
            answers.addAll(List.of(a));
            return this;
        }

        @Override
        public Optional<Path> fileToOpen(Path folder) {
            asked.add("open");
            return Optional.of((Path) answers.remove());
        }

        @Override
        public Optional<Path> mapToOpen(Path folder) {
            asked.add("map");
            return Optional.of((Path) answers.remove());
        }

        @Override
        public Optional<Path> fileToSave(Path folder, String suggestedName) {
            asked.add("save as");
            return Optional.of((Path) answers.remove());
        }

        @Override
        public Unsaved unsavedChanges() {
            asked.add("unsaved");
            return (Unsaved) answers.remove();
        }

        @Override
        public Recovery offerRecovery(Path autosave, Path origin) {
            asked.add("recover " + autosave.getFileName());
            return (Recovery) answers.remove();
        }

        @Override
        public void error(String header, String details) {
            errors.add(header + ": " + details);
        }
    }

    /** One editor window's view model and file actions, files on {@code io}. */
    private record Window(EditorViewModel vm, DocumentFiles files, Autosave autosave) {
    }

    private Window window(Script dialogs, Executor io) {
        EditorViewModel vm = new EditorViewModel(Scene.empty("untitled"), SAME_THREAD, SAME_THREAD);
        vm.view().layers().clear();
        Autosave autosave = new Autosave(home);
        return new Window(vm, new DocumentFiles(vm, STORE, new AppHome(home), autosave, dialogs, io, SAME_THREAD),
                autosave);
    }

    private Window window(Script dialogs) {
        return window(dialogs, SAME_THREAD);
    }

    private static void addWire(EditorViewModel vm, String id) {
        vm.document().apply("add", s -> SceneEdits.addConductor(s, new Conductor.Wire(id, Body.FIXED,
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.02, 0)))));
    }

    private List<Path> autosaves() throws Exception {
        try (Stream<Path> files = Files.list(home)) {
            return files.filter(f -> f.getFileName().toString().matches("autosave.*\\.json")).sorted().toList();
        }
    }

    // ---- recovery ----

    /** The bug this guards: the launcher always opens a demo, and recovery was offered only without one. */
    @Test
    void aStartWithADemoStillOffersTheWorkACrashLeftAndRecoversItUnsaved() throws Exception {
        Path file = home.resolve("work.json");
        STORE.write(SceneWithUnits.of(Scene.empty("as saved")), file);
        Files.setLastModifiedTime(file, FileTime.from(NOW));
        Scene unsaved = Scene.empty("unsaved edits");
        Path left = AutosaveTest.orphan(home, "crashed", unsaved, file, NOW.plusSeconds(30));
        Script dialogs = new Script().answer(FileDialogs.Recovery.RECOVER);
        Window w = window(dialogs);

        w.files().start(null, DEMO);

        assertEquals(List.of("recover " + left.getFileName()), dialogs.asked);
        assertEquals(unsaved, w.vm().scene());
        assertTrue(w.vm().document().isDirty(), "recovered work still needs saving");
        assertEquals(file, w.vm().document().file(), "saving writes it back where it came from");
        assertEquals(List.of(w.autosave().file()), autosaves(), "taken over into this window's autosave");
        assertEquals(unsaved, STORE.read(w.autosave().file()).scene());
    }

    @Test
    void aStartWithAFileOffersWorkNewerThanThatFile() throws Exception {
        Path file = home.resolve("work.json");
        STORE.write(SceneWithUnits.of(Scene.empty("as saved")), file);
        Files.setLastModifiedTime(file, FileTime.from(NOW));
        AutosaveTest.orphan(home, "crashed", Scene.empty("unsaved edits"), file, NOW.plusSeconds(30));
        Script dialogs = new Script().answer(FileDialogs.Recovery.LATER);
        Window w = window(dialogs);

        w.files().start(file, null);

        assertEquals(1, dialogs.asked.size(), dialogs.asked.toString());
        assertEquals("as saved", w.vm().scene().name(), "put off: the file stays open");
        assertEquals(1, autosaves().size(), "put off: kept for the next start");
        Script next = new Script().answer(FileDialogs.Recovery.LATER);
        window(next).files().start(null, null);
        assertEquals(1, next.asked.size(), "offered again");
    }

    @Test
    void workTheFileHasCaughtUpWithIsNeitherOfferedNorRemoved() throws Exception {
        Path file = home.resolve("work.json");
        STORE.write(SceneWithUnits.of(Scene.empty("saved later")), file);
        Files.setLastModifiedTime(file, FileTime.from(NOW));
        Path left = AutosaveTest.orphan(home, "older", Scene.empty("older"), file, NOW.minusSeconds(30));
        Script dialogs = new Script();
        Window w = window(dialogs);

        w.files().start(file, null);
        w.files().quit(() -> { });

        assertTrue(dialogs.asked.isEmpty(), dialogs.asked.toString());
        assertTrue(Files.exists(left));
    }

    @Test
    void declinedWorkIsRemovedAndTheNextIsOffered() throws Exception {
        Path first = AutosaveTest.orphan(home, "first", Scene.empty("first"), null, NOW.plusSeconds(10));
        Path second = AutosaveTest.orphan(home, "second", Scene.empty("second"), null, NOW);
        Script dialogs = new Script().answer(FileDialogs.Recovery.DISCARD, FileDialogs.Recovery.RECOVER);
        Window w = window(dialogs);

        w.files().start(null, null);

        assertEquals(List.of("recover " + first.getFileName(), "recover " + second.getFileName()), dialogs.asked);
        assertFalse(Files.exists(first));
        assertEquals("second", w.vm().scene().name());
    }

    // ---- autosave ----

    @Test
    void eachWindowAutosavesItsOwnWorkAndACleanQuitRemovesOnlyItsOwn() throws Exception {
        Window a = window(new Script().answer(FileDialogs.Unsaved.DISCARD));
        Window b = window(new Script());
        addWire(a.vm(), "in-a");
        addWire(b.vm(), "in-b");
        a.files().autosave();
        b.files().autosave();
        assertEquals(2, autosaves().size());
        boolean[] closed = {false};

        a.files().quit(() -> closed[0] = true);

        assertTrue(closed[0]);
        assertEquals(List.of(b.autosave().file()), autosaves(), "the other window's work stays");
        Script third = new Script();
        window(third).files().start(null, null);
        assertTrue(third.asked.isEmpty(), "a window still open is not offered its work: " + third.asked);
        b.autosave().release();
    }

    @Test
    void theAutosaveHoldsUnsavedWorkAndGoesOnceItIsSaved() throws Exception {
        Window w = window(new Script());
        addWire(w.vm(), "unsaved");
        w.files().autosave();
        assertEquals(w.vm().scene(), STORE.read(w.autosave().file()).scene(), "the autosave holds the current scene");
        assertTrue(w.files().saveTo(home.resolve("saved.json")).get());
        assertFalse(Files.exists(w.autosave().file()), "the file has it all");
        w.files().autosave();
        assertFalse(Files.exists(w.autosave().file()), "nothing unsaved, nothing autosaved");
    }

    @Test
    void undoingBackToTheSavedStateRemovesTheAutosave() throws Exception {
        Window w = window(new Script());
        addWire(w.vm(), "undone");
        w.files().autosave();
        w.vm().document().undo();
        w.files().autosave();
        assertTrue(autosaves().isEmpty());
    }

    @Test
    void quittingWithUnsavedWorkAsksAndCancelKeepsEverything() throws Exception {
        Window w = window(new Script().answer(FileDialogs.Unsaved.CANCEL));
        addWire(w.vm(), "keep");
        w.files().autosave();
        boolean[] closed = {false};
        w.files().quit(() -> closed[0] = true);
        assertFalse(closed[0]);
        assertTrue(Files.exists(w.autosave().file()));
        w.autosave().release();
    }

    // ---- open and save ----

    @Test
    void aSaveMarksSavedTheStateItWroteNotEditsMadeMeanwhile() throws Exception {
        Queue<Runnable> io = new ArrayDeque<>();
        Window w = window(new Script(), io::add);
        addWire(w.vm(), "first");
        Scene written = w.vm().scene();
        Path file = home.resolve("during.json");
        var saved = w.files().saveTo(file);
        addWire(w.vm(), "meanwhile");
        for (Runnable r; (r = io.poll()) != null; ) {
            r.run();
        }
        assertTrue(saved.get());
        assertEquals(written, STORE.read(file).scene());
        assertTrue(w.vm().document().isDirty(), "the later edit is not in the file");
        w.vm().document().undo();
        assertFalse(w.vm().document().isDirty(), "the written state is");
    }

    /** A hand-written file keeps its units through open, edit and save; only the edited value changes. */
    @Test
    void savingKeepsTheUnitsTheFileWasWrittenIn() throws Exception {
        Path file = home.resolve("by-hand.json");
        Files.writeString(file, """
                {"format": "kinduct-scene", "version": 1, "name": "by hand",
                 "time": {"t0": "0 ms", "t1": "200 ms", "dt": "1 ms"},
                 "sources": [{"kind": "block-magnet", "id": "m", "center": ["0 mm", "0 mm"],
                   "size": ["10 mm", "10 mm", "4 mm"], "standoff": "1.5 mm", "remanence": "1.25 T"}],
                 "conductors": [{"kind": "wire", "id": "w", "vertices": [["-10 mm", "8 mm"], ["10 mm", "8 mm"]]}]}
                """);
        Window w = window(new Script());
        assertTrue(w.files().open(file).get());
        w.vm().document().apply("Set gap", s -> SceneValues.of(s).write("m.standoff", 0.002));

        assertTrue(w.files().save().get());

        String saved = Files.readString(file);
        for (String kept : List.of("\"0 ms\"", "\"200 ms\"", "\"1 ms\"", "[\"10 mm\", \"10 mm\", \"4 mm\"]",
                "\"1.25 T\"", "[\"-10 mm\", \"8 mm\"]", "\"standoff\": \"2 mm\"")) {
            assertTrue(saved.contains(kept), kept + " in\n" + saved);
        }
        assertEquals(w.vm().scene(), STORE.read(file).scene());
    }

    @Test
    void saveWithoutAFileAsksWhereAndOpensAgainUnchanged() throws Exception {
        Path file = home.resolve("chosen.json");
        Script dialogs = new Script().answer(file);
        Window w = window(dialogs);
        addWire(w.vm(), "w");
        Scene saved = w.vm().scene();
        assertTrue(w.files().save().get());
        assertEquals(List.of("save as"), dialogs.asked);
        assertEquals(file, w.vm().document().file());
        w.vm().load(Scene.empty("other"), null, false);
        assertTrue(w.files().open(file).get());
        assertEquals(saved, w.vm().scene());
        assertEquals(List.of(file.toAbsolutePath().normalize()), w.files().recent());
    }

    @Test
    void openingAnotherFileAsksFirstAndCancelKeepsTheScene() throws Exception {
        Script dialogs = new Script().answer(FileDialogs.Unsaved.CANCEL);
        Window w = window(dialogs);
        addWire(w.vm(), "keep");
        Scene before = w.vm().scene();
        w.files().openChosen();
        assertEquals(List.of("unsaved"), dialogs.asked, "no file asked for after Cancel");
        assertSame(before, w.vm().scene());
    }

    @Test
    void answeringSaveSavesBeforeTheNewSceneReplacesTheWork() throws Exception {
        Path file = home.resolve("first.json");
        Script dialogs = new Script().answer(FileDialogs.Unsaved.SAVE, file);
        Window w = window(dialogs);
        addWire(w.vm(), "work");
        Scene work = w.vm().scene();
        w.files().newScene();
        assertEquals(List.of("unsaved", "save as"), dialogs.asked);
        assertEquals(work, STORE.read(file).scene());
        assertTrue(w.vm().scene().conductors().isEmpty());
        assertNull(w.vm().document().file());
    }

    @Test
    void aFileThatCannotBeReadOrWrittenLeavesTheSceneAndSaysWhy() throws Exception {
        Script dialogs = new Script();
        Window w = window(dialogs);
        addWire(w.vm(), "keep");
        Scene before = w.vm().scene();
        Path bad = home.resolve("bad.json");
        Files.writeString(bad, "{\n  \"format\": \"kinduct-scene\",\n  \"version\": 1,\n  \"bodies\": 7\n}\n");

        assertFalse(w.files().open(bad).get());
        assertFalse(w.files().saveTo(home).get(), "a folder is no file");

        assertSame(before, w.vm().scene());
        assertTrue(w.vm().document().isDirty());
        assertEquals(2, dialogs.errors.size(), dialogs.errors.toString());
        assertTrue(dialogs.errors.get(0).contains("bad.json:4:"), "file, line and column: " + dialogs.errors);
    }
}
