package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.Snapshot;
import org.kinduct.render.field.SceneEvaluator;
import org.kinduct.render.paint.FieldRaster;

/**
 * Playback pace: while playing, the view shows the precomputed time series instead of solving
 * every frame, and asks for field maps at a wall-clock pace, so painting keeps the cores.
 */
class PlaybackPacingTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final TimeSpan WINDOW = new TimeSpan(0, 1, 0.01);

    /** Counts exact solves; its series samples every {@code dtS} from t0. */
    private static final class CountingEvaluator implements SceneEvaluator {
        final AtomicInteger solves = new AtomicInteger();

        @Override
        public Snapshot at(double tS) {
            solves.incrementAndGet();
            return new Snapshot(tS, List.of());
        }

        @Override
        public List<Snapshot> series(double t0S, double t1S, double dtS) {
            List<Snapshot> out = new ArrayList<>();
            for (int i = 0; t0S + i * dtS <= t1S + dtS * 1e-9; i++) {
                out.add(new Snapshot(t0S + i * dtS, List.of()));
            }
            return out;
        }

        @Override
        public BzField fieldAt(double tS) {
            return (x, y) -> 0;
        }

        @Override
        public BzField fieldOf(double tS, java.util.Set<String> sourceIds) {
            return (x, y) -> 0;
        }
    }

    private static Scene scene() {
        return Fixtures.loopAndMagnet().withTime(WINDOW);
    }

    @Test
    void playingShowsTheNearestSeriesSampleWithoutSolving() {
        CountingEvaluator ev = new CountingEvaluator();
        EditorViewModel vm = new EditorViewModel(scene(), s -> ev, SAME_THREAD, SAME_THREAD);
        double step = vm.seriesProperty().get().get(1).tS() - vm.seriesProperty().get().get(0).tS();
        int before = ev.solves.get();
        vm.playingProperty().set(true);
        for (int i = 0; i < 20; i++) {
            vm.advance(0.0137);
            double t = vm.timeProperty().get();
            double shown = vm.snapshotProperty().get().tS();
            assertTrue(Math.abs(shown - t) <= step / 2 + 1e-12, "t " + t + " shown " + shown);
        }
        assertEquals(before, ev.solves.get(), "no exact solve while the series can be played");
    }

    @Test
    void slowMotionBetweenSeriesSamplesIsSolvedExactly() {
        CountingEvaluator ev = new CountingEvaluator();
        EditorViewModel vm = new EditorViewModel(scene(), s -> ev, SAME_THREAD, SAME_THREAD);
        double sampleStep = vm.seriesProperty().get().get(1).tS() - vm.seriesProperty().get().get(0).tS();
        vm.speedProperty().set(0.01);
        vm.playingProperty().set(true);
        for (int i = 0; i < 5; i++) {
            vm.advance(0.0167);
            assertTrue(0.0167 * 0.01 < sampleStep * EditorViewModel.SLOW_MOTION_FRACTION, "frames fall between samples");
            assertEquals(vm.timeProperty().get(), vm.snapshotProperty().get().tS(), 0, "moves smoothly, not in steps");
        }
    }

    @Test
    void pausingSolvesAtTheExactTime() {
        CountingEvaluator ev = new CountingEvaluator();
        EditorViewModel vm = new EditorViewModel(scene(), s -> ev, SAME_THREAD, SAME_THREAD);
        vm.playingProperty().set(true);
        vm.advance(0.0137);
        vm.playingProperty().set(false);
        assertEquals(vm.timeProperty().get(), vm.snapshotProperty().get().tS(), 0);
    }

    @Test
    void aSeriesOfAnEarlierSceneIsNotPlayed() {
        Queue<Runnable> jobs = new ArrayDeque<>();
        CountingEvaluator ev = new CountingEvaluator();
        EditorViewModel vm = new EditorViewModel(scene(), s -> ev, jobs::add, SAME_THREAD);
        drain(jobs);
        vm.apply("Rename", s -> s.withText("edited", ""));
        vm.playingProperty().set(true);
        vm.advance(0.0137);
        // The edited scene's series is still queued: the frame must be solved, not taken from the old series.
        drain(jobs);
        assertEquals(vm.timeProperty().get(), vm.snapshotProperty().get().tS(), 0);
    }

    @Test
    void playbackAsksForMapsAtAWallClockPace() {
        EditorViewModel vm = new EditorViewModel(scene(), s -> new CountingEvaluator(), SAME_THREAD, SAME_THREAD);
        AtomicInteger maps = new AtomicInteger();
        vm.rasterProperty().addListener((o, a, b) -> maps.incrementAndGet());
        vm.playingProperty().set(true);
        double frame = 0.02;
        int frames = 10;
        for (int i = 0; i < frames; i++) {
            vm.advance(frame);
        }
        // One map on the first frame, then one each time PLAYBACK_MAP_INTERVAL_S of frames has passed.
        int expected = 1 + (int) Math.floor((frames - 1) / Math.ceil(EditorViewModel.PLAYBACK_MAP_INTERVAL_S / frame));
        assertEquals(expected, maps.get());
    }

    @Test
    void playbackMapsAreAskedAheadByTheMeasuredDelay() {
        long[] nowNs = {0};
        List<double[]> asked = new ArrayList<>();
        EditorViewModel vm = new EditorViewModel(scene(), s -> new CountingEvaluator(), SAME_THREAD, SAME_THREAD,
                () -> nowNs[0]);
        List<FieldRaster> maps = new ArrayList<>();
        vm.rasterProperty().addListener((o, a, r) -> {
            maps.add(r);
            asked.add(new double[] {vm.timeProperty().get(), r.tS()});
        });
        double speed = 0.5;
        vm.speedProperty().set(speed);
        vm.playingProperty().set(true);
        vm.advance(0.01);
        double guess = vm.mapLatencyS();
        double[] first = asked.get(asked.size() - 1);
        assertEquals(first[0] + (guess + EditorViewModel.PLAYBACK_MAP_INTERVAL_S / 2) * speed, first[1], 1e-12);

        double took = 3 * guess;
        nowNs[0] += (long) (took * 1e9);
        vm.mapShown(maps.get(maps.size() - 1));
        double learnt = vm.mapLatencyS();
        assertTrue(learnt > guess && learnt <= took, "moves toward the measured delay: " + learnt);

        int before = asked.size();
        for (int i = 0; i < 10 && asked.size() == before; i++) {
            vm.advance(0.01);
        }
        double[] next = asked.get(asked.size() - 1);
        assertEquals(next[0] + (learnt + EditorViewModel.PLAYBACK_MAP_INTERVAL_S / 2) * speed, next[1], 1e-12);
    }

    private static void drain(Queue<Runnable> jobs) {
        for (Runnable r; (r = jobs.poll()) != null; ) {
            r.run();
        }
    }
}
