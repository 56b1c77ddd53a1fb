package org.kinduct.ui.app;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.IntBuffer;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.PixelBuffer;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;
import javafx.stage.Window;
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Java2dSurface;
import org.kinduct.render.paint.ScenePainter;

/**
 * Shows frames on a JavaFX canvas: the {@link ScenePainter} draws each frame with Java2D into a
 * pixel buffer that the canvas shows as one image. Why not the canvas's own drawing calls: the
 * JavaFX software pipeline spends tens of microseconds on every stroked shape (200 short strokes
 * took 12 ms a frame on the 2-core reference machine), while Java2D draws a whole frame of a
 * 20-object scene in a few milliseconds; and the screen then shows the very pixels a PNG export
 * gets. Two buffers take turns, so the one the render thread may still be reading is never drawn
 * into (a pulse waits for the previous frame's rendering before it hands over the next).
 */
final class CanvasFrames {

    private final Canvas canvas;
    private final Buffer[] buffers = new Buffer[2];
    private int next;

    CanvasFrames(Canvas canvas) {
        this.canvas = canvas;
    }

    /** One frame's pixels, seen both as a Java2D image and as a JavaFX image, without copies. */
    private record Buffer(int width, int height, BufferedImage image, PixelBuffer<IntBuffer> pixels,
                          WritableImage fx) {

        static Buffer of(int width, int height) {
            int[] data = new int[width * height];
            PixelBuffer<IntBuffer> pixels = new PixelBuffer<>(width, height, IntBuffer.wrap(data),
                    PixelFormat.getIntArgbPreInstance());
            return new Buffer(width, height, Java2dSurface.premultipliedOver(data, width, height), pixels,
                    new WritableImage(pixels));
        }
    }

    /** Draws {@code f} (field layers from {@code backdrop} when it fits) and puts it on the canvas. */
    void show(Picture f, FieldBackdrop backdrop) {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        if (w < 1 || h < 1) {
            return;
        }
        double scale = outputScale();
        Buffer b = buffer((int) Math.ceil(w * scale), (int) Math.ceil(h * scale));
        Graphics2D g = b.image().createGraphics();
        try {
            g.scale(scale, scale);
            ScenePainter.draw(new Java2dSurface(g, w, h), f, backdrop);
        } finally {
            g.dispose();
        }
        b.pixels().updateBuffer(p -> null);
        GraphicsContext gc = canvas.getGraphicsContext2D();
        // Clearing the whole canvas also drops the previous frame's commands from its buffer.
        gc.clearRect(0, 0, w, h);
        gc.setImageSmoothing(false);
        gc.drawImage(b.fx(), 0, 0, b.width() / scale, b.height() / scale);
    }

    private Buffer buffer(int width, int height) {
        Buffer b = buffers[next];
        if (b == null || b.width() != width || b.height() != height) {
            b = Buffer.of(width, height);
            buffers[next] = b;
        }
        next = 1 - next;
        return b;
    }

    /** Device pixels per canvas unit (2 on a doubled display), so text stays sharp there. */
    private double outputScale() {
        Window window = canvas.getScene() != null ? canvas.getScene().getWindow() : null;
        return window != null ? Math.max(1, window.getOutputScaleX()) : 1;
    }
}
