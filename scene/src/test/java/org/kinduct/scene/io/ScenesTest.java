package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;

/** Moving a scene moves every drawn position, and only those; reading them and moving them agree on which they are. */
class ScenesTest {

    private static final Vec2 BY = new Vec2(1e5, -2e5);

    @Test
    void movingASceneMovesEachOfItsPositionsByTheSameVector() {
        for (Scene scene : List.of(SampleScenes.everyVariant(), SampleScenes.random(new SplittableRandom(5)))) {
            Scene moved = Scenes.movedBy(scene, BY);

            assertEquals(Scenes.positions(scene).stream().map(p -> p.plus(BY)).toList(), Scenes.positions(moved));
            assertEquals(scene.time(), moved.time());
            assertEquals(scene.gravity(), moved.gravity());
        }
    }

    @Test
    void everyKindOfPositionIsFound() {
        // 8 pivots, 1 spring anchor, 4 + 4 outline points, 2 magnet and 1 coil centre, 1 field-map offset,
        // 3 + 4 + 3 + 3 vertices, 4 + 3 plate outline points, 3 × 2 channel ends.
        assertEquals(47, Scenes.positions(SampleScenes.everyVariant()).size());
        assertNotEquals(SampleScenes.everyVariant(), Scenes.movedBy(SampleScenes.everyVariant(), BY));
    }
}
