package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/** Short ways to write the scenes the tests use. */
final class TestScenes {

    /** Bare copper wire of 1 mm diameter. */
    static final WireSpec COPPER_1MM = WireSpec.of(Material.COPPER, 1e-3);

    private TestScenes() {
    }

    static Scene scene(List<Body> bodies, List<Source> sources, List<Conductor> conductors) {
        return new Scene("test", "", bodies, sources, conductors, new TimeSpan(0, 1, 0.01));
    }

    /** Points from x0, y0, x1, y1, …, metres. */
    static List<Vec2> points(double... xy) {
        List<Vec2> points = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            points.add(new Vec2(xy[i], xy[i + 1]));
        }
        return points;
    }

    static List<Conductor.Vertex> vertices(List<Vec2> points) {
        return points.stream().map(p -> new Conductor.Vertex(p, null)).toList();
    }

    static Source.FieldPatch rectanglePatch(String id, String body, double x0, double y0, double x1, double y1,
                                            double bzT) {
        return new Source.FieldPatch(id, body, points(x0, y0, x1, y0, x1, y1, x0, y1), bzT);
    }

    static Conductor.Loop loop(String id, String body, List<Vec2> points) {
        return Conductor.Loop.simple(id, body, vertices(points), COPPER_1MM);
    }

    static Conductor.Wire wire(String id, String body, double... xy) {
        return new Conductor.Wire(id, body, vertices(points(xy)));
    }

    static double[] xs(List<Vec2> points) {
        return points.stream().mapToDouble(Vec2::x).toArray();
    }

    static double[] ys(List<Vec2> points) {
        return points.stream().mapToDouble(Vec2::y).toArray();
    }

    /**
     * Winding number of the closed polygon about (x, y) by signed upward/downward crossings of
     * the ray to the right (Hormann &amp; Agathos, "The point in polygon problem for arbitrary
     * polygons", Computational Geometry 20, 2001). Written here, apart from the solver's code.
     */
    static int winding(List<Vec2> polygon, double x, double y) {
        int w = 0;
        int n = polygon.size();
        for (int i = 0; i < n; i++) {
            Vec2 a = polygon.get(i);
            Vec2 b = polygon.get((i + 1) % n);
            double side = (b.x() - a.x()) * (y - a.y()) - (x - a.x()) * (b.y() - a.y());
            if (a.y() <= y && b.y() > y && side > 0) {
                w++;
            } else if (a.y() > y && b.y() <= y && side < 0) {
                w--;
            }
        }
        return w;
    }

    /** The polygon in reverse vertex order. */
    static List<Vec2> reversed(List<Vec2> polygon) {
        List<Vec2> copy = new ArrayList<>(polygon);
        java.util.Collections.reverse(copy);
        return copy;
    }
}
