package org.kinduct.solver.sheet;

import java.util.Arrays;

/**
 * The eddy-current network of a {@link SheetGrid} seen from its meshes: a stream function ψ on the
 * grid's nodes (amperes), each node the mesh of the four filaments joining the centres of the
 * cells around it, so that the current through a face is the difference of ψ at its two nodes.
 * A closed face carries no current, so the nodes at its ends share ψ: nodes joined through closed
 * faces form one group. The group holding the grid's border is the outside (ψ = 0); every other
 * group of more than one node is a hole (one unknown); the rest are free nodes.
 *
 * <p>Orientation: an x face (i, j) (at x = x0 + i·h between nodes (i, j) and (i, j + 1)) carries
 * I = ψ(i, j + 1) − ψ(i, j) in +x; a y face (i, j) (between nodes (i, j) and (i + 1, j)) carries
 * I = ψ(i, j) − ψ(i + 1, j) in +y; the first node is the face's "plus" node. Kirchhoff's voltage
 * law counter-clockwise round each mesh n reads Σ_f s_nf·R_f·I_f = Σ_f s_nf·ε_f, s = ±1 as n is
 * the plus or minus node, R_f = 1/(σ·d·a_f) the filament's resistance (a_f the face's open
 * fraction) and ε_f the EMF along the filament. This is the planar dual of the cell-potential
 * network of {@link SheetSolver} (Kirchhoff's mesh analysis; e.g. Desoer &amp; Kuh, <i>Basic Circuit
 * Theory</i>, 1969, ch. 10), which {@link #solveResistive} uses as an exact inverse of R.
 */
final class PlateNetwork {

    final SheetGrid grid;
    final int nx;
    final int ny;
    /** Nodes along x, nx + 1. */
    final int nodesX;
    final int nodeCount;
    /** Unknown of each node, −1 outside. */
    final int[] unknownOfNode;
    /** Number of unknowns: free nodes and holes. */
    final int unknowns;
    /** Per unknown, its member nodes (one for a free node). */
    final int[][] members;
    /** Number of holes (unknowns with more than one node). */
    final int holes;

    /** Open faces: plus node, minus node, open fraction, and whether the face is of the x family. */
    final int faceCount;
    final int[] plus;
    final int[] minus;
    final double[] open;
    final boolean[] xFace;
    /** Index of the face in its family's array (see {@link SheetGrid#apertureX}). */
    final int[] familyIndex;

    private final CellOperator cells;
    private Multigrid multigrid;

