package org.kinduct.ui.edit;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.BiFunction;
import java.util.function.Consumer;
import java.util.function.LongSupplier;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.kinduct.render.field.LatestOnly;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.report.InductanceSummary;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.dynamics.SimulationCancelledException;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * The numbers the editor shows, all from one {@link SceneRun} per scene revision, made as the
 * command line and the export make it, so the editor shows what they write: the run's result
 * (samples, free bodies, energy audit), the snapshot of the instant shown with its field for the
 * cursor readout, and the loops' inductances at the start.
 *
 * <p>Every call into the run happens on the {@code work} executor (the run's methods may block
 * while it computes); results arrive through the {@code ui} one, tagged with their revision, and
 * those of an outdated revision are dropped. A coupled run reports its progress and is stopped as
 * soon as the next revision starts, so its worker is free at once.
 */
public final class SceneResults {

    private static final String SIMULATING = "Running the coupled simulation…";
    /** Intervals of the coarse run shown while a long window is computed. */
    static final int PREVIEW_SAMPLES = 40;
    private static final ResultScales NO_SCALES = ResultScales.of(List.of());
    private static final SceneField NO_FIELD = new SceneField(List.of());

    private final BiFunction<Scene, RunMonitor, SceneRun> runs;
    private final Executor ui;
    private final LongSupplier clockNs;
    private final Consumer<String> say;
    private final LatestOnly snapshotJobs;
    private final LatestOnly runJobs;
    private final ReadOnlyObjectWrapper<Snapshot> snapshot = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<RunResult> result = new ReadOnlyObjectWrapper<>();
    /** A coarse run of the revision shown while its full run is computed, else null. */
    private final ReadOnlyObjectWrapper<RunResult> preview = new ReadOnlyObjectWrapper<>();
    /** What the result's scene covers over its window, found with the result (it reads every sample). */
    private SceneBounds extent;
    private final ReadOnlyStringWrapper inductanceLine = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper simulating = new ReadOnlyBooleanWrapper();
    private final ReadOnlyDoubleWrapper simulationProgress = new ReadOnlyDoubleWrapper(-1);
    /** The run of the revision shown now. */
    private SceneRun run;
    private long revision = -1;
    private long resultRevision = -1;
    /** Counts what was asked to be shown, so a late answer never replaces a newer one. */
    private long asked;
    /** The field of the instant shown, delivered with its snapshot. */
    private final ReadOnlyObjectWrapper<SceneField> shownField = new ReadOnlyObjectWrapper<>(NO_FIELD);
    /** Watches the current revision's run; outdated (and so stopped) by the next revision. */
    private RunWatch watch;

    /**
     * @param runs    makes the run of each scene revision, watched by the monitor given
     * @param clockNs monotonic clock, nanoseconds, for progress reports and the run's duration
     */
    SceneResults(BiFunction<Scene, RunMonitor, SceneRun> runs, Executor work, Executor ui, LongSupplier clockNs,
                 Consumer<String> say) {
        this.runs = runs;
        this.ui = ui;
        this.clockNs = clockNs;
        this.say = say;
        this.snapshotJobs = new LatestOnly(work);
        this.runJobs = new LatestOnly(work);
    }

    /** Starts revision {@code rev} of the scene: stops the last one's run and computes the new one's. */
    void start(Scene scene, long rev) {
        if (watch != null) {
            watch.outdate();
        }
        revision = rev;
        preview.set(null);
        watch = new RunWatch(clockNs, percent -> ui.execute(() -> showProgress(rev, percent)));
        run = runs.apply(scene, watch);
        computeRun();
    }

    /** The run of the revision shown now (its methods may block: call them from a worker). */
    SceneRun run() {
        return run;
    }

    long revision() {
        return revision;
    }

