package org.kinduct.solver.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;
import org.kinduct.solver.SceneField;
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
 * An EMF time series of a 20-object scene, 10 sources (half of them moving) and 10 conductors
 * (5 moving 16-gon loops of 10 turns, 5 three-vertex wires), over 100 steps. {@code series} is
 * the full solve (flux, both EMF methods, currents, forces); {@code fluxOnly} is the plain
 * single-threaded direct evaluation it builds on, every loop's flux at every step from
 * {@link SceneSolver#fieldAt}. Their ratio in one run is the price of the two-method check and
 * the rest of the state. {@code magnets} needs the field kernels.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 5, time = 1)
public class SeriesBenchmark {

    static final int STEPS = 100;
    static final double DT_S = 0.01;

    @Param({"patches", "magnets"})
    public String sources;

    private Scene scene;
    private SceneSolver solver;

    @Setup
    public void setUp() {
        List<Body> bodies = List.of(
                new Body("shaker", "shaker", Vec2.ZERO, new Motion.Oscillate(0.01, 5, 0.4, 0)),
                new Body("belt", "belt", Vec2.ZERO, new Motion.Glide(new Vec2(0.05, 0.01))));
        List<Source> list = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            String body = i % 2 == 0 ? Body.FIXED : "shaker";
            Vec2 at = new Vec2(0.03 * (i % 5), 0.03 * (i / 5));
            list.add(source(i, body, at));
        }
        List<Conductor> conductors = new ArrayList<>();
        WireSpec wire = WireSpec.awg(Material.COPPER, 30);
        for (int i = 0; i < 5; i++) {
            Vec2 center = new Vec2(0.03 * i - 0.02, 0.015);
            List<Conductor.Vertex> ring = IntStream.range(0, 16)
                    .mapToObj(k -> new Conductor.Vertex(center.plus(Vec2.polar(0.012, Math.PI * k / 8)), null)).toList();
            conductors.add(new Conductor.Loop("loop" + i, "belt", ring, 10, wire, false, 0, 20));
            conductors.add(new Conductor.Wire("wire" + i, "belt", List.of(
                    new Conductor.Vertex(new Vec2(0.03 * i, -0.01), null),
                    new Conductor.Vertex(new Vec2(0.03 * i + 0.01, 0.0), null),
                    new Conductor.Vertex(new Vec2(0.03 * i, 0.04), null))));
        }
        scene = new Scene("bench", "", bodies, list, conductors, new TimeSpan(0, STEPS * DT_S, DT_S));
        solver = new SceneSolver(scene);
    }

    private Source source(int i, String body, Vec2 at) {
        if (sources.equals("patches")) {
            return new Source.FieldPatch("s" + i, body, List.of(at, at.plus(new Vec2(0.02, 0)),
                    at.plus(new Vec2(0.02, 0.015)), at.plus(new Vec2(0, 0.015))), i % 3 == 0 ? -0.2 : 0.3);
        }
        return i % 2 == 0
                ? new Source.BlockMagnet("s" + i, body, at, 0.02, 0.01, 0.005, 0.1 * i, 0.002, Source.Side.BELOW, 1.2,
                        Source.Magnetization.PLUS_Z)
                : new Source.CylinderMagnet("s" + i, body, at, 0.008, 0.005, 0.002, Source.Side.ABOVE, 1.2,
                        Source.Magnetization.MINUS_Z);
    }

    @Benchmark
    public List<Snapshot> series() {
        return solver.series(0, (STEPS - 1) * DT_S, DT_S);
    }

    @Benchmark
    public double fluxOnly() {
        double sum = 0;
        for (int step = 0; step < STEPS; step++) {
            double t = step * DT_S;
            SceneField field = solver.fieldAt(t);
            for (Conductor c : scene.conductors()) {
                if (c instanceof Conductor.Loop) {
                    List<Vec2> at = solver.placedVertices(c, t);
                    sum += field.flux(at.stream().mapToDouble(Vec2::x).toArray(), at.stream().mapToDouble(Vec2::y).toArray());
                }
            }
        }
        return sum;
    }
}
