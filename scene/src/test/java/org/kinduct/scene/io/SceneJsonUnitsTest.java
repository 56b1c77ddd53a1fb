package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * Saving keeps the units a file was written in: a value read from "10 mm" is written back as
 * "10 mm" while it is unchanged, and an edited one in millimetres, exactly.
 */
class SceneJsonUnitsTest {

    /** A hand-written file: many units, spellings (u for µ, the Unicode minus) and every kind of place a value sits. */
    private static final String HAND_WRITTEN = """
            {
              "format": "kinduct-scene", "version": 1, "name": "by hand",
              "time": {"t0": "0 s", "t1": "0.2 s", "dt": "0.5 ms"},
              "gravity": [0, "-9.81 m/s^2"],
              "bodies": [
                {"id": "cart", "pivot": ["10 mm", "−2.5 mm"], "motion": {"kind": "glide", "velocity": ["3 km/h", 0]}},
                {"id": "rotor", "motion": {"kind": "spin", "omega": "600 rpm", "startAngle": "30 deg"}},
                {"id": "bob", "motion": {"kind": "free", "mass": "20 g", "damping": 0.01,
                  "springs": [{"anchor": ["0 mm", "50 mm"], "stiffness": "200 N/m", "restLength": "1 cm"}]}}
              ],
              "sources": [
                {"kind": "block-magnet", "id": "m", "center": ["0 mm", "0 mm"], "size": ["10 mm", "10 mm", "4 mm"],
                 "standoff": "1.5 mm", "remanence": "12.5 kG"},
                {"kind": "source-coil", "id": "coil", "circle": {"center": [0.05, 0], "radius": "20 mm"}, "turns": 10,
                 "z": "-2 mm", "current": {"amplitude": "500 mA", "frequency": "50 Hz", "phase": "90 deg"}},
                {"kind": "uniform-field", "id": "earth", "bz": "-45 uT"}
              ],
              "conductors": [
                {"kind": "loop", "id": "pickup", "body": "cart",
                 "vertices": [["-5 mm", "-5 mm"], ["5 mm", "-5 mm"], {"at": ["5 mm", "5 mm"], "body": "rotor"}, ["-5 mm", "5 mm"]],
                 "turns": 200, "wire": {"material": "copper", "diameter": "0.1 mm"}, "load": "10 kohm",
                 "temperature": "40 degC"}
              ]
            }
            """;

    @Test
    void aHandWrittenFileIsWrittenBackWithEveryUnitItWasGivenIn() throws SceneFormatException {
        SceneWithUnits read = SceneJson.readWithUnits(HAND_WRITTEN, "by-hand.json");
        assertTrue(read.units().paths().size() >= 30, "texts read: " + read.units().paths());

        String written = SceneJson.write(read);
        SceneWithUnits back = SceneJson.readWithUnits(written, "written.json");

        assertEquals(read.scene(), back.scene());
        for (String path : read.units().paths()) {
            assertEquals(read.units().text(path), back.units().text(path), path);
        }
        assertTrue(written.contains("\"standoff\": \"1.5 mm\"") && written.contains("\"bz\": \"-45 uT\""), written);
        assertTrue(written.contains("\"−2.5 mm\""), "the Unicode minus as given: " + written);
    }

    @Test
    void anEditedValueChangesOnlyItsOwnLineAndKeepsItsUnit() throws SceneFormatException {
        SceneWithUnits read = SceneJson.readWithUnits(HAND_WRITTEN, "by-hand.json");
        Scene edited = SceneValues.of(read.scene()).write("m.standoff", 0.0021);

        List<String> before = SceneJson.write(read).lines().toList();
        List<String> after = SceneJson.write(new SceneWithUnits(edited, read.units())).lines().toList();

        assertEquals(before.size(), after.size());
        List<String> changed = new ArrayList<>();
        for (int i = 0; i < before.size(); i++) {
            if (!before.get(i).equals(after.get(i))) {
                changed.add(before.get(i).strip() + " → " + after.get(i).strip());
            }
        }
        assertEquals(List.of("\"standoff\": \"1.5 mm\", → \"standoff\": \"2.1 mm\","), changed);
        assertEquals(edited, SceneJson.read(String.join("\n", after), "after.json"));
    }

    @Test
    void anEditedValueIsWrittenExactlyInItsUnitEvenWhereTheUnitNeedsManyDigits() {
        // 0.6 rad in degrees is 34.37746770784939…°: enough digits that it reads back to the same double.
        Optional<String> text = Units.exactly(0.6, Dimension.ANGLE, "deg");
        assertTrue(text.isPresent() && text.get().endsWith(" deg"), text.toString());
        assertEquals(0.6, Units.parse(text.get(), Dimension.ANGLE), 0);
        assertEquals(Optional.of("12.5 mm"), Units.exactly(0.0125, Dimension.LENGTH, "mm"));
        assertEquals(Optional.of("-45 uT"), Units.exactly(-45e-6, Dimension.FLUX_DENSITY, "uT"));
        assertEquals("uT", Units.unitOf("−45 uT"));
        assertEquals("", Units.unitOf("0.012"));
    }

    /**
     * Every number of a scene with every variant, given as a text: the writer must find each at
     * the path the reader recorded it under, or it would fall back to a bare number.
     */
    @Test
    void theWriterFindsTheTextOfEveryValueWhereTheReaderRecordedIt() throws SceneFormatException {
        String si = SceneJson.write(SampleScenes.everyVariant());
        // Doubles are written with a point or an exponent; whole numbers (version, turns, awg) stay numbers.
        String texts = Pattern.compile("(?<=[\\[\\s,:])(-?\\d+\\.\\d+(?:[eE][-+]?\\d+)?|-?\\d+[eE][-+]?\\d+)")
                .matcher(si).replaceAll("\"$1\"");
        SceneWithUnits read = SceneJson.readWithUnits(texts, "texts.json", SampleScenes.FOLDER);
        assertEquals(SampleScenes.everyVariant(), read.scene());

        String written = SceneJson.write(read);

        assertEquals(texts, written, "every value written as the text it was given in");
        assertFalse(read.units().paths().isEmpty());
    }
}
