package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.Snapshot;
import org.kinduct.render.field.SceneEvaluator;

class EditorViewModelTest {

    private static final double TIME_TOL = 1e-12;
    private static final Executor SAME_THREAD = Runnable::run;

    /** Field-free evaluator: these tests are about editing state, not numbers. */
    private static SceneEvaluator quiet(Scene s) {
        return new SceneEvaluator() {
            @Override
            public Snapshot at(double tS) {
                return new Snapshot(tS, List.of());
            }

            @Override
            public List<Snapshot> series(double t0S, double t1S, double dtS) {
                return List.of(at(t0S), at(t1S));
            }

            @Override
            public BzField fieldAt(double tS) {
                return (x, y) -> 0;
            }

            @Override
            public BzField fieldOf(double tS, java.util.Set<String> sourceIds) {
                return (x, y) -> 0;
            }
        };
    }

    private static EditorViewModel vm(Scene s, Executor work) {
        return new EditorViewModel(s, EditorViewModelTest::quiet, work, SAME_THREAD);
    }

    @Test
    void rejectedEditKeepsTheSceneAndSaysWhy() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        Scene before = vm.scene();
        boolean applied = vm.apply("Add coil", s -> SceneEdits.addSource(s,
                new Source.UniformField("loop", 0.1)));
        assertFalse(applied);
        assertSame(before, vm.scene());
        assertTrue(vm.statusProperty().get().contains("used twice"), vm.statusProperty().get());
        assertFalse(vm.canUndoProperty().get());
    }

    @Test
    void editsCanBeUndoneAndRedoneAndMarkTheSceneDirty() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        Scene before = vm.scene();
        vm.apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        assertTrue(vm.dirtyProperty().get());
        assertTrue(vm.scene().sources().isEmpty());
        vm.undo();
        assertEquals(before, vm.scene());
        assertFalse(vm.dirtyProperty().get());
        assertTrue(vm.canRedoProperty().get());
        vm.redo();
        assertTrue(vm.scene().sources().isEmpty());
    }

    @Test
    void deletingASelectedObjectDropsItFromTheSelection() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.select(Set.of("loop", "magnet"));
        vm.apply("Delete", s -> SceneEdits.delete(s, Set.of("loop")));
        assertEquals(Set.of("magnet"), vm.selection());
    }

    @Test
    void playbackWrapsAtTheEndOfTheTimeWindow() {
        Scene s = Fixtures.loopAndMagnet().withTime(new TimeSpan(0, 1, 0.01));
        EditorViewModel vm = vm(s, SAME_THREAD);
        vm.speedProperty().set(2);
        vm.advance(0.3);
        assertEquals(0.6, vm.timeProperty().get(), TIME_TOL);
        vm.advance(0.3);
        assertEquals(0.2, vm.timeProperty().get(), TIME_TOL);
        vm.step(3);
        assertEquals(0.23, vm.timeProperty().get(), TIME_TOL);
        vm.resetTime();
        assertEquals(0, vm.timeProperty().get(), TIME_TOL);
    }

    @Test
    void mapsComputedForAnEarlierSceneAreDropped() {
        List<Runnable> queue = new ArrayList<>();
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), queue::add);
        vm.apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        // The first queued map was asked for the scene before the edit; run every queued job.
        while (!queue.isEmpty()) {
            queue.remove(0).run();
        }
        assertNotNull(vm.rasterProperty().get());
        assertEquals(vm.revisionProperty().get(), vm.rasterProperty().get().revision());
        org.kinduct.render.paint.FieldRaster stale = new org.kinduct.render.paint.FieldRaster(0, 0, 1, 1, 1, new float[1], 0,
                vm.revisionProperty().get() - 1, 0);
        vm.acceptRaster(stale);
        assertEquals(vm.revisionProperty().get(), vm.rasterProperty().get().revision(), "the stale map is ignored");
    }

    @Test
    void loadingAFileClearsHistoryAndSelection() {
        EditorViewModel vm = vm(Fixtures.loopAndMagnet(), SAME_THREAD);
        vm.select(Set.of("loop"));
        vm.apply("Delete", s -> SceneEdits.delete(s, Set.of("magnet")));
        vm.load(Scene.empty("other"), null);
        assertFalse(vm.canUndoProperty().get());
        assertTrue(vm.selection().isEmpty());
        assertFalse(vm.dirtyProperty().get());
    }
}
