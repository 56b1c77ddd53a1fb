package org.kinduct.scene;

import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * Finds two edges of a closed polygon that cross or touch, other than neighbours at their shared
 * vertex, in O(n log n): the Shamos–Hoey sweep (M. I. Shamos &amp; D. Hoey, "Geometric
 * intersection problems", 17th IEEE Symposium on Foundations of Computer Science, 1976; as in
 * de Berg, Cheong, van Kreveld &amp; Overmars, <i>Computational Geometry</i>, 3rd ed., 2008,
 * §2.1). A vertical line sweeps from left to right over the vertices; the edges it meets are kept
 * ordered from bottom to top, and only edges that become neighbours in that order are tested. Up
 * to the leftmost crossing the order is that of the edges' heights, so the pair forming it
 * becomes neighbours before the sweep passes it, and the first pair found answers whether there
 * is any. At a vertex, the edges starting there are added before the edges ending there are
 * removed, so closed edges that merely touch meet too.
 *
 * <p>Neighbouring edges may touch at their shared vertex; where several edges meet at one point
 * that allowance could hide a touching pair, so a vertex used twice is found first, by sorting
 * (it makes the two edges leaving it touch). With all vertices distinct, neighbouring edges share
 * only their common vertex, and count as crossing only when they fold back onto each other.
 *
 * <p>Geometry in doubles with exact comparisons, the same predicates as the pairwise test it
 * replaces ({@link Polygons#segmentsCross}).
 */
final class EdgeSweep {

    private final Vec2[] pts;
    private final double[] xs;
    private final double[] ys;
    private final int n;

    private EdgeSweep(List<Vec2> polygon) {
        pts = polygon.toArray(Vec2[]::new);
        n = pts.length;
        xs = new double[n];
        ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = pts[i].x();
            ys[i] = pts[i].y();
        }
    }

    /** A pair of edge indices {i, j}, i &lt; j (edge i runs from vertex i to i + 1), that cross or touch, or null. */
    static int[] firstCrossing(List<Vec2> polygon) {
        return new EdgeSweep(polygon).sweep();
    }

    private int[] sweep() {
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, this::lexicographic);
        for (int k = 1; k < n; k++) {
            if (lexicographic(order[k], order[k - 1]) == 0) {
                // Edges order[k] and order[k − 1] both leave that point.
                return pair(order[k], order[k - 1]);
            }
        }
        TreeSet<Integer> active = new TreeSet<>(this::below);
        for (int v : order) {
            // The edges meeting at vertex v: the one arriving (v − 1) and the one leaving (v).
            int arriving = (v + n - 1) % n;
            for (int e : new int[] {arriving, v}) {
                if (leftEnd(e) == v) {
                    active.add(e);
                    int[] hit = test(active.lower(e), e);
                    if (hit == null) {
                        hit = test(e, active.higher(e));
                    }
                    if (hit != null) {
                        return hit;
                    }
                }
            }
            for (int e : new int[] {arriving, v}) {
                if (leftEnd(e) != v) {
                    Integer under = active.lower(e);
                    Integer over = active.higher(e);
                    active.remove(e);
                    int[] hit = test(under, over);
                    if (hit != null) {
                        return hit;
                    }
                }
            }
        }
        return null;
    }

    /**
     * The pair when both edges exist and cross or touch, other than neighbours meeting at their
     * shared vertex; else null.
     */
    private int[] test(Integer a, Integer b) {
        if (a == null || b == null) {
            return null;
        }
        boolean hit;
        if ((a + 1) % n == b) {
            hit = Polygons.foldsBack(pts[a], pts[b], pts[(b + 1) % n]);
        } else if ((b + 1) % n == a) {
            hit = Polygons.foldsBack(pts[b], pts[a], pts[(a + 1) % n]);
        } else {
            hit = Polygons.segmentsCross(pts[a], pts[(a + 1) % n], pts[b], pts[(b + 1) % n]);
        }
        return hit ? pair(a, b) : null;
    }

    private static int[] pair(int a, int b) {
        return new int[] {Math.min(a, b), Math.max(a, b)};
    }

    /**
     * Bottom-to-top order of two edges the sweep line meets: the later-starting edge's left end
     * against the other's line, then their directions, then their indices. Consistent as long as
     * no two of them have crossed left of the sweep line, which holds until the first crossing
     * is found.
     */
    private int below(Integer a, Integer b) {
        if (a.equals(b)) {
            return 0;
        }
        boolean aLater = lexicographic(leftEnd(a), leftEnd(b)) > 0;
        int newer = aLater ? a : b;
        int older = aLater ? b : a;
        int from = leftEnd(older);
        int to = rightEnd(older);
        int side = (int) Math.signum(orient(from, to, leftEnd(newer)));
        if (side == 0) {
            side = (int) Math.signum(orient(from, to, rightEnd(newer)));
        }
        if (side == 0) {
            side = Integer.compare(newer, older);
        }
        // side > 0: the newer edge lies above the older one.
        return aLater ? side : -side;
    }

    /** The vertex at edge e's left end (lower x, then lower y). */
    private int leftEnd(int e) {
        int next = (e + 1) % n;
        return lexicographic(e, next) <= 0 ? e : next;
    }

    private int rightEnd(int e) {
        int next = (e + 1) % n;
        return lexicographic(e, next) <= 0 ? next : e;
    }

    /** Vertices by x, then y. */
    private int lexicographic(int p, int q) {
        int byX = Double.compare(xs[p], xs[q]);
        return byX != 0 ? byX : Double.compare(ys[p], ys[q]);
    }

    /** Twice the signed area of the triangle p, q, r (as {@link Polygons} computes it). */
    private double orient(int p, int q, int r) {
        return (xs[q] - xs[p]) * (ys[r] - ys[p]) - (ys[q] - ys[p]) * (xs[r] - xs[p]);
    }
}
