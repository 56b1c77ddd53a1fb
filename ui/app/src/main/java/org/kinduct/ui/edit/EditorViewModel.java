package org.kinduct.ui.edit;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.function.BiFunction;
import java.util.function.LongSupplier;
import java.util.function.UnaryOperator;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyLongProperty;
import javafx.beans.property.ReadOnlyLongWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableSet;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.report.InductanceSummary;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.dynamics.SimulationCancelledException;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.LatestOnly;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;

/**
 * The editor's state and the only code that touches the scene and the solver: the current scene
 * with undo history, the selection, the time, the shown snapshot, the field map and the run.
 * Uses JavaFX observable properties but needs no running toolkit (tests drive it directly).
 *
 * <p>Numbers come from one {@link SceneRun} per scene revision, as the command line and the
 * export make it, so the editor shows what they write. Work runs on the {@code work} executor and
 * its results arrive through the {@code ui} one, tagged with the scene revision they belong to;
 * results of an outdated revision are dropped. Nothing here waits for a solve on the calling
 * (UI) thread: the cursor's B_z is read from the field delivered with the shown snapshot. A
 * coupled run reports its progress to the status line and is stopped as soon as a newer revision
 * (an edit, undo, redo or another scene) appears, so its worker is free at once.
 */
public final class EditorViewModel {

    private static final String SIMULATING = "Running the coupled simulation…";
    private static final int UNDO_LIMIT = 200;
    private static final ResultScales NO_SCALES = ResultScales.of(List.of());
    private static final SceneField NO_FIELD = new SceneField(List.of());
    /**
     * While playing, a coarse field map at most this often (seconds of wall-clock time): maps share
     * the two cores with painting, and a map that trails the sources by a few frames is fine to look at.
     */
    static final double PLAYBACK_MAP_INTERVAL_S = 0.05;
    /** Frames that move on by less than this fraction of the series step are solved exactly. */
    static final double SLOW_MOTION_FRACTION = 0.25;
    private static final double LATENCY_SMOOTHING = 0.3;
    /** A map that took longer than this (a stall) is not taken as the usual delay. */
    private static final double MAX_MAP_LATENCY_S = 0.5;

    /** How finely to sample the field map, screen pixels per sample. */
    public enum MapQuality {
        COARSE(8), MEDIUM(4), FINE(2);

        final int stepPx;

        MapQuality(int stepPx) {
            this.stepPx = stepPx;
        }
    }

    private final BiFunction<Scene, RunMonitor, SceneRun> runs;
    private final Executor ui;
    private final LongSupplier clockNs;
    private final UndoHistory history;
    private final FieldMapper mapper;
    private final LatestOnly snapshotJobs;
    private final LatestOnly seriesJobs;

    private final ReadOnlyObjectWrapper<Scene> scene = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyLongWrapper revision = new ReadOnlyLongWrapper();
    private final ReadOnlyObjectWrapper<Snapshot> snapshot = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<RunResult> result = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<FieldRaster> raster = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper inductanceLine = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper simulating = new ReadOnlyBooleanWrapper();
    private final ReadOnlyDoubleWrapper simulationProgress = new ReadOnlyDoubleWrapper(-1);
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper();
    private final DoubleProperty time = new SimpleDoubleProperty();
    private final BooleanProperty playing = new SimpleBooleanProperty();
    private final DoubleProperty speed = new SimpleDoubleProperty(1);
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>();
    private final ObjectProperty<ViewTransform> view = new SimpleObjectProperty<>(ViewTransform.initial(800, 600));
    private final ObjectProperty<ColourRange> range = new SimpleObjectProperty<>(ColourRange.automatic());
    private final ObservableSet<Layer> layers = FXCollections.observableSet(EnumSet.complementOf(
            EnumSet.of(Layer.SYMBOLS)));
    private final ObservableSet<String> selection = FXCollections.observableSet();
    private final ObjectProperty<ToolKind> tool = new SimpleObjectProperty<>(ToolKind.SELECT);
    private final BooleanProperty snapToGrid = new SimpleBooleanProperty(true);
    private final BooleanProperty snapAngles = new SimpleBooleanProperty(true);
    /** The run of the scene shown now; replaced with every revision. */
    private SceneRun run;
    private long resultRevision = -1;
    /** The field of the instant shown, for the cursor readout: evaluated on the UI thread, never waited for. */
    private SceneField shownField = NO_FIELD;
    private double sincePlaybackMap = Double.POSITIVE_INFINITY;
    /** Scene time the last playback frame moved on by. */
    private double playbackStepS;
    /** Wall-clock seconds from asking for a playback map to seeing it, smoothed; a first guess until measured. */
    private double mapLatencyS = 0.1;
    private double leadMapT = Double.NaN;
    private long leadMapAskedNs;
    /** Watches the current revision's simulation; outdated (and so stopped) by the next revision. */
    private RunWatch watch;

