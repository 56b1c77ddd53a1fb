package org.kinduct.ui.app;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;

/** Work handed between the UI thread and the editor's other threads as futures. */
final class Futures {

    private Futures() {
    }

    /**
     * {@code f}, watched: a failure that nothing in the chain handled (a fault in the code, not a
     * file that could not be read) goes to the uncaught-exception handler of the thread that
     * completes it, which the editor has autosave and report, instead of vanishing in the future.
     */
    static <T> CompletableFuture<T> watched(CompletableFuture<T> f) {
        watch(f);
        return f;
    }

    /** Watches {@code f} as {@link #watched} does, for work whose outcome nothing else waits for. */
    // The watching stage exists for its side effect alone; nothing needs its future.
    @SuppressWarnings("FutureReturnValueIgnored")
    static void watch(CompletableFuture<?> f) {
        f.whenComplete((x, failure) -> {
            if (failure != null) {
                Thread t = Thread.currentThread();
                t.getUncaughtExceptionHandler().uncaughtException(t, cause(failure));
            }
        });
    }

    /** The failure a future's chain wrapped. */
    static Throwable cause(Throwable failure) {
        return failure instanceof CompletionException && failure.getCause() != null ? failure.getCause() : failure;
    }
}
