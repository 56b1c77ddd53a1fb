package org.kinduct.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kinduct.report.ResultsCsv;
import org.kinduct.report.ResultsJson;
import org.kinduct.report.ResultsTable;
import org.kinduct.report.SolveResults;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.circuit.LoopInductance;
import org.kinduct.solver.dynamics.CircuitModel;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code kinduct solve}: flux, both EMF methods, current, inductance and force per conductor over
 * time. A time window is a coupled run ({@link SolveResults#run}): free bodies move, loop currents
 * include their inductance (or not, by {@code --circuit}), and an energy audit closes it. {@code --at}
 * is one quasi-static instant, for scenes without free bodies (a free body's state at t needs the
 * run from t0).
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

    @Option(names = "--at", paramLabel = "TIME", description = {"Solve at this one instant instead of a window",
            "(quasi-static; not for scenes with free bodies, whose state needs the run from t0)."})
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
        Scene scene = input.load();
        SolveResults results = solve(scene);
        StringWriter text = new StringWriter();
        switch (format) {
            case table -> ResultsTable.write(scene, results, new PrintWriter(text));
            case csv -> ResultsCsv.write(results, text);
            case json -> ResultsJson.write(scene, results, text);
        }
        Output.deliver(text.toString(), out);
        return KinductMain.OK;
    }

    private SolveResults solve(Scene scene) {
        if (at != null) {
            if (scene.bodies().stream().anyMatch(b -> b.motion() instanceof Motion.Free)) {
                throw new BadInputException("--at: the scene has a free body, whose state at a time needs the run"
                        + " from t0; solve a time window (--t0, --t1, --dt) instead");
            }
            Snapshot instant = new SceneSolver(scene).at(time("--at", at));
            return SolveResults.instants(List.of(instant), List.of(selfInductances(scene, instant)));
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
        try {
            return SolveResults.run(scene, from, to, step, circuit.model);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }

    /** L of each closed loop where it is at this instant. */
    private static Map<String, Double> selfInductances(Scene scene, Snapshot instant) {
        Map<String, Double> out = new HashMap<>();
        for (ConductorState c : instant.conductors()) {
            if (scene.conductor(c.id()).orElseThrow() instanceof Conductor.Loop loop && !loop.open()) {
                out.put(c.id(), LoopInductance.self(c.vertices(), loop.wire().diameterM() / 2, loop.turns()));
            }
        }
        return out;
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
