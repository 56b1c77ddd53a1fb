package org.kinduct.ui.edit;

import java.util.Locale;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.kinduct.scene.TimeSpan;

/**
 * How fast playback really goes: the scene time the view moved on per second of wall-clock time,
 * measured on what was shown, so playback that falls behind the speed asked for says so ("playing
 * at 0.2× — solving") instead of seeming to run at that speed. It falls behind when instants are
 * solved slower than they are played, while a run is computed, or when frames take longer than the
 * clock lets one frame move on.
 */
final class PlaybackRate {

    /** Wall-clock seconds over which the rate is measured before it is told. */
    static final double MEASURE_S = 0.5;
    /** Slower than this fraction of the speed asked for is worth telling. */
    static final double SLOW_FRACTION = 0.8;

    private final ReadOnlyStringWrapper note = new ReadOnlyStringWrapper("");
    private double wallS;
    private double movedS;
    private double lastShownS = Double.NaN;
    /** The first frame after a reset only marks where measuring starts. */
    private boolean started;

    /** Starts measuring afresh (playback started or stopped); says nothing until measured. */
    void reset() {
        wallS = 0;
        movedS = 0;
        lastShownS = Double.NaN;
        started = false;
        note.set("");
    }

    /**
     * One frame of playback: {@code wallSeconds} since the last, the time now shown (NaN while
     * nothing is), and whether the view is waiting for solves (a run under way, or instants solved
     * one by one) rather than showing samples.
     */
    void frame(double wallSeconds, double shownS, TimeSpan window, double askedSpeed, boolean solving) {
        if (started) {
            wallS += wallSeconds;
        }
        started = true;
        if (!Double.isNaN(shownS) && !Double.isNaN(lastShownS)) {
            double moved = shownS - lastShownS;
            // Past the end playback wraps round to the start.
            movedS += moved >= 0 ? moved : (window.t1S() - lastShownS) + (shownS - window.t0S());
        }
        if (!Double.isNaN(shownS)) {
            lastShownS = shownS;
        }
        if (wallS >= MEASURE_S) {
            note.set(describe(movedS / wallS / askedSpeed, askedSpeed, solving));
            wallS = 0;
            movedS = 0;
        }
    }

    private static String describe(double fraction, double askedSpeed, boolean solving) {
        if (fraction >= SLOW_FRACTION) {
            return "";
        }
        String why = solving ? "solving" : "frames are slow";
        if (fraction <= 0) {
            return "playing — waiting: " + why;
        }
        return String.format(Locale.ROOT, "playing at %.2g× — %s", fraction * askedSpeed, why);
    }

    /** Empty while playback keeps up, else how fast it really goes and why. */
    ReadOnlyStringProperty noteProperty() {
        return note.getReadOnlyProperty();
    }
}
