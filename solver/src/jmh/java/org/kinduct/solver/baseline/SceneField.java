package org.kinduct.solver.baseline;

import java.util.List;
import org.kinduct.solver.baseline.field.PlaneField;

/**
 * The field of several sources at one instant: every quantity is the sum of the parts'
 * (superposition holds for B_z, A, flux and line moments alike). Immutable and safe to share
 * between threads, e.g. to evaluate a B_z map row by row.
 */
public final class SceneField implements PlaneField {

    private final PlaneField[] parts;

    public SceneField(List<PlaneField> parts) {
        this.parts = parts.toArray(PlaneField[]::new);
    }

    /** The number of sources summed. */
    public int size() {
        return parts.length;
    }

    @Override
    public double bz(double x, double y) {
        double sum = 0;
        for (PlaneField part : parts) {
            sum += part.bz(x, y);
        }
        return sum;
    }

    /** True when every part has a physical potential (vacuously for no parts). */
    @Override
    public boolean hasPhysicalPotential() {
        for (PlaneField part : parts) {
            if (!part.hasPhysicalPotential()) {
                return false;
            }
        }
        return true;
    }

    @Override
    public void potential(double x, double y, double[] out) {
        double ax = 0;
        double ay = 0;
        for (PlaneField part : parts) {
            part.potential(x, y, out);
            ax += out[0];
            ay += out[1];
        }
        out[0] = ax;
        out[1] = ay;
    }

    @Override
    public double flux(double[] xs, double[] ys) {
        double sum = 0;
        for (PlaneField part : parts) {
            sum += part.flux(xs, ys);
        }
        return sum;
    }

    @Override
    public void bzMoments(double ax, double ay, double bx, double by, double[] out) {
        double m0 = 0;
        double m1 = 0;
        for (PlaneField part : parts) {
            part.bzMoments(ax, ay, bx, by, out);
            m0 += out[0];
            m1 += out[1];
        }
        out[0] = m0;
        out[1] = m1;
    }
}
