package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * EMF in the fields of magnets and coils: the invariants the patch tests check (flux rule =
 * motional EMF, relative motion only, superposition), the induced electric field along a closed
 * wire, and published closed forms. These need the physical field kernels
 * ({@code PhysicalSources}); they run once those are in place.
 */
class PhysicalSourceEmfTest {

    /** μ0, CODATA 2018 (NIST). */
    private static final double MU0 = 1.25663706212e-6;
    private static final int CASES = 40;
    /** The two methods, and the two frames, must agree to this relative (the solver's claim). */
    private static final double AGREEMENT = 1e-6;
    /** Rounding of time differences, as a fraction of an EMF bound. */
    private static final double ROUNDING = 1e-9;

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0x9_a6e7_5L, CASES);
    }

    /** A block or cylinder magnet, or a DC polygon or circle coil, near the origin, on {@code body}. */
    static Source physicalSource(SplittableRandom r, String id, String body) {
        Vec2 center = RandomScenes.vector(r, 1);
        Source.Side side = r.nextBoolean() ? Source.Side.BELOW : Source.Side.ABOVE;
        Source.Magnetization north = r.nextBoolean() ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z;
        switch (r.nextInt(4)) {
            case 0:
                return new Source.BlockMagnet(id, body, center, r.nextDouble(0.2, 0.6), r.nextDouble(0.2, 0.6),
                        r.nextDouble(0.05, 0.3), r.nextDouble(-Math.PI, Math.PI), r.nextDouble(0.05, 0.2), side,
                        r.nextDouble(0.2, 1.4), north);
            case 1:
                return new Source.CylinderMagnet(id, body, center, r.nextDouble(0.1, 0.4), r.nextDouble(0.05, 0.3),
                        r.nextDouble(0.05, 0.2), side, r.nextDouble(0.2, 1.4), north);
            case 2:
                return new Source.SourceCoil(id, body,
                        new Source.CoilShape.Polygon(RandomScenes.star(r, center, r.nextDouble(0.3, 0.8), 3 + r.nextInt(5))),
                        1 + r.nextInt(100), (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.05, 0.3),
                        Source.Drive.dc(r.nextDouble(-10, 10)));
            default:
                return new Source.SourceCoil(id, body, new Source.CoilShape.Circle(center, r.nextDouble(0.3, 0.8)),
                        1 + r.nextInt(100), (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.05, 0.3),
                        Source.Drive.dc(r.nextDouble(-10, 10)));
        }
    }

    static List<Source> physicalSources(SplittableRandom r, String prefix, String body) {
        return IntStream.range(0, 1 + r.nextInt(3)).mapToObj(i -> physicalSource(r, prefix + i, body)).toList();
    }

    /** Peak-speed EMF bound as in {@link RandomScenes#emfBound}, with a field scale of 1 T per source. */
    private static double emfBound(Scene scene, ConductorState state, int turns) {
        double length = 0;
        for (int i = 0; i < state.vertices().size(); i++) {
            length += state.vertices().get((i + 1) % state.vertices().size()).minus(state.vertices().get(i)).length();
        }
        double speed = 0;
        Kinematics kinematics = Kinematics.prescribed(scene);
        for (Body body : scene.bodies()) {
            for (int i = 0; i <= 100; i++) {
                var pose = kinematics.poseAt(body.id(), i / 100.0);
                speed = Math.max(speed, pose.velocity().length() + Math.abs(pose.omegaRadPerS()) * 3);
            }
        }
        return turns * scene.sources().size() * length * speed;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxRuleEqualsMotionalEmfForLoopsMovingPastMagnetsAndCoils(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Body carrier = new Body("carrier", "carrier", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r));
        Conductor.Loop loop = new Conductor.Loop("loop", "carrier", TestScenes.vertices(RandomScenes.loopShape(r)),
                1 + r.nextInt(20), TestScenes.COPPER_1MM, false, 0, 20);
        Scene scene = TestScenes.scene(List.of(carrier), physicalSources(r, "source", Body.FIXED), List.of(loop));
        double t = RandomScenes.time(r);
        ConductorState state = new SceneSolver(scene).at(t).conductor("loop").orElseThrow();
        double larger = Math.max(Math.abs(state.emfFluxV()), Math.abs(state.emfMotionalV()));
        assertEquals(state.emfFluxV(), state.emfMotionalV(),
                AGREEMENT * larger + ROUNDING * emfBound(scene, state, loop.turns()), "seed " + seed + ", t = " + t);
        assertTrue(state.disagreement() <= AGREEMENT, "disagreement " + state.disagreement() + ", seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void magnetsGlidingPastAStillLoopInduceWhatTheLoopGlidingPastThemWould(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Vec2 v = RandomScenes.vector(r, 1);
        double t = RandomScenes.time(r);
        Vec2 travelled = v.times(t);
        List<Source> sources = physicalSources(r, "source", Body.FIXED);
        List<Vec2> shape = RandomScenes.loopShape(r);
        Scene loopMoves = TestScenes.scene(List.of(new Body("carrier", "carrier", Vec2.ZERO, new Motion.Glide(v))),
                sources, List.of(TestScenes.loop("loop", "carrier", shape)));
        // Same relative geometry at t: the loop drawn where it has got to, the sources drawn ahead by
        // as much and gliding back.
        Scene shiftedBack = SceneMaps.moved(TestScenes.scene(List.of(), sources, List.of()), 0, travelled);
        List<Source> carried = new ArrayList<>();
        for (Source s : shiftedBack.sources()) {
            carried.add(onBody(s, "carrier"));
        }
        Scene sourcesMove = TestScenes.scene(
                List.of(new Body("carrier", "carrier", Vec2.ZERO, new Motion.Glide(v.times(-1)))), carried,
                List.of(TestScenes.loop("loop", Body.FIXED, shape.stream().map(p -> p.plus(travelled)).toList())));
        ConductorState a = new SceneSolver(loopMoves).at(t).conductor("loop").orElseThrow();
        ConductorState b = new SceneSolver(sourcesMove).at(t).conductor("loop").orElseThrow();
        double bound = emfBound(loopMoves, a, 1);
        assertEquals(a.fluxWb(), b.fluxWb(), ROUNDING * bound, "flux, seed " + seed);
        assertEquals(a.emfV(), b.emfV(), AGREEMENT * Math.abs(a.emfV()) + ROUNDING * bound, "EMF, seed " + seed);
    }

    private static Source onBody(Source s, String body) {
        if (s instanceof Source.BlockMagnet m) {
            return new Source.BlockMagnet(m.id(), body, m.center(), m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(),
                    m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.CylinderMagnet c) {
            return new Source.CylinderMagnet(c.id(), body, c.center(), c.radiusM(), c.heightM(), c.standoffM(),
                    c.side(), c.remanenceT(), c.magnetization());
        }
        Source.SourceCoil coil = (Source.SourceCoil) s;
        return new Source.SourceCoil(coil.id(), body, coil.shape(), coil.turns(), coil.planeZM(), coil.drive());
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void inducedFieldAroundAClosedWireEqualsTheFluxRule(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        // A still wire that returns to its start encloses flux; with sources moving (and an AC coil)
        // its EMF is −∮ ∂A/∂t·dl alone, which Stokes turns into −dΦ/dt of the same polygon as a loop.
        List<Source> sources = new ArrayList<>(physicalSources(r, "moving", "carrier"));
        sources.add(new Source.SourceCoil("ac", Body.FIXED, new Source.CoilShape.Circle(RandomScenes.vector(r, 0.5),
                r.nextDouble(0.3, 0.8)), 10, 0.1, new Source.Drive(0, r.nextDouble(1, 5), r.nextDouble(0.5, 3), 0)));
        List<Vec2> shape = RandomScenes.loopShape(r);
        List<Vec2> closed = new ArrayList<>(shape);
        closed.add(shape.get(0));
        Scene scene = TestScenes.scene(
                List.of(new Body("carrier", "carrier", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r))),
                sources, List.of(TestScenes.loop("loop", Body.FIXED, shape),
                        new Conductor.Wire("wire", Body.FIXED, TestScenes.vertices(closed))));
        double t = RandomScenes.time(r);
        Snapshot snapshot = new SceneSolver(scene).at(t);
        ConductorState loop = snapshot.conductor("loop").orElseThrow();
        ConductorState wire = snapshot.conductor("wire").orElseThrow();
        assertTrue(wire.inducedFieldIncluded());
        double bound = emfBound(scene, loop, 1);
        assertEquals(loop.emfFluxV(), wire.emfV(), 1e-6 * Math.abs(loop.emfFluxV()) + ROUNDING * bound,
                "seed " + seed + ", t = " + t);
    }

    @Test
    void pickupLoopCoaxialWithAcCoilFollowsMaxwellsMutualInductance() {
        double a = 0.05;
        double b = 0.03;
        double h = 0.02;
        int sourceTurns = 40;
        int pickupTurns = 15;
        double amplitude = 2;
        double frequency = 50;
        double t = 1.3e-3;
        Source coil = new Source.SourceCoil("drive", Body.FIXED, new Source.CoilShape.Circle(Vec2.ZERO, a), sourceTurns,
                h, new Source.Drive(0, amplitude, frequency, 0));
        // 720-gon of radius b: its area falls short of the circle's by (2π/720)²/6 = 1.3e-5.
        List<Vec2> pickup = IntStream.range(0, 720).mapToObj(i -> Vec2.polar(b, 2 * Math.PI * i / 720)).toList();
        Conductor.Loop loop = new Conductor.Loop("pickup", Body.FIXED, TestScenes.vertices(pickup), pickupTurns,
                TestScenes.COPPER_1MM, true, 0, 20);
        ConductorState state = new SceneSolver(TestScenes.scene(List.of(), List.of(coil), List.of(loop))).at(t)
                .conductor("pickup").orElseThrow();
        // Maxwell: M = μ0·√(ab)·[(2/k − k)·K(m) − (2/k)·E(m)], m = k² = 4ab/((a+b)² + h²)
        // (Rosa & Grover, Bull. Bur. Stand. 8, 1911; DLMF §19.2 for K, E with parameter m).
        double m = 4 * a * b / ((a + b) * (a + b) + h * h);
        double k = Math.sqrt(m);
        double mutual = MU0 * Math.sqrt(a * b) * ((2 / k - k) * LegendreEllipticIntegral.bigK(m)
                - 2 / k * LegendreEllipticIntegral.bigE(m));
        double w = 2 * Math.PI * frequency;
        double expected = -pickupTurns * sourceTurns * mutual * amplitude * w * Math.cos(w * t);
        assertEquals(expected, state.emfV(), 1e-4 * Math.abs(expected));
        assertEquals(expected, state.emfFluxV(), 1e-4 * Math.abs(expected));
    }

    @Test
    void shortRodAcrossABlockMagnetsAxisSeesTheOnAxisField() {
        double side = 0.02;
        double thickness = 0.005;
        double standoff = 0.003;
        double br = 1.2;
        double rod = 2e-5;
        double v = 0.7;
        // North face up, below the plane: the field at the plane points out of the screen.
        Source magnet = new Source.BlockMagnet("magnet", Body.FIXED, Vec2.ZERO, side, side, thickness, 0, standoff,
                Source.Side.BELOW, br, Source.Magnetization.PLUS_Z);
        Conductor.Wire wire = TestScenes.wire("rod", "cart", 0, -rod / 2, 0, rod / 2);
        Scene scene = TestScenes.scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(v, 0)))),
                List.of(magnet), List.of(wire));
        ConductorState state = new SceneSolver(scene).at(0).conductor("rod").orElseThrow();
        // On-axis field of a block, face a×b, thickness L, near face at distance s (Camacho & Sosa,
        // Rev. Mex. Fís. E 59, 2013): B = (Br/π)[atan(ab/(2s√(4s²+a²+b²))) − atan(ab/(2(s+L)√(4(s+L)²+a²+b²)))].
        double s = standoff;
        double far = standoff + thickness;
        double bAxis = br / Math.PI * (Math.atan(side * side / (2 * s * Math.sqrt(4 * s * s + 2 * side * side)))
                - Math.atan(side * side / (2 * far * Math.sqrt(4 * far * far + 2 * side * side))));
        // Rod along +y moving +x in B_z > 0: (v × B)·ŷ = −v·B, so the first (lower) end is + (Griffiths ch. 7).
        assertEquals(-bAxis * rod * v, state.emfV(), 1e-6 * bAxis * rod * v);
        assertEquals(Terminal.FIRST, state.positiveEnd());
    }

    @Test
    void shortRodAcrossACylinderMagnetsAxisSeesTheOnAxisField() {
        double radius = 0.01;
        double length = 0.01;
        double standoff = 0.004;
        double br = 1.3;
        double rod = 2e-5;
        double v = 0.4;
        Source magnet = new Source.CylinderMagnet("magnet", Body.FIXED, Vec2.ZERO, radius, length, standoff,
                Source.Side.ABOVE, br, Source.Magnetization.MINUS_Z);
        // Above the plane with its north face down (−z): the field at the plane points into the screen.
        Conductor.Wire wire = TestScenes.wire("rod", "cart", 0, -rod / 2, 0, rod / 2);
        Scene scene = TestScenes.scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(v, 0)))),
                List.of(magnet), List.of(wire));
        ConductorState state = new SceneSolver(scene).at(0).conductor("rod").orElseThrow();
        // On-axis field of a cylinder (Camacho & Sosa 2013): B = (Br/2)[(L+s)/√(R²+(L+s)²) − s/√(R²+s²)].
        double bAxis = br / 2 * ((length + standoff) / Math.hypot(radius, length + standoff)
                - standoff / Math.hypot(radius, standoff));
        // B_z = −bAxis: the upper (last) end is +, EMF = B·L·v.
        assertEquals(bAxis * rod * v, state.emfV(), 1e-6 * bAxis * rod * v);
        assertEquals(Terminal.LAST, state.positiveEnd());
    }
}
