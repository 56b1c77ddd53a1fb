package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;

class SceneEditsTest {

    private static final double GEOMETRY_TOL = 1e-12;

    @Test
    void translateMovesOnlyTheChosenObjects() {
        Scene s = Fixtures.loopAndMagnet();
        Scene moved = SceneEdits.translate(s, Set.of("loop"), new Vec2(0.01, -0.02));
        assertTrue(moved.conductor("loop").orElseThrow().vertices().get(2).at().eq(new Vec2(0.05, 0), GEOMETRY_TOL));
        assertEquals(s.source("magnet"), moved.source("magnet"));
    }

    @Test
    void rotatingAMagnetTurnsItsCentreAndItsAxis() {
        Scene s = Fixtures.loopAndMagnet();
        Scene turned = SceneEdits.rotateAsSeen(s, Set.of("magnet"), Placement.of(s, 0), Vec2.ZERO, Math.PI / 2);
        Source.BlockMagnet m = (Source.BlockMagnet) turned.source("magnet").orElseThrow();
        assertTrue(m.center().eq(new Vec2(0, 0.1), GEOMETRY_TOL));
        assertEquals(Math.PI / 2, m.angleRad(), GEOMETRY_TOL);
    }

    @Test
    void duplicatesGetFreshIds() {
        Scene s = Fixtures.loopAndMagnet();
        Scene twice = SceneEdits.duplicate(SceneEdits.duplicate(s, Set.of("loop"), new Vec2(0, 0.05)),
                Set.of("loop"), new Vec2(0, 0.1));
        assertEquals(3, twice.conductors().size());
        assertTrue(twice.conductor("loop-2").isPresent());
        assertTrue(twice.conductor("loop-3").isPresent());
    }

    @Test
    void givingAFixedObjectMotionCreatesItsOwnBody() {
        Scene s = Fixtures.loopAndMagnet();
        Motion glide = new Motion.Glide(new Vec2(0.5, 0));
        Scene moving = SceneEdits.setMotion(s, "loop", glide, new Vec2(0.02, 0.01));
        String body = SceneEdits.bodyOf(moving, "loop");
        assertNotEquals(Body.FIXED, body);
        assertEquals(glide, moving.body(body).orElseThrow().motion());
        assertEquals(Body.FIXED, SceneEdits.bodyOf(moving, "magnet"), "other objects stay put");
        Motion spin = new Motion.Spin(3, 0);
        Scene respun = SceneEdits.setMotion(moving, "loop", spin, Vec2.ZERO);
        assertEquals(spin, respun.body(body).orElseThrow().motion(), "the existing body changes its motion");
        assertEquals(moving.bodies().size(), respun.bodies().size());
    }

    @Test
    void movingAVertexOntoItsNeighbourIsRefusedByTheModel() {
        Scene s = Fixtures.loopAndMagnet();
        Scene ok = SceneEdits.moveVertex(s, "loop", 1, new Vec2(0.05, 0));
        assertTrue(ok.conductor("loop").orElseThrow().vertices().get(1).at().eq(new Vec2(0.05, 0), 0));
        assertThrows(IllegalArgumentException.class, () -> SceneEdits.moveVertex(s, "nope", 0, Vec2.ZERO));
    }

    @Test
    void deleteRemovesSourcesAndConductors() {
        Scene s = SceneEdits.delete(Fixtures.loopAndMagnet(), Set.of("loop", "magnet"));
        assertTrue(s.conductors().isEmpty() && s.sources().isEmpty());
    }
}
