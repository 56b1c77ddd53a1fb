package org.kinduct.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.scene.Conductor;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/** The page's summary answers the harvester's question: how much of the work put in reaches the load. */
class RunSummaryTest {

    /**
     * The load's share of the coil's Joule heat is R_load/(R_load + R_winding) while both stay
     * constant (the same I² heats both; Joule's law, Griffiths, Introduction to Electrodynamics,
     * 4th ed., 2013, §7.1.1): the load energy summed from the samples (trapezoidal rule) must agree
     * with the Joule heat the run's energy ledger integrates, to the sampling error.
     */
    @Test
    void theHarvesterSummaryStatesTheLoadsShareOfTheWorkPutIn() {
        RunResult run = new SceneRun(Demos.load("pcb-harvester")).result();
        Conductor.Loop coil = run.scene().conductors().stream().filter(c -> c instanceof Conductor.Loop)
                .map(c -> (Conductor.Loop) c).findFirst().orElseThrow();
        double loadJ = MetricKind.LOAD_ENERGY.of(run, coil.id());
        EnergyAudit audit = run.audit().orElseThrow();
        double totalOhm = run.samples().get(0).conductor(coil.id()).orElseThrow().resistanceOhm();
        assertEquals(coil.loadOhm() / totalOhm, loadJ / audit.jouleJ(), 2e-3 * coil.loadOhm() / totalOhm);

        List<String> lines = RunSummary.lines(run);
        String share = String.format(java.util.Locale.ROOT, "%.1f %%", 100 * loadJ / audit.suppliedJ());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("Into the load resistors: ") && l.contains(share)),
                lines.toString());
    }
}
