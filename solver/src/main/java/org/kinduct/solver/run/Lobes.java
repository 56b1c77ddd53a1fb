package org.kinduct.solver.run;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Vec2;

/**
 * The lobes of a closed polygon that crosses itself (a figure-eight): split at a crossing of two
 * sides into the two closed paths either side of it, each again until none crosses itself. Each lobe
 * keeps the polygon's direction along its sides, so its sense is the winding the polygon gives it.
 */
final class Lobes {

    private Lobes() {
    }

    /** The lobes of {@code polygon}; the polygon itself when it does not cross itself. Lobes without area are left out. */
    static List<List<Vec2>> of(List<Vec2> polygon) {
        int n = polygon.size();
        for (int i = 0; i < n; i++) {
            for (int j = i + 2; j < n; j++) {
                if (i == 0 && j == n - 1) {
                    continue;
                }
                Vec2 at = crossing(polygon.get(i), polygon.get(i + 1), polygon.get(j), polygon.get((j + 1) % n));
                if (at != null) {
                    List<Vec2> one = new ArrayList<>(List.of(at));
                    one.addAll(polygon.subList(i + 1, j + 1));
                    List<Vec2> other = new ArrayList<>(List.of(at));
                    other.addAll(polygon.subList(j + 1, n));
                    other.addAll(polygon.subList(0, i + 1));
                    List<List<Vec2>> out = new ArrayList<>(of(one));
                    out.addAll(of(other));
                    return out;
                }
            }
        }
        return n >= 3 && Polygons.signedArea(polygon) != 0 ? List.of(polygon) : List.of();
    }

    /**
     * Where side a–b crosses side c–d inside both (a touch at an end is no crossing), else null;
     * the intersection of two segments by their cross products (common practice in computational
     * geometry).
     */
    private static Vec2 crossing(Vec2 a, Vec2 b, Vec2 c, Vec2 d) {
        double d1 = cross(c, d, a);
        double d2 = cross(c, d, b);
        double d3 = cross(a, b, c);
        double d4 = cross(a, b, d);
        if (!(d1 * d2 < 0 && d3 * d4 < 0)) {
            return null;
        }
        double s = d1 / (d1 - d2);
        return new Vec2(a.x() + s * (b.x() - a.x()), a.y() + s * (b.y() - a.y()));
    }

    /** (q − p) × (r − p). */
    private static double cross(Vec2 p, Vec2 q, Vec2 r) {
        return (q.x() - p.x()) * (r.y() - p.y()) - (q.y() - p.y()) * (r.x() - p.x());
    }
}
