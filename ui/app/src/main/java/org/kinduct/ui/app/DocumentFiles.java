package org.kinduct.ui.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.FieldMapCsv;
import org.kinduct.scene.io.SceneWithUnits;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneDocument;
import org.kinduct.ui.edit.ShapeFactory;

/**
 * The file side of one editor window: new scene, open, open a demo, save, save as, the question
 * before unsaved work would be dropped, the autosave, and the offer of work that earlier
 * sessions left ({@link Autosave}). Files are read and written on the {@code io} executor (one
 * thread, so writes keep their order), never on the UI thread; what follows runs on {@code ui}.
 * Questions go to {@link FileDialogs}. Needs no running toolkit.
 *
 * <p>Unsaved work is never dropped without the user's word: the autosave is removed only once
 * the work is saved, or the document holds nothing unsaved, or the user discarded it on quitting;
 * another window's autosave, or one that was never offered, is never removed.
 */
final class DocumentFiles {

    private final EditorViewModel vm;
    private final SceneStore store;
    private final AppHome home;
    private final Autosave autosave;
    private final FileDialogs dialogs;
    private final Executor io;
    private final Executor ui;
    private final ObservableList<Path> recent = FXCollections.observableArrayList();

    DocumentFiles(EditorViewModel vm, SceneStore store, AppHome home, Autosave autosave, FileDialogs dialogs,
                  Executor io, Executor ui) {
        this.vm = vm;
        this.store = store;
        this.home = home;
        this.autosave = autosave;
        this.dialogs = dialogs;
        this.io = io;
        this.ui = ui;
        Futures.watch(onIo(home::recent).thenAccept(recent::setAll));
    }

    private SceneDocument document() {
        return vm.document();
    }

    // ---- starting ----

    /**
     * Opens what the editor was started with (a file, a demo, or neither), then offers the work
     * earlier sessions left: on every start, whatever is opened.
     */
    CompletableFuture<Void> start(Path file, String demoResource) {
        CompletableFuture<Boolean> opened = file != null ? open(file)
                : demoResource != null ? openDemo(demoResource) : CompletableFuture.completedFuture(true);
        return Futures.watched(opened.thenCompose(ok -> offerRecovery()));
    }

    /**
     * Offers, newest first, each autosave an ended session left that is newer than its file,
     * until one is recovered or put off.
     */
    CompletableFuture<Void> offerRecovery() {
        return onIo(() -> Autosave.recoverable(home.dir())).thenCompose(this::offer).exceptionally(failure -> {
            vm.say("Could not look for unsaved work of earlier sessions in " + home.dir() + ": " + message(failure));
            return null;
        });
    }

    private CompletableFuture<Void> offer(List<Autosave.Orphan> left) {
        if (left.isEmpty()) {
            return CompletableFuture.completedFuture(null);
        }
        Autosave.Orphan o = left.get(0);
        return switch (dialogs.offerRecovery(o.file(), o.origin())) {
            case RECOVER -> recover(o);
            case DISCARD -> onIo(() -> {
                Autosave.discard(o);
                return null;
            }).thenCompose(x -> offer(left.subList(1, left.size())));
            case LATER -> CompletableFuture.completedFuture(null);
        };
    }

    /** Loads the orphan's work, unsaved, into this window, which takes it over into its own autosave. */
    private CompletableFuture<Void> recover(Autosave.Orphan o) {
        return onIo(() -> store.read(o.file())).handle((scene, failure) -> {
            if (failure != null) {
                dialogs.error("Could not recover " + o.file().getFileName() + " (it is kept)", message(failure));
                return null;
            }
            vm.load(scene, o.origin(), true);
            vm.zoomToFit();
            vm.say("Recovered unsaved work" + (o.origin() == null ? "" : " of " + o.origin().getFileName())
                    + " — save it to keep it");
            // Written here first, so the work is never without an autosave.
            io.execute(() -> {
                try {
                    autosave.write(store, scene, o.origin());
                    Autosave.discard(o);
                } catch (IOException | SceneStore.LoadFailure e) {
                    ui.execute(() -> vm.say("Autosave failed: " + e.getMessage()));
                }
            });
            return null;
        });
    }

    // ---- new, open ----

    /** Runs {@code action} once nothing unsaved is left to lose (see {@link #confirmDiscard()}). */
    void afterAsking(Runnable action) {
        Futures.watch(confirmDiscard().thenAccept(ok -> {
            if (ok) {
                action.run();
            }
        }));
    }

    void newScene() {
        afterAsking(() -> {
            vm.load(Scene.empty("untitled"), null, false);
            vm.zoomToFit();
        });
    }

    /** File ▸ Open: asks about unsaved changes, then for the file. */
    void openChosen() {
        afterAsking(() -> dialogs.fileToOpen(folder()).ifPresent(file -> {
            var unused = open(file); // watched: its failures are reported by its own chain
        }));
    }

    /** Opens a scene file; on failure the current scene stays and the user is told what is wrong. */
    CompletableFuture<Boolean> open(Path file) {
        return Futures.watched(onIo(() -> store.read(file)).handle((scene, failure) -> {
            if (failure != null) {
                vm.say("Could not open " + file.getFileName() + " — your scene is unchanged");
                dialogs.error("Could not open " + file.getFileName(), message(failure));
                return false;
            }
            vm.load(scene, file, false);
            vm.zoomToFit();
            vm.say("Opened " + file.getFileName());
            remember(file);
            return true;
        }));
    }

