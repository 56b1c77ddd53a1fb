package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * Playback pace: while playing, the view shows the run's samples instead of solving every frame,
 * and asks for field maps at a wall-clock pace, so painting keeps the cores. A sample shown is
 * the very object of the run's result; an exact solve makes a new snapshot at the exact time.
 */
class PlaybackPacingTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final TimeSpan WINDOW = new TimeSpan(0, 1, 0.01);
    private static final ViewTransform SMALL_VIEW = new ViewTransform(0.05, 0, 1000, 80, 60);

    private static Scene scene() {
        return Fixtures.glidingMagnet().withTime(WINDOW);
    }

    private static EditorViewModel vm(Scene s, Executor work, java.util.function.LongSupplier clockNs) {
        EditorViewModel vm = new EditorViewModel(s, EditorViewModel::run, work, SAME_THREAD, clockNs);
        vm.view().viewProperty().set(SMALL_VIEW);
        return vm;
    }

    private static EditorViewModel vm(Scene s) {
        return vm(s, SAME_THREAD, System::nanoTime);
    }

    private static double sampleStep(RunResult run) {
        return run.samples().get(1).tS() - run.samples().get(0).tS();
    }

    @Test
    void playingShowsTheNearestSampleWithoutSolving() {
        EditorViewModel vm = vm(scene());
        RunResult run = vm.results().currentResult().orElseThrow();
        vm.clock().playingProperty().set(true);
        for (int i = 0; i < 20; i++) {
            vm.clock().advance(0.0137);
            double t = vm.clock().time();
            Snapshot shown = vm.results().snapshot();
            assertSame(run.nearest(t), shown, "t " + t + ": the run's own sample, not a solve");
            assertTrue(Math.abs(shown.tS() - t) <= sampleStep(run) / 2 + 1e-12, "t " + t + " shown " + shown.tS());
        }
    }

    @Test
    void slowMotionBetweenSamplesIsSolvedExactly() {
        EditorViewModel vm = vm(scene());
        double sampleStep = sampleStep(vm.results().currentResult().orElseThrow());
        vm.clock().speedProperty().set(0.01);
        vm.clock().playingProperty().set(true);
        for (int i = 0; i < 5; i++) {
            vm.clock().advance(0.0167);
            assertTrue(0.0167 * 0.01 < sampleStep * PlaybackClock.SLOW_MOTION_FRACTION, "frames fall between samples");
            assertEquals(vm.clock().time(), vm.results().snapshot().tS(), 0, "moves smoothly, not in steps");
        }
    }

    /**
     * A coupled run has no state between its samples but what it sampled: its nearest sample at
     * any pace, shown at once (the workers are not even asked).
     */
    @Test
    void slowMotionOfACoupledRunShowsItsSamplesAtOnce() {
        Queue<Runnable> jobs = new ArrayDeque<>();
        EditorViewModel vm = vm(Fixtures.springCart(false), jobs::add, System::nanoTime);
        drain(jobs);
        RunResult run = vm.results().currentResult().orElseThrow();
        // Just before the middle between two samples (2 ms apart): the first frames cross it.
        vm.clock().seek(0.0489);
        drain(jobs);
        Snapshot before = vm.results().snapshot();
        vm.clock().speedProperty().set(0.01);
        vm.clock().playingProperty().set(true);
        for (int i = 0; i < 5; i++) {
            vm.clock().advance(0.0167);
            assertSame(run.nearest(vm.clock().time()), vm.results().snapshot(), "frame " + i);
        }
        assertNotSame(before, vm.results().snapshot(), "playback reached the next sample");
    }

    @Test
    void pausingSolvesAtTheExactTime() {
        EditorViewModel vm = vm(scene());
        vm.clock().playingProperty().set(true);
        vm.clock().advance(0.0137);
        Snapshot sample = vm.results().snapshot();
        vm.clock().playingProperty().set(false);
        assertNotSame(sample, vm.results().snapshot());
        assertEquals(vm.clock().time(), vm.results().snapshot().tS(), 0);
    }

    @Test
    void theRunOfAnEarlierSceneIsNotPlayed() {
        Queue<Runnable> jobs = new ArrayDeque<>();
        EditorViewModel vm = vm(scene(), jobs::add, System::nanoTime);
        drain(jobs);
        vm.document().apply("Rename", s -> s.withText("edited", ""));
        vm.clock().playingProperty().set(true);
        vm.clock().advance(0.0137);
        // The edited scene's run is still queued: the frame must be solved, not taken from the old run.
        drain(jobs);
        assertEquals(vm.clock().time(), vm.results().snapshot().tS(), 0);
    }

    @Test
    void playbackAsksForMapsAtAWallClockPace() {
        EditorViewModel vm = vm(scene());
        AtomicInteger maps = new AtomicInteger();
        vm.maps().rasterProperty().addListener((o, a, b) -> maps.incrementAndGet());
        vm.clock().playingProperty().set(true);
        double frame = 0.02;
        int frames = 10;
        for (int i = 0; i < frames; i++) {
            vm.clock().advance(frame);
        }
        // One map on the first frame, then one each time PLAYBACK_MAP_INTERVAL_S of frames has passed.
        int expected = 1 + (int) Math.floor((frames - 1) / Math.ceil(FieldMaps.PLAYBACK_MAP_INTERVAL_S / frame));
        assertEquals(expected, maps.get());
    }

    @Test
    void playbackMapsAreAskedAheadByTheMeasuredDelay() {
        long[] nowNs = {0};
        EditorViewModel vm = vm(scene(), SAME_THREAD, () -> nowNs[0]);
        List<double[]> asked = new ArrayList<>();
        List<FieldRaster> maps = new ArrayList<>();
        vm.maps().rasterProperty().addListener((o, a, r) -> {
            maps.add(r);
            asked.add(new double[] {vm.clock().time(), r.tS()});
        });
        double speed = 0.5;
        vm.clock().speedProperty().set(speed);
        vm.clock().playingProperty().set(true);
        vm.clock().advance(0.01);
        double guess = vm.maps().mapLatencyS();
        double[] first = asked.get(asked.size() - 1);
        assertEquals(first[0] + (guess + FieldMaps.PLAYBACK_MAP_INTERVAL_S / 2) * speed, first[1], 1e-12);

        double took = 3 * guess;
        nowNs[0] += (long) (took * 1e9);
        vm.maps().mapShown(maps.get(maps.size() - 1));
        double learnt = vm.maps().mapLatencyS();
        assertTrue(learnt > guess && learnt <= took, "moves toward the measured delay: " + learnt);

        int before = asked.size();
        for (int i = 0; i < 10 && asked.size() == before; i++) {
            vm.clock().advance(0.01);
        }
        double[] next = asked.get(asked.size() - 1);
        assertEquals(next[0] + (learnt + FieldMaps.PLAYBACK_MAP_INTERVAL_S / 2) * speed, next[1], 1e-12);
    }

    private static void drain(Queue<Runnable> jobs) {
        for (Runnable r; (r = jobs.poll()) != null; ) {
            r.run();
        }
    }
}
