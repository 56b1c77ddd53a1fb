package org.kinduct.study;

import java.util.List;

/**
 * The points of a study: every combination of the axes' values ({@link Mode#GRID}, the first
 * axis varying slowest) or their values side by side ({@link Mode#PAIRED}, all axes of one
 * length). Point k (from 0) is the same on every machine, which is what lets shards split a study.
 */
public record Design(List<Axis> axes, Mode mode) {

    /** Most points a study may have: enough for any sweep, few enough to list in memory. */
    public static final int MAX_POINTS = 1_000_000;

    public enum Mode {
        GRID, PAIRED;

        /** As written on the command line and in result files. */
        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    public Design {
        axes = List.copyOf(axes);
        if (axes.isEmpty()) {
            throw new IllegalArgumentException("a study varies at least one value (--vary PATH=SPEC)");
        }
        for (int i = 0; i < axes.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (axes.get(i).path().equals(axes.get(j).path())) {
                    throw new IllegalArgumentException(axes.get(i).path() + " is varied twice");
                }
            }
        }
        if (mode == Mode.PAIRED) {
            for (Axis a : axes) {
                if (a.values().size() != axes.get(0).values().size()) {
                    throw new IllegalArgumentException("paired values need lists of one length: " + axes.get(0).path()
                            + " has " + axes.get(0).values().size() + ", " + a.path() + " has " + a.values().size());
                }
            }
        } else {
            long n = 1;
            for (Axis a : axes) {
                n *= a.values().size();
                if (n > MAX_POINTS) {
                    throw new IllegalArgumentException("the grid has more than " + MAX_POINTS + " points ("
                            + String.join(" × ", axes.stream().map(x -> Integer.toString(x.values().size())).toList())
                            + "); vary fewer values or take fewer of each");
                }
            }
        }
    }

    public int size() {
        if (mode == Mode.PAIRED) {
            return axes.get(0).values().size();
        }
        int n = 1;
        for (Axis a : axes) {
            n *= a.values().size();
        }
        return n;
    }

    /** The axes' values at point {@code k}, in axis order. */
    public double[] at(int k) {
        if (k < 0 || k >= size()) {
            throw new IndexOutOfBoundsException("point " + k + " of " + size());
        }
        double[] out = new double[axes.size()];
        int rest = k;
        for (int i = axes.size() - 1; i >= 0; i--) {
            List<Double> values = axes.get(i).values();
            if (mode == Mode.PAIRED) {
                out[i] = values.get(k);
            } else {
                out[i] = values.get(rest % values.size());
                rest /= values.size();
            }
        }
        return out;
    }
}
