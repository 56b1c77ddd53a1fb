package org.kinduct.solver.plate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * Plates riding free bodies, and free bodies carrying the field over plates, along the whole path
 * a scene takes ({@link SceneRun}): the drag brakes the body, its reaction pushes the source's
 * body, the eddy-current heat enters the energy audit, and the samples report the drag that moved
 * the body.
 */
class FreePlateTest {

    /** Sides of the polygons standing for circles. */
    private static final int SIDES = 64;
    private static final double SIGMA_S_PER_M = PlateScenes.SIGMA_S_PER_M;
    private static final double THICKNESS_M = 0.001;
    private static final double DISC_M = 0.04;
    private static final double POLE_M = 0.01;
    private static final double POLE_AT_M = 0.02;
    private static final double BZ_T = 0.5;
    /** Heavy enough that the pole's sideways pull moves the disc's axle by nanometres: it only turns. */
    private static final double AXLE_MASS_KG = 1e4;
    /** ω decays at about 10 /s with this inertia (the closed form below). */
    private static final double INERTIA_KG_M2 = 4.9e-5;
    private static final double OMEGA0_RAD_PER_S = 20;

    /**
     * A disc spinning about its centre under a still circular pole off its centre brakes with
     * τ = −k·ω, so ω decays as exp(−k·t/I). The rate from the run is checked against the torque the
     * run's own samples report at each ω (the coupling: what the samples say is what moved the
     * body) and against Smythe's closed form (the physics).
     */
    @Test
    void aDiscSpinningUnderAPoleDecaysAtSmythesRate() {
        Source pole = new Source.FieldPatch("pole", Body.FIXED,
                PlateScenes.circle(new Vec2(POLE_AT_M, 0), POLE_M, SIDES), BZ_T);
        RunResult run = new SceneRun(spinningDisc(OMEGA0_RAD_PER_S, pole, 0.0008)).result();
        List<Snapshot> samples = run.samples();
        double tEnd = samples.get(samples.size() - 1).tS();
        double runRate = Math.log(omega(samples.get(0)) / omega(samples.get(samples.size() - 1))) / tEnd;
        // ∫ k(t)/I dt by the trapezoidal rule over the samples, k = −τ/ω from each sample's plate.
        double integral = 0;
        for (int i = 1; i < samples.size(); i++) {
            double dt = samples.get(i).tS() - samples.get(i - 1).tS();
            integral += 0.5 * dt * (damping(samples.get(i)) + damping(samples.get(i - 1))) / INERTIA_KG_M2;
        }
        double sampleRate = integral / tEnd;
        // Smythe, "On eddy currents in a rotating disk", Trans. AIEE 61, 1942 (as derived in
        // SpinningDiscTest): k = ½·σ·d·B²·A_pole·r0²·[1 − R²a²/(a² − r0²)²], the pole's area A
        // that of the polygon drawn.
        double poleArea = 0.5 * SIDES * POLE_M * POLE_M * Math.sin(2 * Math.PI / SIDES);
        double smythe = 0.5 * SIGMA_S_PER_M * THICKNESS_M * BZ_T * BZ_T * poleArea * POLE_AT_M * POLE_AT_M
                * (1 - POLE_M * POLE_M * DISC_M * DISC_M / Math.pow(DISC_M * DISC_M - POLE_AT_M * POLE_AT_M, 2))
                / INERTIA_KG_M2;
        System.out.printf("decay rate: run %.6f /s, samples' torque %.6f /s, Smythe %.6f /s%n", runRate, sampleRate,
                smythe);
        double ripple = samples.stream().mapToDouble(FreePlateTest::damping).max().orElseThrow()
                / samples.stream().mapToDouble(FreePlateTest::damping).min().orElseThrow() - 1;
        System.out.printf("k ripple over the samples %.2e%n", ripple);
        // Coupling: the trapezoidal rule cannot follow k's ripple as the lattice turns under the pole
        // (some 1e-3 between samples; measured 2.9e-4 off in the mean), nor the integrator's 1e-6
        // (CoupledSimulation's tolerance under field edges). A torque missing, doubled or of the
        // wrong sign would be off by order one.
        assertEquals(1, runRate / sampleRate, 1e-3, "decay rate against the samples' torque");
        // Physics: B_z jumps at the pole's rim, so the lattice error is about first order in h/R;
        // SpinningDiscTest measured 0.45 % at R/h = 20 and allows 3 % at R/h = 10; here R/h = 12.5.
        assertEquals(1, runRate / smythe, 0.02, "decay rate against Smythe's closed form");
        EnergyAudit audit = run.audit().orElseThrow();
        System.out.println("disc: " + audit + ", residual/turned over " + audit.residualJ() / audit.turnedOverJ());
    }

