package org.kinduct.study.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.SceneRun;
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
 * What reusing unchanged sources between sweep points could save: one point of a stand-off
 * sweep of the carriage demo's third magnet, on one thread, with all six magnets ({@code all})
 * or with the varied magnet alone ({@code varied}), which is what a point would cost if the five
 * unchanged magnets' contributions came free from a cache. all/varied bounds the gain.
 *
 * <pre>java -jar ui/study/target/benchmarks.jar FieldReuseBenchmark</pre>
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 5)
public class FieldReuseBenchmark {

    @Param({"all", "varied"})
    public String sources;

    private Scene point;

    @Setup
    public void setUp() {
        Scene scene = SceneValues.of(Demos.load("carriage-pickup")).write("magnet-3.standoff", 2e-3);
        point = sources.equals("all") ? scene
                : scene.without(List.of("magnet-1", "magnet-2", "magnet-4", "magnet-5", "magnet-6"));
    }

    @Benchmark
    public Object point() {
        return new SceneRun(point, RunRequest.of(point), RunMonitor.NONE, false).result();
    }
}
