package org.kinduct.ui.app;

import java.util.Set;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.function.BiConsumer;
import org.kinduct.render.field.LatestOnly;
import org.kinduct.render.paint.ColourScale;
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;

/**
 * Renders {@link FieldBackdrop}s on a thread of its own, newest request only, so the UI thread
 * only copies a finished image per frame.
 */
final class BackdropWorker {

    private static final Executor THREAD = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "kinduct-backdrop");
        t.setDaemon(true);
        return t;
    });

    private final LatestOnly jobs = new LatestOnly(THREAD);
    private final Executor deliverOn;
    private final BiConsumer<FieldRaster, FieldBackdrop> deliver;

    /**
     * @param deliver receives each map and its backdrop through {@code deliverOn}, the backdrop null
     *        when rendering failed (the painter then draws the field layers itself and meets the
     *        same error where it is shown)
     */
    BackdropWorker(Executor deliverOn, BiConsumer<FieldRaster, FieldBackdrop> deliver) {
        this.deliverOn = deliverOn;
        this.deliver = deliver;
    }

    /** Asks for the backdrop of {@code raster} in {@code view}; replaces any request still waiting. */
    void request(FieldRaster raster, ViewTransform view, ColourScale scale, Set<Layer> layers) {
        Set<Layer> shown = Set.copyOf(layers);
        jobs.submit(() -> {
            FieldBackdrop b;
            try {
                b = FieldBackdrop.render(raster, view, scale, shown);
            } catch (RuntimeException e) {
                b = null;
            }
            FieldBackdrop done = b;
            deliverOn.execute(() -> deliver.accept(raster, done));
        });
    }
}
