package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PlaneField;

/**
 * The induced EMF along a still open wire beside magnets and coils on a rigidly moving body
 * (glide, spin, oscillation, acceleration, smooth path), and sometimes an AC coil as well,
 * against its definition −d/dt ∫ A·dl (Griffiths, <i>Introduction to Electrodynamics</i>,
 * 4th ed., 2013, §7.2.4, E = −∂A/∂t for a changing field without charges), computed here
 * independently: A of every placed source from its closed form, the line integral by composite
 * Gauss–Legendre on short pieces, the time derivative by a five-point central difference.
 * The solver takes rigidly moving steady sources in closed form ({@link RigidInduction}), which
 * this checks, and AC coils by its own time difference.
 */
class OpenWireInductionTest {

    private static final int CASES = 40;
    /** The solver's claim for EMF, relative (as for the two EMF methods). */
    private static final double AGREEMENT = 1e-6;
    /** Rounding of the time differences (the reference's and the solver's), as a fraction of an EMF bound. */
    private static final double ROUNDING = 1e-9;
    /** Reference quadrature: Gauss–Legendre nodes per piece and the piece length, metres. */
    private static final int NODES = 10;
    private static final double PIECE_M = 0.01;
    /** Reference time step, seconds: the scenes change over about 0.05 s (5 cm at 1 m/s). */
    private static final double STEP_S = 1e-5;
    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(NODES, 0, 1);

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0x0e_a1_3e_77L, CASES);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void stillWireBesideMovingSourcesSeesMinusTheRateOfItsPotentialIntegral(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Source> sources = new ArrayList<>(PhysicalSourceEmfTest.physicalSources(r, "moving", "carrier"));
        if (r.nextBoolean()) {
            sources.add(new Source.SourceCoil("ac", Body.FIXED, new Source.CoilShape.Circle(
                    RandomScenes.vector(r, 0.5), r.nextDouble(0.3, 0.8)), 10, 0.1,
                    new Source.Drive(0, r.nextDouble(1, 5), r.nextDouble(0.5, 3), 0)));
        }
        List<Vec2> path = RandomScenes.tangle(r, Vec2.ZERO, 1, 2 + r.nextInt(4));
        Scene scene = TestScenes.scene(
                List.of(new Body("carrier", "carrier", RandomScenes.vector(r, 2), RandomScenes.rigidMotion(r))),
                sources, List.of(new Conductor.Wire("wire", Body.FIXED, TestScenes.vertices(path))));
        double t = RandomScenes.time(r);

        ConductorState wire = new SceneSolver(scene).at(t).conductor("wire").orElseThrow();

        Kinematics kinematics = Kinematics.prescribed(scene);
        double[] f = new double[4];
        int[] offsets = {-2, -1, 1, 2};
        for (int k = 0; k < offsets.length; k++) {
            f[k] = potentialIntegral(scene, kinematics, path, t + offsets[k] * STEP_S);
        }
        // −f'(t) ≈ −[f(t−2h) − 8f(t−h) + 8f(t+h) − f(t+2h)]/(12h) (Abramowitz & Stegun 1964, eq. 25.3.6; from memory)
        double expected = -(f[0] - 8 * f[1] + 8 * f[2] - f[3]) / (12 * STEP_S);
        assertTrue(wire.inducedFieldIncluded(), "seed " + seed);
        assertEquals(expected, wire.emfV(), AGREEMENT * Math.abs(expected) + ROUNDING * RandomScenes.physicalEmfBound(scene, length(path)),
                "seed " + seed + ", t = " + t);
    }

    private static double length(List<Vec2> path) {
        double length = 0;
        for (int i = 0; i + 1 < path.size(); i++) {
            length += path.get(i + 1).minus(path.get(i)).length();
        }
        return length;
    }

    /** ∫ A·dl along the still path at tS, every source placed at its body's pose then. */
    private static double potentialIntegral(Scene scene, Kinematics kinematics, List<Vec2> path, double tS) {
        double[] a = new double[2];
        double sum = 0;
        for (Source source : scene.sources()) {
            Pose pose = kinematics.poseAt(source.body(), tS);
            PlaneField field = SourceFields.place(source, pose, tS);
            for (int e = 0; e + 1 < path.size(); e++) {
                Vec2 start = path.get(e);
                Vec2 d = path.get(e + 1).minus(start);
                int pieces = (int) Math.ceil(d.length() / PIECE_M);
                for (int p = 0; p < pieces; p++) {
                    for (int k = 0; k < NODES; k++) {
                        double s = (p + RULE.getPoint(k)) / pieces;
                        field.potential(start.x() + s * d.x(), start.y() + s * d.y(), a);
                        sum += RULE.getWeight(k) / pieces * (a[0] * d.x() + a[1] * d.y());
                    }
                }
            }
        }
        return sum;
    }
}
