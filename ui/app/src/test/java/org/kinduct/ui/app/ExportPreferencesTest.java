package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The export dialog's remembered choices survive a restart; damaged values fall back one by one. */
class ExportPreferencesTest {

    @TempDir
    Path home;

    @Test
    void savedChoicesLoadBackUnchanged() throws IOException {
        ExportPreferences chosen = new ExportPreferences(ExportPreferences.Format.FIELD_CSV, 2400, 600, true,
                home.resolve("figures"));

        chosen.save(home.resolve("sub"));

        assertEquals(chosen, ExportPreferences.load(home.resolve("sub")));
    }

    @Test
    void missingFileGivesTheDefaults() {
        assertEquals(ExportPreferences.defaults(), ExportPreferences.load(home.resolve("nowhere")));
    }

    @Test
    void unreadableValuesFallBackEachToItsDefault() throws IOException {
        Files.writeString(home.resolve(ExportPreferences.FILE_NAME),
                "format=TIFF\nwidth=12\ndpi=abc\nwholeScene=true\n");

        ExportPreferences p = ExportPreferences.load(home);

        ExportPreferences d = ExportPreferences.defaults();
        assertEquals(new ExportPreferences(d.format(), d.widthPx(), d.dpi(), true, null), p);
    }
}
