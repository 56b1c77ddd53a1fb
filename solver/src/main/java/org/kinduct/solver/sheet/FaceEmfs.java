package org.kinduct.solver.sheet;

/**
 * The drive sampled once per open face: along the segment from one cell centre to the next
 * (length h, crossing the face at its middle), the EMF ε = ∫ (v × B − ∂A/∂t)·dl and B_z at the
 * segment's midpoint (or its mean along the segment where the drive's field jumps, see
 * {@link SheetDrive#bzAlongT}). ε takes B_z and −∂A/∂t at the midpoint and the flow across the segment from
 * the drive (midpoint rule): second-order accurate where the fields are smooth, first order where
 * B_z jumps (a field patch's edge) or a corner makes the potential singular. Indices as in
 * {@link SheetGrid#apertureX} and {@link SheetGrid#apertureY}; closed faces hold zeros.
 */
final class FaceEmfs {

    /** EMF from cell (i − 1, j) to (i, j), volts. */
    final double[] emfX;
    /** B_z at the middle of face (i, j) of the x family, tesla. */
    final double[] bzX;
    /** EMF from cell (i, j − 1) to (i, j), volts. */
    final double[] emfY;
    final double[] bzY;

    private FaceEmfs(SheetGrid grid) {
        emfX = new double[(grid.nx() + 1) * grid.ny()];
        bzX = new double[emfX.length];
        emfY = new double[grid.nx() * (grid.ny() + 1)];
        bzY = new double[emfY.length];
    }

    static FaceEmfs sample(SheetGrid grid, SheetDrive drive) {
        FaceEmfs faces = new FaceEmfs(grid);
        int nx = grid.nx();
        int ny = grid.ny();
        double h = grid.cellM();
        double[] scratch = new double[2];
        double[] sample = new double[2];
        for (int j = 0; j < ny; j++) {
            double y = grid.centreYM(j);
            for (int i = 1; i < nx; i++) {
                if (grid.apertureX(i, j) > 0) {
                    int f = i + (nx + 1) * j;
                    double x = grid.originXM() + i * h;
                    emf(drive, x - 0.5 * h, y, x + 0.5 * h, y, scratch, sample);
                    faces.emfX[f] = sample[0];
                    faces.bzX[f] = sample[1];
                }
            }
        }
        for (int j = 1; j < ny; j++) {
            double y = grid.originYM() + j * h;
            for (int i = 0; i < nx; i++) {
                if (grid.apertureY(i, j) > 0) {
                    int f = i + nx * j;
                    double x = grid.centreXM(i);
                    emf(drive, x, y - 0.5 * h, x, y + 0.5 * h, scratch, sample);
                    faces.emfY[f] = sample[0];
                    faces.bzY[f] = sample[1];
                }
            }
        }
        return faces;
    }

    /**
     * EMF along the segment a → b (volts) to {@code out[0]} and B_z at its midpoint to {@code out[1]}:
     * −B_z·(flow across) + (−∂A/∂t)·(b − a), all at the midpoint.
     */
    static void emf(SheetDrive drive, double ax, double ay, double bx, double by, double[] scratch, double[] out) {
        double mx = 0.5 * (ax + bx);
        double my = 0.5 * (ay + by);
        double bz = drive.bzAlongT(ax, ay, bx, by);
        drive.inducedField(mx, my, scratch);
        out[0] = -bz * drive.flowAcrossM2PerS(ax, ay, bx, by) + scratch[0] * (bx - ax) + scratch[1] * (by - ay);
        out[1] = bz;
    }
}
