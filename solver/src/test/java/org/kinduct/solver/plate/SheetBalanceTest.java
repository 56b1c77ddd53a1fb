package org.kinduct.solver.plate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;

/**
 * Properties of every plate state through the product path (scene → run → result), over random
 * plates with a hole and electrodes under random block magnets, in random rigid motion of every
 * prescribed kind: energy conservation, Joule power = mechanical power taken, P = −F·V − τ·ω
 * (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §8.1; from memory); and
 * reversal: the problem is linear in v × B, so reversing the motion reverses drag, torque and
 * voltages and keeps the heat. Each case prints its seed when it fails.
 */
class SheetBalanceTest {

    private static final long FIRST_SEED = 0x9_1A7E_5000L;
    private static final int CASES = 16;
    /**
     * The solve stops at a relative residual of 1e-10; the force and power are sums over the same
     * face filaments, so the balance holds to a few times that (the sheet tests measured 1e-13 on
     * their own); relative to the power.
     */
    private static final double BALANCE = 1e-8;
    /** Reversal is exact up to the residual and rounding; relative to each quantity's scale. */
    private static final double ODD = 1e-8;

    static LongStream seeds() {
        return LongStream.range(FIRST_SEED, FIRST_SEED + CASES);
    }

    /** A random plate with a hole, two electrodes and a pair, under one to three magnets, moving as {@code motion}. */
    private static Scene scene(SplittableRandom r, Motion motion) {
        List<Vec2> outline = new ArrayList<>();
        for (int k = 0; k < 12; k++) {
            outline.add(Vec2.polar(r.nextDouble(0.03, 0.05), 2 * Math.PI * (k + r.nextDouble(-0.3, 0.3)) / 12));
        }
        Vec2 centre = Vec2.polar(r.nextDouble(0, 0.01), r.nextDouble(0, 2 * Math.PI));
        List<Vec2> hole = PlateScenes.circle(centre, r.nextDouble(0.004, 0.008), 5 + r.nextInt(4));
        List<Conductor.Electrode> electrodes = List.of(
                new Conductor.Electrode("a", outline.get(0).plus(outline.get(1)).times(0.5)),
                new Conductor.Electrode("b", outline.get(6).plus(outline.get(7)).times(0.5)));
        Vec2 pivot = new Vec2(r.nextDouble(-0.02, 0.02), r.nextDouble(-0.02, 0.02));
        List<Source> magnets = new ArrayList<>();
        int count = 1 + r.nextInt(3);
        for (int k = 0; k < count; k++) {
            magnets.add(new Source.BlockMagnet("m" + k, Body.FIXED, new Vec2(r.nextDouble(-0.03, 0.03),
                    r.nextDouble(-0.03, 0.03)), r.nextDouble(0.005, 0.015), r.nextDouble(0.005, 0.015), 0.005,
                    r.nextDouble(0, Math.PI), r.nextDouble(0.001, 0.004), Source.Side.BELOW, 1.2,
                    r.nextBoolean() ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z));
        }
        return PlateScenes.scene(List.of(new Body("carrier", "carrier", pivot, motion)), magnets,
                List.of(PlateScenes.plate("plate", "carrier", outline, List.of(hole), 0.002, electrodes,
                        List.of(new Conductor.ElectrodePair("a", "b")), OptionalDouble.empty())));
    }

    /** A random prescribed motion and its reverse (the same path run backwards in velocity at t = 0). */
    private static Motion[] motions(SplittableRandom r) {
        Vec2 v = Vec2.polar(r.nextDouble(0.2, 1), r.nextDouble(0, 2 * Math.PI));
        double omega = r.nextDouble(5, 30) * (r.nextBoolean() ? 1 : -1);
        double start = r.nextDouble(0, 2 * Math.PI);
        double amplitude = r.nextDouble(0.002, 0.01);
        double direction = r.nextDouble(0, Math.PI);
        // A path through (offset, angle) at t = 0 that both moves and turns, and the same path backwards.
        Vec2 offset = new Vec2(r.nextDouble(-0.01, 0.01), r.nextDouble(-0.01, 0.01));
        Vec2 shift = v.times(0.1);
        double turn = omega * 0.1;
        Motion.Path.Key early = new Motion.Path.Key(-0.1, offset.minus(shift), start - turn);
        Motion.Path.Key late = new Motion.Path.Key(0.1, offset.plus(shift), start + turn);
        return switch (r.nextInt(4)) {
            case 0 -> new Motion[] {new Motion.Glide(v), new Motion.Glide(v.times(-1))};
            case 1 -> new Motion[] {new Motion.Spin(omega, start), new Motion.Spin(-omega, start)};
            case 2 -> new Motion[] {new Motion.Oscillate(amplitude, 20, direction, 0),
                new Motion.Oscillate(amplitude, 20, direction, Math.PI)};
            default -> new Motion[] {
                new Motion.Path(List.of(early, late), Motion.Path.Blend.LINEAR),
                new Motion.Path(List.of(new Motion.Path.Key(-0.1, late.offset(), late.angleRad()),
                        new Motion.Path.Key(0.1, early.offset(), early.angleRad())), Motion.Path.Blend.LINEAR)};
        };
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void joulePowerIsTheMechanicalPowerTaken(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Motion[] motion = motions(r);
        Scene scene = scene(r, motion[0]);
        double t = 0.004;
        SheetState plate = PlateScenes.sheet(scene, t, "plate");
        Pose pose = scene.body("carrier").orElseThrow().poseAt(t);
        double mechanical = -plate.forceN().dot(pose.velocity()) - plate.torqueNm() * pose.omegaRadPerS();
        assertEquals(plate.joulePowerW(), mechanical, BALANCE * plate.joulePowerW(),
                "seed " + seed + ": P = −F·V − τ·ω with " + motion[0]);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void reversingTheMotionReversesDragTorqueAndVoltage(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Motion[] motion = motions(r);
        long layout = r.nextLong();
        SheetState forward = PlateScenes.sheet(scene(new SplittableRandom(layout), motion[0]), 0, "plate");
        SheetState backward = PlateScenes.sheet(scene(new SplittableRandom(layout), motion[1]), 0, "plate");
        double force = forward.forceN().length();
        assertEquals(-forward.forceN().x(), backward.forceN().x(), ODD * force, "F_x, seed " + seed);
        assertEquals(-forward.forceN().y(), backward.forceN().y(), ODD * force, "F_y, seed " + seed);
        assertEquals(-forward.torqueNm(), backward.torqueNm(), ODD * Math.abs(forward.torqueNm()), "τ, seed " + seed);
        assertEquals(forward.joulePowerW(), backward.joulePowerW(), ODD * forward.joulePowerW(), "P, seed " + seed);
        double voltage = forward.pairs().get(0).voltageV();
        assertEquals(-voltage, backward.pairs().get(0).voltageV(), ODD * Math.abs(voltage), "U, seed " + seed);
        assertEquals(forward.pairs().get(0).positive().map(e -> e.equals("a") ? "b" : "a"),
                backward.pairs().get(0).positive(), "the other electrode is +, seed " + seed);
    }
}
