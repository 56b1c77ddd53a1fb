package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Stokes' theorem and the other contract items of {@link PlaneField}, for every physical source,
 * checked against brute-force quadrature of B_z.
 */
class PlaneFieldContractTest {

    private static final long SEED = 0x5EED_0700L;
    private static final int CASES = 6;
    private static final double FLUX_LEVEL = 1e-9;
    private static final double MOMENT_LEVEL = 1e-9;
    private static final double CURL_LEVEL = 1e-7;
    /** The corrected midpoint rule leaves O(h⁶) with h = 0.1 mm: far below this. */
    private static final double SMALL_SQUARE_LEVEL = 1e-7;

    static Stream<Named<PlaneField>> fields() {
        return Stream.of(
                Named.of("pentagon coil above", new PolygonCoilField(new double[] {-0.01, 0.012, 0.015, 0.0, -0.014},
                        new double[] {-0.012, -0.01, 0.008, 0.016, 0.004}, 0.004, 10)),
                Named.of("circle coil below", new CircleCoilField(0.002, -0.001, 0.012, -0.005, 7)),
                Named.of("rotated block magnet below",
                        new BlockMagnetField(0.001, 0.002, 0.4, 0.02, 0.012, -0.009, -0.004, 1.2)),
                Named.of("cylinder magnet above, magnetized -z",
                        new CylinderMagnetField(-0.002, 0.001, 0.008, 0.003, 0.01, -1.1)));
    }

