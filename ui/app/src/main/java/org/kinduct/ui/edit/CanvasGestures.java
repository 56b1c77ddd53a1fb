package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.kinduct.render.paint.EditorMarks;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;

/**
 * What the mouse and keys do on the canvas, free of JavaFX so it is tested without a toolkit;
 * the canvas only translates its events (screen pixels) into these calls and paints
 * {@link #frame}.
 *
 * <p>A press starts one drag: with the middle button, or the primary one while Space is held, it
 * pans; on a vertex handle of a selected conductor it moves that vertex; on an object it selects
 * it (Shift toggles) and moves the selection; on empty ground it draws a selection band. A drag
 * shows a preview and becomes one undoable edit on release. While a drawing tool is chosen, clicks
 * place its points instead ({@link DrawingTool}), and typed text places them exactly.
 */
public final class CanvasGestures {

    /** The mouse buttons the canvas tells apart. */
    public enum Button { PRIMARY, MIDDLE, OTHER }

    /** The keys the canvas acts on (Backspace counts as {@link #DELETE}). */
    public enum Key { SPACE, ESCAPE, ENTER, DELETE, F, K, PERIOD, COMMA, HOME }

    private enum Drag { NONE, PAN, BAND, MOVE, VERTEX }

    private static final double ZOOM_PER_NOTCH = 1.15;
    /** Scroll delta of one wheel notch. */
    private static final double NOTCH_DELTA = 40;
    /** A click moves at most this far (pixels) between press and release; farther it is a drag. */
    private static final double CLICK_SLOP_PX = 4;
    /** A band smaller than this (pixels) each way was a click on empty ground, not a band. */
    private static final double BAND_MIN_PX = 3;
    /** Duplicates land this far (pixels) right of and below their originals. */
    private static final double DUPLICATE_OFFSET_PX = 20;
    /** An electrode click this close to an edge (pixels) lands on it: twice a pick's reach, as an edge is a thin target. */
    static final double ELECTRODE_REACH_PX = 2 * Picker.REACH_PX;

    private final EditorViewModel vm;
    private final Runnable viewMoving;
    private DrawingTool drawing;
    private boolean spaceDown;
    private Drag drag = Drag.NONE;
    private double pressX;
    private double pressY;
    private ViewTransform pressView;
    private double bandX;
    private double bandY;
    private Set<String> moving = Set.of();
    private Picker.VertexHit vertexHit;
    /** The scene as the drag would leave it, shown until release. */
    private Scene preview;

    /**
     * @param viewMoving told when a pan or zoom moves the view (the canvas asks for a coarse map
     *                   and a fine one once things settle)
     */
    public CanvasGestures(EditorViewModel vm, Runnable viewMoving) {
        this.vm = vm;
        this.viewMoving = viewMoving;
        vm.view().toolProperty().addListener((obs, old, t) -> drawing = t == ToolKind.SELECT ? null
                : t.onSheet() ? new DrawingTool(t, pts -> onSelectedSheet(t, pts)) : new DrawingTool(t));
    }

    // ---- mouse ----

    public void pressed(double x, double y, Button button, boolean shift) {
        pressX = x;
        pressY = y;
        pressView = view();
        drag = Drag.NONE;
        if (button == Button.MIDDLE || (button == Button.PRIMARY && spaceDown)) {
            drag = Drag.PAN;
            return;
        }
        if (button != Button.PRIMARY || drawing != null) {
            return;
        }
        Scene scene = vm.scene();
        Set<String> selection = vm.document().selection();
        Placement seen = vm.seen();
        vertexHit = Picker.vertex(scene, seen, view(), x, y, selection).orElse(null);
        if (vertexHit != null) {
            drag = Drag.VERTEX;
            return;
        }
        Optional<String> hit = Picker.pick(scene, seen, view(), x, y);
        if (hit.isEmpty()) {
            if (!shift) {
                selection.clear();
            }
            drag = Drag.BAND;
            bandX = x;
            bandY = y;
            return;
        }
        String id = hit.get();
        if (shift) {
            if (!selection.remove(id)) {
                selection.add(id);
            }
        } else if (!selection.contains(id)) {
            vm.document().select(Set.of(id));
        }
        moving = Set.copyOf(selection);
        drag = moving.isEmpty() ? Drag.NONE : Drag.MOVE;
    }

