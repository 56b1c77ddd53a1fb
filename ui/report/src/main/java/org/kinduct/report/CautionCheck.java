package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.solver.Snapshot;

/** The caution lines an exported picture must carry for a scene and its solved series. */
public final class CautionCheck {

    private CautionCheck() {
    }

    /**
     * {@link Cautions#MAGNETS} when a magnet's remanence reaches {@link Cautions#STRONG_MAGNET_T};
     * {@link Cautions#VOLTAGE} when a conductor's EMF exceeds the extra-low-voltage limits of
     * IEC 61140 (as {@link Cautions} cites): for an EMF that keeps its sign, its peak against the
     * ripple-free DC limit; for one that reverses (AC), its RMS over the series against the AC limit.
     */
    public static List<String> lines(Scene scene, List<Snapshot> series) {
        List<String> out = new ArrayList<>();
        if (scene.sources().stream().anyMatch(CautionCheck::strongMagnet)) {
            out.add(Cautions.MAGNETS);
        }
        if (!series.isEmpty() && overVoltage(series)) {
            out.add(Cautions.VOLTAGE);
        }
        return out;
    }

    private static boolean overVoltage(List<Snapshot> series) {
        int conductors = series.get(0).conductors().size();
        for (int c = 0; c < conductors; c++) {
            double min = 0;
            double max = 0;
            double sumSq = 0;
            for (Snapshot s : series) {
                double emf = s.conductors().get(c).emfV();
                min = Math.min(min, emf);
                max = Math.max(max, emf);
                sumSq += emf * emf;
            }
            boolean reverses = min < 0 && max > 0;
            double rms = Math.sqrt(sumSq / series.size());
            if (reverses ? rms > Cautions.ELV_AC_RMS_V : Math.max(max, -min) > Cautions.ELV_DC_V) {
                return true;
            }
        }
        return false;
    }

    private static boolean strongMagnet(Source s) {
        return s.match(new Source.Cases<>() {
            @Override
            public Boolean patch(Source.FieldPatch patch) {
                return false;
            }

            @Override
            public Boolean uniform(Source.UniformField uniform) {
                return false;
            }

            @Override
            public Boolean block(Source.BlockMagnet block) {
                return block.remanenceT() >= Cautions.STRONG_MAGNET_T;
            }

            @Override
            public Boolean cylinder(Source.CylinderMagnet cylinder) {
                return cylinder.remanenceT() >= Cautions.STRONG_MAGNET_T;
            }

            @Override
            public Boolean coil(Source.SourceCoil coil) {
                return false;
            }

            @Override
            public Boolean map(Source.FieldMap map) {
                return map.grid().peakT() >= Cautions.STRONG_MAP_FIELD_T;
            }
        });
    }
}
