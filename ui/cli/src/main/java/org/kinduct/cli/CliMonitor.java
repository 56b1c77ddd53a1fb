package org.kinduct.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * The command line's watch over one run: on a terminal, a progress line on standard error for
 * runs that take more than {@value #QUIET_NS} ns (rewritten in place, at most every
 * {@value #INTERVAL_NS} ns, cleared when the run ends); and a stop request, set when the user
 * presses Ctrl-C ({@link Interruption}). Safe to call from several threads.
 */
final class CliMonitor implements RunMonitor {

    /** Runs shorter than this show no progress at all: one second. */
    static final long QUIET_NS = 1_000_000_000L;
    /** Shortest time between two progress lines: a quarter second. */
    static final long INTERVAL_NS = 250_000_000L;

    private final PrintStream terminal;
    private final LongSupplier clockNs;
    private final long startNs;
    private volatile boolean stop;
    private long shownAtNs;
    private int shownPercent = -1;

    /** @param terminal where progress goes, or null when standard error is not a terminal */
    CliMonitor(PrintStream terminal, LongSupplier clockNs) {
        this.terminal = terminal;
        this.clockNs = clockNs;
        this.startNs = clockNs.getAsLong();
        this.shownAtNs = startNs;
    }

    /** Progress on standard error when the command runs in a terminal ({@code System.console() != null}). */
    // On Java 17, which Kinduct targets, console() is null exactly when no terminal is attached.
    @SuppressWarnings("SystemConsoleNull")
    static CliMonitor forThisProcess() {
        return new CliMonitor(System.console() != null ? System.err : null, System::nanoTime);
    }

    /** Asks the run to stop at its next poll. */
    void stop() {
        stop = true;
    }

    boolean stopRequested() {
        return stop;
    }

    @Override
    public boolean cancelled() {
        return stop;
    }

    @Override
    public synchronized void progress(double fractionDone) {
        if (terminal == null) {
            return;
        }
        long now = clockNs.getAsLong();
        int percent = (int) Math.floor(100 * fractionDone);
        if (now - startNs >= QUIET_NS && now - shownAtNs >= INTERVAL_NS && percent > shownPercent && percent < 100) {
            shownAtNs = now;
            shownPercent = percent;
            terminal.print(String.format(Locale.ROOT, "\rkinduct: solving… %d %% (Ctrl-C stops)", percent));
            terminal.flush();
        }
    }

    /** Clears the progress line, if one was shown. */
    synchronized void done() {
        if (terminal != null && shownPercent >= 0) {
            terminal.print("\r" + " ".repeat(48) + "\r");
            terminal.flush();
            shownPercent = -1;
        }
    }
}
