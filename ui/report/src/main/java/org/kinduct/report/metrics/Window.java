package org.kinduct.report.metrics;

import java.util.List;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/** The samples a metric reads: those of a run at or after a start time, in time order. */
final class Window {

    private Window() {
    }

    /**
     * The run's grid samples with t ≥ {@code fromS}.
     *
     * @throws IllegalArgumentException when there is none
     */
    static List<Snapshot> of(RunResult run, double fromS) {
        List<Snapshot> all = run.samples();
        int first = 0;
        while (first < all.size() && all.get(first).tS() < fromS) {
            first++;
        }
        if (first == all.size()) {
            throw new IllegalArgumentException("no samples at or after " + fromS + " s: the run ends at "
                    + all.get(all.size() - 1).tS() + " s");
        }
        return all.subList(first, all.size());
    }

    /** The time average of {@code values} at {@code times} by the trapezoidal rule; the value itself for one sample. */
    static double timeAverage(double[] times, double[] values) {
        if (values.length == 1) {
            return values[0];
        }
        double integral = 0;
        for (int i = 0; i + 1 < values.length; i++) {
            integral += 0.5 * (values[i] + values[i + 1]) * (times[i + 1] - times[i]);
        }
        return integral / (times[times.length - 1] - times[0]);
    }

    /** ∫ values dt by the trapezoidal rule; 0 for one sample. */
    static double integral(double[] times, double[] values) {
        return values.length == 1 ? 0 : timeAverage(times, values) * (times[times.length - 1] - times[0]);
    }
}
