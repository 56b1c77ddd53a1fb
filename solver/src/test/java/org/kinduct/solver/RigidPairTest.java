package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.GradientField;
import org.kinduct.solver.field.PlaneField;

/**
 * {@link RigidPair} against independent references: its flux against {@link PlaneField#flux}, its
 * flux rate against a time difference of that flux with loop and source moved along their rigid
 * motions, its motional EMF against −dΦ/dt (Faraday's flux rule for a contour moving rigidly
 * relative to a rigid source; Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013,
 * §7.1.3) and its force against the edge moments of {@link EdgeSums}. Seeded random magnets and
 * coils (centimetre sizes, millimetre stand-offs), polygons that may cross themselves, and rigid
 * motions of both with speeds about 0.1 m/s and turn rates about 10 rad/s.
 */
class RigidPairTest {

    private static final int CASES = 60;
    /** Flux and force: the same integrals by another adaptive pass, each to about 1e-10. */
    private static final double SAME_INTEGRAL = 1e-9;
    /**
     * Flux rate against the difference: the eight-point difference with h = T/1000 leaves
     * (h/T)⁸ ≈ 1e-24 of truncation, and adaptive quadrature to 1e-10 at each time can move the
     * flux by 1e-10·Φ, which the difference turns into 1e-7·Φ/T.
     */
    private static final double DIFFERENCE_LEVEL = 1e-6;
    /** The two methods share nothing but nodes: each integral's own tolerance. */
    private static final double METHODS_LEVEL = 1e-8;

    static Stream<Long> seeds() {
        return RandomScenes.seeds(0x716_1D0AL, CASES);
    }

    /** A constant-velocity, constant-turn-rate pose about {@code pivot}, as {@link org.kinduct.scene.Motion} gives. */
    private record Rigid(Vec2 pivot, Vec2 velocity, double omega) {
        Pose at(double tS) {
            return new Pose(pivot, velocity.times(tS), omega * tS, velocity, omega);
        }
    }

    private static Rigid rigid(SplittableRandom r) {
        return new Rigid(RandomScenes.vector(r, 0.01), RandomScenes.vector(r, 0.1), r.nextDouble(-10, 10));
    }

    private static Source source(SplittableRandom r) {
        Vec2 at = RandomScenes.vector(r, 0.01);
        Source.Side side = r.nextBoolean() ? Source.Side.BELOW : Source.Side.ABOVE;
        Source.Magnetization north = r.nextBoolean() ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z;
        double standoff = r.nextDouble(0.0005, 0.004);
        switch (r.nextInt(4)) {
            case 0:
                return new Source.BlockMagnet("m", Body.FIXED, at, r.nextDouble(0.003, 0.02), r.nextDouble(0.003, 0.02),
                        r.nextDouble(0.002, 0.01), r.nextDouble(0, Math.PI), standoff, side, 1.2, north);
            case 1:
                return new Source.CylinderMagnet("m", Body.FIXED, at, r.nextDouble(0.002, 0.01), r.nextDouble(0.002, 0.01),
                        standoff, side, 1.2, north);
            case 2:
                return new Source.SourceCoil("m", Body.FIXED, new Source.CoilShape.Circle(at, r.nextDouble(0.003, 0.015)),
                        10, side == Source.Side.BELOW ? -standoff : standoff, Source.Drive.dc(2));
            default:
                return new Source.SourceCoil("m", Body.FIXED,
                        new Source.CoilShape.Polygon(RandomScenes.star(r, at, 0.012, 3 + r.nextInt(4))), 10,
                        side == Source.Side.BELOW ? -standoff : standoff, Source.Drive.dc(2));
        }
    }

