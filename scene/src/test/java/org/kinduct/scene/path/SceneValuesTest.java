package org.kinduct.scene.path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.io.SampleScenes;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.scene.units.Dimension;

/** Paths to scene values: every value is reachable, reads and writes round-trip, bad paths say what is near. */
class SceneValuesTest {

    private static final Scene EVERY = SampleScenes.everyVariant();

    @Test
    void everyFieldOfTheFileFormatHasAPathNamedAsInTheFile() {
        List<String> paths = SceneValues.of(EVERY).paths();
        for (String p : List.of("m1.standoff", "m1.size.x", "m1.size.z", "m1.angle", "m1.remanence", "m1.center.y",
                "m2.radius", "m2.height", "gap.outline[2].x", "gap.bz", "background.bz", "earth.earth.tilt", "earth.earth.intensity", "coil1.polygon[3].y", "coil1.turns",
                "coil1.z", "coil1.current.frequency", "coil2.circle.radius", "coil2.circle.center.x",
                "pickup.vertices[1].x", "pickup.turns", "pickup.wire.diameter", "pickup.load", "pickup.temperature",
                "probe.vertices[2].y", "carriage.pivot.x", "carriage.motion.velocity.x",
                "sled.motion.acceleration.y", "shaker.motion.amplitude", "rotor.motion.omega",
                "arm.motion.keys[1].offset.x", "arm.motion.keys[2].t", "bar.motion.springs[0].anchor.y",
                "bar.motion.springs[1].stiffness", "bar.motion.forceFrequency", "bar.motion.mass", "time.t1",
                "time.dt", "gravity.y", "scan.offset.x")) {
            assertTrue(paths.contains(p), p + " in " + paths);
        }
        // The second spring hangs on a body, not an anchor point; the fixed frame has no values.
        assertTrue(!paths.contains("bar.motion.springs[1].anchor.x") && paths.stream().noneMatch(p -> p.startsWith("fixed.")));
    }

    @Test
    void readsGiveTheRecordsValuesInSi() {
        SceneValues v = SceneValues.of(EVERY);
        assertEquals(2e-3, v.read("m1.standoff"));
        assertEquals(3e-3, v.read("m1.size.z"));
        assertEquals(50, v.read("pickup.turns"));
        assertEquals(0.5, v.read("carriage.motion.velocity.x"));
        assertEquals(-9.81, v.read("gravity.y"));
        assertEquals(Dimension.RESISTANCE, v.find("pickup.load").dimension());
        assertTrue(v.find("pickup.turns").whole());
    }

    @Test
    void writingAnEarthElementRecomputesBz() {
        Scene s = SceneValues.of(EVERY).write("earth.earth.tilt", 0.0);
        org.kinduct.scene.Source.UniformField u = (org.kinduct.scene.Source.UniformField) s.source("earth").orElseThrow();
        // Level, face down: B_z = +Z = F·sin I (the standard geomagnetic element relations; from memory).
        assertEquals(48e-6 * Math.sin(1.15), u.bzT(), 1e-12 * 48e-6);
        assertTrue(!SceneValues.of(EVERY).paths().contains("earth.bz"), "an Earth field's B_z is set by its elements");
    }

    @Test
    void writingADiameterReplacesTheGauge() {
        Scene s = SceneValues.of(EVERY).write("pickup.wire.diameter", 0.2e-3);
        org.kinduct.scene.Conductor.Loop loop = (org.kinduct.scene.Conductor.Loop) s.conductor("pickup").orElseThrow();
        assertEquals(0.2e-3, loop.wire().diameterM());
        assertEquals(null, loop.wire().awg());
    }

    static LongStream seeds() {
        return LongStream.range(0, 12);
    }

