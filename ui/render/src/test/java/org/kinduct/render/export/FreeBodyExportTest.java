package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Material;
import org.kinduct.scene.WireSpec;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.render.view.ViewTransform;

/**
 * A snapshot of a scene with a free body shows the body where the coupled run has it, with the
 * run's current — not the drawn pose with a quasi-static current — and the run's energy audit.
 */
class FreeBodyExportTest {

    private static final double SAME = 1e-9;

    @Test
    void fallingFrameIsExportedAtItsSimulatedPlaceAndCurrent() {
        Scene scene = Demos.load("frame-brake");
        double t = 0.5;
        Snapshot sample = CoupledSimulation.run(scene, scene.time().t0S(), scene.time().t1S(), scene.time().dtS())
                .samples().stream().filter(s -> Math.abs(s.tS() - t) < 1e-12).findFirst().orElseThrow();
        ConductorState expected = sample.conductors().get(0);

        Exporter export = new Exporter(scene, SnapshotOptions.standard(t, 800, 150, new ViewChoice.Fit(),
                LocalDate.of(2026, 1, 1), "test"));
        ConductorState drawn = export.snapshot().conductor(expected.id()).orElseThrow();

        assertEquals(expected.currentA(), drawn.currentA(), SAME * Math.abs(expected.currentA()));
        assertEquals(expected.vertices().get(0).y(), drawn.vertices().get(0).y(), SAME);
        String svg = export.svg();
        assertTrue(svg.contains("Energy over the run") && svg.contains("residual"), "energy audit on the page");
    }

    /** A loop dropped from rest falls g·t²/2 = 4.9 m in 1 s (free fall, no field to brake it): the fitted page still shows it. */
    @Test
    void fittedPageHoldsAFreeBodyWhereTheRunHasIt() {
        Body cage = new Body("cage", "cage", Vec2.ZERO, Motion.Free.ofMass(0.1));
        Conductor.Loop loop = Conductor.Loop.simple("loop", "cage", List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.1, 0), Conductor.Vertex.at(0.1, 0.1), Conductor.Vertex.at(0, 0.1)),
                WireSpec.awg(Material.COPPER, 24));
        Scene scene = Scene.empty("drop").withBodies(List.of(cage)).withConductors(List.of(loop))
                .withGravity(new Vec2(0, -9.81)).withTime(new TimeSpan(0, 1, 0.01));
        double t = 1;
        Snapshot snap = new SceneRun(scene).instant(t);
        SnapshotPage page = SnapshotPage.layout(scene, snap, List.of(), List.of(),
                ResultScales.of(List.of(snap)), null, ExportFixtures.options(t, 800, 150, new ViewChoice.Fit()));
        ViewTransform v = page.mapView();
        List<Vec2> placed = snap.conductor("loop").orElseThrow().vertices();
        assertEquals(-4.905, placed.get(0).y(), 0.01, "free fall over 1 s");
        for (Vec2 p : placed) {
            assertTrue(p.x() >= v.minX() && p.x() <= v.maxX() && p.y() >= v.minY() && p.y() <= v.maxY(),
                    p + " inside the page's map " + v.minX() + " … " + v.maxX() + ", " + v.minY() + " … " + v.maxY());
        }
    }

    /** A spinning plate's page plots what brakes it, the torque; a gliding plate's the drag. */
    @Test
    void aSpinningPlatesPagePlotsItsTorqueAndAGlidingOnesItsDrag() {
        Exporter spinning = new Exporter(Demos.load("disc-spin-down"), ExportFixtures.options(0, 600, 96,
                new ViewChoice.Fit()));
        String svg = spinning.svg();
        assertTrue(svg.contains("Torque on the plates over the run"), "torque chart");
        Exporter gliding = new Exporter(Demos.load("plate-brake"), ExportFixtures.options(0, 600, 96,
                new ViewChoice.Fit()));
        assertTrue(gliding.svg().contains("Force on the plates over the run"), "drag chart");
    }
}
