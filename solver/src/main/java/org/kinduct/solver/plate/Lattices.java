package org.kinduct.solver.plate;

import org.kinduct.solver.StreamLattice;
import org.kinduct.solver.sheet.SheetGrid;

/** A solution's stream function as the {@link StreamLattice} a state keeps. */
final class Lattices {

    /** A stream function of the current density on a grid's nodes, A/m. */
    interface NodeValues {
        double at(int i, int j);
    }

    private Lattices() {
    }

    /**
     * Every k-th node of the grid's nodes, k the least whole number that keeps the count within
     * {@link StreamLattice#MAX_NODES}: node values, not averages, so the lattice's contours are the
     * solution's at the nodes kept. Nodes past the grid's far sides take the side's value (ψ is
     * constant beyond the conductor).
     */
    static StreamLattice of(SheetGrid grid, NodeValues streamFunctionAPerM) {
        int nodesX = grid.nx() + 1;
        int nodesY = grid.ny() + 1;
        int k = (int) Math.ceil(Math.sqrt((double) nodesX * nodesY / StreamLattice.MAX_NODES));
        while (lattice(nodesX, k) * lattice(nodesY, k) > StreamLattice.MAX_NODES) {
            k++;
        }
        int nx = lattice(nodesX, k);
        int ny = lattice(nodesY, k);
        float[] psi = new float[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                psi[i + nx * j] = (float) streamFunctionAPerM.at(Math.min(i * k, grid.nx()),
                        Math.min(j * k, grid.ny()));
            }
        }
        return new StreamLattice(grid.originXM(), grid.originYM(), k * grid.cellM(), nx, ny, psi);
    }

    /** Nodes 0, k, 2k, … reaching the last node n − 1; at least 2. */
    private static int lattice(int nodes, int k) {
        return Math.max(2, (nodes - 1 + k - 1) / k + 1);
    }
}
