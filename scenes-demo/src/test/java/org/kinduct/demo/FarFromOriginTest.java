package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * The same arrangement 131 km from (0, 0) gives the same results: physics does not depend on
 * where the origin is (translation invariance; common practice). Coordinates are put on a grid of
 * 2^-20 m and moved by 2^17 m, so the moved scene holds exactly the same geometry and any
 * difference is the solver's. Solved where drawn, the far copies differed by up to 9e-7 of the
 * peak EMF and lost the two-method check at up to 15 instants.
 */
class FarFromOriginTest {

    private static final double SHIFT_M = Math.scalb(1.0, 17);
    /** Solving the near scene about its own centre instead of (0, 0) changes results by 7e-10 of the peak. */
    private static final double SAME = 1e-9;

    @ParameterizedTest
    @ValueSource(strings = {"gradiometer", "carriage-pickup", "frame-brake"})
    void aSceneFarFromTheOriginGivesTheSameResults(String demo) {
        Scene near = Scenes.mapPositions(Demos.load(demo), p -> new Vec2(onGrid(p.x()), onGrid(p.y())));
        Scene far = Scenes.movedBy(near, new Vec2(SHIFT_M, SHIFT_M));

        RunResult a = new SceneRun(near).result();
        RunResult b = new SceneRun(far).result();

        double peak = 0;
        for (Snapshot s : a.samples()) {
            for (ConductorState c : s.conductors()) {
                peak = Math.max(peak, Math.abs(c.emfV()));
            }
        }
        assertEquals(a.samples().size(), b.samples().size());
        for (int i = 0; i < a.samples().size(); i++) {
            for (int c = 0; c < a.samples().get(i).conductors().size(); c++) {
                ConductorState x = a.samples().get(i).conductors().get(c);
                ConductorState y = b.samples().get(i).conductors().get(c);
                String where = demo + " " + x.id() + " at t = " + a.samples().get(i).tS();
                assertEquals(x.emfV(), y.emfV(), SAME * peak, where);
                assertEquals(Double.isNaN(x.disagreement()), Double.isNaN(y.disagreement()), where + ": check");
                if (x.kind() == ConductorState.Kind.LOOP) {
                    assertEquals(x.emfFluxV(), y.emfFluxV(), SAME * peak, where + ": flux rule");
                    assertEquals(x.currentA() * x.resistanceOhm(), y.currentA() * y.resistanceOhm(), SAME * peak,
                            where + ": current");
                }
                assertTrue(x.vertices().get(0).eq(y.vertices().get(0).minus(new Vec2(SHIFT_M, SHIFT_M)), 1e-9),
                        where + ": vertices where drawn");
            }
        }
    }

    private static double onGrid(double v) {
        return Math.scalb(Math.rint(Math.scalb(v, 20)), -20);
    }
}
