package org.kinduct.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

@Command(name = "kinduct", mixinStandardHelpOptions = true, versionProvider = VersionText.class,
        description = {"Induced EMF, current and braking for conductors moving in magnetic fields.",
                "Without a subcommand, opens the editor on FILE or on the first demo scene."},
        subcommands = {SolveCommand.class, ExportCommand.class, SweepCommand.class, OptimiseCommand.class,
                MergeCommand.class, DemoCommand.class, GuiCommand.class})
final class RootCommand implements Callable<Integer> {

    @Parameters(arity = "0..1", paramLabel = "FILE", description = "Scene file to open in the editor.")
    Path file;

    @Override
    public Integer call() {
        return GuiCommand.open(file, null);
    }
}
