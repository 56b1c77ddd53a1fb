package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.kinduct.report.metrics.LoadPower;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.run.AlternatingPickup;
import org.kinduct.solver.run.RunResult;

/**
 * The answer to "how many volts, how much power, how fast" in one line per conductor and per
 * free body, from the same metrics a design study reads ({@link MetricKind}): peak and RMS EMF
 * and when the peak comes, the dominant frequency, and for closed loops the peak current and the
 * mean power into the load resistor (over the last whole cycles, and over the whole run); the mean
 * drag and eddy-current power of each plate and channel and the peak voltage of its first electrode
 * pair; a self-crossing loop's rejection of the alternating coils' field; the final and terminal
 * speed of each free body; for a coupled run, the share of the work put in that reached the load
 * resistors.
 */
public final class RunSummary {

    private static final List<MetricKind> EVERY_CONDUCTOR = List.of(MetricKind.PEAK_EMF, MetricKind.PEAK_TIME,
            MetricKind.RMS_EMF, MetricKind.DOMINANT_FREQUENCY);
    private static final List<MetricKind> CLOSED_LOOPS = List.of(MetricKind.PEAK_CURRENT, MetricKind.MEAN_LOAD_POWER);
    private static final List<MetricKind> SHEETS = List.of(MetricKind.MEAN_DRAG, MetricKind.MEAN_EDDY_POWER,
            MetricKind.PEAK_PAIR_VOLTAGE);
    private static final List<MetricKind> FREE_BODIES = List.of(MetricKind.FINAL_SPEED, MetricKind.TERMINAL_SPEED);

    private RunSummary() {
    }

    /** E.g. "pickup: peak EMF 248 mV at 140 ms, RMS EMF 154 mV, dominant frequency 8.33 Hz"; only quantities with a value. */
    public static List<String> lines(RunResult run) {
        List<String> out = new ArrayList<>();
        if (run.samples().size() < 2) {
            return out;
        }
        for (Conductor c : run.scene().conductors()) {
            if (c instanceof Conductor.Sheet) {
                out.add(line(run, c.id(), SHEETS));
                continue;
            }
            List<MetricKind> kinds = new ArrayList<>(EVERY_CONDUCTOR);
            if (c instanceof Conductor.Loop loop && !loop.open()) {
                kinds.addAll(CLOSED_LOOPS);
                if (loop.loadOhm() == 0) {
                    kinds.remove(MetricKind.MEAN_LOAD_POWER);
                }
            }
            String line = line(run, c.id(), kinds);
            out.add(run.alternatingPickup(c.id()).map(p -> line + ", " + rejection(run, c.id(), p)).orElse(line));
        }
        for (Body b : run.scene().bodies()) {
            if (b.motion() instanceof Motion.Free) {
                List<MetricKind> kinds = new ArrayList<>(FREE_BODIES);
                if (turns(run, b.id())) {
                    kinds.add(MetricKind.FINAL_SPIN);
                }
                out.add(line(run, b.id(), kinds));
            }
        }
        loadShare(run).ifPresent(out::add);
        return out;
    }

    /**
     * How much of the work put into a coupled run reached the load resistors: the sum of their
     * {@link MetricKind#LOAD_ENERGY} against the energy audit's work in (a harvester's efficiency
     * over the run, build-up included).
     */
    private static Optional<String> loadShare(RunResult run) {
        double workJ = run.audit().map(a -> a.suppliedJ()).orElse(0.0);
        double loadJ = 0;
        for (Conductor c : run.scene().conductors()) {
            if (c instanceof Conductor.Loop loop && !loop.open() && loop.loadOhm() > 0) {
                loadJ += MetricKind.LOAD_ENERGY.of(run, loop.id());
            }
        }
        if (!(workJ > 0) || loadJ == 0) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT,
                "Into the load resistors: %s, %.1f %% of the work put in (%s) over the run",
                Units.format(loadJ, MetricKind.LOAD_ENERGY.dimension()), 100 * loadJ / workJ,
                Units.format(workJ, MetricKind.LOAD_ENERGY.dimension())));
    }

    private static String line(RunResult run, String id, List<MetricKind> kinds) {
        List<String> parts = new ArrayList<>();
        for (MetricKind k : kinds) {
            double v = k.of(run, id);
            // A steady EMF has no frequency to tell (0 Hz by the metric's definition).
            if (!Double.isFinite(v) || k == MetricKind.PEAK_TIME || (k == MetricKind.DOMINANT_FREQUENCY && v == 0)) {
                continue;
            }
            String text = k == MetricKind.MEAN_LOAD_POWER ? loadPower(run, id, v)
                    : name(k) + " " + Units.format(v, k.dimension());
            if (k == MetricKind.PEAK_EMF) {
                text += " at " + Units.format(MetricKind.PEAK_TIME.of(run, id), MetricKind.PEAK_TIME.dimension());
            }
            parts.add(text);
        }
        return id + ": " + String.join(", ", parts);
    }

    /**
     * How well a self-crossing loop rejects the alternating coils' field, from the run's
     * {@link AlternatingPickup}: its rejection, its largest pickup from them against the largest of one
     * lobe alone, and its peak EMF against that pickup as 20·log10 of the ratio in dB (a signal against
     * interference, common practice).
     */
    private static String rejection(RunResult run, String id, AlternatingPickup pickup) {
        double loopV = pickup.loopPeakV(0);
        double lobeV = pickup.lobePeakV(0);
        double shownLoopV = Units.withoutNoise(loopV, lobeV);
        return Labels.alternatingRejection(Units.format(pickup.frequencyHz(), Dimension.FREQUENCY),
                pickup.rejectionDb(0), Units.format(shownLoopV, Dimension.VOLTAGE),
                Units.format(lobeV, Dimension.VOLTAGE), shownLoopV == 0,
                20 * Math.log10(MetricKind.PEAK_EMF.of(run, id) / loopV));
    }

    /**
     * The mean load power a designer asks for: over the whole cycles at the run's end, once the
     * build-up is over, beside the whole run's mean ({@link LoadPower}); the whole run's alone when
     * the current has no whole cycle in the run's last quarter.
     */
    private static String loadPower(RunResult run, String id, double wholeRunW) {
        String whole = Units.format(wholeRunW, MetricKind.MEAN_LOAD_POWER.dimension());
        LoadPower power = LoadPower.of(run, id);
        return power.cycles().map(c -> Labels.steadyLoadPower(
                Units.format(MetricKind.STEADY_LOAD_POWER.of(run, id), MetricKind.STEADY_LOAD_POWER.dimension()),
                c.count(), Units.format(c.startS(), MetricKind.PEAK_TIME.dimension()),
                Units.format(c.endS(), MetricKind.PEAK_TIME.dimension()), power.changePerCycle(c), whole))
                .orElse(name(MetricKind.MEAN_LOAD_POWER) + " " + whole);
    }

    /** "peak EMF", "RMS EMF", "mean load power": the metric's key in words, abbreviations in capitals. */
    /** Whether free body {@code id} turns at some sample (a spinning disc's spin is its motion). */
    private static boolean turns(RunResult run, String id) {
        return run.samples().stream().anyMatch(s -> s.freeBody(id).omegaRadPerS() != 0);
    }

    private static String name(MetricKind k) {
        return k.key().replace('_', ' ').replace("rms", "RMS").replace("emf", "EMF");
    }
}
