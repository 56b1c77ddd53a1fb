package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Path2D;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/** The solver's outputs beyond forces: stream function, both methods, budget, electrodes, Rm, −∂A/∂t. */
class SheetSolverTest {

    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.001;
    private static final List<Vec2> OUTLINE = SheetShape.regularPolygon(Vec2.ZERO, 0.05, 96);
    private static final List<Vec2> HOLE = SheetShape.regularPolygon(new Vec2(0.015, 0.005), 0.012, 6);
    private static final SheetShape PLATE = new SheetShape(OUTLINE, List.of(HOLE));
    private static final SheetDrive DRIVE = SheetDrive.rigid(SheetFixtures.dipole(1, -0.01, 0, 0.006),
            new Vec2(0.8, 0.3), 5, new Vec2(0.002, -0.004));

    private static SheetSolution solve(SheetGrid grid, SheetSolver solver) {
        return solver.solve(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M), DRIVE, Vec2.ZERO, List.of());
    }

    private static Path2D.Double path(List<Vec2> loop) {
        Path2D.Double path = new Path2D.Double();
        path.moveTo(loop.get(0).x(), loop.get(0).y());
        for (Vec2 p : loop.subList(1, loop.size())) {
            path.lineTo(p.x(), p.y());
        }
        path.closePath();
        return path;
    }

    @Test
    void streamFunctionIsZeroOutsideConstantInTheHoleAndGivesTheFaceCurrents() {
        SheetGrid grid = SheetGrid.withCells(PLATE, 80);
        SheetSolution solution = solve(grid, new SheetSolver(SheetSolver.Method.MULTIGRID, 1e-12, 100));
        Path2D.Double outline = path(OUTLINE);
        Path2D.Double hole = path(HOLE);
        double scale = 0;
        for (int j = 0; j <= grid.ny(); j++) {
            for (int i = 0; i <= grid.nx(); i++) {
                scale = Math.max(scale, Math.abs(solution.streamFunctionAPerM(i, j)));
            }
        }
        // Each node value sums current balances up a column; measured agreement about 1e-13.
        double level = 1e-9 * scale;
        double holeValue = Double.NaN;
        int outside = 0;
        int inHole = 0;
        double h = grid.cellM();
        for (int j = 0; j <= grid.ny(); j++) {
            for (int i = 0; i <= grid.nx(); i++) {
                double x = grid.originXM() + i * h;
                double y = grid.originYM() + j * h;
                double psi = solution.streamFunctionAPerM(i, j);
                // Nodes clear of the edge by a cell: no cell around them conducts.
                if (!outline.intersects(x - h, y - h, 2 * h, 2 * h)) {
                    assertEquals(0, psi, level, "outside at node " + i + ", " + j);
                    outside++;
                } else if (hole.contains(x - h, y - h, 2 * h, 2 * h)) {
                    if (Double.isNaN(holeValue)) {
                        holeValue = psi;
                    }
                    assertEquals(holeValue, psi, level, "in the hole at node " + i + ", " + j);
                    inHole++;
                }
                if (i < grid.nx()) {
                    // Current up through a y face is the drop of ψ along it, times d.
                    assertEquals(solution.faceCurrentYA(i, j) / THICKNESS_M,
                            psi - solution.streamFunctionAPerM(i + 1, j), level, "y face " + i + ", " + j);
                }
            }
        }
        assertTrue(outside > 100 && inHole > 4, outside + " nodes outside, " + inHole + " in the hole");
        assertTrue(Math.abs(holeValue) > 1e-3 * scale, "current passes between the hole and the outline");
    }

    @Test
    void multigridAndJacobiAgree() {
        SheetGrid grid = SheetGrid.withCells(PLATE, 64);
        SheetSolution multigrid = solve(grid, new SheetSolver(SheetSolver.Method.MULTIGRID, 1e-12, 100));
        SheetSolution jacobi = solve(grid, new SheetSolver(SheetSolver.Method.JACOBI, 1e-12, 10_000));
        double scale = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    scale = Math.max(scale, Math.abs(multigrid.potentialV(i, j)));
                }
            }
        }
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    assertEquals(multigrid.potentialV(i, j), jacobi.potentialV(i, j), 1e-9 * scale,
                            "cell " + i + ", " + j);
                }
            }
        }
        System.out.printf("64 cells: multigrid %d iterations, Jacobi %d%n", multigrid.iterations(),
                jacobi.iterations());
        assertTrue(multigrid.iterations() < 20, "multigrid iterations " + multigrid.iterations());
    }

    @Test
    void anExhaustedBudgetThrowsWithTheResidualReached() {
        SheetGrid grid = SheetGrid.withCells(PLATE, 48);
        SheetConvergenceException e = assertThrows(SheetConvergenceException.class,
                () -> solve(grid, new SheetSolver(SheetSolver.Method.JACOBI, 1e-10, 3)));
        assertTrue(e.getMessage().startsWith("Jacobi-preconditioned CG did not reach relative residual 1.0E-10 within 3"
                + " iterations"), e.getMessage());
        assertTrue(e.reachedResidual() > 1e-10, "reached " + e.reachedResidual());
    }

    @Test
    void electrodesMustLieOnTheEdgeAndHaveDistinctNames() {
        SheetGrid grid = SheetGrid.withCells(PLATE, 32);
        SheetSolver solver = SheetSolver.multigrid();
        SheetConductor plate = SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M);
        IllegalArgumentException off = assertThrows(IllegalArgumentException.class, () -> solver.solve(grid, plate,
                DRIVE, Vec2.ZERO, List.of(new Electrode("inside", new Vec2(0.01, 0.01)))));
        assertTrue(off.getMessage().contains("electrodes must lie on the edge"), off.getMessage());
        Vec2 onHole = HOLE.get(0).plus(HOLE.get(1)).times(0.5);
        IllegalArgumentException twice = assertThrows(IllegalArgumentException.class, () -> solver.solve(grid, plate,
                DRIVE, Vec2.ZERO, List.of(new Electrode("e", onHole), new Electrode("e", OUTLINE.get(3)))));
        assertTrue(twice.getMessage().contains("two electrodes are named 'e'"), twice.getMessage());
        SheetSolution solution = solver.solve(grid, plate, DRIVE, Vec2.ZERO,
                List.of(new Electrode("hole", onHole), new Electrode("corner", OUTLINE.get(3))));
        assertEquals(List.of("hole", "corner"), List.copyOf(solution.electrodePotentialsV().keySet()));
    }

    @Test
    void magneticReynoldsNumberTakesTheConductorsLength() {
        SheetGrid grid = SheetGrid.withCells(PLATE, 32);
        double speed = 3;
        SheetSolution plate = SheetSolver.multigrid().solve(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M),
                SheetDrive.rigid((x, y) -> 0.1, new Vec2(0, -speed), 0, Vec2.ZERO), Vec2.ZERO, List.of());
        // Rm = μ0·σ·d·v for a plate (the thickness sets the sheet's own-field ratio).
        assertEquals(PhysicalConstants.MU_0 * SIGMA_S_PER_M * THICKNESS_M * speed, plate.magneticReynolds(),
                1e-15 * plate.magneticReynolds());
        ChannelFlow channel = new ChannelFlow(Vec2.ZERO, new Vec2(0.1, 0), 0.02, 0.5, ChannelFlow.Profile.PLUG);
        SheetSolution liquid = SheetSolver.multigrid().solve(SheetGrid.withCellSize(channel.shape(), 0.002),
                SheetConductor.liquid(1e6, 0.01, 0.02), channel.drive((x, y) -> 0.1), Vec2.ZERO, List.of());
        // μ0·σ·w·v̄ for a liquid in a channel of width w.
        assertEquals(PhysicalConstants.MU_0 * 1e6 * 0.02 * 0.5, liquid.magneticReynolds(), 1e-15);
    }

    @Test
    void risingUniformFieldHeatsADiscAsTheEddyLossFormulaSays() {
        // A still disc of radius a in a uniform field rising at dB/dt: −∂A/∂t = (Ḃ/2)(y, −x), whose
        // circulation round a circle of radius r is −Ḃπr² (Faraday's law). It is divergence-free and
        // tangent to the rim, so J = σ·E and P = σd∫|E|² dA = π·σ·d·Ḃ²·a⁴/8 (standard eddy-current
        // loss of a thin disc; from memory). The 1024-gon's rim differs from the circle's by 2e-5.
        double radius = 0.05;
        double rate = 40;
        SheetShape disc = SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, radius, 1024));
        SheetDrive rising = new SheetDrive() {
            @Override
            public double bzT(double x, double y) {
                return 0.2;
            }

            @Override
            public void velocity(double x, double y, double[] out) {
                out[0] = 0;
                out[1] = 0;
            }

            @Override
            public void inducedField(double x, double y, double[] out) {
                out[0] = 0.5 * rate * y;
                out[1] = -0.5 * rate * x;
            }
        };
        double expected = Math.PI * SIGMA_S_PER_M * THICKNESS_M * rate * rate * Math.pow(radius, 4) / 8;
        System.out.println("rising field in a disc:  a/h   P/P_formula");
        double previous = Double.NaN;
        for (int cells : new int[] {32, 64, 128, 256}) {
            SheetSolution solution = SheetSolver.multigrid().solve(SheetGrid.withCells(disc, cells),
                    SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M), rising, Vec2.ZERO, List.of());
            double ratio = solution.joulePowerW() / expected;
            System.out.printf("                         %3d   %.6f%n", cells / 2, ratio);
            assertEquals(0, solution.forceN().length(), 1e-9 * expected / rate, "no net force from a uniform field");
            if (!Double.isNaN(previous)) {
                assertTrue(Math.abs(ratio - 1) < Math.abs(previous - 1) / 3,
                        "error falls about fourfold, a/h = " + cells / 2);
            }
            previous = ratio;
        }
        // Measured 5e-6: the last grid's ~1.5e-5 (a quarter of the previous error) less the
        // polygon's smaller ∫r² dA (about 1.3e-5).
        assertEquals(1, previous, 3e-5, "a/h = 128");
    }
}
