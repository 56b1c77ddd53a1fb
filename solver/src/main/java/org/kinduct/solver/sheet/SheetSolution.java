package org.kinduct.solver.sheet;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.kinduct.scene.Vec2;

/**
 * A solved sheet at one instant; immutable. Potentials are cell values with zero area-weighted
 * mean (the problem fixes φ only up to a constant); current densities are cell values; the stream
 * function is on the grid's nodes; forces and powers are totals over the sheet. See
 * {@link SheetSolver} for the physics; the totals are summed over the same face filaments as the
 * EMFs, so that Joule power and mechanical power balance exactly for rigid motion.
 */
public final class SheetSolution {

    private final SheetGrid grid;
    private final double[] potentialV;
    private final Currents currents;
    private final double thicknessM;
    /** Made on first use: only drawn samples need it, not a coupled run's every solve. */
    private volatile double[] streamFunctionAPerM;
    private final Vec2 pivotM;
    private final Map<String, Double> electrodePotentialsV;
    private final double magneticReynolds;
    private final int iterations;
    private final double relativeResidual;

    SheetSolution(SheetGrid grid, double[] potentialV, Currents currents, double thicknessM, Vec2 pivotM,
                  Map<String, Double> electrodePotentialsV, double magneticReynolds, int iterations,
                  double relativeResidual) {
        this.grid = grid;
        this.potentialV = potentialV;
        this.currents = currents;
        this.thicknessM = thicknessM;
        this.pivotM = pivotM;
        this.electrodePotentialsV = Collections.unmodifiableMap(new LinkedHashMap<>(electrodePotentialsV));
        this.magneticReynolds = magneticReynolds;
        this.iterations = iterations;
        this.relativeResidual = relativeResidual;
    }

    public SheetGrid grid() {
        return grid;
    }

    /** Potential of cell (i, j), volts; NaN for a cell that carries no unknown. */
    public double potentialV(int i, int j) {
        return potentialV[i + grid.nx() * j];
    }

    /** x component of the current density in cell (i, j), A/m²; 0 outside the sheet. */
    public double currentDensityXAPerM2(int i, int j) {
        return currents.jx[i + grid.nx() * j];
    }

    /** y component of the current density in cell (i, j), A/m²; 0 outside the sheet. */
    public double currentDensityYAPerM2(int i, int j) {
        return currents.jy[i + grid.nx() * j];
    }

    /** Current through the face x = x0 + i·h of row j in +x, amperes (see {@link SheetGrid#apertureX}). */
    public double faceCurrentXA(int i, int j) {
        return currents.faceX[i + (grid.nx() + 1) * j];
    }

    /** Current through the face y = y0 + j·h of column i in +y, amperes. */
    public double faceCurrentYA(int i, int j) {
        return currents.faceY[i + grid.nx() * j];
    }

    /**
     * Stream function at node (x0 + i·h, y0 + j·h), 0 ≤ i ≤ nx, 0 ≤ j ≤ ny, A/m: J = ∇ψ × ẑ, so its
     * contours are the eddy currents' streamlines and the current between two of them is d·Δψ.
     * Zero on the outer edge, one constant inside each hole.
     */
    public double streamFunctionAPerM(int i, int j) {
        double[] psi = streamFunctionAPerM;
        if (psi == null) {
            // Two threads may both compute it; they get the same values.
            psi = currents.streamFunction(grid, thicknessM);
            streamFunctionAPerM = psi;
        }
        return psi[i + (grid.nx() + 1) * j];
    }

    /** Largest cell current density magnitude, A/m². */
    public double peakCurrentDensityAPerM2() {
        return currents.peakCurrentDensityAPerM2;
    }

    /** Force of the field on the sheet, d·∫ J × B dA, newtons. */
    public Vec2 forceN() {
        return new Vec2(currents.forceXN, currents.forceYN);
    }

    /** z torque of the field on the sheet about {@link #pivotM()}, newton-metres. */
    public double torqueNm() {
        return currents.torqueNm;
    }

    public Vec2 pivotM() {
        return pivotM;
    }

    /**
     * The force, torque about {@link #pivotM()} and power of part of the drive on these currents
     * (the sources of one body, say), summed over the same filaments at the same sample points as
     * the totals, so that the parts of a drive add up to them.
     */
    public DriveShare shareOf(SheetDrive part) {
        return DriveShare.of(grid, currents.faceX, currents.faceY, FaceEmfs.sample(grid, part), pivotM.x(),
                pivotM.y());
    }

    /** Joule power d·∫ |J|²/σ dA, watts. */
    public double joulePowerW() {
        return currents.joulePowerW;
    }

    /** Potential at each electrode by name, in the order given, volts, on the same zero as the cell potentials. */
    public Map<String, Double> electrodePotentialsV() {
        return electrodePotentialsV;
    }

    /** Potential at the named electrode, volts. */
    public double electrodePotentialV(String name) {
        Double value = electrodePotentialsV.get(name);
        if (value == null) {
            throw new IllegalArgumentException("no electrode named '" + name + "'; have "
                    + electrodePotentialsV.keySet());
        }
        return value;
    }

    /**
     * Magnetic Reynolds number μ0·σ·L·v with the conductor's Reynolds length and the fastest speed
     * at a cell centre: the size of the neglected self-field relative to the applied one. The
     * result is trustworthy for Rm ≪ 1; callers warn above 0.1.
     */
    public double magneticReynolds() {
        return magneticReynolds;
    }

    /** Iterations the linear solver took. */
    public int iterations() {
        return iterations;
    }

    /** ‖b − A·φ‖₂/‖b‖₂ reached. */
    public double relativeResidual() {
        return relativeResidual;
    }
}