    /**
     * Solves the instant {@code tS} off the UI thread and shows it with its field. For a coupled
     * run that is the run's sample, so it arrives once the run is done.
     */
    void solveAt(double tS) {
        SceneRun r = run;
        long rev = revision;
        long ask = ++asked;
        snapshotJobs.submit(() -> {
            try {
                Snapshot shown = r.instant(tS);
                SceneField field = r.fieldAt(shown.tS());
                ui.execute(() -> {
                    if (revision == rev && asked == ask) {
                        shownField.set(field);
                        snapshot.set(shown);
                    }
                });
            } catch (RuntimeException e) {
                failed(rev, ask, e);
            }
        });
    }

    /**
     * Shows at once the numbers a drag solved for the scene just made the current revision (the
     * same instant of the same scene, solved the same way), rather than the last revision's until
     * the revision's own solve, which {@link #solveAt} has already asked for, arrives.
     */
    void showSolved(Snapshot sameInstant) {
        snapshot.set(sameInstant);
    }

    /**
     * Shows the current run's sample nearest to {@code tS} at once (playback) and fetches its
     * field for the cursor readout.
     */
    // The same sample object means the same state of the same run: nothing new to show.
    @SuppressWarnings("ReferenceEquality")
    void showSample(RunResult current, double tS) {
        Snapshot sample = current.nearest(tS);
        if (sample == snapshot.get()) {
            return;
        }
        SceneRun r = run;
        long rev = revision;
        long ask = ++asked;
        snapshot.set(sample);
        snapshotJobs.submit(() -> {
            try {
                SceneField field = r.fieldAt(sample.tS());
                ui.execute(() -> {
                    if (revision == rev && asked == ask) {
                        shownField.set(field);
                    }
                });
            } catch (RuntimeException e) {
                failed(rev, ask, e);
            }
        });
    }

    /** Shows nothing until the next scene's numbers arrive (another scene replaces this one). */
    void forget() {
        snapshot.set(null);
        shownField.set(NO_FIELD);
    }

    /** A solve failed: nothing is shown rather than numbers of another state. A stopped run is no news. */
    private void failed(long rev, long ask, RuntimeException e) {
        ui.execute(() -> {
            if (revision == rev && asked == ask && !(e instanceof SimulationCancelledException)) {
                snapshot.set(null);
                shownField.set(NO_FIELD);
                say.accept("Solver: " + describe(e));
            }
        });
    }

    private void computeRun() {
        SceneRun r = run;
        long rev = revision;
        RunWatch stops = watch;
        // A simulated scene keeps showing the last good run until the new one is done.
        inductanceLine.set("");
        simulating.set(false);
        simulationProgress.set(-1);
        runJobs.submit(() -> {
            try {
                boolean coupled = r.plan().coupled();
                String inductance = InductanceSummary.of(r.inductanceAtStart());
                ui.execute(() -> {
                    if (revision == rev) {
                        inductanceLine.set(inductance);
                        simulating.set(coupled);
                        if (coupled) {
                            say.accept(SIMULATING);
                        }
                    }
                });
                long started = clockNs.getAsLong();
                if (!coupled) {
                    preview(r, rev, stops);
                }
                RunResult done = r.result();
                double seconds = (clockNs.getAsLong() - started) * 1e-9;
                SceneBounds covered = SceneBounds.ofWindow(done.scene(), done.samples());
                ui.execute(() -> {
                    if (revision == rev) {
                        resultRevision = rev;
                        extent = covered;
                        preview.set(null);
                        result.set(done);
                        if (coupled) {
                            simulating.set(false);
                            say.accept(String.format(Locale.ROOT, "Coupled run done (%.1f s)", seconds));
                        }
                    }
                });
            } catch (RuntimeException e) {
                // Failures of an outdated revision, a stopped simulation among them, are not news.
                ui.execute(() -> {
                    if (revision == rev) {
                        simulating.set(false);
                        say.accept("Run: " + describe(e));
                    }
                });
            }
        });
    }

