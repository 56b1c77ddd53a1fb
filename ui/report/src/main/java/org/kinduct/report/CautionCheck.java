package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.solver.Snapshot;

/** The caution lines an exported picture must carry for a scene and its solved series. */
public final class CautionCheck {

    private CautionCheck() {
    }

    /**
     * {@link Cautions#MAGNETS} when a magnet's remanence reaches {@link Cautions#STRONG_MAGNET_T};
     * {@link Cautions#VOLTAGE} when a conductor's EMF or an electrode pair's voltage exceeds the
     * extra-low-voltage limits of IEC 61140 (as {@link Cautions} cites): for one that keeps its sign,
     * its peak against the ripple-free DC limit; for one that reverses (AC), its RMS over the series
     * against the AC limit; {@link Cautions#FLOW} when the scene has a liquid channel.
     */
    public static List<String> lines(Scene scene, List<Snapshot> series) {
        List<String> out = new ArrayList<>();
        if (scene.sources().stream().anyMatch(CautionCheck::strongMagnet)) {
            out.add(Cautions.MAGNETS);
        }
        if (!series.isEmpty() && overVoltage(series)) {
            out.add(Cautions.VOLTAGE);
        }
        if (scene.conductors().stream().anyMatch(c -> c instanceof Conductor.Channel)) {
            out.add(Cautions.FLOW);
        }
        return out;
    }

    private static boolean overVoltage(List<Snapshot> series) {
        Snapshot first = series.get(0);
        for (int c = 0; c < first.conductors().size(); c++) {
            int index = c;
            if (beyondExtraLow(series, s -> s.conductors().get(index).emfV())) {
                return true;
            }
        }
        for (int p = 0; p < first.sheets().size(); p++) {
            for (int q = 0; q < first.sheets().get(p).pairs().size(); q++) {
                int sheet = p;
                int pair = q;
                if (beyondExtraLow(series, s -> s.sheets().get(sheet).pairs().get(pair).voltageV())) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean beyondExtraLow(List<Snapshot> series, ToDoubleFunction<Snapshot> voltage) {
        double min = 0;
        double max = 0;
        double sumSq = 0;
        for (Snapshot s : series) {
            double v = voltage.applyAsDouble(s);
            min = Math.min(min, v);
            max = Math.max(max, v);
            sumSq += v * v;
        }
        boolean reverses = min < 0 && max > 0;
        double rms = Math.sqrt(sumSq / series.size());
        return reverses ? rms > Cautions.ELV_AC_RMS_V : Math.max(max, -min) > Cautions.ELV_DC_V;
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
