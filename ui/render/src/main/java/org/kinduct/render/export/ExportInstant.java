package org.kinduct.render.export;

import java.util.function.ToDoubleFunction;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductor;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/** Which instant an annotated snapshot shows. */
public sealed interface ExportInstant permits ExportInstant.At, ExportInstant.Peak {

    /** The run's state at this instant. */
    Snapshot in(RunResult run);

    /** A given time, seconds: the run samples it exactly. */
    record At(double tS) implements ExportInstant {
        public At {
            Checks.finite(tS, "time");
        }

        @Override
        public Snapshot in(RunResult run) {
            return run.at(tS);
        }
    }

    /**
     * The sample of the run where the answer is largest: |EMF| of a wire or loop, or |voltage| of
     * an electrode pair of a plate or channel, over every conductor or over the one named
     * {@code conductorId} (null: every conductor); where there is no voltage at all (plates without
     * electrodes), the plates' Joule power, the rate at which they brake whatever moves, translation
     * and spin alike (a spinning disc's drag force is near zero). Of the samples within
     * {@value #TIE} of the peak (a plateau), the earliest where the flux rule is a check (no
     * conductor at a field edge), else the earliest; the first sample when everything is zero.
     */
    record Peak(String conductorId) implements ExportInstant {

        @Override
        public Snapshot in(RunResult run) {
            if (conductorId != null && run.scene().conductor(conductorId).isEmpty()) {
                throw new IllegalArgumentException("no conductor '" + conductorId + "' to take the peak of; the scene"
                        + " has " + run.scene().conductors().stream().map(Conductor::id).toList());
            }
            double peak = 0;
            boolean volts = false;
            for (Snapshot s : run.samples()) {
                peak = Math.max(peak, largest(s, true));
                volts |= hasVoltage(s);
            }
            boolean byVoltage = volts;
            if (!byVoltage) {
                for (Snapshot s : run.samples()) {
                    peak = Math.max(peak, largest(s, false));
                }
            }
            Snapshot first = null;
            for (Snapshot s : run.samples()) {
                if (largest(s, byVoltage) >= (1 - TIE) * peak) {
                    if (s.conductors().stream().noneMatch(c -> Double.isNaN(c.disagreement()))) {
                        return s;
                    }
                    first = first == null ? s : first;
                }
            }
            return first;
        }

        /** Relative nearness to the peak that counts as the peak (a flat top computed to rounding). */
        private static final double TIE = 1e-6;

        /** The largest |EMF| or pair |voltage| of the conductors taken, or with {@code volts} false their largest Joule power. */
        private double largest(Snapshot s, boolean volts) {
            double m = 0;
            for (ConductorState c : s.conductors()) {
                if (volts && (conductorId == null || c.id().equals(conductorId))) {
                    m = Math.max(m, Math.abs(c.emfV()));
                }
            }
            for (SheetState p : s.sheets()) {
                if (conductorId == null || p.id().equals(conductorId)) {
                    m = Math.max(m, volts ? p.pairs().stream().mapToDouble(q -> Math.abs(q.voltageV())).max().orElse(0)
                            : p.joulePowerW());
                }
            }
            return m;
        }

        /** Whether a conductor taken has a voltage to show: a wire or loop, or a plate or channel with a pair. */
        private boolean hasVoltage(Snapshot s) {
            return s.conductors().stream().anyMatch(c -> conductorId == null || c.id().equals(conductorId))
                    || s.sheets().stream().anyMatch(p -> (conductorId == null || p.id().equals(conductorId))
                    && !p.pairs().isEmpty());
        }
    }

    /** The peak over every conductor, the default: the instant that answers "how many volts". */
    public static ExportInstant peak() {
        return new Peak(null);
    }

    /**
     * Reads {@code peak}, {@code peak:ID} or a time ({@code time} parses it, e.g. with units).
     *
     * @throws IllegalArgumentException naming what was expected
     */
    public static ExportInstant parse(String text, ToDoubleFunction<String> time) {
        String t = text.strip();
        if (t.equals("peak")) {
            return peak();
        }
        if (t.startsWith("peak:")) {
            String id = t.substring("peak:".length()).strip();
            if (id.isEmpty()) {
                throw new IllegalArgumentException("'peak:' needs a conductor id, e.g. peak:pickup");
            }
            return new Peak(id);
        }
        return new At(time.applyAsDouble(t));
    }
}
