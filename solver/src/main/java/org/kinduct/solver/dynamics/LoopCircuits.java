package org.kinduct.solver.dynamics;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.CholeskyDecomposition;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.LoopResistance;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.circuit.LoopInductance;
import org.kinduct.solver.field.PlaneField;

/**
 * The scene's closed loops as circuits, numbered k = 0, 1, … in scene order: each placed by the
 * bodies its vertices ride, its series resistance where it is ({@link LoopResistance}), its
 * linkage with the sources, and the inductance matrix M of all of them ({@link LoopInductance}).
 * An entry M_kj whose two loops ride one and the same body never changes (rigid motion keeps
 * every distance), so it is computed once, as drawn; the others are computed where the loops are.
 */
final class LoopCircuits {

    /** Closed loop k: the loop, its index among the conductors, its wire radius, its one body (−1 if several). */
    record Circuit(Conductor.Loop loop, int conductor, double wireRadiusM, int rigidBody) {
    }

    private final SceneIndex index;
    private final List<Circuit> circuits = new ArrayList<>();
    /** M_kj where it is constant, henries; NaN where it changes with the poses. */
    private final double[][] constantM;
    private final boolean anyVariable;

    LoopCircuits(SceneIndex index) {
        this.index = index;
        Scene scene = index.scene();
        List<Conductor> conductors = scene.conductors();
        for (int c = 0; c < conductors.size(); c++) {
            if (conductors.get(c) instanceof Conductor.Loop loop && !loop.open()) {
                int first = index.vertexBody(c, 0);
                boolean rigid = true;
                for (int i = 1; i < index.vertexCount(c); i++) {
                    rigid &= index.vertexBody(c, i) == first;
                }
                circuits.add(new Circuit(loop, c, loop.wire().diameterM() / 2, rigid ? first : -1));
            }
        }
        int n = circuits.size();
        constantM = new double[n][n];
        boolean variable = false;
        Pose[] drawn = new Pose[index.bodyCount()];
        for (int b = 0; b < drawn.length; b++) {
            drawn[b] = Pose.rest(scene.bodies().get(b).pivot());
        }
        for (int k = 0; k < n; k++) {
            for (int j = k; j < n; j++) {
                int body = circuits.get(k).rigidBody();
                boolean fixed = body >= 0 && body == circuits.get(j).rigidBody();
                constantM[k][j] = fixed ? entry(k, j, drawn) : Double.NaN;
                constantM[j][k] = constantM[k][j];
                variable |= !fixed;
            }
        }
        anyVariable = variable;
    }

    int count() {
        return circuits.size();
    }

    Conductor.Loop loop(int k) {
        return circuits.get(k).loop();
    }

    /** Loop k's index among the scene's conductors. */
    int conductor(int k) {
        return circuits.get(k).conductor();
    }

    /** True when some entry of M changes as bodies move: loops on different bodies, or one that changes shape. */
    boolean anyVariable() {
        return anyVariable;
    }

    /** True when M_kj never changes. */
    boolean constant(int k, int j) {
        return !Double.isNaN(constantM[k][j]);
    }

    /** Loop k's vertices placed by {@code poses}: {xs, ys}, metres. */
    double[][] place(int k, Pose[] poses) {
        int c = circuits.get(k).conductor();
        int n = index.vertexCount(c);
        double[][] xy = new double[2][n];
        index.place(c, poses, xy[0], xy[1]);
        return xy;
    }

