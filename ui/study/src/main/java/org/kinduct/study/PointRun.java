package org.kinduct.study;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import org.kinduct.report.metrics.Metric;
import org.kinduct.report.metrics.Metrics;
import org.kinduct.scene.Scene;
import org.kinduct.solver.PairMemo;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * Runs one point of a study exactly as {@code kinduct solve} runs the edited scene (one
 * {@link SceneRun} of the scene's own window with the study's circuit model, and one more per
 * scene variant a metric reads), and reads the metrics. Points share a {@link PairMemo}, which
 * changes no number: what the varied values leave alone is integrated once.
 */
final class PointRun {

    private PointRun() {
    }

    /**
     * The row of point {@code k}. A point the model refuses (a value combination that breaks a
     * rule, a loop whose wires overlap) gives a row with the reason and no metrics; anything
     * else that fails is a fault and is thrown.
     *
     * @param parallel whether each run may solve its instants on every core
     * @param memo rigid pairs' integrals shared between the study's points
     */
    static Row run(Study study, int k, RunMonitor monitor, boolean parallel, PairMemo memo) {
        double[] values = study.design().at(k);
        try {
            return new Row(k, values, read(study.sceneAt(k), study.metrics(), study.fromS(), study.circuit(), monitor,
                    parallel, memo), null);
        } catch (IllegalArgumentException refused) {
            double[] none = new double[study.metrics().size()];
            java.util.Arrays.fill(none, Double.NaN);
            return new Row(k, values, none, refused.getMessage());
        }
    }

    /**
     * The metrics of {@code scene}, each from its run (one per scene variant the metrics read).
     *
     * @throws IllegalArgumentException when the model refuses the scene
     */
    static double[] read(Scene scene, List<Metric> metrics, double fromS, CircuitModel circuit, RunMonitor monitor,
                         boolean parallel, PairMemo memo) {
        double[] read = new double[metrics.size()];
        Map<SortedSet<String>, RunResult> runs = new HashMap<>();
        for (int m = 0; m < read.length; m++) {
            Metric metric = metrics.get(m);
            for (SortedSet<String> variant : metric.variants()) {
                if (!runs.containsKey(variant)) {
                    Scene s = Metrics.without(scene, variant);
                    runs.put(variant, new SceneRun(s, new RunRequest(s.time(), circuit, List.of()), monitor, parallel,
                            memo).result());
                }
            }
            read[m] = metric.evaluate(runs, fromS);
        }
        return read;
    }
}
