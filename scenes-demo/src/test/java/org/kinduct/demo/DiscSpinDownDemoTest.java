package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * The disc-spin-down demo as {@code kinduct solve --demo disc-spin-down} runs it: the disc starts
 * with ½·I·ω0² and ends with almost none, the heat accounts for it, the braking torque opposes the
 * spin and the drag points against the rim's motion over the magnet.
 */
class DiscSpinDownDemoTest {

    @Test
    void theDiscSpinsDownAndItsEnergyBecomesHeat() {
        Scene scene = Demos.load("disc-spin-down");
        Motion.Free disc = (Motion.Free) scene.body("disc").orElseThrow().motion();
        RunResult run = new SceneRun(scene).result();
        List<Snapshot> samples = run.samples();
        Snapshot first = samples.get(0);
        Snapshot last = samples.get(samples.size() - 1);
        double omega0 = disc.initialOmegaRadPerS();
        assertEquals(omega0, first.freeBody("disc").omegaRadPerS(), 0, "starts at its initial spin");
        double omegaEnd = last.freeBody("disc").omegaRadPerS();
        assertTrue(omegaEnd > 0 && omegaEnd < 0.05 * omega0, "spun down to " + omegaEnd + " rad/s");

        // Lenz's law (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §7.2.1): the
        // torque opposes ω; over the magnet at +x the rim moves along +y, so the drag points −y.
        SheetState plate = first.sheet("disc-plate").orElseThrow();
        assertTrue(plate.torqueNm() < 0, "torque " + plate.torqueNm());
        assertTrue(plate.forceN().y() < 0 && Math.abs(plate.forceN().x()) < 0.1 * Math.abs(plate.forceN().y()),
                "drag " + plate.forceN());
        // With a still magnet and the axle at rest at the start, the eddy heat is the power the spin
        // gives up, −τ·ω, to the solve's residual (energy conservation, Griffiths §8.1).
        assertEquals(-plate.torqueNm() * omega0, plate.joulePowerW(), 1e-8 * plate.joulePowerW(), "heat = −τ·ω");

        // Conservation of energy: the spin's ½·I·ω² goes into eddy heat (and a little damping of the mount).
        EnergyAudit audit = run.audit().orElseThrow();
        double kinetic0 = 0.5 * disc.inertiaKgM2() * omega0 * omega0;
        assertEquals(kinetic0, audit.eddyJ() + audit.dampingJ() + audit.deltaPotentialJ()
                + 0.5 * disc.inertiaKgM2() * omegaEnd * omegaEnd, 1e-3 * kinetic0, "energy accounted for");
        assertEquals(0, audit.residualJ(), 1e-6 * audit.turnedOverJ(), "audit residual");
    }
}
