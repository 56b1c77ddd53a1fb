package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.UnaryOperator;
import javafx.animation.AnimationTimer;
import javafx.animation.PauseTransition;
import javafx.application.Platform;
import javafx.beans.Observable;
import javafx.scene.Cursor;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Pane;
import javafx.util.Duration;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;
import org.kinduct.scene.Vec2;
import org.kinduct.ui.edit.DrawingTool;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.EditorViewModel.MapQuality;
import org.kinduct.ui.edit.Picker;
import org.kinduct.render.view.SceneBounds;
import org.kinduct.ui.edit.SceneEdits;
import org.kinduct.ui.edit.Snapper;
import org.kinduct.ui.edit.ToolKind;
import org.kinduct.render.paint.EditorMarks;
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Frame;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.Placement;
import org.kinduct.render.paint.ScenePainter;
import org.kinduct.render.view.NiceSteps;
import org.kinduct.render.view.ViewTransform;

/**
 * The drawing area: paints the scene through {@link CanvasFrames}, turns mouse and keys into
 * view changes and edits, and drives playback. Repaints at most once per pulse, only when
 * something changed.
 */
final class EditorCanvas extends Pane {

    private static final double ZOOM_PER_NOTCH = 1.15;
    private static final double GRID_SNAP_PX = 12;
    private static final Duration IDLE_REFINE = Duration.millis(250);
    private static final double FRAME_TIME_SMOOTHING = 0.1;

    private final EditorViewModel vm;
    private final Canvas canvas = new Canvas();
    private final PauseTransition refine = new PauseTransition(IDLE_REFINE);
    private final CanvasFrames frames = new CanvasFrames(canvas);
    private final BackdropWorker backdrops;
    private FieldBackdrop backdrop;
    /** The view the last zoom-to-fit made. */
    private ViewTransform fitted;
    private DrawingTool drawing;
    private boolean spaceDown;
    private boolean needsPaint = true;
    private boolean showFrameTime;
    private double frameMs;
    private double lastFrameMs;
    private java.util.function.DoubleConsumer paintTimes = ms -> { };
    private long lastNanos;

    // Drag state: pan, move selection, or move a vertex.
    private double pressX;
    private double pressY;
    private ViewTransform pressView;
    private boolean panning;
    private Set<String> moving = Set.of();
    private Picker.VertexHit vertexDrag;
    private Scene dragPreview;
    private boolean banding;
    private double bandX;
    private double bandY;
    private final java.util.function.Consumer<String> cursorSink;

