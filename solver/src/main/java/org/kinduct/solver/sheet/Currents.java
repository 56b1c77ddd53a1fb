package org.kinduct.solver.sheet;

/**
 * Face currents of a solved potential and everything summed from them. The discrete current is a
 * network of filaments, one per open face, running from cell centre to cell centre (length h)
 * with current I_f = σ·d·(a_f·h)·(φ_P − φ_nb + ε_f)/h = σ·d·a_f·(φ_P − φ_nb + ε_f), a_f the open
 * fraction of the face. Forces, torque and Joule power are sums over the same filaments with the
 * same B_z samples as the EMFs:
 * <ul>
 *   <li>force I·∫ dl × B = I·B_z·h·(d̂_y, −d̂_x) (Griffiths, <i>Introduction to Electrodynamics</i>,
 *       4th ed., 2013, §5.1.3), so d·∫ J × B dA with each face owning the area a_f·h;</li>
 *   <li>torque about p: (m − p) × that force, m the filament's midpoint;</li>
 *   <li>Joule power Σ I_f²/G_f with G_f = σ·d·a_f (resistor network), so d·∫ |J|²/σ dA.</li>
 * </ul>
 * Summation by parts makes these exactly consistent: Σ I_f·(φ_P − φ_nb) = Σ_P φ_P·(net current
 * out of P), which the solve makes zero to its tolerance, so P = Σ I_f·ε_f; and for rigid motion
 * with no −∂A/∂t, I_f·ε_f = −I_f·B_z·(v·n)·h equals −(F_f·V + τ_f·ω) filament by filament, v being
 * exact at the midpoint. Hence P = −F·V − τ·ω to the solver's tolerance, on any grid.
 */
final class Currents {

    /** Current through face (i, j) of the x family in +x, amperes. */
    final double[] faceX;
    /** Current through face (i, j) of the y family in +y, amperes. */
    final double[] faceY;
    /** Cell current density, A/m²: each component the open-length-weighted mean over the two faces across it. */
    final double[] jx;
    final double[] jy;
    final double joulePowerW;
    final double forceXN;
    final double forceYN;
    final double torqueNm;
    final double peakCurrentDensityAPerM2;

    Currents(SheetGrid grid, SheetConductor conductor, FaceEmfs emfs, double[] phi, double pivotX, double pivotY) {
        int nx = grid.nx();
        int ny = grid.ny();
        double h = grid.cellM();
        double sigma = conductor.sigmaSPerM();
        double sheet = sigma * conductor.thicknessM();
        faceX = new double[(nx + 1) * ny];
        faceY = new double[nx * (ny + 1)];
        double joule = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                double open = grid.apertureX(i, j);
                if (open > 0) {
                    int f = i + (nx + 1) * j;
                    double drop = phi[i - 1 + nx * j] - phi[i + nx * j] + emfs.emfX[f];
                    faceX[f] = sheet * open * drop;
                    joule += faceX[f] * drop;
                }
            }
        }
        for (int j = 1; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double open = grid.apertureY(i, j);
                if (open > 0) {
                    int f = i + nx * j;
                    double drop = phi[i + nx * (j - 1)] - phi[i + nx * j] + emfs.emfY[f];
                    faceY[f] = sheet * open * drop;
                    joule += faceY[f] * drop;
                }
            }
        }
        joulePowerW = joule;
        DriveShare sums = DriveShare.of(grid, faceX, faceY, emfs, pivotX, pivotY);
        forceXN = sums.forceXN();
        forceYN = sums.forceYN();
        torqueNm = sums.torqueNm();

        jx = new double[nx * ny];
        jy = new double[nx * ny];
        double peakSquared = 0;
        double perArea = 1 / (conductor.thicknessM() * h);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int c = i + nx * j;
                if (!grid.active(i, j)) {
                    continue;
                }
                double openX = grid.apertureX(i, j) + grid.apertureX(i + 1, j);
                double openY = grid.apertureY(i, j) + grid.apertureY(i, j + 1);
                jx[c] = openX > 0 ? (faceX[i + (nx + 1) * j] + faceX[i + 1 + (nx + 1) * j]) * perArea / openX : 0;
                jy[c] = openY > 0 ? (faceY[i + nx * j] + faceY[i + nx * (j + 1)]) * perArea / openY : 0;
                peakSquared = Math.max(peakSquared, jx[c] * jx[c] + jy[c] * jy[c]);
            }
        }
        peakCurrentDensityAPerM2 = Math.sqrt(peakSquared);
    }

    /**
     * Stream function on the grid's nodes, A/m (current per unit thickness), with J = ∇ψ × ẑ:
     * the current through a face is d times the difference of ψ across it. Summed up each column
     * of x faces from ψ = 0 on the grid's bottom edge (a row at a time, in memory order), so the x
     * faces hold exactly; the y faces, and ψ = 0 along the outline's top and one constant inside
     * each hole, hold to the solver's tolerance (each is a sum of the cells' current balances).
     */
    double[] streamFunction(SheetGrid grid, double thicknessM) {
        int nx = grid.nx();
        int ny = grid.ny();
        double[] psi = new double[(nx + 1) * (ny + 1)];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i <= nx; i++) {
                psi[i + (nx + 1) * (j + 1)] = psi[i + (nx + 1) * j] + faceX[i + (nx + 1) * j] / thicknessM;
            }
        }
        return psi;
    }
}
