package org.kinduct.study;

import java.util.Arrays;

/**
 * The result of one point: the varied values, one number per metric (NaN where a metric does
 * not apply, e.g. a terminal speed not reached), and the reason the point could not be run
 * (null when it ran; its metrics are then NaN).
 */
public record Row(int point, double[] values, double[] metrics, String error) {

    public Row {
        values = values.clone();
        metrics = metrics.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double[] metrics() {
        return metrics.clone();
    }

    /** Exact comparison, as merging and the tests need; NaN equals NaN. */
    @Override
    public boolean equals(Object o) {
        return o instanceof Row r && r.point == point && Arrays.equals(r.values, values)
                && Arrays.equals(r.metrics, metrics) && java.util.Objects.equals(r.error, error);
    }

    @Override
    public int hashCode() {
        return 31 * point + Arrays.hashCode(metrics);
    }
}