    EditorCanvas(EditorViewModel vm, java.util.function.Consumer<String> cursorSink) {
        this.vm = vm;
        this.cursorSink = cursorSink;
        getChildren().add(canvas);
        setFocusTraversable(true);
        setMinSize(200, 150);
        canvas.widthProperty().bind(widthProperty());
        canvas.heightProperty().bind(heightProperty());
        widthProperty().addListener(o -> resizeView());
        heightProperty().addListener(o -> resizeView());
        for (Observable o : new Observable[] {vm.sceneProperty(), vm.snapshotProperty(), vm.rasterProperty(),
                vm.viewProperty(), vm.layers(), vm.selection(), vm.rangeProperty()}) {
            o.addListener(x -> needsPaint = true);
        }
        backdrops = new BackdropWorker(Platform::runLater, (raster, b) -> {
            backdrop = vm.rasterProperty().get() != null ? b : null;
            vm.mapShown(raster);
            needsPaint = true;
        });
        for (Observable o : new Observable[] {vm.rasterProperty(), vm.viewProperty(), vm.layers(), vm.rangeProperty()}) {
            o.addListener(x -> requestBackdrop());
        }
        vm.resultProperty().addListener(x -> refitAfterRun());
        vm.toolProperty().addListener((obs, old, t) -> {
            drawing = t == ToolKind.SELECT ? null : new DrawingTool(t);
            setCursor(t == ToolKind.SELECT ? Cursor.DEFAULT : Cursor.CROSSHAIR);
            needsPaint = true;
        });
        refine.setOnFinished(e -> vm.requestField(MapQuality.FINE));
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, this::moved);
        addEventHandler(MouseEvent.MOUSE_CLICKED, this::clicked);
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventHandler(KeyEvent.KEY_PRESSED, this::keyPressed);
        addEventHandler(KeyEvent.KEY_RELEASED, e -> {
            if (e.getCode() == KeyCode.SPACE) {
                spaceDown = false;
            }
        });
        new AnimationTimer() {
            @Override
            public void handle(long now) {
                tick(now);
            }
        }.start();
    }

    private void tick(long now) {
        if (lastNanos != 0 && vm.playingProperty().get()) {
            vm.advance(Math.min(0.1, (now - lastNanos) * 1e-9));
            needsPaint = true;
        }
        lastNanos = now;
        if (needsPaint) {
            needsPaint = false;
            paint();
        }
    }

    /** The field layers change with the map, view, colour range or layer choice: draw them anew off this thread. */
    private void requestBackdrop() {
        FieldRaster raster = vm.rasterProperty().get();
        if (raster == null) {
            backdrop = null;
            return;
        }
        ViewTransform v = view();
        if (v.widthPx() >= 1 && v.heightPx() >= 1) {
            backdrops.request(raster, v, vm.rangeProperty().get().scaleFor(raster),
                    org.kinduct.render.paint.FieldLayers.applicable(vm.layers(), vm.scene()));
        }
    }

    /** Paints now; returns the time the painter took, milliseconds. */
    double paint() {
        long t0 = System.nanoTime();
        frames.show(frame(), backdrop);
        double ms = (System.nanoTime() - t0) * 1e-6;
        lastFrameMs = ms;
        frameMs = frameMs == 0 ? ms : frameMs + FRAME_TIME_SMOOTHING * (ms - frameMs);
        paintTimes.accept(ms);
        return ms;
    }

    /** Receives the painter's time of every frame from now on (for the frame-time probe). */
    void onPainted(java.util.function.DoubleConsumer sink) {
        paintTimes = sink;
    }

    Frame frame() {
        Scene scene = dragPreview != null ? dragPreview : vm.scene();
        EditorMarks marks = drawing != null ? drawing.marks(vm.selection())
                : new EditorMarks(vm.selection(), banding ? band() : List.of(), true, null, "");
        String note = showFrameTime
                ? String.format(java.util.Locale.ROOT, "paint: last %.1f ms, average %.1f ms", lastFrameMs, frameMs) : "";
        // Draw at the instant the solver's numbers are for, so overlays sit on their conductors.
        Snapshot snap = dragPreview != null ? null : vm.snapshotProperty().get();
        double t = snap != null ? snap.tS() : vm.timeProperty().get();
        return new Frame(scene, t, snap,
                vm.rasterProperty().get(), vm.viewProperty().get(), vm.layers(), vm.rangeProperty().get(), marks, note,
                vm.scalesNow());
    }

    void toggleFrameTime() {
        showFrameTime = !showFrameTime;
        needsPaint = true;
    }

    /** Shows everything the scene holds over its whole time window, free bodies along their simulated path. */
    void zoomToFit() {
        // A run of the scene shown before (just after opening another) says nothing about this one.
        SceneBounds b = SceneBounds.ofWindow(vm.scene(),
                vm.currentResult().map(RunResult::samples).orElse(List.of()));
        double padX = (b.maxX() - b.minX()) * 0.08;
        double padY = (b.maxY() - b.minY()) * 0.08;
        double legend = vm.layers().contains(Layer.LEGEND) ? ScenePainter.LEGEND_SPAN_PX : 0;
        vm.viewProperty().set(vm.viewProperty().get().fitting(b.minX() - padX, b.minY() - padY, b.maxX() + padX,
                b.maxY() + padY, 30, legend));
        fitted = vm.viewProperty().get();
        vm.requestField(MapQuality.FINE);
    }

    /** A fitted view is fitted again once the free bodies' run is in, unless the user has moved it since. */
    private void refitAfterRun() {
        if (fitted != null && fitted.equals(vm.viewProperty().get())
                && vm.currentResult().map(RunResult::hasFreeBodies).orElse(false)) {
            zoomToFit();
        }
    }

    private void resizeView() {
        vm.viewProperty().set(vm.viewProperty().get().resized(getWidth(), getHeight()));
        interacting();
    }

    /** The view is changing: coarse maps now, a fine one once things settle. */
    private void interacting() {
        vm.requestField(MapQuality.COARSE);
        refine.playFromStart();
    }

    private ViewTransform view() {
        return vm.viewProperty().get();
    }

    /** Where the user sees things: bodies where they are now, free ones where the run has them. */
    private Placement seen() {
        Snapshot shown = vm.snapshotProperty().get();
        return Placement.of(vm.scene(), vm.timeProperty().get(), shown == null ? Map.of() : shown.freeBodies());
    }

    private Snapper snapper() {
        double grid = vm.snapToGridProperty().get() ? NiceSteps.atLeast(GRID_SNAP_PX / view().pxPerM()) : 0;
        return new Snapper(grid, Picker.REACH_PX / view().pxPerM(), vm.snapAnglesProperty().get());
    }

    private List<Vec2> snapVertices() {
        List<Vec2> pts = new ArrayList<>();
        for (Conductor c : vm.scene().conductors()) {
            c.vertices().forEach(v -> pts.add(v.at()));
        }
        for (org.kinduct.scene.Source src : vm.scene().sources()) {
            if (src instanceof org.kinduct.scene.Source.FieldPatch p) {
                pts.addAll(p.outline());
            } else if (src instanceof org.kinduct.scene.Source.SourceCoil coil
                    && coil.shape() instanceof org.kinduct.scene.Source.CoilShape.Polygon poly) {
                pts.addAll(poly.vertices());
            }
        }
        if (drawing != null) {
            pts.addAll(drawing.points());
        }
        return pts;
    }

    private void pressed(MouseEvent e) {
        requestFocus();
        pressX = e.getX();
        pressY = e.getY();
        pressView = view();
        panning = e.getButton() == MouseButton.MIDDLE || (e.getButton() == MouseButton.PRIMARY && spaceDown);
        if (panning || e.getButton() != MouseButton.PRIMARY || drawing != null) {
            return;
        }
        Placement placement = seen();
        vertexDrag = Picker.vertex(vm.scene(), placement, view(), e.getX(), e.getY(), vm.selection()).orElse(null);
        if (vertexDrag != null) {
            return;
        }
        Optional<String> hit = Picker.pick(vm.scene(), placement, view(), e.getX(), e.getY());
        if (hit.isEmpty()) {
            if (!e.isShiftDown()) {
                vm.selection().clear();
            }
            moving = Set.of();
            banding = true;
            bandX = e.getX();
            bandY = e.getY();
            return;
        }
        String id = hit.get();
        if (e.isShiftDown()) {
            if (!vm.selection().remove(id)) {
                vm.selection().add(id);
            }
        } else if (!vm.selection().contains(id)) {
            vm.select(Set.of(id));
        }
        moving = Set.copyOf(vm.selection());
    }

    private void dragged(MouseEvent e) {
        if (panning) {
            vm.viewProperty().set(pressView.pannedBy(e.getX() - pressX, e.getY() - pressY));
            interacting();
            return;
        }
        if (banding) {
            bandX = e.getX();
            bandY = e.getY();
            needsPaint = true;
            return;
        }
        Vec2 d = view().toScene(e.getX(), e.getY()).minus(view().toScene(pressX, pressY));
        try {
            // Edits change the drawn geometry; at t > t0 a body may have moved and turned since.
            Placement now = seen();
            if (vertexDrag != null) {
                Vec2 at = snapper().snap(view().toScene(e.getX(), e.getY()), null, List.of()).point();
                Conductor c = vm.scene().conductor(vertexDrag.conductorId()).orElseThrow();
                String body = c.vertices().get(vertexDrag.index()).bodyOr(c.body());
                dragPreview = SceneEdits.moveVertex(vm.scene(), c.id(), vertexDrag.index(), now.drawn(body, at));
            } else if (!moving.isEmpty()) {
                Scene moved = vm.scene();
                for (String id : moving) {
                    moved = SceneEdits.translate(moved, Set.of(id), now.drawnShift(SceneEdits.bodyOf(moved, id), d));
                }
                dragPreview = moved;
            }
        } catch (IllegalArgumentException ex) {
            dragPreview = null;
            vm.say(ex.getMessage());
        }
        needsPaint = true;
        updateCursor(e.getX(), e.getY());
    }

    private void released(MouseEvent e) {
        if (panning) {
            panning = false;
            vm.requestField(MapQuality.FINE);
            return;
        }
        if (banding) {
            banding = false;
            selectInBand();
            needsPaint = true;
            return;
        }
        if (dragPreview != null) {
            Scene target = dragPreview;
            dragPreview = null;
            vm.apply(vertexDrag != null ? "Move vertex" : "Move " + moving.size() + " object(s)", s -> target);
        }
        vertexDrag = null;
        moving = Set.of();
        needsPaint = true;
    }

    /** The rubber band's corners in scene coordinates. */
    private List<Vec2> band() {
        ViewTransform v = view();
        return List.of(v.toScene(pressX, pressY), v.toScene(bandX, pressY), v.toScene(bandX, bandY),
                v.toScene(pressX, bandY));
    }

    /** Adds every object lying wholly inside the rubber band to the selection. */
    private void selectInBand() {
        if (Math.abs(bandX - pressX) < 3 && Math.abs(bandY - pressY) < 3) {
            return;
        }
        ViewTransform v = view();
        double x0 = Math.min(v.sceneX(pressX), v.sceneX(bandX));
        double x1 = Math.max(v.sceneX(pressX), v.sceneX(bandX));
        double y0 = Math.min(v.sceneY(pressY), v.sceneY(bandY));
        double y1 = Math.max(v.sceneY(pressY), v.sceneY(bandY));
        Scene s = vm.scene();
        Placement seen = seen();
        java.util.Set<String> inside = new java.util.HashSet<>();
        s.sources().forEach(x -> inside.add(x.id()));
        s.conductors().forEach(x -> inside.add(x.id()));
        inside.removeIf(id -> {
            SceneBounds b = SceneBounds.ofObjects(s, Set.of(id), seen);
            return b.minX() < x0 || b.maxX() > x1 || b.minY() < y0 || b.maxY() > y1
                    || s.source(id).filter(src -> src instanceof org.kinduct.scene.Source.UniformField).isPresent();
        });
        vm.selection().addAll(inside);
    }

    private void clicked(MouseEvent e) {
        if (drawing == null || e.getButton() != MouseButton.PRIMARY || spaceDown
                || Math.hypot(e.getX() - pressX, e.getY() - pressY) > 4) {
            return;
        }
        if (e.getClickCount() == 2) {
            drawing.finish().ifPresent(this::commitDrawing);
        } else {
            drawing.click(view().toScene(e.getX(), e.getY()), snapper(), snapVertices()).ifPresent(this::commitDrawing);
        }
        needsPaint = true;
    }

    private void commitDrawing(UnaryOperator<Scene> edit) {
        int before = vm.scene().sources().size() + vm.scene().conductors().size();
        if (vm.apply("Add " + drawing.kind().label().toLowerCase(java.util.Locale.ROOT), edit)) {
            Scene s = vm.scene();
            String id = s.conductors().size() + s.sources().size() > before
                    ? lastAddedId(s, drawing.kind()) : null;
            if (id != null) {
                vm.select(Set.of(id));
            }
        }
        drawing.cancel();
    }

    private static String lastAddedId(Scene s, ToolKind kind) {
        return switch (kind) {
            case WIRE, LOOP, RECT_LOOP, ROUND_LOOP -> s.conductors().get(s.conductors().size() - 1).id();
            default -> s.sources().get(s.sources().size() - 1).id();
        };
    }

    /** Numeric entry while drawing; returns an error message or empty. */
    String typed(String text) {
        if (drawing == null) {
            return "Pick a drawing tool first";
        }
        try {
            drawing.typed(text).ifPresent(this::commitDrawing);
            needsPaint = true;
            return "";
        } catch (IllegalArgumentException ex) {
            return ex.getMessage();
        }
    }

    boolean isDrawing() {
        return drawing != null;
    }

    private void moved(MouseEvent e) {
        if (drawing != null) {
            drawing.hover(view().toScene(e.getX(), e.getY()), snapper(), snapVertices());
            needsPaint = true;
        }
        updateCursor(e.getX(), e.getY());
    }

    private void updateCursor(double sx, double sy) {
        Vec2 p = view().toScene(sx, sy);
        // Read against the colour scale's limit: at a point of symmetry the exact sum is rounding noise.
        double bz = org.kinduct.scene.units.Units.withoutNoise(vm.bzAt(p.x(), p.y()),
                vm.rangeProperty().get().scaleFor(vm.rasterProperty().get()).limitT());
        String sense = bz > 0 ? " ⊙" : bz < 0 ? " ⊗" : "";
        String cursorText = "x " + org.kinduct.render.paint.Quantities.length(p.x()) + "   y "
                + org.kinduct.render.paint.Quantities.length(p.y()) + "   B_z "
                + org.kinduct.render.paint.Quantities.bz(bz) + sense;
        cursorSink.accept(cursorText);
    }

    private void scrolled(ScrollEvent e) {
        if (e.getDeltaY() == 0) {
            return;
        }
        double factor = Math.pow(ZOOM_PER_NOTCH, e.getDeltaY() / 40);
        vm.viewProperty().set(view().zoomedAt(e.getX(), e.getY(), factor));
        interacting();
        e.consume();
    }

    private void keyPressed(KeyEvent e) {
        switch (e.getCode()) {
            case SPACE -> spaceDown = true;
            case ESCAPE -> {
                if (drawing != null && drawing.isDrawing()) {
                    drawing.cancel();
                } else {
                    vm.toolProperty().set(ToolKind.SELECT);
                    vm.selection().clear();
                }
            }
            case ENTER -> {
                if (drawing != null) {
                    drawing.finish().ifPresent(this::commitDrawing);
                }
            }
            case DELETE, BACK_SPACE -> deleteSelection();
            case F -> zoomToFit();
            case K -> vm.playingProperty().set(!vm.playingProperty().get());
            case PERIOD -> vm.step(1);
            case COMMA -> vm.step(-1);
            case HOME -> vm.resetTime();
            default -> {
                return;
            }
        }
        needsPaint = true;
        e.consume();
    }

    void deleteSelection() {
        Set<String> ids = Set.copyOf(vm.selection());
        if (!ids.isEmpty()) {
            vm.apply("Delete " + ids.size() + " object(s)", s -> SceneEdits.delete(s, ids));
        }
    }

    void duplicateSelection() {
        Set<String> ids = Set.copyOf(vm.selection());
        if (!ids.isEmpty()) {
            Vec2 offset = new Vec2(20 / view().pxPerM(), -20 / view().pxPerM());
            vm.apply("Duplicate", s -> SceneEdits.duplicate(s, ids, offset));
        }
    }

    void rotateSelection(double angleRad) {
        Set<String> ids = Set.copyOf(vm.selection());
        if (ids.isEmpty()) {
            return;
        }
        // Turn what the user sees: at t > t0 bodies may have moved and turned since they were drawn.
        Placement seen = seen();
        Vec2 c = SceneBounds.ofObjects(vm.scene(), ids, seen).center();
        vm.apply("Rotate", s -> SceneEdits.rotateAsSeen(s, ids, seen, c, angleRad));
    }
}
