package org.kinduct.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.ResultScales;

/**
 * Values read against the run they belong to. The spinning-coil demo's rotor coil (20 rev/s) is
 * centred over a magnet, and mirror-symmetric about the x axis with it, at t = 0 and every
 * 25 ms: there the flux is an extremum, Φ(θ) = Φ(−θ), so the EMF is zero (symmetry; common
 * practice). In between, as its edges cross the magnet's, the EMF is large.
 */
class ResultScalesTest {

    private static final double STEP_S = 1.25e-3;
    /** Samples from one centred position (t = 0) to the next (t = 25 ms). */
    private static final int HALF_TURN_STEPS = 20;

    @Test
    void emfOfACoilCentredOverItsMagnetReadsZeroBesideTheRun() {
        List<Snapshot> run = rotorRun(Demos.load("spinning-coil-generator"));
        ResultScales scales = ResultScales.of(run);

        for (int i : new int[] {0, HALF_TURN_STEPS}) {
            double emf = coil(run.get(i)).emfV();
            assertEquals("0.00 V", Units.format(scales.emf(emf), Dimension.VOLTAGE),
                    "t = " + run.get(i).tS() + " s: computed " + emf + " V");
            assertEquals(0.0, scales.current(coil(run.get(i)).currentA()), "no EMF, no current");
        }
        double peak = peakEmf(run);
        assertTrue(Math.abs(peak) > 0.1, "edges crossing: " + peak);
        assertEquals(peak, scales.emf(peak), "the peak is kept as computed");
    }

    @Test
    void nanovoltEmfsOfWeakMagnetsKeepTheirValue() {
        // B is linear in the remanence (charge model), so 1e-9 of it gives 1e-9 of the EMF: about 1 nV.
        Scene strong = Demos.load("spinning-coil-generator");
        List<Source> weak = new ArrayList<>(strong.sources());
        weak.replaceAll(s -> s instanceof Source.BlockMagnet m ? new Source.BlockMagnet(m.id(), m.body(), m.center(),
                m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT() * 1e-9,
                m.magnetization()) : s);
        List<Snapshot> run = rotorRun(strong.withSources(weak));
        ResultScales scales = ResultScales.of(run);

        // Linearity: the weak run's peak is 1e-9 of the strong run's, to rounding (the quadrature
        // sees the same integrands scaled, so its panels and their sums scale exactly but for rounding).
        double peak = peakEmf(run);
        double strongPeak = peakEmf(rotorRun(strong));
        assertEquals(1e-9 * strongPeak, peak, 1e-12 * Math.abs(1e-9 * strongPeak), "about a nanovolt: " + peak);
        assertEquals(peak, scales.emf(peak), "a nanovolt EMF is not noise in a nanovolt run");
        String shown = Units.format(scales.emf(peak), Dimension.VOLTAGE);
        assertTrue(shown.endsWith(" nV") && !shown.startsWith("0"), "shown as " + shown);
        assertEquals(0.0, scales.emf(coil(run.get(0)).emfV()), "the zero crossing still reads zero");
    }

    /** The coil from t = 0 to 25 ms. */
    private static List<Snapshot> rotorRun(Scene scene) {
        return new SceneSolver(scene).series(0, HALF_TURN_STEPS * STEP_S, STEP_S);
    }

    private static double peakEmf(List<Snapshot> run) {
        double peak = 0;
        for (Snapshot s : run) {
            double emf = coil(s).emfV();
            peak = Math.abs(emf) > Math.abs(peak) ? emf : peak;
        }
        return peak;
    }

    private static ConductorState coil(Snapshot s) {
        return s.conductor("rotor-coil").orElseThrow();
    }

    @Test
    void anInstantBeyondTheRunWidensTheScalesAndNoInstantLeavesThemAsTheyAre() {
        List<Snapshot> run = rotorRun(Demos.load("spinning-coil-generator"));
        ResultScales start = ResultScales.of(run.subList(0, 1));
        Snapshot peak = run.stream().max(java.util.Comparator.comparingDouble(s -> Math.abs(coil(s).emfV())))
                .orElseThrow();
        assertEquals(ResultScales.of(List.of(run.get(0), peak)), start.including(peak));
        assertEquals(start, start.including(null));
    }
}
