package org.kinduct.solver.dynamics;

/**
 * Where each quantity sits in the state vector y that the integrator advances, in three blocks:
 * <ol>
 *   <li>per free body, in scene order, its {@link BodyDof}s (x, y, θ, vx, vy, ω): the offset of
 *       its pivot from where it is drawn, metres, its angle about the pivot, radians, and their
 *       rates;</li>
 *   <li>for the {@link CircuitModel#INDUCTIVE} model, per closed loop in scene order, its circuit
 *       state Ψ_k − λ_ext,k(t0), webers (see {@link CoupledEquations}); none for
 *       {@link CircuitModel#QUASI_STATIC};</li>
 *   <li>the running energy integrals, joules, one per {@link AuditTerm}.</li>
 * </ol>
 */
final class StateLayout {

    /** A free body's degrees of freedom, in their order within its block. */
    enum BodyDof { X, Y, ANGLE, VX, VY, OMEGA }

    /** The energy integrals carried in the state, in their order within the audit block ({@link EnergyAudit}). */
    enum AuditTerm { APPLIED, HOLDING, DRIVE, JOULE, EDDY, DAMPING }

    private static final int BODY_DOFS = BodyDof.values().length;

    /** Start of each body's block, −1 for bodies that are not free. */
    private final int[] bodyStart;
    private final int loopStart;
    private final int loopCount;
    private final int auditStart;

    /**
     * @param free which bodies are free, in scene order
     * @param loopStates how many circuit states (closed loops of an inductive run, else 0)
     */
    StateLayout(boolean[] free, int loopStates) {
        bodyStart = new int[free.length];
        int next = 0;
        for (int b = 0; b < free.length; b++) {
            bodyStart[b] = free[b] ? next : -1;
            next += free[b] ? BODY_DOFS : 0;
        }
        loopStart = next;
        loopCount = loopStates;
        auditStart = loopStart + loopStates;
    }

    int dimension() {
        return auditStart + AuditTerm.values().length;
    }

    /** True when body b has states (is free). */
    boolean free(int body) {
        return bodyStart[body] >= 0;
    }

    /** Index of a free body's degree of freedom. */
    int of(int body, BodyDof dof) {
        if (bodyStart[body] < 0) {
            throw new IllegalArgumentException("body " + body + " is not free: it has no state");
        }
        return bodyStart[body] + dof.ordinal();
    }

    /** Number of body states: they are the indices [0, bodyStates()). */
    int bodyStates() {
        return loopStart;
    }

    /** Number of circuit states. */
    int loopStates() {
        return loopCount;
    }

    /** Index of closed loop k's circuit state. */
    int loop(int k) {
        if (k < 0 || k >= loopCount) {
            throw new IndexOutOfBoundsException("no circuit state " + k + " of " + loopCount);
        }
        return loopStart + k;
    }

    /** Index of an energy integral. */
    int audit(AuditTerm term) {
        return auditStart + term.ordinal();
    }
}
