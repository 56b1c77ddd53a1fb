package org.kinduct.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.kinduct.report.metrics.Metric;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.study.Bound;
import org.kinduct.study.Constraint;
import org.kinduct.study.Optimisation;
import org.kinduct.study.Optimiser;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code kinduct optimise}: chooses bounded scene values to maximise or minimise a metric under
 * limits on others, prints the optimum, its metrics and every run, and writes the optimal scene.
 */
@Command(name = "optimise", aliases = "optimize", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Choose scene values within bounds for the best metric under limits on others.",
                "e.g. --vary 'board-coil.load=1 ohm..100 ohm:log' --maximise mean_load_power:board-coil",
                "     --constraint 'peak_emf:board-coil <= 5 V'"})
final class OptimiseCommand implements Callable<Integer> {

    private static final int SHOWN_DIGITS = 6;

    @Mixin
    StudySetup setup;

    @Option(names = "--vary", required = true, paramLabel = "PATH=LO..HI[:log]",
            description = "A value to choose and its bounds; ':log' searches it on a log scale (repeatable).")
    List<String> vary;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Goal goal;

    static final class Goal {
        @Option(names = {"--maximise", "--maximize"}, paramLabel = "METRIC", description = "Metric to make largest.")
        String maximise;

        @Option(names = {"--minimise", "--minimize"}, paramLabel = "METRIC", description = "Metric to make smallest.")
        String minimise;
    }

    @Option(names = "--constraint", paramLabel = "'METRIC <= VALUE'",
            description = "A limit on a metric, <= or >=, the value with units (repeatable).")
    List<String> constraints = new ArrayList<>();

    @Option(names = "--method", paramLabel = "auto|bobyqa|cmaes", defaultValue = "auto",
            description = "Brent for one value and BOBYQA for several (auto), or BOBYQA, or CMA-ES.")
    String method;

    @Option(names = "--max-runs", paramLabel = "N", defaultValue = "200", description = "Most runs to spend (default: ${DEFAULT-VALUE}).")
    int maxRuns;

    @Option(names = "--out", paramLabel = "FILE", description = "Write the optimal scene to FILE (atomically).")
    Path out;

    @Override
    public Integer call() {
        Scene scene = setup.scene();
        Optimisation o = optimisation(scene);
        PrintStream err = System.err;
        Optimiser.Result result = new Optimiser(o, e -> err.println("optimise: run " + e.number() + ": "
                + values(o, e.values()) + " → " + shown(o.goal(), e.goal())
                + (e.error() != null ? " (refused: " + e.error() + ")" : e.feasible() ? "" : " (breaks a constraint)")))
                .run();
        print(o, result, System.out);
        if (result.best() < 0) {
            throw new BadInputException("no run met the constraints; widen the bounds or relax the limits");
        }
        if (out != null) {
            Optimiser.Evaluation best = result.history().get(result.best());
            Scene optimal = scene;
            for (int i = 0; i < best.values().length; i++) {
                optimal = o.bounds().get(i).value().write(optimal, best.values()[i]);
            }
            try {
                SceneFiles.write(optimal, out);
            } catch (IOException e) {
                throw new BadInputException("cannot write " + out + ": " + e.getMessage());
            }
            err.println("wrote " + out);
        }
        return KinductMain.OK;
    }

