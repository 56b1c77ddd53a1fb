package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunFailedException;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * A plate drawn as a sliver a million times longer than wide (found by fuzzing: the fin-brake
 * scene 1000 km out, one corner dragged to y = −273.15 m) has a grid on which the sheet solver's
 * iteration sits at the edge of converging: whether it reaches its tolerance within its budget
 * turns on the last bit of the magnets' field (two field kernels that differ by 2e-16 T tip it
 * either way). Either outcome is allowed, as in the fuzz test; failing inside is not: the run
 * stops with the reason naming the plate's trouble, or finishes with every plate number finite.
 */
class SliverPlateTest {

    @Test
    void aSliverPlateStopsTheRunWithTheReasonOrSolvesFinite() {
        Scene far = Scenes.movedBy(Demos.load("fin-brake"), new Vec2(-1e6, -1e6));
        Scene sliver = SceneValues.of(far).write("fin.outline[3].y", -273.15);
        Scene shortRun = SceneValues.of(sliver).write("time.t1", sliver.time().t0S() + 2 * sliver.time().dtS());
        RunResult result;
        try {
            result = new SceneRun(shortRun).result();
        } catch (RunFailedException stopped) {
            assertTrue(stopped.getMessage().startsWith("a plate or channel cannot be solved: ")
                    && stopped.getMessage().contains("nearly closed faces"), stopped.getMessage());
            return;
        }
        for (Snapshot s : result.samples()) {
            assertFalse(s.sheets().isEmpty(), "the fin is solved at t = " + s.tS());
            for (SheetState fin : s.sheets()) {
                double[] numbers = {fin.forceN().x(), fin.forceN().y(), fin.torqueNm(), fin.joulePowerW(),
                        fin.peakCurrentDensityAPerM2(), fin.magneticReynolds()};
                for (double n : numbers) {
                    assertTrue(Double.isFinite(n), fin + " at t = " + s.tS());
                }
            }
        }
    }
}
