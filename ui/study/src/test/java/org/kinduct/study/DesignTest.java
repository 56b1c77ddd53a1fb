package org.kinduct.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.scene.path.SceneValues;

/** Varied values, the points they make, and the parts a study splits into. */
class DesignTest {

    private static final SceneValues CARRIAGE = SceneValues.of(Demos.load("carriage-pickup"));

    @Test
    void rangesIncludeBothEndsExactlyAndLogRangesAreEvenInTheLogarithm() {
        Axis linear = Axis.parse("magnet-1.standoff=0.5 mm..3 mm:6", CARRIAGE);
        assertEquals(List.of(0.5e-3, 1e-3, 1.5e-3, 2e-3, 2.5e-3, 3e-3), linear.values());
        Axis log = Axis.parse("pickup.load=10 ohm..10 kohm:4:log", CARRIAGE);
        assertEquals(10, log.values().get(0));
        assertEquals(1e4, log.values().get(3));
        assertEquals(100, log.values().get(1), 1e-12);
        assertEquals(1000, log.values().get(2), 1e-12);
        assertTrue(log.log());
        assertEquals(List.of(100.0, 200.0, 300.0), Axis.parse("pickup.turns=100,200,300", CARRIAGE).values());
    }

    @Test
    void badAxesSayWhatIsWrong() {
        assertMessage("a range needs a count: FROM..TO:N", () -> Axis.parse("pickup.load=1 ohm..2 ohm", CARRIAGE));
        assertMessage("unknown spacing 'lin'", () -> Axis.parse("pickup.load=1 ohm..2 ohm:3:lin", CARRIAGE));
        assertMessage("log spacing needs both ends non-zero and of one sign",
                () -> Axis.parse("magnet-1.center.x=-1 mm..1 mm:3:log", CARRIAGE));
        assertMessage("pickup.turns takes whole numbers, and this gives 133.3",
                () -> Axis.parse("pickup.turns=100..200:4", CARRIAGE));
        assertMessage("expected PATH=FROM..TO:N", () -> Axis.parse("pickup.turns", CARRIAGE));
        assertMessage("pickup.load: expected a resistance such as '100 ohm', got '2 mm'",
                () -> Axis.parse("pickup.load=2 mm,3 mm", CARRIAGE));
    }

    @Test
    void aGridVariesTheFirstAxisSlowestAndPairedAxesGoSideBySide() {
        Axis a = Axis.parse("magnet-1.standoff=1 mm,2 mm", CARRIAGE);
        Axis b = Axis.parse("pickup.load=1 ohm,2 ohm,3 ohm", CARRIAGE);
        Design grid = new Design(List.of(a, b), Design.Mode.GRID);
        assertEquals(6, grid.size());
        assertEquals(List.of(1e-3, 3.0), List.of(grid.at(2)[0], grid.at(2)[1]));
        assertEquals(List.of(2e-3, 1.0), List.of(grid.at(3)[0], grid.at(3)[1]));
        Axis c = Axis.parse("pickup.turns=10,20", CARRIAGE);
        Design paired = new Design(List.of(a, c), Design.Mode.PAIRED);
        assertEquals(2, paired.size());
        assertEquals(List.of(2e-3, 20.0), List.of(paired.at(1)[0], paired.at(1)[1]));
        assertMessage("paired values need lists of one length", () -> new Design(List.of(a, b), Design.Mode.PAIRED));
        assertMessage("magnet-1.standoff is varied twice", () -> new Design(List.of(a, a), Design.Mode.GRID));
    }

    @Test
    void theShardsOfAStudyCoverEveryPointOnce() {
        List<Integer> seen = new ArrayList<>();
        for (int k = 1; k <= 4; k++) {
            Shard s = new Shard(k, 4);
            for (int p = 0; p < 1000; p++) {
                if (s.contains(p)) {
                    seen.add(p);
                }
            }
        }
        seen.sort(Integer::compare);
        for (int p = 0; p < 1000; p++) {
            assertEquals(p, seen.get(p));
        }
        assertEquals(new Shard(2, 4), Shard.parse(" 2/4 "));
        assertMessage("expected K/N", () -> Shard.parse("2 of 4"));
        assertMessage("1 ≤ K ≤ N", () -> Shard.parse("0/4"));
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(part), e.getMessage());
    }
}
