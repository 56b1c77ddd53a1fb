package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.report.InductanceSummary;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/** The coordinator and its parts on small real scenes: editing, time, revisions, and who waits for what. */
class EditorViewModelTest {

    private static final double TIME_TOL = 1e-12;
    private static final Executor SAME_THREAD = Runnable::run;
    /** A small view keeps the field maps of these tests cheap. */
    private static final ViewTransform SMALL_VIEW = new ViewTransform(0.05, 0, 1000, 80, 60);

    private static EditorViewModel vm(Scene s, Executor work) {
        EditorViewModel vm = new EditorViewModel(s, work, SAME_THREAD);
        vm.view().viewProperty().set(SMALL_VIEW);
        return vm;
    }

    private static void drain(Queue<Runnable> jobs) {
        for (Runnable r; (r = jobs.poll()) != null; ) {
            r.run();
        }
    }

    @Test
    void rejectedEditKeepsTheSceneAndSaysWhy() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        Scene before = vm.scene();
        boolean applied = vm.document().apply("Add coil", s -> SceneEdits.addSource(s,
                new Source.UniformField("loop", 0.1)));
        assertFalse(applied);
        assertSame(before, vm.scene());
        assertTrue(vm.statusProperty().get().contains("used twice"), vm.statusProperty().get());
        assertFalse(vm.document().canUndoProperty().get());
    }

    @Test
    void editsCanBeUndoneAndRedoneAndMarkTheSceneDirty() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        Scene before = vm.scene();
        vm.document().apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        assertTrue(vm.document().isDirty());
        assertTrue(vm.scene().sources().isEmpty());
        vm.document().undo();
        assertEquals(before, vm.scene());
        assertFalse(vm.document().isDirty());
        assertTrue(vm.document().canRedoProperty().get());
        vm.document().redo();
        assertTrue(vm.scene().sources().isEmpty());
    }

    @Test
    void deletingASelectedObjectDropsItFromTheSelection() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.document().select(Set.of("loop", "magnet"));
        vm.document().apply("Delete", s -> SceneEdits.delete(s, Set.of("loop")));
        assertEquals(Set.of("magnet"), vm.document().selection());
    }

    @Test
    void playbackWrapsAtTheEndOfTheTimeWindow() {
        Scene s = Fixtures.loopAndMagnet().withTime(new TimeSpan(0, 1, 0.01));
        EditorViewModel vm = vm(s, SAME_THREAD);
        vm.clock().speedProperty().set(2);
        vm.clock().advance(0.1);
        vm.clock().advance(0.1);
        vm.clock().advance(0.1);
        assertEquals(0.6, vm.clock().time(), TIME_TOL);
        vm.clock().advance(0.3);
        assertEquals(0.8, vm.clock().time(), TIME_TOL, "a frame after a stall moves on by 0.1 s of wall time");
        vm.clock().advance(0.1);
        vm.clock().advance(0.1);
        assertEquals(0.2, vm.clock().time(), TIME_TOL);
        vm.clock().step(3);
        assertEquals(0.23, vm.clock().time(), TIME_TOL);
        vm.clock().resetTime();
        assertEquals(0, vm.clock().time(), TIME_TOL);
    }

    @Test
    void aShorterWindowBringsTheTimeIntoItAndShowsThatInstant() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.clock().seek(0.9);
        vm.document().apply("End time", s -> s.withTime(new TimeSpan(0, 0.5, 0.01)));
        assertEquals(0.5, vm.clock().time(), 0);
        assertEquals(0.5, vm.results().snapshot().tS(), 0);
    }

    @Test
    void mapsComputedForAnEarlierSceneAreDropped() {
        Queue<Runnable> queue = new ArrayDeque<>();
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), queue::add);
        vm.document().apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        // The first queued map was asked for the scene before the edit; run every queued job.
        drain(queue);
        assertNotNull(vm.maps().raster());
        assertEquals(vm.document().revision(), vm.maps().raster().revision());
        FieldRaster stale = new FieldRaster(0, 0, 1, 1, 1, new float[1], 0, 0, vm.document().revision() - 1, 0);
        vm.maps().accept(stale);
        assertEquals(vm.document().revision(), vm.maps().raster().revision(), "the stale map is ignored");
    }

    @Test
    void loadingAFileClearsHistoryAndSelectionAndStartsItsTimeAfresh() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.document().select(Set.of("loop"));
        vm.document().apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        vm.clock().seek(0.4);
        vm.clock().playingProperty().set(true);
        vm.load(Scene.empty("other"), null, false);
        assertFalse(vm.document().canUndoProperty().get());
        assertTrue(vm.document().selection().isEmpty());
        assertFalse(vm.document().isDirty());
        assertFalse(vm.clock().isPlaying());
        assertEquals(0, vm.clock().time(), 0);
    }

    @Test
    void theTitleNamesTheSceneAndItsFileAndMarksUnsavedChanges() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        assertEquals("fixture — Kinduct", vm.document().titleProperty().get());
        vm.document().apply("Rename", s -> s.withText("pickup", ""));
        assertEquals("• pickup — Kinduct", vm.document().titleProperty().get());
        vm.document().markSaved(vm.scene(), Path.of("/tmp/work/pickup.json"));
        assertEquals("pickup — pickup.json — Kinduct", vm.document().titleProperty().get());
        vm.load(org.kinduct.demo.Demos.load("rail-sled"), null, false);
        assertEquals("Sled on rails crossing a pole gap — Kinduct", vm.document().titleProperty().get(),
                "an opened demo, clean and without a file");
        vm.load(Scene.empty(""), null, false);
        assertEquals("untitled — Kinduct", vm.document().titleProperty().get());
    }

    @Test
    void openingAnotherSceneShowsNothingOfTheSceneBeforeWhileItsNumbersAreComputed() {
        Queue<Runnable> work = new ArrayDeque<>();
        EditorViewModel vm = vm(Fixtures.glidingMagnet(), work::add);
        drain(work);
        assertNotNull(vm.results().snapshot());
        assertNotNull(vm.maps().raster());
        assertTrue(vm.results().bzAt(0.1, 0) != 0);

        Scene next = org.kinduct.demo.Demos.load("rail-sled");
        vm.load(next, null, false);

        assertNull(vm.results().snapshot(), "no table rows of the scene before");
        assertNull(vm.maps().raster(), "no field colours of the scene before");
        assertEquals(0, vm.results().bzAt(0.1, 0), 0, "no cursor readout of the scene before");
        assertTrue(vm.results().currentResult().isEmpty(), "no waveform of the scene before");
        drain(work);
        assertEquals(List.of("rail-circuit"), vm.results().snapshot().conductors().stream()
                .map(org.kinduct.solver.ConductorState::id).toList());
        assertEquals(vm.document().revision(), vm.maps().raster().revision());
    }

    /** A loop dropped under gravity: its run decides where it falls, but an edit never moves the view. */
    @Test
    void theViewIsFittedOnOpeningOnlyNeverAfterAnEdit() {
        Scene drop = Fixtures.springCart(false).withBodies(List.of(new org.kinduct.scene.Body("cart", "cart",
                new org.kinduct.scene.Vec2(0.1, 0), org.kinduct.scene.Motion.Free.ofMass(0.1))))
                .withGravity(new org.kinduct.scene.Vec2(0, -9.81));
        Queue<Runnable> work = new ArrayDeque<>();
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), work::add);
        drain(work);
        vm.load(drop, null, false);
        vm.zoomToFit();
        ViewTransform beforeRun = vm.view().view();
        drain(work);
        ViewTransform opened = vm.view().view();
        assertTrue(opened.minY() < beforeRun.minY(), "once the run is in, the fall is taken into view");

        vm.document().apply("Gravity", s -> s.withGravity(new org.kinduct.scene.Vec2(0, -30)));
        drain(work);

        assertTrue(vm.results().currentResult().isPresent());
        assertSame(opened, vm.view().view(), "the edit left the view where it was");
    }

    @Test
    void recoveredWorkLoadsUnsaved() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.load(Scene.empty("recovered"), null, true);
        assertTrue(vm.document().isDirty());
        assertFalse(vm.document().canUndoProperty().get());
    }

    @Test
    void listenersOfTheSceneFindTheResultsAlreadyOnTheNewRevision() {
        Queue<Runnable> work = new ArrayDeque<>();
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), work::add);
        drain(work);
        assertTrue(vm.results().currentResult().isPresent());
        List<Boolean> staleSeen = new ArrayList<>();
        vm.document().sceneProperty().addListener(o -> staleSeen.add(vm.results().currentResult().isPresent()));

        vm.document().apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));

        assertEquals(List.of(false), staleSeen, "the last scene's run is not offered as the new scene's");
        drain(work);
        RunResult current = vm.results().currentResult().orElseThrow();
        assertSame(vm.scene(), current.scene(), "the new revision's run");
    }

    /** A view that rebuilds on every change of the scene, reading it through the document as the panels do. */
    @Test
    void everyEditReachesTheScenesListeners() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        List<String> seen = new ArrayList<>();
        vm.document().sceneProperty().addListener(o -> seen.add(vm.scene().name()));
        vm.document().apply("Rename", s -> s.withText("one", ""));
        vm.document().apply("Rename", s -> s.withText("two", ""));
        vm.document().undo();
        assertEquals(List.of("one", "two", "one"), seen);
    }

    @Test
    void theShownInstantAndItsFieldAreTheRunsAndArriveTogether() {
        Queue<Runnable> work = new ArrayDeque<>();
        Scene s = Fixtures.glidingMagnet();
        EditorViewModel vm = vm(s, work::add);
        drain(work);
        double t = s.time().t0S() + 30 * s.time().dtS();
        double x = 0.06;
        double y = 0.01;
        vm.clock().seek(t);
        assertEquals(s.time().t0S(), vm.results().snapshot().tS(), 0, "until t is solved, t0 is shown");
        assertEquals(new SceneRun(s).fieldAt(s.time().t0S()).bz(x, y), vm.results().bzAt(x, y), 0,
                "and the cursor reads t0's field with it");

        drain(work);

        SceneRun reference = new SceneRun(s);
        // What solve --at and the export write for this state is what the editor shows.
        assertEquals(reference.instant(t), vm.results().snapshot());
        assertEquals(reference.result().at(t), vm.results().snapshot(), "the run's own sample of t");
        assertEquals(reference.fieldAt(t).bz(x, y), vm.results().bzAt(x, y), 0);
        assertEquals(InductanceSummary.of(reference.inductanceAtStart()),
                vm.results().inductanceLineProperty().get());
    }

    /**
     * Nothing the UI thread calls waits for the run: with a coupled scene and no worker ever
     * running, every call returns, and the run's monitor is never polled on this thread. Once a
     * worker runs the queued jobs, the run happens there.
     */
    @Test
    void theCallingThreadNeverRunsOrWaitsForTheRun() throws InterruptedException {
        Thread caller = Thread.currentThread();
        AtomicInteger pollsHere = new AtomicInteger();
        AtomicInteger pollsElsewhere = new AtomicInteger();
        Queue<Runnable> work = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Fixtures.springCart(true), (scene, monitor) ->
                EditorViewModel.run(scene, new RunMonitor() {
                    @Override
                    public boolean cancelled() {
                        (Thread.currentThread() == caller ? pollsHere : pollsElsewhere).incrementAndGet();
                        return monitor.cancelled();
                    }
                }), work::add, SAME_THREAD, System::nanoTime);
        vm.view().viewProperty().set(SMALL_VIEW);

        vm.clock().seek(0.2);
        vm.clock().step(1);
        vm.clock().playingProperty().set(true);
        vm.clock().advance(0.1);
        vm.clock().playingProperty().set(false);
        vm.results().bzAt(0.1, 0);
        vm.results().scalesNow();
        vm.zoomToFit();
        vm.seen();
        vm.maps().request(FieldMaps.Quality.FINE);
        vm.document().apply("Rename", s -> s.withText("renamed", ""));
        vm.document().undo();
        assertEquals(0, pollsHere.get(), "the UI thread ran the simulation");
        assertTrue(vm.results().currentResult().isEmpty());

        Thread worker = new Thread(() -> drain(work));
        worker.start();
        worker.join();
        assertEquals(0, pollsHere.get());
        assertTrue(pollsElsewhere.get() > 0, "the worker ran it");
    }
}