    private Optimisation optimisation(Scene scene) {
        SceneValues values = SceneValues.of(scene);
        List<Bound> bounds = new ArrayList<>();
        for (String v : vary) {
            try {
                bounds.add(Bound.parse(v, values));
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--vary: " + e.getMessage());
            }
        }
        boolean maximise = goal.maximise != null;
        Metric target = StudySetup.metric(maximise ? "--maximise" : "--minimise", maximise ? goal.maximise : goal.minimise,
                scene);
        List<Constraint> limits = new ArrayList<>();
        for (String c : constraints) {
            limits.add(constraint(c, scene));
        }
        Optimisation.Method m = switch (method) {
            case "auto" -> Optimisation.Method.AUTO;
            case "bobyqa" -> Optimisation.Method.BOBYQA;
            case "cmaes" -> Optimisation.Method.CMAES;
            default -> throw new BadInputException("--method: '" + method + "' is not one of auto, bobyqa, cmaes");
        };
        try {
            return new Optimisation(scene, bounds, target, maximise, limits, setup.fromS(), setup.circuit.model, m, maxRuns);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }

    /** {@code METRIC <= VALUE} or {@code METRIC >= VALUE} (also ≤, ≥); the value in the metric's unit. */
    static Constraint constraint(String text, Scene scene) {
        String t = text.replace("≤", "<=").replace("≥", ">=");
        int le = t.indexOf("<=");
        int ge = t.indexOf(">=");
        if ((le < 0) == (ge < 0)) {
            throw new BadInputException("--constraint '" + text + "': expected 'METRIC <= VALUE' or 'METRIC >= VALUE'");
        }
        int at = Math.max(le, ge);
        Metric metric = StudySetup.metric("--constraint", t.substring(0, at).strip(), scene);
        String limit = t.substring(at + 2).strip();
        try {
            return new Constraint(metric, le >= 0, Units.parse(limit, dimension(metric)));
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--constraint '" + text + "': " + e.getMessage());
        }
    }

    /** The dimension a metric's limit is read in; a ratio of unlike quantities takes a bare SI number. */
    private static Dimension dimension(Metric metric) {
        if (metric instanceof Metric.Term term) {
            return term.kind().dimension();
        }
        return Dimension.DIMENSIONLESS;
    }

    private static void print(Optimisation o, Optimiser.Result r, PrintStream out) {
        if (r.best() >= 0) {
            Optimiser.Evaluation best = r.history().get(r.best());
            out.println((o.maximise() ? "Maximum" : "Minimum") + " of " + o.goal().text() + " found at run "
                    + best.number() + " of " + r.history().size() + ":");
            for (int i = 0; i < best.values().length; i++) {
                out.println("  " + o.bounds().get(i).value().path() + " = "
                        + precise(o.bounds().get(i).value().dimension(), best.values()[i]));
            }
            out.println("  " + o.goal().text() + " = " + shown(o.goal(), best.goal()));
            for (int c = 0; c < o.constraints().size(); c++) {
                Constraint k = o.constraints().get(c);
                out.println("  " + k.metric().text() + " = " + shown(k.metric(), best.constrained()[c])
                        + (k.atMost() ? "  (≤ " : "  (≥ ") + shown(k.metric(), k.limit()) + ")");
            }
        } else {
            out.println("No run met the constraints.");
        }
        out.println();
        out.println("Runs:");
        for (Optimiser.Evaluation e : r.history()) {
            StringBuilder line = new StringBuilder(String.format("%4d  ", e.number())).append(values(o, e.values()))
                    .append("  ").append(o.goal().text()).append(" = ").append(shown(o.goal(), e.goal()));
            for (int c = 0; c < o.constraints().size(); c++) {
                line.append("  ").append(o.constraints().get(c).metric().text()).append(" = ")
                        .append(shown(o.constraints().get(c).metric(), e.constrained()[c]));
            }
            line.append(e.error() != null ? "  refused: " + e.error() : e.feasible() ? "" : "  breaks a constraint");
            out.println(line);
        }
    }

    private static String values(Optimisation o, double[] v) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < v.length; i++) {
            parts.add(o.bounds().get(i).value().path() + " = " + precise(o.bounds().get(i).value().dimension(), v[i]));
        }
        return String.join(", ", parts);
    }

    private static String precise(Dimension d, double si) {
        return Units.format(si, d, SHOWN_DIGITS);
    }

    private static String shown(Metric m, double v) {
        if (m instanceof Metric.Term t) {
            return Units.format(v, t.kind().dimension(), SHOWN_DIGITS);
        }
        return String.format(java.util.Locale.ROOT, "%.6g", v) + (m.unit().isEmpty() ? "" : " " + m.unit());
    }
}
