package org.kinduct.cli;

/**
 * Ctrl-C during a run: the Java runtime starts shutting down (exit status 130) and runs this
 * hook, which asks the run to stop and waits for the command to finish cleanly — the run throws
 * instead of returning part of a result, so no output file is written (and an atomic write in
 * progress leaves no partial file). Installed for the length of one run.
 */
final class Interruption implements AutoCloseable {

    /** How long the hook waits for the command to stop, milliseconds. */
    static final long WAIT_MS = 5_000;

    private static volatile boolean requested;

    private final Thread hook;

    private Interruption(Thread hook) {
        this.hook = hook;
    }

    /** Watches for Ctrl-C while the current thread runs a command with {@code monitor}. */
    static Interruption watch(CliMonitor monitor) {
        Thread command = Thread.currentThread();
        Thread hook = new Thread(() -> {
            requested = true;
            monitor.stop();
            try {
                command.join(WAIT_MS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "kinduct-interrupt");
        Runtime.getRuntime().addShutdownHook(hook);
        return new Interruption(hook);
    }

    /** True once Ctrl-C was pressed during a run: the runtime is shutting down. */
    static boolean requested() {
        return requested;
    }

    @Override
    public void close() {
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
            // The hook is running or has run; the runtime ends the process.
        }
    }
}
