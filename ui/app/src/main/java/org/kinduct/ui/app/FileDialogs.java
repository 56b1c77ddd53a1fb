package org.kinduct.ui.app;

import java.nio.file.Path;
import java.util.Optional;

/**
 * What the file actions ask the user: JavaFX dialogs in the editor ({@link FxFileDialogs}),
 * scripted answers in tests. Called on the UI thread; a dialog may wait for the user there (a
 * modal dialog keeps the window responsive), never for a file.
 */
interface FileDialogs {

    /** The answer to "save changes first?". */
    enum Unsaved { SAVE, DISCARD, CANCEL }

    /** The answer to an offer of work an earlier session left; {@code LATER} keeps it for the next start. */
    enum Recovery { RECOVER, DISCARD, LATER }

    /** A scene file to open, starting in {@code folder} (null: the system's choice). */
    Optional<Path> fileToOpen(Path folder);

    /** A field-map file (comma-separated x, y, B_z) to add, starting in {@code folder} (null: the system's choice). */
    Optional<Path> mapToOpen(Path folder);

    /** Where to save, starting in {@code folder} with {@code suggestedName}. */
    Optional<Path> fileToSave(Path folder, String suggestedName);

    /** The scene has unsaved changes that the next action would drop. */
    Unsaved unsavedChanges();

    /** Unsaved work of {@code origin} (null: a scene never saved), autosaved in {@code autosave}. */
    Recovery offerRecovery(Path autosave, Path origin);

    /** Shows what went wrong, with details fit to read (file, line, place at fault). */
    void error(String header, String details);
}
