package org.kinduct.report.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeSet;
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
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * Metrics against runs whose answers are known in closed form, and metric expressions that are
 * refused with the nearest right names.
 */
class MetricsTest {

    /** Oscillating loop: N turns, edge height h, leading edge in a field B, stroke A at f. */
    private static final int N = 10;
    private static final double B = 0.2;
    private static final double H = 0.02;
    private static final double A = 0.002;
    private static final double F = 50;
    private static final double LOAD = 10;
    private static final double DT = 0.5e-3;
    private static final double T = 0.1;
    /** EMF = N·B·h·v (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §7.1), v = A·ω·cos ωt. */
    private static final double EMF = N * B * H * A * 2 * Math.PI * F;
    /** Winding, copper 0.2 mm at 20 °C, ρ20 = 1/58 Ω·mm²/m (IEC 60028), N·perimeter of a 20 mm square. */
    private static final double R = 1.0 / 58 * 1e-6 * N * 4 * H / (Math.PI * 0.1e-3 * 0.1e-3) + LOAD;
    /** Rounding only: the EMF of edges in a uniform patch is exact, the sums are over 201 samples. */
    private static final double EXACT = 1e-12;

    private static Scene oscillating() {
        Body shaker = new Body("shaker", null, Vec2.ZERO, new Motion.Oscillate(A, F, 0, 0));
        Source patch = new Source.FieldPatch("gap", Body.FIXED, List.of(new Vec2(0, -1), new Vec2(1, -1), new Vec2(1, 1),
                new Vec2(0, 1)), B);
        Source earth = new Source.UniformField("earth", 50e-6);
        Conductor loop = new Conductor.Loop("coil", "shaker", List.of(Conductor.Vertex.at(-0.01, -H / 2),
                Conductor.Vertex.at(0.01, -H / 2), Conductor.Vertex.at(0.01, H / 2), Conductor.Vertex.at(-0.01, H / 2)), N,
                WireSpec.of(Material.COPPER, 0.2e-3), false, LOAD, 20);
        return new Scene("oscillating loop", "", List.of(shaker), List.of(patch, earth), List.of(loop),
                new TimeSpan(0, T, DT));
    }

    private static double read(Scene scene, String metric) {
        Metric m = Metrics.parse(metric, scene);
        Map<SortedSet<String>, RunResult> runs = new java.util.HashMap<>();
        for (SortedSet<String> variant : m.variants()) {
            runs.put(variant, new SceneRun(Metrics.without(scene, variant)).result());
        }
        return m.evaluate(runs, Double.NEGATIVE_INFINITY);
    }

    @Test
    void emfMetricsOfASinusoidalEmfAreItsClosedForms() {
        Scene s = oscillating();
        assertEquals(EMF, read(s, "peak_emf:coil"), EXACT * EMF);
        assertEquals(0, read(s, "peak_time:coil"), "cos ωt is largest at t = 0");
        assertEquals(2 * EMF, read(s, "peak_to_peak_emf:coil"), EXACT * EMF);
        // 201 equally weighted samples over five periods: Σcos² = 100 + 1 (the last sample is a crest).
        assertEquals(EMF * Math.sqrt(101.0 / 201), read(s, "rms_emf:coil"), EXACT * EMF);
        assertEquals(2 * N * B * H * A, read(s, "flux_swing:coil"), EXACT * N * B * H * A);
        // The spectrum is read on bins of 1/(2048·Δt) = 0.98 Hz: the peak lies within half a bin.
        assertEquals(F, read(s, "dominant_frequency:coil"), 0.5 / (2048 * DT));
    }

    /** A steady EMF whose samples differ in their last bits only (as a run's do) has no dominant frequency. */
    @Test
    void aSteadyEmfWithRoundingNoiseHasNoDominantFrequency() {
        double[] steady = new double[41];
        for (int i = 0; i < steady.length; i++) {
            steady[i] = Math.nextUp(36.5e-6) + (i % 3) * Math.ulp(36.5e-6);
        }
        assertEquals(0, DominantFrequency.of(steady, DT));
        // A ripple of a millionth is no rounding: it has its frequency, 1/(4·Δt).
        double[] ripple = steady.clone();
        for (int i = 0; i < ripple.length; i++) {
            ripple[i] += 36.5e-12 * Math.cos(Math.PI / 2 * i);
        }
        assertEquals(1 / (4 * DT), DominantFrequency.of(ripple, DT), 0.5 / (512 * DT));
    }

