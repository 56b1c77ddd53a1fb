package org.kinduct.solver.dynamics;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;

/**
 * Forces of the loop currents on one another and of a loop on itself where it changes shape:
 * the generalized forces Q = ½·Iᵀ(∂M/∂q)I on free bodies (Jackson, <i>Classical
 * Electrodynamics</i>, 3rd ed., 1999, §5.16: the force at constant currents is the gradient of the
 * magnetic energy), and the power the holders of prescribed bodies put in against them,
 * −½·Iᵀ(∂M/∂t)I with the free bodies held where they are. Both by central differences of the
 * entries of M that change ({@link LoopCircuits}): steps of {@value #SPACE_STEP_FRACTION} of the
 * smallest loop's size, {@value #ANGLE_STEP_RAD} rad, and the prescribed-motion time step.
 */
final class InductiveForces {

    /** Finite-difference steps: a fraction of the smallest loop size, and radians. */
    private static final double SPACE_STEP_FRACTION = 1e-5;
    private static final double ANGLE_STEP_RAD = 1e-5;

    private final LoopCircuits circuits;
    private final FreeBodies bodies;
    private final double spaceStepM;
    private final double timeStepS;
    private final boolean[] drivenPath;

    /** @param timeStepS time step of the difference quotients of prescribed motion, seconds */
    InductiveForces(LoopCircuits circuits, FreeBodies bodies, double timeStepS) {
        this.circuits = circuits;
        this.bodies = bodies;
        this.timeStepS = timeStepS;
        double smallest = circuits.smallestExtentM();
        spaceStepM = SPACE_STEP_FRACTION * (smallest < Double.POSITIVE_INFINITY ? smallest : 1);
        drivenPath = bodies.drivenPaths();
    }

    /** True when some entry of M changes as the bodies move: otherwise there are no such forces. */
    boolean present() {
        return circuits.anyVariable();
    }

    /**
     * Adds ½·Iᵀ(∂M/∂q)I at the currents I to each free body's load (x, y and, for a body that
     * turns, θ); returns the holders' power, watts.
     */
    double apply(double tS, Pose[] poses, double[] current, BodyLoads loads) {
        int count = bodies.count();
        for (int b = 0; b < count; b++) {
            if (!bodies.isFree(b)) {
                continue;
            }
            boolean[] only = new boolean[count];
            only[b] = true;
            loads.fx[b] += gradient(poses, current, b, only, spaceStepM, 0, 0);
            loads.fy[b] += gradient(poses, current, b, only, 0, spaceStepM, 0);
            // A body without inertia does not turn: no torque needed.
            if (bodies.turns(b)) {
                loads.torque[b] += gradient(poses, current, b, only, 0, 0, ANGLE_STEP_RAD);
            }
        }
        Pose[] later = bodies.drivenTo(poses, tS + timeStepS);
        Pose[] earlier = bodies.drivenTo(poses, tS - timeStepS);
        return -energyChange(later, earlier, current, drivenPath) / (2 * timeStepS);
    }

    /** ∂/∂q of ½·IᵀMI for body {@code body} displaced by (dx, dy, dAngle), by a central difference. */
    private double gradient(Pose[] poses, double[] current, int body, boolean[] only, double dx, double dy,
                            double dAngle) {
        Pose[] plus = poses.clone();
        Pose[] minus = poses.clone();
        Pose p = poses[body];
        plus[body] = new Pose(p.pivot(), p.offset().plus(new Vec2(dx, dy)), p.angleRad() + dAngle, p.velocity(),
                p.omegaRadPerS());
        minus[body] = new Pose(p.pivot(), p.offset().minus(new Vec2(dx, dy)), p.angleRad() - dAngle, p.velocity(),
                p.omegaRadPerS());
        return energyChange(plus, minus, current, only) / (2 * (dx + dy + dAngle));
    }

    /**
     * ½·Iᵀ[M(a) − M(b)]I at the currents I, computing only the entries that change and whose
     * loops ride a body marked in {@code moved} (the others are the same in both).
     */
    private double energyChange(Pose[] a, Pose[] b, double[] current, boolean[] moved) {
        double sum = 0;
        int n = circuits.count();
        for (int k = 0; k < n; k++) {
            for (int j = k; j < n; j++) {
                if (circuits.constant(k, j) || !(circuits.rides(k, moved) || circuits.rides(j, moved))) {
                    continue;
                }
                double change = (circuits.entry(k, j, a) - circuits.entry(k, j, b)) * current[k] * current[j];
                sum += k == j ? 0.5 * change : change;
            }
        }
        return sum;
    }
}
