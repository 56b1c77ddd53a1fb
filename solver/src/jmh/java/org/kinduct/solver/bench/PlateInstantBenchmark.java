package org.kinduct.solver.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.plate.Sheets;
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
 * One instant of a moving plate, the way a run solves it: a 200 × 40 mm aluminium plate with
 * fifteen 2 mm slots gliding at 0.5 m/s over four NdFeB blocks (the plate-brake demo's slotted
 * plate, about 9000 cells), single-threaded. {@code reuse}: the grid built once in the body's
 * frame and the drive sampled where the plate is (what {@link Sheets} does); {@code rebuild}: a
 * fresh grid at every instant, as building it where the plate is would cost. Their difference is
 * the cut-cell grid's construction, which the frame shift saves at every instant.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 4, time = 2)
public class PlateInstantBenchmark {

    private Scene scene;
    private Kinematics kinematics;
    private Sheets sheets;
    private double tS;

    @Setup
    public void setUp() {
        List<List<Vec2>> slots = new ArrayList<>();
        for (int k = -7; k <= 7; k++) {
            double x = 0.0125 * k;
            slots.add(List.of(new Vec2(x - 0.001, -0.015), new Vec2(x + 0.001, -0.015), new Vec2(x + 0.001, 0.015),
                    new Vec2(x - 0.001, 0.015)));
        }
        List<Source> magnets = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            magnets.add(new Source.BlockMagnet("m" + i, Body.FIXED, new Vec2(-0.0375 + 0.025 * i, 0), 0.015, 0.03,
                    0.01, 0, 0.003, Source.Side.BELOW, 1.2,
                    i % 2 == 0 ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z));
        }
        Conductor.Plate plate = new Conductor.Plate("slotted", "carriage", List.of(new Vec2(-0.1, -0.02),
                new Vec2(0.1, -0.02), new Vec2(0.1, 0.02), new Vec2(-0.1, 0.02)), slots, 0.002,
                new Conductivity.OfMaterial(Material.ALUMINIUM, 20), List.of(), List.of(), OptionalDouble.empty());
        scene = new Scene("bench", "", List.of(new Body("carriage", "carriage", Vec2.ZERO,
                new Motion.Glide(new Vec2(0.5, 0)))), magnets, List.of(plate), new TimeSpan(0, 0.1, 0.005));
        kinematics = Kinematics.prescribed(scene);
        sheets = Sheets.of(scene);
        sheets.at(0, kinematics);
    }

    @Benchmark
    public List<SheetState> reuse() {
        tS = (tS + 0.005) % 0.1;
        return sheets.at(tS, kinematics);
    }

    @Benchmark
    public List<SheetState> rebuild() {
        tS = (tS + 0.005) % 0.1;
        return Sheets.of(scene).at(tS, kinematics);
    }
}
