package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.sheet.EddyModel;

/**
 * The figures of one plate or channel over a time series, as a designer reads them first: its
 * largest force (the peak drag) and torque with when they occur, its largest and mean Joule power,
 * peak |J|, largest magnetic Reynolds number and whether the own field mattered or was included, and per electrode pair the voltage of largest
 * magnitude with its + electrode and share of B·w·v̄ there.
 *
 * @param meanJouleW the Joule power averaged over the samples (equal weights), watts
 * @param inducedFieldIncluded false when at some sample a moving field patch left the potentials without its w·A
 * @param beyondResistiveLimit true when some sample neglects an own field that matters ({@link SheetState#beyondResistiveLimit})
 * @param ownField true when some sample was solved with the plate's own field
 */
public record SheetSummary(String id, SheetState.Kind kind, double peakForceN, double peakForceTimeS,
                           double peakTorqueNm, double peakJouleW, double meanJouleW,
                           double peakCurrentDensityAPerM2, double largestReynolds, double cellM,
                           List<PairPeak> pairs, boolean inducedFieldIncluded, boolean beyondResistiveLimit,
                           boolean ownField) {

    /**
     * A pair's voltage of largest magnitude (signed, φ(plus) − φ(minus)) and what goes with it.
     *
     * @param endShortingRatio its share of B·w·v̄ there (NaN for plates)
     */
    public record PairPeak(String plus, String minus, double peakVoltageV, double peakTimeS, Optional<String> positive,
                           double endShortingRatio) {
    }

    public SheetSummary {
        pairs = List.copyOf(pairs);
    }

    /** One summary per plate or channel, in scene order. */
    public static List<SheetSummary> of(List<Snapshot> series) {
        List<SheetSummary> out = new ArrayList<>();
        if (series.isEmpty()) {
            return out;
        }
        for (SheetState first : series.get(0).sheets()) {
            out.add(summarize(series, first.id()));
        }
        return out;
    }

    private static SheetSummary summarize(List<Snapshot> series, String id) {
        SheetState first = series.get(0).sheet(id).orElseThrow();
        double force = -1;
        double forceT = 0;
        double torque = 0;
        double peakJoule = 0;
        double sumJoule = 0;
        double peakJ = 0;
        double reynolds = 0;
        boolean included = true;
        boolean beyond = false;
        boolean ownField = false;
        int pairs = first.pairs().size();
        SheetState.Pair[] peak = new SheetState.Pair[pairs];
        double[] peakT = new double[pairs];
        for (Snapshot s : series) {
            SheetState st = s.sheet(id).orElseThrow();
            if (st.forceN().length() > force) {
                force = st.forceN().length();
                forceT = s.tS();
            }
            torque = Math.abs(st.torqueNm()) > Math.abs(torque) ? st.torqueNm() : torque;
            peakJoule = Math.max(peakJoule, st.joulePowerW());
            sumJoule += st.joulePowerW();
            peakJ = Math.max(peakJ, st.peakCurrentDensityAPerM2());
            reynolds = Math.max(reynolds, st.magneticReynolds());
            included &= st.inducedFieldIncluded();
            beyond |= st.beyondResistiveLimit();
            ownField |= st.model() == EddyModel.SELF_FIELD;
            for (int p = 0; p < pairs; p++) {
                SheetState.Pair pair = st.pairs().get(p);
                if (peak[p] == null || Math.abs(pair.voltageV()) > Math.abs(peak[p].voltageV())) {
                    peak[p] = pair;
                    peakT[p] = s.tS();
                }
            }
        }
        List<PairPeak> pairPeaks = new ArrayList<>();
        for (int p = 0; p < pairs; p++) {
            pairPeaks.add(new PairPeak(peak[p].plus(), peak[p].minus(), peak[p].voltageV(), peakT[p],
                    peak[p].positive(), peak[p].endShortingRatio()));
        }
        return new SheetSummary(id, first.kind(), force, forceT, torque, peakJoule, sumJoule / series.size(), peakJ,
                reynolds, first.cellM(), pairPeaks, included, beyond, ownField);
    }
}
