package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.kinduct.solver.TestScenes.points;
import static org.kinduct.solver.TestScenes.xs;
import static org.kinduct.solver.TestScenes.ys;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PatchField;

class PatchFieldTest {

    private static final double B = 0.7;
    /** Exact geometry in doubles: a few ulps of the areas involved. */
    private static final double EXACT = 1e-14;
    /**
     * Midpoint grid of 800² cells over 4 m × 4 m for a discontinuous integrand: each of the ~3000
     * cells cut by an outline errs by up to one cell area (2.5e-5 m²), with random signs, m².
     */
    private static final double GRID_TOLERANCE = 8e-3;
    /** Midpoint rule on a piecewise-linear integrand with a few kinks, T·m². */
    private static final double CIRCULATION_TOLERANCE = 1e-6;
    private static final long SEED = 0x5eed_f1e1dL;

    private static PatchField patch(List<Vec2> outline, double bzT) {
        return new PatchField(xs(outline), ys(outline), bzT);
    }

    private static double flux(PatchField field, List<Vec2> loop) {
        return field.flux(xs(loop), ys(loop));
    }

    @Test
    void fluxThroughOverlappingRectanglesIsFieldTimesOverlapArea() {
        PatchField field = patch(points(0, 0, 2, 0, 2, 1, 0, 1), B);
        // Overlap of [0,2]×[0,1] with [1,3]×[0.5,2] is [1,2]×[0.5,1]: 1 × 0.5 m² (by hand).
        assertEquals(B * 0.5, flux(field, points(1, 0.5, 3, 0.5, 3, 2, 1, 2)), EXACT);
    }

    @Test
    void fluxThroughTriangleCountsOnlyItsPartInsideThePatch() {
        PatchField field = patch(points(1, 0, 2, 0, 2, 1, 1, 1), B);
        // Triangle (0,0),(2,0),(0,2) ∩ [1,2]×[0,1] = {1≤x≤2, 0≤y≤2−x}: ∫₁² (2−x) dx = 0.5 m² (by hand).
        assertEquals(B * 0.5, flux(field, points(0, 0, 2, 0, 0, 2)), EXACT);
    }

    @Test
    void patchOutlineOrientationDoesNotChangeTheField() {
        List<Vec2> outline = points(0, 0, 2, 0, 2, 1, 0, 1);
        List<Vec2> loop = points(1, 0.5, 3, 0.5, 3, 2, 1, 2);
        assertEquals(flux(patch(outline, B), loop), flux(patch(TestScenes.reversed(outline), B), loop), EXACT);
        assertEquals(B, patch(TestScenes.reversed(outline), B).bz(1, 0.5));
    }

    @Test
    void fluxReversesWhenLoopOrientationIsReversed() {
        PatchField field = patch(points(0, 0, 2, 0, 2, 1, 0, 1), B);
        List<Vec2> loop = points(0, 0, 2, 0, 0, 2);
        assertEquals(-flux(field, loop), flux(field, TestScenes.reversed(loop)), EXACT);
    }

    @Test
    void loopEnclosingThePatchLinksAllItsFluxAndDisjointLoopNone() {
        PatchField field = patch(points(0, 0, 2, 0, 2, 1, 0, 1), B);
        assertEquals(B * 2, flux(field, points(-1, -1, 3, -1, 3, 2, -1, 2)), EXACT);
        assertEquals(0, flux(field, points(5, 5, 6, 5, 6, 6)));
    }

    /** Bow tie (0,0)→(2,2)→(2,0)→(0,2): left lobe counter-clockwise (+1), right lobe clockwise (−1), 1 m² each. */
    private static final List<Vec2> FIGURE_EIGHT = points(0, 0, 2, 2, 2, 0, 0, 2);

    @Test
    void figureEightPartlyInPatchCountsLobesWithSign() {
        // Right lobe alone: winding −1 over 1 m².
        assertEquals(-B, flux(patch(points(1, -1, 3, -1, 3, 3, 1, 3), B), FIGURE_EIGHT), EXACT);
        // Left lobe alone: +1 m².
        assertEquals(B, flux(patch(points(-1, -1, 1, -1, 1, 3, -1, 3), B), FIGURE_EIGHT), EXACT);
        // x ≥ 1.5 of the right lobe: ∫_{1.5}^{2} (2x − 2) dx = 0.75 m² (by hand).
        assertEquals(-0.75 * B, flux(patch(points(1.5, -1, 3, -1, 3, 3, 1.5, 3), B), FIGURE_EIGHT), EXACT);
        // Both lobes: they cancel.
        assertEquals(0, flux(patch(points(-1, -1, 3, -1, 3, 3, -1, 3), B), FIGURE_EIGHT), EXACT);
    }

    @Test
    void fieldIsUniformInsideAndZeroOutside() {
        PatchField field = patch(points(0, 0, 2, 0, 1, 2), B);
        assertEquals(B, field.bz(1, 0.5));
        assertEquals(0, field.bz(1.8, 1.5));
        assertEquals(0, field.bz(-3, 0.5));
    }

