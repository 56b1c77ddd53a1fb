package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/** When the editor's toolkit cannot start, the user is told what to install, not shown a stack trace. */
class GuiCommandTest {

    @Test
    void aMissingGtkLibraryIsNamedWithThePackageToInstall() {
        // As JavaFX reports it on Linux without GTK 3 (common practice: glass loads libgtk-3.so.0).
        Throwable failure = new RuntimeException("Application launch failed",
                new UnsatisfiedLinkError("Unable to load glass GTK library."));

        Optional<String> advice = GuiCommand.missingDesktopLibrary(failure);

        assertTrue(advice.isPresent());
        assertTrue(advice.get().contains("apt-get install libgtk-3-0"), advice.get());
        assertTrue(advice.get().contains("kinduct solve"), "points to the headless commands: " + advice.get());
    }

    @Test
    void otherFailuresAreNotMistakenForAMissingLibrary() {
        assertEquals(Optional.empty(), GuiCommand.missingDesktopLibrary(new IllegalStateException("scene is broken")));
    }
}
