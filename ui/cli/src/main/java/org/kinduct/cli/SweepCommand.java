package org.kinduct.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.kinduct.report.metrics.Metric;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.study.Axis;
import org.kinduct.study.Design;
import org.kinduct.study.Shard;
import org.kinduct.study.Study;
import org.kinduct.study.StudyRunner;
import org.kinduct.study.StudyTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code kinduct sweep}: runs a scene at every point of a design (each point exactly as
 * {@code kinduct solve} runs the edited scene), reads the metrics, writes one row per point, and
 * plots. A part of a study ({@code --shard K/N}) runs its points only, for {@code kinduct merge}.
 * Ctrl-C writes the rows finished so far, marked incomplete.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Vary scene values over a range or list, run every point, and write the metrics.",
                "Paths name values by id and file field: magnet-2.standoff, pickup.turns, carriage.motion.velocity.x.",
                "Values take units: --vary 'magnet-1.standoff=0.5 mm..3 mm:11'."})
final class SweepCommand implements Callable<Integer> {

    @Mixin
    StudySetup setup;

    @Option(names = "--vary", required = true, paramLabel = "PATH=SPEC", description = {
            "PATH=FROM..TO:N (N values), PATH=FROM..TO:N:log, or PATH=V1,V2,… (repeatable)."})
    List<String> vary;

    @Option(names = "--paired", description = "Take the varied values side by side instead of every combination.")
    boolean paired;

    @Option(names = "--metric", required = true, paramLabel = "METRIC", description = {
            "NAME:ID, e.g. peak_emf:pickup; a ratio A / B; 'without ID,…' reads a term without those objects",
            "(repeatable; names in README, 'Metrics')."})
    List<String> metrics;

    @Option(names = "--threads", paramLabel = "N", description = "Points run at once (default: the cores, ${DEFAULT-VALUE}).")
    int threads = Runtime.getRuntime().availableProcessors();

    @Option(names = "--shard", paramLabel = "K/N", description = "Run part K of N (points k with k mod N = K − 1).")
    String shard;

    @Mixin
    StudyOutputs outputs;

    @Override
    public Integer call() throws InterruptedException {
        Study study = study(setup, vary, paired, metrics);
        Shard part = shard == null ? Shard.WHOLE : parseShard(shard);
        if (threads < 1) {
            throw new BadInputException("--threads must be at least 1, got " + threads);
        }
        StudyTable empty = new StudyTable(study.header(), part.whole() ? null : part, false, List.of());
        outputs.checkPlot(empty);
        StudyRunner runner = new StudyRunner(study, part, threads, new Progress("sweep", System.err));
        System.err.println("sweep: study " + study.header().study().substring(0, 12) + "…, " + runner.points().size()
                + " of " + study.design().size() + " points" + (part.whole() ? "" : " (part " + part + ")") + ", "
                + threads + " thread" + (threads > 1 ? "s" : ""));
        PartialOnStop partial = new PartialOnStop(runner, outputs, empty);
        Runtime.getRuntime().addShutdownHook(partial);
        List<org.kinduct.study.Row> rows;
        try {
            rows = runner.run();
        } finally {
            partial.disarm();
        }
        StudyTable table = new StudyTable(empty.header(), empty.shard(), runner.complete(), rows);
        for (Path p : outputs.write(table)) {
            System.err.println("wrote " + p);
        }
        long failed = rows.stream().filter(r -> r.error() != null).count();
        if (failed > 0) {
            throw new BadInputException(failed + " of " + rows.size() + " points could not be run; their rows say why");
        }
        return KinductMain.OK;
    }

    static Study study(StudySetup setup, List<String> vary, boolean paired, List<String> metricTexts) {
        Scene scene = setup.scene();
        SceneValues values = SceneValues.of(scene);
        List<Axis> axes = new ArrayList<>();
        for (String v : vary) {
            try {
                axes.add(Axis.parse(v, values));
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--vary: " + e.getMessage());
            }
        }
        List<Metric> read = new ArrayList<>();
        for (String m : metricTexts) {
            read.add(StudySetup.metric("--metric", m, scene));
        }
        try {
            return new Study(scene, new Design(axes, paired ? Design.Mode.PAIRED : Design.Mode.GRID), read,
                    setup.fromS(), setup.circuit.model);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }

    private static Shard parseShard(String text) {
        try {
            return Shard.parse(text);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--shard: " + e.getMessage());
        }
    }

    /**
     * On Ctrl-C (or any other shutdown) during the run: stop it and write the rows finished so far,
     * marked incomplete. Disarmed once the run returns, so a normal end writes only the full table.
     */
    private static final class PartialOnStop extends Thread {
        private final StudyRunner runner;
        private final StudyOutputs outputs;
        private final StudyTable empty;
        private boolean armed = true;

        PartialOnStop(StudyRunner runner, StudyOutputs outputs, StudyTable empty) {
            super("sweep-partial-results");
            this.runner = runner;
            this.outputs = outputs;
            this.empty = empty;
        }

        synchronized void disarm() {
            armed = false;
            try {
                Runtime.getRuntime().removeShutdownHook(this);
            } catch (IllegalStateException shuttingDown) {
                // the JVM is already exiting: this hook has run or is waiting for the lock, and now does nothing
            }
        }

        @Override
        public synchronized void run() {
            if (!armed) {
                return;
            }
            runner.stop();
            List<org.kinduct.study.Row> rows = runner.finished();
            outputs.write(new StudyTable(empty.header(), empty.shard(), false, rows));
            System.err.println("sweep: stopped; wrote the " + rows.size() + " finished points, marked incomplete");
        }
    }
}
