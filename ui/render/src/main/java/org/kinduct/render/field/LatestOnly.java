package org.kinduct.render.field;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Runs jobs on an executor one at a time, keeping only the newest job that is waiting: when
 * requests come faster than they finish (playback, dragging), intermediate ones are skipped.
 * A job that throws (an {@link Error} included) ends its own run only: the failure goes on to
 * the executor's thread as usual, and the queue takes the next job.
 */
public final class LatestOnly {

    private final Executor work;
    private final AtomicReference<Runnable> waiting = new AtomicReference<>();
    private final Object lock = new Object();
    private boolean running;

    public LatestOnly(Executor work) {
        this.work = Objects.requireNonNull(work);
    }

    /** Queues {@code job}, replacing any job not yet started. */
    public void submit(Runnable job) {
        waiting.set(Objects.requireNonNull(job));
        start();
    }

    /** Starts draining unless a drain is under way. */
    private void start() {
        synchronized (lock) {
            if (running) {
                return;
            }
            running = true;
        }
        work.execute(this::drain);
    }

    private void drain() {
        while (true) {
            Runnable job = waiting.getAndSet(null);
            if (job == null) {
                synchronized (lock) {
                    if (waiting.get() == null) {
                        running = false;
                        return;
                    }
                }
                continue;
            }
            boolean finished = false;
            try {
                job.run();
                finished = true;
            } finally {
                if (!finished) {
                    handOver();
                }
            }
        }
    }

    /** After a job threw: this drain ends, and a new one starts if a job is waiting. */
    private void handOver() {
        synchronized (lock) {
            running = false;
        }
        if (waiting.get() != null) {
            start();
        }
    }
}
