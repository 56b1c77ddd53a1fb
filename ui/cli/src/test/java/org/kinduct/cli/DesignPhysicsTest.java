package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.cli.CliRun.Result;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.study.Row;
import org.kinduct.study.StudyJson;
import org.kinduct.study.StudyTable;

/**
 * Sweeps and the optimiser against published physics on the demos: the harvester's best load
 * and the falling frame's terminal speed against the field.
 */
class DesignPhysicsTest {

    @TempDir
    Path dir;

    /** Harvester (pcb-harvester): flexure damping, coil, disc magnet (scene file). */
    private static final double FLEXURE_DAMPING = 0.075;
    private static final int TURNS = 20;
    /**
     * A tenth of the demo's moving mass and stiffness: the same 60 Hz resonance and the same
     * optimum (it does not involve m or k), but the build-up settles in τ = 2m/c = 13 ms instead of
     * 0.13 s, so the runs can be short.
     */
    private static final double MASS = 0.5e-3;
    private static final double STIFFNESS = 71.1;
    /** Metrics read the last 0.1 s of 0.2 s: the transient is down to e^(−0.1/τ) = 5e-4 of the stroke. */
    private static final String T1 = "0.2 s";
    private static final String FROM = "0.1 s";
    private static final double LOAD_STEP = 0.25;
    /**
     * Optimiser against the formula, relative: the transient left at 0.1 s weighs on the power
     * with a factor that depends on c_e, i.e. on R_L; it moves the optimum by up to about 1e-4 of
     * R* (measured 5.7e-6: R* = 2.492346 Ω, found 2.49236 Ω).
     */
    private static final double BEST_LOAD = 1e-4;

    /**
     * Coil resistance at 25 °C, ρ20·(1 + α20·5 K)·N·perimeter/(π d²/4), copper ρ20 = 1/58 Ω·mm²/m,
     * α20 = 0.00393 /K (IEC 60028), square 12 mm coil of 0.094 mm wire.
     */
    private static double coilResistance() {
        double rho25 = 1.0 / 58 * 1e-6 * (1 + 0.00393 * 5);
        return rho25 * TURNS * 4 * 0.012 / (Math.PI * 0.094e-3 * 0.094e-3 / 4);
    }

    /**
     * The transduction factor N·B·ℓ = |EMF|/v of the coil as the magnet passes its rest position,
     * measured on an open-circuit instant of the solver (magnet gliding at 1 mm/s over the coil,
     * which is open so no current flows): the solver's EMF is tested against published fields
     * elsewhere; what is under test here is the sweep and the optimiser.
     */
    private static double transduction(Scene harvester) {
        double v = 1e-3;
        Body flexure = harvester.body("flexure").orElseThrow();
        Conductor.Loop coil = (Conductor.Loop) harvester.conductor("board-coil").orElseThrow();
        Scene open = harvester.withBodies(List.of(new Body(flexure.id(), flexure.name(), flexure.pivot(),
                new Motion.Glide(new Vec2(v, 0))))).withConductors(List.of(new Conductor.Loop(coil.id(), coil.body(),
                coil.vertices(), coil.turns(), coil.wire(), true, coil.loadOhm(), coil.temperatureC())));
        return Math.abs(new SceneRun(open).instant(0).conductor("board-coil").orElseThrow().emfV()) / v;
    }

