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
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.CoupledRun;

/**
 * Demo results against independent hand calculations. The straight-conductor cases use
 * EMF = B·L·v and F = I·L·B (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §7.1.3,
 * Eq. 7.13 and Example 7.4 setting); the channel case uses U = B·w·v̄ for flow between parallel
 * walls with B normal to the plane, any profile (Shercliff, The Theory of Electromagnetic
 * Flow-Measurement, 1962). The falling frame uses the terminal speed v_t = m·g·R/(B²·w²) of a
 * loop falling with one edge in a field region (Griffiths, Introduction to Electrodynamics, 4th ed.,
 * 2013, Problem 7.11 setting).
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

    /** Frame of the frame-brake demo: rod centreline 100 mm × 500 mm, 10 mm hard-drawn aluminium rod. */
    private static final double FRAME_W = 0.100;
    private static final double FRAME_H = 0.500;
    private static final double ROD_D = 0.010;
    private static final double GAP_B = 0.6;
    private static final double G = 9.81;
    /** Hard-drawn aluminium, IEC 60889: ρ20 = 0.028264 Ω·mm²/m (from memory). */
    private static final double RHO_ALUMINIUM = 0.028264e-6;
    /** Aluminium density 2700 kg/m³ (common practice). */
    private static final double ALUMINIUM_DENSITY = 2700;
    /** The run leaves ~28 mechanical time constants after entry: the approach is long over. */
    private static final double TERMINAL_TOL = 1e-3;
    /** ½·L·I² at the terminal current, about 1e-3 of the heat, is left out of the hand balance. */
    private static final double HEAT_TOL = 3e-3;

    private static CoupledRun frameBrakeRun() {
        Scene scene = Demos.load("frame-brake");
        return CoupledSimulation.run(scene, scene.time().t0S(), scene.time().t1S(), scene.time().dtS());
    }

    @Test
    void frameBrakeMassIsThatOfItsAluminiumRod() {
        Scene scene = Demos.load("frame-brake");
        double mass = ((org.kinduct.scene.Motion.Free) scene.body("frame").orElseThrow().motion()).massKg();
        double rod = ALUMINIUM_DENSITY * 2 * (FRAME_W + FRAME_H) * Math.PI * ROD_D * ROD_D / 4;
        assertEquals(rod, mass, 0.005 * rod);
    }

    @Test
    void frameBrakeFallsAtTheTerminalSpeedMgRoverB2w2() {
        Scene scene = Demos.load("frame-brake");
        double mass = ((org.kinduct.scene.Motion.Free) scene.body("frame").orElseThrow().motion()).massKg();
        // R = ρ·perimeter/(π d²/4) (Pouillet; common practice), no load resistor.
        double r = RHO_ALUMINIUM * 2 * (FRAME_W + FRAME_H) / (Math.PI * ROD_D * ROD_D / 4);
        double vTerminal = mass * G * r / (GAP_B * GAP_B * FRAME_W * FRAME_W);
        List<Snapshot> samples = frameBrakeRun().samples();
        Snapshot last = samples.get(samples.size() - 1);

        assertEquals(-vTerminal, last.freeBody("frame").velocity().y(), TERMINAL_TOL * vTerminal);
        // The terminal current carries the weight: I·w·B = m·g, clockwise (Lenz: the flux out of the page grows).
        assertEquals(-mass * G / (GAP_B * FRAME_W), last.conductor("frame-loop").orElseThrow().currentA(),
                TERMINAL_TOL * mass * G / (GAP_B * FRAME_W));
        assertEquals(Circulation.CW, last.conductor("frame-loop").orElseThrow().direction());
    }

    @Test
    void frameBrakeHeatIsTheLostPotentialEnergyLessTheKineticEnergy() {
        Scene scene = Demos.load("frame-brake");
        double mass = ((org.kinduct.scene.Motion.Free) scene.body("frame").orElseThrow().motion()).massKg();
        CoupledRun run = frameBrakeRun();
        Snapshot first = run.samples().get(0);
        Snapshot last = run.samples().get(run.samples().size() - 1);
        double drop = first.freeBody("frame").offset().y() - last.freeBody("frame").offset().y();
        double speed = last.freeBody("frame").velocity().length();
        double heat = mass * G * drop - 0.5 * mass * speed * speed;

        EnergyAudit audit = run.audit();
        assertTrue(drop > 0.1, "the frame falls into the gap: " + drop + " m");
        assertEquals(heat, audit.jouleJ(), HEAT_TOL * heat, audit.toString());
    }

    @Test
    void harvesterBuildsUpToTheResonanceAmplitudeAndFeedsItsLoad() {
        Scene scene = Demos.load("pcb-harvester");
        CoupledRun run = CoupledSimulation.run(scene, scene.time().t0S(), scene.time().t1S(), scene.time().dtS());
        // Driven at its natural frequency ω0 = √(k/m) (711 N/m, 5 g: 60.0 Hz), a damped oscillator settles at
        // X = F0/(c·ω0) (Taylor, Classical Mechanics, 2005, §5.5, resonance amplitude f0/(2βω0)); the coil's
        // electrical damping is a fraction of a percent of the flexure's 0.075 N·s/m here. After 4.5 time
        // constants 2m/c the build-up is 99 % complete.
        double omega0 = Math.sqrt(711 / 0.005);
        double expected = 0.1 / (0.075 * omega0);
        double amplitude = 0;
        for (Snapshot s : run.samples()) {
            if (s.tS() > scene.time().t1S() - 2 / 60.0) {
                amplitude = Math.max(amplitude, Math.abs(s.freeBody("flexure").offset().x()));
            }
        }
        assertEquals(expected, amplitude, 0.03 * expected, "steady amplitude at resonance");
        EnergyAudit audit = run.audit();
        assertTrue(audit.jouleJ() > 0, "the load takes power: " + audit);
        assertTrue(Math.abs(audit.residualJ()) < 1e-6 * audit.jouleJ(), "energy balance: " + audit);
    }
}