    public void dragged(double x, double y) {
        switch (drag) {
            case PAN -> {
                vm.view().viewProperty().set(pressView.pannedBy(x - pressX, y - pressY));
                viewMoving.run();
            }
            case BAND -> {
                bandX = x;
                bandY = y;
            }
            case MOVE, VERTEX -> preview(x, y);
            case NONE -> { }
        }
    }

    /** The scene as dragging to (x, y) leaves it; edits change the drawn geometry, so the drag is taken back to it. */
    private void preview(double x, double y) {
        try {
            // At t > t0 a body may have moved and turned since it was drawn.
            Placement seen = vm.seen();
            Scene scene = vm.scene();
            if (drag == Drag.VERTEX) {
                Vec2 at = vm.view().snapper().snap(view().toScene(x, y), null, List.of()).point();
                Conductor c = scene.conductor(vertexHit.conductorId()).orElseThrow();
                String body = c.vertices().get(vertexHit.index()).bodyOr(c.body());
                preview = SceneEdits.moveVertex(scene, c.id(), vertexHit.index(), seen.drawn(body, at));
            } else {
                Vec2 d = view().toScene(x, y).minus(view().toScene(pressX, pressY));
                Scene moved = scene;
                for (String id : moving) {
                    moved = SceneEdits.translate(moved, Set.of(id), seen.drawnShift(SceneEdits.bodyOf(moved, id), d));
                }
                preview = moved;
            }
            vm.dragged().ask(preview, vm.clock().time());
        } catch (IllegalArgumentException e) {
            preview = null;
            vm.say(e.getMessage());
        }
    }

    public void released() {
        switch (drag) {
            case PAN -> vm.maps().request(FieldMaps.Quality.FINE);
            case BAND -> selectInBand();
            case MOVE, VERTEX -> {
                if (preview != null) {
                    Scene target = preview;
                    Snapshot solved = vm.dragged().snapshotOf(target);
                    vm.document().apply(drag == Drag.VERTEX ? "Move vertex" : "Move " + moving.size() + " object(s)",
                            s -> target);
                    if (solved != null && vm.scene().equals(target)) {
                        vm.results().showSolved(solved);
                    }
                }
            }
            case NONE -> { }
        }
        drag = Drag.NONE;
        preview = null;
        vm.dragged().clear();
        moving = Set.of();
        vertexHit = null;
    }

    /** A click (press and release in place): places a point of the drawing; a double click on the last point finishes it. */
    public void clicked(double x, double y, Button button, int count) {
        if (drawing == null || button != Button.PRIMARY || spaceDown
                || Math.hypot(x - pressX, y - pressY) > CLICK_SLOP_PX) {
            return;
        }
        if (count == 2) {
            drawing.doubleClick(view().toScene(x, y), vm.view().snapper(), snapVertices())
                    .ifPresent(this::commitDrawing);
        } else {
            drawing.click(view().toScene(x, y), vm.view().snapper(), snapVertices()).ifPresent(this::commitDrawing);
        }
    }

    /** The cursor moved without a button held. */
    public void moved(double x, double y) {
        if (drawing != null) {
            drawing.hover(view().toScene(x, y), vm.view().snapper(), snapVertices());
        }
    }

    /** The wheel turned by {@code deltaY} (one notch is {@value #NOTCH_DELTA}); zooms about the cursor. */
    public boolean scrolled(double x, double y, double deltaY) {
        if (deltaY == 0) {
            return false;
        }
        vm.view().viewProperty().set(view().zoomedAt(x, y, Math.pow(ZOOM_PER_NOTCH, deltaY / NOTCH_DELTA)));
        viewMoving.run();
        return true;
    }