    /**
     * Fills the time plot in behind the instant shown: for a long quasi-static window, the same
     * scene over at most {@value #PREVIEW_SAMPLES} intervals, each instant solved exactly as the
     * full run will, shown until the full run is in (a small share of its cost).
     */
    private void preview(SceneRun full, long rev, RunWatch stops) {
        TimeSpan w = full.scene().time();
        int steps = w.steps();
        if (steps <= 2 * PREVIEW_SAMPLES) {
            return;
        }
        int stride = (steps + PREVIEW_SAMPLES - 1) / PREVIEW_SAMPLES;
        Scene coarse = full.scene().withTime(new TimeSpan(w.t0S(), w.t1S(), stride * w.dtS()));
        RunResult quick = runs.apply(coarse, stops).result();
        ui.execute(() -> {
            if (revision == rev && !resultIsCurrent()) {
                preview.set(quick);
            }
        });
    }

    /** Shows a progress report of revision {@code rev}'s run while that revision is current. */
    private void showProgress(long rev, int percent) {
        if (revision == rev && simulating.get()) {
            simulationProgress.set(percent / 100.0);
            say.accept(String.format(Locale.ROOT, "%s %d %%", SIMULATING, percent));
        }
    }

    private static String describe(RuntimeException e) {
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    /** Whether {@link #resultProperty()} belongs to the scene shown now. */
    public boolean resultIsCurrent() {
        return resultRevision == revision;
    }

    /** The run of the scene shown now, or empty while it is being computed after an edit. */
    public Optional<RunResult> currentResult() {
        return resultIsCurrent() ? Optional.ofNullable(result.get()) : Optional.empty();
    }

    /**
     * What the current scene's objects cover over its time window, free bodies along their run;
     * empty while the run is being computed after an edit.
     */
    public Optional<SceneBounds> extent() {
        return resultIsCurrent() ? Optional.ofNullable(extent) : Optional.empty();
    }

    /**
     * What values shown now are read against (noise reads 0): the current scene's run, widened to
     * the snapshot shown.
     */
    public ResultScales scalesNow() {
        return currentResult().map(RunResult::scales).orElse(NO_SCALES).including(snapshot.get());
    }

    /**
     * B_z at a scene point at the instant shown (the cursor readout), from the field delivered
     * with the snapshot: one closed-form sum, never a wait. 0 while none has arrived.
     */
    public double bzAt(double x, double y) {
        return shownField.get().bz(x, y);
    }

    /** The field {@link #bzAt} reads: it arrives with the snapshot shown, or just after a playback sample. */
    public ReadOnlyObjectProperty<SceneField> shownFieldProperty() {
        return shownField.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Snapshot> snapshotProperty() {
        return snapshot.getReadOnlyProperty();
    }

    public Snapshot snapshot() {
        return snapshot.get();
    }

    /**
     * The run of the scene (samples, free bodies, energy audit); after an edit it keeps the last
     * good run until the new one is done ({@link #resultIsCurrent()} tells which).
     */
    public ReadOnlyObjectProperty<RunResult> resultProperty() {
        return result.getReadOnlyProperty();
    }

    /** A coarse run of the scene shown while its full run is computed (null otherwise): for plots marked as filling in. */
    public ReadOnlyObjectProperty<RunResult> previewProperty() {
        return preview.getReadOnlyProperty();
    }

    /** The loops' inductances at the start of the current scene's run, in words; empty without closed loops. */
    public ReadOnlyStringProperty inductanceLineProperty() {
        return inductanceLine.getReadOnlyProperty();
    }

    /** True while a coupled run of the current scene is under way (the last good result is shown meanwhile). */
    public ReadOnlyBooleanProperty simulatingProperty() {
        return simulating.getReadOnlyProperty();
    }

    /** Fraction of the current revision's run done, −1 until its first report (as a progress indicator takes it). */
    public ReadOnlyDoubleProperty simulationProgressProperty() {
        return simulationProgress.getReadOnlyProperty();
    }
}
