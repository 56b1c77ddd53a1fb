package org.kinduct.solver.plate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
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
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.StreamLattice;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * How plates and channels ride a run: one grid per conductor in its body's frame reused at every
 * instant (checked against grids built where the conductor is), every sample of a window, runs
 * whose circuits are coupled, and free-body runs whose motion they brake.
 */
class SheetRunTest {

    private static final double CELL_M = 0.001;

    private static final List<Source> MAGNETS = List.of(
            new Source.BlockMagnet("north", Body.FIXED, new Vec2(0.004, 0.003), 0.01, 0.01, 0.005, 0.2, 0.002,
                    Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z),
            new Source.BlockMagnet("south", Body.FIXED, new Vec2(-0.012, -0.006), 0.008, 0.012, 0.005, 0, 0.002,
                    Source.Side.BELOW, 1.2, Source.Magnetization.MINUS_Z));

    /** A square plate of side 40 mm about (cx, cy) with an off-centre hole, two electrodes and a pair. */
    private static Conductor.Plate plate(String body, double cx, double cy, boolean turned) {
        List<Vec2> outline = PlateScenes.rectangle(cx - 0.02, cy - 0.02, cx + 0.02, cy + 0.02);
        List<Vec2> hole = PlateScenes.rectangle(cx + 0.004, cy - 0.012, cx + 0.012, cy - 0.003);
        // Electrodes off the grid's lines: one at a cell corner would be carried from either of two
        // equally near cells, which rounding picks.
        Vec2 a = new Vec2(cx - 0.02, cy + 0.0053);
        Vec2 b = new Vec2(cx + 0.0071, cy + 0.02);
        if (turned) {
            // A quarter turn counter-clockwise about the centre: (x, y) → (−y, x), exact in doubles.
            Vec2 c = new Vec2(cx, cy);
            hole = hole.stream().map(p -> c.plus(p.minus(c).perp())).toList();
            a = c.plus(a.minus(c).perp());
            b = c.plus(b.minus(c).perp());
        }
        return PlateScenes.plate("plate", body, outline, List.of(hole), 0.002,
                List.of(new Conductor.Electrode("a", a), new Conductor.Electrode("b", b)),
                List.of(new Conductor.ElectrodePair("a", "b")), OptionalDouble.of(CELL_M));
    }

    private static void assertSameState(SheetState expected, SheetState actual, String what) {
        double force = expected.forceN().length();
        assertEquals(expected.forceN().x(), actual.forceN().x(), 1e-9 * force, what + ": F_x");
        assertEquals(expected.forceN().y(), actual.forceN().y(), 1e-9 * force, what + ": F_y");
        assertEquals(expected.joulePowerW(), actual.joulePowerW(), 1e-9 * expected.joulePowerW(), what + ": P");
        double voltage = expected.pairs().get(0).voltageV();
        assertEquals(voltage, actual.pairs().get(0).voltageV(), 1e-9 * Math.abs(voltage), what + ": U");
    }

    @Test
    void gridBuiltOnceInTheBodysFrameGivesWhatAGridBuiltWhereThePlateIsGives() {
        // Gliding 2 mm (two cells) in 4 ms: the frame's grid, moved, lies on the cells of a grid
        // built around the plate drawn 2 mm on, so both sample the same points.
        Vec2 v = new Vec2(0.5, 0);
        SheetState moved = PlateScenes.sheet(PlateScenes.scene(List.of(PlateScenes.glide("slide", v)), MAGNETS,
                List.of(plate("slide", 0, 0, false))), 0.004, "plate");
        SheetState drawnThere = PlateScenes.sheet(PlateScenes.scene(List.of(PlateScenes.glide("slide", v)), MAGNETS,
                List.of(plate("slide", 0.002, 0, false))), 0, "plate");
        assertSameState(drawnThere, moved, "translated");

        // Spinning a quarter turn about the plate's centre: the square grid turns onto itself.
        double omega = 40;
        Body spinner = new Body("rotor", "rotor", Vec2.ZERO, new Motion.Spin(omega, 0));
        SheetState turned = PlateScenes.sheet(PlateScenes.scene(List.of(spinner), MAGNETS,
                List.of(plate("rotor", 0, 0, false))), Math.PI / 2 / omega, "plate");
        SheetState drawnTurned = PlateScenes.sheet(PlateScenes.scene(List.of(spinner), MAGNETS,
                List.of(plate("rotor", 0, 0, true))), 0, "plate");
        assertSameState(drawnTurned, turned, "turned");
    }

