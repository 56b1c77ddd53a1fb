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
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The editor's 20-object reference scene (the one its frame-time probe plays): 5 block magnets
 * oscillating on one carriage, 5 cylinder magnets gliding on another, 5 still square loops
 * between them and 5 still two-vertex wires. {@code instant} is one {@link SceneSolver#at};
 * {@code series} 50 steps of the scene's own time step.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 5, time = 2)
public class TwentyObjectBenchmark {

    static final int STEPS = 50;
    static final double DT_S = 0.01;

    private SceneSolver solver;
    private int instant;

    @Setup
    public void setUp() {
        solver = new SceneSolver(scene());
    }

    /** The scene of the editor's frame-time probe, built the same way. */
    static Scene scene() {
        List<Body> bodies = List.of(
                new Body("upper", "upper carriage", new Vec2(0, 0.05), new Motion.Oscillate(0.04, 1, 0, 0)),
                new Body("lower", "lower carriage", new Vec2(0, -0.05), new Motion.Glide(new Vec2(-0.05, 0))));
        List<Source> sources = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            double x = -0.1 + 0.05 * i;
            Source.Magnetization north = i % 2 == 0 ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z;
            sources.add(new Source.BlockMagnet("block-" + i, "upper", new Vec2(x, 0.05), 0.02, 0.01, 0.005, 0,
                    0.002, Source.Side.BELOW, 1.2, north));
            sources.add(new Source.CylinderMagnet("disc-" + i, "lower", new Vec2(x, -0.05), 0.008, 0.005, 0.002,
                    Source.Side.BELOW, 1.2, north));
        }
        WireSpec wire = WireSpec.awg(Material.COPPER, 24);
        List<Conductor> conductors = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            double x = -0.1 + 0.05 * i;
            conductors.add(Conductor.Loop.simple("loop-" + i, Body.FIXED, List.of(
                    Conductor.Vertex.at(x - 0.015, -0.01), Conductor.Vertex.at(x + 0.015, -0.01),
                    Conductor.Vertex.at(x + 0.015, 0.01), Conductor.Vertex.at(x - 0.015, 0.01)), wire));
            conductors.add(new Conductor.Wire("wire-" + i, Body.FIXED, List.of(
                    Conductor.Vertex.at(x - 0.01, 0.09), Conductor.Vertex.at(x + 0.01, 0.11))));
        }
        return new Scene("frame-time reference", "", bodies, sources, conductors, new TimeSpan(0, 1, DT_S));
    }

    /** One instant; successive calls walk through the scene's time span so no instant is special. */
    @Benchmark
    public Snapshot instant() {
        instant = (instant + 1) % 100;
        return solver.at(instant * DT_S);
    }

    @Benchmark
    public List<Snapshot> series() {
        return solver.series(0, (STEPS - 1) * DT_S, DT_S);
    }
}