    /** Opens a demo scene shipped as the class-path resource {@code resource}. */
    CompletableFuture<Boolean> openDemo(String resource) {
        return Futures.watched(onIo(() -> store.readResource(resource)).handle((scene, failure) -> {
            if (failure != null) {
                dialogs.error("Could not open the demo " + resource, message(failure));
                return false;
            }
            vm.load(scene, null, false);
            vm.zoomToFit();
            return true;
        }));
    }

    // ---- field maps ----

    /**
     * Edit ▸ Add field map…: the chosen file is read on the file thread (a large map takes a moment)
     * and added as a source named by its path relative to the scene's folder, or by its full path
     * while the scene has no file.
     */
    void addFieldMap() {
        Path sceneFolder = folder();
        dialogs.mapToOpen(sceneFolder).ifPresent(file -> Futures.watch(onIo(() -> {
            try (InputStream in = Files.newInputStream(file)) {
                return FieldMapCsv.readPoints(in, file.toString());
            }
        }).handle((grid, failure) -> {
            if (failure != null) {
                dialogs.error("Could not read the field map " + file.getFileName(), message(failure));
                return null;
            }
            Path absolute = file.toAbsolutePath();
            String name = sceneFolder != null ? sceneFolder.relativize(absolute).toString().replace('\\', '/')
                    : absolute.toString();
            document().add("Add field map", scene -> ShapeFactory.addFieldMap(scene, name, grid));
            vm.say("Added field map " + file.getFileName() + ": " + grid.nx() + " × " + grid.ny() + " samples");
            return null;
        })));
    }

    // ---- save ----

    CompletableFuture<Boolean> save() {
        Path f = document().file();
        return f == null ? saveAs() : saveTo(f);
    }

    CompletableFuture<Boolean> saveAs() {
        String name = vm.scene().name().isEmpty() ? "scene.json" : vm.scene().name() + ".json";
        return dialogs.fileToSave(folder(), name).map(this::saveTo).orElse(CompletableFuture.completedFuture(false));
    }

    /**
     * Writes the scene as it is now to {@code file} (atomically: a failed write leaves the file as
     * it was). Edits made while it is written stay unsaved.
     */
    CompletableFuture<Boolean> saveTo(Path file) {
        SceneWithUnits scene = document().withUnits();
        return Futures.watched(onIo(() -> {
            store.write(scene, file);
            return null;
        }).handle((x, failure) -> {
            if (failure != null) {
                dialogs.error("Could not save " + file.getFileName(), message(failure));
                return false;
            }
            document().markSaved(scene.scene(), file);
            vm.say("Saved " + file.getFileName());
            remember(file);
            if (!document().isDirty()) {
                clearAutosave();
            }
            return true;
        }));
    }

    /** True, once answered, when nothing unsaved is left to lose: there was none, or the user saved or discarded it. */
    CompletableFuture<Boolean> confirmDiscard() {
        if (!document().isDirty()) {
            return CompletableFuture.completedFuture(true);
        }
        return switch (dialogs.unsavedChanges()) {
            case SAVE -> save();
            case DISCARD -> CompletableFuture.completedFuture(true);
            case CANCEL -> CompletableFuture.completedFuture(false);
        };
    }

    /** Quits once nothing unsaved is left to lose: removes this window's autosave, then {@code close}s. */
    void quit(Runnable close) {
        afterAsking(() -> Futures.watch(onIo(() -> {
            autosave.release();
            return null;
        }).whenComplete((x, failure) -> {
            if (failure != null) {
                System.err.println("Kinduct: could not remove the autosave: " + message(failure));
            }
            close.run();
        })));
    }

    // ---- autosave ----

    /** Writes unsaved work to this window's autosave, or removes the autosave when nothing is unsaved. */
    void autosave() {
        if (!document().isDirty()) {
            clearAutosave();
            return;
        }
        SceneWithUnits scene = document().withUnits();
        Path origin = document().file();
        onIo(() -> {
            autosave.write(store, scene, origin);
            return null;
        }).exceptionally(failure -> {
            vm.say("Autosave failed: " + message(failure));
            return null;
        });
    }

    private void clearAutosave() {
        onIo(() -> {
            autosave.clear();
            return null;
        }).exceptionally(failure -> {
            vm.say("Could not remove the autosave: " + message(failure));
            return null;
        });
    }

    // ---- recent files ----

    /** The files opened or saved last, newest first. */
    ObservableList<Path> recent() {
        return recent;
    }

    private void remember(Path file) {
        Futures.watch(onIo(() -> home.remember(file)).thenAccept(recent::setAll));
    }

    /** Where file choosers start: the document's folder, if it has a file. */
    private Path folder() {
        Path f = document().file();
        return f != null ? f.toAbsolutePath().getParent() : null;
    }

    // ---- threads ----

    /** What may throw while reading or writing files. */
    private interface FileWork<T> {
        T run() throws Exception;
    }

    /** Runs {@code work} on the file thread; the result (or failure) is handed on on the UI thread. */
    private <T> CompletableFuture<T> onIo(FileWork<T> work) {
        CompletableFuture<T> done = new CompletableFuture<>();
        io.execute(() -> {
            try {
                T value = work.run();
                ui.execute(() -> done.complete(value));
            } catch (Exception e) {
                ui.execute(() -> done.completeExceptionally(e));
            }
        });
        return done;
    }

    private static String message(Throwable failure) {
        Throwable t = Futures.cause(failure);
        return t.getMessage() != null ? t.getMessage() : t.getClass().getSimpleName();
    }
}
