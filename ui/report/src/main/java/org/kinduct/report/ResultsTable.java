package org.kinduct.report;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.solver.run.RunResult;

/** The readable per-conductor summary printed by {@code kinduct solve} by default. */
public final class ResultsTable {

    private ResultsTable() {
    }

    public static void write(RunResult results, PrintWriter out) {
        Scene scene = results.scene();
        List<Snapshot> series = results.samples();
        double t0 = series.get(0).tS();
        double t1 = series.get(series.size() - 1).tS();
        out.printf(Locale.ROOT, "Scene: %s%n", scene.name().isEmpty() ? "(unnamed)" : scene.name());
        out.printf(Locale.ROOT, "Time: %s%s, %d sample%s (%s, %s circuits)%n%n", Units.format(t0, Dimension.TIME),
                series.size() > 1 ? " to " + Units.format(t1, Dimension.TIME) : "", series.size(),
                series.size() > 1 ? "s" : "", Labels.method(results.plan()),
                Labels.circuitModel(results.plan().circuit()));
        List<ConductorSummary> rows = ConductorSummary.of(series);
        ResultScales scales = results.scales();
        int idWidth = Math.max("conductor".length(), rows.stream().mapToInt(r -> r.id().length()).max().orElse(0));
        String fmt = "%-" + idWidth + "s  %-5s %12s %10s %12s  %-26s %12s %11s  %s%n";
        if (!rows.isEmpty()) {
            out.printf(Locale.ROOT, fmt, "conductor", "kind", "peak EMF", "at", "RMS EMF", "polarity at peak",
                    "peak current", "L", "methods agree");
        }
        for (ConductorSummary r : rows) {
            double l = series.get(0).conductor(r.id()).orElseThrow().inductanceH();
            out.printf(Locale.ROOT, fmt, r.id(), r.kind() == ConductorState.Kind.LOOP ? "loop" : "wire",
                    Units.format(scales.emf(r.peakEmfV()), Dimension.VOLTAGE),
                    Units.format(r.peakTimeS(), Dimension.TIME),
                    Units.format(scales.emf(r.rmsEmfV()), Dimension.VOLTAGE), polarity(r),
                    r.kind() == ConductorState.Kind.LOOP
                            ? Units.format(scales.current(r.peakCurrentA()), Dimension.CURRENT) : "-",
                    Double.isNaN(l) ? "-" : Units.format(l, Dimension.INDUCTANCE), agreement(r));
        }
        if (!rows.isEmpty()) {
            out.println();
        }
        List<SheetSummary> sheets = SheetSummary.of(series);
        if (!sheets.isEmpty()) {
            writeSheets(sheets, scales, out);
        }
        String inductance = InductanceSummary.of(results.inductanceAtStart());
        if (results.inductanceAtStart().self().size() > 1 || !results.inductanceAtStart().allSelfKnown()) {
            out.println(inductance);
        }
        writeBodies(results, out);
        results.audit().ifPresent(a -> writeAudit(a, out));
        out.println("Signs: EMF and current are positive along each conductor's vertex order; for a wire,"
                + " EMF > 0 means its last vertex is the + end.");
        if (rows.stream().anyMatch(r -> !r.inducedFieldIncluded())) {
            out.println("Note: a field patch moves; the induced electric field of an idealized patch is not known"
                    + " from B_z alone, so wire EMFs marked '*' include the v x B part only.");
        }
        if (sheets.stream().anyMatch(r -> !r.inducedFieldIncluded())) {
            out.println("Note: a field patch moves; plate and channel currents, forces and heat are exact, but"
                    + " electrode voltages marked '*' lack the patch's w·A, unknown from B_z alone.");
        }
        CautionCheck.lines(scene, series).forEach(out::println);
    }