    public EditorViewModel(Scene initial, Executor work, Executor ui) {
        this(initial, EditorViewModel::run, work, ui, System::nanoTime);
    }

    /**
     * @param runs makes the run of each scene revision, watched by the monitor given (tests wrap it)
     * @param clockNs monotonic clock, nanoseconds, for the simulation's progress reports and duration
     */
    EditorViewModel(Scene initial, BiFunction<Scene, RunMonitor, SceneRun> runs, Executor work, Executor ui,
                    LongSupplier clockNs) {
        this.runs = runs;
        this.ui = ui;
        this.clockNs = clockNs;
        this.history = new UndoHistory(initial, UNDO_LIMIT);
        this.snapshotJobs = new LatestOnly(work);
        this.seriesJobs = new LatestOnly(work);
        // A stopped simulation only ever belongs to an outdated revision: nothing to report.
        this.mapper = new FieldMapper(work, ui, this::acceptRaster, e -> {
            if (!(e instanceof SimulationCancelledException)) {
                status.set("Field map failed: " + e.getMessage());
            }
        });
        time.addListener((obs, old, t) -> solveNow());
        playing.addListener((obs, was, now) -> {
            if (!now) {
                solveNow();
                requestField(MapQuality.FINE);
            }
        });
        show(initial);
        time.set(initial.time().t0S());
    }

    // ---- editing ----

    /** Applies an edit; an edit the model rejects leaves the scene as it was and says why. */
    public boolean apply(String label, UnaryOperator<Scene> edit) {
        Scene next;
        try {
            next = edit.apply(scene.get());
        } catch (IllegalArgumentException | IllegalStateException e) {
            status.set(label + " refused: " + e.getMessage());
            return false;
        }
        if (next.equals(scene.get())) {
            return false;
        }
        history.push(next, label);
        show(next);
        status.set(label);
        return true;
    }

    public void undo() {
        if (history.canUndo()) {
            String label = history.undoLabel();
            show(history.undo());
            status.set("Undone: " + label);
        }
    }

    public void redo() {
        if (history.canRedo()) {
            String label = history.redoLabel();
            show(history.redo());
            status.set("Redone: " + label);
        }
    }

    /** Replaces the whole scene (opened file, new scene); history starts afresh. */
    public void load(Scene newScene, Path from) {
        load(newScene, from, false);
    }

    /** As {@link #load(Scene, Path)}; {@code unsaved} marks recovered work that still needs saving. */
    public void load(Scene newScene, Path from, boolean unsaved) {
        history.reset(newScene);
        if (unsaved) {
            history.markUnsaved();
        }
        file.set(from);
        selection.clear();
        playing.set(false);
        show(newScene);
        time.set(newScene.time().t0S());
        solveNow();
    }

    public void markSaved(Path to) {
        history.markSaved();
        file.set(to);
        updateFlags();
    }

    private void show(Scene s) {
        if (watch != null) {
            watch.outdate();
        }
        selection.removeIf(id -> s.source(id).isEmpty() && s.conductor(id).isEmpty());
        scene.set(s);
        revision.set(revision.get() + 1);
        long rev = revision.get();
        watch = new RunWatch(clockNs, percent -> ui.execute(() -> showProgress(rev, percent)));
        run = runs.apply(s, watch);
        updateFlags();
        double t = clampTime(time.get());
        if (t != time.get()) {
            time.set(t);
        }
        // The series first: it says that a simulation is under way before any job can report on it.
        requestSeries();
        solveNow();
        requestField(MapQuality.FINE);
    }

    private void updateFlags() {
        dirty.set(history.isDirty());
        canUndo.set(history.canUndo());
        canRedo.set(history.canRedo());
    }

    // ---- time ----

    /** Advances playback by {@code realSeconds} of wall-clock time times the speed, wrapping at the end. */
    public void advance(double realSeconds) {
        playbackStepS = realSeconds * speed.get();
        time.set(wrapped(time.get() + playbackStepS));
        sincePlaybackMap += realSeconds;
        if (sincePlaybackMap >= PLAYBACK_MAP_INTERVAL_S) {
            sincePlaybackMap = 0;
            // Ask for the instant playback will have reached when the map is on screen, so moving
            // sources and their colours stay together instead of the colours trailing behind.
            double lead = (mapLatencyS + PLAYBACK_MAP_INTERVAL_S / 2) * speed.get();
            leadMapT = wrapped(time.get() + lead);
            leadMapAskedNs = clockNs.getAsLong();
            requestField(MapQuality.COARSE, leadMapT);
        }
    }