    // ---- keys ----

    public void keyPressed(Key key) {
        switch (key) {
            case SPACE -> spaceDown = true;
            case ESCAPE -> {
                if (drawing != null && drawing.isDrawing()) {
                    drawing.cancel();
                } else {
                    vm.view().toolProperty().set(ToolKind.SELECT);
                    vm.document().selection().clear();
                }
            }
            case ENTER -> {
                if (drawing != null) {
                    drawing.finish().ifPresent(this::commitDrawing);
                }
            }
            case DELETE -> vm.document().deleteSelection();
            case F -> vm.zoomToFit();
            case K -> vm.clock().togglePlaying();
            case PERIOD -> vm.clock().step(1);
            case COMMA -> vm.clock().step(-1);
            case HOME -> vm.clock().resetTime();
        }
    }

    public void keyReleased(Key key) {
        if (key == Key.SPACE) {
            spaceDown = false;
        }
    }

    /** Numeric entry while drawing ("25 mm", "10 mm, -5 mm"); returns an error message or empty. */
    public String typed(String text) {
        if (drawing == null) {
            return "Pick a drawing tool first";
        }
        try {
            drawing.typed(text).ifPresent(this::commitDrawing);
            return "";
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }

    /** Whether a drawing tool is chosen (typed digits then go to the numeric entry). */
    public boolean isDrawing() {
        return drawing != null;
    }

    /** Copies the selection a little right of and below where it is on screen. */
    public void duplicateSelection() {
        double m = DUPLICATE_OFFSET_PX / view().pxPerM();
        vm.document().duplicateSelection(new Vec2(m, -m));
    }

    private void commitDrawing(UnaryOperator<Scene> edit) {
        String label = "Add " + drawing.kind().label().toLowerCase(Locale.ROOT);
        if (drawing.kind().onSheet()) {
            // The sheet stays selected, so its next hole or electrode goes on it too.
            vm.document().apply(label, edit);
        } else {
            vm.document().add(label, edit);
        }
        drawing.cancel();
    }

    /**
     * The edit a hole or electrode tool makes of its clicked points: on the one selected plate or
     * channel, the points taken back to where it was drawn (its body may have moved by the time shown).
     */
    private UnaryOperator<Scene> onSelectedSheet(ToolKind kind, List<Vec2> pts) {
        Placement seen = vm.seen();
        Set<String> selected = Set.copyOf(vm.document().selection());
        double reachM = ELECTRODE_REACH_PX / view().pxPerM();
        return scene -> {
            List<Conductor> sheets = scene.conductors().stream()
                    .filter(c -> c instanceof Conductor.Sheet && selected.contains(c.id())).toList();
            if (sheets.size() != 1) {
                throw new IllegalArgumentException("select one " + (kind == ToolKind.HOLE ? "plate" : "plate or channel")
                        + " first (" + sheets.size() + " selected)");
            }
            Conductor sheet = sheets.get(0);
            List<Vec2> drawn = pts.stream().map(p -> seen.drawn(sheet.body(), p)).toList();
            return kind == ToolKind.HOLE ? SheetEdits.addHole(scene, sheet.id(), drawn)
                    : SheetEdits.addElectrode(scene, sheet.id(), drawn.get(0), reachM);
        };
    }

    /** Adds every object lying wholly inside the band to the selection; a band too small to mean one adds nothing. */
    private void selectInBand() {
        if (Math.abs(bandX - pressX) < BAND_MIN_PX && Math.abs(bandY - pressY) < BAND_MIN_PX) {
            return;
        }
        ViewTransform v = view();
        double x0 = Math.min(v.sceneX(pressX), v.sceneX(bandX));
        double x1 = Math.max(v.sceneX(pressX), v.sceneX(bandX));
        double y0 = Math.min(v.sceneY(pressY), v.sceneY(bandY));
        double y1 = Math.max(v.sceneY(pressY), v.sceneY(bandY));
        Scene s = vm.scene();
        Placement seen = vm.seen();
        Set<String> inside = new HashSet<>();
        // A uniform field fills the plane: no band holds it.
        s.sources().stream().filter(Shapes::hasPlace).forEach(src -> inside.add(src.id()));
        s.conductors().forEach(c -> inside.add(c.id()));
        inside.removeIf(id -> {
            SceneBounds b = SceneBounds.ofObjects(s, Set.of(id), seen);
            return b.minX() < x0 || b.maxX() > x1 || b.minY() < y0 || b.maxY() > y1;
        });
        vm.document().selection().addAll(inside);
    }

    /** The band's corners in scene coordinates. */
    private List<Vec2> band() {
        ViewTransform v = view();
        return List.of(v.toScene(pressX, pressY), v.toScene(bandX, pressY), v.toScene(bandX, bandY),
                v.toScene(pressX, bandY));
    }

    /** The vertices a drawn point may snap to: every conductor's, every outline's, and the drawing's own. */
    private List<Vec2> snapVertices() {
        List<Vec2> pts = new ArrayList<>();
        for (Conductor c : vm.scene().conductors()) {
            c.vertices().forEach(v -> pts.add(v.at()));
        }
        for (Source src : vm.scene().sources()) {
            pts.addAll(cornersOf(src));
        }
        if (drawing != null) {
            pts.addAll(drawing.points());
        }
        return pts;
    }

    /** A source's drawn corners: those of its outline when it has one made of vertices. */
    private static List<Vec2> cornersOf(Source src) {
        return src.match(new Source.Cases<>() {
            @Override
            public List<Vec2> patch(Source.FieldPatch patch) {
                return patch.outline();
            }

            @Override
            public List<Vec2> uniform(Source.UniformField uniform) {
                return List.of();
            }

            @Override
            public List<Vec2> block(Source.BlockMagnet block) {
                return List.of();
            }

            @Override
            public List<Vec2> cylinder(Source.CylinderMagnet cylinder) {
                return List.of();
            }

            @Override
            public List<Vec2> coil(Source.SourceCoil coil) {
                return coil.shape().match(new Source.CoilShape.Cases<>() {
                    @Override
                    public List<Vec2> polygon(Source.CoilShape.Polygon polygon) {
                        return polygon.vertices();
                    }

                    @Override
                    public List<Vec2> circle(Source.CoilShape.Circle circle) {
                        return List.of();
                    }
                });
            }

            @Override
            public List<Vec2> map(Source.FieldMap map) {
                return List.of();
            }
        });
    }

    // ---- what to paint ----

    /**
     * The frame to paint now: the drag's preview while dragging (drawn at the time shown, with its
     * own numbers once they are solved, never with those of the scene before the drag), else the
     * scene with the snapshot shown, at the instant its numbers are for, so overlays sit on their
     * conductors.
     */
    public Picture frame(String note) {
        Snapshot snap = preview != null ? vm.dragged().snapshotOf(preview) : vm.results().snapshot();
        double t = snap != null ? snap.tS() : vm.clock().time();
        Set<String> selected = vm.document().selection();
        EditorMarks marks = drawing != null ? drawing.marks(selected)
                : new EditorMarks(selected, drag == Drag.BAND ? band() : List.of(), true, null, "");
        ViewSettings settings = vm.view();
        return new Picture(preview != null ? preview : vm.scene(), t, snap, vm.maps().raster(), settings.view(),
                settings.layers(), settings.rangeProperty().get(), marks, note,
                preview != null ? vm.results().scalesNow().including(snap) : vm.results().scalesNow());
    }

    private ViewTransform view() {
        return vm.view().view();
    }
}