    /**
     * Plates and channels: peak force (the drag) with its time, peak torque, peak and mean Joule
     * power, peak |J| and the largest Rm (flagged where the resistive limit was used above
     * {@link SheetState#REYNOLDS_WARNING}, marked where the plate's own field was included); then
     * each electrode pair's peak voltage with its + electrode and, for channels, its share of B·w·v̄.
     */
    private static void writeSheets(List<SheetSummary> sheets, ResultScales scales, PrintWriter out) {
        int idWidth = Math.max("plate/channel".length(), sheets.stream().mapToInt(r -> r.id().length()).max()
                .orElse(0));
        String fmt = "%-" + idWidth + "s  %-7s %11s %10s %12s %11s %11s %13s  %s%n";
        out.printf(Locale.ROOT, fmt, "plate/channel", "kind", "peak force", "at", "peak torque", "peak heat",
                "mean heat", "peak |J|", "Rm (largest)");
        boolean starred = false;
        for (SheetSummary r : sheets) {
            out.printf(Locale.ROOT, fmt, r.id(), Labels.sheetKind(r.kind()),
                    Units.format(Units.withoutNoise(r.peakForceN(), scales.forceN()), Dimension.FORCE),
                    Units.format(r.peakForceTimeS(), Dimension.TIME),
                    Units.format(scales.torque(r.peakTorqueNm()), Dimension.TORQUE),
                    Units.format(scales.power(r.peakJouleW()), Dimension.POWER),
                    Units.format(scales.power(r.meanJouleW()), Dimension.POWER),
                    Units.format(r.peakCurrentDensityAPerM2(), Dimension.CURRENT_DENSITY),
                    String.format(Locale.ROOT, "%.2g", r.largestReynolds())
                            + (r.beyondResistiveLimit() ? "  " + Labels.reynoldsWarning(r.largestReynolds())
                            : r.ownField() ? "  " + Labels.OWN_FIELD : ""));
        }
        List<String[]> pairs = new ArrayList<>();
        for (SheetSummary r : sheets) {
            for (SheetSummary.PairPeak p : r.pairs()) {
                String star = r.inducedFieldIncluded() ? "" : " *";
                starred |= !r.inducedFieldIncluded();
                pairs.add(new String[] {r.id(), p.plus() + " − " + p.minus(),
                    Units.format(scales.emf(p.peakVoltageV()), Dimension.VOLTAGE) + star,
                    Units.format(p.peakTimeS(), Dimension.TIME), Labels.positiveElectrode(p.positive()),
                    Double.isNaN(p.endShortingRatio()) ? "-"
                            : String.format(Locale.ROOT, "%.1f %%", 100 * p.endShortingRatio())});
            }
        }
        if (!pairs.isEmpty()) {
            out.println();
            int pairWidth = Math.max("electrodes".length(), pairs.stream().mapToInt(p -> p[1].length()).max().orElse(0));
            String pairFmt = "%-" + idWidth + "s  %-" + pairWidth + "s %13s %10s  %-18s %9s%n";
            out.printf(Locale.ROOT, pairFmt, "plate/channel", "electrodes", "peak voltage", "at", "polarity at peak",
                    "of B·w·v̄");
            for (String[] row : pairs) {
                out.printf(Locale.ROOT, pairFmt, (Object[]) row);
            }
            out.println("Voltage U = φ(first) − φ(second) of each pair; B·w·v̄ of a channel with B at the electrodes'"
                    + " midpoint (Shercliff's value for a field over the whole channel)"
                    + (starred ? "; '*': see the note below." : "."));
        }
        out.println();
    }

    /**
     * The final speed of each free body. Speeds are read against the fastest any free body goes
     * in the run, or the speed gravity alone would give over the window if larger (the scale of
     * the accelerations whose sum a still body's velocity is); angular speeds against the fastest
     * turn in the run.
     */
    private static void writeBodies(RunResult results, PrintWriter out) {
        if (!results.hasFreeBodies()) {
            return;
        }
        Scene scene = results.scene();
        List<Snapshot> series = results.samples();
        double speedRef = scene.gravity().length() * (series.get(series.size() - 1).tS() - series.get(0).tS());
        double omegaRef = 0;
        for (Snapshot s : series) {
            for (FreeBody b : FreeBody.of(scene, s)) {
                speedRef = Math.max(speedRef, b.velocityMps().length());
                omegaRef = Math.max(omegaRef, Math.abs(b.omegaRadPerS()));
            }
        }
        for (FreeBody b : FreeBody.of(scene, series.get(series.size() - 1))) {
            out.printf(Locale.ROOT, "Free body %s at the end: speed %s, velocity (%s, %s), ω %s%n", b.id(),
                    speed(b.velocityMps().length(), speedRef), speed(b.velocityMps().x(), speedRef),
                    speed(b.velocityMps().y(), speedRef),
                    Units.format(Units.withoutNoise(b.omegaRadPerS(), omegaRef), Dimension.ANGULAR_SPEED));
        }
        out.println();
    }

    private static String speed(double mps, double referenceMps) {
        return Units.format(Units.withoutNoise(mps, referenceMps), Dimension.VELOCITY);
    }

    /** Where the energy went, and what the balance leaves over. */
    private static void writeAudit(EnergyAudit a, PrintWriter out) {
        out.printf(Locale.ROOT, "Energy: work in %s = Joule heat %s + eddy-current heat %s + damping heat %s"
                + " + kinetic %s + potential %s + magnetic %s%n", energy(a.suppliedJ()), energy(a.jouleJ()),
                energy(a.eddyJ()), energy(a.dampingJ()), energy(a.deltaKineticJ()), energy(a.deltaPotentialJ()),
                energy(a.deltaMagneticJ()));
        double scale = a.turnedOverJ();
        out.printf(Locale.ROOT, "Energy residual: %s (%.1e of the energy turned over)%n%n", energy(a.residualJ()),
                scale > 0 ? Math.abs(a.residualJ()) / scale : 0.0);
    }

    private static String energy(double joules) {
        return Units.format(joules, Dimension.ENERGY);
    }

    private static String polarity(ConductorSummary r) {
        if (r.kind() == ConductorState.Kind.WIRE || r.positiveEndAtPeak() != Terminal.NONE) {
            return Labels.polarity(r.positiveEndAtPeak(), r.kind() == ConductorState.Kind.LOOP)
                    + (r.inducedFieldIncluded() ? "" : " *");
        }
        return Labels.sense(r.directionAtPeak());
    }

    private static String agreement(ConductorSummary r) {
        if (r.kind() == ConductorState.Kind.WIRE) {
            return Labels.ONE_METHOD;
        }
        String worst = String.format(Locale.ROOT, "%.1e", r.worstDisagreement());
        String kinks = r.kinkSamples() == 0 ? "" : "; " + r.kinkSamples() + " at field-edge crossings not comparable";
        return (r.worstDisagreement() <= Labels.AGREEMENT_FLAG ? "yes (worst " + worst : "CHECK (differ by " + worst) + kinks + ")";
    }
}
