package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * The EMF around a closed loop depends only on the relative motion of loop and sources: a loop
 * moving through still sources (all motional EMF, ∮ v × B·dl) sees the same EMF as the sources
 * moving the opposite way past the still loop (all transformer EMF, −∮ ∂A/∂t·dl = −∂Φ/∂t). This is
 * Faraday's observation that only relative motion counts, the starting point of special relativity
 * (Einstein, "Zur Elektrodynamik bewegter Körper", Ann. Phys. 17, 1905, introduction;
 * Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1.3). It exercises the
 * transformer term against the independent motional integral.
 */
class FrameChangeTest {

    private static final int CASES = 100;
    /** The transformer term is a time difference: its rounding, relative to the EMF bound. */
    private static final double ROUNDING = 1e-9;
    /** Relative agreement of the two frames, as for the two EMF methods. */
    private static final double AGREEMENT = 1e-6;

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0xf4a3_c4a9L, CASES);
    }

    /**
     * Scene A: the loop rides a body with {@code loopMotion}, the sources stand still. Scene B: the
     * loop stands where A's loop is at {@code tS}, and the sources, drawn where A's relative geometry
     * puts them, ride a body with {@code sourceMotion}.
     */
    private static void assertSameEmf(long seed, SplittableRandom r, Motion loopMotion, Motion sourceMotion,
                                      Vec2 pivot, UnaryOperator<Vec2> loopAtT, UnaryOperator<Vec2> sourcesAtT, double tS) {
        List<Source> sources = new ArrayList<>(RandomScenes.patches(r, "patch", Body.FIXED));
        if (r.nextBoolean()) {
            sources.add(new Source.UniformField("background", RandomScenes.field(r)));
        }
        List<Vec2> shape = RandomScenes.loopShape(r);
        int turns = 1 + r.nextInt(10);
        Scene loopMoves = TestScenes.scene(List.of(new Body("carrier", "carrier", pivot, loopMotion)), sources,
                List.of(new Conductor.Loop("loop", "carrier", TestScenes.vertices(shape), turns, TestScenes.COPPER_1MM,
                        false, 0, 20)));

        List<Source> carried = new ArrayList<>();
        for (Source s : sources) {
            carried.add(s instanceof Source.FieldPatch p
                    ? new Source.FieldPatch(p.id(), "carrier", p.outline().stream().map(sourcesAtT).toList(), p.bzT())
                    : s);
        }
        Scene sourcesMove = TestScenes.scene(List.of(new Body("carrier", "carrier", pivot, sourceMotion)), carried,
                List.of(new Conductor.Loop("loop", Body.FIXED,
                        TestScenes.vertices(shape.stream().map(loopAtT).toList()), turns, TestScenes.COPPER_1MM,
                        false, 0, 20)));

        ConductorState a = new SceneSolver(loopMoves).at(tS).conductor("loop").orElseThrow();
        ConductorState b = new SceneSolver(sourcesMove).at(tS).conductor("loop").orElseThrow();
        double bound = RandomScenes.emfBound(loopMoves, a, turns);
        String where = "seed " + seed + ", t = " + tS;
        for (int i = 0; i < shape.size(); i++) {
            assertTrue(a.vertices().get(i).eq(b.vertices().get(i), 1e-12), "same loop position, " + where);
        }
        assertEquals(a.fluxWb(), b.fluxWb(), ROUNDING * bound, "flux, " + where);
        assertEquals(a.emfV(), b.emfV(), AGREEMENT * Math.abs(a.emfV()) + ROUNDING * bound, "EMF, " + where);
        assertEquals(a.forceN().x(), b.forceN().x(), AGREEMENT * a.forceN().length() + ROUNDING * bound, where);
        assertEquals(a.forceN().y(), b.forceN().y(), AGREEMENT * a.forceN().length() + ROUNDING * bound, where);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void sourcesGlidingPastAStillLoopInduceWhatTheLoopGlidingPastThemWould(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Vec2 v = RandomScenes.vector(r, 1);
        double t = RandomScenes.time(r);
        Vec2 travelled = v.times(t);
        assertSameEmf(seed, r, new Motion.Glide(v), new Motion.Glide(v.times(-1)), Vec2.ZERO,
                p -> p.plus(travelled), p -> p.plus(travelled), t);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void sourcesTurningPastAStillLoopInduceWhatTheLoopTurningPastThemWould(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double omega = (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.5, 2);
        Vec2 pivot = RandomScenes.vector(r, 1.5);
        double t = RandomScenes.time(r);
        UnaryOperator<Vec2> turned = p -> pivot.plus(p.minus(pivot).rotate(omega * t));
        assertSameEmf(seed, r, new Motion.Spin(omega, 0), new Motion.Spin(-omega, 0), pivot, turned, turned, t);
    }
}
