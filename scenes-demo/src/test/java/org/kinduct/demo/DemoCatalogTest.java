package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Scene;

/** Every demo loads, explains itself and asks the engineering question it answers. */
class DemoCatalogTest {

    static java.util.List<String> names() {
        return Demos.names();
    }

    @ParameterizedTest
    @MethodSource("names")
    void demoLoadsWithNameDescriptionAndQuestion(String name) {
        Scene scene = Demos.load(name);
        assertFalse(scene.name().isBlank(), name + " has no title");
        assertTrue(scene.description().length() > 120, name + " description is too short to explain the scenario");
        assertTrue(scene.description().contains("Question:"), name + " does not state its engineering question");
        assertFalse(scene.conductors().isEmpty(), name + " has no conductor");
        assertFalse(scene.sources().isEmpty(), name + " has no field source");
    }
}
