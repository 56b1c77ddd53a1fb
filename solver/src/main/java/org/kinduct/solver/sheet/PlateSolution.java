package org.kinduct.solver.sheet;

import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/**
 * A plate's eddy currents at one instant, with the plate's own field; immutable once made. ψ and
 * the plate's B_z live on the grid's nodes (x0 + i·h, y0 + j·h), 0 ≤ i ≤ nx, 0 ≤ j ≤ ny. Forces
 * and torques are in the coordinates of the grid (the plate's drawing for a transient run).
 */
public final class PlateSolution {

    private final Plate plate;
    private final double[] unknowns;
    private final double[] psiA;
    private final double[] plateFieldT;
    private final Vec2 forceN;
    private final double torqueNm;
    private final Vec2 pivotM;
    private final double joulePowerW;
    private final double mechanicalPowerW;
    private final EddyModel model;
    private final double speedRatio;
    private final int iterations;
    private final double relativeResidual;

    PlateSolution(Plate plate, double[] unknowns, double[] psiA, double[] plateFieldT, Vec2 forceN, double torqueNm,
                  Vec2 pivotM, double joulePowerW, double mechanicalPowerW, EddyModel model, double speedRatio,
                  int iterations, double relativeResidual) {
        this.plate = plate;
        this.unknowns = unknowns.clone();
        this.psiA = psiA;
        this.plateFieldT = plateFieldT;
        this.forceN = forceN;
        this.torqueNm = torqueNm;
        this.pivotM = pivotM;
        this.joulePowerW = joulePowerW;
        this.mechanicalPowerW = mechanicalPowerW;
        this.model = model;
        this.speedRatio = speedRatio;
        this.iterations = iterations;
        this.relativeResidual = relativeResidual;
    }

    Plate plate() {
        return plate;
    }

    double[] unknowns() {
        return unknowns;
    }

    public SheetGrid grid() {
        return plate.grid();
    }

    /** Which physics made these currents. */
    public EddyModel model() {
        return model;
    }

    /**
     * v/w: the fastest material speed over the characteristic speed 2/(μ0σd) (half the magnetic
     * Reynolds number μ0σdv); NaN for a transient state.
     */
    public double speedRatio() {
        return speedRatio;
    }

    /**
     * Stream function at node (i, j), amperes: K = ∇ψ × ẑ, so the current between two contours is
     * their difference; 0 on the outer edge, one value inside each hole. For drawing streamlines.
     */
    public double streamFunctionA(int i, int j) {
        return psiA[i + (grid().nx() + 1) * j];
    }

    /**
     * Stream function of the current density at node (i, j), A/m: ψ/d, so that J = ∇(ψ/d) × ẑ as
     * for {@link SheetSolution#streamFunctionAPerM}.
     */
    public double streamFunctionAPerM(int i, int j) {
        return streamFunctionA(i, j) / plate.conductor().thicknessM();
    }