    /** Loop k's vertices placed by {@code poses}. */
    List<Vec2> placedVertices(int k, Pose[] poses) {
        int c = circuits.get(k).conductor();
        int n = index.vertexCount(c);
        List<Vec2> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(poses[index.vertexBody(c, i)].place(index.drawn(c, i)));
        }
        return out;
    }

    /** True when some vertex of loop k rides a body marked in {@code marked}. */
    boolean rides(int k, boolean[] marked) {
        int c = circuits.get(k).conductor();
        for (int i = 0; i < index.vertexCount(c); i++) {
            if (marked[index.vertexBody(c, i)]) {
                return true;
            }
        }
        return false;
    }

    /** M_kj with the loops placed by {@code poses}, henries (L_k for k = j), computed afresh. */
    double entry(int k, int j, Pose[] poses) {
        Circuit a = circuits.get(k);
        if (k == j) {
            return LoopInductance.self(placedVertices(k, poses), a.wireRadiusM(), a.loop().turns());
        }
        Circuit b = circuits.get(j);
        return LoopInductance.mutual(placedVertices(k, poses), a.wireRadiusM(), a.loop().turns(),
                placedVertices(j, poses), b.wireRadiusM(), b.loop().turns());
    }

    /** The inductance matrix of the closed loops at these poses, henries. */
    double[][] inductance(Pose[] poses) {
        int n = circuits.size();
        double[][] m = new double[n][n];
        for (int k = 0; k < n; k++) {
            for (int j = k; j < n; j++) {
                m[k][j] = Double.isNaN(constantM[k][j]) ? entry(k, j, poses) : constantM[k][j];
                m[j][k] = m[k][j];
            }
        }
        return m;
    }

    /** λ_ext,k = N·Σ_s Φ_s, loop k's linkage with the sources, webers, the loop at xs, ys. */
    double externalLinkage(int k, double[] xs, double[] ys, PlaneField[] fields) {
        double flux = 0;
        for (PlaneField field : fields) {
            flux += field.flux(xs, ys);
        }
        return circuits.get(k).loop().turns() * flux;
    }

    /** Loop k's series resistance with the loop at xs, ys ({@link LoopResistance}), ohms. */
    double resistanceOhm(int k, double[] xs, double[] ys) {
        double perimeter = 0;
        for (int i = 0; i < xs.length; i++) {
            int j = (i + 1) % xs.length;
            perimeter += Math.hypot(xs[j] - xs[i], ys[j] - ys[i]);
        }
        return LoopResistance.ohms(circuits.get(k).loop(), perimeter);
    }

    /**
     * The currents I = M⁻¹·ψ for the linkages ψ_k = Ψ_k − λ_ext,k the currents themselves must
     * carry, amperes; M is symmetric positive definite for any physical geometry (Cholesky).
     */
    static double[] currents(double[][] m, double[] ownLinkage) {
        if (ownLinkage.length == 0) {
            return new double[0];
        }
        return new CholeskyDecomposition(new Array2DRowRealMatrix(m, false)).getSolver()
                .solve(new ArrayRealVector(ownLinkage, false)).toArray();
    }

    /** ½·IᵀMI, joules. */
    static double magneticEnergyJ(double[][] m, double[] current) {
        double sum = 0;
        for (int k = 0; k < current.length; k++) {
            for (int j = 0; j < current.length; j++) {
                sum += current[k] * m[k][j] * current[j];
            }
        }
        return 0.5 * sum;
    }

    /** Size of the loops (the largest extent of a loop as drawn), metres; 1 m without loops. */
    double lengthScaleM() {
        double size = 0;
        for (int k = 0; k < circuits.size(); k++) {
            size = Math.max(size, drawnExtentM(k));
        }
        return size > 0 ? size : 1;
    }

    /** The smallest loop's extent as drawn, metres; infinite without loops. */
    double smallestExtentM() {
        double smallest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < circuits.size(); k++) {
            smallest = Math.min(smallest, drawnExtentM(k));
        }
        return smallest;
    }

    /** The largest distance between two of loop k's vertices as drawn, metres (positive for a valid loop). */
    private double drawnExtentM(int k) {
        int c = circuits.get(k).conductor();
        int n = index.vertexCount(c);
        double size = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                size = Math.max(size, index.drawn(c, i).minus(index.drawn(c, j)).length());
            }
        }
        return size;
    }
}
