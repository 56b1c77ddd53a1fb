package org.kinduct.render.export;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.kinduct.report.ResultsJson;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.sheet.EddyModel;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * The exported data as text: the time series in wide CSV form, the B_z map of a view as CSV, and
 * the results JSON of {@code kinduct solve --format json}. Numbers are written with
 * {@link Double#toString}, which reads back to the identical double.
 */
public final class DataFiles {

    /** Columns of the field-map CSV across the view; rows follow from the view's aspect. */
    public static final int FIELD_COLUMNS = 200;

    private DataFiles() {
    }

    /** One column of the series CSV for a conductor: name with unit, and where its value comes from. */
    private record Column(String name, ToDoubleFunction<ConductorState> value) {
    }

    private static final List<Column> LOOP_COLUMNS = List.of(new Column("flux_Wb", ConductorState::fluxWb),
            new Column("linkage_Wb", ConductorState::linkageWb), new Column("emf_V", ConductorState::emfV),
            new Column("emf_flux_V", ConductorState::emfFluxV), new Column("current_A", ConductorState::currentA),
            new Column("force_x_N", c -> c.forceN().x()), new Column("force_y_N", c -> c.forceN().y()));
    private static final List<Column> WIRE_COLUMNS = List.of(new Column("emf_V", ConductorState::emfV));

    /** The columns of a plate or channel. */
    private static final List<SheetColumn> SHEET_COLUMNS = List.of(new SheetColumn("drag_x_N", p -> p.forceN().x()),
            new SheetColumn("drag_y_N", p -> p.forceN().y()), new SheetColumn("torque_Nm", SheetState::torqueNm),
            new SheetColumn("joule_W", SheetState::joulePowerW),
            new SheetColumn("peak_current_density_A_per_m2", SheetState::peakCurrentDensityAPerM2),
            new SheetColumn("reynolds_magnetic", SheetState::magneticReynolds),
            new SheetColumn("own_field", p -> p.model() == EddyModel.SELF_FIELD ? 1 : 0));

    private record SheetColumn(String name, ToDoubleFunction<SheetState> value) {
    }

    /**
     * One row per time; per conductor the columns that apply to it, named {@code id.quantity_unit}:
     * wires {@code emf_V}; loops {@code flux_Wb, linkage_Wb, emf_V, emf_flux_V, current_A,
     * force_x_N, force_y_N}; plates and channels {@code drag_x_N, drag_y_N, torque_Nm, joule_W,
     * peak_current_density_A_per_m2, reynolds_magnetic, own_field} (1 where the plate's own field
     * was included, 0 in the resistive limit) and per electrode pair
     * {@code id.plus-minus.voltage_V}. Empty cells for values that are not finite.
     */
    public static String seriesCsv(List<Snapshot> series) {
        StringBuilder out = new StringBuilder("t_s");
        if (!series.isEmpty()) {
            for (ConductorState c : series.get(0).conductors()) {
                for (Column col : columns(c)) {
                    out.append(',').append(c.id()).append('.').append(col.name());
                }
            }
            for (SheetState p : series.get(0).sheets()) {
                for (SheetColumn col : SHEET_COLUMNS) {
                    out.append(',').append(p.id()).append('.').append(col.name());
                }
                for (SheetState.Pair pair : p.pairs()) {
                    out.append(',').append(p.id()).append('.').append(pair.plus()).append('-').append(pair.minus())
                            .append(".voltage_V");
                }
            }
        }
        out.append('\n');
        for (Snapshot s : series) {
            out.append(num(s.tS()));
            for (ConductorState c : s.conductors()) {
                for (Column col : columns(c)) {
                    out.append(',').append(num(col.value().applyAsDouble(c)));
                }
            }
            for (SheetState p : s.sheets()) {
                for (SheetColumn col : SHEET_COLUMNS) {
                    out.append(',').append(num(col.value().applyAsDouble(p)));
                }
                for (SheetState.Pair pair : p.pairs()) {
                    out.append(',').append(num(pair.voltageV()));
                }
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static List<Column> columns(ConductorState c) {
        return c.kind() == ConductorState.Kind.LOOP ? LOOP_COLUMNS : WIRE_COLUMNS;
    }

    /**
     * B_z at the centres of a {@link #FIELD_COLUMNS}-wide grid of square cells over {@code box},
     * evaluated exactly (not taken from the display raster); rows from bottom to top, x fastest.
     */
    public static String fieldCsv(SceneField field, ViewChoice.Box box) {
        return fieldCsv(field, box, FIELD_COLUMNS);
    }

    /** As {@link #fieldCsv(SceneField, ViewChoice.Box)} with {@code columns} columns (a finer or coarser grid). */
    public static String fieldCsv(SceneField field, ViewChoice.Box box, int columns) {
        double cell = (box.x1() - box.x0()) / columns;
        int rows = Math.max(1, (int) Math.round((box.y1() - box.y0()) / cell));
        double cellY = (box.y1() - box.y0()) / rows;
        StringBuilder out = new StringBuilder(columns * rows * 40).append("x_m,y_m,Bz_T\n");
        for (int r = 0; r < rows; r++) {
            double y = box.y0() + (r + 0.5) * cellY;
            for (int c = 0; c < columns; c++) {
                double x = box.x0() + (c + 0.5) * cell;
                out.append(num(x)).append(',').append(num(y)).append(',').append(num(field.bz(x, y))).append('\n');
            }
        }
        return out.toString();
    }

    /** The results JSON of a run: the same document as {@code kinduct solve --format json}. */
    public static String resultsJson(RunResult run) {
        StringWriter w = new StringWriter();
        try {
            ResultsJson.write(run, w);
        } catch (IOException e) {
            throw new UncheckedIOException("writing to memory failed", e);
        }
        return w.toString();
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }
}
