package org.kinduct.ui.edit;

import java.util.Objects;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.run.RunResult;

/**
 * The time shown and how it moves: playing at a speed (scene seconds per real second) and
 * wrapping at the end of the scene's window, stepping by the window's step, seeking, and back to
 * the start; the time always lies in the window.
 */
public final class PlaybackClock {

    /** Playback frames that move on by less than this fraction of a run's sample step are solved exactly. */
    static final double SLOW_MOTION_FRACTION = 0.25;
    /** Longest wall-clock step one playback frame takes: after a stall, playback resumes rather than jumps. */
    static final double MAX_FRAME_S = 0.1;

    /** Told of every move after it happened, so the field maps can follow at a fitting pace. */
    interface Moves {
        /** A playback frame {@code wallSeconds} of wall-clock time after the last moved the time on. */
        void played(double wallSeconds);

        /** The user put the time somewhere: {@code settled} after a step or reset, false while scrubbing. */
        void jumped(boolean settled);
    }

    private final ReadOnlyDoubleWrapper time = new ReadOnlyDoubleWrapper();
    private final BooleanProperty playing = new SimpleBooleanProperty();
    private final DoubleProperty speed = new SimpleDoubleProperty(1);
    private final Moves moves;
    private TimeSpan window;
    /** Scene time the last playback frame moved on by. */
    private double frameStepS;

    PlaybackClock(TimeSpan window, Moves moves) {
        this.window = Objects.requireNonNull(window);
        this.moves = Objects.requireNonNull(moves);
        time.set(window.t0S());
    }

    /**
     * Takes the scene's (possibly changed) window and brings the time into it. True when that
     * moved the time (its listeners have then been told).
     */
    boolean window(TimeSpan w) {
        window = Objects.requireNonNull(w);
        double t = clamped(time.get());
        if (t == time.get()) {
            return false;
        }
        time.set(t);
        return true;
    }

    /**
     * A playback frame {@code wallSeconds} after the last: moves the time on by that (at most
     * {@value #MAX_FRAME_S} s) times the speed, wrapping at the end.
     */
    public void advance(double wallSeconds) {
        frameStepS = Math.min(wallSeconds, MAX_FRAME_S) * speed.get();
        time.set(wrapped(time.get() + frameStepS));
        moves.played(wallSeconds);
    }

    /** Moves by {@code steps} of the scene's time step. */
    public void step(int steps) {
        time.set(clamped(time.get() + steps * window.dtS()));
        moves.jumped(true);
    }

    /** Stops and goes back to the start of the window. */
    public void resetTime() {
        playing.set(false);
        time.set(window.t0S());
        moves.jumped(true);
    }

    /** Sets the time, clamped to the scene's window (the scrubber and the plot). */
    public void seek(double tS) {
        time.set(clamped(tS));
        moves.jumped(false);
    }

    public void togglePlaying() {
        playing.set(!playing.get());
    }

    /**
     * Whether the frame shown now may be {@code run}'s nearest sample instead of an exact solve:
     * while playing, unless so slowly that several frames fall between two samples of
     * quasi-static instants (slow motion would then move in visible steps). A coupled run's
     * nearest sample is the exact answer the run has, at any pace.
     */
    boolean playsSamplesOf(RunResult run) {
        if (!playing.get() || run.samples().size() < 2) {
            return false;
        }
        int last = run.samples().size() - 1;
        double sampleStepS = (run.samples().get(last).tS() - run.samples().get(0).tS()) / last;
        return run.plan().coupled() || frameStepS >= sampleStepS * SLOW_MOTION_FRACTION;
    }

    /** {@code t} brought into the window, past the end wrapping round to the start. */
    double wrapped(double t) {
        return t > window.t1S() ? window.t0S() + (t - window.t1S()) % (window.t1S() - window.t0S()) : t;
    }

    private double clamped(double t) {
        return Math.max(window.t0S(), Math.min(window.t1S(), t));
    }

    public double time() {
        return time.get();
    }

    public ReadOnlyDoubleProperty timeProperty() {
        return time.getReadOnlyProperty();
    }

    public BooleanProperty playingProperty() {
        return playing;
    }

    public boolean isPlaying() {
        return playing.get();
    }

    /** Scene seconds per real second. */
    public DoubleProperty speedProperty() {
        return speed;
    }

    public double speed() {
        return speed.get();
    }
}
