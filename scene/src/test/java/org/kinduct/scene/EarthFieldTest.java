package org.kinduct.scene;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;

/**
 * B_z of the Earth's field normal to a board, against cases worked by hand. Components
 * X = F·cos I·cos D, Y = F·cos I·sin D, Z = F·sin I (north, east, down): the standard relations of
 * the geomagnetic elements (Campbell, Introduction to Geomagnetic Fields, 2nd ed., 2003, §1.2;
 * from memory). The board geometry (which way a tilt turns the normal) is worked out in each case.
 */
class EarthFieldTest {

    private static final double DEG = Math.PI / 180;
    /** Rounding of a few sines and cosines of a 50 µT field. */
    private static final double TOL_T = 1e-12 * 50e-6;

    private static EarthField board(double fUT, double iDeg, double dDeg, double tiltDeg, double headingDeg,
                                    EarthField.Face face) {
        return new EarthField(fUT * 1e-6, iDeg * DEG, dDeg * DEG, tiltDeg * DEG, headingDeg * DEG, face);
    }

    @Test
    void levelBoardFaceUpSeesMinusZ() {
        // F = 50 µT, I = 60°: Z = 50·sin 60° = 25·√3 µT down, so B_z (up) = −25·√3 µT, whatever the heading or D.
        assertEquals(-25 * Math.sqrt(3) * 1e-6, board(50, 60, 0, 0, 0, EarthField.Face.UP).bzT(), TOL_T);
        assertEquals(-25 * Math.sqrt(3) * 1e-6, board(50, 60, 17, 0, 123, EarthField.Face.UP).bzT(), TOL_T);
    }

    @Test
    void verticalBoardFacingNorthSeesX() {
        // Heading 270° puts +x to the west; lifting the +y (south) edge by 90° turns the face to the north.
        // X = F·cos I·cos D = 50·½·cos 10° µT.
        assertEquals(25 * Math.cos(10 * DEG) * 1e-6, board(50, 60, 10, 90, 270, EarthField.Face.UP).bzT(), TOL_T);
    }

    @Test
    void verticalBoardFacingEastSeesY() {
        // Heading 0: +x north, +y west; lifting the west edge by 90° turns the face to the east. Y = 50·½·sin 10° µT.
        assertEquals(25 * Math.sin(10 * DEG) * 1e-6, board(50, 60, 10, 90, 0, EarthField.Face.UP).bzT(), TOL_T);
    }

    @Test
    void boardTiltedThirtyDegreesSouthFacesAgainstTheField() {
        // I = 60°, D = 0: the field points north, 60° below the horizontal. Heading 90° (+x east, +y north);
        // lifting the north edge by 30° leans the normal 30° from the vertical toward the south, exactly
        // against the field: B_z = −F. (Formula: −Z·cos 30° − X·sin 30° = −37.5 − 12.5 µT.)
        assertEquals(-50e-6, board(50, 60, 0, 30, 90, EarthField.Face.UP).bzT(), TOL_T);
    }

    @Test
    void boardTiltedFortyFiveDegreesEastWithDeclination() {
        // F = 40 µT, I = 45°, D = 30°: Y = 40·(√2/2)·½ = 10·√2, Z = 20·√2 µT. Heading 0 (+x north), the west
        // edge lifted 45°: normal (up + east)/√2, so B_z = (Y − Z)/√2 = −10 µT.
        assertEquals(-10e-6, board(40, 45, 30, 45, 0, EarthField.Face.UP).bzT(), TOL_T);
    }

    @Test
    void southernHemisphereFieldPointsUp() {
        // I = −60°: Z = −25·√3 µT (upward), so a level board facing up sees +25·√3 µT.
        assertEquals(25 * Math.sqrt(3) * 1e-6, board(50, -60, 0, 0, 0, EarthField.Face.UP).bzT(), TOL_T);
    }

    static LongStream seeds() {
        return new SplittableRandom(20261205).longs(20);
    }

    /** Turning the board over, about its x axis or about its y axis, or drawing it face down, negates B_z. */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void turningTheBoardOverNegatesBz(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double f = r.nextDouble(20e-6, 70e-6);
        double i = r.nextDouble(-Math.PI / 2, Math.PI / 2);
        double d = r.nextDouble(-Math.PI, Math.PI);
        double tilt = r.nextDouble(0, Math.PI / 2);
        double heading = r.nextDouble(0, 2 * Math.PI);
        double up = new EarthField(f, i, d, tilt, heading, EarthField.Face.UP).bzT();
        String why = "seed " + seed;
        assertEquals(-up, new EarthField(f, i, d, tilt, heading, EarthField.Face.DOWN).bzT(), TOL_T, why);
        assertEquals(-up, new EarthField(f, i, d, tilt + Math.PI, heading, EarthField.Face.UP).bzT(), TOL_T, why);
        assertEquals(-up, new EarthField(f, i, d, Math.PI - tilt, heading + Math.PI, EarthField.Face.UP).bzT(),
                TOL_T, why);
    }

    @Test
    void inclinationBeyondTheVerticalIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> board(50, 91, 0, 0, 0, EarthField.Face.UP));
        assertTrue(e.getMessage().contains("inclination"), e.getMessage());
    }

    private static String refusal(String source) {
        String text = "{\"format\": \"kinduct-scene\", \"version\": 1, \"sources\": [" + source + "]}";
        return assertThrows(SceneFormatException.class, () -> SceneJson.read(text, "t.json")).getMessage();
    }

    @Test
    void fileRefusesBzBesideTheElementsAndAnInclinationPastVertical() {
        String both = refusal("{\"kind\": \"uniform-field\", \"id\": \"e\", \"bz\": \"1 uT\","
                + " \"earth\": {\"intensity\": \"48 uT\", \"inclination\": \"66 deg\"}}");
        assertTrue(both.contains("either \"bz\" or \"earth\""), both);
        String steep = refusal("{\"kind\": \"uniform-field\", \"id\": \"e\","
                + " \"earth\": {\"intensity\": \"48 uT\", \"inclination\": \"100 deg\"}}");
        assertTrue(steep.contains("sources[0].earth") && steep.contains("inclination"), steep);
    }

    @Test
    void uniformFieldTakesItsValueFromTheElements() {
        EarthField e = board(48, 66, 2, 30, 90, EarthField.Face.UP);
        assertEquals(e.bzT(), Source.UniformField.earth("earth", e).bzT());
    }
}
