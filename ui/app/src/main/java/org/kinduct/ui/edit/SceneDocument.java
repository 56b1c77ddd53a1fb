package org.kinduct.ui.edit;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.ObjLongConsumer;
import java.util.function.UnaryOperator;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableSet;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.io.SceneWithUnits;
import org.kinduct.scene.io.UnitTexts;

/**
 * The document being edited: the scene with its undo history, whether it has unsaved changes,
 * the file it belongs to, and the selection, kept to objects the scene still has. Every scene
 * shown (edit, undo, redo, load) gets a new revision number, by which work done for one scene is
 * told from work for another.
 */
public final class SceneDocument {

    private static final int UNDO_LIMIT = 200;

    private final UndoHistory history;
    private final Consumer<String> say;
    private final ObjLongConsumer<Scene> revised;
    private final ReadOnlyObjectWrapper<Scene> scene = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyObjectWrapper<Path> file = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper();
    /** The units the loaded file gave values in, written back on saving. */
    private UnitTexts units = UnitTexts.none();
    private final ObservableSet<String> selection = FXCollections.observableSet();
    private long revision;

    /**
     * @param say     puts a message on the status line
     * @param revised told of each new scene and its revision before the scene property changes,
     *                so the scene's listeners find the rest of the editor already on it (it gets
     *                the new scene as its argument: {@link #scene()} is still the old one)
     */
    SceneDocument(Scene initial, Consumer<String> say, ObjLongConsumer<Scene> revised) {
        this.history = new UndoHistory(initial, UNDO_LIMIT);
        this.say = say;
        this.revised = revised;
        scene.set(initial);
        updateFlags();
    }

    /** Applies an edit; an edit the model rejects leaves the scene as it was and says why. */
    public boolean apply(String label, UnaryOperator<Scene> edit) {
        Scene next;
        try {
            next = edit.apply(scene());
        } catch (IllegalArgumentException | IllegalStateException e) {
            say.accept(label + " refused: " + e.getMessage());
            return false;
        }
        if (next.equals(scene())) {
            return false;
        }
        history.push(next, label);
        show(next);
        say.accept(label);
        return true;
    }

    /** Applies an edit that adds objects and selects what it added. */
    public boolean add(String label, UnaryOperator<Scene> edit) {
        Set<String> before = ids(scene());
        if (!apply(label, edit)) {
            return false;
        }
        Set<String> added = ids(scene());
        added.removeAll(before);
        select(added);
        return true;
    }

    public void undo() {
        if (history.canUndo()) {
            String label = history.undoLabel();
            show(history.undo());
            say.accept("Undone: " + label);
        }
    }

    public void redo() {
        if (history.canRedo()) {
            String label = history.redoLabel();
            show(history.redo());
            say.accept("Redone: " + label);
        }
    }

    /**
     * Replaces the whole scene (opened file, new scene, recovered work); history starts afresh.
     * {@code unsaved} marks recovered work that still needs saving. Through
     * {@link EditorViewModel#load}, which also takes the time back to the start.
     */
    void load(SceneWithUnits newScene, Path from, boolean unsaved) {
        history.reset(newScene.scene());
        if (unsaved) {
            history.markUnsaved();
        }
        units = newScene.units();
        file.set(from);
        selection.clear();
        show(newScene.scene());
    }

    /** The scene now with the units its file gave values in: what saving writes. */
    public SceneWithUnits withUnits() {
        return new SceneWithUnits(scene(), units);
    }

    /**
     * Records that {@code saved}, the very scene written, is now in {@code to}. The write may end
     * after further edits (they stay unsaved) or after another scene was opened (then nothing
     * changes and this returns false).
     */
    public boolean markSaved(Scene saved, Path to) {
        if (!history.markSaved(saved)) {
            return false;
        }
        file.set(to);
        updateFlags();
        return true;
    }

    private void show(Scene s) {
        selection.removeIf(id -> s.source(id).isEmpty() && s.conductor(id).isEmpty());
        revision++;
        revised.accept(s, revision);
        scene.set(s);
        updateFlags();
    }

    private void updateFlags() {
        dirty.set(history.isDirty());
        canUndo.set(history.canUndo());
        canRedo.set(history.canRedo());
        title.set(title(scene(), file(), isDirty()));
    }

    /** "• Scene name — file.json — Kinduct": the mark while unsaved, the file once there is one. */
    static String title(Scene s, Path file, boolean dirty) {
        String name = s.name().isBlank() ? "untitled" : s.name().strip();
        return (dirty ? "• " : "") + name + (file == null ? "" : " — " + file.getFileName()) + " — Kinduct";
    }

    // ---- selection ----

    /** Selects exactly {@code ids}. */
    public void select(Set<String> ids) {
        selection.retainAll(ids);
        selection.addAll(ids);
    }

    public void selectAll() {
        select(ids(scene()));
    }

    public void deleteSelection() {
        Set<String> ids = Set.copyOf(selection);
        if (!ids.isEmpty()) {
            apply("Delete " + ids.size() + " object(s)", s -> SceneEdits.delete(s, ids));
        }
    }

    /** Copies the selection, shifted by {@code offset} (metres). */
    public void duplicateSelection(Vec2 offset) {
        Set<String> ids = Set.copyOf(selection);
        if (!ids.isEmpty()) {
            apply("Duplicate", s -> SceneEdits.duplicate(s, ids, offset));
        }
    }

    /**
     * Turns the selection about its centre as the user sees it: at t &gt; t0 bodies may have moved
     * and turned since they were drawn.
     */
    public void rotateSelection(double angleRad, Placement seen) {
        Set<String> ids = Set.copyOf(selection);
        if (!ids.isEmpty()) {
            Vec2 c = SceneBounds.ofObjects(scene(), ids, seen).center();
            apply("Rotate", s -> SceneEdits.rotateAsSeen(s, ids, seen, c, angleRad));
        }
    }

    private static Set<String> ids(Scene s) {
        Set<String> ids = new HashSet<>();
        s.sources().stream().map(Source::id).forEach(ids::add);
        s.conductors().forEach(c -> ids.add(c.id()));
        return ids;
    }

    // ---- properties ----

    /** The scene shown (during {@code revised} still the one before). */
    public Scene scene() {
        return scene.get();
    }

    public ReadOnlyObjectProperty<Scene> sceneProperty() {
        return scene.getReadOnlyProperty();
    }

    /** The number of the scene shown, counting every scene shown since the document was made. */
    public long revision() {
        return revision;
    }

    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    public boolean isDirty() {
        return dirty.get();
    }

    /** The window's title: the scene's name, its file, and a mark while it has unsaved changes. */
    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    /** The file the scene was opened from or last saved to; null for a new scene or a demo. */
    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file.getReadOnlyProperty();
    }

    public Path file() {
        return file.get();
    }

    public ObservableSet<String> selection() {
        return selection;
    }
}
