package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * A figure-eight whose lobes cannot be built as loops (found by fuzzing: the scene 1000 km out and
 * one corner moved to x = 2 147 483 647 m, so the crossing's corners round onto each other) still solves: the loop's
 * own EMF is the run's, and it simply has no rejection figure.
 */
class DegenerateLobesTest {

    @Test
    void aFigureEightWithLobesTheModelRefusesSolvesWithoutARejectionFigure() {
        Scene gradiometer = Demos.load("gradiometer");
        Scene far = Scenes.movedBy(gradiometer, new Vec2(1e6, 1e6));
        Scene stretched = SceneValues.of(far).write("figure-eight.vertices[3].x", 2147483647);
        stretched = SceneValues.of(stretched).write("time.t1", stretched.time().t0S() + 2 * stretched.time().dtS());
        RunResult run = new SceneRun(stretched).result();
        assertEquals(3, run.samples().size());
        assertTrue(run.alternatingPickup("figure-eight").isEmpty(), "no rejection figure");
        assertTrue(new SceneRun(gradiometer).result().alternatingPickup("figure-eight").isPresent(),
                "the drawn figure-eight has one");
    }
}
