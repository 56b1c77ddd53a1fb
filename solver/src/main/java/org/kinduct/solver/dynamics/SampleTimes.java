package org.kinduct.solver.dynamics;

import java.util.List;

/**
 * The instants a run samples, in time order: the grid t0 + k·dt, k = 0 … n, each computed from
 * its integer k (adding dt up would drift, and a grid point would then be missed or doubled),
 * with n the largest k whose instant does not pass t1 beyond rounding; and further instants
 * within [t0, t1] that need not lie on the grid.
 */
final class SampleTimes {

    /** Slack in counting steps so that t1 = t0 + n·dt computed with rounding still counts n. */
    private static final double STEP_COUNT_SLACK = 1e-9;

    private final double[] times;
    private final boolean[] grid;
    private final int gridCount;

    private SampleTimes(double[] times, boolean[] grid, int gridCount) {
        this.times = times;
        this.grid = grid;
        this.gridCount = gridCount;
    }

    static SampleTimes of(double t0S, double t1S, double dtS, List<Double> extraS) {
        long n = (long) Math.floor((t1S - t0S) / dtS + STEP_COUNT_SLACK);
        if (n + 1 > Integer.MAX_VALUE - extraS.size()) {
            throw new IllegalArgumentException("too many samples: (t1 − t0)/dt = " + n);
        }
        double[] extra = extraS.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
        for (double t : extra) {
            if (!(t >= t0S && t <= t1S)) {
                throw new IllegalArgumentException("a sampled instant must lie within the run [" + t0S + " s, " + t1S
                        + " s], got " + t + " s");
            }
        }
        int total = (int) (n + 1) + extra.length;
        double[] times = new double[total];
        boolean[] grid = new boolean[total];
        int e = 0;
        int out = 0;
        for (long k = 0; k <= n; k++) {
            double t = t0S + k * dtS;
            for (; e < extra.length && extra[e] < t; e++) {
                times[out++] = extra[e];
            }
            grid[out] = true;
            times[out++] = t;
        }
        for (; e < extra.length; e++) {
            times[out++] = extra[e];
        }
        return new SampleTimes(times, grid, (int) (n + 1));
    }

    int count() {
        return times.length;
    }

    int gridCount() {
        return gridCount;
    }

    double time(int i) {
        return times[i];
    }

    boolean onGrid(int i) {
        return grid[i];
    }

    /** The last instant sampled, seconds: t1, or the last grid point when rounding puts it a hair past t1. */
    double last() {
        return times[times.length - 1];
    }
}