    /**
     * The view shows the map made for {@code r}: if it is the latest map asked for ahead of
     * playback, the wall-clock time it took from asking to showing refines how far ahead to ask.
     */
    public void mapShown(FieldRaster r) {
        if (r.tS() == leadMapT && r.revision() == revision.get()) {
            double took = (clockNs.getAsLong() - leadMapAskedNs) * 1e-9;
            mapLatencyS += LATENCY_SMOOTHING * (Math.min(took, MAX_MAP_LATENCY_S) - mapLatencyS);
            leadMapT = Double.NaN;
        }
    }

    /** How far ahead of playback, in wall-clock seconds, maps are asked for (before the half interval). */
    double mapLatencyS() {
        return mapLatencyS;
    }

    private double wrapped(double t) {
        TimeSpan span = scene.get().time();
        return t > span.t1S() ? span.t0S() + (t - span.t1S()) % (span.t1S() - span.t0S()) : t;
    }

    /** Moves by {@code steps} of the scene's time step. */
    public void step(int steps) {
        time.set(clampTime(time.get() + steps * scene.get().time().dtS()));
        requestField(MapQuality.FINE);
    }

    public void resetTime() {
        playing.set(false);
        time.set(scene.get().time().t0S());
        requestField(MapQuality.FINE);
    }

    /** Sets the time, clamped to the scene's window. */
    public void seek(double tS) {
        time.set(clampTime(tS));
        requestField(MapQuality.MEDIUM);
    }

    private double clampTime(double t) {
        TimeSpan span = scene.get().time();
        return Math.max(span.t0S(), Math.min(span.t1S(), t));
    }

    // ---- solving ----

    /**
     * The run of one revision: the scene's own window, as the command line and the export run it,
     * its instants on one core: the editor's display keeps the other (measured: frames of 50 ms
     * instead of 17 ms while the 20-object reference scene's series was solved on both).
     */
    static SceneRun run(Scene scene, RunMonitor monitor) {
        return new SceneRun(scene, RunRequest.of(scene), monitor, false);
    }

