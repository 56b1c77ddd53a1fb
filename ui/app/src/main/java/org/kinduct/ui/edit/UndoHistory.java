package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.kinduct.scene.Scene;

/**
 * Undo and redo as a list of immutable scenes with a cursor. Knows which entry was last saved,
 * so "unsaved changes" survives undoing back to the saved state.
 */
public final class UndoHistory {

    private record Entry(Scene scene, String label) {
    }

    private final int limit;
    private final List<Entry> entries = new ArrayList<>();
    private int index;
    private int savedIndex;

    public UndoHistory(Scene initial, int limit) {
        if (limit < 2) {
            throw new IllegalArgumentException("undo limit must be at least 2, got " + limit);
        }
        this.limit = limit;
        reset(initial);
    }

    /** Forgets all history; {@code scene} counts as saved. */
    public void reset(Scene scene) {
        entries.clear();
        entries.add(new Entry(Objects.requireNonNull(scene), "start"));
        index = 0;
        savedIndex = 0;
    }

    public Scene current() {
        return entries.get(index).scene();
    }

    /** Records {@code scene} after the current one, dropping anything that could have been redone. */
    public void push(Scene scene, String label) {
        while (entries.size() > index + 1) {
            entries.remove(entries.size() - 1);
        }
        if (savedIndex > index) {
            savedIndex = -1;
        }
        entries.add(new Entry(Objects.requireNonNull(scene), label));
        index++;
        if (entries.size() > limit) {
            entries.remove(0);
            index--;
            savedIndex--;
        }
    }

    public boolean canUndo() {
        return index > 0;
    }

    public boolean canRedo() {
        return index < entries.size() - 1;
    }

    /** Label of the edit that {@link #undo} would revert, or empty. */
    public String undoLabel() {
        return canUndo() ? entries.get(index).label() : "";
    }

    public String redoLabel() {
        return canRedo() ? entries.get(index + 1).label() : "";
    }

    public Scene undo() {
        if (!canUndo()) {
            throw new IllegalStateException("nothing to undo");
        }
        index--;
        return current();
    }

    public Scene redo() {
        if (!canRedo()) {
            throw new IllegalStateException("nothing to redo");
        }
        index++;
        return current();
    }

    /** Treats the current state as never saved (recovered work). */
    public void markUnsaved() {
        savedIndex = -1;
    }

    /**
     * Marks the entry holding {@code saved}, the very scene written, as the state on file: a save
     * finishes after its write, when the user may have edited on meanwhile. False, and nothing
     * marked, when no entry holds it any more (the history was reset or dropped it).
     */
    @SuppressWarnings("ReferenceEquality") // the very object written, not an equal scene elsewhere
    public boolean markSaved(Scene saved) {
        for (int i = entries.size() - 1; i >= 0; i--) {
            if (entries.get(i).scene() == saved) {
                savedIndex = i;
                return true;
            }
        }
        return false;
    }

    public boolean isDirty() {
        return savedIndex != index;
    }
}
