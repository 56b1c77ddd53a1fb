package org.kinduct.scene.io;

import java.util.Objects;
import org.kinduct.scene.Scene;

/** A scene as read from a file, with the texts its values were given in (see {@link UnitTexts}). */
public record SceneWithUnits(Scene scene, UnitTexts units) {

    public SceneWithUnits {
        Objects.requireNonNull(scene);
        Objects.requireNonNull(units);
    }

    /** A scene that came from no file (a new one): its values are written as SI numbers. */
    public static SceneWithUnits of(Scene scene) {
        return new SceneWithUnits(scene, UnitTexts.none());
    }
}
