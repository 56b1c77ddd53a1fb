package org.kinduct.solver.dynamics;

import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.dynamics.StateLayout.BodyDof;

/**
 * The mechanics of the scene's bodies: poses from the state (free bodies) or from their paths
 * (prescribed bodies), the non-magnetic forces on free bodies, Newton's second law for them, the
 * power holders of prescribed bodies supply, and kinetic and potential energy.
 *
 * <p>A free body's pivot is taken as its centre of mass: m·a = F_applied(t) + m·g − c·v + Σ
 * springs + F_mag, and I_p·α = τ_mag when its inertia I_p about the pivot is positive (otherwise
 * it does not turn). Springs are linear (Hooke 1678; common practice) between the pivot and a
 * fixed anchor or another body's pivot, whose body takes the reaction.
 */
final class FreeBodies {

    private final Scene scene;
    private final SceneIndex index;
    private final StateLayout layout;
    private final List<Body> bodies;
    /** Each free body's motion, null for the others. */
    private final Motion.Free[] free;
    /** Bodies that move on a prescribed path (not free, not still). */
    private final boolean[] drivenPath;

    /** Applied and damping power of one evaluation, watts: what the applied forces put in, what damping takes out. */
    record Power(double appliedW, double dampingW) {
    }

    FreeBodies(SceneIndex index, StateLayout layout) {
        this.index = index;
        this.layout = layout;
        scene = index.scene();
        bodies = scene.bodies();
        free = new Motion.Free[bodies.size()];
        drivenPath = new boolean[bodies.size()];
        for (int b = 0; b < bodies.size(); b++) {
            Motion motion = bodies.get(b).motion();
            free[b] = motion instanceof Motion.Free f ? f : null;
            drivenPath[b] = !(motion instanceof Motion.Free) && !(motion instanceof Motion.Still);
        }
    }

    /** Which of the scene's bodies are free, in scene order. */
    static boolean[] freeIn(Scene scene) {
        boolean[] mask = new boolean[scene.bodies().size()];
        for (int b = 0; b < mask.length; b++) {
            mask[b] = scene.bodies().get(b).motion() instanceof Motion.Free;
        }
        return mask;
    }

    int count() {
        return bodies.size();
    }

    boolean isFree(int body) {
        return free[body] != null;
    }

    /** The bodies that move on a prescribed path, as a mask in scene order (a copy). */
    boolean[] drivenPaths() {
        return drivenPath.clone();
    }

    /** True when free body b turns: it has a positive inertia about its pivot. */
    boolean turns(int body) {
        return free[body].inertiaKgM2() > 0;
    }

    /** Writes the free bodies' initial velocities into y; positions start as drawn (zero offset and angle). */
    void writeInitialState(double[] y) {
        for (int b = 0; b < free.length; b++) {
            if (free[b] != null) {
                y[layout.of(b, BodyDof.VX)] = free[b].initialVelocity().x();
                y[layout.of(b, BodyDof.VY)] = free[b].initialVelocity().y();
                y[layout.of(b, BodyDof.OMEGA)] = free[b].inertiaKgM2() > 0 ? free[b].initialOmegaRadPerS() : 0;
            }
        }
    }

    /** Every body's pose at t for state y. */
    Pose[] poses(double tS, double[] y) {
        Pose[] poses = new Pose[bodies.size()];
        for (int b = 0; b < poses.length; b++) {
            Body body = bodies.get(b);
            poses[b] = free[b] == null ? body.poseAt(tS)
                    : new Pose(body.pivot(), new Vec2(y[layout.of(b, BodyDof.X)], y[layout.of(b, BodyDof.Y)]),
                            y[layout.of(b, BodyDof.ANGLE)],
                            new Vec2(y[layout.of(b, BodyDof.VX)], y[layout.of(b, BodyDof.VY)]),
                            y[layout.of(b, BodyDof.OMEGA)]);
        }
        return poses;
    }

    /**
     * Body b at time t near tS: on its path if prescribed, carried along its velocity at tS if
     * free (exact to first order, which is what difference quotients at tS need).
     */
    Pose poseAround(int b, Pose[] now, double tS, double t) {
        if (free[b] == null) {
            return bodies.get(b).poseAt(t);
        }
        Pose p = now[b];
        double dt = t - tS;
        return new Pose(p.pivot(), p.offset().plus(p.velocity().times(dt)), p.angleRad() + p.omegaRadPerS() * dt,
                p.velocity(), p.omegaRadPerS());
    }

    /** Body poses near tS, each by {@link #poseAround}, for the quasi-static solver's difference quotients. */
    Kinematics kinematicsAround(double tS, Pose[] now) {
        return (bodyId, t) -> poseAround(index.body(bodyId), now, tS, t);
    }

    /** The poses {@code now} with the bodies on prescribed paths moved to where their paths have them at t. */
    Pose[] drivenTo(Pose[] now, double tS) {
        Pose[] moved = now.clone();
        for (int b = 0; b < moved.length; b++) {
            if (drivenPath[b]) {
                moved[b] = bodies.get(b).poseAt(tS);
            }
        }
        return moved;
    }