    /**
     * Largest |J| over the cells that conduct, A/m², each cell's J as {@link SheetSolution} has it
     * ({@code Currents}): the current through its two x faces over their open length, and likewise
     * for y, per thickness.
     */
    public double peakCurrentDensityAPerM2() {
        SheetGrid g = grid();
        double peak = 0;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                if (!g.active(i, j)) {
                    continue;
                }
                double openX = g.apertureX(i, j) + g.apertureX(i + 1, j);
                double openY = g.apertureY(i, j) + g.apertureY(i, j + 1);
                double jx = openX > 0 ? (faceCurrentXA(i, j) + faceCurrentXA(i + 1, j)) / openX : 0;
                double jy = openY > 0 ? (faceCurrentYA(i, j) + faceCurrentYA(i, j + 1)) / openY : 0;
                peak = Math.max(peak, Math.hypot(jx, jy));
            }
        }
        return peak / (g.cellM() * plate.conductor().thicknessM());
    }

    /** Current through the x face (i, j) in +x, amperes (as {@link SheetSolution#faceCurrentXA}). */
    public double faceCurrentXA(int i, int j) {
        return streamFunctionA(i, j + 1) - streamFunctionA(i, j);
    }

    /** Current through the y face (i, j) in +y, amperes. */
    public double faceCurrentYA(int i, int j) {
        return streamFunctionA(i, j) - streamFunctionA(i + 1, j);
    }

    /**
     * The plate's own B_z at node (i, j), tesla: its mean weighted by the node's bilinear hat
     * (support 2h × 2h), which is what the solve uses. Defined on every node of the grid,
     * inside and outside the plate.
     */
    public double plateFieldT(int i, int j) {
        return plateFieldT[i + (grid().nx() + 1) * j];
    }

    /**
     * The plate's own B_z at any point, tesla. In the plate's plane (z = 0) within the grid:
     * bilinear interpolation of {@link #plateFieldT(int, int)} — second order where the field is
     * smooth on the scale of the cells, a hat-weighted mean near the edge where the field varies
     * within a cell. Elsewhere (z ≠ 0, or beyond the grid): the sum over nodes of the field of each
     * node's hat of ψ, as a dipole ψ·h² with its second-moment correction,
     * μ0ψh²/(4π)·[f + (h²/12)∇²_xy f], f = (2z² − ρ²)/(ρ² + z²)^{5/2} (the dipole's field, Griffiths
     * ch. 5, and the hat's variance h²/6 per axis): relative error per node about (h/r)⁴, so
     * trustworthy a few cells or more from the plate (a pickup loop beside it, a magnet above it).
     */
    public double plateFieldT(double xM, double yM, double zM) {
        SheetGrid g = grid();
        double h = g.cellM();
        double u = (xM - g.originXM()) / h;
        double v = (yM - g.originYM()) / h;
        int nx = g.nx();
        int ny = g.ny();
        if (zM == 0 && u >= 0 && v >= 0 && u <= nx && v <= ny) {
            int i = Math.min((int) u, nx - 1);
            int j = Math.min((int) v, ny - 1);
            double a = u - i;
            double b = v - j;
            return (1 - a) * (1 - b) * plateFieldT(i, j) + a * (1 - b) * plateFieldT(i + 1, j)
                    + (1 - a) * b * plateFieldT(i, j + 1) + a * b * plateFieldT(i + 1, j + 1);
        }
        double sum = 0;
        double z2 = zM * zM;
        double spread = h * h / 12;
        for (int j = 1; j < ny; j++) {
            double dy = yM - (g.originYM() + j * h);
            for (int i = 1; i < nx; i++) {
                double psi = psiA[i + (nx + 1) * j];
                if (psi == 0) {
                    continue;
                }
                double dx = xM - (g.originXM() + i * h);
                double s = dx * dx + dy * dy;
                double q = s + z2;
                double q25 = 1 / (q * q * Math.sqrt(q));
                double q35 = q25 / q;
                double q45 = q35 / q;
                double f = (2 * z2 - s) * q25;
                double d1 = -q25 - 2.5 * (2 * z2 - s) * q35;
                double d2 = 5 * q35 + 8.75 * (2 * z2 - s) * q45;
                sum += psi * (f + spread * 4 * (s * d2 + d1));
            }
        }
        return PhysicalConstants.MU_0_OVER_4PI * h * h * sum;
    }

    /** Force of the sources' field on the plate, newtons. */
    public Vec2 forceN() {
        return forceN;
    }

    /** z torque of the sources' field on the plate about {@link #pivotM()}, newton-metres. */
    public double torqueNm() {
        return torqueNm;
    }

    public Vec2 pivotM() {
        return pivotM;
    }

    /** Joule power Σ R_f·I_f² = d·∫|J|²/σ dA, watts. */
    public double joulePowerW() {
        return joulePowerW;
    }

    /**
     * Power the motion delivers against the sources' field in a steady state, Σ I_f·ε_f with ε_f the
     * filaments' motional EMF in the sources' field: −F·V − τ·ω for a rigid motion. NaN for a
     * transient state.
     */
    public double mechanicalPowerW() {
        return mechanicalPowerW;
    }

    /** Outer iterations of the solve. */
    public int iterations() {
        return iterations;
    }

    /** Relative residual reached. */
    public double relativeResidual() {
        return relativeResidual;
    }
}