    /** Plate on a spring swinging over a magnet: the audit closes to 1e-6 of the energy turned over. */
    @Test
    void aPlateOnASpringSwingingOverAMagnetKeepsTheEnergyAuditClosed() {
        Motion.Free slider = new Motion.Free(0.01, 0, new Vec2(0.5, 0), 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(Vec2.ZERO, null, 100, 0)));
        Source magnet = new Source.CylinderMagnet("magnet", Body.FIXED, Vec2.ZERO, 0.005, 0.005, 0.002,
                Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Scene scene = new Scene("spring", "", List.of(new Body("slider", "slider", Vec2.ZERO, slider)), List.of(magnet),
                List.of(plate("plate", "slider", PlateScenes.rectangle(-0.02, -0.01, 0.02, 0.01), OptionalDouble.empty())),
                new TimeSpan(0, 0.1, 0.001));
        EnergyAudit audit = new SceneRun(scene).result().audit().orElseThrow();
        System.out.println("spring plate: " + audit + ", residual/turned over " + audit.residualJ() / audit.turnedOverJ());
        double kinetic0 = 0.5 * 0.01 * 0.5 * 0.5;
        // The magnet brakes the plate as it swings over it: much of the energy turns into heat.
        assertTrue(audit.eddyJ() > 0.1 * kinetic0, "eddy heat " + audit.eddyJ() + " J");
        assertEquals(0, audit.jouleJ() + audit.dampingJ() + audit.suppliedJ(), 0, "nothing else spends or supplies");
        // Conservation of energy (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §8.1):
        // the sheet's Joule heat is the work its drag takes, −F·v − τ·ω, to the solver's residual.
        assertEquals(0, audit.residualJ(), 1e-6 * audit.turnedOverJ(), "audit residual");
    }

