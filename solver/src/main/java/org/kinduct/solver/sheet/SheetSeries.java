package org.kinduct.solver.sheet;

import java.util.List;
import org.kinduct.scene.Vec2;

/**
 * One sheet solved at many instants ({@link SheetSolver#series}): the grid's operator, its
 * preconditioner and the electrodes' host cells are built once, and each solve starts from the
 * potentials of the one before. Between nearby instants of a run those differ by little, so the
 * solve takes fewer iterations; it stops at the same relative residual either way. Mutable, for
 * one thread.
 */
public final class SheetSeries {

    private final SheetSolver solver;
    private final SheetGrid grid;
    private final List<Electrode> electrodes;
    private final int[] hosts;
    private final CellOperator operator;
    private final ConjugateGradient.Preconditioner preconditioner;
    /** The last solution's unknowns, the next solve's start. */
    private final double[] last;

    SheetSeries(SheetSolver solver, SheetGrid grid, List<Electrode> electrodes) {
        this.solver = solver;
        this.grid = grid;
        this.electrodes = List.copyOf(electrodes);
        hosts = SheetSolver.hostCells(grid, this.electrodes);
        operator = CellOperator.of(grid);
        preconditioner = solver.preconditioner(operator);
        last = new double[operator.size()];
    }

    /** Solves the sheet under {@code drive}, torques about {@code pivotM}; see {@link SheetSolver#solve}. */
    public SheetSolution solve(SheetConductor conductor, SheetDrive drive, Vec2 pivotM) {
        return solver.solve(grid, operator, preconditioner, hosts, electrodes, last, conductor, drive, pivotM);
    }
}
