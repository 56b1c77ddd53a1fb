package org.kinduct.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.demo.GradiometerReference;
import org.kinduct.demo.HarvesterReference;
import org.kinduct.report.metrics.LoadPower;
import org.kinduct.report.metrics.SteadyCycles;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.scene.Conductor;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.AlternatingPickup;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/** The page's summary answers the harvester's question: how much power, and how much of the work put in, reaches the load. */
class RunSummaryTest {

    /**
     * The steady load power against the analytic steady state of the harvester's circuit
     * ({@link HarvesterReference#steadyLoadPower()}: the driven oscillator's steady motion, the coil's
     * EMF N·v·∂Φ/∂x_c by hand, I = EMF/R), relative. What the run's last quarter (0.9–1.2 s) still
     * holds of the build-up from rest, amplitude deficit e^{−βt} with β = c/2m = 7.5/s (Taylor,
     * Classical Mechanics, 2005, §5.4), lowers the power by about 2·e^{−βt}: at most 2.3e-3 at 0.9 s,
     * 9e-4 averaged over the quarter; the hand model's own error is 5e-5 (DemoHandCalculationTest).
     * The mean over the whole run, build-up included, is 10 % lower and would fail.
     */
    private static final double STEADY = 3e-3;

    /**
     * The gradiometer's pickup from the floor coil alone against the hand integral of the coil's
     * off-axis field over each lobe ({@link GradiometerReference}), relative: the lobe's own to the
     * solver's quadrature tolerance (1e-10), the figure-eight's, a difference of the lobes 1/300 of
     * either, to 300 times that. t = 0 is a sample and the current 5 A·sin ωt changes fastest there,
     * so the sampled peaks are the amplitudes.
     */
    private static final double LOBE = 1e-9;
    private static final double RESIDUAL = 3e-8;

    @Test
    void theGradiometerSummaryStatesItsRejectionOfTheMainsFieldAsTheHandCalculationGivesIt() throws java.io.IOException {
        RunResult run = new SceneRun(Demos.load("gradiometer")).result();
        AlternatingPickup pickup = run.alternatingPickup("figure-eight").orElseThrow();
        assertEquals(2, pickup.lobeEmfV().length, "lobes");
        double lobe = GradiometerReference.lobeAmplitudeV();
        double loop = GradiometerReference.loopAmplitudeV();
        assertEquals(lobe, pickup.lobePeakV(0), LOBE * lobe, "one lobe alone, V");
        assertEquals(loop, pickup.loopPeakV(0), RESIDUAL * loop, "the figure-eight, V");

        // 20·log10 of the amplitude ratio (common practice): 49.8 dB, 0.60 µV against 186 µV.
        String rejection = String.format(Locale.ROOT, "50.0 Hz rejection %.1f dB: %s at the output against %s",
                20 * Math.log10(lobe / loop), Units.format(loop, Dimension.VOLTAGE), Units.format(lobe, Dimension.VOLTAGE));
        String line = RunSummary.lines(run).stream().filter(l -> l.startsWith("figure-eight: ")).findFirst().orElseThrow();
        assertTrue(line.contains(rejection), line + " should say " + rejection);

        // The results file states the same figure.
        java.io.StringWriter json = new java.io.StringWriter();
        ResultsJson.write(run, json);
        assertTrue(json.toString().contains("\"rejection_dB\" : " + pickup.rejectionDb(0)), json.toString()
                .substring(json.toString().indexOf("alternating_pickup")));
    }

    @Test
    void theHarvesterSummaryStatesTheSteadyLoadPowerOverItsLastWholeCycles() {
        RunResult run = new SceneRun(Demos.load("pcb-harvester")).result();
        double steady = MetricKind.STEADY_LOAD_POWER.of(run, "board-coil");
        double expected = HarvesterReference.steadyLoadPower();
        assertEquals(expected, steady, STEADY * expected, "steady load power, W");
        double wholeRun = MetricKind.MEAN_LOAD_POWER.of(run, "board-coil");
        assertTrue(Math.abs(wholeRun - expected) > 10 * STEADY * expected, "the whole run's mean " + wholeRun + " W");

        // 60 Hz over the last quarter (0.3 s): 18 whole cycles between the first and last upward crossing.
        SteadyCycles cycles = LoadPower.of(run, "board-coil").cycles().orElseThrow();
        assertEquals(17, cycles.count(), 1, cycles.toString());
        assertTrue(cycles.startS() >= 0.9 && cycles.endS() <= 1.2, cycles.toString());
        String line = RunSummary.lines(run).stream().filter(l -> l.startsWith("board-coil: ")).findFirst().orElseThrow();
        assertTrue(line.contains("mean load power " + Units.format(steady, Dimension.POWER) + " over the last "
                + cycles.count() + " cycles"), line);
    }

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
