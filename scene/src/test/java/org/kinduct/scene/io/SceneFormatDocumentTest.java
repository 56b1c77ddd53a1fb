package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Unit;

/** Keeps docs/scene-format.md true: its examples read, and its unit table lists every accepted unit. */
class SceneFormatDocumentTest {

    /** Surefire runs in the module folder; the document sits in the project's docs folder. */
    private static final Path DOCUMENT = Path.of("..", "docs", "scene-format.md");

    private static String text;

    @BeforeAll
    static void readDocument() throws IOException {
        text = Files.readString(DOCUMENT, StandardCharsets.UTF_8);
    }

    @Test
    void everyExampleIsAValidScene() {
        int examples = 0;
        for (int at = text.indexOf("```json\n"); at >= 0; at = text.indexOf("```json\n", at + 1)) {
            int start = at + "```json\n".length();
            String example = text.substring(start, text.indexOf("```", start));
            int number = ++examples;
            assertDoesNotThrow(() -> SceneJson.read(example, "scene-format.md example " + number));
        }
        // The pickup-coil scene at the top and the plate-and-channel scene under CONDUCTOR.
        assertTrue(examples >= 2, "examples found: " + examples);
    }

    @Test
    void sourceTableDescribesEverySourceKindTheReaderKnows() {
        for (String kind : new SceneReader(new ReadContext(SceneFolder.NONE)).sourceKinds()) {
            assertTrue(text.contains("| `" + kind + "` |"), "docs/scene-format.md has no row for source kind " + kind);
        }
    }

    @ParameterizedTest
    @EnumSource(value = Dimension.class, mode = EnumSource.Mode.EXCLUDE, names = "DIMENSIONLESS")
    void unitTableListsEveryAcceptedSpelling(Dimension d) {
        String label = d.noun().replaceFirst("^an? ", "");
        Optional<String> row = text.lines().filter(l -> l.startsWith("| " + label + " |")).findFirst();
        assertTrue(row.isPresent(), "no table row for " + label);
        List<String> listed = Arrays.asList(row.get().split("\\|")[3].replaceAll("\\([^)]*\\)", "").split(","));
        for (Unit u : d.units()) {
            for (String spelling : u.spellings()) {
                boolean asciiMicro = spelling.startsWith("u") && u.spellings().contains("µ" + spelling.substring(1));
                assertTrue(asciiMicro || listed.stream().anyMatch(s -> s.strip().equals(spelling)),
                        label + " row lacks '" + spelling + "': " + row.get());
            }
        }
    }
}
