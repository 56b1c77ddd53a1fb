package org.kinduct.solver.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * Long windows yield every grid sample, on both paths: quasi-static instants and a coupled run.
 * The windows are ones where (t1 − t0)/dt rounds to a hair below the step count, which a fixed
 * slack of 1e-9 steps missed, dropping the last sample (found by searching decimal windows).
 */
class SampleCountTest {

    /** 101 s to 101.15411669 s in 2.73 µs: 56 453 steps, (t1 − t0)/dt = 56452.99999999819. */
    private static final TimeSpan INSTANTS_WINDOW = new TimeSpan(101, 101.15411669, 2.73e-6);
    /** 729.9 s to 729.90413308 s in 0.28 µs: 14 761 steps, (t1 − t0)/dt = 14760.999999907652. */
    private static final TimeSpan COUPLED_WINDOW = new TimeSpan(729.9, 729.90413308, 2.8e-7);

    @Test
    void quasiStaticInstantsSampleEveryStepOfALongWindow() {
        Scene scene = scene(new Motion.Glide(new Vec2(0.1, 0)), INSTANTS_WINDOW);
        RunResult run = run(scene);
        assertEquals(RunPlan.Method.INSTANTS, run.plan().method());
        assertGrid(INSTANTS_WINDOW, 56_454, run.samples());
    }

    @Test
    void aCoupledRunSamplesEveryStepOfALongWindow() {
        Motion falling = new Motion.Free(0.01, 0, Vec2.ZERO, 0, 0, new Vec2(0, -0.1), Vec2.ZERO, 0, List.of());
        Scene scene = scene(falling, COUPLED_WINDOW);
        RunResult run = run(scene);
        assertEquals(RunPlan.Method.COUPLED, run.plan().method());
        assertGrid(COUPLED_WINDOW, 14_762, run.samples());
    }

    private static RunResult run(Scene scene) {
        return new SceneRun(scene, new RunRequest(scene.time(), CircuitModel.AUTO, List.of()), RunMonitor.NONE, true)
                .result();
    }

    /** A wire riding a body with the given motion through a uniform field. */
    private static Scene scene(Motion motion, TimeSpan window) {
        Body carrier = new Body("carrier", "carrier", Vec2.ZERO, motion);
        Conductor.Wire wire = new Conductor.Wire("rod", "carrier",
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0, 0.01)));
        return new Scene("long window", "", List.of(carrier), List.of(new Source.UniformField("b", 0.1)),
                List.of(wire), window);
    }

    private static void assertGrid(TimeSpan w, int count, List<Snapshot> samples) {
        assertEquals(count, w.steps() + 1, "the window's own count");
        assertEquals(count, samples.size(), "samples");
        for (int k = 0; k < count; k++) {
            assertEquals(w.at(k), samples.get(k).tS(), "instant " + k);
        }
        assertTrue(samples.get(count - 1).tS() <= w.t1S() + Math.ulp(w.t1S()));
    }
}