    /**
     * For every path of a random scene: writing the value read gives back an equal scene; writing
     * another value either makes a valid scene where exactly that value changed (and which the
     * file format reads back equal) or is refused with a message that starts with the path.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void everyPathRoundTripsOnRandomScenes(long seed) throws SceneFormatException {
        SplittableRandom r = new SplittableRandom(seed);
        Scene scene = SampleScenes.random(r);
        SceneValues values = SceneValues.of(scene);
        for (String path : values.paths()) {
            SceneValue v = values.find(path);
            double old = v.read(scene);
            assertEquals(scene, v.write(scene, old), "seed " + seed + ", " + path);
            double changed = v.whole() ? old + 1 + r.nextInt(3) : old * (1 + r.nextDouble(-0.5, 0.5)) + r.nextDouble(0, 1e-3);
            Scene edited;
            try {
                edited = v.write(scene, changed);
            } catch (IllegalArgumentException refused) {
                assertTrue(refused.getMessage().startsWith(path + " = "), refused.getMessage());
                continue;
            }
            assertEquals(changed, v.read(edited), "seed " + seed + ", " + path);
            SceneValues after = SceneValues.of(edited);
            assertEquals(values.paths(), after.paths());
            for (String other : values.paths()) {
                if (!other.equals(path)) {
                    assertEquals(values.read(other), after.read(other), "seed " + seed + ": writing " + path
                            + " changed " + other);
                }
            }
            assertEquals(edited, SceneJson.read(SceneJson.write(edited), "edited.json"), "seed " + seed + ", " + path);
        }
    }

    @Test
    void aMisspeltPathNamesTheNearestValidOnes() {
        SceneValues v = SceneValues.of(EVERY);
        assertMessage("no value 'm1.standof' in scene 'Every variant'; nearest: m1.standoff", () -> v.find("m1.standof"));
        assertMessage("nearest: pickup.turns", () -> v.find("pickup.turn"));
        assertMessage("nearest: pickup.vertices[3].x", () -> v.find("pickup.vertex[3].x"));
    }

    @Test
    void aPathFarFromAnyNamesWhatItsObjectHasOrTheNearestIds() {
        SceneValues v = SceneValues.of(EVERY);
        assertMessage("'pickup' has vertices[i].x, vertices[i].y, turns, wire.diameter, load, temperature",
                () -> v.find("pickup.colourOfTheInsulation"));
        assertMessage("nearest ids: carriage", () -> v.find("carriag.motion.speed.x"));
    }

    @Test
    void aValueThatBreaksARuleIsRefusedNamingThePathTheValueAndTheRule() {
        SceneValues v = SceneValues.of(EVERY);
        assertMessage("m1.standoff = −1.00 mm: stand-off must be zero or positive, got -0.001",
                () -> v.write("m1.standoff", -1e-3));
        assertMessage("pickup.turns = 12.5: pickup.turns takes a whole number", () -> v.write("pickup.turns", 12.5));
        assertMessage("time.t1 = 0.00 s: t1 must be after t0", () -> v.write("time.t1", 0));
        assertMessage("pickup.turns takes a whole number, got '12.5'", () -> v.find("pickup.turns").parse("12.5"));
        assertMessage("m1.standoff: expected a length such as '12 mm', got '2 mT' (mT is a unit of flux density)",
                () -> v.find("m1.standoff").parse("2 mT"));
    }

    @Test
    void unitStringsAreReadInTheValuesDimension() {
        SceneValue standoff = SceneValues.of(EVERY).find("m1.standoff");
        assertEquals(0.002, standoff.parse("2 mm"));
        assertEquals(0.0254, standoff.parse("1 in"));
    }

    @Test
    void idsWithDotsAreMatchedWhole() {
        Scene s = new Scene("dots", "", List.of(new Body("a", null, Vec2.ZERO, new org.kinduct.scene.Motion.Still())),
                List.of(new Source.UniformField("a.b", 1e-3)), List.of(), new TimeSpan(0, 1, 0.1));
        SceneValues v = SceneValues.of(s);
        assertEquals(1e-3, v.read("a.b.bz"));
        assertEquals(List.of("a.b.bz", "a.pivot.x", "a.pivot.y", "time.t0", "time.t1", "time.dt", "gravity.x",
                "gravity.y"), v.paths());
    }

    private static void assertMessage(String expectedPart, org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(expectedPart), "message: " + e.getMessage());
    }
}
