package org.kinduct.solver.sheet;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.geometry.core.RegionLocation;
import org.apache.commons.geometry.euclidean.twod.Lines;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Segment;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.apache.commons.geometry.euclidean.twod.path.LinePath;
import org.apache.commons.numbers.core.Precision;
import org.kinduct.scene.Vec2;

/**
 * The plan of a thin conductor: a simple outline polygon with simple polygonal holes strictly
 * inside it and apart from each other, in metres. Vertices may run either way round; an edge runs
 * from each vertex to the next and from the last back to the first.
 *
 * @param outline the outer edge, at least 3 vertices
 * @param holes insulating holes, each at least 3 vertices
 */
public record SheetShape(List<Vec2> outline, List<List<Vec2>> holes) {

    /**
     * Points closer than this fraction of the shape's extent count as one in the region work
     * (Commons Geometry's precision context): far below any cell, far above rounding.
     */
    static final double RELATIVE_EPSILON = 1e-10;

    public SheetShape {
        outline = List.copyOf(outline);
        List<List<Vec2>> copied = new ArrayList<>(holes.size());
        for (List<Vec2> hole : holes) {
            copied.add(List.copyOf(hole));
        }
        holes = List.copyOf(copied);
        validate(outline, holes);
    }

    /** A shape without holes. */
    public static SheetShape of(List<Vec2> outline) {
        return new SheetShape(outline, List.of());
    }

    /** A regular polygon with {@code sides} vertices on the circle of radius {@code radiusM}. */
    public static List<Vec2> regularPolygon(Vec2 centre, double radiusM, int sides) {
        if (sides < 3 || !(radiusM > 0)) {
            throw new IllegalArgumentException("a regular polygon needs at least 3 sides and a positive radius, got "
                    + sides + " sides of radius " + radiusM + " m");
        }
        List<Vec2> vertices = new ArrayList<>(sides);
        for (int k = 0; k < sides; k++) {
            vertices.add(centre.plus(Vec2.polar(radiusM, 2 * Math.PI * k / sides)));
        }
        return vertices;
    }

    /** Largest side of the bounding box, metres. */
    public double extentM() {
        double[] box = boundingBox();
        return Math.max(box[2] - box[0], box[3] - box[1]);
    }

    /** {minX, minY, maxX, maxY} of the outline, metres. */
    double[] boundingBox() {
        return box(outline);
    }