    /** A convex polygon: 3..8 vertices at sorted random angles on a circle near the source. */
    private static double[][] convexPolygon(SplittableRandom r) {
        int n = 3 + r.nextInt(6);
        double cx = r.nextDouble(-0.015, 0.015);
        double cy = r.nextDouble(-0.015, 0.015);
        double radius = r.nextDouble(0.005, 0.025);
        double[] angles = r.doubles(n, 0, 2 * Math.PI).sorted().toArray();
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = cx + radius * Math.cos(angles[i]);
            ys[i] = cy + radius * Math.sin(angles[i]);
        }
        return new double[][] {xs, ys};
    }

    @ParameterizedTest
    @MethodSource("fields")
    void fluxOfSmallSquareIsBzTimesArea(PlaneField field) {
        long seed = SEED;
        SplittableRandom r = new SplittableRandom(seed);
        for (int c = 0; c < CASES; c++) {
            double x = r.nextDouble(-0.03, 0.03);
            double y = r.nextDouble(-0.03, 0.03);
            double h = 1e-4;
            double flux = field.flux(new double[] {x - h / 2, x + h / 2, x + h / 2, x - h / 2},
                    new double[] {y - h / 2, y - h / 2, y + h / 2, y + h / 2});
            // Stokes: Φ = ∬ B_z dA = h²[B_z + (h²/24)∇²B_z] + O(h⁶) over a square centred at (x, y)
            // (Taylor expansion of the midpoint rule); ∇²B_z by the five-point stencil of step h.
            double bz = field.bz(x, y);
            double laplacian = (field.bz(x + h, y) + field.bz(x - h, y) + field.bz(x, y + h) + field.bz(x, y - h)
                    - 4 * bz) / (h * h);
            double expected = h * h * (bz + h * h / 24 * laplacian);
            double scale = h * h * (Math.abs(bz) + h * h / 24 * Math.abs(laplacian));
            assertEquals(expected, flux, SMALL_SQUARE_LEVEL * scale, "seed " + seed + " case " + c);
        }
    }

    @ParameterizedTest
    @MethodSource("fields")
    void fluxOfPolygonMatchesAreaQuadratureOfBz(PlaneField field) {
        long seed = SEED + 1;
        SplittableRandom r = new SplittableRandom(seed);
        for (int c = 0; c < CASES; c++) {
            double[][] p = convexPolygon(r);
            // Stokes' theorem against a direct 2-D quadrature of B_z (fan of Duffy-mapped triangles).
            double expected = NumericalReference.integratePolygon(field::bz, p[0], p[1], 12);
            double magnitude = NumericalReference.integratePolygon((x, y) -> Math.abs(field.bz(x, y)), p[0], p[1], 12);
            assertEquals(expected, field.flux(p[0], p[1]), FLUX_LEVEL * magnitude, "seed " + seed + " case " + c);
        }
    }

    @ParameterizedTest
    @MethodSource("fields")
    void reversedPolygonHasOppositeFlux(PlaneField field) {
        long seed = SEED + 2;
        SplittableRandom r = new SplittableRandom(seed);
        double[][] p = convexPolygon(r);
        int n = p[0].length;
        double[] rx = new double[n];
        double[] ry = new double[n];
        for (int i = 0; i < n; i++) {
            rx[i] = p[0][n - 1 - i];
            ry[i] = p[1][n - 1 - i];
        }
        double flux = field.flux(p[0], p[1]);
        assertEquals(-flux, field.flux(rx, ry), FLUX_LEVEL * Math.abs(flux), "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("fields")
    void figureEightCountsItsLobesWithOppositeSigns(PlaneField field) {
        // Bow tie (−a,−a) → (a, a) → (a, −a) → (−a, a): the right lobe is traversed clockwise
        // (winding −1), the left one counter-clockwise (+1). Reference: the two triangles'
        // area quadratures with those signs.
        double a = 0.012;
        double[] xs = {-a, a, a, -a};
        double[] ys = {-a, a, -a, a};
        double left = NumericalReference.integratePolygon(field::bz, new double[] {-a, 0, -a}, new double[] {-a, 0, a}, 12);
        double right = NumericalReference.integratePolygon(field::bz, new double[] {0, a, a}, new double[] {0, -a, a}, 12);
        double magnitude = Math.abs(left) + Math.abs(right);
        assertEquals(left - right, field.flux(xs, ys), FLUX_LEVEL * magnitude);
    }

    @ParameterizedTest
    @MethodSource("fields")
    void bzMomentsMatchBruteForceQuadrature(PlaneField field) {
        long seed = SEED + 3;
        SplittableRandom r = new SplittableRandom(seed);
        double[] out = new double[2];
        for (int c = 0; c < CASES; c++) {
            double ax = r.nextDouble(-0.03, 0.03);
            double ay = r.nextDouble(-0.03, 0.03);
            double bx = r.nextDouble(-0.03, 0.03);
            double by = r.nextDouble(-0.03, 0.03);
            field.bzMoments(ax, ay, bx, by, out);
            double m0 = NumericalReference.integrate(s -> field.bz(ax + s * (bx - ax), ay + s * (by - ay)), 0, 1, 200);
            double m1 = NumericalReference.integrate(s -> s * field.bz(ax + s * (bx - ax), ay + s * (by - ay)), 0, 1, 200);
            double magnitude = NumericalReference.integrate(
                    s -> Math.abs(field.bz(ax + s * (bx - ax), ay + s * (by - ay))), 0, 1, 200);
            assertEquals(m0, out[0], MOMENT_LEVEL * magnitude, "seed " + seed + " case " + c);
            assertEquals(m1, out[1], MOMENT_LEVEL * magnitude, "seed " + seed + " case " + c);
        }
    }

    @ParameterizedTest
    @MethodSource("fields")
    void curlOfPotentialIsBz(PlaneField field) {
        long seed = SEED + 4;
        SplittableRandom r = new SplittableRandom(seed);
        for (int c = 0; c < CASES; c++) {
            double x = r.nextDouble(-0.03, 0.03);
            double y = r.nextDouble(-0.03, 0.03);
            double h = 2e-6;
            // B = ∇ × A: B_z = ∂A_y/∂x − ∂A_x/∂y, by fourth-order central differences.
            double dAyDx = derivative(field, x, y, h, 0, 1);
            double dAxDy = derivative(field, x, y, 0, h, 0);
            double bz = field.bz(x, y);
            assertEquals(bz, dAyDx - dAxDy, CURL_LEVEL * Math.abs(bz) + 1e-12, "seed " + seed + " case " + c);
        }
        assertTrue(field.hasPhysicalPotential());
    }

    private static double derivative(PlaneField field, double x, double y, double hx, double hy, int component) {
        double[] a = new double[2];
        double sum = 0;
        double[] weights = {1, -8, 8, -1};
        double[] steps = {-2, -1, 1, 2};
        for (int i = 0; i < 4; i++) {
            field.potential(x + steps[i] * hx, y + steps[i] * hy, a);
            sum += weights[i] * a[component];
        }
        return sum / (12 * (hx + hy));
    }
}
