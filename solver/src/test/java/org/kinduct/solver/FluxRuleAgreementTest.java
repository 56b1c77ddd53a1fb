package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
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
 * The flux rule −dλ/dt and the motional EMF ∮ (v × B)·dl are one law for a contour moving or
 * deforming in a static field (Leibniz rule for moving surfaces; Griffiths, <i>Introduction to
 * Electrodynamics</i>, 4th ed., 2013, §7.1.3, where the flux rule is derived for moving loops).
 * The solver computes them independently — a difference of exact polygon fluxes against exact
 * line integrals of B_z — so their agreement checks both.
 */
class FluxRuleAgreementTest {

    /** The two methods must agree to this, relative (the solver's own accuracy claim). */
    private static final double AGREEMENT = 1e-6;
    /** Plus this fraction of the loop's EMF bound, for EMFs that cancel to nearly zero. */
    private static final double ROUNDING = 1e-9;
    private static final int CASES = 150;

    static Stream<Long> rigidSeeds() {
        return RandomScenes.seeds(0xf1_0001L, CASES);
    }

    static Stream<Long> deformingSeeds() {
        return RandomScenes.seeds(0xdef0_0002L, CASES);
    }

    private static List<Source> staticSources(SplittableRandom r) {
        List<Source> sources = new ArrayList<>(RandomScenes.patches(r, "patch", Body.FIXED));
        if (r.nextBoolean()) {
            sources.add(new Source.UniformField("background", RandomScenes.field(r)));
        }
        return sources;
    }

    private static void assertMethodsAgree(Scene scene, double tS, long seed) {
        for (ConductorState state : new SceneSolver(scene).at(tS).conductors()) {
            int turns = ((Conductor.Loop) scene.conductor(state.id()).orElseThrow()).turns();
            double bound = RandomScenes.emfBound(scene, state, turns);
            double larger = Math.max(Math.abs(state.emfFluxV()), Math.abs(state.emfMotionalV()));
            assertEquals(state.emfFluxV(), state.emfMotionalV(), AGREEMENT * larger + ROUNDING * bound,
                    "seed " + seed + ", t = " + tS);
            assertTrue(state.disagreement() <= AGREEMENT,
                    "reported disagreement " + state.disagreement() + ", seed " + seed + ", t = " + tS);
        }
    }

    @ParameterizedTest
    @MethodSource("rigidSeeds")
    void fluxRuleEqualsMotionalEmfForRigidlyMovingLoops(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Body carrier = new Body("carrier", "carrier", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r));
        Conductor.Loop loop = new Conductor.Loop("loop", "carrier", TestScenes.vertices(RandomScenes.loopShape(r)),
                1 + r.nextInt(20), TestScenes.COPPER_1MM, r.nextBoolean(), 0, 20);
        Scene scene = TestScenes.scene(List.of(carrier), staticSources(r), List.of(loop));
        assertMethodsAgree(scene, RandomScenes.time(r), seed);
    }

    @ParameterizedTest
    @MethodSource("deformingSeeds")
    void fluxRuleEqualsMotionalEmfForLoopsWhoseVerticesRideDifferentBodies(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Body> bodies = List.of(
                new Body("a", "a", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r)),
                new Body("b", "b", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r)));
        List<Conductor.Vertex> vertices = new ArrayList<>();
        for (Vec2 p : RandomScenes.loopShape(r)) {
            vertices.add(new Conductor.Vertex(p, List.of(Body.FIXED, "a", "b").get(r.nextInt(3))));
        }
        Conductor.Loop loop = new Conductor.Loop("loop", "a", vertices, 1, TestScenes.COPPER_1MM, false, 0, 20);
        Scene scene = TestScenes.scene(bodies, staticSources(r), List.of(loop));
        assertMethodsAgree(scene, RandomScenes.time(r), seed);
    }

    @ParameterizedTest
    @MethodSource("rigidSeeds")
    void transformerTermMatchesFluxRuleWhenPatchesMoveAndLoopsToo(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Body> bodies = List.of(
                new Body("loops", "loops", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r)),
                new Body("magnets", "magnets", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r)));
        List<Source> sources = new ArrayList<>(RandomScenes.patches(r, "moving", "magnets"));
        sources.addAll(staticSources(r));
        Conductor.Loop loop = TestScenes.loop("loop", "loops", RandomScenes.loopShape(r));
        assertMethodsAgree(TestScenes.scene(bodies, sources, List.of(loop)), RandomScenes.time(r), seed);
    }
}
