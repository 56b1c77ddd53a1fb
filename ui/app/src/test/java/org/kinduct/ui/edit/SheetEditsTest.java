package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;

/** Holes and electrodes on plates and channels as pure scene edits. */
class SheetEditsTest {

    private static final double TOL = 1e-12;

    /** A 60 mm × 40 mm plate with its lower left corner at the origin, and a channel along x at y = 0.1 m, 20 mm wide. */
    private static Scene plateAndChannel() {
        Conductor.Plate plate = new Conductor.Plate("plate", Body.FIXED, List.of(new Vec2(0, 0), new Vec2(0.06, 0),
                new Vec2(0.06, 0.04), new Vec2(0, 0.04)), List.of(), 0.002, ShapeFactory.PLATE_CONDUCTIVITY, List.of(),
                List.of(), OptionalDouble.empty());
        Conductor.Channel channel = new Conductor.Channel("duct", Body.FIXED, new Vec2(0, 0.1), new Vec2(0.1, 0.1),
                0.02, 0.01, 0.05, Conductor.Channel.Profile.PLUG, new MeanFlow.Steady(1), List.of(), List.of(),
                OptionalDouble.empty());
        return Scene.empty("sheets").withConductors(List.of(plate, channel));
    }

    private static Conductor.Sheet sheet(Scene s, String id) {
        return (Conductor.Sheet) s.conductor(id).orElseThrow();
    }

    private static final List<Vec2> HOLE = List.of(new Vec2(0.02, 0.01), new Vec2(0.04, 0.01), new Vec2(0.04, 0.03),
            new Vec2(0.02, 0.03));

    @Test
    void aHoleStrictlyInsideIsCutAndOneTouchingOrCrossingTheOutlineIsRefusedWithTheReason() {
        Scene s = SheetEdits.addHole(plateAndChannel(), "plate", HOLE);
        assertEquals(List.of(HOLE), sheet(s, "plate").holes());
        IllegalArgumentException crossing = assertThrows(IllegalArgumentException.class, () -> SheetEdits.addHole(
                plateAndChannel(), "plate", List.of(new Vec2(0.05, 0.01), new Vec2(0.07, 0.01), new Vec2(0.07, 0.03))));
        assertTrue(crossing.getMessage().startsWith("a hole must lie strictly inside plate 'plate'"),
                crossing.getMessage());
        // A vertex on the outline is not strictly inside.
        assertThrows(IllegalArgumentException.class, () -> SheetEdits.addHole(plateAndChannel(), "plate",
                List.of(new Vec2(0.02, 0), new Vec2(0.04, 0.01), new Vec2(0.03, 0.02))));
        assertThrows(IllegalArgumentException.class, () -> SheetEdits.addHole(s, "plate", HOLE),
                "a second hole on the first overlaps it");
        IllegalArgumentException channel = assertThrows(IllegalArgumentException.class,
                () -> SheetEdits.addHole(plateAndChannel(), "duct", HOLE));
        assertTrue(channel.getMessage().contains("channel"), channel.getMessage());
    }

    @Test
    void electrodesSnapOntoTheNearestEdgeIncludingAHolesAndTheSecondBringsThePair() {
        Scene s = SheetEdits.addHole(plateAndChannel(), "plate", HOLE);
        s = SheetEdits.addElectrode(s, "plate", new Vec2(0.03, 0.041), 0.002);
        s = SheetEdits.addElectrode(s, "plate", new Vec2(0.041, 0.02), 0.002);
        Conductor.Sheet plate = sheet(s, "plate");
        assertEquals("e1", plate.electrodes().get(0).name());
        assertTrue(plate.electrodes().get(0).at().eq(new Vec2(0.03, 0.04), TOL), "onto the top edge");
        assertTrue(plate.electrodes().get(1).at().eq(new Vec2(0.04, 0.02), TOL), "onto the hole's right edge");
        assertEquals(List.of(new Conductor.ElectrodePair("e1", "e2")), plate.pairs());
        Scene third = SheetEdits.addElectrode(s, "plate", new Vec2(0, 0.02), 0.002);
        assertEquals(3, sheet(third, "plate").electrodes().size());
        assertEquals(plate.pairs(), sheet(third, "plate").pairs(), "a third electrode adds no pair by itself");
    }

    @Test
    void aChannelsElectrodesGoOnItsWallsNotOnItsOpenEnds() {
        // Near the start's end cut, but nearer the lower wall than 3 mm: it lands on the wall.
        Scene s = SheetEdits.addElectrode(plateAndChannel(), "duct", new Vec2(0.001, 0.092), 0.005);
        Vec2 at = sheet(s, "duct").electrodes().get(0).at();
        assertTrue(at.eq(new Vec2(0.001, 0.09), TOL), "on the lower wall: " + at);
        // The middle of the end cut is 10 mm from either wall: too far.
        assertThrows(IllegalArgumentException.class,
                () -> SheetEdits.addElectrode(plateAndChannel(), "duct", new Vec2(-0.001, 0.1), 0.005));
    }

    @Test
    void aClickAwayFromTheEdgeOrOnAWireIsRefused() {
        IllegalArgumentException far = assertThrows(IllegalArgumentException.class,
                () -> SheetEdits.addElectrode(plateAndChannel(), "plate", new Vec2(0.03, 0.02), 0.002));
        assertTrue(far.getMessage().contains("edge of 'plate'"), far.getMessage());
        Scene withWire = SceneEdits.addConductor(plateAndChannel(), new Conductor.Wire("w", Body.FIXED,
                List.of(Conductor.Vertex.at(0, -0.1), Conductor.Vertex.at(0.1, -0.1))));
        assertThrows(IllegalArgumentException.class,
                () -> SheetEdits.addElectrode(withWire, "w", new Vec2(0.05, -0.1), 0.002));
    }
}
