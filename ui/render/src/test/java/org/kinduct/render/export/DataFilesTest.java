package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.kinduct.render.export.ExportFixtures.B;
import static org.kinduct.render.export.ExportFixtures.FRAME_H;
import static org.kinduct.render.export.ExportFixtures.ROD;
import static org.kinduct.render.export.ExportFixtures.SPEED;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;

/**
 * The data files: headers with units, values identical to the solver's, and the physics they
 * carry checked against textbook results: a rod of length L at speed v across B has EMF B·L·v,
 * and a loop entering a field region at v with side h across the motion has EMF −B·h·v by the
 * flux rule (D. J. Griffiths, Introduction to Electrodynamics, 4th ed., 2013, eq. 7.13 and
 * §7.1.3; sign: counter-clockwise positive, flux growing out of the screen drives clockwise).
 */
class DataFilesTest {

    /** Relative tolerance for the solver against the textbook formulas (ideal patch edges, exact flux). */
    private static final double PHYSICS_REL = 1e-6;

    @TempDir
    Path dir;

    @Test
    void seriesCsvHeaderNamesEachConductorQuantityWithItsUnit() {
        Scene scene = ExportFixtures.frameEnteringPatch();
        Exporter export = new Exporter(scene, ExportFixtures.options(0, 600, 96, new ViewChoice.Fit()));

        String header = DataFiles.seriesCsv(export.result().samples()).lines().findFirst().orElseThrow();

        assertEquals("t_s,frame.flux_Wb,frame.linkage_Wb,frame.emf_V,frame.emf_flux_V,frame.current_A,"
                + "frame.force_x_N,frame.force_y_N,rod.emf_V", header);
    }

    @Test
    void seriesCsvRowsEqualTheSolverAndTheTextbookEmfs() {
        Scene scene = ExportFixtures.frameEnteringPatch();
        Exporter export = new Exporter(scene, ExportFixtures.options(0, 600, 96, new ViewChoice.Fit()));
        List<Snapshot> expected = new SceneSolver(scene).series(scene.time().t0S(), scene.time().t1S(),
                scene.time().dtS());

        List<String> lines = DataFiles.seriesCsv(export.result().samples()).lines().toList();

        assertEquals(expected.size() + 1, lines.size(), "one row per time");
        for (int i = 0; i < expected.size(); i++) {
            String[] cells = lines.get(i + 1).split(",", -1);
            Snapshot s = expected.get(i);
            ConductorState frame = s.conductor("frame").orElseThrow();
            ConductorState rod = s.conductor("rod").orElseThrow();
            double[] want = {s.tS(), frame.fluxWb(), frame.linkageWb(), frame.emfV(), frame.emfFluxV(),
                frame.currentA(), frame.forceN().x(), frame.forceN().y(), rod.emfV()};
            assertEquals(want.length, cells.length, "cells in row " + (i + 1));
            for (int c = 0; c < want.length; c++) {
                assertEquals(want[c], Double.parseDouble(cells[c]), 0.0, "row " + (i + 1) + " column " + c);
            }
            assertEquals(-B * FRAME_H * SPEED, Double.parseDouble(cells[3]), PHYSICS_REL * B * FRAME_H * SPEED,
                    "frame EMF at t = " + s.tS());
            assertEquals(-B * ROD * SPEED, Double.parseDouble(cells[8]), PHYSICS_REL * B * ROD * SPEED,
                    "rod EMF at t = " + s.tS());
        }
    }

    @Test
    void fieldCsvGivesTheSolversFieldOnAGridOverTheView() {
        Scene scene = ExportFixtures.rodInUniformField();
        double t = 0.03;
        ViewChoice.Box box = new ViewChoice.Box(-0.05, -0.1, 0.25, 0.2);
        SceneField field = new SceneSolver(scene).fieldAt(t);

        List<String> lines = DataFiles.fieldCsv(field, box).lines().toList();

        assertEquals("x_m,y_m,Bz_T", lines.get(0));
        assertEquals(DataFiles.FIELD_COLUMNS * DataFiles.FIELD_COLUMNS + 1, lines.size(), "square cells on a square box");
        double cell = (box.x1() - box.x0()) / DataFiles.FIELD_COLUMNS;
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            double x = Double.parseDouble(c[0]);
            double y = Double.parseDouble(c[1]);
            double bz = Double.parseDouble(c[2]);
            assertEquals(field.bz(x, y), bz, 0.0, "at " + x + ", " + y);
            boolean inPatch = x > 0 && x < 0.2 && y > 0.1 && y < 0.16;
            boolean nearEdge = Math.min(Math.min(Math.abs(x), Math.abs(x - 0.2)),
                    Math.min(Math.abs(y - 0.1), Math.abs(y - 0.16))) < cell;
            if (!nearEdge) {
                assertEquals(inPatch ? B : -B, bz, 1e-12, "uniform −B plus a +2B patch, at " + x + ", " + y);
            }
        }
    }
}
