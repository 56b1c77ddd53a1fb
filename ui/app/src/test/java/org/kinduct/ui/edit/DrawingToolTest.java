package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

class DrawingToolTest {

    private static final double TOL = 1e-12;
    private static final Snapper NO_SNAP = new Snapper(0, 1e-9, false);

    private static List<Vec2> points(Conductor c) {
        return c.vertices().stream().map(Conductor.Vertex::at).toList();
    }

    @Test
    void clickingFourPointsAndFinishingMakesALoop() {
        DrawingTool t = new DrawingTool(ToolKind.LOOP);
        for (Vec2 p : List.of(new Vec2(0, 0), new Vec2(0.03, 0), new Vec2(0.03, 0.02), new Vec2(0, 0.02))) {
            assertTrue(t.click(p, NO_SNAP, List.of()).isEmpty(), "a polygon waits for Enter");
        }
        Scene s = t.finish().orElseThrow().apply(Scene.empty("t"));
        Conductor.Loop loop = (Conductor.Loop) s.conductors().get(0);
        assertEquals(4, loop.vertices().size());
        assertEquals(0.03 * 0.02, Polygons.signedArea(points(loop)), TOL, "shoelace area of the drawn rectangle");
    }

    @Test
    void clickingTheFirstVertexAgainClosesTheLoop() {
        DrawingTool t = new DrawingTool(ToolKind.LOOP);
        Snapper snap = new Snapper(0, 0.001, false);
        t.click(new Vec2(0, 0), snap, List.of());
        t.click(new Vec2(0.02, 0), snap, List.of());
        t.click(new Vec2(0.02, 0.02), snap, List.of());
        Optional<UnaryOperator<Scene>> done = t.click(new Vec2(0.0004, 0.0003), snap, t.points());
        assertTrue(done.isPresent());
        assertEquals(3, done.get().apply(Scene.empty("t")).conductors().get(0).vertices().size());
    }

    @Test
    void aClickThatSnapsOntoTheFirstVertexByAngleClosesTheLoopDespiteRounding() {
        // Grid 5 mm, reach too small for a vertex snap: the closing point comes from the 15° rule,
        // previous + polar(10 mm, −90°), whose x is off by cos(−90°)·10 mm ≈ 6e-19 m.
        DrawingTool t = new DrawingTool(ToolKind.LOOP);
        Snapper snap = new Snapper(0.005, 1e-6, true);
        t.click(new Vec2(0.0101, 0.0099), snap, List.of());
        t.click(new Vec2(0.0301, 0.0099), snap, List.of());
        t.click(new Vec2(0.0301, 0.0201), snap, List.of());
        t.click(new Vec2(0.0101, 0.0201), snap, List.of());
        Optional<UnaryOperator<Scene>> done = t.click(new Vec2(0.0104, 0.0102), snap, List.of());
        assertTrue(done.isPresent(), "closed, not a fifth vertex on top of the first: " + t.points());
        assertEquals(4, done.get().apply(Scene.empty("t")).conductors().get(0).vertices().size());
    }

    @Test
    void rectangleToolDrawsCounterClockwiseFromAnyCorners() {
        DrawingTool t = new DrawingTool(ToolKind.RECT_LOOP);
        t.click(new Vec2(0.05, 0.04), NO_SNAP, List.of());
        Scene s = t.click(new Vec2(0.01, 0.01), NO_SNAP, List.of()).orElseThrow().apply(Scene.empty("t"));
        double area = Polygons.signedArea(points(s.conductors().get(0)));
        assertEquals(0.04 * 0.03, area, TOL, "positive area means counter-clockwise (loop normal +z)");
    }

    @Test
    void typedLengthGoesTowardsTheCursor() {
        DrawingTool t = new DrawingTool(ToolKind.WIRE);
        t.click(new Vec2(0.01, 0.01), NO_SNAP, List.of());
        t.hover(new Vec2(0.01, 0.5), NO_SNAP, List.of());
        t.typed("25 mm");
        Scene s = t.finish().orElseThrow().apply(Scene.empty("t"));
        assertTrue(points(s.conductors().get(0)).get(1).eq(new Vec2(0.01, 0.035), TOL));
    }

    @Test
    void typedCoordinatesPlaceAPoint() {
        DrawingTool t = new DrawingTool(ToolKind.DISC_MAGNET);
        t.typed("0, 0");
        Scene s = t.typed("10 mm, 0").orElseThrow().apply(Scene.empty("t"));
        Source.CylinderMagnet m = (Source.CylinderMagnet) s.sources().get(0);
        assertEquals(0.01, m.radiusM(), TOL);
    }

    @Test
    void badTypedInputSaysWhatWasExpected() {
        DrawingTool t = new DrawingTool(ToolKind.WIRE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.typed("twelve"));
        assertTrue(e.getMessage().contains("length"), e.getMessage());
    }

    @Test
    void wireNeedsTwoPointsBeforeItCanFinish() {
        DrawingTool t = new DrawingTool(ToolKind.WIRE);
        t.click(new Vec2(0, 0), NO_SNAP, List.of());
        assertFalse(t.finish().isPresent());
    }

    @Test
    void newObjectsGetUniqueIds() {
        Scene s = Scene.empty("t");
        for (int i = 0; i < 3; i++) {
            DrawingTool t = new DrawingTool(ToolKind.ROUND_COIL);
            t.click(new Vec2(i, 0), NO_SNAP, List.of());
            s = t.click(new Vec2(i + 0.1, 0), NO_SNAP, List.of()).orElseThrow().apply(s);
        }
        assertEquals(List.of("coil", "coil-2", "coil-3"), s.sources().stream().map(Source::id).toList());
    }
}
