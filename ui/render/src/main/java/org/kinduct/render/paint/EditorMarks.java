package org.kinduct.render.paint;

import java.util.List;
import java.util.Set;
import org.kinduct.scene.Vec2;

/**
 * Editing aids drawn over the scene: selection, the shape being drawn, the snap target.
 *
 * @param preview points of the shape being drawn, scene metres (empty when not drawing)
 * @param previewClosed whether the preview is a closed outline
 * @param snap the snapped cursor position, or null
 * @param hint short text shown next to the cursor while drawing (length, angle), or empty
 */
public record EditorMarks(Set<String> selected, List<Vec2> preview, boolean previewClosed, Vec2 snap, String hint) {

    public EditorMarks {
        selected = Set.copyOf(selected);
        preview = List.copyOf(preview);
        hint = hint == null ? "" : hint;
    }

    public static EditorMarks none() {
        return new EditorMarks(Set.of(), List.of(), false, null, "");
    }
}
