package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.Sample;
import org.kinduct.solver.dynamics.Trajectory;
import org.kinduct.render.field.Evaluators;
import org.kinduct.render.field.TrajectoryEvaluator;

/** Playback of a scene with a free body shows the simulated motion, not the drawn pose. */
class FreePlaybackTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final double MASS_KG = Fixtures.CART_MASS_KG;
    private static final double STIFFNESS_N_PER_M = Fixtures.CART_SPRING_N_PER_M;
    private static final double V0_M_PER_S = Fixtures.CART_V0_M_PER_S;
    /** Positions from the integrator are good to about 1e-9 m (CoupledSimulation javadoc); allow for the sampling. */
    private static final double POSITION_TOL_M = 1e-7;
    private static final double CURRENT_REL_TOL = 1e-9;
    private static final long SEED = 20261202L;

    private static EditorViewModel vm(Scene s) {
        return new EditorViewModel(s, Evaluators.solver(), SAME_THREAD, SAME_THREAD);
    }

    @Test
    void aSpringHeldCartPlaysTheHarmonicMotionOfItsMassAndStiffness() {
        EditorViewModel vm = vm(Fixtures.springCart(false));
        double omega = Math.sqrt(STIFFNESS_N_PER_M / MASS_KG);
        SplittableRandom random = new SplittableRandom(SEED);
        for (int i = 0; i < 20; i++) {
            vm.seek(random.nextDouble(0, 0.5));
            double t = vm.snapshotProperty().get().tS();
            Pose p = vm.posesProperty().get().get("cart");
            assertNotNull(p, "seed " + SEED + ": the free body has a simulated pose");
            // Undamped harmonic oscillator from rest length with speed v0: x = (v0/ω)·sin ωt
            // (Taylor, Classical Mechanics, 2005, eqs. 5.5 and 5.11).
            assertEquals(V0_M_PER_S / omega * Math.sin(omega * t), p.offset().x(), POSITION_TOL_M,
                    "seed " + SEED + ", t = " + t);
            assertEquals(V0_M_PER_S * Math.cos(omega * t), p.velocity().x(), POSITION_TOL_M * omega,
                    "seed " + SEED + ", t = " + t);
            assertEquals(0, p.offset().y(), POSITION_TOL_M);
        }
    }

    @Test
    void posesBetweenSamplesFollowTheSameMotion() {
        Scene s = Fixtures.springCart(false);
        TrajectoryEvaluator ev = new TrajectoryEvaluator(s);
        double omega = Math.sqrt(STIFFNESS_N_PER_M / MASS_KG);
        SplittableRandom random = new SplittableRandom(SEED + 1);
        for (int i = 0; i < 50; i++) {
            double t = random.nextDouble(0, 0.5);  // the run reaches past t1 by half a step
            // Same closed form as above (Taylor 2005, eq. 5.11); cubic Hermite error ~ (ωh)⁴·A/384, far below this.
            assertEquals(V0_M_PER_S / omega * Math.sin(omega * t), ev.posesAt(t).get("cart").offset().x(),
                    POSITION_TOL_M, "seed " + (SEED + 1) + ", t = " + t);
        }
    }

    @Test
    void playbackWithAnInductiveLoopShowsTheCoupledRunAndItsEnergyAudit() {
        Scene s = Fixtures.springCart(true);
        EditorViewModel vm = vm(s);
        TimeSpan span = s.time();
        double step = TrajectoryEvaluator.stepS(span);
        Trajectory run = CoupledSimulation.run(s, span.t0S(), span.t1S() + step / 2, step);
        assertFalse(vm.simulatingProperty().get());
        for (int i : new int[] {0, 37, 125, run.samples().size() - 1}) {
            Sample sample = run.samples().get(i);
            vm.seek(sample.tS());
            assertEquals(sample.tS(), vm.snapshotProperty().get().tS(), 1e-12);
            Pose p = vm.posesProperty().get().get("cart");
            assertTrue(p.offset().eq(sample.pose("cart").offset(), POSITION_TOL_M), "t = " + sample.tS());
            double expected = sample.conductor("loop").currentA();
            assertEquals(expected, vm.snapshotProperty().get().conductor("loop").orElseThrow().currentA(),
                    CURRENT_REL_TOL * Math.abs(expected) + 1e-15, "t = " + sample.tS());
        }
        assertEquals(run.samples().size(), vm.seriesProperty().get().size());
        EnergyAudit audit = vm.auditProperty().get().orElseThrow();
        assertEquals(run.audit().jouleJ(), audit.jouleJ(), 1e-9 * Math.abs(run.audit().jouleJ()));
    }

    @Test
    void aSceneWithoutFreeBodiesHasNoAuditAndNoIntegratedPoses() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet());
        vm.seek(0.3);
        assertTrue(vm.posesProperty().get().isEmpty());
        assertTrue(vm.auditProperty().get().isEmpty());
    }
}
