package org.kinduct.ui.edit;

import static java.util.concurrent.TimeUnit.NANOSECONDS;
import static java.util.concurrent.TimeUnit.SECONDS;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import java.util.function.BiFunction;
import java.util.function.LongSupplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/** The editor's simulation of free bodies: an outdated run stops at once, its progress reaches the status line. */
class EditorViewModelSimulationTest {

    private static final long WAIT_S = 60;
    /** The edit comes when the first run has done this fraction of its time window. */
    private static final double EDIT_AT = 0.1;
    /**
     * Polls of the outdated run's monitor after the edit: the run's next one, which stops it, and
     * one by the job that was waiting for the same run's instant, which starts it again and is
     * stopped at its first poll. (The map request waiting behind them is replaced by the new
     * revision's before it starts.)
     */
    private static final int POLLS_AFTER_EDIT_MAX = 2;
    private static final Pattern PROGRESS = Pattern.compile("Running the coupled simulation… (\\d+) %");
    private static final String DONE = "Coupled run done";

    /** Watches the runs of one scene between the editor and the simulation; holds the run at {@code holdAt} until the edit. */
    private static final class Watched {
        final Scene scene;
        final double holdAt;
        final CountDownLatch reached = new CountDownLatch(1);
        final CountDownLatch edited = new CountDownLatch(1);
        final AtomicInteger pollsAfterEdit = new AtomicInteger();
        final AtomicInteger reportsAfterEdit = new AtomicInteger();
        volatile double furthest;

        Watched(Scene scene, double holdAt) {
            this.scene = scene;
            this.holdAt = holdAt;
        }

        RunMonitor around(RunMonitor editors) {
            return new RunMonitor() {
                @Override
                public void progress(double fractionDone) {
                    reportsAfterEdit.addAndGet(edited.getCount() == 0 ? 1 : 0);
                    furthest = Math.max(furthest, fractionDone);
                    if (fractionDone >= holdAt && reached.getCount() > 0) {
                        reached.countDown();
                        awaitEdit();
                    }
                    editors.progress(fractionDone);
                }

                @Override
                public boolean cancelled() {
                    pollsAfterEdit.addAndGet(edited.getCount() == 0 ? 1 : 0);
                    return editors.cancelled();
                }
            };
        }

        private void awaitEdit() {
            try {
                assertTrue(edited.await(WAIT_S, SECONDS), "no edit came");
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException(e);
            }
        }
    }

    /** The editor's runs, with the monitor the editor attaches to {@code watched}'s scene wrapped by it. */
    private static BiFunction<Scene, RunMonitor, SceneRun> watching(Watched watched) {
        return (scene, monitor) -> EditorViewModel.run(scene, scene.equals(watched.scene) ? watched.around(monitor)
                : monitor);
    }

    @Test
    void anEditDuringASimulationStopsTheOutdatedRunAndTheNewRevisionsResultArrives() throws InterruptedException {
        Scene slow = Fixtures.springCart(true);
        Watched watched = new Watched(slow, EDIT_AT);
        BlockingQueue<Runnable> uiQueue = new LinkedBlockingQueue<>();
        ExecutorService work = Executors.newFixedThreadPool(2);
        try {
            EditorViewModel vm = new EditorViewModel(slow, watching(watched), work, uiQueue::add, System::nanoTime);
            List<String> statuses = new ArrayList<>();
            vm.statusProperty().addListener((obs, old, now) -> statuses.add(now));
            assertTrue(watched.reached.await(WAIT_S, SECONDS), "the first run did not reach " + EDIT_AT);

            vm.document().apply("Delete the loop", s -> s.withConductors(List.of()));
            watched.edited.countDown();
            drainUntil(uiQueue, () -> vm.results().currentResult().isPresent());

            assertTrue(watched.pollsAfterEdit.get() >= 1, "the outdated run was not asked again");
            assertTrue(watched.pollsAfterEdit.get() <= POLLS_AFTER_EDIT_MAX, "polls after the edit: "
                    + watched.pollsAfterEdit.get());
            assertEquals(0, watched.reportsAfterEdit.get(), "the outdated run went on");
            assertTrue(watched.furthest < 1, "the outdated run finished");
            RunResult result = vm.results().currentResult().orElseThrow();
            assertSame(vm.scene(), result.scene(), "the result is the new revision's");
            assertTrue(result.samples().get(0).conductor("loop").isEmpty(), "without the loop");
            assertFalse(vm.results().simulatingProperty().get());
            assertTrue(vm.statusProperty().get().startsWith(DONE), vm.statusProperty().get());
            assertTrue(statuses.stream().noneMatch(s -> s.contains("cancel")), statuses.toString());
        } finally {
            work.shutdownNow();
        }
    }

