package org.kinduct.report;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;

/** The readable per-conductor summary printed by {@code kinduct solve} by default. */
public final class ResultsTable {

    /** Relative disagreement between the two EMF methods above which a line is flagged. */
    public static final double AGREEMENT_FLAG = 1e-6;

    private ResultsTable() {
    }

    public static void write(Scene scene, List<Snapshot> series, PrintWriter out) {
        double t0 = series.get(0).tS();
        double t1 = series.get(series.size() - 1).tS();
        out.printf(Locale.ROOT, "Scene: %s%n", scene.name().isEmpty() ? "(unnamed)" : scene.name());
        out.printf(Locale.ROOT, "Time: %s to %s, %d samples%n%n", Units.format(t0, Dimension.TIME),
                Units.format(t1, Dimension.TIME), series.size());
        List<ConductorSummary> rows = ConductorSummary.of(series);
        int idWidth = Math.max("conductor".length(), rows.stream().mapToInt(r -> r.id().length()).max().orElse(0));
        String fmt = "%-" + idWidth + "s  %-5s %12s %10s %12s  %-26s %12s  %s%n";
        out.printf(Locale.ROOT, fmt, "conductor", "kind", "peak EMF", "at", "RMS EMF", "polarity at peak",
                "peak current", "methods agree");
        for (ConductorSummary r : rows) {
            out.printf(Locale.ROOT, fmt, r.id(), r.kind() == ConductorState.Kind.LOOP ? "loop" : "wire",
                    Units.format(r.peakEmfV(), Dimension.VOLTAGE), Units.format(r.peakTimeS(), Dimension.TIME),
                    Units.format(r.rmsEmfV(), Dimension.VOLTAGE), polarity(r),
                    r.kind() == ConductorState.Kind.LOOP ? Units.format(r.peakCurrentA(), Dimension.CURRENT) : "-",
                    agreement(r));
        }
        out.println();
        out.println("Signs: EMF and current are positive along each conductor's vertex order; for a wire,"
                + " EMF > 0 means its last vertex is the + end.");
        if (rows.stream().anyMatch(r -> !r.inducedFieldIncluded())) {
            out.println("Note: a field patch moves; the induced electric field of an idealized patch is not known"
                    + " from B_z alone, so wire EMFs marked '*' include the v x B part only.");
        }
        if (rows.stream().anyMatch(r -> Math.abs(r.peakEmfV()) > Cautions.ELV_DC_V)) {
            out.println(Cautions.VOLTAGE);
        }
    }

    private static String polarity(ConductorSummary r) {
        if (r.kind() == ConductorState.Kind.WIRE || r.positiveEndAtPeak() != Terminal.NONE) {
            String mark = r.inducedFieldIncluded() ? "" : " *";
            return switch (r.positiveEndAtPeak()) {
                case LAST -> "+ at last vertex" + mark;
                case FIRST -> "+ at first vertex" + mark;
                case NONE -> "no EMF" + mark;
            };
        }
        return switch (r.directionAtPeak()) {
            case CCW -> "current counter-clockwise";
            case CW -> "current clockwise";
            case NONE -> "no current";
        };
    }

    private static String agreement(ConductorSummary r) {
        if (r.kind() == ConductorState.Kind.WIRE) {
            return "n/a (open wire)";
        }
        String worst = String.format(Locale.ROOT, "%.1e", r.worstDisagreement());
        return r.worstDisagreement() <= AGREEMENT_FLAG ? "yes (worst " + worst + ")" : "CHECK: differ by " + worst;
    }
}
