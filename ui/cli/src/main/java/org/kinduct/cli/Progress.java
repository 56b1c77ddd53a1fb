package org.kinduct.cli;

import java.io.PrintStream;
import java.util.Locale;
import org.kinduct.study.Row;
import org.kinduct.study.StudyRunner;

/** Progress of a study on standard error: at most a line a second, and the last one. */
final class Progress implements StudyRunner.Listener {

    private static final long INTERVAL_NS = 1_000_000_000L;

    private final String what;
    private final PrintStream err;
    private final long startNs = System.nanoTime();
    private long lastNs = startNs - INTERVAL_NS;

    Progress(String what, PrintStream err) {
        this.what = what;
        this.err = err;
    }

    @Override
    public synchronized void finished(Row row, int done, int total) {
        long now = System.nanoTime();
        if (row.error() != null) {
            err.println(what + ": point " + row.point() + " not run: " + row.error());
        }
        if (now - lastNs < INTERVAL_NS && done < total) {
            return;
        }
        lastNs = now;
        double elapsed = (now - startNs) / 1e9;
        String left = done < total ? String.format(Locale.ROOT, ", about %s left", seconds(elapsed / done * (total - done)))
                : "";
        err.println(String.format(Locale.ROOT, "%s: %d/%d points, %s%s", what, done, total, seconds(elapsed), left));
        err.flush();
    }

    private static String seconds(double s) {
        return s < 120 ? String.format(Locale.ROOT, "%.0f s", s) : String.format(Locale.ROOT, "%.0f min", s / 60);
    }
}
