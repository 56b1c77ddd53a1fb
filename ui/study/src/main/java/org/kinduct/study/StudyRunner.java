package org.kinduct.study;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentSkipListMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.kinduct.scene.Checks;
import org.kinduct.solver.PairMemo;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.dynamics.SimulationCancelledException;

/**
 * Runs the points of one shard of a study on a fixed number of threads, one point per thread
 * at a time (each run on its own thread, so two threads use two cores whatever the scene);
 * with more than one thread the first point runs alone, its instants over every core, since it
 * integrates what the points share.
 * Rows come back in point order; which thread ran a point changes no number. A stop request
 * ({@link #stop()}) lets no new point start and ends coupled runs at their next step; the rows
 * finished by then stay available ({@link #finished()}).
 */
public final class StudyRunner {

    /** Told of every finished point, from the thread that ran it. */
    public interface Listener {
        void finished(Row row, int done, int total);
    }

    private final Study study;
    private final List<Integer> points;
    private final int threads;
    private final Listener listener;
    private final ConcurrentSkipListMap<Integer, Row> rows = new ConcurrentSkipListMap<>();
    /** The points' shared integrals of the sources and loops a point's values leave alone. */
    private final PairMemo memo = new PairMemo();
    private volatile boolean stopping;

    public StudyRunner(Study study, Shard shard, int threads, Listener listener) {
        this.study = Checks.nonNull(study, "study");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        this.threads = threads;
        this.listener = Checks.nonNull(listener, "listener");
        points = new ArrayList<>();
        for (int k = 0; k < study.design().size(); k++) {
            if (shard.contains(k)) {
                points.add(k);
            }
        }
    }

    /** The points this runner runs, in order. */
    public List<Integer> points() {
        return List.copyOf(points);
    }

    /**
     * Runs every point, or until {@link #stop()}.
     *
     * @return the rows in point order: all of them unless stopped
     * @throws InterruptedException when the calling thread is interrupted while waiting
     */
    public List<Row> run() throws InterruptedException {
        AtomicReference<RuntimeException> fault = new AtomicReference<>();
        RunMonitor monitor = new RunMonitor() {
            @Override
            public boolean cancelled() {
                return stopping;
            }
        };
        AtomicInteger next = new AtomicInteger();
        if (threads > 1 && !points.isEmpty()) {
            // The first point integrates what all points share; alone and over every core, so
            // that no thread waits behind another for a shared integral (one per instant).
            runPoint(next.getAndIncrement(), true, monitor, fault);
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "study-point");
            t.setDaemon(true);
            return t;
        });
        try {
            for (int t = 0; t < threads; t++) {
                pool.execute(() -> {
                    int i;
                    while (!stopping && (i = next.getAndIncrement()) < points.size()) {
                        if (!runPoint(i, false, monitor, fault)) {
                            return;
                        }
                    }
                });
            }
            pool.shutdown();
            while (!pool.awaitTermination(1, TimeUnit.SECONDS)) {
                // keep waiting: each point ends by itself or at a stop request
            }
        } finally {
            pool.shutdownNow();
        }
        if (fault.get() != null) {
            throw fault.get();
        }
        return finished();
    }

    /**
     * Runs the {@code i}-th point of this shard and records its row.
     *
     * @return false when the run was stopped before the point finished
     */
    private boolean runPoint(int i, boolean parallel, RunMonitor monitor, AtomicReference<RuntimeException> fault) {
        try {
            Row row = PointRun.run(study, points.get(i), monitor, parallel, memo);
            rows.put(row.point(), row);
            listener.finished(row, rows.size(), points.size());
            return true;
        } catch (SimulationCancelledException stopped) {
            return false;
        } catch (RuntimeException e) {
            fault.compareAndSet(null, e);
            stopping = true;
            return true;
        }
    }

    /** Asks the run to stop: no new point starts, coupled runs end at their next step. */
    public void stop() {
        stopping = true;
    }

    /** The rows finished so far, in point order. */
    public List<Row> finished() {
        return List.copyOf(rows.values());
    }

    /** True when every point has a row. */
    public boolean complete() {
        return rows.size() == points.size();
    }
}
