package org.kinduct.ui.edit;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.function.Function;
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
import org.kinduct.report.ResultScales;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.SimulationCancelledException;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.LatestOnly;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.field.SceneEvaluator;
import org.kinduct.render.field.TrajectoryEvaluator;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;

/**
 * The editor's state and the only code that touches the scene and the solver: the current scene
 * with undo history, the selection, the time, the solved snapshot, the field map and time series.
 * Uses JavaFX observable properties but needs no running toolkit (tests drive it directly).
 *
 * <p>Work runs on the {@code work} executor and its results arrive through the {@code ui} one,
 * tagged with the scene revision they belong to; results of an outdated revision are dropped. The
 * simulation of free bodies reports its progress to the status line and is stopped as soon as a
 * newer revision (an edit, undo, redo or another scene) appears, so its worker is free at once.
 */
public final class EditorViewModel {

    /** Samples in a time plot. */
    public static final int SERIES_SAMPLES = 241;
    private static final String SIMULATING = "Simulating the free bodies…";
    private static final int UNDO_LIMIT = 200;
    private static final ResultScales NO_SCALES = ResultScales.of(List.of());
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

    private final Function<Scene, SceneEvaluator> evaluators;
    private final Executor ui;
    private final LongSupplier clockNs;
    private final UndoHistory history;
    private final FieldMapper mapper;
    private final LatestOnly snapshotJobs;
    private final LatestOnly seriesJobs;

    private final ReadOnlyObjectWrapper<Scene> scene = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyLongWrapper revision = new ReadOnlyLongWrapper();
    private final ReadOnlyObjectWrapper<Snapshot> snapshot = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<List<Snapshot>> series = new ReadOnlyObjectWrapper<>(List.of());
    private final ReadOnlyObjectWrapper<FieldRaster> raster = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<Map<String, Pose>> poses = new ReadOnlyObjectWrapper<>(Map.of());
    private final ReadOnlyObjectWrapper<Optional<EnergyAudit>> audit = new ReadOnlyObjectWrapper<>(Optional.empty());
    private final ReadOnlyBooleanWrapper simulating = new ReadOnlyBooleanWrapper();
    private final ReadOnlyDoubleWrapper simulationProgress = new ReadOnlyDoubleWrapper(-1);
    private final ReadOnlyObjectWrapper<List<Map<String, Pose>>> poseSeries = new ReadOnlyObjectWrapper<>(List.of());
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
    private SceneEvaluator evaluator;
    private long evaluatorRevision = -1;
    private long seriesRevision = -1;
    private ResultScales runScales = NO_SCALES;
    private double sincePlaybackMap = Double.POSITIVE_INFINITY;
    /** Scene time the last playback frame moved on by. */
    private double playbackStepS;
    /** Wall-clock seconds from asking for a playback map to seeing it, smoothed; a first guess until measured. */
    private double mapLatencyS = 0.1;
    private double leadMapT = Double.NaN;
    private long leadMapAskedNs;
    /** Watches the current revision's simulation; outdated (and so stopped) by the next revision. */
    private RunWatch watch;

    public EditorViewModel(Scene initial, Function<Scene, SceneEvaluator> evaluators, Executor work, Executor ui) {
        this(initial, evaluators, work, ui, System::nanoTime);
    }

