package org.kinduct.cli;

import picocli.CommandLine;

/**
 * Entry point of the {@code kinduct} command. Headless subcommands never touch JavaFX; the GUI is
 * reached only through {@link GuiCommand}, which loads the JavaFX classes on demand.
 *
 * <p>Exit codes: 0 success, 1 bad input (the message names what and where: the file, line and
 * field, or the conductor and time where a run could not be completed), 2 internal failure, 130
 * stopped by Ctrl-C (nothing written).
 */
public final class KinductMain {

    public static final int OK = 0;
    public static final int BAD_INPUT = 1;
    public static final int INTERNAL = 2;
    /** As a shell reports a command ended by Ctrl-C (SIGINT): 128 + 2. */
    public static final int INTERRUPTED = 130;

    private KinductMain() {
    }

    public static void main(String[] args) {
        int code = run(args);
        if (Interruption.requested()) {
            return; // the runtime is already shutting down after Ctrl-C, with status 130
        }
        if (code != OK || !GuiCommand.guiStarted()) {
            System.exit(code);
        }
    }

    /** Runs the command line without exiting the JVM (tests call this). */
    public static int run(String... args) {
        CommandLine cl = new CommandLine(new RootCommand());
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            if (ex instanceof BadInputException) {
                cmd.getErr().println("kinduct: " + ex.getMessage());
                return BAD_INPUT;
            }
            if (Interruption.requested()) {
                cmd.getErr().println("kinduct: stopped by Ctrl-C before the run finished; nothing was written");
                return INTERRUPTED;
            }
            cmd.getErr().println("kinduct: internal error: " + ex);
            ex.printStackTrace(cmd.getErr());
            return INTERNAL;
        });
        cl.setParameterExceptionHandler((ex, a) -> {
            ex.getCommandLine().getErr().println("kinduct: " + ex.getMessage());
            ex.getCommandLine().usage(ex.getCommandLine().getErr());
            return BAD_INPUT;
        });
        return cl.execute(args);
    }
}
