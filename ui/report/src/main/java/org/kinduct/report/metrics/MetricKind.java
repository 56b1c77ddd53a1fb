package org.kinduct.report.metrics;

import java.util.List;
import org.kinduct.report.ConductorSummary;
import org.kinduct.scene.units.Dimension;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * What a study can read from a run, each with its unit and a one-line definition (README,
 * "Metrics"). Every metric reads the samples of the run's window at or after the study's start
 * time ({@code --from}), in SI.
 */
public enum MetricKind {
    PEAK_EMF("peak_emf", Scope.CONDUCTOR, Dimension.VOLTAGE, "largest |EMF| over the samples",
            (run, w, id) -> Math.abs(summary(w, id).peakEmfV())),
    RMS_EMF("rms_emf", Scope.CONDUCTOR, Dimension.VOLTAGE, "root mean square of the EMF, samples weighted equally",
            (run, w, id) -> summary(w, id).rmsEmfV()),
    PEAK_TO_PEAK_EMF("peak_to_peak_emf", Scope.CONDUCTOR, Dimension.VOLTAGE, "largest minus smallest EMF",
            (run, w, id) -> ConductorSeries.range(new ConductorSeries(w, id).emfV)),
    PEAK_TIME("peak_time", Scope.CONDUCTOR, Dimension.TIME, "time of the largest |EMF| (the first, if it repeats)",
            (run, w, id) -> summary(w, id).peakTimeS()),
    DOMINANT_FREQUENCY("dominant_frequency", Scope.CONDUCTOR, Dimension.FREQUENCY,
            "frequency of the largest peak of the EMF's spectrum (mean removed, zero-padded FFT, resolution 1/(8·T));"
                    + " 0 for a steady EMF",
            (run, w, id) -> {
                ConductorSeries s = new ConductorSeries(w, id);
                return DominantFrequency.of(s.emfV, s.spacingS());
            }),
    FLUX_SWING("flux_swing", Scope.LOOP, Dimension.FLUX, "largest minus smallest flux linkage N·Φ",
            (run, w, id) -> ConductorSeries.range(new ConductorSeries(w, id).linkageWb)),
    PEAK_CURRENT("peak_current", Scope.CLOSED_LOOP, Dimension.CURRENT, "largest |current|",
            (run, w, id) -> Math.abs(summary(w, id).peakCurrentA())),
    MEAN_LOAD_POWER("mean_load_power", Scope.CLOSED_LOOP, Dimension.POWER,
            "time average of I²·R_load (trapezoidal rule over the samples)",
            (run, w, id) -> LoadPower.of(run, w, id).average()),
    STEADY_LOAD_POWER("steady_load_power", Scope.CLOSED_LOOP, Dimension.POWER,
            "time average of I²·R_load over the whole cycles of the current (between its upward zero crossings)"
                    + " in the last quarter of the samples; empty with less than one cycle there",
            (run, w, id) -> LoadPower.of(run, w, id).steady()),
    LOAD_ENERGY("load_energy", Scope.CLOSED_LOOP, Dimension.ENERGY,
            "∫ I²·R_load dt, the energy into the load resistor (trapezoidal rule over the samples)",
            (run, w, id) -> LoadPower.of(run, w, id).integral()),
    JOULE_HEAT("joule_heat", Scope.CLOSED_LOOP, Dimension.ENERGY,
            "∫ I²·R dt, R winding plus load (trapezoidal rule over the samples)", (run, w, id) -> {
                ConductorSeries s = new ConductorSeries(w, id);
                double[] power = new double[s.currentA.length];
                for (int i = 0; i < power.length; i++) {
                    power[i] = s.currentA[i] * s.currentA[i] * s.resistanceOhm[i];
                }
                return Window.integral(s.times, power);
            }),
    PEAK_FORCE("peak_force", Scope.CLOSED_LOOP, Dimension.FORCE, "largest magnitude of the magnetic force on the loop",
            (run, w, id) -> ConductorSeries.largestMagnitude(new ConductorSeries(w, id).forceN)),
    MEAN_DRAG("mean_drag", Scope.SHEET, Dimension.FORCE,
            "time average of the magnitude of the magnetic force on the plate or channel (trapezoidal rule)",
            (run, w, id) -> SheetSeries.timeAverage(w, id, s -> s.forceN().length())),
    MEAN_EDDY_POWER("mean_eddy_power", Scope.SHEET, Dimension.POWER,
            "time average of the Joule power of the eddy currents (trapezoidal rule)",
            (run, w, id) -> SheetSeries.timeAverage(w, id, SheetState::joulePowerW)),
    PEAK_PAIR_VOLTAGE("peak_pair_voltage", Scope.SHEET, Dimension.VOLTAGE,
            "largest |voltage| of the first electrode pair; empty when there is none",
            (run, w, id) -> SheetSeries.peakFirstPairVoltage(w, id)),
    FINAL_SPEED("final_speed", Scope.FREE_BODY, Dimension.VELOCITY, "speed of the body's pivot at the last sample",
            (run, w, id) -> new BodySpeeds(w, id).last()),
    FINAL_SPIN("final_spin", Scope.FREE_BODY, Dimension.ANGULAR_SPEED, "|ω| of the body at the last sample",
            (run, w, id) -> Math.abs(w.get(w.size() - 1).freeBody(id).omegaRadPerS())),
    TERMINAL_SPEED("terminal_speed", Scope.FREE_BODY, Dimension.VELOCITY,
            "speed approached at the end: Aitken Δ² extrapolation of the speeds a tenth of the window apart"
                    + " (the last speed once settled, 0 for a body coming to rest); empty when the speed does not"
                    + " approach a limit",
            (run, w, id) -> new BodySpeeds(w, id).terminal()),
    SETTLING_TIME("settling_time", Scope.FREE_BODY, Dimension.TIME,
            "time from the run's start after which the speed stays within 2 % of its final value",
            (run, w, id) -> new BodySpeeds(w, id).settlingTime(run.samples().get(0).tS())),
    AUDIT_RESIDUAL("audit_residual", Scope.SCENE, Dimension.ENERGY,
            "residual of the run's energy audit (whole run); empty for quasi-static instants, which have none",
            (run, w, id) -> run.audit().map(a -> a.residualJ()).orElse(Double.NaN));

