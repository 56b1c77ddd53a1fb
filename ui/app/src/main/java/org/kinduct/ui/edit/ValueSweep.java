package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.report.metrics.Metrics;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValue;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.study.Axis;
import org.kinduct.study.Design;
import org.kinduct.study.Study;

/**
 * The editor's "vary a value": one value of the scene over a range and the metrics read from each
 * run, as {@code kinduct sweep --vary PATH=SPEC --metric …} would run it (same paths, ranges,
 * metrics and run per point; the automatic circuit model; metrics over the whole window).
 */
public final class ValueSweep {

    /** Points a range offers unless the user says otherwise. */
    static final int DEFAULT_POINTS = 11;

    private ValueSweep() {
    }

    /** The values of object {@code id} a sweep can vary, as paths ({@code magnet-2.standoff}); of the whole scene for null. */
    public static List<String> paths(Scene scene, String id) {
        List<String> all = SceneValues.of(scene).paths();
        return id == null ? all : all.stream().filter(p -> p.startsWith(id + ".")).toList();
    }

    /** Every metric expression that applies to something in the scene ({@code peak_emf:pickup}), scene order within each kind. */
    public static List<String> metrics(Scene scene) {
        List<String> out = new ArrayList<>();
        for (MetricKind k : MetricKind.values()) {
            if (k.scope() == MetricKind.Scope.SCENE) {
                out.add(k.key());
            } else {
                Metrics.candidates(k.scope(), scene).forEach(id -> out.add(k.key() + ":" + id));
            }
        }
        return out;
    }

    /** A first range for {@code path}: from half to one and a half times its value, or 0 to 1 unit when it is 0. */
    public static String defaultRange(Scene scene, String path) {
        SceneValue value = SceneValues.of(scene).find(path);
        double v = value.read(scene);
        if (value.whole()) {
            long n = Math.round(v);
            return Math.max(1, n / 2) + ".." + Math.max(2, n + n / 2) + ":" + DEFAULT_POINTS;
        }
        double lo = v == 0 ? 0 : 0.5 * v;
        double hi = v == 0 ? 1 : 1.5 * v;
        return Units.format(lo, value.dimension()) + ".." + Units.format(hi, value.dimension()) + ":" + DEFAULT_POINTS;
    }

    /**
     * The study of {@code path} over {@code range} ({@code FROM..TO:N}, {@code FROM..TO:N:log} or
     * {@code V1,V2,…}), reading {@code metrics}.
     *
     * @throws IllegalArgumentException naming what is wrong, as the command line says it
     */
    public static Study study(Scene scene, String path, String range, List<String> metrics) {
        Axis axis = Axis.parse(path + "=" + range, SceneValues.of(scene));
        return new Study(scene, new Design(List.of(axis), Design.Mode.GRID),
                metrics.stream().map(m -> Metrics.parse(m, scene)).toList(), Double.NEGATIVE_INFINITY,
                CircuitModel.AUTO);
    }
}
