package org.kinduct.ui.edit;

import java.util.List;
import java.util.Optional;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.paint.SourcePainter;
import org.kinduct.render.view.ViewTransform;

/** Finds what lies under a screen point: conductors (near their wire) before sources (inside their outline). */
public final class Picker {

    /** How close to a wire a click must be, pixels. */
    public static final double REACH_PX = 7;

    /** A conductor vertex under the cursor. */
    public record VertexHit(String conductorId, int index) {
    }

    private Picker() {
    }

    public static Optional<String> pick(Scene scene, Placement placement, ViewTransform v, double sx, double sy) {
        Vec2 p = v.toScene(sx, sy);
        double reach = REACH_PX / v.pxPerM();
        List<Conductor> conductors = scene.conductors();
        for (int i = conductors.size() - 1; i >= 0; i--) {
            Conductor c = conductors.get(i);
            if (distanceToPath(p, placement.vertices(c), closed(c)) <= reach) {
                return Optional.of(c.id());
            }
        }
        List<Source> sources = scene.sources();
        for (int i = sources.size() - 1; i >= 0; i--) {
            List<Vec2> outline = SourcePainter.outline(sources.get(i), placement);
            if (!outline.isEmpty() && (contains(outline, p) || distanceToPath(p, outline, true) <= reach)) {
                return Optional.of(sources.get(i).id());
            }
        }
        return Optional.empty();
    }

    /** A vertex of one of {@code among} (selected conductors) within reach. */
    public static Optional<VertexHit> vertex(Scene scene, Placement placement, ViewTransform v, double sx, double sy,
                                             java.util.Set<String> among) {
        for (Conductor c : scene.conductors()) {
            if (!among.contains(c.id())) {
                continue;
            }
            List<Vec2> pts = placement.vertices(c);
            for (int i = 0; i < pts.size(); i++) {
                if (Math.hypot(v.screenX(pts.get(i).x()) - sx, v.screenY(pts.get(i).y()) - sy) <= REACH_PX) {
                    return Optional.of(new VertexHit(c.id(), i));
                }
            }
        }
        return Optional.empty();
    }

    /** Whether a conductor runs round a closed outline (a loop, with a gap or not) rather than end to end. */
    private static boolean closed(Conductor c) {
        return c.match(new Conductor.Cases<>() {
            @Override
            public Boolean wire(Conductor.Wire wire) {
                return false;
            }

            @Override
            public Boolean loop(Conductor.Loop loop) {
                return true;
            }

            @Override
            public Boolean plate(Conductor.Plate plate) {
                return true;
            }

            @Override
            public Boolean channel(Conductor.Channel channel) {
                return true;
            }
        });
    }

    static double distanceToPath(Vec2 p, List<Vec2> pts, boolean closed) {
        double best = Double.POSITIVE_INFINITY;
        int n = pts.size();
        for (int i = 0; i < (closed ? n : n - 1); i++) {
            best = Math.min(best, distanceToSegment(p, pts.get(i), pts.get((i + 1) % n)));
        }
        return best;
    }

    static double distanceToSegment(Vec2 p, Vec2 a, Vec2 b) {
        Vec2 ab = b.minus(a);
        double len2 = ab.dot(ab);
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.minus(a.plus(ab.times(t))).length();
    }

    /** Even-odd point-in-polygon test (ray casting). */
    static boolean contains(List<Vec2> poly, Vec2 p) {
        boolean inside = false;
        for (int i = 0, j = poly.size() - 1; i < poly.size(); j = i++) {
            Vec2 a = poly.get(i);
            Vec2 b = poly.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                inside = !inside;
            }
        }
        return inside;
    }
}
