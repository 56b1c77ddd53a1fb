package org.kinduct.solver.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleBinaryOperator;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;
import org.kinduct.solver.sheet.Plate;
import org.kinduct.solver.sheet.PlateSolution;
import org.kinduct.solver.sheet.PlateSolver;
import org.kinduct.solver.sheet.PlateSource;
import org.kinduct.solver.sheet.PlateTransient;
import org.kinduct.solver.sheet.SheetConductor;
import org.kinduct.solver.sheet.SheetDrive;
import org.kinduct.solver.sheet.SheetGrid;
import org.kinduct.solver.sheet.SheetShape;
import org.kinduct.solver.sheet.SheetSolution;
import org.kinduct.solver.sheet.SheetSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * A copper disc plate (radius 50 mm, a 256-gon, 1 mm thick, w = 27.4 m/s) on a 256 × 256 grid
 * (51 000 conducting cells, 66 049 nodes) under a small magnet (a point dipole of 1 A·m², 5 mm up,
 * 12 mm off the axis), side by side:
 * <ul>
 *   <li>{@code selfFieldCurve}: a force–speed curve of 40 speeds, v/w from 0.01 to 100 evenly in
 *       log v, with the plate's own field ({@link Plate#steadySweep}, relative residual 1e-6; below
 *       v/w = 1e-3 none, so all 40 are self-field solves), the plate prepared once per trial;</li>
 *   <li>{@code resistiveCurve}: the same 40 speeds in the resistive limit ({@link SheetSolver},
 *       multigrid CG to 1e-10), what the curve cost before and what it gets wrong above v/w ≈ 0.1;</li>
 *   <li>{@code prepare}: the plate's one-off preparation (network, FFT of the kernel, multigrid);</li>
 *   <li>{@code transientStep}: one backward-Euler step of the plate moving at v = w under the magnet,
 *       a step of one cell's travel, relative residual 1e-6; the run restarts (and takes five
 *       steps) before each measurement iteration, so that in the ~100 steps of an iteration the
 *       magnet stays over the inner half of the disc (a run kept going across iterations carried
 *       the magnet over the rim, where the outer iterations triple, and its figure drifted with
 *       the iteration's length).</li>
 * </ul>
 * Run: {@code mvn -B -q -Pbench -pl solver -am package -DskipTests && java -jar
 * solver/target/benchmarks.jar PlateSolverBenchmark -f 1 -wi 1 -i 3}. JTransforms uses both
 * cores for transforms of this size; everything else runs on one.
 */
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class PlateSolverBenchmark {

    private static final double DISC_M = 0.05;
    private static final double HEIGHT_M = 0.005;
    private static final int CELLS = 256;
    private static final int SPEEDS = 40;
    private static final double TOLERANCE = 1e-6;

    private final SheetConductor copper = SheetConductor.plate(5.8e7, 0.001);
    private final DoubleBinaryOperator magnet = (x, y) -> {
        double dx = x - 0.012;
        double rho2 = dx * dx + y * y;
        double h2 = HEIGHT_M * HEIGHT_M;
        return PhysicalConstants.MU_0_OVER_4PI * (2 * h2 - rho2) / Math.pow(h2 + rho2, 2.5);
    };
    private SheetGrid grid;
    private PlateSolver solver;
    private Plate plate;
    private double[] speeds;
    private PlateTransient run;
    private double stepS;

    @Setup(Level.Trial)
    public void setUp() {
        grid = SheetGrid.withCells(SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, DISC_M, 256)), CELLS);
        solver = new PlateSolver(TOLERANCE, 1000, 40, 2);
        plate = solver.prepare(grid, copper);
        double w = plate.characteristicSpeedMPerS();
        speeds = new double[SPEEDS];
        for (int k = 0; k < SPEEDS; k++) {
            speeds[k] = w * Math.pow(10, -2 + 4.0 * k / (SPEEDS - 1));
        }
        stepS = grid.cellM() / w;
    }

    @Setup(Level.Iteration)
    public void restartRun() {
        run = plate.transientRun(PlateSource.rigidMotion(magnet, new Vec2(plate.characteristicSpeedMPerS(), 0), 0,
                Vec2.ZERO), 0, 1);
        for (int k = 0; k < 5; k++) {
            run.step(stepS);
        }
    }

    private SheetDrive drive(double v) {
        return SheetDrive.rigid(magnet, new Vec2(v, 0), 0, Vec2.ZERO);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public List<PlateSolution> selfFieldCurve() {
        return plate.steadySweep(speeds, this::drive, Vec2.ZERO);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public void resistiveCurve(Blackhole hole) {
        SheetSolver resistive = SheetSolver.multigrid();
        for (double v : speeds) {
            SheetSolution s = resistive.solve(grid, copper, drive(v), Vec2.ZERO, List.of());
            hole.consume(s.forceN());
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Plate prepare() {
        return solver.prepare(grid, copper);
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Measurement(iterations = 3, time = 3)
    @Warmup(iterations = 1, time = 3)
    public double transientStep() {
        run.advance(stepS);
        return run.timeS();
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Measurement(iterations = 3, time = 3)
    @Warmup(iterations = 1, time = 3)
    public PlateSolution transientStepWithOutputs() {
        return run.step(stepS);
    }
}