    @Test
    void currentMetricsFollowFromTheEmfAndTheResistance() {
        Scene s = oscillating();
        double peak = EMF / R;
        assertEquals(peak, read(s, "peak_current:coil"), EXACT * peak);
        // The trapezoidal rule averages cos² over whole periods exactly: ⟨I²⟩ = I²/2.
        assertEquals(peak * peak * LOAD / 2, read(s, "mean_load_power:coil"), EXACT * peak * peak * LOAD);
        assertEquals(peak * peak * R / 2 * T, read(s, "joule_heat:coil"), EXACT * peak * peak * R * T);
        // A closed loop in a field uniform over its moving edge: forces on the two long edges cancel
        // only outside; inside the patch F = N·I·h·B on the leading edge.
        assertEquals(N * peak * H * B, read(s, "peak_force:coil"), EXACT * N * peak * H * B);
        assertTrue(Double.isNaN(read(s, "audit_residual")), "quasi-static instants have no energy audit");
    }

    @Test
    void aRatioReadsEachTermFromItsOwnRun() {
        // The uniform field links the same flux wherever the rigid loop is: it adds no EMF.
        assertEquals(1, read(oscillating(), "rms_emf:coil / rms_emf:coil without earth"), EXACT);
        assertEquals("", Metrics.parse("rms_emf:coil / rms_emf:coil without earth", oscillating()).unit());
        assertEquals("V/A", Metrics.parse("peak_emf:coil / peak_current:coil", oscillating()).unit());
    }

    /** Frame of N turns falling from rest with its lower edge in the field, quasi-static circuit. */
    private static final double MASS = 0.01;
    private static final double G = 9.81;
    private static final double W = 0.05;
    private static final double FRAME_R = 1.0 / 58 * 1e-6 * 50 * 2 * (W + 1) / (Math.PI * 0.25e-3 * 0.25e-3) + 0.1;
    /** Terminal speed m·g·R/(N·B·w)² (Griffiths 2013, ch. 7) and time constant τ = v_t/g. */
    private static final double V_T = MASS * G * FRAME_R / Math.pow(50 * 0.5 * W, 2);
    private static final double TAU = V_T / G;
    /** The integration holds speeds to about 1e-9; Aitken is exact for the exponential approach. */
    private static final double SPEED = 1e-8;

    private static RunResult fall() {
        Body frame = new Body("frame", null, new Vec2(0.025, 0.4), Motion.Free.ofMass(MASS));
        Source gap = new Source.FieldPatch("gap", Body.FIXED, List.of(new Vec2(-10, -10), new Vec2(10, -10),
                new Vec2(10, 0), new Vec2(-10, 0)), 0.5);
        Conductor coil = new Conductor.Loop("coil", "frame", List.of(Conductor.Vertex.at(0, -0.1),
                Conductor.Vertex.at(W, -0.1), Conductor.Vertex.at(W, 0.9), Conductor.Vertex.at(0, 0.9)), 50,
                WireSpec.of(Material.COPPER, 0.5e-3), false, 0.1, 20);
        Scene s = new Scene("fall", "", List.of(frame), List.of(gap), List.of(coil), new TimeSpan(0, 0.3, 0.003),
                new Vec2(0, -G));
        return new SceneRun(s, new RunRequest(s.time(), CircuitModel.QUASI_STATIC, List.of()), RunMonitor.NONE, true)
                .result();
    }