    @Test
    void everySampleOfAWindowCarriesItsPlatesWithABoundedStreamFunction() {
        Scene scene = new Scene("window", "", List.of(PlateScenes.glide("slide", new Vec2(0.5, 0))), MAGNETS,
                List.of(plate("slide", 0, 0, false)), new TimeSpan(0, 0.01, 0.001));
        RunResult run = new SceneRun(scene).result();
        assertEquals(11, run.samples().size());
        for (Snapshot s : run.samples()) {
            SheetState plate = s.sheet("plate").orElseThrow();
            StreamLattice psi = plate.streamFunction();
            assertTrue(psi.nx() * psi.ny() <= StreamLattice.MAX_NODES, "lattice " + psi.nx() + " × " + psi.ny());
            assertEquals(new Vec2(0.5 * s.tS(), 0).x(), plate.pivotM().x(), 1e-15, "pivot where the body is");
        }
        // The run's scales read the plates too.
        double largest = run.samples().stream().mapToDouble(s -> s.sheets().get(0).forceN().length()).max()
                .orElseThrow();
        assertEquals(largest, run.scales().forceN(), 0);
    }

    @Test
    void platesRideRunsWhoseLoopsAreCoupledThroughTheirInductance() {
        // A closed loop makes the run a coupled one (inductive circuit model); the plate beside it
        // is solved at each of its samples as on its own.
        Conductor.Loop loop = Conductor.Loop.simple("loop", "slide", List.of(Conductor.Vertex.at(0.03, -0.01),
                Conductor.Vertex.at(0.05, -0.01), Conductor.Vertex.at(0.05, 0.01), Conductor.Vertex.at(0.03, 0.01)),
                WireSpec.of(Material.COPPER, 1e-3));
        List<Conductor> conductors = new ArrayList<>(List.of(plate("slide", 0, 0, false), loop));
        Scene scene = new Scene("coupled", "", List.of(PlateScenes.glide("slide", new Vec2(0.5, 0))), MAGNETS,
                conductors, new TimeSpan(0, 0.004, 0.001));
        SceneRun run = new SceneRun(scene, new RunRequest(scene.time(), CircuitModel.INDUCTIVE, List.of()),
                RunMonitor.NONE, true);
        RunResult result = run.result();
        assertTrue(result.plan().coupled());
        SheetState alone = PlateScenes.sheet(scene, 0.003, "plate");
        assertSameState(alone, result.at(0.003).sheet("plate").orElseThrow(), "in a coupled run");
        assertTrue(result.at(0.003).conductor("loop").isPresent());
    }

    /**
     * A plate on a free body falling past the magnets, and a magnet falling over a still plate: the
     * runs go through, each sample carries the plate where the run has its body, the magnet falls
     * slower than it would freely (Lenz's law: the plate's reaction holds it back), and the
     * eddy-current heat in the audit is the samples' Joule power over the run (trapezoidal rule).
     */
    @Test
    void freeBodyRunsCarryTheirPlatesDrag() {
        Body falling = new Body("sled", "sled", Vec2.ZERO, Motion.Free.ofMass(0.01));
        Scene plateOnFreeBody = new Scene("free", "", List.of(falling), MAGNETS, List.of(plate("sled", 0, 0, false)),
                new TimeSpan(0, 0.01, 0.001), new Vec2(0, -9.81));
        RunResult run = new SceneRun(plateOnFreeBody).result();
        double heat = 0;
        for (int i = 0; i < run.samples().size(); i++) {
            Snapshot s = run.samples().get(i);
            Vec2 at = s.freeBody("sled").pivot().plus(s.freeBody("sled").offset());
            assertEquals(0, s.sheet("plate").orElseThrow().pivotM().minus(at).length(), 0, "plate where its body is");
            if (i > 0) {
                heat += 0.5 * 0.001 * (s.sheets().get(0).joulePowerW() + run.samples().get(i - 1).sheets().get(0)
                        .joulePowerW());
            }
        }
        double eddy = run.audit().orElseThrow().eddyJ();
        assertTrue(eddy > 0, "eddy heat " + eddy);
        // The trapezoidal rule's error over ten samples of a smooth power curve.
        assertEquals(heat, eddy, 0.02 * eddy, "eddy heat against the samples' power");

        List<Source> magnetOnFreeBody = List.of(new Source.BlockMagnet("puck", "sled", Vec2.ZERO, 0.01, 0.01, 0.005,
                0, 0.002, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z));
        Scene magnetFalls = new Scene("free", "", List.of(falling), magnetOnFreeBody,
                List.of(plate(Body.FIXED, 0, 0, false)), new TimeSpan(0, 0.01, 0.001), new Vec2(0, -9.81));
        RunResult fall = new SceneRun(magnetFalls).result();
        double vy = fall.samples().get(fall.samples().size() - 1).freeBody("sled").velocity().y();
        assertTrue(vy < 0 && vy > -9.81 * 0.01, "braked fall: " + vy + " m/s");
        assertTrue(fall.audit().orElseThrow().eddyJ() > 0, "the still plate heats");
    }
}