    /**
     * Adds the applied force F_applied + F_amplitude·sin(2πf·t), gravity m·g, damping −c·v and
     * the springs to each free body's load (a spring's reaction to the body at its other end);
     * returns the power of the applied forces and of damping.
     */
    Power addForces(double tS, Pose[] poses, BodyLoads loads) {
        double applied = 0;
        double damping = 0;
        Vec2 gravity = scene.gravity();
        for (int b = 0; b < free.length; b++) {
            Motion.Free f = free[b];
            if (f == null) {
                continue;
            }
            Vec2 v = poses[b].velocity();
            double w = 2 * Math.PI * f.appliedFrequencyHz();
            Vec2 app = f.appliedForce().plus(f.appliedAmplitude().times(Math.sin(w * tS)));
            applied += app.dot(v);
            damping += f.dampingNsPerM() * v.dot(v);
            loads.fx[b] += app.x() + f.massKg() * gravity.x() - f.dampingNsPerM() * v.x();
            loads.fy[b] += app.y() + f.massKg() * gravity.y() - f.dampingNsPerM() * v.y();
            Vec2 here = poses[b].pivot().plus(poses[b].offset());
            for (Motion.Free.Spring spring : f.springs()) {
                Vec2 pull = springForce(poses, spring, here);
                loads.fx[b] += pull.x();
                loads.fy[b] += pull.y();
                if (spring.otherBody() != null) {
                    int o = index.body(spring.otherBody());
                    loads.fx[o] -= pull.x();
                    loads.fy[o] -= pull.y();
                }
            }
        }
        return new Power(applied, damping);
    }

    /** Writes each free body's rates: (vx, vy, ω), then F/m and τ/I_p (0 when it does not turn). */
    void writeDerivatives(Pose[] poses, BodyLoads loads, double[] derivative) {
        for (int b = 0; b < free.length; b++) {
            Motion.Free f = free[b];
            if (f == null) {
                continue;
            }
            derivative[layout.of(b, BodyDof.X)] = poses[b].velocity().x();
            derivative[layout.of(b, BodyDof.Y)] = poses[b].velocity().y();
            derivative[layout.of(b, BodyDof.ANGLE)] = poses[b].omegaRadPerS();
            derivative[layout.of(b, BodyDof.VX)] = loads.fx[b] / f.massKg();
            derivative[layout.of(b, BodyDof.VY)] = loads.fy[b] / f.massKg();
            derivative[layout.of(b, BodyDof.OMEGA)] = f.inertiaKgM2() > 0 ? loads.torque[b] / f.inertiaKgM2() : 0;
        }
    }

    /**
     * Power the holders of prescribed bodies supply, watts: what the loads on them would take
     * out, −Σ (F·v + τ·ω) over the bodies that are not free.
     */
    double holdingPowerW(Pose[] poses, BodyLoads loads) {
        double holding = 0;
        for (int b = 0; b < free.length; b++) {
            if (free[b] == null) {
                holding -= loads.fx[b] * poses[b].velocity().x() + loads.fy[b] * poses[b].velocity().y()
                        + loads.torque[b] * poses[b].omegaRadPerS();
            }
        }
        return holding;
    }

    /** Kinetic energy of the free bodies, ½mv² + ½Iω² (pivot at the centre of mass), joules. */
    double kineticEnergyJ(Pose[] poses) {
        double sum = 0;
        for (int b = 0; b < free.length; b++) {
            if (free[b] != null) {
                Vec2 v = poses[b].velocity();
                double omega = poses[b].omegaRadPerS();
                sum += 0.5 * free[b].massKg() * v.dot(v) + 0.5 * free[b].inertiaKgM2() * (omega * omega);
            }
        }
        return sum;
    }

    /** Spring energy ½k(ℓ − ℓ0)² plus gravitational −m·g·offset of the free bodies, joules. */
    double potentialEnergyJ(Pose[] poses) {
        double sum = 0;
        for (int b = 0; b < free.length; b++) {
            if (free[b] != null) {
                Vec2 here = poses[b].pivot().plus(poses[b].offset());
                sum -= free[b].massKg() * scene.gravity().dot(poses[b].offset());
                for (Motion.Free.Spring spring : free[b].springs()) {
                    double stretch = anchor(poses, spring).minus(here).length() - spring.restLengthM();
                    sum += 0.5 * spring.stiffnessNPerM() * stretch * stretch;
                }
            }
        }
        return sum;
    }

    private Vec2 anchor(Pose[] poses, Motion.Free.Spring spring) {
        if (spring.otherBody() == null) {
            return spring.anchor();
        }
        Pose other = poses[index.body(spring.otherBody())];
        return other.pivot().plus(other.offset());
    }

    /** Hooke's law along the line from the pivot to the anchor (Hooke 1678; common practice). */
    private Vec2 springForce(Pose[] poses, Motion.Free.Spring spring, Vec2 here) {
        Vec2 d = anchor(poses, spring).minus(here);
        double length = d.length();
        if (length == 0) {
            return Vec2.ZERO;
        }
        return d.times(spring.stiffnessNPerM() * (length - spring.restLengthM()) / length);
    }
}