    @Test
    void theStatusLineShowsTheSimulationsRisingProgressAtMostFourTimesPerClockSecond() {
        AtomicLong readings = new AtomicLong();
        long tickNs = 20_000_000L;
        LongSupplier clock = () -> readings.incrementAndGet() * tickNs;
        Queue<Runnable> uiQueue = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Fixtures.springCart(false), EditorViewModel::run, Runnable::run,
                uiQueue::add, clock);
        // The run is done (same-thread work), but its reports wait on the UI executor.
        assertTrue(vm.results().currentResult().isEmpty());
        List<String> statuses = new ArrayList<>();
        vm.statusProperty().addListener((obs, old, now) -> statuses.add(now));

        while (!uiQueue.isEmpty()) {
            uiQueue.remove().run();
        }

        List<Integer> percents = percents(statuses);
        assertTrue(percents.size() >= 5, statuses.toString());
        for (int i = 0; i < percents.size(); i++) {
            assertTrue(percents.get(i) >= 0 && percents.get(i) <= 100, statuses.toString());
            assertTrue(i == 0 || percents.get(i) > percents.get(i - 1), statuses.toString());
        }
        // One report per RunWatch.INTERVAL_NS of the clock at most, none in the first interval.
        assertTrue(percents.size() <= readings.get() * tickNs / RunWatch.INTERVAL_NS,
                percents.size() + " reports in " + readings.get() * tickNs * 1e-9 + " s");
        assertTrue(vm.statusProperty().get().startsWith(DONE), vm.statusProperty().get());
        assertEquals(percents.get(percents.size() - 1) / 100.0, vm.results().simulationProgressProperty().get());
    }

    @Test
    void aRunShorterThanOneReportIntervalShowsNoPercentage() {
        AtomicLong readings = new AtomicLong();
        LongSupplier clock = () -> readings.incrementAndGet() * 1000;
        List<String> statuses = new ArrayList<>();
        Queue<Runnable> uiQueue = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Fixtures.springCart(false), EditorViewModel::run, Runnable::run,
                uiQueue::add, clock);
        vm.statusProperty().addListener((obs, old, now) -> statuses.add(now));

        while (!uiQueue.isEmpty()) {
            uiQueue.remove().run();
        }

        assertTrue(readings.get() * 1000 < RunWatch.INTERVAL_NS, "the run took " + readings.get() + " readings");
        assertTrue(percents(statuses).isEmpty(), statuses.toString());
        assertEquals(-1, vm.results().simulationProgressProperty().get());
        assertTrue(vm.statusProperty().get().startsWith(DONE), vm.statusProperty().get());
    }

    private static List<Integer> percents(List<String> statuses) {
        List<Integer> out = new ArrayList<>();
        for (String s : statuses) {
            Matcher m = PROGRESS.matcher(s);
            if (m.matches()) {
                out.add(Integer.parseInt(m.group(1)));
            }
        }
        return out;
    }

    /** Runs what arrives on the UI queue, as the UI thread would, until {@code done}. */
    private static void drainUntil(BlockingQueue<Runnable> queue, BooleanSupplier done) throws InterruptedException {
        long deadline = System.nanoTime() + SECONDS.toNanos(WAIT_S);
        while (!done.getAsBoolean()) {
            Runnable job = queue.poll(deadline - System.nanoTime(), NANOSECONDS);
            assertNotNull(job, "nothing arrived on the UI queue within " + WAIT_S + " s");
            job.run();
        }
    }
}