    private static PlacedConductor place(Vec2[] drawn, Pose pose) {
        int n = drawn.length;
        PlacedConductor placed = new PlacedConductor(new double[n], new double[n], new double[n], new double[n], true);
        for (int i = 0; i < n; i++) {
            Vec2 p = pose.place(drawn[i]);
            Vec2 v = pose.velocityAt(p);
            placed.xs()[i] = p.x();
            placed.ys()[i] = p.y();
            placed.vx()[i] = v.x();
            placed.vy()[i] = v.y();
        }
        return placed;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxRateIsTheTimeDerivativeOfTheFluxAndMinusTheMotionalEmf(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Source source = source(r);
        Rigid sourceMotion = rigid(r);
        Rigid loopMotion = rigid(r);
        Vec2[] drawn = (r.nextBoolean() ? RandomScenes.star(r, RandomScenes.vector(r, 0.01), 0.015, 3 + r.nextInt(6))
                : RandomScenes.tangle(r, RandomScenes.vector(r, 0.01), 0.015, 4 + r.nextInt(4))).toArray(Vec2[]::new);
        double tS = r.nextDouble(-0.05, 0.05);

        PlaneField field = SourceFields.place(source, sourceMotion.at(tS), tS);
        PlacedConductor loop = place(drawn, loopMotion.at(tS));
        RigidPair pair = RigidPair.of((GradientField) field, sourceMotion.at(tS), loop, loopMotion.at(tS));

        double flux = field.flux(loop.xs(), loop.ys());
        String where = "seed " + seed + ", " + source.getClass().getSimpleName();
        assertEquals(flux, pair.fluxWb(), SAME_INTEGRAL * Math.abs(flux) + 1e-22, where);

        // T: the time over which the relative pose changes appreciably (1 cm at the fastest point's
        // relative speed; each body turns about its own pivot, a few centimetres from the other's).
        double speed = loopMotion.velocity().minus(sourceMotion.velocity()).length()
                + 0.05 * (Math.abs(loopMotion.omega()) + Math.abs(sourceMotion.omega()));
        double timeScale = 0.01 / speed;
        double rate = fluxRate(source, sourceMotion, loopMotion, drawn, tS, timeScale / 1000);
        double rateScale = Math.max(Math.abs(rate), Math.abs(flux) / timeScale);
        assertEquals(rate, pair.fluxRateWbPerS(), DIFFERENCE_LEVEL * rateScale, "flux rate, " + where);
        assertEquals(-pair.fluxRateWbPerS(), pair.motionalV(), METHODS_LEVEL * rateScale, "motional EMF, " + where);

        EdgeSums sums = EdgeSums.along(field, loop);
        double forceScale = Math.abs(sums.forceXNPerA()) + Math.abs(sums.forceYNPerA());
        assertEquals(sums.forceXNPerA(), pair.forceXNPerA(), SAME_INTEGRAL * forceScale, "force x, " + where);
        assertEquals(sums.forceYNPerA(), pair.forceYNPerA(), SAME_INTEGRAL * forceScale, "force y, " + where);
    }

    /**
     * dΦ/dt by the eight-point central difference
     * [672(f₁ − f₋₁) − 168(f₂ − f₋₂) + 32(f₃ − f₋₃) − 3(f₄ − f₋₄)]/(840h) (Fornberg, Math. Comp. 51,
     * 699–706, 1988, Table 1; from memory), the flux through the loop as placed at each time.
     */
    private static double fluxRate(Source source, Rigid sourceMotion, Rigid loopMotion, Vec2[] drawn, double tS,
                                   double h) {
        int[] weights = {672, -168, 32, -3};
        double sum = 0;
        for (int k = 1; k <= 4; k++) {
            sum += weights[k - 1] * (flux(source, sourceMotion, loopMotion, drawn, tS + k * h)
                    - flux(source, sourceMotion, loopMotion, drawn, tS - k * h));
        }
        return sum / (840 * h);
    }

    private static double flux(Source source, Rigid sourceMotion, Rigid loopMotion, Vec2[] drawn, double tS) {
        PlacedConductor loop = place(drawn, loopMotion.at(tS));
        return SourceFields.place(source, sourceMotion.at(tS), tS).flux(loop.xs(), loop.ys());
    }
}
