package org.kinduct.solver.sheet;

import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;
import org.kinduct.solver.field.WorkTally;

/**
 * Eddy currents in a thin conductor at one instant, in the resistive limit.
 *
 * <p>Physics. In a sheet of thickness d and conductivity σ moving with velocity v(x, y) through a
 * field whose normal component is B_z, Ohm's law in the moving material gives the in-plane current
 * density J = σ(−∇φ + v × B − ∂A/∂t), with (v × B) = (v_y·B_z, −v_x·B_z) for in-plane v (Griffiths,
 * <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1.1 and §7.1.3). Charge conservation in
 * the steady state, ∇·J = 0, with J·n = 0 on the outline and around holes (insulating edges;
 * electrodes draw no current), fixes φ up to a constant. The currents' own field is neglected
 * (resistive or low-magnetic-Reynolds limit, valid for Rm = μ0·σ·d·v ≪ 1 in a plate and
 * μ0·σ·v·L ≪ 1 in a liquid of width L; Davidson, <i>An Introduction to Magnetohydrodynamics</i>,
 * Cambridge, 2001, §4.1; Reitz, J. Appl. Phys. 41, 2067, 1970, for a sheet's characteristic speed
 * 2/(μ0·σ·d)); {@link SheetSolution#magneticReynolds()} reports Rm. −∂A/∂t comes from the caller.
 * The force on the sheet is d·∫ J × B dA = d·∫ (J_y·B_z, −J_x·B_z) dA, the Joule power
 * d·∫ |J|²/σ dA; for rigid motion without −∂A/∂t the two balance, P = −F·V − τ·ω.
 *
 * <p>Discretization: cell-centred finite volumes on the cut-cell grid of {@link SheetGrid}. The
 * current through each open face is σ·d·ℓ_f·(φ_P − φ_nb + ε_f)/h with ℓ_f its open length and
 * ε_f the EMF from one cell centre to the next (<code>FaceEmfs</code>: B_z, v and −∂A/∂t taken at
 * the segment's midpoint); zero through the edge. Current balance in every cell gives the
 * symmetric singular system A·φ = b of <code>CellOperator</code>; b sums to zero by construction
 * (each face enters two cells with opposite signs) and is projected onto zero sum against
 * rounding; φ is shifted to zero area-weighted mean. Second-order accurate where B_z and v are
 * smooth, away from corners of the edge; first order near jumps of B_z (a field patch's rim). Cut
 * faces use the two-point difference across the full face: an O(h) error in the flux of the band
 * of cells along the edge (the current density there converges at first order), whose effect on
 * the potential is O(h²) (see the convergence tests).
 *
 * <p>Linear solver: conjugate gradients preconditioned by one multigrid V-cycle (<code>Multigrid</code>,
 * work proportional to the number of cells), or by the diagonal (Jacobi, the baseline, iterations
 * growing like the number of cells along a side). Either stops at ‖b − A·φ‖₂ ≤ tolerance·‖b‖₂ or
 * throws {@link SheetConvergenceException} when the budget is spent.
 *
 * @param method the preconditioner
 * @param relativeTolerance target ‖b − A·φ‖₂/‖b‖₂, in (0, 1)
 * @param maxIterations iteration budget, at least 1
 */
public record SheetSolver(Method method, double relativeTolerance, int maxIterations) {

    /** Relative residual of {@link #multigrid()} and {@link #jacobi()}. */
    public static final double DEFAULT_TOLERANCE = 1e-10;

    /** How the conjugate gradients are preconditioned. */
    public enum Method {
        /** One symmetric multigrid V-cycle per iteration. */
        MULTIGRID("multigrid-preconditioned CG"),
        /** Diagonal scaling. */
        JACOBI("Jacobi-preconditioned CG");

        private final String label;

        Method(String label) {
            this.label = label;
        }
    }

    /** An electrode must lie within this fraction of a cell of the edge. */
    static final double ELECTRODE_EDGE_TOLERANCE = 1e-6;
    /** The electrode's host cell conducts at least this fraction of its area when any nearby one does. */
    private static final double HOST_FRACTION = 0.5;

    public SheetSolver {
        if (method == null) {
            throw new IllegalArgumentException("a solver method is required");
        }
        if (!(relativeTolerance > 0 && relativeTolerance < 1)) {
            throw new IllegalArgumentException("relative tolerance must lie in (0, 1), got " + relativeTolerance);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration budget must be at least 1, got " + maxIterations);
        }
    }

