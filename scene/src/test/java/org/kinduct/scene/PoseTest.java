package org.kinduct.scene;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Placing a drawn point and taking it back is the identity (rigid motion; common practice). */
class PoseTest {

    private static final double TOL = 1e-12;

    @Test
    void unplaceUndoesPlace() {
        long seed = 20261202L;
        SplittableRandom r = new SplittableRandom(seed);
        for (int i = 0; i < 200; i++) {
            Pose pose = new Pose(new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1)),
                    new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1)), r.nextDouble(-7, 7), Vec2.ZERO, 0);
            Vec2 drawn = new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
            Vec2 back = pose.unplace(pose.place(drawn));
            assertTrue(back.eq(drawn, TOL), "seed " + seed + ", case " + i + ": " + drawn + " came back as " + back);
        }
    }
}
