package org.kinduct.solver.dynamics;

/**
 * The forces (newtons) and torques about each body's pivot (newton-metres, z component) that the
 * parts of one evaluation add up on every body, in scene order: magnetic forces on loop edges
 * and their reactions on source bodies, forces between loop currents, applied, gravity, damping
 * and spring forces. Prescribed bodies collect them too: what they take is what their holders
 * supply. Mutable; one per evaluation.
 */
final class BodyLoads {

    final double[] fx;
    final double[] fy;
    final double[] torque;

    BodyLoads(int bodyCount) {
        fx = new double[bodyCount];
        fy = new double[bodyCount];
        torque = new double[bodyCount];
    }
}
