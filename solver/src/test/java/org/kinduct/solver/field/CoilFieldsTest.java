package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class CoilFieldsTest {

    private static final long SEED = 0x5EED_0600L;
    private static final double AMPERE_TURNS = 12;
    private static final double ULP_LEVEL = 1e-13;
    /** Against the numerical Biot–Savart reference (converged to ~1e-13), relative. */
    private static final double BRUTE_FORCE_LEVEL = 1e-11;
    /** Richardson-extrapolated polygon values keep an O(1/N⁴) error: ~1e-9 at N = 512. */
    private static final double EXTRAPOLATED_LEVEL = 1e-8;

    /** Vertices of a regular N-gon inscribed in the circle (cx, cy, r), counter-clockwise. */
    static double[][] regularPolygon(double cx, double cy, double r, int n) {
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = cx + r * Math.cos(2 * Math.PI * i / n);
            ys[i] = cy + r * Math.sin(2 * Math.PI * i / n);
        }
        return new double[][] {xs, ys};
    }

    @RepeatedTest(20)
    void polygonCoilConvergesToCircleCoilAsSidesDouble(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.04, 0.04);
        double y = r.nextDouble(-0.04, 0.04);
        double radius = 0.015;
        double z0 = r.nextDouble(0.003, 0.02);
        double circle = new CircleCoilField(0, 0, radius, z0, AMPERE_TURNS).bz(x, y);
        double[] errors = new double[3];
        double[] values = new double[3];
        for (int k = 0; k < 3; k++) {
            double[][] p = regularPolygon(0, 0, radius, 256 << k);
            values[k] = new PolygonCoilField(p[0], p[1], z0, AMPERE_TURNS).bz(x, y);
            errors[k] = values[k] - circle;
        }
        // An inscribed N-gon departs from its circle by O(1/N²): the error falls fourfold per
        // doubling, and Richardson's extrapolation (4F(2N) − F(N))/3 removes that term.
        assertEquals(0.25, errors[1] / errors[0], 0.01, "seed " + seed);
        assertEquals(0.25, errors[2] / errors[1], 0.01, "seed " + seed);
        assertEquals(circle, (4 * values[2] - values[1]) / 3, EXTRAPOLATED_LEVEL * Math.abs(circle), "seed " + seed);
    }

    @RepeatedTest(10)
    void fluxOfCircleCoilThroughPolygonApproachesMaxwellMutualInductance(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double a = 0.02;
        double b = a * r.nextDouble(0.3, 2);
        double h = r.nextDouble(0.002, 0.03);
        CircleCoilField coil = new CircleCoilField(0.001, -0.002, a, -h, AMPERE_TURNS);
        // Maxwell's formula for coaxial circles (Rosa & Grover, Bull. Bur. Stand. 8, 1911):
        // M = μ0 √(ab)[(2/k − k)K(m) − (2/k)E(m)], m = k² = 4ab/((a + b)² + h²).
        double m = 4 * a * b / ((a + b) * (a + b) + h * h);
        double k = Math.sqrt(m);
        double maxwell = AMPERE_TURNS * PhysicalConstants.MU_0 * Math.sqrt(a * b)
                * ((2 / k - k) * LegendreEllipticIntegral.bigK(m) - 2 / k * LegendreEllipticIntegral.bigE(m));
        // A polygon inscribed in the circle of radius b misses O(1/N²) of its flux: the error falls
        // fourfold per doubling, and Richardson's extrapolation over N = 256 and 512 removes it.
        double[][] p1 = regularPolygon(0.001, -0.002, b, 256);
        double[][] p2 = regularPolygon(0.001, -0.002, b, 512);
        double f1 = coil.flux(p1[0], p1[1]);
        double f2 = coil.flux(p2[0], p2[1]);
        assertEquals(0.25, (f2 - maxwell) / (f1 - maxwell), 0.01, "seed " + seed);
        assertEquals(maxwell, (4 * f2 - f1) / 3, EXTRAPOLATED_LEVEL * maxwell, "seed " + seed);
    }

    @RepeatedTest(10)
    void squareCoilOnAxisMatchesTextbookForm(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double side = r.nextDouble(0.005, 0.05);
        double h = r.nextDouble(0.001, 0.05);
        // Square loop of side s, on its axis at distance h (Griffiths ch. 5 problems; from memory):
        // B = μ0 I s²/(2π (h² + s²/4) √(h² + s²/2)).
        double expected = PhysicalConstants.MU_0 * AMPERE_TURNS * side * side
                / (2 * Math.PI * (h * h + side * side / 4) * Math.sqrt(h * h + side * side / 2));
        double half = side / 2;
        PolygonCoilField square = new PolygonCoilField(new double[] {-half, half, half, -half},
                new double[] {-half, -half, half, half}, h, AMPERE_TURNS);
        assertEquals(expected, square.bz(0, 0), ULP_LEVEL * expected, "seed " + seed);
    }

    @Test
    void reversingVertexOrderReversesTheCurrent() {
        double[] xs = {0, 0.02, 0.025, -0.004};
        double[] ys = {0, -0.003, 0.018, 0.02};
        double[] rx = {-0.004, 0.025, 0.02, 0};
        double[] ry = {0.02, 0.018, -0.003, 0};
        PolygonCoilField forward = new PolygonCoilField(xs, ys, 0.004, AMPERE_TURNS);
        PolygonCoilField backward = new PolygonCoilField(rx, ry, 0.004, AMPERE_TURNS);
        // Reference: the Biot–Savart law integrated numerically along the four sides (Griffiths ch. 5;
        // NumericalReference, 20-point Gauss–Legendre on 400 panels a side, converged far below
        // BRUTE_FORCE_LEVEL). Counter-clockwise current gives B_z > 0 inside.
        double expected = 0;
        for (int i = 0; i < 4; i++) {
            int j = (i + 1) % 4;
            expected += NumericalReference.biotSavartBz(NumericalReference.segment(xs[i], ys[i], xs[j], ys[j], 0.004),
                    AMPERE_TURNS, 0.01, 0.007, 0, 1, 400);
        }
        double bz = forward.bz(0.01, 0.007);
        assertEquals(expected, bz, BRUTE_FORCE_LEVEL * expected, "counter-clockwise current, inside");
        // Biot–Savart is linear in the current direction.
        assertEquals(-bz, backward.bz(0.01, 0.007), ULP_LEVEL * bz);
    }

    @Test
    void coilInTheDrawingPlaneIsRejected() {
        IllegalArgumentException circle = assertThrows(IllegalArgumentException.class,
                () -> new CircleCoilField(0, 0, 0.01, 0, AMPERE_TURNS));
        assertTrue(circle.getMessage().contains("off the drawing plane"), circle.getMessage());
        IllegalArgumentException polygon = assertThrows(IllegalArgumentException.class,
                () -> new PolygonCoilField(new double[] {0, 1, 0}, new double[] {0, 0, 1}, 0, AMPERE_TURNS));
        assertTrue(polygon.getMessage().contains("off the drawing plane"), polygon.getMessage());
        IllegalArgumentException repeated = assertThrows(IllegalArgumentException.class,
                () -> new PolygonCoilField(new double[] {0, 1, 1, 0}, new double[] {0, 0, 0, 1}, 0.01, AMPERE_TURNS));
        assertTrue(repeated.getMessage().contains("repeats vertex 1"), repeated.getMessage());
    }
}
