package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.run.RunFailedException;
import org.kinduct.solver.run.SceneRun;

/**
 * A plate drawn 100 km across with a magnet touching the plane (found by fuzzing: the fin-brake
 * scene with one corner dragged to (100 km, −100 km) and one stand-off set to 0): its cells are
 * hundreds of metres wide, and each cell face's field integral runs into the jump of B_z at the
 * magnet's edge; one instant would have taken hours. The instant's work allowance stops the run
 * with the reason.
 */
class HugePlateTouchingMagnetTest {

    @Test
    void anInstantBeyondItsWorkAllowanceStopsTheRunWithTheReason() {
        Scene fin = Demos.load("fin-brake");
        Scene huge = SceneValues.of(fin).write("fin.outline[1].x", 1e5);
        huge = SceneValues.of(huge).write("fin.outline[1].y", -1e5);
        huge = SceneValues.of(huge).write("magnet-2.standoff", 0);
        Scene oneInstant = SceneValues.of(huge).write("time.t1", huge.time().t0S() + huge.time().dtS());
        RunFailedException stopped = assertThrows(RunFailedException.class, () -> new SceneRun(oneInstant).result());
        // Both instants go over; the first to do so (they run in parallel) is named.
        assertTrue(stopped.getMessage().matches("the instant at t = (0\\.00000|0\\.000500000) s would need more than"
                + " 1\\.0e\\+08 field evaluations .*"), stopped.getMessage());
    }
}
