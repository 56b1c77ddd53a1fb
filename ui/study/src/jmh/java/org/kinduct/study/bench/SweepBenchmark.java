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
 * {@code points} stand-offs of one magnet, the peak EMF of each, on {@code threads} threads.
 * Points per second = points / (seconds per operation); the ratio of the two thread settings
 * is the speed-up from the second core.
 *
 * <pre>mvn -B -q -Pstudy-bench -pl ui/study -am package -DskipTests
 * java -jar ui/study/target/benchmarks.jar SweepBenchmark</pre>
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 4)
@Measurement(iterations = 8)
public class SweepBenchmark {

    /** Points share the integrals of the magnets they leave alone, computed once: larger sweeps amortise that. */
    @Param({"16", "64"})
    public int points;

    @Param({"1", "2"})
    public int threads;

    private Study study;

    @Setup
    public void setUp() {
        Scene carriage = Demos.load("carriage-pickup");
        Axis standoff = Axis.parse("magnet-3.standoff=1 mm..2.5 mm:" + points, SceneValues.of(carriage));
        study = new Study(carriage, new Design(List.of(standoff), Design.Mode.GRID),
                List.of(Metrics.parse("peak_emf:pickup", carriage)), Double.NEGATIVE_INFINITY, CircuitModel.AUTO);
    }

    @Benchmark
    public Object sweep() throws InterruptedException {
        return new StudyRunner(study, Shard.WHOLE, threads, (row, done, total) -> { }).run();
    }
}
