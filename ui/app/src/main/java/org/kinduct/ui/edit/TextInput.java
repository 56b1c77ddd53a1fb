package org.kinduct.ui.edit;

import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/** Lengths typed while drawing ("12 mm", "0.3"); a bare number is metres. */
public final class TextInput {

    private TextInput() {
    }

    /** Metres, or {@link IllegalArgumentException} saying what was expected. */
    public static double length(String text) {
        return Units.parse(text, Dimension.LENGTH);
    }
}
