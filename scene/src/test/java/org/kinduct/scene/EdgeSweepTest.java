package org.kinduct.scene;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The sweep finds a crossing exactly when some pair of non-neighbouring edges crosses or touches
 * or two neighbours fold back, as the test of all pairs decides (the definition of a simple
 * polygon; common practice), on random polygons whose vertices sit on a small grid, so that shared points,
 * collinear overlaps, vertical edges and vertices lying on other edges are frequent.
 */
class EdgeSweepTest {

    private static final int CASES = 200;
    private static final int POLYGONS_PER_CASE = 100;

    static LongStream seeds() {
        SplittableRandom r = new SplittableRandom(0x5ee9_0001L);
        return LongStream.range(0, CASES).map(i -> r.nextLong());
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void sweepAgreesWithThePairwiseTestOnGridPolygons(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int k = 0; k < POLYGONS_PER_CASE; k++) {
            // Mostly small polygons on small grids (many degenerate contacts), some larger ones.
            boolean large = k % 4 == 0;
            List<Vec2> polygon = gridPolygon(r, 3 + r.nextInt(large ? 60 : 10), 1 + r.nextInt(large ? 40 : 6));
            int[] found = EdgeSweep.firstCrossing(polygon);
            boolean expected = pairwiseCrossingOrFoldBack(polygon);
            assertEquals(expected, found != null, "seed " + seed + ", polygon " + polygon);
            if (found != null) {
                assertTrue(crossOrFoldBack(polygon, found[0], found[1]), "reported pair does not cross");
            }
        }
    }

    @Test
    void aTenThousandVertexOutlineIsCheckedInMilliseconds() {
        List<Vec2> star = star(new SplittableRandom(7), 10_000);
        // The pairwise test took about 2 s for this outline; the sweep takes some milliseconds.
        Assertions.assertTimeoutPreemptively(Duration.ofMillis(500), () -> assertNull(EdgeSweep.firstCrossing(star)));
    }

    @Test
    void aFarVertexPullingAnEdgeAcrossTheOutlineIsFound() {
        List<Vec2> star = new ArrayList<>(star(new SplittableRandom(8), 10_000));
        star.set(5_000, new Vec2(3, 0.001));
        assertTrue(EdgeSweep.firstCrossing(star) != null);
    }

    /** n points on a (size + 1)² grid, no two consecutive equal. */
    private static List<Vec2> gridPolygon(SplittableRandom r, int n, int size) {
        List<Vec2> pts = new ArrayList<>();
        while (pts.size() < n) {
            Vec2 p = new Vec2(r.nextInt(size + 1), r.nextInt(size + 1));
            if (pts.isEmpty() || !pts.get(pts.size() - 1).equals(p)) {
                pts.add(p);
            }
        }
        if (pts.get(0).equals(pts.get(n - 1))) {
            pts.set(n - 1, new Vec2(pts.get(n - 1).x() + 0.5, pts.get(n - 1).y()));
        }
        return pts;
    }

    /** A star-shaped (hence simple) polygon about the origin. */
    private static List<Vec2> star(SplittableRandom r, int n) {
        List<Vec2> pts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            pts.add(Vec2.polar(0.5 + 0.5 * r.nextDouble(), 2 * Math.PI * i / n));
        }
        return pts;
    }

    /** Edges i < j cross or touch; if they are neighbours, they fold back onto each other. */
    private static boolean crossOrFoldBack(List<Vec2> p, int i, int j) {
        int n = p.size();
        if (j == i + 1) {
            return Polygons.foldsBack(p.get(i), p.get(j), p.get((j + 1) % n));
        }
        if (i == 0 && j == n - 1) {
            return Polygons.foldsBack(p.get(j), p.get(0), p.get(1));
        }
        return Polygons.segmentsCross(p.get(i), p.get((i + 1) % n), p.get(j), p.get((j + 1) % n));
    }

    /**
     * The definition, pair by pair: two edges that are not neighbours cross or touch, or two
     * neighbours fold back onto each other (with four or more vertices a fold-back always makes
     * some other pair touch too; in a triangle it means the triangle has no area).
     */
    private static boolean pairwiseCrossingOrFoldBack(List<Vec2> p) {
        int n = p.size();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (crossOrFoldBack(p, i, j)) {
                    return true;
                }
            }
        }
        return false;
    }
}
