package org.kinduct.solver.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Vec2;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The baseline for {@link FieldBenchmark} with {@code kind = patch}: the same octagon and points,
 * B_z by a plain crossing-number test written inline on bare arrays, single-threaded.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 5, time = 1)
public class PlainPatchBenchmark {

    private static final double BZ_T = 0.3;

    private double[] px;
    private double[] py;
    private double[] xs;
    private double[] ys;

    @Setup
    public void setUp() {
        List<Vec2> outline = FieldBenchmark.octagon();
        px = outline.stream().mapToDouble(Vec2::x).toArray();
        py = outline.stream().mapToDouble(Vec2::y).toArray();
        double[][] points = FieldBenchmark.points();
        xs = points[0];
        ys = points[1];
    }

    @Benchmark
    @OperationsPerInvocation(FieldBenchmark.POINTS)
    public double bz() {
        double sum = 0;
        int m = px.length;
        for (int k = 0; k < FieldBenchmark.POINTS; k++) {
            double x = xs[k];
            double y = ys[k];
            boolean inside = false;
            for (int i = 0, j = m - 1; i < m; j = i++) {
                if ((py[i] > y) != (py[j] > y) && x < px[j] + (y - py[j]) * (px[i] - px[j]) / (py[i] - py[j])) {
                    inside = !inside;
                }
            }
            sum += inside ? BZ_T : 0;
        }
        return sum;
    }
}
