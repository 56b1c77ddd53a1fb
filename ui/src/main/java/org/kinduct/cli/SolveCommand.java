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
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code kinduct solve}: flux, both EMF methods, current and force per conductor over time. */
@Command(name = "solve", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Solve a scene over a time window and print results per conductor.",
                "Times accept units, e.g. --dt '0.5 ms'. Defaults come from the scene's time window."})
final class SolveCommand implements Callable<Integer> {

    enum Format { table, csv, json }

    @picocli.CommandLine.Mixin
    SceneInput input;

    @Option(names = "--t0", paramLabel = "TIME", description = "Start time (default: the scene's).")
    String t0;

    @Option(names = "--t1", paramLabel = "TIME", description = "End time (default: the scene's).")
    String t1;

    @Option(names = "--dt", paramLabel = "TIME", description = "Sampling step (default: the scene's).")
    String dt;

    @Option(names = "--at", paramLabel = "TIME", description = "Solve at this one instant instead of a window.")
    String at;

    @Option(names = "--format", paramLabel = "table|csv|json", description = "Output format (default: ${DEFAULT-VALUE}).",
            defaultValue = "table")
    Format format;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    Path out;

    @Override
    public Integer call() throws IOException {
        Scene scene = input.load();
        List<Snapshot> series = solve(scene);
        StringWriter text = new StringWriter();
        switch (format) {
            case table -> ResultsTable.write(scene, series, new PrintWriter(text));
            case csv -> ResultsCsv.write(series, text);
            case json -> ResultsJson.write(scene, series, text);
        }
        Output.deliver(text.toString(), out);
        return KinductMain.OK;
    }

    private List<Snapshot> solve(Scene scene) {
        SceneSolver solver = new SceneSolver(scene);
        if (at != null) {
            return List.of(solver.at(time("--at", at)));
        }
        TimeSpan span = scene.time();
        double from = t0 == null ? span.t0S() : time("--t0", t0);
        double to = t1 == null ? span.t1S() : time("--t1", t1);
        double step = dt == null ? span.dtS() : time("--dt", dt);
        try {
            new TimeSpan(from, to, step);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("time window: " + e.getMessage());
        }
        return solver.series(from, to, step);
    }

    private static double time(String option, String value) {
        try {
            return Units.parse(value, Dimension.TIME);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(option + ": " + e.getMessage());
        }
    }
}