    PlateNetwork(SheetGrid grid) {
        this.grid = grid;
        nx = grid.nx();
        ny = grid.ny();
        nodesX = nx + 1;
        nodeCount = nodesX * (ny + 1);
        int[] parent = new int[nodeCount];
        for (int n = 0; n < nodeCount; n++) {
            parent[n] = n;
        }
        int count = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i <= nx; i++) {
                if (grid.apertureX(i, j) > 0) {
                    count++;
                } else {
                    union(parent, node(i, j), node(i, j + 1));
                }
            }
        }
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (grid.apertureY(i, j) > 0) {
                    count++;
                } else {
                    union(parent, node(i, j), node(i + 1, j));
                }
            }
        }
        int outside = find(parent, 0);
        int[] unknownOfRoot = new int[nodeCount];
        Arrays.fill(unknownOfRoot, -1);
        unknownOfNode = new int[nodeCount];
        int next = 0;
        int[] size = new int[nodeCount];
        for (int n = 0; n < nodeCount; n++) {
            int root = find(parent, n);
            if (root == outside) {
                unknownOfNode[n] = -1;
                continue;
            }
            if (unknownOfRoot[root] < 0) {
                unknownOfRoot[root] = next++;
            }
            unknownOfNode[n] = unknownOfRoot[root];
            size[unknownOfNode[n]]++;
        }
        unknowns = next;
        members = new int[unknowns][];
        int holeCount = 0;
        for (int u = 0; u < unknowns; u++) {
            members[u] = new int[size[u]];
            if (size[u] > 1) {
                holeCount++;
            }
        }
        holes = holeCount;
        int[] filled = new int[unknowns];
        for (int n = 0; n < nodeCount; n++) {
            int u = unknownOfNode[n];
            if (u >= 0) {
                members[u][filled[u]++] = n;
            }
        }

        faceCount = count;
        plus = new int[count];
        minus = new int[count];
        open = new double[count];
        xFace = new boolean[count];
        familyIndex = new int[count];
        int f = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i <= nx; i++) {
                double a = grid.apertureX(i, j);
                if (a > 0) {
                    plus[f] = node(i, j + 1);
                    minus[f] = node(i, j);
                    open[f] = a;
                    xFace[f] = true;
                    familyIndex[f] = i + (nx + 1) * j;
                    f++;
                }
            }
        }
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i < nx; i++) {
                double a = grid.apertureY(i, j);
                if (a > 0) {
                    plus[f] = node(i, j);
                    minus[f] = node(i + 1, j);
                    open[f] = a;
                    xFace[f] = false;
                    familyIndex[f] = i + nx * j;
                    f++;
                }
            }
        }
        cells = CellOperator.of(grid);
    }

    int node(int i, int j) {
        return i + nodesX * j;
    }

    private static int find(int[] parent, int n) {
        while (parent[n] != n) {
            parent[n] = parent[parent[n]];
            n = parent[n];
        }
        return n;
    }

    private static void union(int[] parent, int a, int b) {
        int ra = find(parent, a);
        int rb = find(parent, b);
        if (ra != rb) {
            parent[Math.max(ra, rb)] = Math.min(ra, rb);
        }
    }

    /** ψ on every node from the unknowns (0 outside). */
    void expand(double[] u, double[] nodes) {
        for (int n = 0; n < nodeCount; n++) {
            int k = unknownOfNode[n];
            nodes[n] = k >= 0 ? u[k] : 0;
        }
    }

    /** Per unknown, the sum of a node quantity over its members (a mesh equation of a hole is the sum of its nodes'). */
    void gather(double[] nodes, double[] u) {
        Arrays.fill(u, 0);
        for (int n = 0; n < nodeCount; n++) {
            int k = unknownOfNode[n];
            if (k >= 0) {
                u[k] += nodes[n];
            }
        }
    }

    /** Face currents I_f = ψ(plus) − ψ(minus), amperes, from node values. */
    void faceCurrents(double[] psiNodes, double[] current) {
        for (int f = 0; f < faceCount; f++) {
            current[f] = psiNodes[plus[f]] - psiNodes[minus[f]];
        }
    }

    /**
     * y += scale·R·ψ per unknown, R with unit sheet conductance (R_f = 1/a_f): the resistive drops
     * Σ_f s_nf·I_f/a_f round each mesh.
     */
    void addResistive(double[] psiNodes, double scale, double[] y) {
        for (int f = 0; f < faceCount; f++) {
            double drop = scale * (psiNodes[plus[f]] - psiNodes[minus[f]]) / open[f];
            int p = unknownOfNode[plus[f]];
            int m = unknownOfNode[minus[f]];
            if (p >= 0) {
                y[p] += drop;
            }
            if (m >= 0) {
                y[m] -= drop;
            }
        }
    }

    /** y += scale·Σ_f s_nf·ε_f per unknown, for EMFs given per open face. */
    void addMeshEmfs(double[] faceEmf, double scale, double[] y) {
        for (int f = 0; f < faceCount; f++) {
            double e = scale * faceEmf[f];
            int p = unknownOfNode[plus[f]];
            int m = unknownOfNode[minus[f]];
            if (p >= 0) {
                y[p] += e;
            }
            if (m >= 0) {
                y[m] -= e;
            }
        }
    }

    /**
     * u = R⁻¹·r for unit sheet conductance: the mesh currents that the mesh EMFs r drive, by the
     * dual cell-potential problem. Face EMFs ε on the x faces only, summed up each column so that
     * their circulation round every mesh is r (a hole's r on one of its nodes: only the sum round
     * the hole matters, its inner faces being closed); the cell potentials from conjugate gradients
     * with the multigrid V-cycle of {@link SheetSolver}; the face currents summed up each column
     * give ψ. Exact up to the potential solve's tolerance.
     *
     * @return the conjugate-gradient iterations taken
     */
    int solveResistive(double[] r, double[] u, double tolerance, int maxIterations) {
        return resistive(r, u, tolerance, maxIterations);
    }

    private int resistive(double[] r, double[] u, double tolerance, int maxIterations) {
        if (multigrid == null) {
            multigrid = new Multigrid(cells);
            work = new Work(nodeCount, nx, ny, cells.size());
        }
        double[] nodeR = work.nodeR;
        java.util.Arrays.fill(nodeR, 0);
        for (int k = 0; k < unknowns; k++) {
            nodeR[members[k][0]] = r[k];
        }
        // ε_x(i, j) = −Σ_{j' ≤ j} r(i, j'), x faces indexed i + (nx + 1)·j.
        double[] emfX = work.emfX;
        for (int i = 0; i <= nx; i++) {
            double sum = 0;
            for (int j = 0; j < ny; j++) {
                sum -= nodeR[node(i, j)];
                emfX[i + (nx + 1) * j] = sum;
            }
        }
        double[] b = work.b;
        double total = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = cells.index(i, j);
                if (cells.diagonal[k] > 0) {
                    b[k] = grid.apertureX(i, j) * emfX[i + (nx + 1) * j]
                            - grid.apertureX(i + 1, j) * emfX[i + 1 + (nx + 1) * j];
                    total += b[k];
                }
            }
        }
        double mean = total / cells.activeCount();
        for (int k = 0; k < b.length; k++) {
            if (cells.diagonal[k] > 0) {
                b[k] -= mean;
            }
        }
        double[] phi = work.phi;
        int iterations;
        if (maxIterations == 0) {
            multigrid.apply(b, phi);
            iterations = 0;
        } else {
            iterations = ConjugateGradient.solve(cells, b, phi, multigrid, tolerance, maxIterations,
                    "multigrid-preconditioned CG (resistive part)").iterations();
        }
        double[] psi = work.psi;
        for (int i = 0; i <= nx; i++) {
            double value = 0;
            for (int j = 0; j < ny; j++) {
                double a = grid.apertureX(i, j);
                if (a > 0) {
                    value += a * (phi[cells.index(i - 1, j)] - phi[cells.index(i, j)] + emfX[i + (nx + 1) * j]);
                }
                psi[node(i, j + 1)] = value;
            }
        }
        for (int k = 0; k < unknowns; k++) {
            double sum = 0;
            for (int n : members[k]) {
                sum += psi[n];
            }
            u[k] = sum / members[k].length;
        }
        return iterations;
    }

    /** Link weight standing in for a closed face (a short) in the node operator of {@link #nodeResistive}. */
    static final double SHORT_WEIGHT = 1e4;

    private CellOperator nodes;
    private Multigrid nodeMultigrid;
    private double[] nodeB;
    private double[] nodeX;

    /**
     * u ≈ R⁻¹·r on the nodes directly: the mesh resistances as a five-point operator on the node
     * grid ({@link CellOperator} with nodes for cells), each closed face a link of weight
     * {@value #SHORT_WEIGHT}·(largest open weight) standing in for the short that ties a hole's or the
     * outside's nodes together (100 instead: 22 outer iterations at low speed instead of 13); the outside's nodes absorb the balance of r, and ψ is shifted so
     * that their mean is zero. An approximation of R⁻¹ (ψ outside is only nearly constant), solved by
     * multigrid-preconditioned CG to {@code tolerance}, or by one V-cycle when
     * {@code maxIterations} is 0: for preconditioning, where the exact dual solve of
     * {@link #solveResistive} would cost more.
     */
    void nodeResistive(double[] r, double[] u, double tolerance, int maxIterations) {
        if (nodes == null) {
            nodes = new CellOperator(nodesX, ny + 1);
            double strongest = 1;
            for (int f = 0; f < faceCount; f++) {
                strongest = Math.max(strongest, 1 / open[f]);
            }
            double shortWeight = SHORT_WEIGHT * strongest;
            for (int j = 0; j <= ny; j++) {
                for (int i = 0; i <= nx; i++) {
                    int k = nodes.index(i, j);
                    if (i < nx) {
                        double a = grid.apertureY(i, j);
                        nodes.east[k] = a > 0 ? 1 / a : shortWeight;
                    }
                    if (j < ny) {
                        double a = grid.apertureX(i, j);
                        nodes.north[k] = a > 0 ? 1 / a : shortWeight;
                    }
                }
            }
            nodes.completeDiagonal();
            nodeMultigrid = new Multigrid(nodes);
            nodeB = new double[nodes.size()];
            nodeX = new double[nodes.size()];
        }
        java.util.Arrays.fill(nodeB, 0);
        double balance = 0;
        int outside = 0;
        for (int k = 0; k < unknowns; k++) {
            double share = r[k] / members[k].length;
            for (int n : members[k]) {
                nodeB[nodes.index(n % nodesX, n / nodesX)] = share;
            }
            balance += r[k];
        }
        for (int n = 0; n < nodeCount; n++) {
            if (unknownOfNode[n] < 0) {
                outside++;
            }
        }
        for (int n = 0; n < nodeCount; n++) {
            if (unknownOfNode[n] < 0) {
                nodeB[nodes.index(n % nodesX, n / nodesX)] = -balance / outside;
            }
        }
        if (maxIterations == 0) {
            nodeMultigrid.apply(nodeB, nodeX);
        } else {
            ConjugateGradient.solve(nodes, nodeB, nodeX, nodeMultigrid, tolerance, maxIterations,
                    "multigrid-preconditioned CG (mesh resistances)");
        }
        double shift = 0;
        for (int n = 0; n < nodeCount; n++) {
            if (unknownOfNode[n] < 0) {
                shift += nodeX[nodes.index(n % nodesX, n / nodesX)];
            }
        }
        shift /= outside;
        for (int k = 0; k < unknowns; k++) {
            double sum = 0;
            for (int n : members[k]) {
                sum += nodeX[nodes.index(n % nodesX, n / nodesX)];
            }
            u[k] = sum / members[k].length - shift;
        }
    }

    /** Scratch arrays of the resistive solve, made on first use. */
    private Work work;

    private record Work(double[] nodeR, double[] emfX, double[] b, double[] phi, double[] psi) {
        Work(int nodes, int nx, int ny, int cellSize) {
            this(new double[nodes], new double[(nx + 1) * ny], new double[cellSize], new double[cellSize],
                    new double[nodes]);
        }
    }
}
