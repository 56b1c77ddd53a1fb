package org.kinduct.ui.edit;

import java.util.Objects;
import java.util.function.IntConsumer;
import java.util.function.LongSupplier;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * The editor's monitor of one scene revision's simulation: stops it once the revision is
 * outdated (its result would be dropped anyway, and the worker is needed for the new one), and
 * passes its progress on in whole percent, rising, at most once per {@value #INTERVAL_NS} ns of
 * the clock, the first time that long after the watch began, so a short run does not flicker.
 */
final class RunWatch implements RunMonitor {

    /** Shortest time between two progress reports, nanoseconds: four a second. */
    static final long INTERVAL_NS = 250_000_000L;

    private final LongSupplier clockNs;
    private final IntConsumer percentDone;
    private volatile boolean outdated;
    // Touched only by the simulating thread; runs of one SceneRun never overlap (it runs under its lock).
    private long reportedAtNs;
    private int reportedPercent = -1;

    /**
     * @param clockNs     monotonic clock, nanoseconds
     * @param percentDone receives the reports, on the simulating thread
     */
    RunWatch(LongSupplier clockNs, IntConsumer percentDone) {
        this.clockNs = Objects.requireNonNull(clockNs);
        this.percentDone = Objects.requireNonNull(percentDone);
        this.reportedAtNs = clockNs.getAsLong();
    }

    /** Stops the run at its next poll. */
    void outdate() {
        outdated = true;
    }

    @Override
    public boolean cancelled() {
        return outdated;
    }

    @Override
    public void progress(double fractionDone) {
        int percent = (int) Math.floor(100 * fractionDone);
        long now = clockNs.getAsLong();
        if (percent > reportedPercent && now - reportedAtNs >= INTERVAL_NS) {
            reportedPercent = percent;
            reportedAtNs = now;
            percentDone.accept(percent);
        }
    }
}
