package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.SceneRun;

/**
 * The rail-sled demo run with the inductive circuit model, as {@code kinduct solve --demo
 * rail-sled --circuit inductive} runs it: its one loop changes shape as the sled moves, so the
 * holder of the sled also supplies −½·I²·dL/dt, the power against the circuit's pull on itself
 * (the force at constant current is the gradient of ½·L·I²; Jackson, <i>Classical
 * Electrodynamics</i>, 3rd ed., 1999, §5.16). Energy conservation then balances the audit: work
 * of the holder = Joule heat + change of ½·L·I².
 *
 * <p>The window is 35–50 ms of the demo's 0–160 ms: the sled's bar enters the gap at 40 ms, so
 * the current rises and then flows steadily, while the loop keeps growing. Without that power the
 * residual is ½·(dL/dx)·v/R ≈ 2.5e-6 of the heat over any stretch in the gap (measured 2.9e-6 over
 * the whole window). The loop's L/R of 0.2 µs makes the explicit integrator take ~10⁵ steps for
 * the whole 160 ms, several minutes, so the test keeps to this part.
 */
class InductiveRailSledTest {

    /** The README's bound on the audit residual, relative to the heat. */
    private static final double AUDIT_TOL = 1e-6;

    @Test
    void holdingWorkPaysForHeatAndMagneticEnergyWithTheInductiveModel() {
        Scene scene = Demos.load("rail-sled");
        TimeSpan window = new TimeSpan(0.035, 0.050, scene.time().dtS());
        SceneRun run = new SceneRun(scene, new RunRequest(window, CircuitModel.INDUCTIVE, List.of()),
                RunMonitor.NONE, true);

        EnergyAudit audit = run.result().audit().orElseThrow();

        assertEquals(CircuitModel.INDUCTIVE, run.plan().circuit());
        assertTrue(audit.jouleJ() > 0 && audit.holdingJ() > 0, audit.toString());
        assertEquals(0, audit.residualJ(), AUDIT_TOL * audit.jouleJ(), audit.toString());
    }
}
