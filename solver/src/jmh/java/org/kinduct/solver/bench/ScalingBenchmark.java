package org.kinduct.solver.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
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
 * How one instant's cost grows: {@code count} block magnets on a gliding carriage over
 * {@code count} still loops, each loop a regular polygon of {@code vertices} sides (so every
 * magnet–loop pair is solved: count² pairs). Read the growth with the count at 4 vertices, and
 * with the vertices at one pair.
 *
 * <pre>java -jar solver/target/benchmarks.jar ScalingBenchmark -f 1 -wi 2 -i 3</pre>
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
public class ScalingBenchmark {

    @Param({"1", "5", "20", "80"})
    public int count;

    @Param({"4", "16", "64", "256"})
    public int vertices;

    private SceneSolver solver;
    private int instant;

    @Setup
    public void setUp() {
        solver = new SceneSolver(scene(count, vertices));
    }

    static Scene scene(int count, int sides) {
        Body carriage = new Body("carriage", "carriage", Vec2.ZERO, new Motion.Glide(new Vec2(0.1, 0)));
        List<Source> sources = new ArrayList<>();
        List<Conductor> conductors = new ArrayList<>();
        WireSpec wire = WireSpec.awg(Material.COPPER, 30);
        for (int i = 0; i < count; i++) {
            double x = 0.03 * i;
            sources.add(new Source.BlockMagnet("magnet-" + i, "carriage", new Vec2(x - 0.01, 0.002), 0.01, 0.01,
                    0.005, 0, 0.002, Source.Side.BELOW, 1.2,
                    i % 2 == 0 ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z));
            List<Conductor.Vertex> polygon = new ArrayList<>();
            for (int k = 0; k < sides; k++) {
                double a = 2 * Math.PI * (k + 0.5) / sides;
                polygon.add(Conductor.Vertex.at(x + 0.008 * Math.cos(a), 0.008 * Math.sin(a)));
            }
            conductors.add(Conductor.Loop.simple("loop-" + i, Body.FIXED, polygon, wire));
        }
        return new Scene("scaling", "", List.of(carriage), sources, conductors, new TimeSpan(0, 0.1, 0.001));
    }

    /** One instant; successive calls walk through the window so no instant is special. */
    @Benchmark
    public Snapshot instant() {
        instant = (instant + 1) % 100;
        return solver.at(instant * 0.001);
    }
}