    /**
     * Load sweep at resonance. Driven at its natural frequency, the flexure's velocity amplitude
     * is V = F/(c_m + c_e) with the coil's electrical damping c_e = (N·B·ℓ)²/(R_c + R_L) (Williams
     * &amp; Yates, Sens. Actuators A 52, 8–11, 1996: the damping model). The EMF N·B·ℓ·v drives
     * I = EMF/(R_c + R_L), so the mean load power is P = ½·I_max²·R_L =
     * ½·F²·(NBℓ)²·R_L/[c_m·(R_c + R_L) + (NBℓ)²]². With a = c_m and b = c_m·R_c + (NBℓ)²,
     * dP/dR_L ∝ (a·R_L + b) − 2·a·R_L = 0 gives R_L* = b/a = R_c + (NBℓ)²/c_m, the load at which
     * c_e equals c_m (derived here; the formula from memory).
     */
    @Test
    void harvesterLoadPowerPeaksWhereElectricalDampingMeetsTheMechanical() throws Exception {
        Scene demo = Demos.load("pcb-harvester");
        double k = transduction(demo);
        double best = coilResistance() + k * k / FLEXURE_DAMPING;
        String resonance = Double.toString(Math.sqrt(STIFFNESS / MASS) / (2 * Math.PI));
        String[] scene = {"--demo", "pcb-harvester", "--set", "flexure.motion.mass=" + MASS,
            "--set", "flexure.motion.springs[0].stiffness=" + STIFFNESS, "--set", "flexure.motion.forceFrequency=" + resonance,
            "--set", "flexure.motion.forceAmplitude.x=1 mN", "--set", "time.t1=" + T1, "--from", FROM};

        Path json = dir.resolve("loads.json");
        Result sweep = CliRun.run(join(List.of("sweep"), scene, "--vary", "board-coil.load=1.5 ohm..3.5 ohm:9",
                "--metric", "mean_load_power:board-coil", "--json", json.toString(), "--png", dir.resolve("p.png").toString()));
        assertEquals(KinductMain.OK, sweep.code(), sweep.err());
        StudyTable table = StudyJson.read(Files.readString(json), "loads.json");
        Row top = table.rows().stream().max((a, b) -> Double.compare(a.metrics()[0], b.metrics()[0])).orElseThrow();
        assertTrue(Math.abs(top.values()[0] - best) <= LOAD_STEP, "grid optimum " + top.values()[0] + " Ω, R* = " + best);

        Result opt = CliRun.run(join(List.of("optimise"), scene, "--vary", "board-coil.load=1 ohm..5 ohm",
                "--maximise", "mean_load_power:board-coil", "--out", dir.resolve("best.json").toString()));
        assertEquals(KinductMain.OK, opt.code(), opt.err());
        double found = org.kinduct.scene.path.SceneValues.of(org.kinduct.scene.io.SceneFiles.read(dir.resolve("best.json")))
                .read("board-coil.load");
        assertEquals(best, found, BEST_LOAD * best, opt.out());
    }

    /** Falling frame (frame-brake): mass, aluminium rod, frame width (scene file). */
    private static final double FRAME_MASS = 0.254;
    private static final double G = 9.81;
    private static final double FRAME_W = 0.1;
    /**
     * Terminal speed against the formula, relative. The runs end 0.16 s after the frame enters the
     * gap, while the speed still approaches v_t (at 0.6 T the last speed is 1.7 % above it); the
     * extrapolation is exact for the slow exponential that is left (the inductive mode, L/R ≈ 2 ms,
     * has died out), so what remains is the integration's error. Measured ≤ 1.3e-13.
     */
    private static final double TERMINAL = 1e-12;

    /**
     * Hard-drawn aluminium at 20 °C, ρ20 = 0.028264 Ω·mm²/m (IEC 60889, from memory, as the scene
     * model), rod of 10 mm round a 100 × 500 mm frame.
     */
    private static double frameResistance() {
        return 0.028264e-6 * 2 * (0.1 + 0.5) / (Math.PI * 0.01 * 0.01 / 4);
    }

    /**
     * Terminal speed against the field: in steady fall the braking force B·w·I with I = B·w·v/R
     * balances m·g, so v_t = m·g·R/(B·w)² (Griffiths, <i>Introduction to Electrodynamics</i>, 4th
     * ed., 2013, ch. 7; the self-inductance only delays the approach).
     */
    @Test
    void fallingFrameTerminalSpeedFollowsTheInverseSquareOfTheField() throws IOException {
        Path json = dir.resolve("frame.json");
        Result r = CliRun.run("sweep", "--demo", "frame-brake", "--set", "time.t1=0.3 s", "--vary",
                "pole-gap.bz=0.6 T..1.2 T:4", "--metric",
                "terminal_speed:frame", "--metric", "final_speed:frame", "--json", json.toString());
        assertEquals(KinductMain.OK, r.code(), r.err());
        for (Row row : StudyJson.read(Files.readString(json), "frame.json").rows()) {
            double b = row.values()[0];
            double expected = FRAME_MASS * G * frameResistance() / (b * FRAME_W * b * FRAME_W);
            assertEquals(expected, row.metrics()[0], TERMINAL * expected, "B = " + b + " T");
        }
    }

    private static String[] join(List<String> head, String[] middle, String... tail) {
        List<String> all = new java.util.ArrayList<>(head);
        all.addAll(List.of(middle));
        all.addAll(List.of(tail));
        return all.toArray(String[]::new);
    }
}
