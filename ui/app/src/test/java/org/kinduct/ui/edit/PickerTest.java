package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.view.ViewTransform;

class PickerTest {

    private static final ViewTransform VIEW = new ViewTransform(0, 0, 1000, 800, 600);

    private static Optional<String> pickAt(Scene s, double t, double x, double y) {
        return Picker.pick(s, Placement.of(s, t), VIEW, VIEW.screenX(x), VIEW.screenY(y));
    }

    @Test
    void wireIsPickedNearItsLineNotInsideTheLoop() {
        Scene s = Fixtures.loopAndMagnet();
        assertEquals(Optional.of("loop"), pickAt(s, 0, 0.02, 0.003), "3 px from the bottom edge");
        assertEquals(Optional.empty(), pickAt(s, 0, 0.02, 0.01), "the middle of a loop is not the loop");
    }

    @Test
    void magnetIsPickedAnywhereInsideItsOutline() {
        assertEquals(Optional.of("magnet"), pickAt(Fixtures.loopAndMagnet(), 0, 0.103, 0.008));
    }

    @Test
    void pickingFollowsTheBodyAtTheCurrentTime() {
        Scene s = SceneEdits.setMotion(Fixtures.loopAndMagnet(), "magnet", new Motion.Glide(new Vec2(0.1, 0)),
                new Vec2(0.1, 0));
        assertEquals(Optional.of("magnet"), pickAt(s, 0.5, 0.15, 0), "moved 50 mm by t = 0.5 s");
        assertEquals(Optional.empty(), pickAt(s, 0.5, 0.1, 0));
    }

    @Test
    void vertexHandlesOnlyOfSelectedConductors() {
        Scene s = Fixtures.loopAndMagnet();
        Placement p = Placement.of(s, 0);
        double sx = VIEW.screenX(0.04) + 2;
        double sy = VIEW.screenY(0.02) - 2;
        assertTrue(Picker.vertex(s, p, VIEW, sx, sy, Set.of()).isEmpty());
        assertEquals(new Picker.VertexHit("loop", 2), Picker.vertex(s, p, VIEW, sx, sy, Set.of("loop")).orElseThrow());
    }

    @Test
    void pointInPolygonUsesEvenOddRule() {
        List<Vec2> square = List.of(new Vec2(0, 0), new Vec2(1, 0), new Vec2(1, 1), new Vec2(0, 1));
        assertTrue(Picker.contains(square, new Vec2(0.5, 0.5)));
        assertTrue(!Picker.contains(square, new Vec2(1.5, 0.5)));
    }
}