    @Test
    void segmentMomentsCountTheInsidePiecesExactly() {
        PatchField field = patch(points(0, 0, 2, 0, 2, 1, 0, 1), B);
        double[] m = new double[2];
        // (−1, 0.5)→(3, 0.5): inside for s in [0.25, 0.75]; ∫ds = 0.5, ∫s ds = (0.75² − 0.25²)/2 = 0.25 (by hand).
        field.bzMoments(-1, 0.5, 3, 0.5, m);
        assertEquals(0.5 * B, m[0], EXACT);
        assertEquals(0.25 * B, m[1], EXACT);
        // (1, 0.5)→(3, 0.5): inside for s in [0, 0.5]: 0.5 and 0.125.
        field.bzMoments(1, 0.5, 3, 0.5, m);
        assertEquals(0.5 * B, m[0], EXACT);
        assertEquals(0.125 * B, m[1], EXACT);
    }

    @Test
    void rejectsOutlineWithoutArea() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> patch(points(0, 0, 1, 1, 2, 2), B));
        assertEquals("field patch outline encloses no area", e.getMessage());
    }

    static Stream<Long> seeds() {
        SplittableRandom master = new SplittableRandom(SEED);
        return IntStream.range(0, 12).mapToObj(i -> master.nextLong());
    }

    /** A star-shaped (hence simple) polygon about (cx, cy). */
    static List<Vec2> star(SplittableRandom r, double cx, double cy, double radius, int n) {
        return IntStream.range(0, n).mapToObj(i -> {
            double angle = 2 * Math.PI * (i + 0.4 * r.nextDouble()) / n;
            return Vec2.polar(radius * (0.3 + 0.7 * r.nextDouble()), angle).plus(new Vec2(cx, cy));
        }).toList();
    }

    /** Random points in the unit disc: usually a self-crossing polygon. */
    static List<Vec2> tangle(SplittableRandom r, int n) {
        return IntStream.range(0, n).mapToObj(i -> Vec2.polar(Math.sqrt(r.nextDouble()), 2 * Math.PI * r.nextDouble()))
                .toList();
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxMatchesGridQuadratureOfWindingNumber(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5), 1, 3 + r.nextInt(6));
        List<Vec2> loop = tangle(r, 4 + r.nextInt(5));
        PatchField field = patch(outline, 1);
        // Independent numerical integral: midpoint rule of w_loop(x)·1[patch](x) over [−2, 2]², both
        // indicators from the test's own winding rule.
        int cells = 800;
        double size = 4.0 / cells;
        double sum = 0;
        for (int i = 0; i < cells; i++) {
            for (int j = 0; j < cells; j++) {
                double x = -2 + (i + 0.5) * size;
                double y = -2 + (j + 0.5) * size;
                if (TestScenes.winding(outline, x, y) != 0) {
                    sum += TestScenes.winding(loop, x, y);
                }
            }
        }
        double reference = sum * size * size;
        assertEquals(reference, flux(field, loop), GRID_TOLERANCE, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void segmentMomentsMatchQuadratureOfTheField(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        PatchField field = patch(star(r, 0, 0, 1, 3 + r.nextInt(6)), B);
        double ax = r.nextDouble(-1.5, 1.5);
        double ay = r.nextDouble(-1.5, 1.5);
        double bx = r.nextDouble(-1.5, 1.5);
        double by = r.nextDouble(-1.5, 1.5);
        int steps = 200_000;
        double m0 = 0;
        double m1 = 0;
        for (int i = 0; i < steps; i++) {
            double s = (i + 0.5) / steps;
            double bz = field.bz(ax + s * (bx - ax), ay + s * (by - ay));
            m0 += bz / steps;
            m1 += s * bz / steps;
        }
        double[] m = new double[2];
        field.bzMoments(ax, ay, bx, by, m);
        // Midpoint rule on a step function: error ≤ (number of steps crossed)·B/steps.
        double tolerance = 20 * B / steps;
        assertEquals(m0, m[0], tolerance, "seed " + seed);
        assertEquals(m1, m[1], tolerance, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void potentialCirculationEqualsFlux(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        PatchField field = patch(star(r, 0, 0, 1, 3 + r.nextInt(6)), B);
        List<Vec2> loop = tangle(r, 4 + r.nextInt(4));
        // Stokes: ∮ A·dl = ∬ curl A dA = Φ. Midpoint rule along each edge of the piecewise-linear A_y.
        int steps = 20_000;
        double[] a = new double[2];
        double circulation = 0;
        for (int e = 0; e < loop.size(); e++) {
            Vec2 p = loop.get(e);
            Vec2 d = loop.get((e + 1) % loop.size()).minus(p);
            for (int i = 0; i < steps; i++) {
                double s = (i + 0.5) / steps;
                field.potential(p.x() + s * d.x(), p.y() + s * d.y(), a);
                circulation += (a[0] * d.x() + a[1] * d.y()) / steps;
            }
        }
        assertEquals(flux(field, loop), circulation, CIRCULATION_TOLERANCE, "seed " + seed);
    }
}
