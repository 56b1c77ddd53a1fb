package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;

/**
 * Peak and RMS figures of one conductor over a time series, as a designer reads them first.
 *
 * @param peakEmfV EMF of largest magnitude (signed), volts
 * @param peakTimeS when it occurred
 * @param rmsEmfV root-mean-square EMF over the samples (equal weights)
 * @param positiveEndAtPeak + terminal at the peak (wires, open loops)
 * @param directionAtPeak current sense at the peak (closed loops)
 * @param peakCurrentA current of largest magnitude (signed)
 * @param worstDisagreement largest relative disagreement between the two EMF methods
 * @param kinkSamples samples skipped by that comparison because the flux had a kink there
 */
public record ConductorSummary(String id, ConductorState.Kind kind, double peakEmfV, double peakTimeS,
                               double rmsEmfV, Terminal positiveEndAtPeak, Circulation directionAtPeak,
                               double peakCurrentA, double worstDisagreement, int kinkSamples,
                               boolean inducedFieldIncluded) {

    /** One summary per conductor, in scene order. */
    public static List<ConductorSummary> of(List<Snapshot> series) {
        List<ConductorSummary> out = new ArrayList<>();
        if (series.isEmpty()) {
            return out;
        }
        int n = series.get(0).conductors().size();
        for (int c = 0; c < n; c++) {
            out.add(summarize(series, c));
        }
        return out;
    }

    private static ConductorSummary summarize(List<Snapshot> series, int index) {
        ConductorState peak = null;
        double peakT = 0;
        double sumSq = 0;
        double peakI = 0;
        double worst = 0;
        int kinks = 0;
        boolean included = true;
        for (Snapshot s : series) {
            ConductorState c = s.conductors().get(index);
            if (peak == null || Math.abs(c.emfV()) > Math.abs(peak.emfV())) {
                peak = c;
                peakT = s.tS();
            }
            sumSq += c.emfV() * c.emfV();
            if (Math.abs(c.currentA()) > Math.abs(peakI)) {
                peakI = c.currentA();
            }
            if (Double.isNaN(c.disagreement())) {
                kinks++;
            } else if (c.disagreement() > worst) {
                worst = c.disagreement();
            }
            included &= c.inducedFieldIncluded();
        }
        return new ConductorSummary(peak.id(), peak.kind(), peak.emfV(), peakT, Math.sqrt(sumSq / series.size()),
                peak.positiveEnd(), peak.direction(), peakI, worst, kinks, included);
    }
}
