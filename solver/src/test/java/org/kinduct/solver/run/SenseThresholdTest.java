package org.kinduct.solver.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
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
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;

/**
 * A current that is rounding noise gets no sense, on every path: quasi-static instants and coupled
 * runs apply the one rule ({@link Circulation#of}), the current the EMF's reporting threshold
 * would drive through the loop.
 */
class SenseThresholdTest {

    @Test
    void aCurrentBelowTheNoiseLevelHasNoSense() {
        assertEquals(Circulation.NONE, Circulation.of(5e-14, 1e-2, 1e-12));
        assertEquals(Circulation.CCW, Circulation.of(2e-12, 1e-2, 1e-12), "above it, counter-clockwise loop, I > 0");
        assertEquals(Circulation.CW, Circulation.of(2e-12, -1e-2, 1e-12), "clockwise vertex order, I > 0");
        assertEquals(Circulation.CW, Circulation.of(-2e-12, 1e-2, 1e-12));
    }

    /**
     * A loop spinning wholly inside a region of uniform field links a constant flux, so by Faraday's
     * law no current flows (common practice); its computed EMF and current are rounding noise (the
     * flux of a rotated polygon differs in the last bits). A free puck elsewhere makes the window
     * a coupled run; 200 turns of fine wire give the loop an L/R (about 0.6 ms) that the automatic
     * choice runs inductively at a 1 ms step. Neither path may give that noise a sense.
     */
    @Test
    void aLoopSpinningInsideAUniformRegionCarriesNoCurrentSenseOnEitherPath() {
        Body puck = new Body("puck", "puck", new Vec2(1, 1), new Motion.Free(0.1, 0, new Vec2(0.3, 0), 0, 0,
                Vec2.ZERO, Vec2.ZERO, 0, List.of()));
        Body cart = new Body("cart", "cart", new Vec2(0.05, 0.05), new Motion.Spin(31.4, 0.3));
        Conductor.Loop loop = new Conductor.Loop("still", "cart", List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.1, 0), Conductor.Vertex.at(0.1, 0.1), Conductor.Vertex.at(0, 0.1)), 200,
                WireSpec.awg(Material.COPPER, 30), false, 0, 20);
        Source patch = new Source.FieldPatch("gap", Body.FIXED, List.of(new Vec2(-1, -1), new Vec2(2, -1),
                new Vec2(2, 1), new Vec2(-1, 1)), 0.5);
        Scene coupled = new Scene("gliding loop", "", List.of(cart, puck), List.of(patch), List.of(loop),
                new TimeSpan(0, 0.02, 0.001));
        Scene instants = coupled.withBodies(List.of(cart));
        double noise = 0;
        for (Scene scene : List.of(coupled, instants)) {
            for (CircuitModel model : List.of(CircuitModel.AUTO, CircuitModel.QUASI_STATIC)) {
                RunResult run = new SceneRun(scene, new RunRequest(scene.time(), model, List.of()),
                        org.kinduct.solver.dynamics.RunMonitor.NONE, false).result();
                for (Snapshot s : run.samples()) {
                    ConductorState c = s.conductor("still").orElseThrow();
                    assertEquals(Circulation.NONE, c.direction(), run.plan() + " at t = " + s.tS() + ": I = "
                            + c.currentA() + " A");
                    noise = Math.max(noise, Math.abs(c.currentA()));
                }
            }
        }
        assertTrue(noise > 0, "the case has rounding noise to hide: largest |I| " + noise);
    }
}
