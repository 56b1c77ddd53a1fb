package org.kinduct.report;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * Long-form CSV of a time series: one row per conductor per time, the same quantities and
 * names as {@link ResultsJson}, units in the header. Empty cells where a quantity does not apply.
 * Free bodies and the energy audit are in the JSON and the table only.
 */
public final class ResultsCsv {

    static final String HEADER = "t_s,id,kind,flux_Wb,linkage_Wb,emf_flux_V,emf_motional_V,emf_V,disagreement,"
            + "positive_end,current_A,direction,force_x_N,force_y_N,inductance_H";

    private ResultsCsv() {
    }

    public static void write(RunResult results, Writer out) throws IOException {
        out.write(HEADER);
        out.write('\n');
        for (Snapshot s : results.samples()) {
            for (ConductorState c : s.conductors()) {
                boolean loop = c.kind() == ConductorState.Kind.LOOP;
                out.write(String.join(",", num(s.tS()), c.id(), loop ? "loop" : "wire", num(c.fluxWb()),
                        num(c.linkageWb()), num(c.emfFluxV()), num(c.emfMotionalV()), num(c.emfV()),
                        num(c.disagreement()), Labels.terminal(c.positiveEnd()), num(c.currentA()),
                        loop ? Labels.circulation(c.direction()) : "none", num(c.forceN().x()),
                        num(c.forceN().y()), num(c.inductanceH())));
                out.write('\n');
            }
        }
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.10g", v) : "";
    }
}
