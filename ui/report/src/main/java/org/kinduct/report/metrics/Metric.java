package org.kinduct.report.metrics;

import java.util.Map;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;
import org.kinduct.scene.units.Dimension;
import org.kinduct.solver.run.RunResult;

/**
 * A figure of merit read from runs: one metric of one target ({@link Term}), or the ratio of two
 * ({@link Ratio}), e.g. a rejection: a pickup's RMS EMF with a disturbing field over the same
 * without it. Parsed by {@link Metrics#parse}; written back by {@link #text()}.
 */
public sealed interface Metric permits Metric.Term, Metric.Ratio {

    /** The expression in its one written form, e.g. {@code peak_emf:pickup}. */
    String text();

    /** The unit symbol of its value (SI; empty for a plain number). */
    String unit();

    /**
     * The scenes it reads, each named by the set of source and conductor ids left out of the
     * study's scene (the empty set: the scene itself).
     */
    Set<SortedSet<String>> variants();

    /**
     * Its value from the runs of {@link #variants()}, reading their samples at or after {@code fromS}.
     *
     * @throws IllegalArgumentException when a run has no sample in that window
     */
    double evaluate(Map<SortedSet<String>, RunResult> runs, double fromS);

    /**
     * A metric of a conductor or free body ({@code target}), or of the whole run (target null),
     * in the scene without the objects {@code without}.
     */
    record Term(MetricKind kind, String target, SortedSet<String> without) implements Metric {

        public Term {
            without = new TreeSet<>(without);
        }

        @Override
        public String text() {
            return kind.key() + (target == null ? "" : ":" + target)
                    + (without.isEmpty() ? "" : " without " + String.join(",", without));
        }

        @Override
        public String unit() {
            return kind.dimension().siUnit().symbol();
        }

        @Override
        public Set<SortedSet<String>> variants() {
            return Set.of(without);
        }

        @Override
        public double evaluate(Map<SortedSet<String>, RunResult> runs, double fromS) {
            return kind.read(runs.get(without), target, fromS);
        }
    }

    /** numerator / denominator; a plain number when both have one dimension. */
    record Ratio(Term numerator, Term denominator) implements Metric {

        @Override
        public String text() {
            return numerator.text() + " / " + denominator.text();
        }

        @Override
        public String unit() {
            Dimension top = numerator.kind().dimension();
            if (top == denominator.kind().dimension()) {
                return "";
            }
            String bottom = denominator.unit();
            return numerator.unit() + "/" + (bottom.contains("/") ? "(" + bottom + ")" : bottom);
        }

        @Override
        public Set<SortedSet<String>> variants() {
            return Set.of(numerator.without(), denominator.without());
        }

        @Override
        public double evaluate(Map<SortedSet<String>, RunResult> runs, double fromS) {
            return numerator.evaluate(runs, fromS) / denominator.evaluate(runs, fromS);
        }
    }
}