    /** @param clockNs monotonic clock, nanoseconds, for the simulation's progress reports and duration */
    EditorViewModel(Scene initial, Function<Scene, SceneEvaluator> evaluators, Executor work, Executor ui,
                    LongSupplier clockNs) {
        this.evaluators = evaluators;
        this.ui = ui;
        this.clockNs = clockNs;
        this.history = new UndoHistory(initial, UNDO_LIMIT);
        this.snapshotJobs = new LatestOnly(work);
        this.seriesJobs = new LatestOnly(work);
        // A stopped simulation only ever belongs to an outdated revision: nothing to report.
        this.mapper = new FieldMapper(evaluators, work, ui, this::acceptRaster, e -> {
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

    private SceneEvaluator evaluator() {
        if (evaluator == null || evaluatorRevision != revision.get()) {
            evaluator = evaluators.apply(scene.get());
            evaluator.monitor(watch);
            evaluatorRevision = revision.get();
        }
        return evaluator;
    }

    /**
     * Solves the current time off the UI thread; a result for an older scene is dropped. While
     * playing, the time series' sample nearest in time is shown instead when the series is ready,
     * so playback moves at frame rate instead of at the solver's pace; pausing solves exactly.
     */
    private void solveNow() {
        if (scene.get() == null) {
            return;
        }
        if (playing.get() && showSeriesSample(time.get())) {
            return;
        }
        SceneEvaluator ev;
        try {
            ev = evaluator();
        } catch (RuntimeException e) {
            snapshot.set(null);
            status.set("Solver: " + describe(e));
            return;
        }
        long rev = revision.get();
        double t = time.get();
        snapshotJobs.submit(() -> {
            try {
                Snapshot result = ev.at(t);
                Map<String, Pose> placed = ev.posesAt(result.tS());
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        snapshot.set(result);
                        poses.set(placed);
                    }
                });
            } catch (RuntimeException e) {
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        snapshot.set(null);
                        status.set("Solver: " + describe(e));
                    }
                });
            }
        });
    }

    /** Whether {@link #seriesProperty()} (and the simulated poses) belong to the scene shown now. */
    public boolean seriesIsCurrent() {
        return seriesRevision == revision.get();
    }

    /** The time series of the scene shown now; empty while it is being solved after an edit. */
    public List<Snapshot> currentSeries() {
        return seriesIsCurrent() ? series.get() : List.of();
    }

    /**
     * What values shown now are read against (noise reads 0): the current scene's run, taken once
     * when it arrives, widened to the snapshot shown.
     */
    public ResultScales scalesNow() {
        return (seriesIsCurrent() ? runScales : NO_SCALES).including(snapshot.get());
    }

    /**
     * Shows the series sample nearest to {@code t}; false when the series is not for this scene,
     * or when playback is so slow that several frames fall between two samples (slow motion would
     * then move in visible steps: those frames are solved exactly).
     */
    private boolean showSeriesSample(double t) {
        List<Snapshot> samples = series.get();
        if (seriesRevision != revision.get() || samples.size() < 2) {
            return false;
        }
        double sampleStep = (samples.get(samples.size() - 1).tS() - samples.get(0).tS()) / (samples.size() - 1);
        if (playbackStepS < sampleStep * SLOW_MOTION_FRACTION) {
            return false;
        }
        int i = nearestSample(samples, t);
        List<Map<String, Pose>> placed = poseSeries.get();
        snapshot.set(samples.get(i));
        poses.set(placed.size() == samples.size() ? placed.get(i) : Map.of());
        return true;
    }

    /** Index of the sample (in time order) nearest to {@code t}. */
    static int nearestSample(List<Snapshot> samples, double t) {
        int lo = 0;
        int hi = samples.size() - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (samples.get(mid).tS() <= t) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.abs(samples.get(hi).tS() - t) < Math.abs(samples.get(lo).tS() - t) ? hi : lo;
    }

    private void requestSeries() {
        Scene s = scene.get();
        long rev = revision.get();
        SceneEvaluator ev;
        try {
            ev = evaluator();
        } catch (RuntimeException e) {
            simulating.set(false);
            status.set("Solver: " + describe(e));
            return;
        }
        TimeSpan span = s.time();
        double dt = (span.t1S() - span.t0S()) / (SERIES_SAMPLES - 1);
        // A simulated scene keeps showing the last good run until the new one is done.
        boolean simulated = TrajectoryEvaluator.needsSimulation(s);
        simulating.set(simulated);
        simulationProgress.set(-1);
        if (simulated) {
            status.set(SIMULATING);
        } else {
            audit.set(Optional.empty());
        }
        seriesJobs.submit(() -> {
            try {
                long started = clockNs.getAsLong();
                List<Snapshot> result = ev.series(span.t0S(), span.t1S(), dt);
                Optional<EnergyAudit> energy = ev.audit();
                List<Map<String, Pose>> placed = simulated
                        ? result.stream().map(sn -> ev.posesAt(sn.tS())).toList() : List.of();
                double seconds = (clockNs.getAsLong() - started) * 1e-9;
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        seriesRevision = rev;
                        runScales = ResultScales.of(result);
                        series.set(result);
                        poseSeries.set(placed);
                        audit.set(energy);
                        if (simulated) {
                            simulating.set(false);
                            status.set(String.format(Locale.ROOT, "Free bodies simulated (%.1f s)", seconds));
                        }
                    }
                });
            } catch (RuntimeException e) {
                // Failures of an outdated revision, a stopped simulation among them, are not news.
                ui.execute(() -> {
                    if (revision.get() == rev) {
                        simulating.set(false);
                        status.set((simulated ? "Simulation: " : "Time series: ") + describe(e));
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
        mapper.request(new MapRequest(scene.get(), revision.get(), tS, v, quality.stepPx));
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

    /** Exact B_z at a scene point at the current time (for the cursor readout); NaN if the solver fails. */
    public double bzAt(double x, double y) {
        try {
            return evaluator().fieldAt(time.get()).bz(x, y);
        } catch (RuntimeException e) {
            return Double.NaN;
        }
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

    public ReadOnlyObjectProperty<List<Snapshot>> seriesProperty() {
        return series.getReadOnlyProperty();
    }

    /** Integrated poses of the free bodies at the shown time; empty when every body follows a prescribed motion. */
    public ReadOnlyObjectProperty<Map<String, Pose>> posesProperty() {
        return poses.getReadOnlyProperty();
    }

    /** Simulated poses at the times of {@link #seriesProperty()}; empty when no body is simulated. */
    public ReadOnlyObjectProperty<List<Map<String, Pose>>> poseSeriesProperty() {
        return poseSeries.getReadOnlyProperty();
    }

    /** The energy audit of the simulated run, when the scene has free bodies. */
    public ReadOnlyObjectProperty<Optional<EnergyAudit>> auditProperty() {
        return audit.getReadOnlyProperty();
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
