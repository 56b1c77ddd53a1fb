package org.kinduct.solver.sheet;

import org.kinduct.scene.Vec2;

/**
 * The force, torque and power of a drive on given face currents, summed filament by filament as
 * {@link Currents} states: force I·∫ dl × B = I·B_z·h·(d̂_y, −d̂_x) on each filament from cell
 * centre to cell centre (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §5.1.3),
 * its torque about p taken at the filament's midpoint, and the power Σ I_f·ε_f the drive's EMFs
 * put into the currents. Summed with the whole drive it gives the sheet's force and torque; with
 * part of it (the sources of one body, the flow of a liquid) that part's share, at the same
 * sample points, so the shares add up to the whole.
 *
 * @param forceXN x force, newtons
 * @param forceYN y force, newtons
 * @param torqueNm z torque about the pivot, newton-metres
 * @param powerW Σ I_f·ε_f, watts
 */
public record DriveShare(double forceXN, double forceYN, double torqueNm, double powerW) {

    /** The force as a vector, newtons. */
    public Vec2 forceN() {
        return new Vec2(forceXN, forceYN);
    }

    static DriveShare of(SheetGrid grid, double[] faceX, double[] faceY, FaceEmfs emfs, double pivotX,
                           double pivotY) {
        int nx = grid.nx();
        int ny = grid.ny();
        double h = grid.cellM();
        double fx = 0;
        double fy = 0;
        double torque = 0;
        double power = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                int f = i + (nx + 1) * j;
                if (grid.apertureX(i, j) > 0) {
                    // Filament along +x: force (0, −I·B·h) at x = x_i.
                    double force = -faceX[f] * emfs.bzX[f] * h;
                    fy += force;
                    torque += (grid.originXM() + i * h - pivotX) * force;
                    power += faceX[f] * emfs.emfX[f];
                }
            }
        }
        for (int j = 1; j < ny; j++) {
            double arm = grid.originYM() + j * h - pivotY;
            for (int i = 0; i < nx; i++) {
                int f = i + nx * j;
                if (grid.apertureY(i, j) > 0) {
                    // Filament along +y: force (I·B·h, 0) at y = y_j.
                    double force = faceY[f] * emfs.bzY[f] * h;
                    fx += force;
                    torque -= arm * force;
                    power += faceY[f] * emfs.emfY[f];
                }
            }
        }
        return new DriveShare(fx, fy, torque, power);
    }
}
