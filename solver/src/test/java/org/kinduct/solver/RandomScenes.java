package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Random ingredients for property tests, drawn from a seeded {@link SplittableRandom}: loops about
 * 1 m across, fields up to 1 T, speeds about 1 m/s and 1 rad/s.
 */
final class RandomScenes {

    /** Keyframed paths have keys every quarter second from 0 to 1 s. */
    static final double KEY_SPACING_S = 0.25;
    /** Sample times keep this far from keys, where a smooth path's acceleration jumps. */
    static final double KEY_MARGIN_S = 0.01;

    private RandomScenes() {
    }

    /** {@code count} seeds derived from {@code master}. */
    static Stream<Long> seeds(long master, int count) {
        SplittableRandom r = new SplittableRandom(master);
        return LongStream.range(0, count).mapToObj(i -> r.nextLong());
    }

    /** A star-shaped, hence simple, polygon of n vertices about {@code center}. */
    static List<Vec2> star(SplittableRandom r, Vec2 center, double radius, int n) {
        return IntStream.range(0, n).mapToObj(i -> {
            double angle = 2 * Math.PI * (i + 0.4 * r.nextDouble()) / n;
            return Vec2.polar(radius * (0.3 + 0.7 * r.nextDouble()), angle).plus(center);
        }).toList();
    }

    /** Random points in a disc: usually a self-crossing polygon. */
    static List<Vec2> tangle(SplittableRandom r, Vec2 center, double radius, int n) {
        return IntStream.range(0, n)
                .mapToObj(i -> Vec2.polar(radius * Math.sqrt(r.nextDouble()), 2 * Math.PI * r.nextDouble()).plus(center))
                .toList();
    }

    /** Half of the time simple (3–8 vertices), half self-crossing (4–7 vertices), near the origin. */
    static List<Vec2> loopShape(SplittableRandom r) {
        Vec2 center = new Vec2(r.nextDouble(-0.3, 0.3), r.nextDouble(-0.3, 0.3));
        return r.nextBoolean() ? star(r, center, 1, 3 + r.nextInt(6)) : tangle(r, center, 1, 4 + r.nextInt(4));
    }

    static Vec2 vector(SplittableRandom r, double size) {
        return new Vec2(r.nextDouble(-size, size), r.nextDouble(-size, size));
    }

    /** One to three field patches near the origin on {@code body}, ids prefixed. */
    static List<Source> patches(SplittableRandom r, String prefix, String body) {
        List<Source> patches = new ArrayList<>();
        int count = 1 + r.nextInt(3);
        for (int i = 0; i < count; i++) {
            patches.add(new Source.FieldPatch(prefix + i, body,
                    star(r, vector(r, 1), r.nextDouble(0.5, 1.5), 3 + r.nextInt(6)), field(r)));
        }
        return patches;
    }

    /** ±(0.1…1) T. */
    static double field(SplittableRandom r) {
        return (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.1, 1);
    }

    /** A rigid motion: glide, spin about a random pivot (the body's), oscillation, acceleration or smooth path. */
    static Motion rigidMotion(SplittableRandom r) {
        switch (r.nextInt(5)) {
            case 0:
                return new Motion.Glide(vector(r, 1));
            case 1:
                return new Motion.Spin((r.nextBoolean() ? 1 : -1) * r.nextDouble(0.5, 2), r.nextDouble(-1, 1));
            case 2:
                return new Motion.Oscillate(r.nextDouble(0.2, 1), r.nextDouble(0.2, 2), r.nextDouble(0, 2 * Math.PI),
                        r.nextDouble(0, 2 * Math.PI));
            case 3:
                return new Motion.Accelerate(vector(r, 1), vector(r, 2));
            default:
                List<Motion.Path.Key> keys = new ArrayList<>();
                for (int k = 0; k * KEY_SPACING_S <= 1; k++) {
                    keys.add(new Motion.Path.Key(k * KEY_SPACING_S, vector(r, 0.5), r.nextDouble(-0.5, 0.5)));
                }
                return new Motion.Path(keys, Motion.Path.Blend.SMOOTH);
        }
    }

    /** A time in (0, 1) s at least {@link #KEY_MARGIN_S} from every key. */
    static double time(SplittableRandom r) {
        while (true) {
            double t = r.nextDouble(KEY_MARGIN_S, 1 - KEY_MARGIN_S);
            double fromKey = Math.abs(t / KEY_SPACING_S - Math.rint(t / KEY_SPACING_S)) * KEY_SPACING_S;
            if (fromKey >= KEY_MARGIN_S) {
                return t;
            }
        }
    }

    /** Samples per second when looking for the peak speed of a scene's motions. */
    private static final int SPEED_SAMPLES = 100;

