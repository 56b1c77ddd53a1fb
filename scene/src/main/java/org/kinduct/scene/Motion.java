package org.kinduct.scene;

import java.util.List;

/**
 * How a body moves. Every variant gives its {@link Pose} at time t (seconds) with exact
 * velocities (derivatives taken analytically, not by differences).
 */
public sealed interface Motion
        permits Motion.Still, Motion.Glide, Motion.Accelerate, Motion.Oscillate, Motion.Spin,
                Motion.Path, Motion.Free {

    /** The body's pose at {@code tS}; {@code pivot} is the body's pivot as drawn. */
    Pose poseAt(Vec2 pivot, double tS);

    /**
     * Dispatches to the case for this kind. Adding a kind adds a method to {@link Cases}, so every
     * place that handles motions fails to compile until it handles the new one.
     */
    <R> R match(Cases<R> cases);

    /** One method per kind of motion. */
    interface Cases<R> {
        R still(Still still);

        R glide(Glide glide);

        R accelerate(Accelerate accelerate);

        R oscillate(Oscillate oscillate);

        R spin(Spin spin);

        R path(Path path);

        R free(Free free);
    }

    /** Does not move. */
    record Still() implements Motion {
        @Override
        public <R> R match(Cases<R> cases) {
            return cases.still(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            return Pose.rest(pivot);
        }
    }

    /** Constant velocity (m/s). */
    record Glide(Vec2 velocity) implements Motion {
        public Glide {
            Checks.nonNull(velocity, "velocity");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.glide(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            return new Pose(pivot, velocity.times(tS), 0, velocity, 0);
        }
    }

    /** Constant acceleration from an initial velocity: x = v0·t + ½·a·t². */
    record Accelerate(Vec2 initialVelocity, Vec2 acceleration) implements Motion {
        public Accelerate {
            Checks.nonNull(initialVelocity, "initialVelocity");
            Checks.nonNull(acceleration, "acceleration");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.accelerate(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            Vec2 offset = initialVelocity.times(tS).plus(acceleration.times(0.5 * tS * tS));
            return new Pose(pivot, offset, 0, initialVelocity.plus(acceleration.times(tS)), 0);
        }
    }

    /**
     * Sinusoidal translation x = A·sin(2πft + φ)·û, û at {@code directionRad} from +x.
     */
    record Oscillate(double amplitudeM, double frequencyHz, double directionRad, double phaseRad)
            implements Motion {
        public Oscillate {
            Checks.finite(amplitudeM, "amplitude");
            Checks.positive(frequencyHz, "frequency");
            Checks.finite(directionRad, "direction");
            Checks.finite(phaseRad, "phase");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.oscillate(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            double w = 2 * Math.PI * frequencyHz;
            Vec2 u = Vec2.polar(1, directionRad);
            return new Pose(pivot, u.times(amplitudeM * Math.sin(w * tS + phaseRad)), 0,
                    u.times(amplitudeM * w * Math.cos(w * tS + phaseRad)), 0);
        }
    }

    /** Rotation about the body's pivot at constant angular speed (counter-clockwise positive). */
    record Spin(double omegaRadPerS, double startAngleRad) implements Motion {
        public Spin {
            Checks.finite(omegaRadPerS, "angular speed");
            Checks.finite(startAngleRad, "start angle");
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.spin(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            return new Pose(pivot, Vec2.ZERO, startAngleRad + omegaRadPerS * tS, Vec2.ZERO, omegaRadPerS);
        }
    }

    /**
     * Keyframed path: offsets and angles at given times, held constant before the first and
     * after the last key. {@link Blend#LINEAR} interpolates piecewise linearly; {@link Blend#SMOOTH}
     * uses a cubic Hermite spline with Catmull–Rom tangents (common practice in animation),
     * so velocity is continuous at the keys.
     */
    record Path(List<Key> keys, Blend blend) implements Motion {
        public Path {
            keys = List.copyOf(Checks.nonNull(keys, "keys"));
            Checks.nonNull(blend, "blend");
            if (keys.size() < 2) {
                throw new IllegalArgumentException("A path needs at least two keys, got " + keys.size());
            }
            for (int i = 1; i < keys.size(); i++) {
                if (!(keys.get(i).tS() > keys.get(i - 1).tS())) {
                    throw new IllegalArgumentException("Path key times must increase: key " + i
                            + " at " + keys.get(i).tS() + " s follows " + keys.get(i - 1).tS() + " s");
                }
            }
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.path(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            int n = keys.size();
            if (tS <= keys.get(0).tS()) {
                return new Pose(pivot, keys.get(0).offset(), keys.get(0).angleRad(), Vec2.ZERO, 0);
            }
            if (tS >= keys.get(n - 1).tS()) {
                return new Pose(pivot, keys.get(n - 1).offset(), keys.get(n - 1).angleRad(), Vec2.ZERO, 0);
            }
            int i = 0;
            while (keys.get(i + 1).tS() < tS) {
                i++;
            }
            Key a = keys.get(i);
            Key b = keys.get(i + 1);
            double h = b.tS() - a.tS();
            double s = (tS - a.tS()) / h;
            if (blend == Blend.LINEAR) {
                Vec2 v = b.offset().minus(a.offset()).times(1 / h);
                double w = (b.angleRad() - a.angleRad()) / h;
                return new Pose(pivot, a.offset().plus(b.offset().minus(a.offset()).times(s)),
                        a.angleRad() + (b.angleRad() - a.angleRad()) * s, v, w);
            }
            // Cubic Hermite basis (e.g. Foley & van Dam, Computer Graphics, 2nd ed., §11.2).
            double[] ax = hermite(i, s, h, k -> k.offset().x());
            double[] ay = hermite(i, s, h, k -> k.offset().y());
            double[] aa = hermite(i, s, h, Key::angleRad);
            return new Pose(pivot, new Vec2(ax[0], ay[0]), aa[0], new Vec2(ax[1], ay[1]), aa[1]);
        }

        /** Value and time derivative of one coordinate on segment i at fraction s. */
        private double[] hermite(int i, double s, double h, java.util.function.ToDoubleFunction<Key> f) {
            double p0 = f.applyAsDouble(keys.get(i));
            double p1 = f.applyAsDouble(keys.get(i + 1));
            double m0 = tangent(i, f) * h;
            double m1 = tangent(i + 1, f) * h;
            double s2 = s * s;
            double s3 = s2 * s;
            double value = (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * m0
                    + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * m1;
            double dds = (6 * s2 - 6 * s) * p0 + (3 * s2 - 4 * s + 1) * m0
                    + (-6 * s2 + 6 * s) * p1 + (3 * s2 - 2 * s) * m1;
            return new double[] {value, dds / h};
        }

        /** Catmull–Rom tangent (per second) at key k; zero at the ends so the path starts and stops at rest. */
        private double tangent(int k, java.util.function.ToDoubleFunction<Key> f) {
            if (k == 0 || k == keys.size() - 1) {
                return 0;
            }
            return (f.applyAsDouble(keys.get(k + 1)) - f.applyAsDouble(keys.get(k - 1)))
                    / (keys.get(k + 1).tS() - keys.get(k - 1).tS());
        }

        /** One waypoint: at {@code tS} the body is displaced by {@code offset} and turned by {@code angleRad}. */
        public record Key(double tS, Vec2 offset, double angleRad) {
            public Key {
                Checks.finite(tS, "key time");
                Checks.nonNull(offset, "offset");
                Checks.finite(angleRad, "key angle");
            }
        }

        public enum Blend { LINEAR, SMOOTH }
    }

    /**
     * A free body: its motion is integrated from forces (gravity, springs, damping, applied and
     * magnetic). {@link #poseAt} gives the initial state only; the dynamics solver owns the rest.
     *
     * @param massKg mass
     * @param inertiaKgM2 moment of inertia about the pivot (0: rotation locked)
     * @param initialVelocity initial velocity of the pivot, m/s
     * @param initialOmegaRadPerS initial angular velocity
     * @param dampingNsPerM viscous damping coefficient (force = −c·v)
     * @param appliedForce constant applied force, N, plus {@code appliedAmplitude}·sin(2πft)
     */
    record Free(double massKg, double inertiaKgM2, Vec2 initialVelocity, double initialOmegaRadPerS,
                double dampingNsPerM, Vec2 appliedForce, Vec2 appliedAmplitude, double appliedFrequencyHz,
                List<Spring> springs) implements Motion {
        public Free {
            Checks.positive(massKg, "mass");
            Checks.nonNegative(inertiaKgM2, "moment of inertia");
            if (inertiaKgM2 > 0 && inertiaKgM2 < massKg * SMALLEST_GYRATION_M * SMALLEST_GYRATION_M) {
                throw new IllegalArgumentException("moment of inertia " + inertiaKgM2 + " kg·m² is less than mass × (1 µm)²:"
                        + " give 0 to lock rotation, or the body's real inertia");
            }
            Checks.nonNull(initialVelocity, "initial velocity");
            Checks.finite(initialOmegaRadPerS, "initial angular velocity");
            Checks.nonNegative(dampingNsPerM, "damping");
            Checks.nonNull(appliedForce, "applied force");
            Checks.nonNull(appliedAmplitude, "applied force amplitude");
            Checks.nonNegative(appliedFrequencyHz, "applied force frequency");
            springs = List.copyOf(Checks.nonNull(springs, "springs"));
        }

        /**
         * Smallest radius of gyration √(I/m) of a body that turns, metres: a smaller inertia would
         * spin the body up without bound under the slightest torque.
         */
        static final double SMALLEST_GYRATION_M = 1e-6;

        /**
         * The fastest rate of the body's own mechanics, 1/s: its damping rate c/m and its springs'
         * angular frequency √(Σk/m), magnetic forces aside. An explicit integrator takes a few
         * steps per unit of rate × time.
         */
        public double fastestRatePerS() {
            double stiffness = springs.stream().mapToDouble(Spring::stiffnessNPerM).sum();
            return Math.max(dampingNsPerM / massKg, Math.sqrt(stiffness / massKg));
        }

        public static Free ofMass(double massKg) {
            return new Free(massKg, 0, Vec2.ZERO, 0, 0, Vec2.ZERO, Vec2.ZERO, 0, List.of());
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.free(this);
        }

        @Override
        public Pose poseAt(Vec2 pivot, double tS) {
            return new Pose(pivot, Vec2.ZERO, 0, initialVelocity, initialOmegaRadPerS);
        }

        /**
         * A linear spring from the body's pivot to an anchor: a fixed point, or the pivot of
         * another body ({@code otherBody} non-null).
         */
        public record Spring(Vec2 anchor, String otherBody, double stiffnessNPerM, double restLengthM) {
            public Spring {
                Checks.positive(stiffnessNPerM, "spring stiffness");
                Checks.nonNegative(restLengthM, "spring rest length");
                if ((anchor == null) == (otherBody == null)) {
                    throw new IllegalArgumentException("A spring needs an anchor point or another body, not "
                            + (anchor == null ? "neither" : "both"));
                }
            }
        }
    }

}
