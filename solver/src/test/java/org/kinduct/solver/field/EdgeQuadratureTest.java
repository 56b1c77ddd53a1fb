package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class EdgeQuadratureTest {

    private static final long SEED = 0x5EED_0500L;
    private static final double TOLERANCE = 1e-10;
    /** Exact rules and shoelace areas agree to rounding of O(1) sums. */
    private static final double ROUNDING_LEVEL = 1e-14;
    /** The cancellation floor: 1e-13 of the parts, which are O(1) here. */
    private static final double CANCELLATION_LEVEL = 1e-12;
    private static final EdgeQuadrature QUADRATURE = EdgeQuadrature.STANDARD;

    /** A random star-shaped polygon round (cx, cy); counter-clockwise. */
    static double[][] starPolygon(SplittableRandom r, double cx, double cy, double size, int n) {
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            double angle = 2 * Math.PI * (i + r.nextDouble(0, 0.8)) / n;
            double radius = size * r.nextDouble(0.3, 1);
            xs[i] = cx + radius * Math.cos(angle);
            ys[i] = cy + radius * Math.sin(angle);
        }
        return new double[][] {xs, ys};
    }

    @RepeatedTest(30)
    void circulationOfHalfPositionVectorIsPolygonArea(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double[][] p = starPolygon(r, r.nextDouble(-1, 1), r.nextDouble(-1, 1), 0.5, 3 + r.nextInt(8));
        // Green's theorem: ∮ (−y/2, x/2)·dl = area; the shoelace formula gives the area exactly.
        double shoelace = 0;
        for (int i = 0; i < p[0].length; i++) {
            int j = (i + 1) % p[0].length;
            shoelace += (p[0][i] * p[1][j] - p[0][j] * p[1][i]) / 2;
        }
        EdgeQuadrature.Estimate e = QUADRATURE.closedPath((x, y, dx, dy) -> (-y * dx + x * dy) / 2, p[0], p[1]);
        assertEquals(shoelace, e.value(), ROUNDING_LEVEL, "seed " + seed);
        assertTrue(e.converged(), "seed " + seed);
    }

    @RepeatedTest(30)
    void circulationOfGradientVanishes(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double[][] p = starPolygon(r, 0, 0, 1, 3 + r.nextInt(8));
        // ∮ ∇φ·dl = 0 for φ = sin(3x)·e^y (fundamental theorem for line integrals): pure cancellation,
        // so the result must reach the rounding floor relative to the parts.
        EdgeQuadrature.Estimate e = QUADRATURE.closedPath((x, y, dx, dy) ->
                3 * Math.cos(3 * x) * Math.exp(y) * dx + Math.sin(3 * x) * Math.exp(y) * dy, p[0], p[1]);
        assertEquals(0, e.value(), CANCELLATION_LEVEL, "seed " + seed);
        assertTrue(e.converged(), "seed " + seed);
    }

    @RepeatedTest(30)
    void narrowPeakIsResolvedByLocalBisection(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double s0 = r.nextDouble(0, 1);
        double w = Math.pow(10, r.nextDouble(-6, -2));
        // ∫₀¹ w/((s − s0)² + w²) ds = atan((1 − s0)/w) + atan(s0/w).
        double exact = Math.atan((1 - s0) / w) + Math.atan(s0 / w);
        EdgeQuadrature.Estimate e = QUADRATURE.segment((x, y, dx, dy) -> w / ((x - s0) * (x - s0) + w * w), 0, 0, 1, 0);
        assertTrue(e.converged(), "seed " + seed);
        assertEquals(exact, e.value(), TOLERANCE * exact, "seed " + seed + " w " + w);
        assertTrue(e.evaluations() < 4000, "seed " + seed + " used " + e.evaluations());
    }

    @RepeatedTest(30)
    void logarithmicSingularityAndJumpConverge(RepetitionInfo info) {
        long seed = SEED + 3000 + info.getCurrentRepetition();
        double s0 = new SplittableRandom(seed).nextDouble(0.01, 0.99);
        // ∫₀¹ ln|s − s0| ds = (1 − s0)ln(1 − s0) + s0 ln s0 − 1; ∫₀¹ H(s − s0) ds = 1 − s0 with first
        // moment (1 − s0²)/2 (elementary integrals).
        double logExact = (1 - s0) * Math.log(1 - s0) + s0 * Math.log(s0) - 1;
        EdgeQuadrature.Estimate log = QUADRATURE.segment((x, y, dx, dy) -> Math.log(Math.abs(x - s0)), 0, 0, 1, 0);
        EdgeQuadrature.Estimate step = QUADRATURE.segment((x, y, dx, dy) -> x > s0 ? 1 : 0, 0, 0, 1, 0);
        assertTrue(log.converged() && step.converged(), "seed " + seed);
        assertEquals(logExact, log.value(), 10 * TOLERANCE * Math.abs(logExact), "seed " + seed);
        assertEquals(1 - s0, step.value(), 10 * TOLERANCE, "seed " + seed);
        assertEquals((1 - s0 * s0) / 2, step.firstMoment(), 10 * TOLERANCE, "seed " + seed);
    }

    @Test
    void gaussRuleIsExactToDegree19AndKronrodToDegree31() {
        // (The first moment s·f raises the degree by one, so the zero-error check uses degree 18.)
        // An n-point Gauss rule integrates polynomials of degree 2n − 1 exactly; Kronrod's 2n + 1
        // point extension reaches 3n + 1 (Piessens et al., QUADPACK, 1983, §2.2). ∫₀¹ s^d ds = 1/(d + 1).
        EdgeQuadrature onePanel = new EdgeQuadrature(1e-15, EdgeQuadrature.PANEL_EVALUATIONS);
        EdgeQuadrature.Estimate degree18 = onePanel.segment((x, y, dx, dy) -> Math.pow(x, 18), 0, 0, 1, 0);
        EdgeQuadrature.Estimate degree31 = onePanel.segment((x, y, dx, dy) -> Math.pow(x, 31), 0, 0, 1, 0);
        assertEquals(1.0 / 19, degree18.value(), ROUNDING_LEVEL);
        assertEquals(0, degree18.errorEstimate(), ROUNDING_LEVEL, "Gauss and Kronrod agree up to degree 19");
        assertEquals(1.0 / 32, degree31.value(), ROUNDING_LEVEL);
        assertTrue(degree31.errorEstimate() > 1e-10, "Gauss alone is not exact on degree 31");
    }

    /**
     * The rule follows the clearance a caller states: f = 1/(|p(s) − q|² + h²), the field-like
     * kernel of a point q at height h, along a unit segment, integrated in closed form
     * (∫ ds/((s − σ)² + D²) = [atan((1 − σ)/D) + atan(σ/D)]/D, D² the squared distance from q to the
     * line, elementary). With no clearance a panel takes the 21 nodes and both ends (23 evaluations);
     * with the true clearance at one to three lengths, the 21 nodes alone; at three lengths or
     * more, the 15-point rule. Each meets the tolerance in one panel, and the Kronrod 15 value is as
     * good as the 21's: a few ulp.
     */
    @Test
    void theRuleFollowsTheStatedClearanceAndKeepsTheAccuracy() {
        double[][] cases = {{0.4, 0.9, 0.2, 23}, {0.4, 1.2, 0.3, 21}, {0.5, 3.5, 0.5, 15}, {2.0, 0.0, 4.0, 15}};
        for (double[] c : cases) {
            double qx = c[0];
            double qy = c[1];
            double h = c[2];
            double d = Math.hypot(qy, h);
            double exact = (Math.atan((1 - qx) / d) + Math.atan(qx / d)) / d;
            double clearance = c[3] == 23 ? 0 : Math.hypot(Clearance.segmentDistance(0, 0, 1, 0, qx, qy), h);
            EdgeQuadrature.Breaks stated = new EdgeQuadrature.Breaks() {
                @Override
                public double[] along(double ax, double ay, double bx, double by) {
                    return new double[0];
                }

                @Override
                public double clearanceM(double ax, double ay, double bx, double by) {
                    return clearance;
                }
            };
            EdgeQuadrature.Estimate e = QUADRATURE.segment(
                    (x, y, dx, dy) -> 1 / ((x - qx) * (x - qx) + (y - qy) * (y - qy) + h * h), 0, 0, 1, 0, stated);
            String where = "q (" + qx + ", " + qy + ", " + h + "), clearance " + clearance;
            assertEquals((int) c[3], e.evaluations(), where);
            assertEquals(exact, e.value(), 4 * Math.ulp(exact), where);
        }
    }

    @Test
    void theFifteenPointPairIsExactToDegree13And22() {
        // 7-point Gauss: degree 13; its 15-point Kronrod extension: 3·7 + 1 = 22 (Piessens et al.,
        // QUADPACK, 1983, §2.2). A stated clearance far beyond the segment selects the pair.
        EdgeQuadrature.Breaks far = new EdgeQuadrature.Breaks() {
            @Override
            public double[] along(double ax, double ay, double bx, double by) {
                return new double[0];
            }

            @Override
            public double clearanceM(double ax, double ay, double bx, double by) {
                return 1e3;
            }
        };
        EdgeQuadrature onePanel = new EdgeQuadrature(1e-15, EdgeQuadrature.PANEL_EVALUATIONS);
        EdgeQuadrature.Estimate degree12 = onePanel.segment((x, y, dx, dy) -> Math.pow(x, 12), 0, 0, 1, 0, far);
        EdgeQuadrature.Estimate degree22 = onePanel.segment((x, y, dx, dy) -> Math.pow(x, 22), 0, 0, 1, 0, far);
        assertEquals(15, degree12.evaluations());
        assertEquals(1.0 / 13, degree12.value(), ROUNDING_LEVEL);
        assertEquals(0, degree12.errorEstimate(), ROUNDING_LEVEL, "Gauss and Kronrod agree up to degree 13");
        assertEquals(1.0 / 23, degree22.value(), ROUNDING_LEVEL);
        assertTrue(degree22.errorEstimate() > 1e-10, "Gauss alone is not exact on degree 22");
    }

    @Test
    void exhaustedBudgetIsReportedNotHidden() {
        EdgeQuadrature small = new EdgeQuadrature(1e-12, 100);
        // A Lorentzian of width 1e-6 needs far more than 100 evaluations.
        EdgeQuadrature.Estimate e = small.segment((x, y, dx, dy) -> 1e-6 / ((x - 0.3) * (x - 0.3) + 1e-12), 0, 0, 1, 0);
        assertFalse(e.converged());
        assertTrue(e.evaluations() <= 100, "used " + e.evaluations());
        assertTrue(e.errorEstimate() > 1e-12 * Math.abs(e.value()));
    }

    @Test
    void anIntegrandWhoseNoiseLimitsTheErrorStopsEarlyAtTheNoiseLevel() {
        // f = 1 + 1e-9·(deterministic noise in [−1, 1]): no rule gets the error below ~1e-9, so a
        // 1e-12 tolerance is out of reach. QUADPACK's roundoff test (dqage, error flag 2; Piessens
        // et al., QUADPACK, 1983, §4.3) stops once bisections stop reducing the error; without it
        // the whole budget of 20 000 evaluations is spent on noise.
        EdgeQuadrature.Estimate e = new EdgeQuadrature(1e-12, 20_000).segment((x, y, dx, dy) -> {
            long bits = Double.doubleToLongBits(x) * 0x9E3779B97F4A7C15L;
            return 1 + 1e-9 * ((bits >>> 11) * 0x1.0p-53 * 2 - 1);
        }, 0, 0, 1, 0);
        assertFalse(e.converged());
        assertTrue(e.evaluations() < 2_000, "used " + e.evaluations());
        assertEquals(1, e.value(), 1e-9, "as good as the integrand allows");
    }

    @Test
    void invalidSettingsAreRejectedWithTheRule() {
        IllegalArgumentException tolerance = assertThrows(IllegalArgumentException.class,
                () -> new EdgeQuadrature(0, 1000));
        assertTrue(tolerance.getMessage().contains("relative tolerance"), tolerance.getMessage());
        IllegalArgumentException budget = assertThrows(IllegalArgumentException.class,
                () -> new EdgeQuadrature(1e-8, 5));
        assertTrue(budget.getMessage().contains("evaluation budget"), budget.getMessage());
        IllegalArgumentException arrays = assertThrows(IllegalArgumentException.class,
                () -> QUADRATURE.closedPath((x, y, dx, dy) -> 1, new double[] {0, 1, 2}, new double[] {0, 1}));
        assertTrue(arrays.getMessage().contains("matching coordinate arrays"), arrays.getMessage());
    }
}
