package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.run.RunFailedException;
import org.kinduct.solver.run.SceneRun;

/**
 * A plate drawn as a sliver a million times longer than wide (found by fuzzing: the fin-brake
 * scene 1000 km out, one corner dragged to y = −273.15 m) has a grid its solver cannot converge
 * on: the run stops with the reason, naming the plate's trouble, instead of failing inside.
 */
class SliverPlateTest {

    @Test
    void aSliverPlateStopsTheRunWithTheReason() {
        Scene far = Scenes.movedBy(Demos.load("fin-brake"), new Vec2(-1e6, -1e6));
        Scene sliver = SceneValues.of(far).write("fin.outline[3].y", -273.15);
        Scene shortRun = SceneValues.of(sliver).write("time.t1", sliver.time().t0S() + 2 * sliver.time().dtS());
        RunFailedException stopped = assertThrows(RunFailedException.class, () -> new SceneRun(shortRun).result());
        assertTrue(stopped.getMessage().startsWith("a plate or channel cannot be solved: ")
                && stopped.getMessage().contains("nearly closed faces"), stopped.getMessage());
    }
}