    private static double[] box(List<Vec2> loop) {
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.NEGATIVE_INFINITY};
        for (Vec2 p : loop) {
            box[0] = Math.min(box[0], p.x());
            box[1] = Math.min(box[1], p.y());
            box[2] = Math.max(box[2], p.x());
            box[3] = Math.max(box[3], p.y());
        }
        return box;
    }

    Precision.DoubleEquivalence precision() {
        return Precision.doubleEquivalenceOfEpsilon(RELATIVE_EPSILON * extentM());
    }

    /** A fresh region tree of the conductor: the outline's area less the holes'. */
    RegionBSPTree2D region() {
        Precision.DoubleEquivalence precision = precision();
        RegionBSPTree2D region = area(outline, precision);
        for (List<Vec2> hole : holes) {
            region.difference(area(hole, precision));
        }
        return region;
    }

    /** The area a closed loop encloses, whichever way round it runs. */
    private static RegionBSPTree2D area(List<Vec2> loop, Precision.DoubleEquivalence precision) {
        RegionBSPTree2D tree = LinePath.fromVertexLoop(vectors(loop), precision).toTree();
        if (!Double.isFinite(tree.getSize())) {
            // A clockwise loop bounds its outside.
            tree.complement();
        }
        return tree;
    }

    private static List<Vector2D> vectors(List<Vec2> loop) {
        return loop.stream().map(p -> Vector2D.of(p.x(), p.y())).toList();
    }

    private static void validate(List<Vec2> outline, List<List<Vec2>> holes) {
        checkLoop("outline", outline);
        for (int h = 0; h < holes.size(); h++) {
            checkLoop("hole " + h, holes.get(h));
        }
        double[] box = box(outline);
        double extent = Math.max(box[2] - box[0], box[3] - box[1]);
        Precision.DoubleEquivalence precision = Precision.doubleEquivalenceOfEpsilon(RELATIVE_EPSILON * extent);
        List<Segment> outer = segments(outline, precision);
        checkSimple("outline", outer);
        RegionBSPTree2D outerArea = area(outline, precision);
        if (!(outerArea.getSize() > RELATIVE_EPSILON * extent * extent)) {
            throw new IllegalArgumentException("outline encloses no area (its vertices are collinear)");
        }
        List<List<Segment>> holeEdges = new ArrayList<>();
        List<RegionBSPTree2D> holeAreas = new ArrayList<>();
        for (int h = 0; h < holes.size(); h++) {
            List<Segment> edges = segments(holes.get(h), precision);
            checkSimple("hole " + h, edges);
            RegionBSPTree2D holeArea = area(holes.get(h), precision);
            if (!(holeArea.getSize() > RELATIVE_EPSILON * extent * extent)) {
                throw new IllegalArgumentException("hole " + h + " encloses no area (its vertices are collinear)");
            }
            for (Vec2 p : holes.get(h)) {
                if (outerArea.classify(Vector2D.of(p.x(), p.y())) != RegionLocation.INSIDE) {
                    throw new IllegalArgumentException("hole " + h + " must lie strictly inside the outline; its"
                            + " vertex " + p + " does not");
                }
            }
            checkApart("hole " + h, edges, "the outline", outer);
            for (int g = 0; g < h; g++) {
                checkApart("hole " + h, edges, "hole " + g, holeEdges.get(g));
                Vec2 p = holes.get(h).get(0);
                Vec2 q = holes.get(g).get(0);
                if (holeAreas.get(g).classify(Vector2D.of(p.x(), p.y())) != RegionLocation.OUTSIDE
                        || holeArea.classify(Vector2D.of(q.x(), q.y())) != RegionLocation.OUTSIDE) {
                    throw new IllegalArgumentException("holes " + g + " and " + h + " must not overlap or nest");
                }
            }
            holeEdges.add(edges);
            holeAreas.add(holeArea);
        }
    }

    private static void checkLoop(String name, List<Vec2> loop) {
        if (loop.size() < 3) {
            throw new IllegalArgumentException(name + " needs at least 3 vertices, got " + loop.size());
        }
        for (int k = 0; k < loop.size(); k++) {
            if (loop.get(k).equals(loop.get((k + 1) % loop.size()))) {
                throw new IllegalArgumentException(name + " repeats vertex " + k + " at " + loop.get(k)
                        + " (an edge of zero length)");
            }
        }
    }

    private static List<Segment> segments(List<Vec2> loop, Precision.DoubleEquivalence precision) {
        List<Segment> edges = new ArrayList<>(loop.size());
        for (int k = 0; k < loop.size(); k++) {
            Vec2 a = loop.get(k);
            Vec2 b = loop.get((k + 1) % loop.size());
            edges.add(Lines.segmentFromPoints(Vector2D.of(a.x(), a.y()), Vector2D.of(b.x(), b.y()), precision));
        }
        return edges;
    }

    /**
     * Edges that are not neighbours must not meet; neighbours meet only at their shared vertex (a
     * fold back along the previous edge overlaps it).
     */
    private static void checkSimple(String name, List<Segment> edges) {
        int n = edges.size();
        for (int a = 0; a < n; a++) {
            Segment next = edges.get((a + 1) % n);
            if (edges.get(a).contains(next.getEndPoint()) || next.contains(edges.get(a).getStartPoint())) {
                throw new IllegalArgumentException(name + " is not simple: edges " + a + " and " + (a + 1) % n
                        + " fold back over each other");
            }
            for (int b = a + 2; b < n; b++) {
                if (a == 0 && b == n - 1) {
                    continue;
                }
                if (meet(edges.get(a), edges.get(b))) {
                    throw new IllegalArgumentException(name + " is not simple: edges " + a + " and " + b + " meet");
                }
            }
        }
    }

    private static void checkApart(String name, List<Segment> edges, String otherName, List<Segment> other) {
        for (int a = 0; a < edges.size(); a++) {
            for (int b = 0; b < other.size(); b++) {
                if (meet(edges.get(a), other.get(b))) {
                    throw new IllegalArgumentException(name + " touches " + otherName + ": its edge " + a
                            + " meets edge " + b);
                }
            }
        }
    }

    /** Whether two segments share a point: a crossing, a touch, or a collinear overlap. */
    private static boolean meet(Segment s, Segment t) {
        if (s.intersection(t) != null) {
            return true;
        }
        return s.getLine().contains(t.getStartPoint()) && s.getLine().contains(t.getEndPoint())
                && (s.contains(t.getStartPoint()) || s.contains(t.getEndPoint()) || t.contains(s.getStartPoint()));
    }
}
