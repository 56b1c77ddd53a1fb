package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;

class PropertySheetTest {

    private static final double TOL = 1e-15;

    private static Property find(List<Property> props, String label) {
        return props.stream().filter(p -> p.label().startsWith(label)).findFirst().orElseThrow(
                () -> new AssertionError("no property '" + label + "' in " + props.stream().map(Property::label).toList()));
    }

    private static Scene set(Scene s, List<Property> props, String label, String text) {
        return find(props, label).check(s, text).apply(s);
    }

    @Test
    void lengthsAndFluxDensitiesAcceptTheirUnits() {
        Scene s = Fixtures.loopAndMagnet();
        Scene t = set(s, PropertySheet.of(s, "magnet"), "Size x", "12 mm");
        t = set(t, PropertySheet.of(t, "magnet"), "Remanence", "0.5 G");
        Source.BlockMagnet m = (Source.BlockMagnet) t.source("magnet").orElseThrow();
        assertEquals(0.012, m.sizeXM(), TOL);
        // 1 G = 1e-4 T (SI Brochure, 9th ed., Table 9, non-SI CGS units).
        assertEquals(0.5e-4, m.remanenceT(), TOL);
    }

    @Test
    void aMagnetTurnedOntoTheYAxisShowsItsCentreOnTheAxis() {
        // Turning (0.1 m, 0) a quarter turn about the origin gives (0, 0.1 m); in floating point
        // x is 0.1·cos(π/2) ≈ 6e-18 m, rounding noise beside the 0.1 m the centre lies out.
        Scene s = Fixtures.loopAndMagnet();
        Scene t = SceneEdits.rotateAsSeen(s, Set.of("magnet"), Placement.of(s, 0), Vec2.ZERO, Math.PI / 2);
        List<Property> props = PropertySheet.of(t, "magnet");
        assertEquals("0.000 m", find(props, "Centre x").text());
        assertEquals("100.0 mm", find(props, "Centre y").text());
    }

    @Test
    void wrongDimensionIsRefusedWithTheReason() {
        Scene s = Fixtures.loopAndMagnet();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> find(PropertySheet.of(s, "magnet"), "Size x").check(s, "12 mT"));
        assertTrue(e.getMessage().contains("length"), e.getMessage());
    }

    @Test
    void outOfRangeValuesAreRefusedNotClamped() {
        Scene s = Fixtures.loopAndMagnet();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> find(PropertySheet.of(s, "magnet"), "Size x").check(s, "-3 mm"));
        assertTrue(e.getMessage().startsWith("size x must be at least 1 nm, got -0.003 m"), e.getMessage());
        IllegalArgumentException turns = assertThrows(IllegalArgumentException.class,
                () -> find(PropertySheet.of(s, "loop"), "Turns").check(s, "2.5"));
        assertTrue(turns.getMessage().contains("whole number"), turns.getMessage());
    }

    @Test
    void choicesSwitchPolesAndOpenTheLoop() {
        Scene s = Fixtures.loopAndMagnet();
        Scene t = set(s, PropertySheet.of(s, "magnet"), "Poles", PropertySheet.NORTH.get(1));
        assertEquals(Source.Magnetization.MINUS_Z, ((Source.BlockMagnet) t.source("magnet").orElseThrow()).magnetization());
        t = set(t, PropertySheet.of(t, "loop"), "Circuit", PropertySheet.GAP.get(1));
        assertTrue(((Conductor.Loop) t.conductor("loop").orElseThrow()).open());
    }

    @Test
    void sceneTimeWindowIsEditableWhenNothingIsSelected() {
        Scene s = Fixtures.loopAndMagnet();
        Scene t = set(s, PropertySheet.of(s, null), "End time", "250 ms");
        assertEquals(0.25, t.time().t1S(), TOL);
        assertThrows(IllegalArgumentException.class,
                () -> find(PropertySheet.of(s, null), "End time").check(s, "-1 s"));
    }

    @Test
    void choosingAMotionPutsAFixedObjectOnItsOwnBody() {
        Scene s = Fixtures.loopAndMagnet();
        Scene t = set(s, MotionSheet.of(s, "loop"), "Motion", "glide");
        String body = SceneEdits.bodyOf(t, "loop");
        assertNotEquals(Body.FIXED, body);
        t = set(t, MotionSheet.of(t, "loop"), "Velocity", "0.25 m/s, -10 mm/s");
        assertEquals(new Motion.Glide(new Vec2(0.25, -0.01)), t.body(body).orElseThrow().motion());
        // The pivot of the new body is the loop's centre (40 mm × 20 mm loop at the origin).
        assertTrue(t.body(body).orElseThrow().pivot().eq(new Vec2(0.02, 0.01), TOL));
    }

    @Test
    void everyPrescribedMotionCanBeChosenAndEdited() {
        Scene s = Fixtures.loopAndMagnet();
        for (String kind : MotionSheet.KINDS) {
            Scene t = set(s, MotionSheet.of(s, "magnet"), "Motion", kind);
            Motion m = t.body(SceneEdits.bodyOf(t, "magnet")).orElseThrow().motion();
            assertEquals(kind, MotionSheet.kindOf(m));
        }
        Scene osc = set(s, MotionSheet.of(s, "magnet"), "Motion", "oscillate");
        osc = set(osc, MotionSheet.of(osc, "magnet"), "Frequency", "50 Hz");
        Motion.Oscillate o = (Motion.Oscillate) osc.body(SceneEdits.bodyOf(osc, "magnet")).orElseThrow().motion();
        assertEquals(50, o.frequencyHz(), TOL);
    }

    @Test
    void pathKeysAreTypedWithUnits() {
        Scene s = set(Fixtures.loopAndMagnet(), MotionSheet.of(Fixtures.loopAndMagnet(), "loop"), "Motion", "path keys");
        Scene t = set(s, MotionSheet.of(s, "loop"), "Keys", "0 s, 0 mm, 0 mm, 0 deg; 0.5 s, 30 mm, 0 mm, 90 deg");
        Motion m = t.body(SceneEdits.bodyOf(t, "loop")).orElseThrow().motion();
        Motion.Path p = assertInstanceOf(Motion.Path.class, m);
        assertEquals(2, p.keys().size());
        assertEquals(Math.PI / 2, p.keys().get(1).angleRad(), 1e-12);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> find(MotionSheet.of(s, "loop"), "Keys").check(s, "0 s, 1 mm"));
        assertTrue(e.getMessage().contains("key 1"), e.getMessage());
    }

    @Test
    void backgroundFieldIsEditedWithTheScene() {
        Scene s = ShapeFactory.addBackground(Fixtures.loopAndMagnet());
        Scene t = set(s, PropertySheet.of(s, null), "“background”", "-30 µT");
        assertEquals(-30e-6, ((Source.UniformField) t.source("background").orElseThrow()).bzT(), 1e-18);
    }
}
