package org.kinduct.study.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.solver.PairMemo;
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
 * What reusing unchanged sources between sweep points saves: {@value #POINTS} points of a
 * stand-off sweep of the carriage demo's third magnet (six magnets, 401 instants a point), on one
 * thread, with the points sharing one {@link PairMemo} ({@code shared}, as studies run) or
 * integrating every pair afresh ({@code none}). none/shared is the gain.
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

    static final int POINTS = 8;

    @Param({"shared", "none"})
    public String memo;

    private final List<Scene> points = new ArrayList<>();

    @Setup
    public void setUp() {
        Scene carriage = Demos.load("carriage-pickup");
        for (int k = 0; k < POINTS; k++) {
            points.add(SceneValues.of(carriage).write("magnet-3.standoff", 1e-3 + k * 0.25e-3));
        }
    }

    @Benchmark
    public Object sweep() {
        PairMemo shared = memo.equals("shared") ? new PairMemo() : PairMemo.NONE;
        List<Object> results = new ArrayList<>();
        for (Scene point : points) {
            results.add(new SceneRun(point, RunRequest.of(point), RunMonitor.NONE, false, shared).result());
        }
        return results;
    }
}
