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
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.CoupledRun;
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
 * Wall time of a coupled simulation: a row of {@code loops} square coils (100 turns, 10 cm,
 * 0.5 mm copper, 10 Ω load, L/R ≈ 0.2 ms), each on its own free body on a spring, driven at
 * 5 Hz and straddling the edge of a field patch, so that every pair of coils couples through a
 * changing mutual inductance; {@code durationS} simulated seconds sampled every 10 ms.
 * Single shot: one run is the unit of work. Scaling with {@code loops} shows the cost of the
 * inductance matrix and of the loop–loop forces (differenced per free body).
 *
 * <pre>mvn -B -q -Pbench -pl solver -am package -DskipTests
 * java -jar solver/target/benchmarks.jar CoupledBenchmark -p durationS=1</pre>
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 2)
public class CoupledBenchmark {

    @Param({"1", "2", "5", "10"})
    public int loops;

    @Param({"10"})
    public double durationS;

    private Scene scene;

    @Setup
    public void setUp() {
        List<Body> bodies = new ArrayList<>();
        List<Conductor> coils = new ArrayList<>();
        for (int i = 0; i < loops; i++) {
            double x = 0.12 * i;
            Motion.Free free = new Motion.Free(0.1, 0, Vec2.ZERO, 0, 0.05, Vec2.ZERO, new Vec2(0, 0.5 + 0.1 * i), 5,
                    List.of(new Motion.Free.Spring(new Vec2(x, 0.3), null, 100, 0.3)));
            bodies.add(new Body("b" + i, null, new Vec2(x, 0), free));
            coils.add(new Conductor.Loop("coil" + i, "b" + i, List.of(
                    Conductor.Vertex.at(x - 0.05, -0.05), Conductor.Vertex.at(x + 0.05, -0.05),
                    Conductor.Vertex.at(x + 0.05, 0.05), Conductor.Vertex.at(x - 0.05, 0.05)), 100,
                    WireSpec.of(Material.COPPER, 0.5e-3), false, 10, 20));
        }
        Source region = new Source.FieldPatch("region", Body.FIXED,
                List.of(new Vec2(-10, -10), new Vec2(10, -10), new Vec2(10, 0), new Vec2(-10, 0)), 0.5);
        scene = new Scene("coupled row", "", bodies, List.of(region), coils, new TimeSpan(0, durationS, 0.01));
    }

    @Benchmark
    public CoupledRun simulate() {
        return CoupledSimulation.run(scene, 0, durationS, 0.01);
    }
}
