package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneFolder;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.scene.io.SceneWithUnits;

/** Saving a demo writes every value in the unit its file gives it in, and reads back as the same scene. */
class DemoUnitsRoundTripTest {

    static java.util.List<String> names() {
        return Demos.names();
    }

    @ParameterizedTest
    @MethodSource("names")
    void everyUnitTextOfTheDemoSurvivesASave(String name) throws IOException, SceneFormatException {
        String resource = Demos.resource(name).orElseThrow();
        String text;
        try (InputStream in = Demos.class.getResourceAsStream(resource)) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        // Field maps are read beside the demo's resource, on reading and on reading back.
        SceneFolder folder = SceneFolder.ofResource(Demos.class, resource);
        SceneWithUnits read = SceneJson.readWithUnits(text, resource, folder);
        assertFalse(read.units().paths().isEmpty(), name + " gives its values with units");

        SceneWithUnits back = SceneJson.readWithUnits(SceneJson.write(read), name + " saved", folder);

        assertEquals(read.scene(), back.scene());
        for (String path : read.units().paths()) {
            assertEquals(read.units().text(path), back.units().text(path), name + " at " + path);
        }
    }
}