    /** What a metric is about. */
    public enum Scope {
        /** Any wire or loop. */
        CONDUCTOR("a wire or loop"),
        /** A loop, open or closed (it has a flux). */
        LOOP("a loop"),
        /** A closed loop (it carries a current). */
        CLOSED_LOOP("a closed loop"),
        /** A plate or a liquid channel. */
        SHEET("a plate or channel"),
        /** A body that moves under forces. */
        FREE_BODY("a free body"),
        /** The whole run. */
        SCENE("the whole run");

        private final String noun;

        Scope(String noun) {
            this.noun = noun;
        }

        public String noun() {
            return noun;
        }
    }

    private interface Reading {
        double read(RunResult run, List<Snapshot> window, String target);
    }

    private final String key;
    private final Scope scope;
    private final Dimension dimension;
    private final String definition;
    private final Reading reading;

    MetricKind(String key, Scope scope, Dimension dimension, String definition, Reading reading) {
        this.key = key;
        this.scope = scope;
        this.dimension = dimension;
        this.definition = definition;
        this.reading = reading;
    }

    /** The name used in metric expressions and column headers, e.g. {@code peak_emf}. */
    public String key() {
        return key;
    }

    public Scope scope() {
        return scope;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** One line saying what the metric is. */
    public String definition() {
        return definition;
    }

    /** This metric of {@code target} (null for SCENE) over the whole of {@code run}. */
    public double of(RunResult run, String target) {
        return read(run, target, Double.NEGATIVE_INFINITY);
    }

    /** This metric of {@code target} (null for SCENE) from the samples of {@code run} at or after {@code fromS}. */
    double read(RunResult run, String target, double fromS) {
        return reading.read(run, Window.of(run, fromS), target);
    }

    /** The kind named {@code key}, if any. */
    public static java.util.Optional<MetricKind> byKey(String key) {
        for (MetricKind k : values()) {
            if (k.key.equals(key)) {
                return java.util.Optional.of(k);
            }
        }
        return java.util.Optional.empty();
    }

    private static ConductorSummary summary(List<Snapshot> window, String id) {
        int index = -1;
        List<org.kinduct.solver.ConductorState> first = window.get(0).conductors();
        for (int i = 0; i < first.size(); i++) {
            if (first.get(i).id().equals(id)) {
                index = i;
            }
        }
        if (index < 0) {
            throw new IllegalArgumentException("the run has no conductor '" + id + "'");
        }
        return ConductorSummary.of(window).get(index);
    }
}
