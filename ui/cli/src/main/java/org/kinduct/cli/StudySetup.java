package org.kinduct.cli;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.report.metrics.Metric;
import org.kinduct.report.metrics.Metrics;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** What sweeps and optimisations share: the scene, fixed edits, the window the metrics read, the circuit model. */
final class StudySetup {

    @Mixin
    SceneInput input;

    @Option(names = "--set", paramLabel = "PATH=VALUE", description = {"Set a value before varying others, e.g.",
            "--set 'board-coil.load=10 ohm' (repeatable)."})
    List<String> sets = new ArrayList<>();

    @Option(names = "--from", paramLabel = "TIME", description = "Metrics read the samples from this time on (default: all).")
    String from;

    @Option(names = "--circuit", paramLabel = "auto|inductive|quasi-static", converter = SolveCommand.CircuitConverter.class,
            description = "Circuit model of every run, as for solve (default: ${DEFAULT-VALUE}).", defaultValue = "auto")
    SolveCommand.Circuit circuit;

    /** The scene with the --set edits written in, in the order given. */
    Scene scene() {
        Scene scene = input.load();
        for (String set : sets) {
            int eq = set.indexOf('=');
            if (eq < 0) {
                throw new BadInputException("--set '" + set + "': expected PATH=VALUE, e.g. 'magnet-1.standoff=2 mm'");
            }
            try {
                SceneValues values = SceneValues.of(scene);
                var value = values.find(set.substring(0, eq).strip());
                scene = value.write(scene, value.parse(set.substring(eq + 1)));
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--set: " + e.getMessage());
            }
        }
        return scene;
    }

    double fromS() {
        if (from == null) {
            return Double.NEGATIVE_INFINITY;
        }
        try {
            return Units.parse(from, Dimension.TIME);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--from: " + e.getMessage());
        }
    }

    static Metric metric(String option, String text, Scene scene) {
        try {
            return Metrics.parse(text, scene);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(option + ": " + e.getMessage());
        }
    }
}
