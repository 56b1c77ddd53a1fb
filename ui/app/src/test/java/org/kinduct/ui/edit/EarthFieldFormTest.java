package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;

/**
 * The Earth's-field dialog's model: it adds a field, updates the one a scene has, previews B_z as
 * the entries change and says which entry does not read. Expected B_z from the standard
 * geomagnetic element relations X = F·cos I·cos D, Z = F·sin I (Campbell, Introduction to
 * Geomagnetic Fields, 2nd ed., 2003, §1.2; from memory).
 */
class EarthFieldFormTest {

    @Test
    void addsTheFieldThenUpdatesIt() {
        Scene empty = Fixtures.loopAndMagnet();
        EarthFieldForm form = EarthFieldForm.of(empty);
        assertFalse(form.updates());
        // Level board facing up at F = 50 µT, I = 60°: B_z = −Z = −25·√3 µT.
        Scene added = form.with(List.of("50 uT", "60 deg", "0 deg", "0 deg", "0 deg"), "up").edit().apply(empty);
        Source.UniformField earth = (Source.UniformField) added.source("earth").orElseThrow();
        assertEquals(-25 * Math.sqrt(3) * 1e-6, earth.bzT(), 1e-12 * 50e-6);

        EarthFieldForm again = EarthFieldForm.of(added);
        assertTrue(again.updates());
        assertEquals(List.of("50 uT", "60 deg", "0 deg", "0 deg", "0 deg"), again.texts());
        assertEquals(added, again.edit().apply(added), "opening and confirming changes nothing");
        // Heading 90° (+x east), north edge raised 30°: the normal leans south, B_z = −X·sin 30° − Z·cos 30° = −50 µT.
        Scene tilted = again.with(List.of("50 uT", "60 deg", "0 deg", "30 deg", "90 deg"), "up").edit().apply(added);
        assertEquals(added.sources().size(), tilted.sources().size(), "updated in place, not added");
        assertEquals(-50e-6, ((Source.UniformField) tilted.source("earth").orElseThrow()).bzT(), 1e-12 * 50e-6);
    }

    @Test
    void previewShowsBzOrWhatDoesNotRead() {
        EarthFieldForm form = EarthFieldForm.of(Fixtures.loopAndMagnet());
        assertEquals("B_z normal to the board: −50.0 µT (+ out of the screen)",
                form.with(List.of("50 uT", "60 deg", "0 deg", "30 deg", "90 deg"), "up").preview());
        EarthFieldForm wrong = form.with(List.of("50 mm", "60 deg", "0 deg", "0 deg", "0 deg"), "up");
        assertFalse(wrong.readable());
        assertTrue(wrong.preview().startsWith("Total intensity F"), wrong.preview());
    }

    @Test
    void propertiesEditTheElementsAndRefuseBzItself() {
        Scene s = EarthFieldForm.of(Fixtures.loopAndMagnet())
                .with(List.of("50 uT", "60 deg", "0 deg", "0 deg", "90 deg"), "up").edit().apply(Fixtures.loopAndMagnet());
        List<Property> props = PropertySheet.of(s, null);
        Property tilt = props.stream().filter(p -> p.label().equals("“earth”: Board tilt")).findFirst().orElseThrow();
        Scene t = tilt.check(s, "30 deg").apply(s);
        // As above: heading 90°, north edge raised 30°, the normal points against the field: B_z = −F.
        assertEquals(-50e-6, ((Source.UniformField) t.source("earth").orElseThrow()).bzT(), 1e-12 * 50e-6);
        Property bz = props.stream().filter(p -> p.label().startsWith("“earth”: B_z")).findFirst().orElseThrow();
        assertThrows(IllegalArgumentException.class, () -> bz.check(s, "-30 uT"));
    }

    @Test
    void tellsWhereTheElementsComeFrom() {
        assertTrue(EarthFieldForm.WHERE_TO_GET.contains("geomagnetic survey"));
    }
}
