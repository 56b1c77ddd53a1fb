package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.commons.geometry.euclidean.twod.ConvexArea;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PlaneField;

/**
 * A field map's interpolant against fields it must reproduce exactly. Keys' cubic convolution
 * (Keys, IEEE Trans. ASSP 29(6), 1981, §III) agrees with the Taylor series through second order,
 * so it reproduces every quadratic; as a tensor product, every polynomial of degree ≤ 2 in x and in
 * y separately, and his boundary rule f₋₁ = 3f₀ − 3f₁ + f₂ (eq. 19) is exact for them too. The
 * samples of such a polynomial therefore give back the polynomial, and its flux and line moments
 * have independent exact values: flux by Apache Commons Geometry's clipping of the loop to the
 * map's rectangle (BSP regions, then convex pieces) and Gauss–Legendre on each triangle of the
 * pieces (Hipparchus, collapsed-square rule, Stroud, <i>Approximate Calculation of Multiple
 * Integrals</i>, 1971, §2.7), line moments by Gauss–Legendre along the segment.
 */
class FieldMapFieldTest {

    private static final long SEED = 0x5EED_F1E1DL;
    /** The map: 41 × 31 samples, 2.5 mm apart, from (−50 mm, −30 mm). */
    private static final int NX = 41;
    private static final int NY = 31;
    private static final double X0 = -0.05;
    private static final double Y0 = -0.03;
    private static final double H = 0.0025;
    /** Relative agreement: rounding of sums over a few hundred cells and Gauss nodes. */
    private static final double EXACT = 1e-11;
    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(6, 0, 1);

    /** B_z = c0 + c1·x + c2·y + c3·x² + c4·x·y + c5·y² + c6·x²y², tesla, x and y in metres. */
    private record Biquadratic(double[] c) {
        double at(double x, double y) {
            return c[0] + c[1] * x + c[2] * y + c[3] * x * x + c[4] * x * y + c[5] * y * y + c[6] * x * x * y * y;
        }

        static Biquadratic random(SplittableRandom r) {
            return new Biquadratic(new double[] {r.nextDouble(-0.1, 0.1), r.nextDouble(-5, 5), r.nextDouble(-5, 5),
                r.nextDouble(-200, 200), r.nextDouble(-200, 200), r.nextDouble(-200, 200), r.nextDouble(-1e5, 1e5)});
        }
    }

    private static FieldGrid sampled(Biquadratic b) {
        double[] samples = new double[NX * NY];
        for (int j = 0; j < NY; j++) {
            for (int i = 0; i < NX; i++) {
                samples[j * NX + i] = b.at(X0 + i * H, Y0 + j * H);
            }
        }
        return new FieldGrid(FieldGrid.Layout.POINTS, NX, NY, X0, Y0, H, H, 1, samples);
    }

    private static Source.FieldMap map(FieldGrid grid, Source.FieldMap.Outside outside) {
        return new Source.FieldMap("scan", "fixed", "scan.csv", grid, Vec2.ZERO, outside);
    }

    private static PlaneField placed(FieldGrid grid) {
        return SourceFields.place(map(grid, Source.FieldMap.Outside.ZERO), Pose.rest(Vec2.ZERO), 0);
    }

    static Stream<Long> seeds() {
        SplittableRandom master = new SplittableRandom(SEED);
        return IntStream.range(0, 30).mapToObj(i -> master.nextLong());
    }

