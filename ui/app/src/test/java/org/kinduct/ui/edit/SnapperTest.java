package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;

class SnapperTest {

    private static final double TOL = 1e-12;
    private static final SplittableRandom SEEDS = new SplittableRandom(15L);

    @Test
    void nearbyVertexWinsOverGridAndAngle() {
        Snapper s = new Snapper(0.01, 0.002, true);
        Vec2 vertex = new Vec2(0.0123, 0.0456);
        Snapper.Snap snap = s.snap(new Vec2(0.0125, 0.0450), Vec2.ZERO, List.of(vertex));
        assertEquals(vertex, snap.point());
        assertEquals("vertex", snap.to());
    }

    @RepeatedTest(30)
    void continuingSegmentsSnapToFifteenDegreeStepsAndWholeGridLengths() {
        long seed = SEEDS.nextLong();
        SplittableRandom r = new SplittableRandom(seed);
        Snapper s = new Snapper(0.005, 1e-6, true);
        Vec2 from = new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1));
        Vec2 raw = from.plus(Vec2.polar(r.nextDouble(0.01, 0.2), r.nextDouble(-Math.PI, Math.PI)));
        Vec2 d = s.snap(raw, from, List.of()).point().minus(from);
        double steps = Math.atan2(d.y(), d.x()) / Snapper.ANGLE_STEP_RAD;
        assertEquals(Math.round(steps), steps, 1e-9, "seed " + seed);
        double lengths = d.length() / 0.005;
        assertEquals(Math.round(lengths), lengths, 1e-9, "seed " + seed);
    }

    @Test
    void firstPointSnapsToTheGrid() {
        Snapper.Snap snap = new Snapper(0.01, 0.001, true).snap(new Vec2(0.0149, -0.0251), null, List.of());
        assertTrue(snap.point().eq(new Vec2(0.01, -0.03), TOL));
        assertEquals("grid", snap.to());
    }

    @Test
    void withoutGridOrAnglesThePointIsKept() {
        Vec2 raw = new Vec2(0.0149, -0.0251);
        assertEquals(raw, new Snapper(0, 0.001, false).snap(raw, Vec2.ZERO, List.of()).point());
    }

    @Test
    void anAngleSnapAlongAnAxisKeepsTheOtherCoordinateExactly() {
        Snapper snap = new Snapper(0.005, 1e-6, true);
        Vec2 from = new Vec2(0.03, 0.02);
        Vec2 up = snap.snap(new Vec2(0.0302, 0.0451), from, List.of()).point();
        Vec2 left = snap.snap(new Vec2(0.0049, 0.0203), from, List.of()).point();
        assertEquals(0.03, up.x(), 0.0, "straight up: x unchanged to the last bit");
        assertEquals(0.02, left.y(), 0.0, "straight left: y unchanged to the last bit");
    }
}
