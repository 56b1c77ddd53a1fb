package org.kinduct.solver.field;

/**
 * A field whose in-plane vector potential has a closed-form gradient: what the rate of change of
 * a loop's flux needs at one instant when loop and source move rigidly relative to each other
 * (the Reynolds transport of ∮ A·dl; see {@code org.kinduct.solver.RigidPair}).
 *
 * <p>In the plane z = 0 the sources' currents flow parallel to it (A_z = 0) and A is in the Coulomb
 * gauge, so ∂A_x/∂x + ∂A_y/∂y = 0 and ∂A_y/∂x − ∂A_x/∂y = B_z (Griffiths, <i>Introduction to
 * Electrodynamics</i>, 4th ed., 2013, §5.4.1). B_z is also given by the field's own B_z formula,
 * which is how the gradient is checked.
 */
public interface GradientField extends PlaneField {

    /** Values {@link #jet} writes. */
    int JET_SIZE = 7;

    /**
     * At (x, y, 0): {@code out[0..1]} = (A_x, A_y), T·m; {@code out[2..5]} = ∂A_x/∂x, ∂A_x/∂y,
     * ∂A_y/∂x, ∂A_y/∂y, tesla; {@code out[6]} = B_z as {@link #bz} gives it (a cylinder magnet's
     * jet interpolates its closed forms: to a few 1e-13 of the field's size).
     */
    void jet(double x, double y, double[] out);

    /**
     * Where B_z jumps and A kinks along a segment in the plane (the edge of a magnet's face lying
     * in the plane), for quadrature panels to end there; none for fields smooth in the plane.
     */
    EdgeQuadrature.Breaks breaks();
}
