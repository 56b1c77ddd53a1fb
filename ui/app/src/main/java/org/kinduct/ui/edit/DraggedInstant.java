package org.kinduct.ui.edit;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.function.BiFunction;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import org.kinduct.render.field.LatestOnly;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.SceneRun;

/**
 * The numbers of a drag under way: the instant shown, solved for the scene as the drag would
 * leave it, on a worker, the newest position only (moves that come faster than solves are
 * skipped). A drag becomes a revision only on release; until then its numbers live here, each
 * with the very scene it was solved for, so the canvas shows them only over that geometry.
 *
 * <p>A scene with free bodies has none: its instant is a sample of a run from t0, which is
 * started on release. A preview the solver refuses has none either; releasing it makes the
 * revision whose run says why.
 */
public final class DraggedInstant {

    /** A drag's scene and its instant's numbers. */
    public record Solved(Scene scene, Snapshot snapshot) {
    }

    private final BiFunction<Scene, RunMonitor, SceneRun> runs;
    private final Executor ui;
    private final LatestOnly jobs;
    private final ReadOnlyObjectWrapper<Solved> solved = new ReadOnlyObjectWrapper<>();
    /** Counts requests (UI thread only), so a solve that arrives after a newer request or a clear is dropped. */
    private long asked;
    /** The last request's scene and time (UI thread only): a move the grid snaps to the same place asks nothing. */
    private Scene lastPreview;
    private double lastTimeS;

    DraggedInstant(BiFunction<Scene, RunMonitor, SceneRun> runs, Executor work, Executor ui) {
        this.runs = Objects.requireNonNull(runs);
        this.ui = Objects.requireNonNull(ui);
        this.jobs = new LatestOnly(work);
    }

    /** Solves {@code preview} at {@code tS} off this thread; its numbers replace the last drag position's. */
    void ask(Scene preview, double tS) {
        if (tS == lastTimeS && preview.equals(lastPreview)) {
            return;
        }
        lastPreview = preview;
        lastTimeS = tS;
        long ask = ++asked;
        jobs.submit(() -> {
            Solved done = solve(preview, tS);
            ui.execute(() -> {
                if (asked == ask && done != null) {
                    solved.set(done);
                }
            });
        });
    }

    /** The drag ended: its numbers go, and any still being solved are dropped. */
    void clear() {
        asked++;
        lastPreview = null;
        solved.set(null);
    }

    // A refused preview shows no numbers while dragging; the revision made on release reports why.
    private Solved solve(Scene preview, double tS) {
        try {
            SceneRun run = runs.apply(preview, RunMonitor.NONE);
            return run.plan().coupled() ? null : new Solved(preview, run.instant(tS));
        } catch (RuntimeException refused) {
            return null;
        }
    }

    /** The numbers of {@code preview} (an equal scene solves to equal numbers), or null while they are computed. */
    public Snapshot snapshotOf(Scene preview) {
        Solved s = solved.get();
        return s != null && s.scene().equals(preview) ? s.snapshot() : null;
    }

    public ReadOnlyObjectProperty<Solved> solvedProperty() {
        return solved.getReadOnlyProperty();
    }
}
