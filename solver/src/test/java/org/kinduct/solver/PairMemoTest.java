package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Runs of variants of one scene sharing rigid pairs' integrals give the numbers a fresh run gives,
 * bit for bit, and integrate again only the pairs the change touches.
 */
class PairMemoTest {

    private static final int INSTANTS = 21;

    /** Two magnets on a carriage gliding past a still square loop; the second at {@code standoffM}. */
    private static Scene carriage(double standoffM) {
        Body carriage = new Body("carriage", "carriage", Vec2.ZERO, new Motion.Glide(new Vec2(0.2, 0)));
        List<Source> magnets = List.of(
                new Source.BlockMagnet("first", "carriage", new Vec2(-0.03, 0), 0.01, 0.01, 0.005, 0, 0.002,
                        Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z),
                new Source.BlockMagnet("second", "carriage", new Vec2(-0.015, 0.002), 0.01, 0.01, 0.005, 0.1,
                        standoffM, Source.Side.BELOW, 1.2, Source.Magnetization.MINUS_Z));
        Conductor.Loop loop = TestScenes.loop("pickup", Body.FIXED,
                TestScenes.points(-0.006, -0.006, 0.006, -0.006, 0.006, 0.006, -0.006, 0.006));
        return TestScenes.scene(List.of(carriage), magnets, List.of(loop));
    }

    private static List<Snapshot> series(Scene scene, PairMemo memo) {
        return new SceneSolver(scene, Kinematics.prescribed(scene), memo).series(0, 0.2, 0.2 / (INSTANTS - 1), false);
    }

    @Test
    void aVariantReusesTheUntouchedPairAndGivesTheSameBits() {
        PairMemo memo = new PairMemo();
        series(carriage(0.002), memo);
        assertEquals(2 * INSTANTS, memo.computed());
        assertEquals(0, memo.reused());

        List<Snapshot> shared = series(carriage(0.003), memo);

        assertEquals(series(carriage(0.003), PairMemo.NONE), shared, "every number of every instant, bit for bit");
        assertEquals(INSTANTS, memo.reused(), "the first magnet's pair at every instant");
        assertEquals(3 * INSTANTS, memo.computed(), "the second magnet's pair again at every instant");
    }

    @Test
    void aFullMemoKeepsNothingMoreAndStillGivesTheSameBits() {
        PairMemo full = new PairMemo(8); // the square's 8 numbers: the first pair of the first instant only
        series(carriage(0.002), full);
        List<Snapshot> shared = series(carriage(0.002), full);

        assertEquals(series(carriage(0.002), PairMemo.NONE), shared);
        assertEquals(1, full.reused());
    }
}
