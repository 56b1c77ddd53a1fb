package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;

class PlacementTest {

    private static final double TOL = 1e-12;
    private static final SplittableRandom SEEDS = new SplittableRandom(4242L);

    @RepeatedTest(40)
    void drawnUndoesPlaceOnAMovingTurningBody() {
        long seed = SEEDS.nextLong();
        SplittableRandom r = new SplittableRandom(seed);
        Motion m = new Motion.Path(List.of(new Motion.Path.Key(0, Vec2.ZERO, 0),
                new Motion.Path.Key(1, new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1)), r.nextDouble(-7, 7))),
                Motion.Path.Blend.SMOOTH);
        Body b = new Body("b", "b", new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1)), m);
        Scene s = new Scene("p", "", List.of(b), List.of(), List.of(), new TimeSpan(0, 1, 0.1));
        Placement p = Placement.of(s, r.nextDouble(0, 1));
        Vec2 drawn = new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
        Vec2 now = p.place("b", List.of(drawn)).get(0);
        assertTrue(p.drawn("b", now).eq(drawn, TOL), "seed " + seed);
        Vec2 shift = new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
        Vec2 movedNow = p.place("b", List.of(drawn.plus(p.drawnShift("b", shift)))).get(0);
        assertTrue(movedNow.eq(now.plus(shift), TOL), "a drawn shift shows as the same shift now, seed " + seed);
    }
}
