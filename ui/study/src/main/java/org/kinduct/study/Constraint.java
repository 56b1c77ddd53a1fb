package org.kinduct.study;

import org.kinduct.report.metrics.Metric;

/**
 * A limit on a metric, {@code METRIC <= LIMIT} or {@code METRIC >= LIMIT} (SI).
 *
 * @param atMost true for ≤, false for ≥
 */
public record Constraint(Metric metric, boolean atMost, double limit) {

    /** How far {@code value} lies beyond the limit, relative to it (0 when met; NaN counts as not met). */
    double violation(double value) {
        if (Double.isNaN(value)) {
            return 1;
        }
        double excess = atMost ? value - limit : limit - value;
        return Math.max(0, excess) / Math.max(Math.abs(limit), Double.MIN_NORMAL);
    }

    boolean met(double value) {
        return violation(value) == 0;
    }

    @Override
    public String toString() {
        return metric.text() + (atMost ? " <= " : " >= ") + limit;
    }
}
