package org.kinduct.solver.bench;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleFunction;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.solver.SceneSolver;
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
 * Today's solver against the baseline ({@link org.kinduct.solver.baseline}, the solver as of
 * commit 65ff77a) in one run: one instant, and the scene's whole time window, both on the calling
 * thread alone (as the editor solves), for the 20-object reference scene ({@link TwentyObjectBenchmark})
 * and the carriage demo (six magnets, a 200-turn pickup riding past them, 401 instants). The
 * ratio baseline/today of the same benchmark and scene is the speed-up.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 5, time = 2)
public class WindowBenchmark {

    @Param({"twenty", "carriage"})
    public String scene;

    @Param({"baseline", "today"})
    public String solver;

    private TimeSpan window;
    private DoubleFunction<Object> at;
    private int instant;

    @Setup
    public void setUp() throws IOException, SceneFormatException {
        Scene s = scene.equals("twenty") ? TwentyObjectBenchmark.scene() : demo("carriage-pickup");
        window = s.time();
        if (solver.equals("baseline")) {
            org.kinduct.solver.baseline.SceneSolver old = new org.kinduct.solver.baseline.SceneSolver(s);
            at = old::at;
        } else {
            SceneSolver now = new SceneSolver(s);
            at = now::at;
        }
    }

    /** A demo scene as the editor opens it. */
    static Scene demo(String name) throws IOException, SceneFormatException {
        String path = "/org/kinduct/demo/" + name + ".json";
        try (InputStream in = WindowBenchmark.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("no demo resource " + path);
            }
            return SceneJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8), name + ".json");
        }
    }

    private int steps() {
        return (int) Math.floor((window.t1S() - window.t0S()) / window.dtS() + 1e-9);
    }

    /** One instant; successive calls walk through the window so that no instant is special. */
    @Benchmark
    public Object instant() {
        instant = (instant + 1) % (steps() + 1);
        return at.apply(window.t0S() + instant * window.dtS());
    }

    /** Every instant of the window, one after another on this thread. */
    @Benchmark
    public List<Object> window() {
        int n = steps();
        Object[] out = new Object[n + 1];
        for (int k = 0; k <= n; k++) {
            out[k] = at.apply(window.t0S() + k * window.dtS());
        }
        return List.of(out);
    }
}
