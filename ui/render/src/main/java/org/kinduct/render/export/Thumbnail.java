package org.kinduct.render.export;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.EnumSet;
import java.util.Set;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Java2dSurface;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.ScenePainter;
import org.kinduct.render.view.ViewTransform;

/**
 * A small picture of a scene for the demo browser, drawn by the export path ({@link Java2dSurface}
 * and the same {@link ScenePainter}) at the middle of the scene's time window. JavaFX-free and
 * slow (solves the scene and maps its field): call it off the UI thread.
 */
public final class Thumbnail {

    /** Only what identifies a scene at a glance; labels and legends are unreadable at this size. */
    private static final Set<Layer> LAYERS = EnumSet.of(Layer.HEAT_MAP, Layer.SOURCES, Layer.CONDUCTORS,
            Layer.EDDY_CURRENTS, Layer.LENZ);
    /** Screen pixels per field sample: coarse, a thumbnail has few pixels to fill. */
    private static final int MAP_STEP_PX = 3;
    /** Painter units per device pixel: the painter's fixed-size marks need a page a few hundred units wide. */
    private static final double PAGE_PER_PX = 2.5;

    private Thumbnail() {
    }

    /** {@code scene} fitted into a {@code widthPx} × {@code heightPx} image. */
    public static BufferedImage render(Scene scene, int widthPx, int heightPx) {
        if (widthPx < 1 || heightPx < 1) {
            throw new IllegalArgumentException("thumbnail size must be positive, got " + widthPx + " × " + heightPx);
        }
        double t = (scene.time().t0S() + scene.time().t1S()) / 2;
        double pageW = widthPx * PAGE_PER_PX;
        double pageH = heightPx * PAGE_PER_PX;
        ViewChoice.Box box = ViewChoice.box(new ViewChoice.Fit(), scene, t);
        ViewTransform view = new ViewTransform(0, 0, 1, pageW, pageH).fitting(box.x0(), box.y0(), box.x1(), box.y1(), 0);
        SceneRun run = new SceneRun(scene);
        Snapshot snapshot = run.instant(t);
        FieldMapper mapper = new FieldMapper(Runnable::run, Runnable::run, r -> { }, e -> { });
        ViewTransform device = new ViewTransform(view.centerX(), view.centerY(), view.pxPerM() / PAGE_PER_PX,
                widthPx, heightPx);
        var raster = mapper.compute(new MapRequest(run, 0, t, device, MAP_STEP_PX));
        BufferedImage img = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, widthPx, heightPx);
            g.scale(1 / PAGE_PER_PX, 1 / PAGE_PER_PX);
            ScenePainter.draw(new Java2dSurface(g, pageW, pageH), new Picture(scene, t, snapshot, raster, view, LAYERS,
                    ColourRange.automatic(), null, ""));
        } finally {
            g.dispose();
        }
        return img;
    }
}