    /** Multigrid-preconditioned CG to {@value #DEFAULT_TOLERANCE} within 100 iterations (it takes about 8). */
    public static SheetSolver multigrid() {
        return new SheetSolver(Method.MULTIGRID, DEFAULT_TOLERANCE, 100);
    }

    /** Jacobi-preconditioned CG to {@value #DEFAULT_TOLERANCE}, with a budget for grids up to ~4000 cells a side. */
    public static SheetSolver jacobi() {
        return new SheetSolver(Method.JACOBI, DEFAULT_TOLERANCE, 200_000);
    }

    /**
     * Solves the sheet.
     *
     * @param grid the cut-cell grid of the conductor
     * @param conductor its material
     * @param drive the field, motion and induced field at this instant
     * @param pivotM the point torques are taken about
     * @param electrodes points on the edge whose potentials are wanted
     */
    public SheetSolution solve(SheetGrid grid, SheetConductor conductor, SheetDrive drive, Vec2 pivotM,
                               List<Electrode> electrodes) {
        return series(grid, electrodes).solve(conductor, drive, pivotM);
    }

    /**
     * A solver for many instants of one sheet (a coupled run): the operator, its preconditioner
     * and the electrodes' host cells are built once, and each solve starts from the last one's
     * potentials. Not thread-safe.
     */
    public SheetSeries series(SheetGrid grid, List<Electrode> electrodes) {
        return new SheetSeries(this, grid, electrodes);
    }

    /** The preconditioner of this solver's method for {@code a}. */
    ConjugateGradient.Preconditioner preconditioner(CellOperator a) {
        return method == Method.MULTIGRID ? new Multigrid(a) : ConjugateGradient.jacobi(a);
    }

    /**
     * Solves the sheet with the operator, preconditioner and host cells of {@code grid} already
     * built, starting from {@code x} (overwritten with the solution).
     */
    SheetSolution solve(SheetGrid grid, CellOperator a, ConjugateGradient.Preconditioner preconditioner, int[] hosts,
                        List<Electrode> electrodes, double[] x, SheetConductor conductor, SheetDrive drive,
                        Vec2 pivotM) {
        FaceEmfs emfs = FaceEmfs.sample(grid, drive);
        // Besides the solve's iterations (counted there), a handful of passes over every cell of
        // the grid, its empty cells too: on a thin shape in a large box they outweigh the solve.
        WorkTally.add(Math.max(1, grid.nx() * grid.ny() / ConjugateGradient.CELLS_PER_EVALUATION));
        double[] b = rightHandSide(grid, a, emfs);
        ConjugateGradient.Outcome outcome = ConjugateGradient.solveFrom(a, b, x, preconditioner, relativeTolerance,
                maxIterations, method.label);
        double[] phi = potentials(grid, a, x);
        Currents currents = new Currents(grid, conductor, emfs, phi, pivotM.x(), pivotM.y());
        Map<String, Double> potentials = new LinkedHashMap<>();
        for (int e = 0; e < electrodes.size(); e++) {
            potentials.put(electrodes.get(e).name(),
                    electrodePotential(grid, conductor, drive, phi, currents, hosts[e], electrodes.get(e).pointM()));
        }
        return new SheetSolution(grid, phi, currents, conductor.thicknessM(), pivotM,
                potentials, reynolds(grid, conductor, drive), outcome.iterations(), outcome.relativeResidual());
    }

