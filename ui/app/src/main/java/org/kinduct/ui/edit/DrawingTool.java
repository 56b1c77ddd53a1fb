package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.EditorMarks;
import org.kinduct.render.paint.Quantities;

/**
 * The state of drawing one new object: clicked points, the snapped cursor, and typed input.
 * Finishing yields the edit that adds the object; {@link CanvasGestures} applies it through the
 * {@link SceneDocument} so it can be undone.
 */
public final class DrawingTool {

    /** Points closer than this are one point (far below any drawn feature, far above rounding). */
    private static final double SAME_POINT_M = 1e-9;

    private final ToolKind kind;
    private final Function<List<Vec2>, UnaryOperator<Scene>> build;
    private final List<Vec2> points = new ArrayList<>();
    private Snapper.Snap cursor;

    /** A tool that adds a new object ({@link ShapeFactory}). */
    public DrawingTool(ToolKind kind) {
        this(kind, pts -> scene -> ShapeFactory.add(scene, kind, pts));
    }

    /** A tool whose finished points become the edit {@code build} makes of them (a hole, an electrode). */
    public DrawingTool(ToolKind kind, Function<List<Vec2>, UnaryOperator<Scene>> build) {
        if (kind == ToolKind.SELECT) {
            throw new IllegalArgumentException("the selection tool does not draw");
        }
        this.kind = kind;
        this.build = build;
    }

    public ToolKind kind() {
        return kind;
    }

    public List<Vec2> points() {
        return List.copyOf(points);
    }

    /** Updates the cursor; {@code vertices} are the existing vertices it may snap to. */
    public void hover(Vec2 raw, Snapper snapper, List<Vec2> vertices) {
        if (kind.gesture() == ToolKind.Gesture.POINT) {
            // A point tool (the electrode) snaps onto an edge when placed; the grid would pull it off.
            cursor = new Snapper.Snap(raw, "");
            return;
        }
        // A rectangle's second corner is free in both axes: no 15° steps from the first one.
        Vec2 from = kind.gesture() == ToolKind.Gesture.RECTANGLE ? null : last();
        cursor = snapper.snap(raw, from, vertices);
    }

    /** Adds the (snapped) point; returns the finished edit when the gesture is complete. */
    public Optional<UnaryOperator<Scene>> click(Vec2 raw, Snapper snapper, List<Vec2> vertices) {
        hover(raw, snapper, vertices);
        return addPoint(cursor.point());
    }

    /**
     * The second click of a double click: it finishes the shape where it lands on the last point
     * placed; elsewhere it places a point like any click, since quick clicks at separate spots can
     * count as one double click (the toolkit's distance allowance varies by platform).
     */
    public Optional<UnaryOperator<Scene>> doubleClick(Vec2 raw, Snapper snapper, List<Vec2> vertices) {
        hover(raw, snapper, vertices);
        Vec2 from = last();
        return from != null && same(from, cursor.point()) ? finish() : addPoint(cursor.point());
    }

    /**
     * Numeric entry: "x, y" places a point at those coordinates; a single length places the next
     * point that far from the last one towards the cursor (or the radius of a circle, or along +x
     * when there is no direction yet).
     */
    public Optional<UnaryOperator<Scene>> typed(String text) {
        String[] parts = text.split("[,;]", -1);
        if (parts.length == 2) {
            return addPoint(new Vec2(TextInput.length(parts[0]), TextInput.length(parts[1])));
        }
        if (parts.length != 1) {
            throw new IllegalArgumentException("type a length (12 mm) or coordinates (10 mm, -5 mm)");
        }
        double len = TextInput.length(parts[0]);
        Vec2 from = last();
        if (from == null) {
            throw new IllegalArgumentException("place the first point before typing a length");
        }
        Vec2 dir = cursor != null ? cursor.point().minus(from) : Vec2.ZERO;
        Vec2 unit = dir.length() > 0 ? dir.times(1 / dir.length()) : new Vec2(1, 0);
        return addPoint(from.plus(unit.times(len)));
    }

    /** Completes a polyline or polygon (Enter, double-click); empty while it has too few points. */
    public Optional<UnaryOperator<Scene>> finish() {
        if (kind.fixedPoints() > 0 || points.size() < kind.minPoints()) {
            return Optional.empty();
        }
        return Optional.of(edit(List.copyOf(points)));
    }

    public void cancel() {
        points.clear();
        cursor = null;
    }

    public boolean isDrawing() {
        return !points.isEmpty();
    }

    /** What the canvas shows: the shape so far including the cursor, the snap target and its length. */
    public EditorMarks marks(Set<String> selected) {
        List<Vec2> shown = new ArrayList<>(points);
        if (cursor != null && !points.isEmpty()) {
            shown.add(cursor.point());
        }
        List<Vec2> preview = ShapeFactory.preview(kind, shown);
        boolean closed = kind.gesture() == ToolKind.Gesture.POLYGON || preview.size() > shown.size();
        return new EditorMarks(selected, preview, closed, cursor == null ? null : cursor.point(), hint());
    }

    private String hint() {
        if (cursor == null) {
            return "";
        }
        Vec2 from = last();
        if (from == null) {
            return "(" + Quantities.length(cursor.point().x()) + ", " + Quantities.length(cursor.point().y()) + ")"
                    + (cursor.to().isEmpty() ? "" : " · " + cursor.to());
        }
        Vec2 d = cursor.point().minus(from);
        return Quantities.length(d.length()) + " at " + Math.round(Math.toDegrees(Math.atan2(d.y(), d.x()))) + "°"
                + (cursor.to().isEmpty() ? "" : " · " + cursor.to());
    }

    /**
     * Whether two snapped points are the same vertex: snapping by angle or grid rounds differently
     * from the first click (cos 90° is 6e-17, not 0), so exact equality would miss.
     */
    private static boolean same(Vec2 a, Vec2 b) {
        return a.minus(b).length() <= SAME_POINT_M;
    }

    private Optional<UnaryOperator<Scene>> addPoint(Vec2 p) {
        if (!points.isEmpty() && same(points.get(points.size() - 1), p)) {
            return Optional.empty();
        }
        if (kind.gesture() == ToolKind.Gesture.POLYGON && points.size() >= 3 && same(points.get(0), p)) {
            return finish();
        }
        points.add(p);
        if (kind.fixedPoints() > 0 && points.size() == kind.fixedPoints()) {
            List<Vec2> done = List.copyOf(points);
            points.clear();
            return Optional.of(edit(done));
        }
        return Optional.empty();
    }

    private UnaryOperator<Scene> edit(List<Vec2> pts) {
        points.clear();
        return build.apply(pts);
    }

    private Vec2 last() {
        return points.isEmpty() ? null : points.get(points.size() - 1);
    }
}
