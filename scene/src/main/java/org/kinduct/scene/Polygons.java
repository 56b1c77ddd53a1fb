package org.kinduct.scene;

import java.util.List;

/** Polygon checks and measures shared by the model. */
public final class Polygons {

    private Polygons() {
    }

    /** Copies {@code pts} after checking it has at least 3 distinct points and no crossing edges (O(n log n), {@link EdgeSweep}). */
    public static List<Vec2> requireSimple(List<Vec2> pts, String what) {
        List<Vec2> copy = requirePolygon(pts, what);
        int[] crossing = EdgeSweep.firstCrossing(copy);
        if (crossing != null) {
            int n = copy.size();
            boolean neighbours = crossing[1] == crossing[0] + 1 || crossing[1] - crossing[0] == n - 1;
            throw new IllegalArgumentException(what + " must not cross itself: edge " + crossing[0]
                    + (neighbours ? " and edge " + crossing[1] + " fold back onto each other" : " crosses edge "
                    + crossing[1]));
        }
        if (signedArea(copy) == 0) {
            throw new IllegalArgumentException(what + " encloses no area");
        }
        return copy;
    }

    /** Copies {@code pts} after checking it has at least 3 points and no repeated consecutive point. */
    public static List<Vec2> requirePolygon(List<Vec2> pts, String what) {
        List<Vec2> copy = List.copyOf(Checks.nonNull(pts, what));
        if (copy.size() < 3) {
            throw new IllegalArgumentException(what + " needs at least 3 vertices, got " + copy.size());
        }
        for (int i = 0; i < copy.size(); i++) {
            if (copy.get(i).equals(copy.get((i + 1) % copy.size()))) {
                throw new IllegalArgumentException(what + " repeats vertex " + i);
            }
        }
        return copy;
    }

    /** Shoelace signed area, m²: positive for counter-clockwise vertex order. */
    public static double signedArea(List<Vec2> pts) {
        double twice = 0;
        for (int i = 0, n = pts.size(); i < n; i++) {
            twice += pts.get(i).cross(pts.get((i + 1) % n));
        }
        return twice / 2;
    }

    /** True when the closed segments properly cross or touch (collinear overlap counts). */
    static boolean segmentsCross(Vec2 a, Vec2 b, Vec2 c, Vec2 d) {
        double d1 = orient(c, d, a);
        double d2 = orient(c, d, b);
        double d3 = orient(a, b, c);
        double d4 = orient(a, b, d);
        if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
            return true;
        }
        return (d1 == 0 && onSegment(c, d, a)) || (d2 == 0 && onSegment(c, d, b))
                || (d3 == 0 && onSegment(a, b, c)) || (d4 == 0 && onSegment(a, b, d));
    }

    /** True when the path a → b → c turns straight back: c lies on the line through a and b, on b's side towards a. */
    static boolean foldsBack(Vec2 a, Vec2 b, Vec2 c) {
        return orient(a, b, c) == 0 && b.minus(a).dot(c.minus(b)) < 0;
    }

    private static double orient(Vec2 p, Vec2 q, Vec2 r) {
        return q.minus(p).cross(r.minus(p));
    }

    private static boolean onSegment(Vec2 p, Vec2 q, Vec2 r) {
        return Math.min(p.x(), q.x()) <= r.x() && r.x() <= Math.max(p.x(), q.x())
                && Math.min(p.y(), q.y()) <= r.y() && r.y() <= Math.max(p.y(), q.y());
    }
}
