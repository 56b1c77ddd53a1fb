package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;

class UndoHistoryTest {

    private final Scene a = Scene.empty("a");
    private final Scene b = Scene.empty("b");
    private final Scene c = Scene.empty("c");

    @Test
    void undoAndRedoWalkTheHistory() {
        UndoHistory h = new UndoHistory(a, 10);
        h.push(b, "to b");
        h.push(c, "to c");
        assertEquals("to c", h.undoLabel());
        assertSame(b, h.undo());
        assertSame(a, h.undo());
        assertFalse(h.canUndo());
        assertSame(b, h.redo());
        assertEquals("to c", h.redoLabel());
    }

    @Test
    void aNewEditDropsTheRedoBranch() {
        UndoHistory h = new UndoHistory(a, 10);
        h.push(b, "to b");
        h.undo();
        h.push(c, "to c");
        assertFalse(h.canRedo());
        assertSame(a, h.undo());
    }

    @Test
    void unsavedChangesFollowTheSavedEntryThroughUndo() {
        UndoHistory h = new UndoHistory(a, 10);
        assertFalse(h.isDirty());
        h.push(b, "to b");
        assertTrue(h.isDirty());
        assertTrue(h.markSaved(b));
        assertFalse(h.isDirty());
        h.undo();
        assertTrue(h.isDirty(), "back before the save differs from the file");
        h.redo();
        assertFalse(h.isDirty(), "back at the saved state");
        h.undo();
        h.push(c, "to c");
        h.undo();
        assertTrue(h.isDirty(), "the saved entry was discarded with the redo branch");
    }

    @Test
    void aSaveThatFinishesAfterAnEditMarksTheStateItWrote() {
        UndoHistory h = new UndoHistory(a, 10);
        h.push(b, "to b");
        h.push(c, "to c");
        assertTrue(h.markSaved(b), "b was written while the user went on to c");
        assertTrue(h.isDirty(), "c is not on file");
        h.undo();
        assertFalse(h.isDirty(), "b is");
    }

    @Test
    void aSaveOfAStateTheHistoryNoLongerHoldsMarksNothing() {
        UndoHistory h = new UndoHistory(a, 10);
        h.push(b, "to b");
        h.reset(c);
        assertFalse(h.markSaved(b), "another scene was opened meanwhile");
        assertFalse(h.isDirty(), "the opened scene stays as it was");
    }

    @Test
    void historyIsCappedAtItsLimit() {
        UndoHistory h = new UndoHistory(a, 3);
        h.push(b, "1");
        h.push(c, "2");
        h.push(a, "3");
        h.undo();
        h.undo();
        assertFalse(h.canUndo(), "only three entries are kept");
        assertSame(b, h.current());
    }

    @Test
    void undoWithNothingToUndoSaysSo() {
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> new UndoHistory(a, 5).undo());
        assertTrue(e.getMessage().contains("nothing to undo"));
    }
}
