package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;

/** The free-body fields of the motion editor and scene gravity, driven without a toolkit. */
class FreeMotionSheetTest {

    private static final double TOL = 1e-12;

    private static Property find(List<Property> props, String label) {
        return props.stream().filter(p -> p.label().startsWith(label)).findFirst().orElseThrow(
                () -> new AssertionError("no property '" + label + "' in " + props.stream().map(Property::label).toList()));
    }

    private static Scene set(Scene s, String object, String label, String text) {
        return find(MotionSheet.of(s, object), label).check(s, text).apply(s);
    }

    private static Motion.Free free(Scene s, String object) {
        return assertInstanceOf(Motion.Free.class, s.body(SceneEdits.bodyOf(s, object)).orElseThrow().motion());
    }

    private static Scene freeMagnet() {
        return set(Fixtures.loopAndMagnet(), "magnet", "Motion", "free (forces)");
    }

    @Test
    void choosingFreeGivesTheObjectABodyWithADefaultMassAtRest() {
        Motion.Free f = free(freeMagnet(), "magnet");
        assertEquals(FreeMotionSheet.DEFAULT_MASS_KG, f.massKg(), TOL);
        assertEquals(Vec2.ZERO, f.initialVelocity());
        assertTrue(f.springs().isEmpty());
    }

    @Test
    void everyScalarAndVectorFieldTakesItsUnits() {
        Scene s = freeMagnet();
        s = set(s, "magnet", "Mass", "35 g");
        s = set(s, "magnet", "Moment of inertia", "2 g*cm^2");
        s = set(s, "magnet", "Initial velocity", "0.5 m/s, -20 mm/s");
        s = set(s, "magnet", "Initial angular speed", "60 rpm");
        s = set(s, "magnet", "Damping", "0.25 N*s/m");
        s = set(s, "magnet", "Applied force (x, y)", "10 mN, 0");
        s = set(s, "magnet", "Applied force, sinusoidal", "0, 2 mN");
        s = set(s, "magnet", "Applied force frequency", "5 Hz");
        Motion.Free f = free(s, "magnet");
        assertEquals(0.035, f.massKg(), TOL);
        // 1 g·cm² = 1e-3 kg × 1e-4 m² = 1e-7 kg·m² (SI Brochure, 9th ed., prefixes).
        assertEquals(2e-7, f.inertiaKgM2(), 1e-20);
        assertTrue(f.initialVelocity().eq(new Vec2(0.5, -0.02), TOL));
        // 60 rpm = 2π rad/s (definition of the revolution).
        assertEquals(2 * Math.PI, f.initialOmegaRadPerS(), TOL);
        assertEquals(0.25, f.dampingNsPerM(), TOL);
        assertTrue(f.appliedForce().eq(new Vec2(0.01, 0), TOL));
        assertTrue(f.appliedAmplitude().eq(new Vec2(0, 0.002), TOL));
        assertEquals(5, f.appliedFrequencyHz(), TOL);
    }

    @Test
    void springsAreAddedEditedAndRemovedLineByLine() {
        Scene s = set(freeMagnet(), "magnet", "Add a spring", "0, 50 mm; 200 N/m; 20 mm");
        Motion.Free.Spring first = free(s, "magnet").springs().get(0);
        assertTrue(first.anchor().eq(new Vec2(0, 0.05), TOL));
        assertEquals(200, first.stiffnessNPerM(), TOL);
        assertEquals(0.02, first.restLengthM(), TOL);
        s = set(s, "loop", "Motion", "free (forces)");
        String loopBody = SceneEdits.bodyOf(s, "loop");
        s = set(s, "magnet", "Add a spring", loopBody + "; 1.5 N/mm; 0");
        Motion.Free.Spring second = free(s, "magnet").springs().get(1);
        assertEquals(loopBody, second.otherBody());
        assertNull(second.anchor());
        assertEquals(1500, second.stiffnessNPerM(), TOL);
        s = set(s, "magnet", "Spring 1", "");
        assertEquals(List.of(second), free(s, "magnet").springs());
        assertEquals(FreeMotionSheet.springText(second), find(MotionSheet.of(s, "magnet"), "Spring 1").text());
    }

    @Test
    void badInputIsRefusedWithTheReason() {
        Scene s = freeMagnet();
        IllegalArgumentException mass = assertThrows(IllegalArgumentException.class,
                () -> find(MotionSheet.of(s, "magnet"), "Mass").check(s, "-3 g"));
        assertTrue(mass.getMessage().contains("mass"), mass.getMessage());
        IllegalArgumentException spring = assertThrows(IllegalArgumentException.class,
                () -> find(MotionSheet.of(s, "magnet"), "Add a spring").check(s, "0, 0; 200 N/m"));
        assertTrue(spring.getMessage().contains("stiffness"), spring.getMessage());
        IllegalArgumentException body = assertThrows(IllegalArgumentException.class,
                () -> find(MotionSheet.of(s, "magnet"), "Add a spring").check(s, "nobody; 200 N/m; 0"));
        assertTrue(body.getMessage().contains("nobody"), body.getMessage());
    }

    @Test
    void gravityIsAScenePropertyWithUnits() {
        Scene s = Fixtures.loopAndMagnet();
        Scene t = find(PropertySheet.of(s, null), "Gravity").check(s, "0, -9.81 m/s^2").apply(s);
        assertTrue(t.gravity().eq(new Vec2(0, -9.81), TOL));
    }
}
