package org.kinduct.solver.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;
import org.kinduct.solver.sheet.SheetConductor;
import org.kinduct.solver.sheet.SheetDrive;
import org.kinduct.solver.sheet.SheetGrid;
import org.kinduct.solver.sheet.SheetShape;
import org.kinduct.solver.sheet.SheetSolution;
import org.kinduct.solver.sheet.SheetSolver;
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
 * Eddy currents in a copper disc plate (radius 50 mm, a 256-gon, 1 mm thick) under a small magnet
 * (a point dipole of 1 A·m², 5 mm up, 12 mm off the axis), the plate moving at 1 m/s and turning
 * at 10 rad/s: one full {@link SheetSolver#solve} per operation (B_z sampled on every face, the
 * linear solve to 1e-10, currents, force, torque, stream function), single-threaded. The grid is
 * built once per trial. {@code unknowns} is the side of the square number of unknowns: the disc's
 * grid has about that many cells in its area. {@code MULTIGRID} and {@code JACOBI} in one run:
 * their ratio is what the multigrid preconditioner saves; the growth with {@code unknowns} shows
 * that multigrid's work is linear (its iteration count stays flat) and Jacobi's is not.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
public class SheetSolverBenchmark {

    private static final double DISC_M = 0.05;
    private static final double HEIGHT_M = 0.005;

    @Param({"128", "256", "512", "1024"})
    public int unknowns;

    @Param({"MULTIGRID", "JACOBI"})
    public String method;

    private SheetGrid grid;
    private SheetSolver solver;
    private SheetDrive drive;
    private final SheetConductor copper = SheetConductor.plate(5.8e7, 0.001);

    @Setup
    public void setUp() {
        // Cells across the disc so that its π/4 share of the square holds unknowns² cells.
        int cells = (int) Math.round(unknowns * 2 / Math.sqrt(Math.PI));
        grid = SheetGrid.withCells(SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, DISC_M, 256)), cells);
        solver = new SheetSolver(SheetSolver.Method.valueOf(method), SheetSolver.DEFAULT_TOLERANCE, 1_000_000);
        double moment = 1;
        drive = SheetDrive.rigid((x, y) -> {
            double dx = x - 0.012;
            double rho2 = dx * dx + y * y;
            double h2 = HEIGHT_M * HEIGHT_M;
            return PhysicalConstants.MU_0_OVER_4PI * moment * (2 * h2 - rho2) / Math.pow(h2 + rho2, 2.5);
        }, new Vec2(1, 0), 10, Vec2.ZERO);
    }

    @Benchmark
    public SheetSolution solve() {
        return solver.solve(grid, copper, drive, Vec2.ZERO, List.of());
    }
}
