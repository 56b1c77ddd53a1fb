package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.study.Row;
import org.kinduct.study.Shard;
import org.kinduct.study.Study;
import org.kinduct.study.StudyRunner;

/** The editor's "vary a value" offers the object's values and the scene's metrics, and runs each point as a scene run. */
class ValueSweepTest {

    @Test
    void offersTheSelectedObjectsValuesAndEveryMetricThatApplies() {
        Scene carriage = Demos.load("carriage-pickup");
        List<String> paths = ValueSweep.paths(carriage, "magnet-2");
        assertTrue(paths.contains("magnet-2.standoff"), paths.toString());
        assertTrue(paths.stream().allMatch(p -> p.startsWith("magnet-2.")), paths.toString());
        assertEquals(SceneValues.of(carriage).paths(), ValueSweep.paths(carriage, null));
        assertTrue(ValueSweep.metrics(carriage).contains("peak_emf:pickup"));

        List<String> plates = ValueSweep.metrics(Demos.load("plate-brake"));
        assertTrue(plates.contains("mean_drag:solid-plate"), plates.toString());
        assertFalse(plates.contains("peak_emf:solid-plate"), "an EMF metric is not offered for a plate");
    }

    @Test
    void theFirstRangeRunsFromHalfToOneAndAHalfTimesTheValue() {
        Scene carriage = Demos.load("carriage-pickup");
        double standoff = SceneValues.of(carriage).read("magnet-2.standoff");
        Study s = ValueSweep.study(carriage, "magnet-2.standoff",
                ValueSweep.defaultRange(carriage, "magnet-2.standoff"), List.of("peak_emf:pickup"));
        List<Double> values = s.design().axes().get(0).values();
        assertEquals(ValueSweep.DEFAULT_POINTS, values.size());
        assertEquals(0.5 * standoff, values.get(0), 1e-12 * standoff);
        assertEquals(1.5 * standoff, values.get(values.size() - 1), 1e-12 * standoff);
    }

    /**
     * The rail sled's peak EMF is B·L·v (Griffiths, Introduction to Electrodynamics, 4th ed., 2013,
     * eq. 7.13): rails 20 mm apart, 0.5 m/s; each point also equals a run of its own scene.
     */
    @Test
    void eachPointIsTheRunOfItsVariant() throws InterruptedException {
        Scene sled = Demos.load("rail-sled");
        Study s = ValueSweep.study(sled, "gap.bz", "0.25 T..0.75 T:3", List.of("peak_emf:rail-circuit"));
        List<Row> rows = new StudyRunner(s, Shard.WHOLE, 1, (row, done, total) -> { }).run();
        assertEquals(3, rows.size());
        for (Row row : rows) {
            double bz = row.values()[0];
            double expected = bz * 0.020 * 0.5;
            assertEquals(expected, row.metrics()[0], 1e-9 * expected, "B·L·v at B = " + bz);
            double own = MetricKind.PEAK_EMF.of(new SceneRun(s.sceneAt(row.point())).result(), "rail-circuit");
            assertEquals(own, row.metrics()[0], 1e-12 * own);
        }
    }
}
