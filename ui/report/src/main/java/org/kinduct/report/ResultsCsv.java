package org.kinduct.report;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * Long-form CSV of a time series: one row per conductor per time, the same quantities and
 * names as {@link ResultsJson}, units in the header. Empty cells where a quantity does not apply.
 * A run with plates or channels adds their columns ({@link #SHEET_COLUMNS}) and one row per plate
 * or channel per time and electrode pair (one row without pair cells when it has no pair); its
 * force (the drag) goes in the force columns. Free bodies, electrode potentials and the energy
 * audit are in the JSON and the table only.
 */
public final class ResultsCsv {

    static final String HEADER = "t_s,id,kind,flux_Wb,linkage_Wb,emf_flux_V,emf_motional_V,emf_V,disagreement,"
            + "positive_end,current_A,direction,force_x_N,force_y_N,inductance_H";
    static final String SHEET_COLUMNS = ",torque_Nm,joule_W,peak_current_density_A_per_m2,reynolds_magnetic,"
            + "eddy_model,plus,minus,voltage_V,positive,ideal_voltage_V,end_shorting";
    /** Cells of the conductor columns a plate or channel has no value for, between kind and force. */
    private static final int BLANK_BEFORE_FORCE = 9;
    private static final int SHEET_CELLS = 11;
    private static final int PAIR_CELLS = 6;

    private ResultsCsv() {
    }

    public static void write(RunResult results, Writer out) throws IOException {
        boolean sheets = results.samples().stream().anyMatch(s -> !s.sheets().isEmpty());
        out.write(HEADER + (sheets ? SHEET_COLUMNS : ""));
        out.write('\n');
        String noSheet = sheets ? ",".repeat(SHEET_CELLS) : "";
        for (Snapshot s : results.samples()) {
            for (ConductorState c : s.conductors()) {
                boolean loop = c.kind() == ConductorState.Kind.LOOP;
                out.write(String.join(",", num(s.tS()), c.id(), loop ? "loop" : "wire", num(c.fluxWb()),
                        num(c.linkageWb()), num(c.emfFluxV()), num(c.emfMotionalV()), num(c.emfV()),
                        num(c.disagreement()), Labels.terminal(c.positiveEnd()), num(c.currentA()),
                        loop ? Labels.circulation(c.direction()) : "none", num(c.forceN().x()),
                        num(c.forceN().y()), num(c.inductanceH())) + noSheet);
                out.write('\n');
            }
            for (SheetState p : s.sheets()) {
                String lead = String.join(",", num(s.tS()), p.id(), Labels.sheetKind(p.kind())) + ",".repeat(
                        BLANK_BEFORE_FORCE + 1) + String.join(",", num(p.forceN().x()), num(p.forceN().y()), "",
                        num(p.torqueNm()), num(p.joulePowerW()), num(p.peakCurrentDensityAPerM2()),
                        num(p.magneticReynolds()), Labels.eddyModel(p));
                if (p.pairs().isEmpty()) {
                    out.write(lead + ",".repeat(PAIR_CELLS) + "\n");
                }
                for (SheetState.Pair pair : p.pairs()) {
                    out.write(String.join(",", lead, pair.plus(), pair.minus(), num(pair.voltageV()),
                            Labels.positiveName(pair.positive()), num(pair.idealVoltageV()),
                            num(pair.endShortingRatio())));
                    out.write('\n');
                }
            }
        }
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.10g", v) : "";
    }
}
