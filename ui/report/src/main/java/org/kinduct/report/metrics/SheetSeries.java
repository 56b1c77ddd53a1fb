package org.kinduct.report.metrics;

import java.util.List;
import java.util.function.ToDoubleFunction;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;

/** Readings of one plate or channel over a run's window. */
final class SheetSeries {

    private SheetSeries() {
    }

    /** The time average of {@code value} of sheet {@code id} (trapezoidal rule over the samples). */
    static double timeAverage(List<Snapshot> window, String id, ToDoubleFunction<SheetState> value) {
        double[] times = window.stream().mapToDouble(Snapshot::tS).toArray();
        double[] values = window.stream().mapToDouble(s -> value.applyAsDouble(sheet(s, id))).toArray();
        return Window.timeAverage(times, values);
    }

    /** The largest |voltage| of the sheet's first electrode pair, NaN (empty) without one. */
    static double peakFirstPairVoltage(List<Snapshot> window, String id) {
        double peak = Double.NaN;
        for (Snapshot s : window) {
            List<SheetState.Pair> pairs = sheet(s, id).pairs();
            if (pairs.isEmpty()) {
                return Double.NaN;
            }
            double v = Math.abs(pairs.get(0).voltageV());
            peak = Double.isNaN(peak) ? v : Math.max(peak, v);
        }
        return peak;
    }

    private static SheetState sheet(Snapshot s, String id) {
        return s.sheet(id).orElseThrow(() -> new IllegalArgumentException("the run has no plate or channel '" + id + "'"));
    }
}
