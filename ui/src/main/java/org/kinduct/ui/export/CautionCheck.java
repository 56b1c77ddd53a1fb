package org.kinduct.ui.export;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.report.Cautions;
import org.kinduct.report.ConductorSummary;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.solver.Snapshot;

/** The caution lines an exported picture must carry for a scene and its solved series. */
final class CautionCheck {

    private CautionCheck() {
    }

    /**
     * {@link Cautions#MAGNETS} when a magnet's remanence reaches {@link Cautions#STRONG_MAGNET_T};
     * {@link Cautions#VOLTAGE} when an EMF's peak exceeds the DC extra-low-voltage limit or its RMS
     * over the series the AC one (both from IEC 61140, as {@link Cautions} cites).
     */
    static List<String> lines(Scene scene, List<Snapshot> series) {
        List<String> out = new ArrayList<>();
        if (scene.sources().stream().anyMatch(CautionCheck::strongMagnet)) {
            out.add(Cautions.MAGNETS);
        }
        if (ConductorSummary.of(series).stream().anyMatch(s -> Math.abs(s.peakEmfV()) > Cautions.ELV_DC_V
                || s.rmsEmfV() > Cautions.ELV_AC_RMS_V)) {
            out.add(Cautions.VOLTAGE);
        }
        return out;
    }

    private static boolean strongMagnet(Source s) {
        double br = s instanceof Source.BlockMagnet b ? b.remanenceT()
                : s instanceof Source.CylinderMagnet c ? c.remanenceT() : 0;
        return br >= Cautions.STRONG_MAGNET_T;
    }
}