    /**
     * Solves the current time off the UI thread; a result for an older scene is dropped. While
     * playing, the run's sample nearest in time is shown instead when the run is ready, so
     * playback moves at frame rate instead of at the solver's pace; pausing solves exactly (for a
     * coupled run, the nearest sample is the exact answer the run has).
     */
    private void solveNow() {
        if (scene.get() == null) {
            return;
        }
        if (playing.get() && showRunSample(time.get())) {
            return;
        }
        SceneRun r = run;
        long rev = revision.get();
        double t = time.get();
        snapshotJobs.submit(() -> {
            try {
                Snapshot shown = r.instant(t);
                SceneField field = r.fieldAt(shown.tS());
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        snapshot.set(shown);
                        shownField = field;
                    }
                });
            } catch (RuntimeException e) {
                ui.execute(() -> {
                    if (revision.get() == rev && !(e instanceof SimulationCancelledException)) {
                        snapshot.set(null);
                        shownField = NO_FIELD;
                        status.set("Solver: " + describe(e));
                    }
                });
            }
        });
    }

    /** Whether {@link #resultProperty()} belongs to the scene shown now. */
    public boolean resultIsCurrent() {
        return resultRevision == revision.get();
    }

    /** The run of the scene shown now, or empty while it is being computed after an edit. */
    public Optional<RunResult> currentResult() {
        return resultIsCurrent() ? Optional.ofNullable(result.get()) : Optional.empty();
    }

    /**
     * What values shown now are read against (noise reads 0): the current scene's run, widened to
     * the snapshot shown.
     */
    public ResultScales scalesNow() {
        return currentResult().map(RunResult::scales).orElse(NO_SCALES).including(snapshot.get());
    }

    /**
     * Shows the run's sample nearest to {@code t}; false when the run is not for this scene, or
     * when playback is so slow that several frames fall between two samples of quasi-static
     * instants (slow motion would then move in visible steps: those frames are solved exactly).
     */
    private boolean showRunSample(double t) {
        Optional<RunResult> current = currentResult();
        if (current.isEmpty() || current.get().samples().size() < 2) {
            return false;
        }
        List<Snapshot> samples = current.get().samples();
        double sampleStep = (samples.get(samples.size() - 1).tS() - samples.get(0).tS()) / (samples.size() - 1);
        if (!current.get().plan().coupled() && playbackStepS < sampleStep * SLOW_MOTION_FRACTION) {
            return false;
        }
        snapshot.set(current.get().nearest(t));
        return true;
    }

    private void requestSeries() {
        SceneRun r = run;
        long rev = revision.get();
        // A simulated scene keeps showing the last good run until the new one is done.
        inductanceLine.set("");
        simulating.set(false);
        simulationProgress.set(-1);
        seriesJobs.submit(() -> {
            try {
                boolean coupled = r.plan().coupled();
                String inductance = InductanceSummary.of(r.inductanceAtStart());
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        inductanceLine.set(inductance);
                        simulating.set(coupled);
                        if (coupled) {
                            status.set(SIMULATING);
                        }
                    }
                });
                long started = clockNs.getAsLong();
                RunResult done = r.result();
                double seconds = (clockNs.getAsLong() - started) * 1e-9;
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        resultRevision = rev;
                        result.set(done);
                        if (coupled) {
                            simulating.set(false);
                            status.set(String.format(Locale.ROOT, "Coupled run done (%.1f s)", seconds));
                        }
                    }
                });
            } catch (RuntimeException e) {
                // Failures of an outdated revision, a stopped simulation among them, are not news.
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        simulating.set(false);
                        status.set("Run: " + describe(e));
                    }
                });
            }
        });
    }

    /** Shows a progress report of revision {@code rev}'s simulation while that revision is current. */
    private void showProgress(long rev, int percent) {
        if (revision.get() == rev && simulating.get()) {
            simulationProgress.set(percent / 100.0);
            status.set(String.format(Locale.ROOT, "%s %d %%", SIMULATING, percent));
        }
    }

    /** Asks for a field map of the current view at the current time. */
    public void requestField(MapQuality quality) {
        requestField(quality, time.get());
    }

    private void requestField(MapQuality quality, double tS) {
        ViewTransform v = view.get();
        if (v.widthPx() < 1 || v.heightPx() < 1 || !layers.contains(Layer.HEAT_MAP)
                && !layers.contains(Layer.CONTOURS) && !layers.contains(Layer.SYMBOLS)) {
            return;
        }
        mapper.request(new MapRequest(run, revision.get(), tS, v, quality.stepPx));
    }

    /** Takes a finished map unless the scene changed since it was asked for. */
    void acceptRaster(FieldRaster r) {
        if (r.revision() == revision.get()) {
            raster.set(r);
        }
    }

    private static String describe(RuntimeException e) {
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    /**
     * Exact B_z at a scene point at the instant shown (for the cursor readout), from the field
     * delivered with the snapshot: one closed-form evaluation, never a wait. 0 while none is shown.
     */
    public double bzAt(double x, double y) {
        return shownField.bz(x, y);
    }

    // ---- status ----

    public void say(String message) {
        status.set(message);
    }

    // ---- properties ----

    public ReadOnlyObjectProperty<Scene> sceneProperty() {
        return scene.getReadOnlyProperty();
    }

    public Scene scene() {
        return scene.get();
    }

    public ReadOnlyLongProperty revisionProperty() {
        return revision.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Snapshot> snapshotProperty() {
        return snapshot.getReadOnlyProperty();
    }

    /**
     * The run of the scene (samples, free bodies, energy audit); after an edit it keeps the last
     * good run until the new one is done ({@link #resultIsCurrent()} tells which).
     */
    public ReadOnlyObjectProperty<RunResult> resultProperty() {
        return result.getReadOnlyProperty();
    }

    /** The loops' inductances at the start of the current scene's run, in words; empty without closed loops. */
    public ReadOnlyStringProperty inductanceLineProperty() {
        return inductanceLine.getReadOnlyProperty();
    }

    /** True while a simulation of the current scene is running (the last good result is shown meanwhile). */
    public ReadOnlyBooleanProperty simulatingProperty() {
        return simulating.getReadOnlyProperty();
    }

    /** Fraction of the current revision's simulation done, −1 until its first report (as a progress indicator takes it). */
    public ReadOnlyDoubleProperty simulationProgressProperty() {
        return simulationProgress.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<FieldRaster> rasterProperty() {
        return raster.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    public DoubleProperty timeProperty() {
        return time;
    }

    public BooleanProperty playingProperty() {
        return playing;
    }

    public DoubleProperty speedProperty() {
        return speed;
    }

    public ObjectProperty<Path> fileProperty() {
        return file;
    }

    public ObjectProperty<ViewTransform> viewProperty() {
        return view;
    }

    public ObjectProperty<ColourRange> rangeProperty() {
        return range;
    }

    public ObservableSet<Layer> layers() {
        return layers;
    }

    public ObjectProperty<ToolKind> toolProperty() {
        return tool;
    }

    public BooleanProperty snapToGridProperty() {
        return snapToGrid;
    }

    public BooleanProperty snapAnglesProperty() {
        return snapAngles;
    }

    public ObservableSet<String> selection() {
        return selection;
    }

    /** Selects exactly {@code ids}. */
    public void select(Set<String> ids) {
        selection.retainAll(ids);
        selection.addAll(ids);
    }
}
