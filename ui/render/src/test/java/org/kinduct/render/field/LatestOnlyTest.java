package org.kinduct.render.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/** The newest-wins queue keeps working after a job fails, and the failure is not swallowed. */
class LatestOnlyTest {

    private static final long WAIT_S = 10;

    @Test
    void aJobThrowingAnErrorDoesNotStopLaterJobs() {
        LatestOnly jobs = new LatestOnly(Runnable::run);
        Error boom = new Error("boom");
        Error thrown = assertThrows(Error.class, () -> jobs.submit(() -> {
            throw boom;
        }));
        assertSame(boom, thrown, "the failure reaches the executor's thread unchanged");
        AtomicInteger ran = new AtomicInteger();
        jobs.submit(ran::incrementAndGet);
        jobs.submit(ran::incrementAndGet);
        assertEquals(2, ran.get());
    }

    @Test
    void onAWorkerThreadTheNextJobRunsAndTheErrorReachesTheThread() throws InterruptedException {
        AtomicReference<Throwable> uncaught = new AtomicReference<>();
        CountDownLatch reported = new CountDownLatch(1);
        ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "latest-only-test");
            t.setUncaughtExceptionHandler((thread, e) -> {
                uncaught.set(e);
                reported.countDown();
            });
            return t;
        });
        try {
            LatestOnly jobs = new LatestOnly(worker);
            CountDownLatch failing = new CountDownLatch(1);
            jobs.submit(() -> {
                failing.countDown();
                throw new OutOfMemoryError("simulated");
            });
            // Newest wins: the failing job must have started before the next one replaces it.
            assertTrue(failing.await(WAIT_S, TimeUnit.SECONDS));
            CountDownLatch later = new CountDownLatch(1);
            jobs.submit(later::countDown);
            assertTrue(later.await(WAIT_S, TimeUnit.SECONDS), "the job after the failing one never ran");
            assertTrue(reported.await(WAIT_S, TimeUnit.SECONDS));
            assertTrue(uncaught.get() instanceof OutOfMemoryError, "the error was swallowed: " + uncaught.get());
        } finally {
            worker.shutdownNow();
        }
    }
}
