package org.kinduct.scene.io;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The texts with units a scene file gave its values in ("10 mm", "0.5 G"), by JSON path
 * ({@code sources[2].standoff}, {@code conductors[0].vertices[1][0]}), so that saving the scene
 * writes them back and hand-edited files stay readable. Kept beside the scene, not in it: the
 * scene holds SI values only.
 *
 * <p>Paths count list items by position, as the reader reports problems; a deleted object shifts
 * the paths of those after it, which only means an unchanged value there is written in the unit
 * of the text that was at its place (exactly, or as an SI number).
 */
public final class UnitTexts {

    /** A value's text as given, and the kind of quantity it was read as. */
    record Given(String text, Dimension dimension) {
    }

    private static final UnitTexts NONE = new UnitTexts(Map.of());

    private final Map<String, Given> byPath;

    private UnitTexts(Map<String, Given> byPath) {
        this.byPath = Map.copyOf(byPath);
    }

    /** No texts: every value is written as an SI number. */
    public static UnitTexts none() {
        return NONE;
    }

    static UnitTexts of(Map<String, Given> byPath) {
        return byPath.isEmpty() ? NONE : new UnitTexts(new LinkedHashMap<>(byPath));
    }

    /**
     * What to write for the value {@code si} at {@code path}: the text given there if it still
     * reads as exactly {@code si}; else {@code si} exactly in the unit given there (an edited
     * value); empty where no text was given, or it had no unit, or no text in its unit is exact
     * (then the SI number is written).
     */
    Optional<String> textFor(String path, double si) {
        Given g = byPath.get(path);
        if (g == null) {
            return Optional.empty();
        }
        if (Double.compare(Units.parse(g.text(), g.dimension()), si) == 0) {
            return Optional.of(g.text());
        }
        String unit = Units.unitOf(g.text());
        return unit.isEmpty() ? Optional.empty() : Units.exactly(si, g.dimension(), unit);
    }

    /** The text given at {@code path}, if any. */
    public Optional<String> text(String path) {
        return Optional.ofNullable(byPath.get(path)).map(Given::text);
    }

    /** The paths that were given with a text. */
    public java.util.Set<String> paths() {
        return byPath.keySet();
    }
}
