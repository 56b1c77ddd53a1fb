package org.kinduct.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.kinduct.report.ResultsCsv;
import org.kinduct.report.ResultsJson;
import org.kinduct.report.ResultsTable;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.run.RunFailedException;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code kinduct solve}: flux, both EMF methods, current, inductance and force per conductor over
 * time, from the one run of the scene ({@link SceneRun}, which decides between quasi-static
 * instants and a coupled run exactly as the editor and the export do). {@code --at} reports one
 * instant: solved on its own, or sampled exactly from the coupled run from t0.
 */
@Command(name = "solve", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Solve a scene over a time window and print results per conductor.",
                "Times accept units, e.g. --dt '0.5 ms'. Defaults come from the scene's time window."})
final class SolveCommand implements Callable<Integer> {

    enum Format { table, csv, json }

    /** The --circuit choices, spelled as on the command line. */
    enum Circuit {
        auto(CircuitModel.AUTO), inductive(CircuitModel.INDUCTIVE), quasi_static(CircuitModel.QUASI_STATIC);

        final CircuitModel model;

        Circuit(CircuitModel model) {
            this.model = model;
        }

        @Override
        public String toString() {
            return name().replace('_', '-');
        }
    }

    @picocli.CommandLine.Mixin
    SceneInput input;

    @Option(names = "--t0", paramLabel = "TIME", description = "Start time (default: the scene's).")
    String t0;

    @Option(names = "--t1", paramLabel = "TIME", description = "End time (default: the scene's).")
    String t1;

    @Option(names = "--dt", paramLabel = "TIME", description = "Sampling step (default: the scene's).")
    String dt;

    @Option(names = "--at", paramLabel = "TIME", description = {"Report this one instant instead of a window",
            "(for a coupled run, the run from t0 sampled exactly there)."})
    String at;

    @Option(names = "--circuit", paramLabel = "auto|inductive|quasi-static", converter = CircuitConverter.class,
            description = {"Loop currents in a time window: with their inductance, as EMF/R,",
                    "or auto: inductive when the largest L/R exceeds dt/10 (default: ${DEFAULT-VALUE})."},
            defaultValue = "auto")
    Circuit circuit;

    @Option(names = "--format", paramLabel = "table|csv|json", description = "Output format (default: ${DEFAULT-VALUE}).",
            defaultValue = "table")
    Format format;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    Path out;

    @Override
    public Integer call() throws IOException {
        OutputTargets.requireDistinct(input.file(), OutputTargets.of("--out", out));
        Scene scene = input.load();
        RunResult results = solve(scene);
        StringWriter text = new StringWriter();
        switch (format) {
            case table -> ResultsTable.write(results, new PrintWriter(text));
            case csv -> ResultsCsv.write(results, text);
            case json -> ResultsJson.write(results, text);
        }
        Output.deliver(text.toString(), out);
        return KinductMain.OK;
    }

    // The Ctrl-C watch acts by being open over the run; its body never names it.
    @SuppressWarnings("try")
    private RunResult solve(Scene scene) {
        TimeSpan span = scene.time();
        double from = t0 == null ? span.t0S() : time("--t0", t0);
        double to = t1 == null ? span.t1S() : time("--t1", t1);
        double step = dt == null ? span.dtS() : time("--dt", dt);
        RunRequest request;
        try {
            request = new RunRequest(new TimeSpan(from, to, step), circuit.model, List.of());
        } catch (IllegalArgumentException e) {
            throw new BadInputException("time window: " + e.getMessage());
        }
        CliMonitor monitor = CliMonitor.forThisProcess();
        SceneRun run = new SceneRun(scene, request, monitor, true);
        try (Interruption watch = Interruption.watch(monitor)) {
            return at == null ? run.result() : run.instantResult(time("--at", at));
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        } catch (RunFailedException e) {
            throw new BadInputException(input.name() + ": " + e.getMessage());
        } finally {
            monitor.done();
        }
    }

    /** Accepts the names as {@link Circuit#toString()} spells them. */
    static final class CircuitConverter implements picocli.CommandLine.ITypeConverter<Circuit> {
        @Override
        public Circuit convert(String value) {
            for (Circuit c : Circuit.values()) {
                if (c.toString().equals(value)) {
                    return c;
                }
            }
            throw new picocli.CommandLine.TypeConversionException("'" + value
                    + "' is not one of auto, inductive, quasi-static");
        }
    }

    private static double time(String option, String value) {
        try {
            return Units.parse(value, Dimension.TIME);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(option + ": " + e.getMessage());
        }
    }
}
