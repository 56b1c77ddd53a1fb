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

    /**
     * Refuses neighbouring vertices of a closed polygon closer than {@code gapM}: geometry
     * libraries count points that close as one and then find an edge with no direction.
     */
    public static void requireSpaced(List<Vec2> pts, double gapM, String what) {
        for (int i = 0; i < pts.size(); i++) {
            int next = (i + 1) % pts.size();
            if (pts.get(i).minus(pts.get(next)).length() < gapM) {
                throw new IllegalArgumentException(what + ": vertices " + i + " and " + next + " are " + pts.get(i)
                        .minus(pts.get(next)).length() + " m apart, closer than " + gapM + " m (a billionth of its"
                        + " size); merge them");
            }
        }
    }

    /** Shoelace signed area, m²: positive for counter-clockwise vertex order. */
    public static double signedArea(List<Vec2> pts) {
        double twice = 0;
        for (int i = 0, n = pts.size(); i < n; i++) {
            twice += pts.get(i).cross(pts.get((i + 1) % n));
        }
        return twice / 2;
    }

    /**
     * Checks holes of a plate: each a simple polygon with area lying strictly inside {@code outline}
     * (no vertex outside or on it, no edge meeting it), and apart from the other holes (no edges
     * meeting, neither inside another). Returns copies.
     */
    public static List<List<Vec2>> requireHoles(List<Vec2> outline, List<List<Vec2>> holes) {
        List<List<Vec2>> copies = new java.util.ArrayList<>();
        for (int h = 0; h < Checks.nonNull(holes, "holes").size(); h++) {
            List<Vec2> hole = requireSimple(holes.get(h), "hole " + h);
            for (Vec2 p : hole) {
                if (!contains(outline, p)) {
                    throw new IllegalArgumentException("hole " + h + " must lie inside the outline; its vertex " + p
                            + " does not");
                }
            }
            requireApart(hole, outline, "hole " + h + " touches the outline");
            for (int g = 0; g < copies.size(); g++) {
                List<Vec2> other = copies.get(g);
                requireApart(hole, other, "holes " + g + " and " + h + " touch");
                if (contains(other, hole.get(0)) || contains(hole, other.get(0))) {
                    throw new IllegalArgumentException("holes " + g + " and " + h + " must not overlap or nest");
                }
            }
            copies.add(hole);
        }
        return List.copyOf(copies);
    }

    private static void requireApart(List<Vec2> a, List<Vec2> b, String message) {
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < b.size(); j++) {
                if (segmentsCross(a.get(i), a.get((i + 1) % a.size()), b.get(j), b.get((j + 1) % b.size()))) {
                    throw new IllegalArgumentException(message + ": edge " + i + " meets edge " + j);
                }
            }
        }
    }

    /** True when {@code p} lies inside the closed polygon {@code loop} (even–odd rule; points on an edge may go either way). */
    public static boolean contains(List<Vec2> loop, Vec2 p) {
        boolean inside = false;
        for (int i = 0, n = loop.size(), j = n - 1; i < n; j = i++) {
            Vec2 a = loop.get(i);
            Vec2 b = loop.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                inside = !inside;
            }
        }
        return inside;
    }

    /** The point of the closed polygon's edges nearest to {@code p}. */
    public static Vec2 nearestEdgePoint(List<Vec2> loop, Vec2 p) {
        Vec2 best = loop.get(0);
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int i = 0, n = loop.size(); i < n; i++) {
            Vec2 a = loop.get(i);
            Vec2 ab = loop.get((i + 1) % n).minus(a);
            double s = Math.max(0, Math.min(1, p.minus(a).dot(ab) / ab.dot(ab)));
            Vec2 q = a.plus(ab.times(s));
            double d = q.minus(p).length();
            if (d < bestDistance) {
                best = q;
                bestDistance = d;
            }
        }
        return best;
    }

    /** Largest side of the axis-parallel box around {@code pts}, metres. */
    public static double extentM(List<Vec2> pts) {
        return box(pts).extentM();
    }

    /** The axis-parallel box around some points (empty: infinite bounds the wrong way round). */
    public record Box(double minX, double minY, double maxX, double maxY) {

        public Vec2 centre() {
            return new Vec2(0.5 * (minX + maxX), 0.5 * (minY + maxY));
        }

        /** Its larger side. */
        public double extentM() {
            return Math.max(maxX - minX, maxY - minY);
        }
    }

    /** The axis-parallel box around {@code pts}. */
    public static Box box(List<Vec2> pts) {
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (Vec2 p : pts) {
            minX = Math.min(minX, p.x());
            minY = Math.min(minY, p.y());
            maxX = Math.max(maxX, p.x());
            maxY = Math.max(maxY, p.y());
        }
        return new Box(minX, minY, maxX, maxY);
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
