package org.kinduct.ui.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.Sample;

/**
 * A snapshot of a scene with a free body shows the body where the coupled run has it, with the
 * run's current — not the drawn pose with a quasi-static current — and the run's energy audit.
 */
class FreeBodyExportTest {

    private static final double SAME = 1e-9;

    @Test
    void fallingFrameIsExportedAtItsSimulatedPlaceAndCurrent() {
        Scene scene = Demos.load("frame-brake");
        double t = 0.5;
        Sample sample = CoupledSimulation.run(scene, scene.time().t0S(), scene.time().t1S(), scene.time().dtS())
                .samples().stream().filter(s -> Math.abs(s.tS() - t) < 1e-12).findFirst().orElseThrow();
        ConductorState expected = sample.conductors().get(0);

        Exporter export = new Exporter(scene, SnapshotOptions.standard(t, 800, 150, new ViewChoice.Fit(),
                LocalDate.of(2026, 1, 1), "test"));
        ConductorState drawn = export.snapshot().conductor(expected.id()).orElseThrow();

        assertEquals(expected.currentA(), drawn.currentA(), SAME * Math.abs(expected.currentA()));
        assertEquals(expected.vertices().get(0).y(), drawn.vertices().get(0).y(), SAME);
        String svg = export.svg();
        assertTrue(svg.contains("Energy over the run") && svg.contains("residual"), "energy audit on the page");
    }
}
