package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Symmetries every correct solution has, over random scenes of moving loops, wires and patches:
 * Maxwell's equations are linear (superposition), and have no preferred origin or direction in
 * the plane (Euclidean invariance); reversing a conductor's orientation reverses every signed
 * quantity measured along it (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013,
 * §7.1.3 sign conventions; common practice).
 */
class InvarianceTest {

    private static final int CASES = 100;
    /** Rounding allowance, as a fraction of each conductor's EMF (or flux, or force) bound. */
    private static final double ROUNDING = 1e-9;
    /** Moving everything by up to this much costs about one decimal digit of the ~1 m geometry. */
    private static final double SHIFT_M = 5;

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0x1_4a41_a4ceL, CASES);
    }

    private static Snapshot solve(Scene scene, double tS) {
        return new SceneSolver(scene).at(tS);
    }

    /** Tolerances for one conductor from the test's own bounds. */
    private record Bounds(double emfV, double fluxWb, double forceN) {

        static Bounds of(Scene scene, ConductorState state) {
            Conductor conductor = scene.conductor(state.id()).orElseThrow();
            int turns = conductor instanceof Conductor.Loop loop ? loop.turns() : 1;
            double emf = RandomScenes.emfBound(scene, state, turns);
            double bSum = scene.sources().stream().mapToDouble(s -> s instanceof Source.FieldPatch p ? Math.abs(p.bzT())
                    : Math.abs(((Source.UniformField) s).bzT())).sum();
            double length = 0;
            for (int i = 0; i < state.vertices().size(); i++) {
                length += state.vertices().get((i + 1) % state.vertices().size()).minus(state.vertices().get(i)).length();
            }
            double current = conductor instanceof Conductor.Loop ? emf / state.resistanceOhm() : 0;
            return new Bounds(ROUNDING * emf, ROUNDING * bSum * length * length,
                    ROUNDING * turns * current * bSum * length);
        }
    }

    private static void assertSameSigned(ConductorState expected, ConductorState actual, double sign, Bounds bounds,
                                         String where) {
        assertEquals(sign * expected.emfV(), actual.emfV(), bounds.emfV(), "EMF, " + where);
        if (expected.kind() == ConductorState.Kind.LOOP) {
            assertEquals(sign * expected.fluxWb(), actual.fluxWb(), bounds.fluxWb(), "flux, " + where);
            assertEquals(sign * expected.currentA(), actual.currentA(), bounds.emfV() / expected.resistanceOhm(),
                    "current, " + where);
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void shiftingEverythingChangesNothing(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene scene = RandomScenes.mixed(r).scene();
        double t = RandomScenes.time(r);
        Scene shifted = SceneMaps.moved(scene, 0, RandomScenes.vector(r, SHIFT_M));
        Snapshot before = solve(scene, t);
        Snapshot after = solve(shifted, t);
        for (ConductorState a : before.conductors()) {
            ConductorState b = after.conductor(a.id()).orElseThrow();
            Bounds bounds = Bounds.of(scene, a);
            String where = a.id() + ", seed " + seed;
            assertSameSigned(a, b, 1, bounds, where);
            assertEquals(a.forceN().x(), b.forceN().x(), bounds.forceN() * SHIFT_M, "force x, " + where);
            assertEquals(a.forceN().y(), b.forceN().y(), bounds.forceN() * SHIFT_M, "force y, " + where);
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void turningEverythingKeepsEmfAndTurnsForces(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene scene = RandomScenes.mixed(r).scene();
        double t = RandomScenes.time(r);
        double angle = r.nextDouble(-Math.PI, Math.PI);
        Snapshot before = solve(scene, t);
        Snapshot after = solve(SceneMaps.moved(scene, angle, Vec2.ZERO), t);
        for (ConductorState a : before.conductors()) {
            ConductorState b = after.conductor(a.id()).orElseThrow();
            Bounds bounds = Bounds.of(scene, a);
            String where = a.id() + ", seed " + seed;
            assertSameSigned(a, b, 1, bounds, where);
            Vec2 turned = a.forceN().rotate(angle);
            assertEquals(turned.x(), b.forceN().x(), bounds.forceN(), "force x, " + where);
            assertEquals(turned.y(), b.forceN().y(), bounds.forceN(), "force y, " + where);
            assertEquals(a.direction(), b.direction(), where);
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void reversingVertexOrderFlipsSignsButNotTheSenseOnScreen(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Scene scene = RandomScenes.mixed(r).scene();
        double t = RandomScenes.time(r);
        List<Conductor> reversed = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            List<Conductor.Vertex> vertices = new ArrayList<>(c.vertices());
            java.util.Collections.reverse(vertices);
            reversed.add(c instanceof Conductor.Loop l
                    ? new Conductor.Loop(l.id(), l.body(), vertices, l.turns(), l.wire(), l.open(), l.loadOhm(),
                            l.temperatureC())
                    : new Conductor.Wire(c.id(), c.body(), vertices));
        }
        Snapshot before = solve(scene, t);
        Snapshot after = solve(scene.withConductors(reversed), t);
        for (ConductorState a : before.conductors()) {
            ConductorState b = after.conductor(a.id()).orElseThrow();
            Bounds bounds = Bounds.of(scene, a);
            String where = a.id() + ", seed " + seed;
            assertSameSigned(a, b, -1, bounds, where);
            assertEquals(a.forceN().x(), b.forceN().x(), bounds.forceN(), "force x, " + where);
            assertEquals(a.forceN().y(), b.forceN().y(), bounds.forceN(), "force y, " + where);
            assertEquals(a.direction(), b.direction(), where);
            assertEquals(swapped(a.positiveEnd()), b.positiveEnd(), where);
        }
    }

    private static Terminal swapped(Terminal end) {
        return end == Terminal.FIRST ? Terminal.LAST : end == Terminal.LAST ? Terminal.FIRST : Terminal.NONE;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void sourcesSuperpose(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        RandomScenes.Mixed parts = RandomScenes.mixed(r);
        double t = RandomScenes.time(r);
        Scene both = parts.scene();
        Snapshot all = solve(both, t);
        Snapshot still = solve(parts.with(parts.staticSources()), t);
        Snapshot moving = solve(parts.with(parts.movingSources()), t);
        for (ConductorState ab : all.conductors()) {
            ConductorState a = still.conductor(ab.id()).orElseThrow();
            ConductorState b = moving.conductor(ab.id()).orElseThrow();
            Bounds bounds = Bounds.of(both, ab);
            String where = ab.id() + ", seed " + seed;
            assertEquals(a.emfV() + b.emfV(), ab.emfV(), bounds.emfV(), "EMF, " + where);
            if (ab.kind() == ConductorState.Kind.LOOP) {
                assertEquals(a.fluxWb() + b.fluxWb(), ab.fluxWb(), bounds.fluxWb(), "flux, " + where);
                // Force is bilinear, I·∮dl×B: superpose the force per ampere, N·∮dl×B, where
                // a current flows to define it; F·I_a·I_b = I_ab·(F_a·I_b + F_b·I_a) avoids dividing.
                double ia = a.currentA();
                double ib = b.currentA();
                double iab = ab.currentA();
                double currentScale = bounds.emfV() / ROUNDING / ab.resistanceOhm();
                double tolerance = bounds.forceN() * currentScale * currentScale;
                assertEquals(ab.forceN().x() * ia * ib, iab * (a.forceN().x() * ib + b.forceN().x() * ia), tolerance,
                        "force x, " + where);
                assertEquals(ab.forceN().y() * ia * ib, iab * (a.forceN().y() * ib + b.forceN().y() * ia), tolerance,
                        "force y, " + where);
            }
        }
    }
}