    private static double scale(Biquadratic b) {
        double peak = 0;
        for (double x = X0; x <= X0 + (NX - 1) * H; x += H) {
            for (double y = Y0; y <= Y0 + (NY - 1) * H; y += H) {
                peak = Math.max(peak, Math.abs(b.at(x, y)));
            }
        }
        return peak;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void interpolantReproducesBiquadraticFieldsEverywhereOnTheMap(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Biquadratic b = Biquadratic.random(r);
        PlaneField field = placed(sampled(b));
        for (int k = 0; k < 200; k++) {
            double x = r.nextDouble(X0, X0 + (NX - 1) * H);
            double y = r.nextDouble(Y0, Y0 + (NY - 1) * H);
            assertEquals(b.at(x, y), field.bz(x, y), EXACT * scale(b), "seed " + seed + " at " + x + ", " + y);
        }
        assertEquals(0, field.bz(X0 - 1e-6, 0), "zero beyond the samples");
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxIsTheExactIntegralOverTheLoopClippedToTheMap(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Biquadratic b = Biquadratic.random(r);
        // Loops of 10–60 mm about a point that may lie off the map, so many are clipped by its edge.
        List<Vec2> loop = PatchFieldTest.star(r, r.nextDouble(-0.06, 0.06), r.nextDouble(-0.04, 0.04),
                r.nextDouble(0.01, 0.06), 3 + r.nextInt(8));
        List<Vec2> oriented = r.nextBoolean() ? loop : TestScenes.reversed(loop);
        double sign = Math.signum(GeometryReference.shoelaceArea(oriented));
        double expected = sign * integralOverClip(b, GeometryReference.region(loop));
        double[] xs = oriented.stream().mapToDouble(Vec2::x).toArray();
        double[] ys = oriented.stream().mapToDouble(Vec2::y).toArray();
        double reference = scale(b) * Math.abs(GeometryReference.shoelaceArea(loop));
        assertEquals(expected, placed(sampled(b)).flux(xs, ys), EXACT * reference, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void lineMomentsAreExactAlongSegmentsOnTheMap(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Biquadratic b = Biquadratic.random(r);
        double ax = r.nextDouble(X0, X0 + (NX - 1) * H);
        double ay = r.nextDouble(Y0, Y0 + (NY - 1) * H);
        double bx = r.nextDouble(X0, X0 + (NX - 1) * H);
        double by = r.nextDouble(Y0, Y0 + (NY - 1) * H);
        double[] out = new double[2];
        placed(sampled(b)).bzMoments(ax, ay, bx, by, out);
        // Along the segment B is a polynomial of degree ≤ 4 in s (the x²y² term), s·B of degree ≤ 5: the
        // six-point Gauss–Legendre rule (exact to degree 11; Abramowitz & Stegun 25.4.29) integrates both exactly.
        double m0 = RULE.integrate(s -> b.at(ax + s * (bx - ax), ay + s * (by - ay)));
        double m1 = RULE.integrate(s -> s * b.at(ax + s * (bx - ax), ay + s * (by - ay)));
        assertEquals(m0, out[0], EXACT * scale(b), "seed " + seed);
        assertEquals(m1, out[1], EXACT * scale(b), "seed " + seed);
    }

    @Test
    void mapRidesItsBodyAndTurnsWithIt() {
        Biquadratic b = new Biquadratic(new double[] {0.01, 1, -2, 30, 40, -50, 1000});
        Source.FieldMap map = new Source.FieldMap("scan", "carriage", "scan.csv", sampled(b), new Vec2(0.004, -0.002),
                Source.FieldMap.Outside.ZERO);
        Pose pose = new Pose(new Vec2(0.01, 0.02), new Vec2(0.003, 0.001), 0.7, Vec2.ZERO, 0);
        PlaneField field = SourceFields.place(map, pose, 0);
        Vec2 drawn = new Vec2(0.012, 0.005);
        Vec2 now = pose.place(drawn);
        // The sample coordinates of a point are where it was drawn less the map's offset (Pose.place inverted).
        assertEquals(b.at(drawn.x() - 0.004, drawn.y() + 0.002), field.bz(now.x(), now.y()), EXACT * scale(b));
    }

    @Test
    void errorRuleRefusesConductorsThatLeaveTheMap() {
        FieldGrid grid = sampled(new Biquadratic(new double[] {0.01, 0, 0, 0, 0, 0, 0}));
        PlaneField field = SourceFields.place(map(grid, Source.FieldMap.Outside.ERROR), Pose.rest(Vec2.ZERO), 0);
        double[] out = new double[2];
        field.bzMoments(0, 0, 0.01, 0, out);
        assertEquals(0.01, out[0], 1e-15, "inside: uniform 10 mT over the whole segment");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> field.bzMoments(0, 0, 0.2, 0, out));
        assertTrue(e.getMessage().contains("beyond field map 'scan'"), e.getMessage());
    }

    /** ∬ over (loop region ∩ map rectangle) of b, by Commons Geometry clipping and Gauss on triangles. */
    private static double integralOverClip(Biquadratic b, RegionBSPTree2D loop) {
        double x1 = X0 + (NX - 1) * H;
        double y1 = Y0 + (NY - 1) * H;
        RegionBSPTree2D rectangle = GeometryReference.region(List.of(new Vec2(X0, Y0), new Vec2(x1, Y0),
                new Vec2(x1, y1), new Vec2(X0, y1)));
        RegionBSPTree2D clipped = RegionBSPTree2D.empty();
        clipped.intersection(loop, rectangle);
        double sum = 0;
        for (ConvexArea piece : clipped.toConvex()) {
            List<Vector2D> v = piece.getVertices();
            for (int k = 1; k + 1 < v.size(); k++) {
                sum += triangle(b, v.get(0), v.get(k), v.get(k + 1));
            }
        }
        return sum;
    }

    /** ∬ over triangle (p, q, w) of b: the square [0,1]² collapsed onto it, p + u(q − p) + u·v(w − q), Jacobian 2A·u. */
    private static double triangle(Biquadratic b, Vector2D p, Vector2D q, Vector2D w) {
        double twiceArea = Math.abs((q.getX() - p.getX()) * (w.getY() - p.getY())
                - (q.getY() - p.getY()) * (w.getX() - p.getX()));
        return RULE.integrate(u -> RULE.integrate(v -> {
            double x = p.getX() + u * (q.getX() - p.getX()) + u * v * (w.getX() - q.getX());
            double y = p.getY() + u * (q.getY() - p.getY()) + u * v * (w.getY() - q.getY());
            return b.at(x, y);
        }) * twiceArea * u);
    }
}
