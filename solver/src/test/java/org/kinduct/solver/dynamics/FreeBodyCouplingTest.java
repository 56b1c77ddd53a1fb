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

/**
 * Conservation laws that tie the force, torque and reaction terms to the circuit equations:
 * energy (work = heat + stored; e.g. Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed.,
 * §8.1) and momentum (Newton's third law holds between closed circuits in magnetostatics,
 * Griffiths §5.2 / Jackson §5.2).
 */
class FreeBodyCouplingTest {

    private static final double B = 0.5;
    private static final double WIRE_D = 0.5e-3;
    private static final double AUDIT_TOL = 1e-6;
    /** Loop–loop forces come from central differences of M: their audit is looser. */
    private static final double DIFFERENCED_AUDIT_TOL = 1e-4;
    private static final double MOMENTUM_TOL = 1e-8;
    private static final double NEWTON_TOL = 1e-8;

    private final CoupledSimulation simulation = new CoupledSimulation(1e-10, CircuitModel.INDUCTIVE);

    /**
     * A loop spinning about its centre, off the region's edge but across it (a chord through the
     * centre would always halve the square's area, so the centre sits above the edge) is braked by the torque
     * of its own induced current; the audit only balances if that torque matches the EMF.
     */
    @Test
    void spinningLoopAcrossTheEdgeIsBrakedAndTheAuditBalances() {
        Conductor.Loop loop = new Conductor.Loop("coil", "rotor", vertices(shifted(square(0.1), 0, 0.03)), 20,
                WireSpec.of(Material.COPPER, WIRE_D), false, 1, 20);
        Motion.Free free = new Motion.Free(0.05, 2e-4, Vec2.ZERO, 20, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(new Vec2(0, 0.03), null, 1000, 0)));
        Scene scene = scene(List.of(new Body("rotor", null, new Vec2(0, 0.03), free)), "fixed", loop);
        CoupledRun run = simulation.simulate(scene, 0, 0.5, 0.01);
        EnergyAudit audit = run.audit();
        double spin = 0.5 * 2e-4 * 20 * 20;
        assertTrue(audit.jouleJ() > 0.05 * spin, "hardly braked: " + audit);
        assertEquals(0, audit.residualJ(), AUDIT_TOL * audit.jouleJ(), audit.toString());
    }

    /**
     * A free loop and a free field region push each other: with no other force the total
     * momentum stays what it was, and the kinetic energy lost is the heat plus the stored energy.
     */
    @Test
    void loopAndFreeRegionExchangeMomentumAndEnergy() {
        Conductor.Loop loop = new Conductor.Loop("coil", "puck", vertices(square(0.1)), 20,
                WireSpec.of(Material.COPPER, WIRE_D), false, 1, 20);
        Motion.Free puck = new Motion.Free(0.02, 0, new Vec2(0, -0.4), 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of());
        Motion.Free magnet = new Motion.Free(0.05, 0, new Vec2(0, 0.1), 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of());
        Scene scene = scene(List.of(new Body("puck", null, new Vec2(0, 0.06), puck),
                new Body("magnet", null, new Vec2(0, 0), magnet)), "magnet", shiftedLoop(loop, 0, 0.06));
        CoupledRun run = simulation.simulate(scene, 0, 0.3, 0.01);
        double p0 = 0.02 * -0.4 + 0.05 * 0.1;
        for (Snapshot s : run.samples()) {
            double p = 0.02 * s.freeBody("puck").velocity().y() + 0.05 * s.freeBody("magnet").velocity().y();
            assertEquals(p0, p, MOMENTUM_TOL, "t = " + s.tS());
        }
        EnergyAudit audit = run.audit();
        assertTrue(audit.jouleJ() > 1e-4, audit.toString());
        assertEquals(0, audit.residualJ(), AUDIT_TOL * audit.jouleJ(), audit.toString());
    }

    /**
     * Two loops on different bodies couple through their mutual inductance: a driven loop enters
     * the region on a prescribed path, a free loop beside it is pulled by their currents. The
     * holder's work must pay for heat, kinetic and magnetic energy.
     */
    @Test
    void coupledLoopsOnDifferentBodiesBalanceTheirEnergy() {
        Conductor.Loop driven = new Conductor.Loop("driven", "cart", vertices(square(0.1)), 50,
                WireSpec.of(Material.COPPER, WIRE_D), false, 0.5, 20);
        Conductor.Loop follower = new Conductor.Loop("follower", "sled", vertices(shifted(square(0.1), 0.12, 0.1)), 50,
                WireSpec.of(Material.COPPER, WIRE_D), false, 0.5, 20);
        Body cart = new Body("cart", null, new Vec2(0, 0.06), new Motion.Glide(new Vec2(0, -0.5)));
        Motion.Free sled = new Motion.Free(0.01, 0, Vec2.ZERO, 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(new Vec2(0.12, 0.2), null, 50, 0.1)));
        Scene scene = new Scene("pair", "", List.of(cart, new Body("sled", null, new Vec2(0.12, 0.1), sled)),
                List.of(regionSource(Body.FIXED)), List.of(shiftedLoop(driven, 0, 0.06), follower),
                new TimeSpan(0, 1, 0.01));
        CoupledRun run = simulation.simulate(scene, 0, 0.2, 0.005);
        EnergyAudit audit = run.audit();
        assertTrue(audit.holdingJ() > 0, audit.toString());
        assertTrue(Math.abs(run.samples().get(run.samples().size() - 1).conductor("follower").orElseThrow().currentA()) > 0,
                "no induced current in the follower");
        assertEquals(0, audit.residualJ(), DIFFERENCED_AUDIT_TOL * audit.holdingJ(), audit.toString());
    }

    /**
     * Two bodies joined by a spring, one pushed by a constant force, under gravity: internal
     * spring forces cancel, so the centre of mass moves as x = ½·(F + M·g)/M·t² (Newton's second
     * law for a system of particles; e.g. Goldstein, <i>Classical Mechanics</i>, 3rd ed., §1.2),
     * and the work of the push is the kinetic energy plus the spring's and gravity's.
     */
    @Test
    void springPairMovesItsCentreOfMassByNewtonAndConservesEnergy() {
        double m1 = 0.3;
        double m2 = 0.7;
        Vec2 push = new Vec2(0.4, 0.1);
        Vec2 g = new Vec2(0, -9.81);
        Motion.Free first = new Motion.Free(m1, 0, Vec2.ZERO, 0, 0, push, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(null, "second", 40, 0.05)));
        Motion.Free second = new Motion.Free(m2, 0, Vec2.ZERO, 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of());
        Scene scene = new Scene("pair", "", List.of(new Body("first", null, new Vec2(0, 0), first),
                new Body("second", null, new Vec2(0.1, 0), second)), List.of(), List.of(), new TimeSpan(0, 1, 0.01))
                .withGravity(g);
        CoupledRun run = simulation.simulate(scene, 0, 1, 0.05);
        double total = m1 + m2;
        Vec2 accel = push.plus(g.times(total)).times(1 / total);
        for (Snapshot s : run.samples()) {
            Vec2 centre = s.freeBody("first").offset().times(m1).plus(s.freeBody("second").offset().times(m2)).times(1 / total);
            Vec2 expected = accel.times(0.5 * s.tS() * s.tS());
            assertTrue(centre.eq(expected, NEWTON_TOL), "t = " + s.tS() + ": " + centre + " vs " + expected);
        }
        EnergyAudit audit = run.audit();
        assertEquals(0, audit.residualJ(), AUDIT_TOL * Math.abs(audit.deltaKineticJ()), audit.toString());
    }

    private static Scene scene(List<Body> bodies, String regionBody, Conductor.Loop loop) {
        return new Scene("test", "", bodies, List.of(regionSource(regionBody)), List.of(loop), new TimeSpan(0, 1, 0.01));
    }

    /** B_z = B below y = 0 of the body's frame, far wider than the loops. */
    private static Source regionSource(String body) {
        return new Source.FieldPatch("region", body,
                List.of(new Vec2(-10, -10), new Vec2(10, -10), new Vec2(10, 0), new Vec2(-10, 0)), B);
    }

    private static List<Vec2> square(double side) {
        double h = side / 2;
        return List.of(new Vec2(-h, -h), new Vec2(h, -h), new Vec2(h, h), new Vec2(-h, h));
    }

    private static List<Vec2> shifted(List<Vec2> points, double dx, double dy) {
        return points.stream().map(p -> p.plus(new Vec2(dx, dy))).toList();
    }

    private static Conductor.Loop shiftedLoop(Conductor.Loop loop, double dx, double dy) {
        return new Conductor.Loop(loop.id(), loop.body(), loop.vertices().stream()
                .map(v -> new Conductor.Vertex(v.at().plus(new Vec2(dx, dy)), v.body())).toList(),
                loop.turns(), loop.wire(), loop.open(), loop.loadOhm(), loop.temperatureC());
    }

    private static List<Conductor.Vertex> vertices(List<Vec2> points) {
        return points.stream().map(p -> new Conductor.Vertex(p, null)).toList();
    }
}
