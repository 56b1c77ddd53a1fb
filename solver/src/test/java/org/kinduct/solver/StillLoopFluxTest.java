package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
 * A still loop among magnets and coils that stand still, move rigidly, start from rest with an
 * acceleration (at rest at t = 0, yet elsewhere a moment later) or carry AC: its flux and both
 * EMF methods against Faraday's law EMF = −N dΦ/dt (Griffiths, <i>Introduction to
 * Electrodynamics</i>, 4th ed., 2013, §7.1.3) computed here independently, Φ at each time summed
 * over the sources placed at their bodies' poses then, the derivative by a five-point central
 * difference. The solver reuses a still loop's per-source flux between its stencil times and
 * methods; this checks that reuse against evaluation from scratch.
 */
class StillLoopFluxTest {

    private static final int CASES = 40;
    /** The solver's claim for the EMF, relative (as for the two EMF methods). */
    private static final double AGREEMENT = 1e-6;
    /** Rounding of the time differences (the reference's and the solver's), as a fraction of an EMF bound. */
    private static final double ROUNDING = 1e-9;
    /** Flux is a sum of quadratures good to about 1e-10 of each part; both sides use the same ones. */
    private static final double FLUX_LEVEL = 1e-12;
    /** Reference time step, seconds: the scenes change over about 0.05 s (5 cm at 1 m/s). */
    private static final double STEP_S = 1e-5;

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0x5711_100bL, CASES);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void stillLoopSeesMinusTheRateOfItsFluxWhateverTheSourcesDo(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Body> bodies = List.of(
                new Body("moving", "moving", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r)),
                new Body("starting", "starting", Vec2.ZERO, new Motion.Accelerate(Vec2.ZERO, RandomScenes.vector(r, 2))));
        List<Source> sources = new ArrayList<>(PhysicalSourceEmfTest.physicalSources(r, "moving", "moving"));
        sources.addAll(PhysicalSourceEmfTest.physicalSources(r, "still", Body.FIXED));
        sources.addAll(PhysicalSourceEmfTest.physicalSources(r, "starting", "starting"));
        if (r.nextBoolean()) {
            sources.add(new Source.SourceCoil("ac", Body.FIXED, new Source.CoilShape.Circle(
                    RandomScenes.vector(r, 0.5), r.nextDouble(0.3, 0.8)), 10, 0.1,
                    new Source.Drive(0, r.nextDouble(1, 5), r.nextDouble(0.5, 3), 0)));
        }
        List<Vec2> shape = RandomScenes.loopShape(r);
        int turns = 1 + r.nextInt(10);
        Scene scene = TestScenes.scene(bodies, sources, List.of(new Conductor.Loop("loop", Body.FIXED,
                TestScenes.vertices(shape), turns, TestScenes.COPPER_1MM, false, 0, 20)));
        // Half of the cases at t = 0, where the starting body is at rest but not for long.
        double t = r.nextBoolean() ? 0 : RandomScenes.time(r);

        ConductorState loop = new SceneSolver(scene).at(t).conductor("loop").orElseThrow();

        Kinematics kinematics = Kinematics.prescribed(scene);
        double[] xs = TestScenes.xs(shape);
        double[] ys = TestScenes.ys(shape);
        double[] magnitude = new double[1];
        double flux = flux(scene, kinematics, xs, ys, t, magnitude);
        int[] offsets = {-2, -1, 1, 2};
        double[] f = new double[offsets.length];
        for (int k = 0; k < offsets.length; k++) {
            f[k] = flux(scene, kinematics, xs, ys, t + offsets[k] * STEP_S, new double[1]);
        }
        // −f'(t) ≈ −[f(t−2h) − 8f(t−h) + 8f(t+h) − f(t+2h)]/(12h) (Abramowitz & Stegun 1964, eq. 25.3.6; from memory)
        double expected = -turns * (f[0] - 8 * f[1] + 8 * f[2] - f[3]) / (12 * STEP_S);
        double perimeter = 0;
        for (int i = 0; i < shape.size(); i++) {
            perimeter += shape.get((i + 1) % shape.size()).minus(shape.get(i)).length();
        }
        double tolerance = AGREEMENT * Math.abs(expected)
                + ROUNDING * turns * RandomScenes.physicalEmfBound(scene, perimeter);
        assertEquals(flux, loop.fluxWb(), FLUX_LEVEL * magnitude[0], "flux, seed " + seed + ", t = " + t);
        assertEquals(expected, loop.emfFluxV(), tolerance, "flux rule, seed " + seed + ", t = " + t);
        assertEquals(expected, loop.emfMotionalV(), tolerance, "motional method, seed " + seed + ", t = " + t);
    }

    /** Σ over the sources placed at tS of the flux through the polygon; Σ|parts| into {@code magnitude[0]}. */
    private static double flux(Scene scene, Kinematics kinematics, double[] xs, double[] ys, double tS,
                               double[] magnitude) {
        double sum = 0;
        for (Source source : scene.sources()) {
            double part = SourceFields.place(source, kinematics.poseAt(source.body(), tS), tS).flux(xs, ys);
            sum += part;
            magnitude[0] += Math.abs(part);
        }
        return sum;
    }
}
