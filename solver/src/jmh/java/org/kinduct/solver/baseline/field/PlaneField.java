package org.kinduct.solver.baseline.field;

/**
 * The field of one source at one instant, with the source already placed (posed) in scene
 * coordinates, evaluated in the drawing plane z = 0.
 *
 * <p>Signs: z out of the screen; B_z &gt; 0 out of the screen. A closed polygon given as
 * {@code xs, ys} is traversed in vertex order; its flux is positive when that order is
 * counter-clockwise and B_z &gt; 0 (right-hand rule), and a self-crossing polygon counts each
 * region with its winding number.
 */
public interface PlaneField {

    /** B_z at (x, y, 0), tesla. */
    double bz(double x, double y);

    /**
     * Whether {@link #potential} is the physical (Coulomb-gauge) vector potential of real
     * currents, so that −∂A/∂t is the induced electric field along an open wire. False for
     * idealized sources (field patches) whose B_z alone does not fix the induced field.
     */
    boolean hasPhysicalPotential();

    /** In-plane vector potential (A_x, A_y) at (x, y, 0), T·m, written to {@code out[0..1]}. */
    void potential(double x, double y, double[] out);

    /**
     * Flux Φ = ∬ w·B_z dA through the closed polygon (winding number w), webers, to relative
     * accuracy about 1e-9 where the source is smooth over the polygon (see each implementation).
     */
    double flux(double[] xs, double[] ys);

    /**
     * Moments of B_z along the segment p(s) = a + s·(b − a), 0 ≤ s ≤ 1:
     * {@code out[0] = ∫ B_z ds}, {@code out[1] = ∫ s·B_z ds} (dimensionless s, result in tesla).
     * Line integrals of v×B and of forces along straight edges reduce to these two numbers when
     * velocity varies linearly along the edge.
     */
    void bzMoments(double ax, double ay, double bx, double by, double[] out);
}
