package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;

/**
 * Demo results against independent hand calculations. The straight-conductor cases use
 * EMF = B·L·v and F = I·L·B (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §7.1.3,
 * Eq. 7.13 and Example 7.4 setting); the channel case uses U = B·w·v̄ for flow between parallel
 * walls with B normal to the plane, any profile (Shercliff, The Theory of Electromagnetic
 * Flow-Measurement, 1962).
 */
class DemoHandCalculationTest {

    private static final double TIGHT = 1e-9;

    @Test
    void senseTracePeakIsBLvWithUpperEndPositiveWhileMovingRight() {
        Scene scene = Demos.load("drive-sense-wire");
        // Shuttle velocity is largest at t = 0: v = 2π f A = 2π · 20 Hz · 8 mm.
        double v = 2 * Math.PI * 20 * 0.008;
        ConductorState trace = new SceneSolver(scene).at(0).conductor("sense-trace").orElseThrow();
        assertEquals(0.35 * 0.020 * v, trace.emfV(), TIGHT * 10 + 1e-9 * trace.emfV());
        assertEquals(Terminal.LAST, trace.positiveEnd(), "v = +x, B into the board: upper (last) end is +");
    }

    @Test
    void senseTraceOutsideTheGapHasNoEmf() {
        Scene scene = Demos.load("drive-sense-wire");
        // At t = 3/(4f) the trace is at x = 4 mm − 8 mm = −4 mm, left of the gap edge at x = 0.
        ConductorState trace = new SceneSolver(scene).at(0.75 / 20).conductor("sense-trace").orElseThrow();
        assertEquals(0, trace.emfV(), 1e-12);
    }

    @Test
    void flowElectrodesGiveBwvAndTheUpperElectrodeIsPositive() {
        Scene scene = Demos.load("flow-electrodes");
        ConductorState column = new SceneSolver(scene).at(0.005).conductor("lower-to-upper-electrode").orElseThrow();
        assertEquals(0.2 * 0.030 * 2.0, column.emfV(), 1e-12);
        assertEquals(Terminal.LAST, column.positiveEnd());
    }

    @Test
    void railSledInTheGapDrivesClockwiseCurrentThatBrakesIt() {
        Scene scene = Demos.load("rail-sled");
        double t = 0.06; // sled at x = −40 mm + 30 mm = −10 mm: inside the gap (−20…20 mm)
        ConductorState loop = new SceneSolver(scene).at(t).conductor("rail-circuit").orElseThrow();
        double emf = 0.5 * 0.020 * 0.5; // B·w·v
        // The loop is drawn counter-clockwise; its flux (B out of the board) grows, so the EMF is negative
        // along the vertex order and the current circulates clockwise (Lenz's law).
        assertEquals(-emf, loop.emfV(), 1e-9 * emf);
        assertEquals(Circulation.CW, loop.direction());
        // R = ρ20 · perimeter / (π d²/4) + shunt, ρ20 = 1/58 Ω·mm²/m (IEC 60028), perimeter at t.
        double sledX = -0.040 + 0.5 * t;
        double perimeter = 2 * (sledX + 0.050) + 2 * 0.020;
        double r = (1.0 / 58 * 1e-6) * perimeter / (Math.PI * 0.003 * 0.003 / 4) + 0.1;
        assertEquals(-emf / r, loop.currentA(), 1e-9 * emf / r);
        // F = I·w·B on the sled edge, opposing the motion (−x); the fixed end bar sits outside the gap.
        assertEquals(-(emf / r) * 0.020 * 0.5, loop.forceN().x(), 1e-9 * emf / r * 0.01);
        assertEquals(0, loop.forceN().y(), 1e-12);
    }

    @Test
    void railSledOutsideTheGapCarriesNoCurrent() {
        List<Snapshot> series = new SceneSolver(Demos.load("rail-sled")).series(0, 0.018, 0.001);
        for (Snapshot s : series) {
            assertTrue(Math.abs(s.conductors().get(0).currentA()) < 1e-12, "current before the sled reaches the gap");
        }
    }

    @Test
    void rotorCoilGivesTwentyHertzWithHalfTurnAntisymmetry() {
        // 1200 rpm = 20 rev/s (definition of rpm); the magnet pair is antisymmetric under a half
        // turn about the shaft (N up at +25 mm, S up at −25 mm), so λ(θ + π) = −λ(θ) and the EMF
        // half a period (25 ms) later is the negative (symmetry; common practice for alternators).
        SceneSolver solver = new SceneSolver(Demos.load("spinning-coil-generator"));
        for (double t : new double[] {0.0031, 0.0107, 0.0188}) {
            double now = solver.at(t).conductor("rotor-coil").orElseThrow().emfV();
            double half = solver.at(t + 0.025).conductor("rotor-coil").orElseThrow().emfV();
            double full = solver.at(t + 0.050).conductor("rotor-coil").orElseThrow().emfV();
            assertEquals(-now, half, 1e-6 * Math.abs(now) + 1e-9, "half a turn later at t = " + t);
            assertEquals(now, full, 1e-6 * Math.abs(now) + 1e-9, "a full turn later at t = " + t);
        }
    }

    @Test
    void gradiometerRejectsTheStrayFieldThatASingleLobePicksUp() {
        Scene full = Demos.load("gradiometer");
        Scene strayOnly = full.withSources(full.sources().stream()
                .filter(src -> src.id().equals("floor-coil")).toList());
        // Single-lobe estimate in the near-uniform field at the floor coil's axis:
        // B0 = μ0·N·I·a²/(2(a² + z²)^{3/2}) (on-axis field of a circular loop; Griffiths 2013, Ex. 5.6),
        // EMF amplitude of one 500 mm² lobe of 30 turns = 30 · ω · B0 · A at t = 0 (current ∝ sin ωt).
        double mu0 = 1.25663706212e-6; // CODATA 2018
        double a = 0.5;
        double z = 0.3;
        double b0PerAmp = mu0 * 10 * a * a / (2 * Math.pow(a * a + z * z, 1.5));
        double oneLobe = 30 * 2 * Math.PI * 50 * b0PerAmp * 5 * 500e-6;
        ConductorState stray = new SceneSolver(strayOnly).at(0).conductor("figure-eight").orElseThrow();
        assertTrue(Math.abs(stray.emfV()) < 1e-6 * oneLobe,
                "stray EMF " + stray.emfV() + " V against one lobe's " + oneLobe + " V");
        double magnetPeak = 0;
        for (Snapshot s : new SceneSolver(full).series(0.08, 0.12, 0.001)) {
            magnetPeak = Math.max(magnetPeak, Math.abs(s.conductors().get(0).emfV()));
        }
        assertTrue(magnetPeak > 5 * oneLobe, "magnet pulse " + magnetPeak + " V should stand out over "
                + oneLobe + " V of stray pickup per lobe");
    }
}
