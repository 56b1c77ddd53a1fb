package org.kinduct.render.view;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.render.paint.Extent;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.paint.SourcePainter;

/** The box around everything drawn in a scene, at one instant or over its time window, for zoom-to-fit. */
public record SceneBounds(double minX, double minY, double maxX, double maxY) {

    /** Bounds of all outlines at {@code tS}, every body by its prescribed motion; see {@link #of(Scene, Placement)}. */
    public static SceneBounds of(Scene scene, double tS) {
        return of(scene, Placement.of(scene, tS));
    }

    /**
     * Bounds of what matters where {@code placement} puts it: the conductors, and the sources near
     * enough and small enough to act on them as something to look at (within
     * {@value #NEAR_SIZES} conductor sizes of them and at most {@value #LARGEST_SIZES} times their
     * size: a metre-wide mains coil around a 20 mm pickup is context, not the subject). Without
     * conductors, every source; a 0.2 m box around the origin for an empty scene.
     */
    public static SceneBounds of(Scene scene, Placement placement) {
        List<Vec2> conductors = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            conductors.addAll(placement.vertices(c));
        }
        List<Vec2> pts = new ArrayList<>(conductors);
        Extent focus = conductors.isEmpty() ? null : Extent.of(conductors);
        double size = focus == null ? 0 : Math.max(Math.max(focus.width(), focus.height()), MIN_FOCUS_M);
        for (Source s : scene.sources()) {
            List<Vec2> outline = SourcePainter.outline(s, placement);
            if (!outline.isEmpty() && (focus == null || actsOnFocus(Extent.of(outline), focus, size))) {
                pts.addAll(outline);
            }
        }
        if (pts.isEmpty()) {
            return new SceneBounds(-0.1, -0.1, 0.1, 0.1);
        }
        Extent e = Extent.of(pts);
        return new SceneBounds(e.minX(), e.minY(), e.maxX(), e.maxY());
    }

    /** Conductor sizes within which a source counts as near. */
    private static final double NEAR_SIZES = 2;
    /** Largest source, in conductor sizes, that zoom-to-fit takes in whole. */
    private static final double LARGEST_SIZES = 4;
    /** Conductors smaller than this are taken as this big when judging sources, metres. */
    private static final double MIN_FOCUS_M = 1e-3;

    private static boolean actsOnFocus(Extent source, Extent focus, double size) {
        double gapX = Math.max(0, Math.max(source.minX() - focus.maxX(), focus.minX() - source.maxX()));
        double gapY = Math.max(0, Math.max(source.minY() - focus.maxY(), focus.minY() - source.maxY()));
        return Math.hypot(gapX, gapY) <= NEAR_SIZES * size
                && Math.max(source.width(), source.height()) <= LARGEST_SIZES * size;
    }

    /**
     * Everything the scene shows over its time window, for zoom-to-fit: all bodies by their
     * prescribed motion at t0, the midpoint and t1, and at every sample of a simulated run, free
     * bodies where the run has them.
     *
     * @param series the run's samples (their times and free bodies are read)
     */
    public static SceneBounds ofWindow(Scene scene, List<Snapshot> series) {
        TimeSpan w = scene.time();
        SceneBounds b = of(scene, w.t0S()).union(of(scene, w.t1S())).union(of(scene, (w.t0S() + w.t1S()) / 2));
        for (Snapshot s : series) {
            if (!s.freeBodies().isEmpty()) {
                b = b.union(of(scene, Placement.of(scene, s.tS(), s.freeBodies())));
            }
        }
        return b;
    }

    /** Bounds of the objects {@code ids} alone at {@code tS}. */
    public static SceneBounds ofObjects(Scene scene, Set<String> ids, double tS) {
        return ofObjects(scene, ids, Placement.of(scene, tS));
    }

    /** Bounds of the objects {@code ids} alone where {@code placement} (made for {@code scene}) puts them. */
    public static SceneBounds ofObjects(Scene scene, Set<String> ids, Placement placement) {
        Set<String> others = new HashSet<>();
        scene.sources().forEach(s -> others.add(s.id()));
        scene.conductors().forEach(c -> others.add(c.id()));
        others.removeAll(ids);
        return of(scene.without(others), placement);
    }

    public Vec2 center() {
        return new Vec2((minX + maxX) / 2, (minY + maxY) / 2);
    }

    /** This box grown to include {@code o}. */
    public SceneBounds union(SceneBounds o) {
        return new SceneBounds(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX),
                Math.max(maxY, o.maxY));
    }
}
