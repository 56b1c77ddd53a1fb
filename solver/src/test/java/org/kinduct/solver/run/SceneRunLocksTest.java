package org.kinduct.solver.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * Asking a run for its plan never waits for the run itself. The editor asks for the plan to know
 * whether a long coupled run is coming (and to show its progress); when another worker had
 * already started the run (the instant shown needs it), the plan waited behind the whole run on
 * one lock, and the editor showed no progress for as long as the run took.
 */
class SceneRunLocksTest {

    /** A magnet on a spring-held cart beside a fixed shorted loop: a coupled run. */
    private static Scene cartOnASpring() {
        Motion.Free cart = new Motion.Free(0.02, 0, new Vec2(0.1, 0), 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(new Vec2(0, 0), null, 2, 0.1)));
        Source.BlockMagnet magnet = new Source.BlockMagnet("magnet", "cart", new Vec2(0.1, 0), 0.01, 0.02, 0.005, 0,
                0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Conductor.Loop loop = new Conductor.Loop("loop", Body.FIXED, List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.02), Conductor.Vertex.at(0, 0.02)), 10,
                WireSpec.awg(Material.COPPER, 24), false, 0, 20);
        return Scene.empty("cart on a spring").withBodies(List.of(new Body("cart", "cart", new Vec2(0.1, 0), cart)))
                .withSources(List.of(magnet)).withConductors(List.of(loop)).withTime(new TimeSpan(0, 0.5, 0.002));
    }

    @Test
    void thePlanAnswersWhileAnotherThreadIsInTheMiddleOfTheRun() throws Exception {
        CountDownLatch running = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        RunMonitor heldMidway = new RunMonitor() {
            @Override
            public void progress(double fractionDone) {
                running.countDown();
                try {
                    release.await(30, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        Scene scene = cartOnASpring();
        SceneRun run = new SceneRun(scene, RunRequest.of(scene), heldMidway, false);
        CompletableFuture<RunResult> whole = CompletableFuture.supplyAsync(run::result);
        try {
            assertTrue(running.await(30, TimeUnit.SECONDS), "the run started");
            CompletableFuture<RunPlan> plan = CompletableFuture.supplyAsync(run::plan);
            // Unblocked, the plan is a lookup; held behind the run, it would wait the 30 s above.
            assertTrue(plan.get(10, TimeUnit.SECONDS).coupled(), "a free body makes a coupled run");
        } finally {
            release.countDown();
        }
        assertEquals(251, whole.get(60, TimeUnit.SECONDS).samples().size(), "0 to 0.5 s every 2 ms, held or not");
    }
}
