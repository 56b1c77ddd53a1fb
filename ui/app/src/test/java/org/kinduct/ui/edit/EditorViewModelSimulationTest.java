package org.kinduct.ui.edit;

import static java.util.concurrent.TimeUnit.NANOSECONDS;
import static java.util.concurrent.TimeUnit.SECONDS;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Queue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import java.util.function.Function;
import java.util.function.LongSupplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.render.field.Evaluators;
import org.kinduct.render.field.SceneEvaluator;

/** The editor's simulation of free bodies: an outdated run stops at once, its progress reaches the status line. */
class EditorViewModelSimulationTest {

    private static final long WAIT_S = 60;
    /** The edit comes when the first run has done this fraction of its time window. */
    private static final double EDIT_AT = 0.1;
    /**
     * Polls of the outdated run's monitor after the edit: the run's next one, which stops it, and
     * one by the other job that was waiting for the same run, before it would start it again.
     */
    private static final int POLLS_AFTER_EDIT_MAX = 2;
    private static final Pattern PROGRESS = Pattern.compile("Simulating the free bodies… (\\d+) %");

    /** Watches the runs of one scene's evaluator between the editor and the simulation; holds the run at {@code holdAt} until the edit. */
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

    /** The editor's evaluators, with the monitor the editor attaches to {@code watched}'s scene wrapped by it. */
    private static Function<Scene, SceneEvaluator> watching(Watched watched) {
        Function<Scene, SceneEvaluator> solver = Evaluators.solver();
        return scene -> {
            SceneEvaluator ev = solver.apply(scene);
            return scene.equals(watched.scene) ? new SceneEvaluator() {
                @Override
                public Snapshot at(double tS) {
                    return ev.at(tS);
                }

                @Override
                public List<Snapshot> series(double t0S, double t1S, double dtS) {
                    return ev.series(t0S, t1S, dtS);
                }

                @Override
                public BzField fieldAt(double tS) {
                    return ev.fieldAt(tS);
                }

                @Override
                public BzField fieldOf(double tS, java.util.Set<String> sourceIds) {
                    return ev.fieldOf(tS, sourceIds);
                }

                @Override
                public Map<String, Pose> posesAt(double tS) {
                    return ev.posesAt(tS);
                }

                @Override
                public Optional<EnergyAudit> audit() {
                    return ev.audit();
                }

                @Override
                public void monitor(RunMonitor monitor) {
                    ev.monitor(watched.around(monitor));
                }
            } : ev;
        };
    }

    @Test
    void anEditDuringASimulationStopsTheOutdatedRunAndTheNewRevisionsResultArrives() throws InterruptedException {
        Scene slow = Fixtures.springCart(true);
        Watched watched = new Watched(slow, EDIT_AT);
        BlockingQueue<Runnable> uiQueue = new LinkedBlockingQueue<>();
        ExecutorService work = Executors.newFixedThreadPool(2);
        try {
            EditorViewModel vm = new EditorViewModel(slow, watching(watched), work, uiQueue::add);
            List<String> statuses = new ArrayList<>();
            vm.statusProperty().addListener((obs, old, now) -> statuses.add(now));
            assertTrue(watched.reached.await(WAIT_S, SECONDS), "the first run did not reach " + EDIT_AT);

            vm.apply("Delete the loop", s -> s.withConductors(List.of()));
            watched.edited.countDown();
            drainUntil(uiQueue, () -> !vm.simulatingProperty().get());

            assertTrue(watched.pollsAfterEdit.get() >= 1, "the outdated run was not asked again");
            assertTrue(watched.pollsAfterEdit.get() <= POLLS_AFTER_EDIT_MAX, "polls after the edit: "
                    + watched.pollsAfterEdit.get());
            assertEquals(0, watched.reportsAfterEdit.get(), "the outdated run went on");
            assertTrue(watched.furthest < 1, "the outdated run finished");
            List<Snapshot> series = vm.seriesProperty().get();
            assertFalse(series.isEmpty(), "no result for the new revision");
            assertTrue(series.get(0).conductor("loop").isEmpty(), "the result is the new revision's, without the loop");
            assertTrue(vm.statusProperty().get().startsWith("Free bodies simulated"), vm.statusProperty().get());
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
        EditorViewModel vm = new EditorViewModel(Fixtures.springCart(false), Evaluators.solver(), Runnable::run,
                uiQueue::add, clock);
        // The run is done (same-thread work), but its reports wait on the UI executor.
        assertEquals("Simulating the free bodies…", vm.statusProperty().get());
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
        assertTrue(vm.statusProperty().get().startsWith("Free bodies simulated"), vm.statusProperty().get());
        assertEquals(percents.get(percents.size() - 1) / 100.0, vm.simulationProgressProperty().get());
    }

    @Test
    void aRunShorterThanOneReportIntervalShowsNoPercentage() {
        AtomicLong readings = new AtomicLong();
        LongSupplier clock = () -> readings.incrementAndGet() * 1000;
        List<String> statuses = new ArrayList<>();
        Queue<Runnable> uiQueue = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Fixtures.springCart(false), Evaluators.solver(), Runnable::run,
                uiQueue::add, clock);
        vm.statusProperty().addListener((obs, old, now) -> statuses.add(now));

        while (!uiQueue.isEmpty()) {
            uiQueue.remove().run();
        }

        assertTrue(readings.get() * 1000 < RunWatch.INTERVAL_NS, "the run took " + readings.get() + " readings");
        assertTrue(percents(statuses).isEmpty(), statuses.toString());
        assertEquals(-1, vm.simulationProgressProperty().get());
        assertTrue(vm.statusProperty().get().startsWith("Free bodies simulated"), vm.statusProperty().get());
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
