package org.kinduct.study;

import java.util.List;

/**
 * What a study's result file says about the study, besides its rows: the hash that ties the
 * parts of one study together, and enough to read and plot the rows without the scene.
 *
 * @param fromS start time of the metrics' samples, −∞ for all
 * @param points number of points of the whole study
 */
public record Header(String study, String scene, String mode, double fromS, String circuit, int points,
                     List<Varied> varied, List<Read> metrics) {

    public Header {
        varied = List.copyOf(varied);
        metrics = List.copyOf(metrics);
    }

    /** A varied value: its path, SI unit symbol, whether spaced in the logarithm, and its values. */
    public record Varied(String path, String unit, boolean log, List<Double> values) {
        public Varied {
            values = List.copyOf(values);
        }
    }

    /** A metric: its expression and SI unit symbol. */
    public record Read(String metric, String unit) {
    }
}
