package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * Reads a hand-written file that uses unit strings and leaves optional fields out, and checks the
 * SI values against the unit definitions: inch 0.0254 m, mil 0.001 in, gauss 1e-4 T and
 * km/h = 1/3.6 m/s are exact (NIST Special Publication 811, 2008, Appendix B.8); degree π/180 rad,
 * standard gravity 9.80665 m/s² and T/K = t/°C + 273.15 from the SI Brochure, 9th ed. (2019).
 */
class SceneJsonReadTest {

    /** A few ulps, for conversions through π; decimal conversions are compared exactly. */
    private static final double RELATIVE_TOLERANCE = 1e-15;

    private static Scene scene;

    @BeforeAll
    static void readHandWrittenFile() throws IOException, SceneFormatException {
        try (InputStream in = SceneJsonReadTest.class.getResourceAsStream("hand-written.json")) {
            scene = SceneJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8), "hand-written.json");
        }
    }

    private static Motion motion(String body) {
        return scene.body(body).orElseThrow().motion();
    }

    private static void assertClose(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.abs(expected) * RELATIVE_TOLERANCE, what);
    }

    @Test
    void imperialLengthsAreExactInMetres() {
        assertEquals(new Vec2(0.0254, 0.0127), scene.body("carriage").orElseThrow().pivot());
        Source.CylinderMagnet m2 = (Source.CylinderMagnet) scene.source("m2").orElseThrow();
        assertEquals(0.00635, m2.radiusM());
        assertEquals(40 * 0.0000254, m2.standoffM(), Math.ulp(1.016e-3));
    }

    @Test
    void gaussConvertsToTesla() {
        assertEquals(-0.45e-4, ((Source.UniformField) scene.source("earth").orElseThrow()).bzT());
        assertEquals(1.2, ((Source.BlockMagnet) scene.source("m1").orElseThrow()).remanenceT());
    }

    @Test
    void speedsAnglesAndRatesConvertToSi() {
        assertEquals(new Vec2(1, 0), ((Motion.Glide) motion("carriage")).velocity());
        assertClose(600 * 2 * Math.PI / 60, ((Motion.Spin) motion("rotor")).omegaRadPerS(), "600 rpm");
        assertClose(Math.PI / 2, ((Source.BlockMagnet) scene.source("m1").orElseThrow()).angleRad(), "90 deg");
        Motion.Oscillate shaker = (Motion.Oscillate) motion("shaker");
        assertEquals(50, shaker.frequencyHz());
        assertEquals(0.002, shaker.amplitudeM());
        assertEquals(new Vec2(0, -9.80665), ((Motion.Accelerate) motion("drop")).acceleration());
    }

    @Test
    void gravityReadsInAccelerationUnits() throws SceneFormatException {
        // Standard gravity 9.80665 m/s² (SI Brochure, 9th ed., 2019), in two accepted spellings.
        Scene vertical = SceneJson.read("{\"format\": \"kinduct-scene\", \"version\": 1,"
                + " \"gravity\": [\"1.5 m/s2\", \"-9.80665 m/s^2\"]}", "gravity.json");

        assertClose(1.5, vertical.gravity().x(), "gravity x");
        assertClose(-9.80665, vertical.gravity().y(), "gravity y");
    }

    @Test
    void freeBodyQuantitiesConvertToSi() {
        Motion.Free bar = (Motion.Free) motion("bar");
        assertEquals(0.02, bar.massKg());
        assertEquals(2e-7, bar.inertiaKgM2());
        assertClose(Math.PI / 2, bar.initialOmegaRadPerS(), "90 deg/s");
        assertEquals(0.5, bar.dampingNsPerM());
        assertEquals(List.of(new Motion.Free.Spring(new Vec2(0, 0.05), null, 200, 0),
                new Motion.Free.Spring(null, "carriage", 50, 0.01)), bar.springs());
    }

    @Test
    void kelvinConvertsToCelsius() {
        assertEquals(20, ((Conductor.Loop) scene.conductor("pickup").orElseThrow()).temperatureC());
    }

    @Test
    void optionalFieldsTakeTheirDocumentedDefaults() {
        assertEquals(0, scene.time().t0S());
        assertEquals(0.5, scene.time().t1S());
        assertEquals(0.001, scene.time().dtS());
        assertEquals(Vec2.ZERO, scene.gravity());
        Body parked = scene.body("parked").orElseThrow();
        assertEquals(new Body("parked", "parked", Vec2.ZERO, new Motion.Still()), parked);
        assertEquals(0, ((Motion.Spin) motion("rotor")).startAngleRad());
        assertEquals(0, ((Motion.Oscillate) motion("shaker")).phaseRad());
        assertEquals(Vec2.ZERO, ((Motion.Accelerate) motion("drop")).initialVelocity());
        Motion.Path arm = (Motion.Path) motion("arm");
        assertEquals(Motion.Path.Blend.LINEAR, arm.blend());
        assertEquals(new Motion.Path.Key(0, Vec2.ZERO, 0), arm.keys().get(0));
        Source.BlockMagnet m1 = (Source.BlockMagnet) scene.source("m1").orElseThrow();
        assertEquals(Source.Side.BELOW, m1.side());
        assertEquals(Source.Magnetization.PLUS_Z, m1.magnetization());
        assertEquals(Body.FIXED, scene.source("gap").orElseThrow().body());
        Source.SourceCoil coil = (Source.SourceCoil) scene.source("coil").orElseThrow();
        assertEquals(new Source.Drive(0.5, 0, 50, 0), coil.drive());
        Conductor.Loop plain = (Conductor.Loop) scene.conductor("plain").orElseThrow();
        assertEquals(new Conductor.Loop("plain", Body.FIXED, plain.vertices(), 1, WireSpec.awg(Material.COPPER, 30),
                false, 0, 20), plain);
    }

    @Test
    void loopKeepsGaugeLoadAndVertexBodies() {
        Conductor.Loop pickup = (Conductor.Loop) scene.conductor("pickup").orElseThrow();
        assertEquals(WireSpec.awg(Material.COPPER, 36), pickup.wire());
        assertEquals(100, pickup.loadOhm());
        assertEquals(50, pickup.turns());
        assertEquals(new Conductor.Vertex(new Vec2(0.02, 0), "bar"), pickup.vertices().get(1));
        assertNull(pickup.vertices().get(0).body());
    }

    @Test
    void byteOrderMarkIsIgnored() throws SceneFormatException {
        Scene s = SceneJson.read("\uFEFF{\"format\": \"kinduct-scene\", \"version\": 1}", "bom.json");

        assertEquals(Scene.empty(""), s);
    }
}
