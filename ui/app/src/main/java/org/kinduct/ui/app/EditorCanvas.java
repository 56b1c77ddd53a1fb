package org.kinduct.ui.app;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.DoubleConsumer;
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
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Quantities;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Units;
import org.kinduct.ui.edit.CanvasGestures;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.FieldMaps;
import org.kinduct.ui.edit.ToolKind;

/**
 * The drawing area: hands mouse and keys to {@link CanvasGestures}, paints its frames through
 * {@link CanvasFrames}, shows the cursor's position and B_z, and drives playback. Repaints at
 * most once per pulse, only when something changed.
 */
final class EditorCanvas extends Pane {

    private static final Duration IDLE_REFINE = Duration.millis(250);
    private static final double FRAME_TIME_SMOOTHING = 0.1;

    private final EditorViewModel vm;
    private final CanvasGestures gestures;
    private final Consumer<String> cursorSink;
    private final Canvas canvas = new Canvas();
    private final PauseTransition refine = new PauseTransition(IDLE_REFINE);
    private final CanvasFrames frames = new CanvasFrames(canvas);
    private final BackdropWorker backdrops;
    private FieldBackdrop backdrop;
    private boolean needsPaint = true;
    private boolean showFrameTime;
    private double frameMs;
    private double lastFrameMs;
    private DoubleConsumer paintTimes = ms -> { };
    private long lastNanos;
    /** Where the cursor was last seen over the canvas, pixels; NaN before. */
    private double cursorX = Double.NaN;
    private double cursorY = Double.NaN;

