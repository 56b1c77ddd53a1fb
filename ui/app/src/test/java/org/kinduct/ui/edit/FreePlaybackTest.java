package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/** Playback of a scene with a free body shows the simulated motion, not the drawn pose. */
class FreePlaybackTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final double MASS_KG = Fixtures.CART_MASS_KG;
    private static final double STIFFNESS_N_PER_M = Fixtures.CART_SPRING_N_PER_M;
    private static final double V0_M_PER_S = Fixtures.CART_V0_M_PER_S;
    /** Positions from the integrator are good to about 1e-9 m (CoupledSimulation javadoc); allow for the sampling. */
    private static final double POSITION_TOL_M = 1e-7;
    private static final long SEED = 20261202L;

    private static EditorViewModel vm(Scene s) {
        EditorViewModel vm = new EditorViewModel(s, SAME_THREAD, SAME_THREAD);
        vm.view().viewProperty().set(new ViewTransform(0.1, 0, 1000, 80, 60));
        return vm;
    }

    @Test
    void aSpringHeldCartPlaysTheHarmonicMotionOfItsMassAndStiffness() {
        EditorViewModel vm = vm(Fixtures.springCart(false));
        double omega = Math.sqrt(STIFFNESS_N_PER_M / MASS_KG);
        SplittableRandom random = new SplittableRandom(SEED);
        for (int i = 0; i < 20; i++) {
            vm.clock().seek(random.nextDouble(0, 0.5));
            Snapshot shown = vm.results().snapshot();
            double t = shown.tS();
            Pose p = shown.freeBodies().get("cart");
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
        EditorViewModel vm = vm(Fixtures.springCart(false));
        RunResult run = vm.results().currentResult().orElseThrow();
        double omega = Math.sqrt(STIFFNESS_N_PER_M / MASS_KG);
        SplittableRandom random = new SplittableRandom(SEED + 1);
        for (int i = 0; i < 50; i++) {
            double t = random.nextDouble(0, 0.5);
            // Same closed form as above (Taylor 2005, eq. 5.11); cubic Hermite error ~ (ωh)⁴·A/384, far below this.
            assertEquals(V0_M_PER_S / omega * Math.sin(omega * t), run.freePosesAt(t).get("cart").offset().x(),
                    POSITION_TOL_M, "seed " + (SEED + 1) + ", t = " + t);
        }
    }

    /** The editor shows the very run {@code kinduct solve} and the export make of the scene. */
    @Test
    void playbackWithAnInductiveLoopShowsTheCoupledRunAndItsEnergyAudit() {
        Scene s = Fixtures.springCart(true);
        EditorViewModel vm = vm(s);
        RunResult reference = new SceneRun(s).result();
        assertTrue(reference.plan().coupled());
        assertFalse(vm.results().simulatingProperty().get());
        RunResult shown = vm.results().currentResult().orElseThrow();
        assertEquals(reference.samples(), shown.samples());
        for (int i : new int[] {0, 37, 125, reference.samples().size() - 1}) {
            Snapshot sample = reference.samples().get(i);
            vm.clock().seek(sample.tS());
            assertEquals(sample, vm.results().snapshot(), "t = " + sample.tS());
        }
        EnergyAudit audit = shown.audit().orElseThrow();
        assertEquals(reference.audit().orElseThrow(), audit);
    }

    @Test
    void aSceneWithoutFreeBodiesHasNoAuditAndNoIntegratedPoses() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet());
        vm.clock().seek(0.3);
        assertTrue(vm.results().snapshot().freeBodies().isEmpty());
        assertTrue(vm.results().currentResult().orElseThrow().audit().isEmpty());
        assertFalse(vm.results().currentResult().orElseThrow().hasFreeBodies());
    }
}
