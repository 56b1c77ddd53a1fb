package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Work given an allowance stops once it goes over it, and only that work. */
class WorkTallyTest {

    @Test
    void workOverItsAllowanceStopsAndTheAllowanceEndsWithIt() {
        assertThrows(WorkTally.AllowanceExceededException.class, () -> WorkTally.within(100, () -> {
            WorkTally.add(60);
            WorkTally.add(60);
            return null;
        }));
        long before = WorkTally.onThisThread();
        WorkTally.add(1000);
        assertEquals(before + 1000, WorkTally.onThisThread(), "no allowance outside");
    }

    @Test
    void anInnerAllowanceCannotWidenTheOneAroundIt() {
        assertThrows(WorkTally.AllowanceExceededException.class, () -> WorkTally.within(100, () ->
                WorkTally.within(1_000_000, () -> {
                    WorkTally.add(150);
                    return null;
                })));
        assertEquals(7, WorkTally.within(100, () -> {
            WorkTally.add(100);
            return 7;
        }), "exactly the allowance is within it");
    }
}
