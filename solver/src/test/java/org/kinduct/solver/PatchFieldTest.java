package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.solver.TestScenes.points;
import static org.kinduct.solver.TestScenes.xs;
import static org.kinduct.solver.TestScenes.ys;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.commons.geometry.core.RegionLocation;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
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
     * Solver against Apache Commons Geometry 1.0 (BSP regions), both exact up to rounding; Wb for
     * flux and circulation, T for line moments (B times fractions of the segment). Coordinates are of order 1 m and
     * a flux sums at most 8 × 9 triangle pairs, each a few roundings of areas ≤ 1 m², so the
     * difference is a few ulp(1) = 2.2e-16. Measured over 3000 seeds of every generator below
     * (stars, tangles, figure-eights, segment moments, circulation): at most 1.1e-15. The bound is
     * ten times that. (The midpoint grid this replaces erred by up to 3e-4 m² and was allowed 8e-3.)
     */
    private static final double AGREEMENT = 1e-14;
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
        return IntStream.range(0, 40).mapToObj(i -> master.nextLong());
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

    /**
     * A figure-eight about a random crossing point c: lobe L = (c, L1, …, Lk) with its vertices in
     * increasing angle about c inside a half-plane (counter-clockwise, winding +1), lobe R = (c, R1,
     * …, Rm) in the opposite half-plane in decreasing angle (clockwise, winding −1). R1 is opposite
     * Lk and Rm opposite L1 as seen from c, so the loop L1…Lk R1…Rm crosses itself at c; each lobe is
     * star-shaped about c, hence simple. Writes the lobes into {@code lobes} (L first).
     */
    static List<Vec2> figureEight(SplittableRandom r, List<List<Vec2>> lobes) {
        Vec2 c = new Vec2(r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5));
        double turn = r.nextDouble(0, 2 * Math.PI);
        int k = 2 + r.nextInt(4);
        int m = 2 + r.nextInt(4);
        double[] left = r.doubles(k, 0.05, Math.PI - 0.05).sorted().toArray();
        double[] right = new double[m];
        right[0] = left[k - 1];
        right[m - 1] = left[0];
        double[] between = r.doubles(m - 2, left[0], left[k - 1]).sorted().toArray();
        for (int i = 1; i < m - 1; i++) {
            right[i] = between[m - 2 - i];
        }
        List<Vec2> lobeL = new ArrayList<>(List.of(c));
        List<Vec2> lobeR = new ArrayList<>(List.of(c));
        for (double angle : left) {
            lobeL.add(Vec2.polar(r.nextDouble(0.2, 1), turn + Math.PI / 2 + angle).plus(c));
        }
        for (double angle : right) {
            lobeR.add(Vec2.polar(r.nextDouble(0.2, 1), turn - Math.PI / 2 + angle).plus(c));
        }
        lobes.add(lobeL);
        lobes.add(lobeR);
        List<Vec2> loop = new ArrayList<>(lobeL.subList(1, lobeL.size()));
        loop.addAll(lobeR.subList(1, lobeR.size()));
        return loop;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxThroughSimpleLoopIsFieldTimesCommonsGeometryOverlap(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5), 1, 3 + r.nextInt(6));
        List<Vec2> loop = star(r, r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5), 1, 3 + r.nextInt(6));
        List<Vec2> oriented = r.nextBoolean() ? loop : TestScenes.reversed(loop);
        // Reference: Commons Geometry's BSP intersection of the two regions; the sign is the
        // loop's orientation (positive counter-clockwise).
        double overlap = GeometryReference.intersectionArea(GeometryReference.region(outline),
                GeometryReference.region(oriented));
        double expected = B * Math.signum(GeometryReference.shoelaceArea(oriented)) * overlap;
        assertEquals(expected, flux(patch(outline, B), oriented), AGREEMENT, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxThroughFigureEightCountsEachLobeWithItsWinding(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5), 1, 3 + r.nextInt(6));
        List<List<Vec2>> lobes = new ArrayList<>();
        List<Vec2> loop = figureEight(r, lobes);
        RegionBSPTree2D patchRegion = GeometryReference.region(outline);
        // Split lobes: winding +1 over lobe L, −1 over lobe R (by construction, checked here).
        assertTrue(GeometryReference.shoelaceArea(lobes.get(0)) > 0 && GeometryReference.shoelaceArea(lobes.get(1)) < 0,
                "seed " + seed + ": lobe orientations");
        double byLobes = GeometryReference.intersectionArea(GeometryReference.region(lobes.get(0)), patchRegion)
                - GeometryReference.intersectionArea(GeometryReference.region(lobes.get(1)), patchRegion);
        // The trapezoid reference must agree with the split lobes before it is trusted on tangles.
        assertEquals(byLobes, GeometryReference.windingWeightedArea(loop, patchRegion), AGREEMENT,
                "seed " + seed + ": reference by trapezoids");
        assertEquals(B * byLobes, flux(patch(outline, B), loop), AGREEMENT, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fluxThroughTangledLoopIsWindingWeightedOverlap(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, r.nextDouble(-0.5, 0.5), r.nextDouble(-0.5, 0.5), 1, 3 + r.nextInt(6));
        List<Vec2> loop = tangle(r, 4 + r.nextInt(5));
        // Reference: Σ over the loop's edges of ±area(vertical trapezoid ∩ patch), every area from
        // Commons Geometry (GeometryReference.windingWeightedArea; Hormann & Agathos 2001).
        double expected = B * GeometryReference.windingWeightedArea(loop, GeometryReference.region(outline));
        assertEquals(expected, flux(patch(outline, B), loop), AGREEMENT, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fieldIsBzExactlyWhereCommonsGeometrySaysInside(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, 0, 0, 1, 3 + r.nextInt(6));
        PatchField field = patch(outline, B);
        RegionBSPTree2D region = GeometryReference.region(outline);
        for (int i = 0; i < 200; i++) {
            Vector2D p = Vector2D.of(r.nextDouble(-1.2, 1.2), r.nextDouble(-1.2, 1.2));
            RegionLocation location = region.classify(p);
            if (location != RegionLocation.BOUNDARY) {
                assertEquals(location == RegionLocation.INSIDE ? B : 0, field.bz(p.getX(), p.getY()),
                        "seed " + seed + " at " + p);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void segmentMomentsMatchCommonsGeometryLinecast(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, 0, 0, 1, 3 + r.nextInt(6));
        PatchField field = patch(outline, B);
        Vec2 a = new Vec2(r.nextDouble(-1.5, 1.5), r.nextDouble(-1.5, 1.5));
        Vec2 b = new Vec2(r.nextDouble(-1.5, 1.5), r.nextDouble(-1.5, 1.5));
        // Reference: the segment cut where Commons Geometry's linecast meets the outline; inside
        // pieces add ∫ds and ∫s ds exactly (GeometryReference.insideMoments).
        double[] expected = GeometryReference.insideMoments(GeometryReference.region(outline), a, b);
        double[] m = new double[2];
        field.bzMoments(a.x(), a.y(), b.x(), b.y(), m);
        assertEquals(B * expected[0], m[0], AGREEMENT, "seed " + seed);
        assertEquals(B * expected[1], m[1], AGREEMENT, "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void potentialCirculationEqualsFlux(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Vec2> outline = star(r, 0, 0, 1, 3 + r.nextInt(6));
        PatchField field = patch(outline, B);
        RegionBSPTree2D region = GeometryReference.region(outline);
        List<Vec2> loop = tangle(r, 4 + r.nextInt(4));
        // Stokes: ∮ A·dl = ∬ curl A dA = Φ. Along an edge A_y = B·Σ ±(min(x, x_c(y)) − x_0) is linear
        // between the points where the edge meets the outline (min switches) or a vertex's height
        // (the set of outline edges crossing that height changes); cut there, the midpoint rule on
        // each linear piece is exact, so the circulation is exact to rounding.
        double[] a = new double[2];
        double circulation = 0;
        for (int e = 0; e < loop.size(); e++) {
            Vec2 p = loop.get(e);
            Vec2 q = loop.get((e + 1) % loop.size());
            Vec2 d = q.minus(p);
            List<Double> cuts = new ArrayList<>(List.of(0.0, 1.0));
            for (double s : GeometryReference.boundaryCrossings(region, p, q)) {
                cuts.add(s);
            }
            for (Vec2 v : outline) {
                double s = (v.y() - p.y()) / d.y();
                if (s > 0 && s < 1) {
                    cuts.add(s);
                }
            }
            cuts.sort(Double::compare);
            for (int i = 0; i + 1 < cuts.size(); i++) {
                double s = 0.5 * (cuts.get(i) + cuts.get(i + 1));
                field.potential(p.x() + s * d.x(), p.y() + s * d.y(), a);
                circulation += (a[0] * d.x() + a[1] * d.y()) * (cuts.get(i + 1) - cuts.get(i));
            }
        }
        double expected = B * GeometryReference.windingWeightedArea(loop, region);
        assertEquals(expected, circulation, AGREEMENT, "seed " + seed);
    }
}