    @Test
    void aBodySpinningFreeKeepsItsSpinAndItsFinalSpinIsThat() {
        // No torque acts (no source): ω stays at its initial value (Newton's first law for rotation);
        // clockwise, so the metric's magnitude must drop the sign.
        Body rotor = new Body("rotor", null, Vec2.ZERO, new Motion.Free(0.01, 1e-5, Vec2.ZERO, -7.5, 0, Vec2.ZERO,
                Vec2.ZERO, 0, List.of()));
        Conductor coil = new Conductor.Loop("coil", "rotor", List.of(Conductor.Vertex.at(0.01, -0.01),
                Conductor.Vertex.at(0.03, -0.01), Conductor.Vertex.at(0.03, 0.01), Conductor.Vertex.at(0.01, 0.01)), 1,
                WireSpec.of(Material.COPPER, 0.5e-3), false, 0, 20);
        Scene s = new Scene("spin", "", List.of(rotor), List.of(), List.of(coil), new TimeSpan(0, 0.1, 0.01));
        RunResult run = new SceneRun(s).result();
        assertEquals(7.5, MetricKind.FINAL_SPIN.read(run, "rotor", Double.NEGATIVE_INFINITY), 1e-9 * 7.5);
        assertEquals(0, MetricKind.FINAL_SPEED.read(run, "rotor", Double.NEGATIVE_INFINITY), 1e-12);
    }

    @Test
    void speedsOfABodyApproachingItsTerminalSpeed() {
        RunResult run = fall();
        double end = 0.3;
        double last = V_T * (1 - Math.exp(-end / TAU));
        assertEquals(last, MetricKind.FINAL_SPEED.read(run, "frame", Double.NEGATIVE_INFINITY), SPEED * V_T);
        assertEquals(V_T, MetricKind.TERMINAL_SPEED.read(run, "frame", Double.NEGATIVE_INFINITY), SPEED * V_T);
        // Settled once v_f − v(t) = v_t·(e^(−t/τ) − e^(−T/τ)) ≤ 2 % of v_f: the first sample after that time.
        double settles = -TAU * Math.log(Math.exp(-end / TAU) + 0.02 * (1 - Math.exp(-end / TAU)));
        assertEquals(Math.ceil(settles / 0.003) * 0.003, MetricKind.SETTLING_TIME.read(run, "frame",
                Double.NEGATIVE_INFINITY), 1e-12);
    }

    @Test
    void metricsReadOnlyTheSamplesFromTheStartTimeOn() {
        Scene s = oscillating();
        RunResult run = new SceneRun(s).result();
        // From 5 ms on (a quarter period), the first sample is a zero crossing and the crest comes at 10 ms.
        assertEquals(0.01, MetricKind.PEAK_TIME.read(run, "coil", 0.005), 1e-15);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MetricKind.PEAK_EMF.read(run, "coil", 1));
        assertEquals("no samples at or after 1.0 s: the run ends at 0.1 s", e.getMessage());
    }

    @Test
    void wrongExpressionsNameTheNearestRightOnes() {
        Scene s = oscillating();
        assertMessage("unknown metric 'peak_emv' (did you mean peak_emf", () -> Metrics.parse("peak_emv:coil", s));
        assertMessage("no wire or loop 'coll' (did you mean coil?); peak_emf applies to coil",
                () -> Metrics.parse("peak_emf:coll", s));
        assertMessage("terminal_speed needs the id of a free body", () -> Metrics.parse("terminal_speed", s));
        assertMessage("audit_residual is about the whole run and takes no id", () -> Metrics.parse("audit_residual:coil", s));
        assertMessage("nothing to leave out named 'erth' (did you mean earth?)",
                () -> Metrics.parse("rms_emf:coil without erth", s));
        assertMessage("cannot read 'coil' without itself", () -> Metrics.parse("rms_emf:coil without coil", s));
        assertMessage("one '/' at most", () -> Metrics.parse("a/b/c", s));
        assertEquals("rms_emf:coil without earth,gap", Metrics.parse(" rms_emf : coil  without gap, earth ", s).text());
        assertEquals(new TreeSet<>(List.of("earth", "gap")), ((Metric.Term) Metrics.parse("rms_emf:coil without gap,earth",
                s)).without());
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(part), e.getMessage());
    }
}
