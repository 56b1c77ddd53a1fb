package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.geometry.euclidean.twod.ConvexArea;
import org.apache.commons.geometry.euclidean.twod.LinecastPoint2D;
import org.apache.commons.geometry.euclidean.twod.Lines;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.apache.commons.geometry.euclidean.twod.path.LinePath;
import org.apache.commons.numbers.core.Precision;
import org.kinduct.scene.Vec2;

/**
 * Areas and line pieces from Apache Commons Geometry 1.0 (BSP-tree regions and their Boolean
 * operations), an implementation independent of the solver's fan triangulation and
 * Sutherland–Hodgman clipping. Used as the reference for patch flux and patch line moments.
 *
 * <p>Commons Geometry builds regions from simple boundaries only; a self-crossing loop is
 * handled here through its winding number written as signed crossings of a ray (Hormann &amp;
 * Agathos, "The point in polygon problem for arbitrary polygons", Computational Geometry 20,
 * 131–144, 2001): for the ray from a point straight up (+y), w(p) = Σ_e sgn(x_a − x_b)·1[p lies
 * below edge e = a→b, within its x-span] (the top edge of a counter-clockwise square runs right to
 * left and counts +1 for the points under it). Each term is the trapezoid between the edge and a
 * baseline below everything, so ∬_P w dA = Σ_e sgn(x_a − x_b)·area(trapezoid_e ∩ P) with every
 * area from a Boolean intersection of two BSP trees. This vertical-trapezoid decomposition (the
 * trapezoid form of the shoelace formula) is another decomposition than the solver's fan of
 * triangles from the loop's first vertex.
 */
final class GeometryReference {

    /**
     * Commons Geometry's equivalence for points and hyperplanes, m. Overlaps thinner than this
     * are snapped away; with coordinates of order 1 m and perimeters of a few metres that changes
     * an area by at most ~1e-13 m², below the tolerances the tests use.
     */
    static final Precision.DoubleEquivalence PRECISION = Precision.doubleEquivalenceOfEpsilon(1e-14);

    private GeometryReference() {
    }

    static Vector2D vector(Vec2 p) {
        return Vector2D.of(p.x(), p.y());
    }

    /** The region inside a simple polygon, whichever its orientation. */
    static RegionBSPTree2D region(List<Vec2> simplePolygon) {
        List<Vector2D> vertices = new ArrayList<>(simplePolygon.stream().map(GeometryReference::vector).toList());
        if (shoelaceArea(simplePolygon) < 0) {
            java.util.Collections.reverse(vertices);
        }
        return LinePath.fromVertexLoop(vertices, PRECISION).toTree();
    }

    /** Area of the intersection of two BSP regions, m². */
    static double intersectionArea(RegionBSPTree2D a, RegionBSPTree2D b) {
        RegionBSPTree2D result = RegionBSPTree2D.empty();
        result.intersection(a, b);
        return result.getSize();
    }

    /** Signed area by the shoelace formula (positive counter-clockwise), m². */
    static double shoelaceArea(List<Vec2> polygon) {
        double twice = 0;
        int n = polygon.size();
        for (int i = 0; i < n; i++) {
            Vec2 a = polygon.get(i);
            Vec2 b = polygon.get((i + 1) % n);
            twice += a.x() * b.y() - b.x() * a.y();
        }
        return 0.5 * twice;
    }

    /**
     * ∬ w_loop(x)·1[region](x) dA for any closed polygon {@code loop}, simple or self-crossing, by
     * the signed vertical trapezoids described in the class comment, m².
     */
    static double windingWeightedArea(List<Vec2> loop, RegionBSPTree2D region) {
        double baseline = region.getBounds().getMin().getY();
        for (Vec2 p : loop) {
            baseline = Math.min(baseline, p.y());
        }
        baseline -= 1;
        double sum = 0;
        int n = loop.size();
        for (int i = 0; i < n; i++) {
            Vec2 a = loop.get(i);
            Vec2 b = loop.get((i + 1) % n);
            if (a.x() == b.x()) {
                continue;
            }
            Vec2 left = a.x() < b.x() ? a : b;
            Vec2 right = a.x() < b.x() ? b : a;
            ConvexArea trapezoid = ConvexArea.convexPolygonFromVertices(List.of(
                    Vector2D.of(left.x(), baseline), Vector2D.of(right.x(), baseline),
                    vector(right), vector(left)), PRECISION);
            sum += Math.signum(a.x() - b.x()) * intersectionArea(trapezoid.toTree(), region);
        }
        return sum;
    }

    /**
     * ∫₀¹ 1[region](a + s(b − a)) ds and ∫₀¹ s·1[region] ds for the segment a→b: the segment is cut
     * where Commons Geometry's linecast meets the region's boundary, and each piece whose midpoint
     * the region contains adds its length and first moment exactly.
     */
    static double[] insideMoments(RegionBSPTree2D region, Vec2 a, Vec2 b) {
        Vector2D start = vector(a);
        Vector2D end = vector(b);
        List<Double> cuts = new ArrayList<>();
        cuts.add(0.0);
        for (double s : boundaryCrossings(region, a, b)) {
            cuts.add(s);
        }
        cuts.add(1.0);
        cuts.sort(Double::compare);
        double m0 = 0;
        double m1 = 0;
        for (int i = 0; i + 1 < cuts.size(); i++) {
            double s0 = cuts.get(i);
            double s1 = cuts.get(i + 1);
            double mid = 0.5 * (s0 + s1);
            if (s1 > s0 && region.contains(start.lerp(end, mid))) {
                m0 += s1 - s0;
                m1 += 0.5 * (s1 * s1 - s0 * s0);
            }
        }
        return new double[] {m0, m1};
    }

    /** Where the segment a→b meets the region's boundary, as fractions s ∈ [0, 1] of its length. */
    static double[] boundaryCrossings(RegionBSPTree2D region, Vec2 a, Vec2 b) {
        Vector2D start = vector(a);
        Vector2D end = vector(b);
        double length = start.distance(end);
        return region.linecast(Lines.segmentFromPoints(start, end, PRECISION)).stream()
                .mapToDouble(hit -> hit.getPoint().distance(start) / length)
                .toArray();
    }
}
