package org.kinduct.ui.edit;

import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.function.LongSupplier;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.solver.dynamics.SimulationCancelledException;

/**
 * The field maps behind the view: B_z of the current revision's run over the view, computed off
 * the UI thread, newest request only. While playing, coarse maps at most every
 * {@value #PLAYBACK_MAP_INTERVAL_S} s of wall-clock time, each for the instant playback will
 * have reached when it is on screen (the delay from asking to showing is measured and smoothed).
 */
public final class FieldMaps {

    /** How finely to sample a map, screen pixels per sample. */
    public enum Quality {
        COARSE(8), MEDIUM(4), FINE(2);

        final int stepPx;

        Quality(int stepPx) {
            this.stepPx = stepPx;
        }
    }

    /**
     * While playing, a coarse map at most this often (seconds of wall-clock time): maps share the
     * two cores with painting, and a map that trails the sources by a few frames is fine to look at.
     */
    static final double PLAYBACK_MAP_INTERVAL_S = 0.05;
    private static final double LATENCY_SMOOTHING = 0.3;
    /** A map that took longer than this (a stall) is not taken as the usual delay. */
    private static final double MAX_MAP_LATENCY_S = 0.5;

    private final SceneResults results;
    private final PlaybackClock clock;
    private final ViewSettings view;
    private final LongSupplier clockNs;
    private final FieldMapper mapper;
    private final ReadOnlyObjectWrapper<FieldRaster> raster = new ReadOnlyObjectWrapper<>();
    private double sincePlaybackMapS = Double.POSITIVE_INFINITY;
    /** Wall-clock seconds from asking for a playback map to seeing it, smoothed; a first guess until measured. */
    private double mapLatencyS = 0.1;
    private double leadMapT = Double.NaN;
    private long leadMapAskedNs;

    FieldMaps(SceneResults results, PlaybackClock clock, ViewSettings view, Executor work, Executor ui,
              LongSupplier clockNs, Consumer<String> say) {
        this.results = results;
        this.clock = clock;
        this.view = view;
        this.clockNs = clockNs;
        // A stopped run only ever belongs to an outdated revision: nothing to report.
        this.mapper = new FieldMapper(work, ui, this::accept, e -> {
            if (!(e instanceof SimulationCancelledException)) {
                say.accept("Field map failed: " + e.getMessage());
            }
        });
    }

    /** Asks for a map of the current view at the current time. */
    public void request(Quality quality) {
        request(quality, clock.time());
    }

    private void request(Quality quality, double tS) {
        ViewTransform v = view.view();
        if (v.widthPx() >= 1 && v.heightPx() >= 1 && view.showsField()) {
            mapper.request(new MapRequest(results.run(), results.revision(), tS, v, quality.stepPx));
        }
    }

    /** A playback frame of {@code realSeconds}: asks for a coarse map ahead of playback when one is due. */
    void played(double realSeconds) {
        sincePlaybackMapS += realSeconds;
        if (sincePlaybackMapS >= PLAYBACK_MAP_INTERVAL_S) {
            sincePlaybackMapS = 0;
            // Ask for the instant playback will have reached when the map is on screen, so moving
            // sources and their colours stay together instead of the colours trailing behind.
            double lead = (mapLatencyS + PLAYBACK_MAP_INTERVAL_S / 2) * clock.speed();
            leadMapT = clock.wrapped(clock.time() + lead);
            leadMapAskedNs = clockNs.getAsLong();
            request(Quality.COARSE, leadMapT);
        }
    }

    /**
     * The view shows the map made for {@code r}: if it is the latest map asked for ahead of
     * playback, the wall-clock time it took from asking to showing refines how far ahead to ask.
     */
    public void mapShown(FieldRaster r) {
        if (r.tS() == leadMapT && r.revision() == results.revision()) {
            double took = (clockNs.getAsLong() - leadMapAskedNs) * 1e-9;
            mapLatencyS += LATENCY_SMOOTHING * (Math.min(took, MAX_MAP_LATENCY_S) - mapLatencyS);
            leadMapT = Double.NaN;
        }
    }

    /** How far ahead of playback, in wall-clock seconds, maps are asked for (before the half interval). */
    double mapLatencyS() {
        return mapLatencyS;
    }

    /** Shows no map until the next scene's first arrives (another scene replaces this one). */
    void forget() {
        raster.set(null);
    }

    /** Takes a finished map unless the scene changed since it was asked for. */
    void accept(FieldRaster r) {
        if (r.revision() == results.revision()) {
            raster.set(r);
        }
    }

    public ReadOnlyObjectProperty<FieldRaster> rasterProperty() {
        return raster.getReadOnlyProperty();
    }

    public FieldRaster raster() {
        return raster.get();
    }
}
