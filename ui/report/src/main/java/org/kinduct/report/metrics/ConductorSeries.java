package org.kinduct.report.metrics;

import java.util.List;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;

/** One conductor's quantities over a window of samples, as arrays in time order. */
final class ConductorSeries {

    final double[] times;
    final double[] emfV;
    final double[] currentA;
    final double[] resistanceOhm;
    final double[] linkageWb;
    final double[] forceN;

    ConductorSeries(List<Snapshot> window, String id) {
        int n = window.size();
        times = new double[n];
        emfV = new double[n];
        currentA = new double[n];
        resistanceOhm = new double[n];
        linkageWb = new double[n];
        forceN = new double[n];
        for (int i = 0; i < n; i++) {
            Snapshot s = window.get(i);
            ConductorState c = s.conductor(id).orElseThrow(() -> new IllegalArgumentException("the run has no conductor '"
                    + id + "'"));
            times[i] = s.tS();
            emfV[i] = c.emfV();
            currentA[i] = c.currentA();
            resistanceOhm[i] = c.resistanceOhm();
            linkageWb[i] = c.linkageWb();
            forceN[i] = c.forceN().length();
        }
    }

    static double largestMagnitude(double[] values) {
        double largest = 0;
        for (double v : values) {
            largest = Math.max(largest, Math.abs(v));
        }
        return largest;
    }

    static double range(double[] values) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return hi - lo;
    }

    /** The samples' spacing: the window's span over its intervals. */
    double spacingS() {
        return times.length < 2 ? 0 : (times[times.length - 1] - times[0]) / (times.length - 1);
    }
}
