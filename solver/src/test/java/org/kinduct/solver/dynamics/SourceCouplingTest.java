package org.kinduct.solver.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.solver.Snapshot;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;
import org.kinduct.solver.circuit.LoopInductance;

/** Coupling to the physical sources: a driven coil (transformer) and a free magnet. */
class SourceCouplingTest {

    private static final double WIRE_D = 0.5e-3;
    /** Copper, IEC 60028: ρ20 = 1/58 Ω·mm²/m. */
    private static final double RHO_COPPER = 1.0 / 58 * 1e-6;
    private static final double AUDIT_TOL = 1e-6;
    /**
     * The simulation takes the coil's flux from the field kernels, the check takes M from the
     * Neumann/Jackson path of {@link LoopInductance}: two independent routes, each about 1e-9.
     */
    private static final double PHASOR_TOL = 1e-5;

    private final CoupledSimulation simulation = new CoupledSimulation(1e-10, CircuitModel.INDUCTIVE);

    /**
     * A loop under an AC coil is a transformer secondary: in steady state
     * |I| = ω·M·I_c/√(R² + (ωL)²) (phasor analysis of L·dI/dt + R·I = −M·dI_c/dt; e.g. Griffiths,
     * <i>Introduction to Electrodynamics</i>, 4th ed., §7.2.3), and the drive's work is the heat
     * plus the change of ½·L·I².
     */
    @Test
    void loopUnderAnAcCoilCarriesThePhasorCurrentAndTheDrivePaysForTheHeat() {
        double w = 0.04;
        int turns = 20;
        double load = 0.5;
        double f = 200;
        double amplitude = 2;
        List<Vec2> outline = List.of(new Vec2(-w / 2, -w / 2), new Vec2(w / 2, -w / 2), new Vec2(w / 2, w / 2),
                new Vec2(-w / 2, w / 2));
        Conductor.Loop loop = new Conductor.Loop("pickup", Body.FIXED,
                outline.stream().map(p -> new Conductor.Vertex(p, null)).toList(), turns,
                WireSpec.of(Material.COPPER, WIRE_D), false, load, 20);
        Source.SourceCoil coil = new Source.SourceCoil("primary", Body.FIXED,
                new Source.CoilShape.Circle(new Vec2(0.004, -0.002), 0.015), 50, 0.005,
                new Source.Drive(0, amplitude, f, 0));
        Scene scene = new Scene("transformer", "", List.of(), List.of(coil), List.of(loop), new TimeSpan(0, 1, 0.01));

        double r = turns * 4 * w * RHO_COPPER / (Math.PI * WIRE_D * WIRE_D / 4) + load;
        double l = LoopInductance.self(outline, WIRE_D / 2, turns);
        double m = LoopInductance.mutualToCircleCoil(outline, turns, new Vec2(0.004, -0.002), 0.015, 0.005, 50);
        double omega = 2 * Math.PI * f;
        double expected = omega * Math.abs(m) * amplitude / Math.hypot(r, omega * l);
        double tau = l / r;
        assertTrue(tau < 0.1 / f, "τ = " + tau);

        int perPeriod = 64;
        CoupledRun run = simulation.simulate(scene, 0, 3.0 / f + 40 * tau, 1.0 / (f * perPeriod));
        List<Snapshot> samples = run.samples();
        double sumSq = 0;
        for (int i = samples.size() - perPeriod; i < samples.size(); i++) {
            double current = samples.get(i).conductor("pickup").orElseThrow().currentA();
            sumSq += current * current;
        }
        assertEquals(expected, Math.sqrt(2 * sumSq / perPeriod), PHASOR_TOL * expected);

        EnergyAudit audit = run.audit();
        assertTrue(audit.driveJ() > 0, audit.toString());
        assertEquals(0, audit.residualJ(), AUDIT_TOL * audit.driveJ(), audit.toString());
    }

    /**
     * A free magnet gliding over a closed loop is braked by the loop's current (the reaction of
     * the force on the loop): its lost kinetic energy is the heat plus the stored ½·L·I².
     */
    @Test
    void freeMagnetOverALoopIsBrakedAndTheAuditBalances() {
        double w = 0.02;
        Conductor.Loop loop = new Conductor.Loop("ring", Body.FIXED, List.of(Conductor.Vertex.at(-w / 2, -w / 2),
                Conductor.Vertex.at(w / 2, -w / 2), Conductor.Vertex.at(w / 2, w / 2), Conductor.Vertex.at(-w / 2, w / 2)),
                10, WireSpec.of(Material.COPPER, WIRE_D), false, 0.01, 20);
        Motion.Free puck = new Motion.Free(0.002, 0, new Vec2(0.5, 0), 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of());
        Body body = new Body("puck", null, new Vec2(-0.03, 0.002), puck);
        Source.CylinderMagnet magnet = new Source.CylinderMagnet("magnet", "puck", new Vec2(-0.03, 0.002), 0.005,
                0.005, 0.002, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Scene scene = new Scene("puck", "", List.of(body), List.of(magnet), List.of(loop), new TimeSpan(0, 1, 0.01));

        CoupledRun run = simulation.simulate(scene, 0, 0.12, 0.002);
        EnergyAudit audit = run.audit();
        assertTrue(audit.deltaKineticJ() < 0, audit.toString());
        assertEquals(0, audit.residualJ(), AUDIT_TOL * audit.jouleJ(), audit.toString());
        double vEnd = run.samples().get(run.samples().size() - 1).freeBody("puck").velocity().x();
        assertTrue(vEnd < 0.5, "not braked: " + vEnd);
    }
}
