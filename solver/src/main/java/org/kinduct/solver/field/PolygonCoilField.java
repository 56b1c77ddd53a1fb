package org.kinduct.solver.field;

import java.util.Arrays;
import org.kinduct.scene.Checks;

/**
 * A closed polygonal filament coil in the plane z = z0 (z0 ≠ 0): the sum of the straight
 * filaments along its edges ({@link StraightFilament}, Biot–Savart for a finite segment,
 * Griffiths ch. 5). The current, given as ampere-turns N·I, flows along the vertex order, so a
 * counter-clockwise polygon with N·I &gt; 0 makes B_z &gt; 0 inside.
 *
 * <p>Accuracy: closed forms to a few ulp per edge; near the polygon's corners the per-edge terms
 * are large and of opposite sign, which leaves an absolute error of ~1e-16 of the largest one.
 * Field points within ~|z0| of a projected edge see a field that varies on the scale |z0|.
 */
public final class PolygonCoilField extends CurrentSourceField {

    private final double[] xs;
    private final double[] ys;
    private final double[] ux;
    private final double[] uy;
    private final double[] length;
    private final double z0M;
    private final double ampereTurns;

    /**
     * @param xs vertex x, metres (copied)
     * @param ys vertex y, metres (copied)
     * @param z0M height of the coil plane, metres, non-zero
     * @param ampereTurns N·I, amperes, positive along the vertex order
     */
    public PolygonCoilField(double[] xs, double[] ys, double z0M, double ampereTurns) {
        requirePolygon(xs, ys, "a coil polygon");
        this.z0M = requireCoilOffPlane(z0M);
        this.ampereTurns = Checks.finite(ampereTurns, "ampere-turns");
        int n = xs.length;
        this.xs = xs.clone();
        this.ys = ys.clone();
        this.ux = new double[n];
        this.uy = new double[n];
        this.length = new double[n];
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double dx = Checks.finite(xs[j], "coil vertex x") - Checks.finite(xs[i], "coil vertex x");
            double dy = Checks.finite(ys[j], "coil vertex y") - Checks.finite(ys[i], "coil vertex y");
            double len = Math.hypot(dx, dy);
            if (len == 0) {
                throw new IllegalArgumentException("coil polygon repeats vertex " + i);
            }
            ux[i] = dx / len;
            uy[i] = dy / len;
            length[i] = len;
        }
    }

    /**
     * No break in the plane; the filaments keep at least |z0| off it, and the distance to a disc
     * round the first vertex that holds every vertex in it.
     */
    @Override
    public EdgeQuadrature.Breaks breaks() {
        double reach = 0;
        for (int i = 1; i < xs.length; i++) {
            reach = Math.max(reach, Math.hypot(xs[i] - xs[0], ys[i] - ys[0]));
        }
        return Clearance.aroundDisc(xs[0], ys[0], reach, Math.abs(z0M));
    }

    @Override
    public double bz(double x, double y) {
        double sum = 0;
        for (int i = 0; i < xs.length; i++) {
            sum += StraightFilament.bz(xs[i], ys[i], ux[i], uy[i], length[i], z0M, ampereTurns, x, y);
        }
        return sum;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        double ax = 0;
        double ay = 0;
        for (int i = 0; i < xs.length; i++) {
            double a = StraightFilament.potentialAlong(xs[i], ys[i], ux[i], uy[i], length[i], z0M, ampereTurns, x, y);
            ax += a * ux[i];
            ay += a * uy[i];
        }
        out[0] = ax;
        out[1] = ay;
    }

    /** The filaments' shares summed ({@link StraightFilament#addJet}). */
    @Override
    public void jet(double x, double y, double[] out) {
        Arrays.fill(out, 0, JET_SIZE, 0);
        for (int i = 0; i < xs.length; i++) {
            StraightFilament.addJet(xs[i], ys[i], ux[i], uy[i], length[i], z0M, ampereTurns, x, y, out);
        }
    }
}
