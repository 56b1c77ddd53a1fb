package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.export.ExportInstant;
import org.kinduct.render.paint.Quantities;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The instants an export can show, as the export dialog offers them: the peak of any conductor,
 * the peak of each one, and the time shown in the editor (exactly, not as rounded for its label);
 * or, typed, whatever {@code kinduct export --at} takes: {@code peak}, {@code peak:ID} or a time.
 */
public final class ExportTimes {

    /** One offered instant and its words. */
    public record Choice(String label, ExportInstant instant) {
    }

    private ExportTimes() {
    }

    /** The choices for {@code scene} with the editor showing {@code shownS}, the overall peak first. */
    public static List<Choice> of(Scene scene, double shownS) {
        List<Choice> out = new ArrayList<>();
        out.add(new Choice("peak (largest EMF of any conductor)", ExportInstant.peak()));
        for (Conductor c : scene.conductors()) {
            out.add(new Choice("peak of " + c.id(), new ExportInstant.Peak(c.id())));
        }
        out.add(new Choice("the time shown, " + Quantities.time(shownS), new ExportInstant.At(shownS)));
        return out;
    }

    /**
     * The instant {@code text} names: one of {@code choices} by its words, else read as
     * {@code --at} reads it.
     *
     * @throws IllegalArgumentException naming what was expected
     */
    public static ExportInstant parse(String text, List<Choice> choices) {
        String t = text == null ? "" : text.strip();
        for (Choice c : choices) {
            if (c.label().equals(t)) {
                return c.instant();
            }
        }
        return ExportInstant.parse(t, s -> Units.parse(s, Dimension.TIME));
    }
}