    /**
     * b_P = −Σ_f g_f·ε_{P→nb}, the EMFs' drive on each cell's balance Σ_f g_f·(φ_P − φ_nb) = b_P,
     * projected onto zero sum over the cells.
     */
    private static double[] rightHandSide(SheetGrid grid, CellOperator a, FaceEmfs emfs) {
        int nx = grid.nx();
        double[] b = new double[a.size()];
        double sum = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < nx; i++) {
                int k = a.index(i, j);
                if (a.diagonal[k] > 0) {
                    b[k] = grid.apertureX(i, j) * emfs.emfX[i + (nx + 1) * j]
                            - grid.apertureX(i + 1, j) * emfs.emfX[i + 1 + (nx + 1) * j]
                            + grid.apertureY(i, j) * emfs.emfY[i + nx * j]
                            - grid.apertureY(i, j + 1) * emfs.emfY[i + nx * (j + 1)];
                    sum += b[k];
                }
            }
        }
        double mean = sum / a.activeCount();
        for (int k = 0; k < b.length; k++) {
            if (a.diagonal[k] > 0) {
                b[k] -= mean;
            }
        }
        return b;
    }

    /** Cell potentials in grid order with zero area-weighted mean, NaN where there is no unknown. */
    private static double[] potentials(SheetGrid grid, CellOperator a, double[] x) {
        int nx = grid.nx();
        double weighted = 0;
        double area = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < nx; i++) {
                weighted += grid.areaFraction(i, j) * x[a.index(i, j)];
                area += grid.areaFraction(i, j);
            }
        }
        double mean = weighted / area;
        double[] phi = new double[nx * grid.ny()];
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < nx; i++) {
                phi[i + nx * j] = grid.active(i, j) ? x[a.index(i, j)] - mean : Double.NaN;
            }
        }
        return phi;
    }

    /**
     * For each electrode, the cell its potential is carried from: among the conducting cells within
     * two cells of it, the one with the nearest centre that conducts at least half its area, or
     * failing that the fullest.
     */
    static int[] hostCells(SheetGrid grid, List<Electrode> electrodes) {
        int[] hosts = new int[electrodes.size()];
        Set<String> names = new HashSet<>();
        for (int e = 0; e < electrodes.size(); e++) {
            Electrode electrode = electrodes.get(e);
            if (!names.add(electrode.name())) {
                throw new IllegalArgumentException("two electrodes are named '" + electrode.name() + "'");
            }
            Vec2 p = electrode.pointM();
            double off = p.minus(grid.nearestEdgePoint(p)).length();
            if (off > ELECTRODE_EDGE_TOLERANCE * grid.cellM()) {
                throw new IllegalArgumentException("electrode '" + electrode.name() + "' at " + p + " is " + off
                        + " m from the sheet's edge; electrodes must lie on the edge");
            }
            double h = grid.cellM();
            int ci = (int) Math.floor((p.x() - grid.originXM()) / h);
            int cj = (int) Math.floor((p.y() - grid.originYM()) / h);
            int best = -1;
            double bestDistance = Double.POSITIVE_INFINITY;
            int fullest = -1;
            double fullestFraction = 0;
            for (int j = Math.max(0, cj - 2); j <= Math.min(grid.ny() - 1, cj + 2); j++) {
                for (int i = Math.max(0, ci - 2); i <= Math.min(grid.nx() - 1, ci + 2); i++) {
                    double fraction = grid.areaFraction(i, j);
                    if (fraction > fullestFraction) {
                        fullest = i + grid.nx() * j;
                        fullestFraction = fraction;
                    }
                    double distance = Math.hypot(grid.centreXM(i) - p.x(), grid.centreYM(j) - p.y());
                    if (fraction >= HOST_FRACTION && distance < bestDistance) {
                        best = i + grid.nx() * j;
                        bestDistance = distance;
                    }
                }
            }
            if (fullest < 0) {
                throw new IllegalArgumentException("electrode '" + electrode.name() + "' at " + p
                        + " has no conducting cell within two cells; use smaller cells");
            }
            hosts[e] = best >= 0 ? best : fullest;
        }
        return hosts;
    }

    /**
     * φ at an edge point e from its host cell P: φ(e) = φ_P + ∫_P^e ∇φ·dl with ∇φ = (v × B − ∂A/∂t)
     * − J/σ, the EMF part exactly as for a face (<code>FaceEmfs.emf</code>) and J taken as the host
     * cell's: second order, as |e − c_P| = O(h) and J is first-order accurate in a cut cell.
     */
    private static double electrodePotential(SheetGrid grid, SheetConductor conductor, SheetDrive drive,
                                             double[] phi, Currents currents, int host, Vec2 e) {
        int i = host % grid.nx();
        int j = host / grid.nx();
        double cx = grid.centreXM(i);
        double cy = grid.centreYM(j);
        double[] sample = new double[2];
        FaceEmfs.emf(drive, cx, cy, e.x(), e.y(), new double[2], sample);
        double ohmic = (currents.jx[host] * (e.x() - cx) + currents.jy[host] * (e.y() - cy)) / conductor.sigmaSPerM();
        return phi[host] + sample[0] - ohmic;
    }

    /**
     * The magnetic Reynolds number of a sheet under a drive: μ0·σ·L·(fastest speed at a conducting
     * cell's centre), L the thickness of a plate or the width of a channel.
     */
    public static double reynolds(SheetGrid grid, SheetConductor conductor, SheetDrive drive) {
        double[] v = new double[2];
        double fastestSquared = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    drive.velocity(grid.centreXM(i), grid.centreYM(j), v);
                    fastestSquared = Math.max(fastestSquared, v[0] * v[0] + v[1] * v[1]);
                }
            }
        }
        return PhysicalConstants.MU_0 * conductor.sigmaSPerM() * conductor.reynoldsLengthM() * Math.sqrt(fastestSquared);
    }
}
