package org.kinduct.render.paint;

import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.render.view.ViewTransform;

/**
 * Everything one picture shows.
 *
 * @param snapshot solved values at {@code tS}, or null when there are none (solver error); its
 *        free bodies are drawn where it has them, the other bodies by their prescribed motion
 * @param raster field map, or null while none has been computed
 * @param note small text for the top-right corner (frame time), or empty
 * @param scales what the value labels are read against so rounding noise prints as 0 (those of
 *        the whole run where there is one); null for those of the snapshot alone
 */
public record Picture(Scene scene, double tS, Snapshot snapshot, FieldRaster raster, ViewTransform view,
                    Set<Layer> layers, ColourRange range, EditorMarks marks, String note, ResultScales scales) {

    public Picture {
        layers = layers.isEmpty() ? EnumSet.noneOf(Layer.class) : EnumSet.copyOf(layers);
        marks = marks == null ? EditorMarks.none() : marks;
        note = note == null ? "" : note;
        if (scales == null) {
            scales = ResultScales.of(snapshot == null ? List.of() : List.of(snapshot));
        }
    }

    /** A picture whose value labels are read against its own snapshot. */
    public Picture(Scene scene, double tS, Snapshot snapshot, FieldRaster raster, ViewTransform view,
                 Set<Layer> layers, ColourRange range, EditorMarks marks, String note) {
        this(scene, tS, snapshot, raster, view, layers, range, marks, note, null);
    }

    /** Poses of the free bodies as the snapshot has them; empty without a snapshot. */
    public Map<String, Pose> freeBodies() {
        return snapshot == null ? Map.of() : snapshot.freeBodies();
    }

    public boolean shows(Layer layer) {
        return layers.contains(layer);
    }
}
