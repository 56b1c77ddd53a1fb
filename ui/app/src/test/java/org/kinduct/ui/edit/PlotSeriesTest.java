package org.kinduct.ui.edit;

import org.kinduct.report.EnergyText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.solver.dynamics.EnergyAudit;

class PlotSeriesTest {

    private static final double TOL = 1e-12;

    private static Scene glidingMagnet() {
        Scene s = Fixtures.loopAndMagnet();
        return find(MotionSheet.of(s, "magnet"), "Motion").check(s, "glide").apply(s);
    }

    /** The run of {@code s} over {@code window}, as the editor, the export and the command line make it. */
    private static RunResult run(Scene s, TimeSpan window) {
        return new SceneRun(s, new RunRequest(window, CircuitModel.AUTO, List.of()), RunMonitor.NONE, true).result();
    }

    private static Property find(List<Property> props, String label) {
        return props.stream().filter(p -> p.label().startsWith(label)).findFirst().orElseThrow();
    }

    @Test
    void bodyPositionOfAPrescribedGlideIsPivotPlusVelocityTimesTime() {
        Scene s = glidingMagnet();
        Motion.Glide g = (Motion.Glide) s.body(SceneEdits.bodyOf(s, "magnet")).orElseThrow().motion();
        Vec2 pivot = s.body(SceneEdits.bodyOf(s, "magnet")).orElseThrow().pivot();
        RunResult run = run(s, new TimeSpan(0, 1, 0.25));
        List<Snapshot> series = run.samples();
        List<PlotSeries.Line> lines = PlotSeries.lines(run, Set.of("magnet"), PlotSeries.Quantity.POSITION_X);
        assertEquals(1, lines.size());
        for (int i = 0; i < series.size(); i++) {
            // Uniform motion x = x0 + v·t (definition of constant velocity).
            assertEquals(pivot.x() + g.velocity().x() * series.get(i).tS(), lines.get(0).values()[i], TOL);
        }
        List<PlotSeries.Line> speed = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.SPEED);
        assertEquals(g.velocity().length(), speed.get(0).values()[2], TOL);
    }

    /**
     * The rotor demo's coil is centred over its magnets at t = 0 and t = 25 ms, where by symmetry
     * Φ(θ) = Φ(−θ) and the EMF is zero (common practice): the solver returns rounding noise there,
     * which the plot must show as zero, not stretch to the axis height.
     */
    @Test
    void aConductorsRoundingNoiseIsPlottedAsZero() {
        Scene s = org.kinduct.demo.Demos.load("spinning-coil-generator");
        RunResult run = run(s, new TimeSpan(0, 0.025, 1.25e-3));
        List<Snapshot> series = run.samples();
        double[] emf = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.EMF).get(0).values();
        assertTrue(series.get(0).conductors().get(0).emfV() != 0, "the solver's value there is noise, not an exact 0");
        assertEquals(0, emf[0], 0.0);
        assertEquals(0, emf[emf.length - 1], 0.0);
        double peak = 0;
        for (double v : emf) {
            peak = Math.max(peak, Math.abs(v));
        }
        assertTrue(peak > 0.1, "edges crossing the magnets: " + peak + " V");
    }

    @Test
    void aFreeBodyIsPlottedAsItsRunMovedIt() {
        Scene s = Fixtures.springCart(false);
        RunResult run = run(s, s.time());
        PlotSeries.Line x = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.POSITION_X).get(0);
        for (int i = 0; i < run.samples().size(); i += 50) {
            Pose p = run.samples().get(i).freeBodies().get("cart");
            assertEquals(p.pivot().x() + p.offset().x(), x.values()[i], 0);
        }
        assertTrue(x.values()[50] != x.values()[0], "it moved, unlike its drawn pose");
    }

    @Test
    void conductorQuantitiesFollowTheSelectionAndTheSnapshots() {
        Scene s = glidingMagnet();
        RunResult run = run(s, new TimeSpan(0, 1, 0.5));
        PlotSeries.Line f = PlotSeries.lines(run, Set.of("loop"), PlotSeries.Quantity.FORCE_X).get(0);
        assertEquals("loop", f.id());
        assertEquals(run.samples().get(1).conductor("loop").orElseThrow().forceN().x(), f.values()[1], 0);
    }

    @Test
    void selectingOnlySourcesKeepsEveryConductorPlotted() {
        Scene s = SceneEdits.addConductor(glidingMagnet(), new Conductor.Wire("rod", Body.FIXED,
                List.of(Conductor.Vertex.at(0.06, -0.01), Conductor.Vertex.at(0.06, 0.01))));
        RunResult run = run(s, new TimeSpan(0, 1, 0.5));
        assertEquals(List.of("loop", "rod"), ids(PlotSeries.lines(run, Set.of("magnet"), PlotSeries.Quantity.EMF)));
        assertEquals(List.of("rod"), ids(PlotSeries.lines(run, Set.of("magnet", "rod"), PlotSeries.Quantity.EMF)),
                "a selected conductor still picks its line");
    }

    private static List<String> ids(List<PlotSeries.Line> lines) {
        return lines.stream().map(PlotSeries.Line::id).toList();
    }

    @Test
    void energyLineNamesEveryTermAndTheResidual() {
        EnergyAudit a = new EnergyAudit(1e-3, 0, 0, 6e-4, 0, 1e-4, 2e-4, 1e-4, 0);
        String text = EnergyText.of(a);
        for (String term : List.of("work in", "Joule heat", "eddy-current heat", "damping heat", "Δ kinetic", "Δ potential", "Δ magnetic",
                "residual")) {
            assertTrue(text.contains(term), text);
        }
        assertTrue(text.contains("work in 1.00 mJ"), text);
    }

    @Test
    void aPlateInAUniformFieldPlotsTheRodEmfAcrossItsElectrodesAndNoDrag() {
        // 60 mm × 40 mm plate gliding along +x at 1 m/s through a uniform 0.1 T, electrodes on its top and bottom edges.
        Scene s = Scene.empty("plate").withSources(List.of(new org.kinduct.scene.Source.UniformField("b", 0.1)))
                .withConductors(List.of(new Conductor.Plate("plate", Body.FIXED, List.of(new Vec2(0, 0),
                        new Vec2(0.06, 0), new Vec2(0.06, 0.04), new Vec2(0, 0.04)), List.of(), 0.002,
                        ShapeFactory.PLATE_CONDUCTIVITY, List.of(), List.of(), java.util.OptionalDouble.empty())));
        s = SheetEdits.addElectrode(s, "plate", new Vec2(0.03, 0.04), 1e-6);
        s = SheetEdits.addElectrode(s, "plate", new Vec2(0.03, 0), 1e-6);
        s = SceneEdits.setMotion(s, "plate", new Motion.Glide(new Vec2(1, 0)), Vec2.ZERO);
        RunResult run = run(s, new TimeSpan(0, 0.02, 0.01));
        List<PlotSeries.Line> voltage = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.PAIR_VOLTAGE);
        assertEquals(1, voltage.size());
        assertEquals("plate: e1 − e2", voltage.get(0).id());
        for (double v : voltage.get(0).values()) {
            // v × B = (0, −v·B) drives charge to −y: φ(top) − φ(bottom) = −B·L·v (Griffiths (2013) §7.1.3).
            assertEquals(-0.1 * 0.04 * 1, v, 1e-9 * 0.004);
        }
        List<PlotSeries.Line> drag = PlotSeries.lines(run, Set.of("plate"), PlotSeries.Quantity.DRAG);
        assertEquals(List.of("plate"), drag.stream().map(PlotSeries.Line::id).toList());
        for (int i = 0; i < run.samples().size(); i++) {
            // No eddy current in a uniform field, hence no drag (same reference).
            assertEquals(0, drag.get(0).values()[i], 1e-9);
            assertEquals(run.samples().get(i).sheet("plate").orElseThrow().pairs().get(0).voltageV(),
                    voltage.get(0).values()[i], 0);
        }
    }

    @Test
    void aSpinningDiscsJouleHeatLineIsThePowerItsTorqueLineTakesFromTheSpin() {
        // A 24-gon disc 40 mm across, 1 mm thick, spinning at 20 rad/s about its centre over a small
        // still magnet 12 mm out from the axle.
        List<Vec2> disc = new java.util.ArrayList<>();
        for (int k = 0; k < 24; k++) {
            disc.add(new Vec2(0.02 * Math.cos(2 * Math.PI * k / 24), 0.02 * Math.sin(2 * Math.PI * k / 24)));
        }
        double omega = 20;
        Scene s = Scene.empty("disc").withBodies(List.of(new Body("axle", "axle", Vec2.ZERO,
                        new Motion.Spin(omega, 0))))
                .withSources(List.of(new org.kinduct.scene.Source.CylinderMagnet("m", Body.FIXED, new Vec2(0.012, 0),
                        0.004, 0.004, 0.001, org.kinduct.scene.Source.Side.BELOW, 1.2,
                        org.kinduct.scene.Source.Magnetization.PLUS_Z)))
                .withConductors(List.of(new Conductor.Plate("disc", "axle", disc, List.of(), 0.001,
                        ShapeFactory.PLATE_CONDUCTIVITY, List.of(), List.of(), java.util.OptionalDouble.empty())));
        RunResult run = run(s, new TimeSpan(0, 0.02, 0.01));
        double[] torque = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.TORQUE).get(0).values();
        double[] heat = PlotSeries.lines(run, Set.of(), PlotSeries.Quantity.JOULE_HEAT).get(0).values();
        for (int i = 0; i < torque.length; i++) {
            // With still sources all the heat comes from the spin: P = −τ·ω (energy conservation, Griffiths
            // (2013) §8.1); the field brakes the spin, so τ opposes ω.
            assertEquals(-torque[i] * omega, heat[i], 1e-6 * heat[i]);
            assertTrue(torque[i] < 0, "braking torque " + torque[i]);
        }
    }

    @Test
    void aSceneOfPlatesAloneTurnsAWireQuantityIntoItsPairVoltagesOrDragAndOtherwiseTheChoiceStays() {
        Scene plate = Scene.empty("plate").withConductors(List.of(new Conductor.Plate("plate", Body.FIXED,
                List.of(new Vec2(0, 0), new Vec2(0.06, 0), new Vec2(0.06, 0.04), new Vec2(0, 0.04)), List.of(), 0.002,
                ShapeFactory.PLATE_CONDUCTIVITY, List.of(), List.of(), java.util.OptionalDouble.empty())));
        assertEquals(PlotSeries.Quantity.DRAG, PlotSeries.fitting(plate, PlotSeries.Quantity.EMF));
        Scene paired = SheetEdits.addElectrode(SheetEdits.addElectrode(plate, "plate", new Vec2(0.03, 0), 1e-6),
                "plate", new Vec2(0.03, 0.04), 1e-6);
        assertEquals(PlotSeries.Quantity.PAIR_VOLTAGE, PlotSeries.fitting(paired, PlotSeries.Quantity.CURRENT));
        assertEquals(PlotSeries.Quantity.DRAG, PlotSeries.fitting(paired, PlotSeries.Quantity.DRAG));
        assertEquals(PlotSeries.Quantity.SPEED, PlotSeries.fitting(paired, PlotSeries.Quantity.SPEED));
        Scene withLoop = paired.withConductors(List.of(paired.conductors().get(0),
                Fixtures.loopAndMagnet().conductors().get(0)));
        assertEquals(PlotSeries.Quantity.EMF, PlotSeries.fitting(withLoop, PlotSeries.Quantity.EMF));
        assertEquals(PlotSeries.Quantity.EMF, PlotSeries.fitting(Scene.empty("none"), PlotSeries.Quantity.EMF));
    }
}
