package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The font directory the editor hands JavaFX: every file that {@code logicalfonts.properties}
 * names is there, for every logical family (sans, serif, monospace) in every style JavaFX asks
 * for, so that no text falls back to a missing file on a machine without fonts (the headless tests
 * run on the same list, see ui/app/pom.xml).
 */
class ShippedFontsTest {

    @Test
    void everyFileTheListNamesIsCopiedForEveryFamilyAndStyle() throws IOException {
        Path dir = ShippedFonts.copied();
        Properties list = new Properties();
        try (Reader in = Files.newBufferedReader(dir.resolve("logicalfonts.properties"))) {
            list.load(in);
        }
        for (String family : new String[] {"sans", "serif", "monospace"}) {
            for (String style : new String[] {"regular", "bold", "italic", "bolditalic"}) {
                String file = list.getProperty(family + "." + style + ".0.file");
                assertTrue(file != null && Files.size(dir.resolve(file)) > 100_000, family + " " + style + ": " + file);
                assertTrue(list.getProperty(family + "." + style + ".0.font").startsWith("DejaVu Sans"), family + " " + style);
            }
        }
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(3, files.count(), "the two fonts and the list");
        }
    }
}
