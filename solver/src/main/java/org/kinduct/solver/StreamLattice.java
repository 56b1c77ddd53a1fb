package org.kinduct.solver;

/**
 * The eddy currents' stream function ψ of a plate or channel on a regular lattice in its body's
 * drawn frame, A/m: J·d = ∇ψ × ẑ·d, so its contours are the current's streamlines, the current
 * between two contours is d·Δψ, and |J| = |∇ψ|. ψ is 0 on the outer edge and constant in each hole
 * and beyond the conductor.
 *
 * <p>Kept for drawing only, in floats and coarsened to at most {@value #MAX_NODES} nodes: a run
 * stores one per sheet per sample (the editor plays samples back), so 2000 samples of one plate
 * take at most 33 MB. Forces, powers, potentials and the peak |J| are taken from the full solution
 * before coarsening, so no reported number depends on the lattice. Immutable.
 */
public final class StreamLattice {

    /** Largest number of lattice nodes kept per sheet and sample. */
    public static final int MAX_NODES = 4096;

    private final double x0M;
    private final double y0M;
    private final double stepM;
    private final int nx;
    private final int ny;
    private final float[] psi;
    private final double largest;

    /**
     * @param psi node values, node (i, j) at {@code psi[i + nx·j]}, 0 ≤ i &lt; nx, 0 ≤ j &lt; ny (copied)
     */
    public StreamLattice(double x0M, double y0M, double stepM, int nx, int ny, float[] psi) {
        if (nx < 2 || ny < 2 || psi.length != nx * ny || !(stepM > 0)) {
            throw new IllegalArgumentException("a lattice needs at least 2 × 2 nodes, a positive step and one value"
                    + " per node; got " + nx + " × " + ny + " nodes, step " + stepM + " m, " + psi.length + " values");
        }
        this.x0M = x0M;
        this.y0M = y0M;
        this.stepM = stepM;
        this.nx = nx;
        this.ny = ny;
        this.psi = psi.clone();
        double max = 0;
        for (float v : psi) {
            max = Math.max(max, Math.abs(v));
        }
        largest = max;
    }

    /** x of node column 0 in the drawn frame, metres. */
    public double x0M() {
        return x0M;
    }

    public double y0M() {
        return y0M;
    }

    /** Distance between neighbouring nodes, metres. */
    public double stepM() {
        return stepM;
    }

    /** Nodes along x. */
    public int nx() {
        return nx;
    }

    public int ny() {
        return ny;
    }

    /** ψ at node (i, j), A/m. */
    public double psiAPerM(int i, int j) {
        return psi[i + nx * j];
    }

    /** Largest |ψ| on the lattice, A/m. */
    public double largestAPerM() {
        return largest;
    }
}
