package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.solver.sheet.EddyModel;

/**
 * A plate whose own-field solve does not converge (found by fuzzing: the slotted brake plate at
 * 273 m/s, twelve times its characteristic speed) is solved in the resistive limit at that instant
 * and flagged, never a failed run; the solid plate beside it keeps its own field.
 */
class OwnFieldFallbackTest {

    @Test
    void aPlateWhoseOwnFieldSolveFailsIsFlaggedInTheResistiveLimit() {
        Scene fast = SceneValues.of(Demos.load("plate-brake")).write("carriage.motion.velocity.x", -273.15);
        fast = SceneValues.of(fast).write("time.t1", fast.time().t0S() + fast.time().dtS());
        Snapshot s = new SceneRun(fast).result().samples().get(0);
        SheetState slotted = s.sheet("slotted-plate").orElseThrow();
        assertEquals(EddyModel.RESISTIVE_LIMIT, slotted.model());
        assertTrue(slotted.beyondResistiveLimit(), "flagged: Rm " + slotted.magneticReynolds());
        assertEquals(EddyModel.SELF_FIELD, s.sheet("solid-plate").orElseThrow().model());
    }
}
