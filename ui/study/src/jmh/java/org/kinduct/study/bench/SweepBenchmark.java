package org.kinduct.study.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.demo.Demos;
import org.kinduct.report.metrics.Metrics;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.study.Axis;
import org.kinduct.study.Design;
import org.kinduct.study.Shard;
import org.kinduct.study.Study;
import org.kinduct.study.StudyRunner;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Sweep throughput on the carriage demo (six magnets, a 200-turn pickup, 401 instants a point):
 * {@code POINTS} stand-offs of one magnet, the peak EMF of each, on {@code threads} threads.
 * Points per second = POINTS / (seconds per operation).
 *
 * <p>{@code onePoint} with {@code sources} = {@code all} or {@code varied} bounds what reusing
 * the fields of the five magnets that do not change could save: a point of the scene with only
 * the varied magnet costs what a point would cost if the other five cost nothing.
 *
 * <pre>mvn -B -q -Pstudy-bench -pl ui/study -am package -DskipTests
 * java -jar ui/study/target/benchmarks.jar SweepBenchmark</pre>
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class SweepBenchmark {

    static final int POINTS = 4;

    @Param({"1", "2"})
    public int threads;

    @Param({"all", "varied"})
    public String sources;

    private Study study;
    private Scene onePoint;

    @Setup
    public void setUp() {
        Scene carriage = Demos.load("carriage-pickup");
        Axis standoff = Axis.parse("magnet-3.standoff=1 mm..2.5 mm:" + POINTS, SceneValues.of(carriage));
        study = new Study(carriage, new Design(List.of(standoff), Design.Mode.GRID),
                List.of(Metrics.parse("peak_emf:pickup", carriage)), Double.NEGATIVE_INFINITY, CircuitModel.AUTO);
        Scene point = SceneValues.of(carriage).write("magnet-3.standoff", 2e-3);
        onePoint = sources.equals("all") ? point
                : point.without(List.of("magnet-1", "magnet-2", "magnet-4", "magnet-5", "magnet-6"));
    }

    @Benchmark
    public Object sweep() throws InterruptedException {
        if (!sources.equals("all")) {
            return null;
        }
        return new StudyRunner(study, Shard.WHOLE, threads, (row, done, total) -> { }).run();
    }

    @Benchmark
    public Object onePoint() {
        if (threads != 1) {
            return null;
        }
        return new org.kinduct.solver.run.SceneRun(onePoint, org.kinduct.solver.run.RunRequest.of(onePoint),
                org.kinduct.solver.dynamics.RunMonitor.NONE, false).result();
    }
}