    /**
     * A bound on the EMF a conductor can have, N·(Σ|B|)·length·(peak speed of any vertex or patch
     * corner over 0…1 s), against which rounding is judged; computed from the scene, not the solver.
     */
    static double emfBound(Scene scene, ConductorState state, int turns) {
        Kinematics kinematics = Kinematics.prescribed(scene);
        double bSum = 0;
        double fastest = 0;
        for (Source source : scene.sources()) {
            if (source instanceof Source.FieldPatch patch) {
                bSum += Math.abs(patch.bzT());
                fastest = Math.max(fastest, peakSpeed(kinematics, source.body(), patch.outline()));
            } else if (source instanceof Source.UniformField uniform) {
                bSum += Math.abs(uniform.bzT());
            }
        }
        var conductor = scene.conductor(state.id()).orElseThrow();
        for (var vertex : conductor.vertices()) {
            fastest = Math.max(fastest, peakSpeed(kinematics, vertex.bodyOr(conductor.body()), List.of(vertex.at())));
        }
        double length = 0;
        List<Vec2> at = state.vertices();
        for (int i = 0; i < at.size(); i++) {
            length += at.get((i + 1) % at.size()).minus(at.get(i)).length();
        }
        return turns * bSum * length * fastest;
    }

    /**
     * An EMF bound for a conductor of length {@code lengthM} among magnets and coils: sources × 1 T ×
     * length × (the fastest point of any body within 3 m of its pivot over 0…1 s, plus 2π f·length
     * for the fastest AC drive); a source's field scale of 1 T per source holds for magnets of
     * remanence below that and the coils drawn here away from their filaments.
     */
    static double physicalEmfBound(Scene scene, double lengthM) {
        Kinematics kinematics = Kinematics.prescribed(scene);
        double speed = 0;
        for (var body : scene.bodies()) {
            for (int i = 0; i <= SPEED_SAMPLES; i++) {
                Pose pose = kinematics.poseAt(body.id(), (double) i / SPEED_SAMPLES);
                speed = Math.max(speed, pose.velocity().length() + Math.abs(pose.omegaRadPerS()) * 3);
            }
        }
        double rate = 0;
        for (Source source : scene.sources()) {
            if (source instanceof Source.SourceCoil coil && coil.drive().frequencyHz() > 0) {
                rate = Math.max(rate, 2 * Math.PI * coil.drive().frequencyHz());
            }
        }
        return scene.sources().size() * lengthM * (speed + rate * lengthM);
    }

    private static double peakSpeed(Kinematics kinematics, String body, List<Vec2> drawn) {
        double fastest = 0;
        for (int i = 0; i <= SPEED_SAMPLES; i++) {
            Pose pose = kinematics.poseAt(body, (double) i / SPEED_SAMPLES);
            for (Vec2 p : drawn) {
                fastest = Math.max(fastest, pose.velocityAt(pose.place(p)).length());
            }
        }
        return fastest;
    }

    /**
     * A loop and a wire riding moving bodies among static and moving patches (and sometimes a
     * uniform field), kept in parts so tests can recombine the sources.
     */
    record Mixed(List<Body> bodies, List<Source> staticSources, List<Source> movingSources,
                 List<Conductor> conductors) {

        Scene scene() {
            List<Source> all = new ArrayList<>(staticSources);
            all.addAll(movingSources);
            return with(all);
        }

        Scene with(List<Source> sources) {
            return TestScenes.scene(bodies, sources, conductors);
        }
    }

    static Mixed mixed(SplittableRandom r) {
        List<Body> bodies = List.of(
                new Body("loops", "loops", vector(r, 2), rigidMotion(r)),
                new Body("magnets", "magnets", vector(r, 2), rigidMotion(r)));
        List<Source> still = new ArrayList<>(patches(r, "still", Body.FIXED));
        if (r.nextBoolean()) {
            still.add(new Source.UniformField("background", field(r)));
        }
        List<Source> moving = patches(r, "moving", "magnets");
        Conductor.Loop loop = new Conductor.Loop("loop", "loops", TestScenes.vertices(loopShape(r)), 1 + r.nextInt(5),
                TestScenes.COPPER_1MM, r.nextInt(4) == 0, r.nextDouble(0, 0.1), r.nextDouble(0, 80));
        Conductor.Wire wire = new Conductor.Wire("wire", r.nextBoolean() ? "loops" : Body.FIXED,
                TestScenes.vertices(tangle(r, Vec2.ZERO, 1, 2 + r.nextInt(4))));
        return new Mixed(bodies, still, moving, List.of(loop, wire));
    }
}
