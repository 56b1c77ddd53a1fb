package org.kinduct.report.metrics;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The whole cycles at the end of a window over which a steady state's mean is read: the periods of
 * an alternating quantity between its upward zero crossings (interpolated linearly between samples)
 * that lie in the window's last quarter, so a build-up at the start is left out. Mean power over
 * whole periods, P = (1/T)∫ i²R dt, is the usual definition of a periodic circuit's average power
 * (common practice in circuit analysis); averaging over whole periods leaves no part-cycle bias.
 *
 * @param startS the first crossing in the last quarter
 * @param endS the last crossing
 * @param count whole cycles between them, at least one
 */
public record SteadyCycles(double startS, double endS, int count) {

    /** The share of the window, at its end, in which the cycles are taken. */
    static final double TAIL = 0.25;
    /** A crossing counts once the quantity has gone below this share of its largest magnitude: rounding noise near 0 makes none. */
    private static final double ARM = 1e-6;

    /** The cycles of {@code values} at {@code times} in the window's last quarter; empty with less than one whole cycle there. */
    public static Optional<SteadyCycles> of(double[] times, double[] values) {
        List<Double> ups = crossings(times, values);
        double from = times[times.length - 1] - TAIL * (times[times.length - 1] - times[0]);
        List<Double> tail = ups.stream().filter(t -> t >= from).toList();
        if (tail.size() < 2) {
            return Optional.empty();
        }
        return Optional.of(new SteadyCycles(tail.get(0), tail.get(tail.size() - 1), tail.size() - 1));
    }

    /** Mean of the samples' linear interpolant over these cycles, (1/T)∫ values dt (trapezoidal rule, exact ends). */
    public double mean(double[] times, double[] values) {
        return integral(times, values, startS, endS) / (endS - startS);
    }

    /**
     * How much the mean changes from one cycle to the next, relative: the geometric step from the
     * first cycle's mean to the last's; 0 for a single cycle. Near 0 once the state is steady.
     */
    public double changePerCycle(double[] times, double[] values) {
        if (count < 2) {
            return 0;
        }
        double period = (endS - startS) / count;
        double first = integral(times, values, startS, startS + period);
        double last = integral(times, values, endS - period, endS);
        return Math.pow(last / first, 1.0 / (count - 1)) - 1;
    }

    /** Upward zero crossings, armed only after the quantity has gone clearly below 0. */
    private static List<Double> crossings(double[] times, double[] values) {
        double largest = ConductorSeries.largestMagnitude(values);
        List<Double> out = new ArrayList<>();
        boolean armed = false;
        for (int i = 0; i + 1 < values.length; i++) {
            armed |= values[i] < -ARM * largest;
            if (armed && values[i] < 0 && values[i + 1] >= 0) {
                out.add(times[i] + values[i] / (values[i] - values[i + 1]) * (times[i + 1] - times[i]));
                armed = false;
            }
        }
        return out;
    }

    /** ∫ from a to b of the samples' linear interpolant. */
    private static double integral(double[] times, double[] values, double a, double b) {
        double sum = 0;
        for (int i = 0; i + 1 < times.length; i++) {
            double lo = Math.max(a, times[i]);
            double hi = Math.min(b, times[i + 1]);
            if (hi > lo) {
                sum += 0.5 * (at(times, values, i, lo) + at(times, values, i, hi)) * (hi - lo);
            }
        }
        return sum;
    }

    private static double at(double[] times, double[] values, int i, double t) {
        double s = (t - times[i]) / (times[i + 1] - times[i]);
        return values[i] + s * (values[i + 1] - values[i]);
    }
}
