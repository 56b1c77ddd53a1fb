package org.kinduct.solver.bench;

import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Body;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SourceFields;
import org.kinduct.solver.field.PlaneField;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * B_z evaluation per source type, nanoseconds per point, over 1024 points scattered around a
 * 20 mm source. Compare {@code bz} for {@code patch} with {@link PlainPatchBenchmark}, a
 * textbook crossing test on bare arrays in the same run: their ratio is the cost of the
 * {@link PlaneField} abstraction. Magnets and coils need the field kernels.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 5, time = 1)
public class FieldBenchmark {

    static final int POINTS = 1024;
    static final long SEED = 20_26L;

    @Param({"patch", "uniform", "block", "cylinder", "polygonCoil", "circleCoil"})
    public String kind;

    private PlaneField field;
    private double[] xs;
    private double[] ys;

    /** An octagon of radius 10 mm, the shape the patch benchmarks share. */
    static List<Vec2> octagon() {
        return java.util.stream.IntStream.range(0, 8).mapToObj(i -> Vec2.polar(0.01, Math.PI * i / 4)).toList();
    }

    static double[][] points() {
        SplittableRandom r = new SplittableRandom(SEED);
        double[][] points = new double[2][POINTS];
        for (int i = 0; i < POINTS; i++) {
            points[0][i] = r.nextDouble(-0.03, 0.03);
            points[1][i] = r.nextDouble(-0.03, 0.03);
        }
        return points;
    }

    private Source source() {
        switch (kind) {
            case "patch":
                return new Source.FieldPatch("s", Body.FIXED, octagon(), 0.3);
            case "uniform":
                return new Source.UniformField("s", 50e-6);
            case "block":
                return new Source.BlockMagnet("s", Body.FIXED, Vec2.ZERO, 0.02, 0.01, 0.005, 0.3, 0.002,
                        Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
            case "cylinder":
                return new Source.CylinderMagnet("s", Body.FIXED, Vec2.ZERO, 0.01, 0.005, 0.002, Source.Side.BELOW, 1.2,
                        Source.Magnetization.PLUS_Z);
            case "polygonCoil":
                return new Source.SourceCoil("s", Body.FIXED, new Source.CoilShape.Polygon(octagon()), 50, 0.003,
                        Source.Drive.dc(1));
            case "circleCoil":
                return new Source.SourceCoil("s", Body.FIXED, new Source.CoilShape.Circle(Vec2.ZERO, 0.01), 50, 0.003,
                        Source.Drive.dc(1));
            default:
                throw new IllegalArgumentException("unknown source kind " + kind);
        }
    }

    @Setup
    public void setUp() {
        field = SourceFields.place(source(), Pose.rest(Vec2.ZERO), 0);
        double[][] points = points();
        xs = points[0];
        ys = points[1];
    }

    @Benchmark
    @OperationsPerInvocation(POINTS)
    public double bz() {
        double sum = 0;
        for (int i = 0; i < POINTS; i++) {
            sum += field.bz(xs[i], ys[i]);
        }
        return sum;
    }
}
