package org.kinduct.solver.sheet;

import java.util.Objects;
import org.kinduct.scene.Vec2;

/**
 * A point on the sheet's edge (outline or hole) where the potential is read; it draws no current.
 *
 * @param name unique among the electrodes of one solve
 * @param pointM where it touches the edge, metres
 */
public record Electrode(String name, Vec2 pointM) {

    public Electrode {
        Objects.requireNonNull(pointM, "electrode point");
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("an electrode needs a name, got '" + name + "'");
        }
    }
}