    EditorCanvas(EditorViewModel vm, Consumer<String> cursorSink) {
        this.vm = vm;
        this.cursorSink = cursorSink;
        this.gestures = new CanvasGestures(vm, this::interacting);
        getChildren().add(canvas);
        setFocusTraversable(true);
        setMinSize(200, 150);
        canvas.widthProperty().bind(widthProperty());
        canvas.heightProperty().bind(heightProperty());
        widthProperty().addListener(o -> resizeView());
        heightProperty().addListener(o -> resizeView());
        for (Observable o : new Observable[] {vm.document().sceneProperty(), vm.results().snapshotProperty(),
                vm.maps().rasterProperty(), vm.view().viewProperty(), vm.view().layers(), vm.document().selection(),
                vm.view().rangeProperty(), vm.dragged().solvedProperty()}) {
            o.addListener(x -> needsPaint = true);
        }
        backdrops = new BackdropWorker(Platform::runLater, (raster, b) -> {
            // Colours of a scene no longer shown (another was opened meanwhile) never reach the view.
            FieldRaster shown = vm.maps().raster();
            if (shown != null && shown.revision() == raster.revision()) {
                backdrop = b;
                needsPaint = true;
            }
            vm.maps().mapShown(raster);
        });
        for (Observable o : new Observable[] {vm.maps().rasterProperty(), vm.view().viewProperty(), vm.view().layers(),
                vm.view().rangeProperty()}) {
            o.addListener(x -> requestBackdrop());
        }
        // The readout follows the field of the instant shown and the view, also while the mouse
        // rests; change listeners, since the readout need not read the value every time.
        vm.results().shownFieldProperty().addListener((o, was, now) -> refreshCursor());
        vm.view().viewProperty().addListener((o, was, now) -> refreshCursor());
        vm.view().toolProperty().addListener((obs, old, t) -> {
            setCursor(t == ToolKind.SELECT ? Cursor.DEFAULT : Cursor.CROSSHAIR);
            needsPaint = true;
        });
        refine.setOnFinished(e -> vm.maps().request(FieldMaps.Quality.FINE));
        addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            requestFocus();
            gestures.pressed(e.getX(), e.getY(), button(e.getButton()), e.isShiftDown());
            needsPaint = true;
        });
        addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            gestures.dragged(e.getX(), e.getY());
            showCursor(e.getX(), e.getY());
            needsPaint = true;
        });
        addEventHandler(MouseEvent.MOUSE_RELEASED, e -> {
            gestures.released();
            needsPaint = true;
        });
        addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            gestures.clicked(e.getX(), e.getY(), button(e.getButton()), e.getClickCount());
            needsPaint = true;
        });
        addEventHandler(MouseEvent.MOUSE_MOVED, e -> {
            gestures.moved(e.getX(), e.getY());
            showCursor(e.getX(), e.getY());
            // Only a drawing shows the cursor in the picture (its snapped point and rubber line).
            needsPaint |= gestures.isDrawing();
        });
        addEventHandler(ScrollEvent.SCROLL, e -> {
            if (gestures.scrolled(e.getX(), e.getY(), e.getDeltaY())) {
                e.consume();
            }
        });
        addEventHandler(KeyEvent.KEY_PRESSED, e -> key(e.getCode()).ifPresent(k -> {
            gestures.keyPressed(k);
            needsPaint = true;
            e.consume();
        }));
        addEventHandler(KeyEvent.KEY_RELEASED, e -> key(e.getCode()).ifPresent(gestures::keyReleased));
        new AnimationTimer() {
            @Override
            public void handle(long now) {
                tick(now);
            }
        }.start();
    }

    private static CanvasGestures.Button button(MouseButton b) {
        return switch (b) {
            case PRIMARY -> CanvasGestures.Button.PRIMARY;
            case MIDDLE -> CanvasGestures.Button.MIDDLE;
            default -> CanvasGestures.Button.OTHER;
        };
    }

    private static Optional<CanvasGestures.Key> key(KeyCode code) {
        return Optional.ofNullable(switch (code) {
            case SPACE -> CanvasGestures.Key.SPACE;
            case ESCAPE -> CanvasGestures.Key.ESCAPE;
            case ENTER -> CanvasGestures.Key.ENTER;
            case DELETE, BACK_SPACE -> CanvasGestures.Key.DELETE;
            case F -> CanvasGestures.Key.F;
            case K -> CanvasGestures.Key.K;
            case PERIOD -> CanvasGestures.Key.PERIOD;
            case COMMA -> CanvasGestures.Key.COMMA;
            case HOME -> CanvasGestures.Key.HOME;
            default -> null;
        });
    }

    CanvasGestures gestures() {
        return gestures;
    }

    private void tick(long now) {
        if (lastNanos != 0 && vm.clock().isPlaying()) {
            vm.clock().advance((now - lastNanos) * 1e-9);
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
        FieldRaster raster = vm.maps().raster();
        if (raster == null) {
            backdrop = null;
            return;
        }
        ViewTransform v = vm.view().view();
        if (v.widthPx() >= 1 && v.heightPx() >= 1) {
            backdrops.request(raster, v, vm.view().rangeProperty().get().scaleFor(raster),
                    org.kinduct.render.paint.FieldLayers.applicable(vm.view().layers(), vm.scene()));
        }
    }

    /** Paints now; returns the time the painter took, milliseconds. */
    double paint() {
        long t0 = System.nanoTime();
        String note = showFrameTime
                ? String.format(Locale.ROOT, "paint: last %.1f ms, average %.1f ms", lastFrameMs, frameMs) : "";
        Picture frame = gestures.frame(note);
        frames.show(frame, backdrop);
        double ms = (System.nanoTime() - t0) * 1e-6;
        lastFrameMs = ms;
        frameMs = frameMs == 0 ? ms : frameMs + FRAME_TIME_SMOOTHING * (ms - frameMs);
        paintTimes.accept(ms);
        return ms;
    }

    /** Receives the painter's time of every frame from now on (for the frame-time probe). */
    void onPainted(DoubleConsumer sink) {
        paintTimes = sink;
    }

    void toggleFrameTime() {
        showFrameTime = !showFrameTime;
        needsPaint = true;
    }

    private void resizeView() {
        vm.view().viewProperty().set(vm.view().view().resized(getWidth(), getHeight()));
        interacting();
    }

    /** The view is changing: coarse maps now, a fine one once things settle. */
    private void interacting() {
        vm.maps().request(FieldMaps.Quality.COARSE);
        refine.playFromStart();
    }

    private void refreshCursor() {
        if (!Double.isNaN(cursorX)) {
            showCursor(cursorX, cursorY);
        }
    }

    /** Position and B_z under the cursor; B_z is the field delivered with the snapshot shown. */
    private void showCursor(double sx, double sy) {
        cursorX = sx;
        cursorY = sy;
        Vec2 p = vm.view().view().toScene(sx, sy);
        // Read against the colour scale's limit: at a point of symmetry the exact sum is rounding noise.
        double bz = Units.withoutNoise(vm.results().bzAt(p.x(), p.y()),
                vm.view().rangeProperty().get().scaleFor(vm.maps().raster()).limitT());
        String sense = bz > 0 ? " ⊙" : bz < 0 ? " ⊗" : "";
        cursorSink.accept("x " + Quantities.length(p.x()) + "   y " + Quantities.length(p.y()) + "   B_z "
                + Quantities.bz(bz) + sense);
    }
}
