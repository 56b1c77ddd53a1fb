package org.kinduct.ui.edit;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.BiFunction;
import java.util.function.LongSupplier;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneWithUnits;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * The editor's state, in parts with one job each, and the wiring between them: a new revision of
 * the {@link SceneDocument} starts a new run in {@link SceneResults} and a new map in
 * {@link FieldMaps}; a move of the {@link PlaybackClock} shows that instant (the run's nearest
 * sample while playing, else solved exactly) and asks for a map at a fitting pace;
 * {@link ViewSettings} hold how it is looked at. Uses JavaFX observable properties but needs no
 * running toolkit (tests drive it directly), and never waits for the solver on the calling (UI)
 * thread.
 */
public final class EditorViewModel {

    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final SceneResults results;
    private final DraggedInstant dragged;
    private final ViewSettings view = new ViewSettings();
    private final PlaybackClock clock;
    private final FieldMaps maps;
    private final SceneDocument document;
    private final PlaybackRate rate = new PlaybackRate();
    /**
     * A zoom to fit was asked for before the run it should take in (free bodies' paths) was in:
     * it is fitted again once that run arrives, unless the user moved the view or edited first.
     */
    private boolean fitAwaitsRun;

    public EditorViewModel(Scene initial, Executor work, Executor ui) {
        this(initial, EditorViewModel::run, work, ui, System::nanoTime);
    }

    /**
     * @param runs    makes the run of each scene revision, watched by the monitor given (tests wrap it)
     * @param clockNs monotonic clock, nanoseconds, for progress reports, run durations and map delays
     */
    EditorViewModel(Scene initial, BiFunction<Scene, RunMonitor, SceneRun> runs, Executor work, Executor ui,
                    LongSupplier clockNs) {
        results = new SceneResults(runs, work, ui, clockNs, this::say);
        dragged = new DraggedInstant(runs, work, ui);
        clock = new PlaybackClock(initial.time(), new PlaybackClock.Moves() {
            @Override
            public void played(double wallSeconds) {
                maps.played(wallSeconds);
                measure(wallSeconds);
            }

            @Override
            public void jumped(boolean settled) {
                maps.request(settled ? FieldMaps.Quality.FINE : FieldMaps.Quality.MEDIUM);
            }
        });
        maps = new FieldMaps(results, clock, view, work, ui, clockNs, this::say);
        document = new SceneDocument(initial, this::say, this::revised);
        clock.timeProperty().addListener(o -> showTime());
        clock.playingProperty().addListener((o, was, now) -> {
            rate.reset();
            if (!now) {
                showTime();
                maps.request(FieldMaps.Quality.FINE);
            }
        });
        // A change listener: an invalidation listener that does not read the value would miss the next run.
        results.resultProperty().addListener((o, was, now) -> refitAfterRun());
        revised(initial, document.revision());
    }

    /**
     * The run of one revision: the scene's own window, as the command line and the export run it,
     * its instants on one core: the editor's display keeps the other (measured: frames of 50 ms
     * instead of 17 ms while the 20-object reference scene's series was solved on both).
     */
    static SceneRun run(Scene scene, RunMonitor monitor) {
        return new SceneRun(scene, RunRequest.of(scene), monitor, false);
    }

    private void revised(Scene s, long revision) {
        fitAwaitsRun = false;
        results.start(s, revision);
        if (!clock.window(s.time())) {
            showTime();
        }
        maps.request(FieldMaps.Quality.FINE);
    }

    /** Shows the clock's instant: the run's nearest sample while playback may, else solved exactly. */
    private void showTime() {
        Optional<RunResult> current = results.currentResult();
        if (current.isPresent() && clock.playsSamplesOf(current.get())) {
            results.showSample(current.get(), clock.time());
        } else {
            results.solveAt(clock.time());
        }
    }

    /** Measures how fast playback really goes by the instant shown after a frame of {@code wallSeconds}. */
    private void measure(double wallSeconds) {
        Snapshot shown = results.snapshot();
        Optional<RunResult> current = results.currentResult();
        boolean solving = current.isEmpty() || !clock.playsSamplesOf(current.get());
        rate.frame(wallSeconds, shown == null ? Double.NaN : shown.tS(), document.scene().time(), clock.speed(),
                solving);
    }

    /**
     * Replaces the whole scene (opened file, new scene, recovered work) and starts its time
     * afresh; {@code unsaved} marks recovered work that still needs saving.
     */
    public void load(Scene newScene, Path from, boolean unsaved) {
        load(SceneWithUnits.of(newScene), from, unsaved);
    }

    /** Replaces the whole scene as {@link #load(Scene, Path, boolean)} does, keeping the units its file gave. */
    public void load(SceneWithUnits newScene, Path from, boolean unsaved) {
        // Nothing of the scene before may stand beside the new one while its numbers are computed.
        results.forget();
        maps.forget();
        document.load(newScene, from, unsaved);
        clock.resetTime();
    }

    /**
     * Shows everything the scene holds over its whole time window, free bodies along their run
     * once it is in (their drawn place until then).
     */
    public void zoomToFit() {
        // A run of the scene shown before (just after opening another) says nothing about this one.
        Optional<SceneBounds> covered = results.extent();
        view.fit(covered.orElseGet(() -> SceneBounds.ofWindow(document.scene(), List.of())));
        fitAwaitsRun = covered.isEmpty();
        maps.request(FieldMaps.Quality.FINE);
    }

    /**
     * Completes a zoom to fit asked for while the run was computed (on opening a scene), so free
     * bodies' paths are in view; the view never rescales by itself after an edit.
     */
    private void refitAfterRun() {
        if (fitAwaitsRun && results.resultIsCurrent()) {
            fitAwaitsRun = false;
            if (view.stillFitted() && results.currentResult().map(RunResult::hasFreeBodies).orElse(false)) {
                zoomToFit();
            }
        }
    }

    /** Where the user sees things: bodies where they are at the time shown, free ones where the run has them. */
    public Placement seen() {
        Snapshot shown = results.snapshot();
        return Placement.of(document.scene(), clock.time(), shown == null ? Map.of() : shown.freeBodies());
    }

    public void say(String message) {
        status.set(message);
    }

    /** Empty while playback keeps to the speed asked for, else how fast it really goes and why. */
    public ReadOnlyStringProperty playbackNoteProperty() {
        return rate.noteProperty();
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public SceneDocument document() {
        return document;
    }

    public PlaybackClock clock() {
        return clock;
    }

    public SceneResults results() {
        return results;
    }

    /**
     * The numbers the tables show: those of the drag under way once its latest position is
     * solved, else the snapshot of the instant shown.
     */
    public Snapshot numbersShown() {
        DraggedInstant.Solved d = dragged.solvedProperty().get();
        return d != null ? d.snapshot() : results.snapshot();
    }

    /** The numbers of a drag under way, before it becomes a revision. */
    public DraggedInstant dragged() {
        return dragged;
    }

    public ViewSettings view() {
        return view;
    }

    public FieldMaps maps() {
        return maps;
    }

    /** The scene now (shorthand for the document's). */
    public Scene scene() {
        return document.scene();
    }
}