    /**
     * The heat of a free plate or channel supplied from elsewhere enters the audit as that supply:
     * a shaker holding one of two magnets on its path (holding work; each magnet's body takes its
     * own share of the reaction), a pump keeping a channel's flow against the field (holding work),
     * an AC coil's drive (drive work). Each closes to 1e-6 of the energy turned over
     * (conservation of energy, Griffiths §8.1).
     */
    @Test
    void theAuditClosesWhateverSuppliesTheHeat() {
        Motion.Free onSpring = new Motion.Free(0.01, 0, new Vec2(0.2, 0), 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(Vec2.ZERO, null, 50, 0)));
        Body slider = new Body("slider", "slider", Vec2.ZERO, onSpring);
        Body shaker = new Body("shaker", "shaker", Vec2.ZERO, new Motion.Oscillate(0.004, 40, Math.PI / 2, 0));
        Conductor.Plate plate = plate("plate", "slider", PlateScenes.rectangle(-0.02, -0.01, 0.02, 0.01),
                OptionalDouble.empty());
        Scene shaken = new Scene("shaken", "", List.of(slider, shaker), List.of(
                new Source.CylinderMagnet("shaken", "shaker", new Vec2(-0.008, 0), 0.004, 0.005, 0.002,
                        Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z),
                new Source.CylinderMagnet("still", Body.FIXED, new Vec2(0.008, 0), 0.004, 0.005, 0.002,
                        Source.Side.BELOW, 1.2, Source.Magnetization.MINUS_Z)), List.of(plate),
                new TimeSpan(0, 0.03, 0.001));
        Conductor.Channel duct = new Conductor.Channel("duct", "slider", new Vec2(-0.03, 0), new Vec2(0.03, 0), 0.01,
                0.005, 1e6, Conductor.Channel.Profile.LAMINAR, new MeanFlow.Steady(2), List.of(), List.of(),
                OptionalDouble.empty());
        Scene pumped = new Scene("pumped", "", List.of(slider), List.of(magnet(Source.Magnetization.PLUS_Z)),
                List.of(duct), new TimeSpan(0, 0.03, 0.001));
        Source.SourceCoil coil = new Source.SourceCoil("coil", Body.FIXED,
                new Source.CoilShape.Circle(new Vec2(0.01, 0), 0.008), 200, -0.003, new Source.Drive(0, 2, 100, 0));
        Scene driven = new Scene("driven", "", List.of(slider), List.of(coil), List.of(plate),
                new TimeSpan(0, 0.02, 0.0005));
        for (Scene scene : List.of(shaken, pumped, driven)) {
            EnergyAudit audit = new SceneRun(scene).result().audit().orElseThrow();
            System.out.println(scene.name() + ": " + audit + ", residual/turned over "
                    + audit.residualJ() / audit.turnedOverJ());
            double supplied = scene == driven ? audit.driveJ() : audit.holdingJ();
            assertTrue(supplied > 0.01 * audit.eddyJ(), scene.name() + ": supplied " + supplied + " J");
            assertEquals(0, audit.residualJ(), 1e-6 * audit.turnedOverJ(), scene.name() + ": audit residual");
        }
    }

    /**
     * A plate on one free body and a magnet on another, nothing else acting: the drag on the plate
     * and its reaction on the magnet's body are equal and opposite (Newton's third law, which holds
     * between the plate's closed currents and the source in magnetostatics: Griffiths §5.2), so the
     * total momentum stays what it was, the magnet is dragged along, and the audit closes.
     */
    @Test
    void aFreeMagnetIsDraggedAlongByTheFreePlateItBrakes() {
        double plateMass = 0.02;
        double patchMass = 0.05;
        Body plateBody = new Body("plate-body", "plate-body", Vec2.ZERO,
                new Motion.Free(plateMass, 0, new Vec2(1, 0.2), 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of()));
        Body patchBody = new Body("patch-body", "patch-body", new Vec2(0.01, 0), Motion.Free.ofMass(patchMass));
        Source magnet = new Source.CylinderMagnet("magnet", "patch-body", new Vec2(0.01, 0), 0.005, 0.005, 0.002,
                Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Scene scene = new Scene("drag", "", List.of(plateBody, patchBody), List.of(magnet),
                List.of(plate("plate", "plate-body", PlateScenes.rectangle(-0.02, -0.01, 0.04, 0.01),
                        OptionalDouble.empty())),
                new TimeSpan(0, 0.02, 0.001));
        RunResult run = new SceneRun(scene).result();
        Vec2 p0 = new Vec2(1, 0.2).times(plateMass);
        for (Snapshot s : run.samples()) {
            Vec2 p = s.freeBody("plate-body").velocity().times(plateMass)
                    .plus(s.freeBody("patch-body").velocity().times(patchMass));
            assertEquals(0, p.minus(p0).length(), 1e-9 * p0.length(), "momentum at t = " + s.tS());
        }
        Snapshot end = run.samples().get(run.samples().size() - 1);
        double pulled = end.freeBody("patch-body").velocity().x();
        System.out.println("magnet dragged to " + pulled + " m/s; " + run.audit().orElseThrow());
        assertTrue(pulled > 1e-3, "the magnet moves with the plate: " + pulled + " m/s");
        EnergyAudit audit = run.audit().orElseThrow();
        assertEquals(0, audit.residualJ(), 1e-6 * audit.turnedOverJ(), "audit residual");
    }

    /**
     * Reversal symmetries of the resistive limit (common practice): J is linear in the velocities
     * and in B, the force J × B quadratic in B. Spinning the other way mirrors the run about the x
     * axis (the scene, a disc over a magnet on that axis, is symmetric there), so ω(t) and the
     * torque change sign and nothing else; reversing the magnet changes nothing.
     */
    @Test
    void reversingTheSpinOrTheFieldMirrorsOrRepeatsTheRun() {
        List<Snapshot> forward = new SceneRun(spinningDisc(OMEGA0_RAD_PER_S, magnet(Source.Magnetization.PLUS_Z), 0.0025))
                .result().samples();
        List<Snapshot> backward = new SceneRun(spinningDisc(-OMEGA0_RAD_PER_S, magnet(Source.Magnetization.PLUS_Z),
                0.0025)).result().samples();
        List<Snapshot> flipped = new SceneRun(spinningDisc(OMEGA0_RAD_PER_S, magnet(Source.Magnetization.MINUS_Z),
                0.0025)).result().samples();
        // The mirror holds to rounding in the geometry (its polygons' sines and the grid built on
        // them); measured within 1e-10. Reversing B negates every current exactly, so that run
        // repeats to the last bit.
        for (int i = 0; i < forward.size(); i++) {
            double w = omega(forward.get(i));
            assertEquals(-w, omega(backward.get(i)), 1e-9 * OMEGA0_RAD_PER_S, "reversed spin, sample " + i);
            assertEquals(w, omega(flipped.get(i)), 0, "reversed field, sample " + i);
            double torque = forward.get(i).sheets().get(0).torqueNm();
            assertEquals(-torque, backward.get(i).sheets().get(0).torqueNm(), 1e-8 * Math.abs(torque),
                    "reversed spin's torque, sample " + i);
        }
        double end = omega(forward.get(forward.size() - 1));
        assertTrue(end > 0 && end < 0.99 * OMEGA0_RAD_PER_S, "the disc slows: " + end + " rad/s");
    }

    /** A still cylinder magnet where the pole is, below the disc. */
    private static Source magnet(Source.Magnetization north) {
        return new Source.CylinderMagnet("magnet", Body.FIXED, new Vec2(POLE_AT_M, 0), POLE_M, 0.005, 0.002,
                Source.Side.BELOW, 1.2, north);
    }

    /** The disc of {@link #aDiscSpinningUnderAPoleDecaysAtSmythesRate} with the given spin, source and cell. */
    private static Scene spinningDisc(double omega0, Source pole, double cellM) {
        Body disc = new Body("disc", "disc", Vec2.ZERO, new Motion.Free(AXLE_MASS_KG, INERTIA_KG_M2, Vec2.ZERO,
                omega0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of()));
        return new Scene("disc", "", List.of(disc), List.of(pole),
                List.of(plate("disc-plate", "disc", PlateScenes.circle(Vec2.ZERO, DISC_M, SIDES),
                        OptionalDouble.of(cellM))),
                new TimeSpan(0, 0.05, 0.005));
    }

    private static Conductor.Plate plate(String id, String body, List<Vec2> outline, OptionalDouble cellM) {
        return PlateScenes.plate(id, body, outline, List.of(), THICKNESS_M, List.of(), List.of(), cellM);
    }

    private static double omega(Snapshot s) {
        return s.freeBody("disc").omegaRadPerS();
    }

    /** k = −τ/ω of the sample's plate. */
    private static double damping(Snapshot s) {
        return -s.sheets().get(0).torqueNm() / omega(s);
    }
}
