package org.kinduct.render.export;

import java.time.LocalDate;
import java.util.EnumSet;
import java.util.Set;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.Layer;
import org.kinduct.scene.Checks;

/**
 * How to draw an annotated snapshot.
 *
 * @param instant the instant shown: a time, or the peak of the EMF
 * @param widthPx width of the PNG in pixels (the SVG's nominal width)
 * @param dpi resolution written into the PNG, dots per inch
 * @param layers what the map shows
 * @param date date printed in the title block
 * @param version program version printed in the title block
 */
public record SnapshotOptions(ExportInstant instant, int widthPx, int dpi, ViewChoice view, Set<Layer> layers,
                              ColourRange range, LocalDate date, String version) {

    /** Default width: 16 cm at about 280 dpi. */
    public static final int DEFAULT_WIDTH_PX = 1800;
    public static final int DEFAULT_DPI = 300;
    public static final int MIN_WIDTH_PX = 300;
    public static final int MAX_WIDTH_PX = 12_000;
    public static final int MIN_DPI = 30;
    public static final int MAX_DPI = 2400;

    public SnapshotOptions {
        Checks.nonNull(instant, "instant");
        if (widthPx < MIN_WIDTH_PX || widthPx > MAX_WIDTH_PX) {
            throw new IllegalArgumentException("width must be " + MIN_WIDTH_PX + " to " + MAX_WIDTH_PX
                    + " pixels, got " + widthPx);
        }
        if (dpi < MIN_DPI || dpi > MAX_DPI) {
            throw new IllegalArgumentException("resolution must be " + MIN_DPI + " to " + MAX_DPI + " dpi, got " + dpi);
        }
        if (view == null || range == null || date == null || version == null) {
            throw new IllegalArgumentException("view, colour range, date and version are required");
        }
        layers = layers.isEmpty() ? EnumSet.noneOf(Layer.class) : EnumSet.copyOf(layers);
    }

    /**
     * Every layer but the ⊙/⊗ symbol grid and the |J| colours (which hide the field map under plates
     * and channels; their streamlines show the currents), and an automatic colour range.
     */
    public static SnapshotOptions standard(ExportInstant instant, int widthPx, int dpi, ViewChoice view,
                                           LocalDate date, String version) {
        return new SnapshotOptions(instant, widthPx, dpi, view,
                EnumSet.complementOf(EnumSet.of(Layer.SYMBOLS, Layer.CURRENT_DENSITY)), ColourRange.automatic(), date,
                version);
    }

    /** These options with {@code layer} shown too. */
    public SnapshotOptions withLayer(Layer layer) {
        EnumSet<Layer> more = layers.isEmpty() ? EnumSet.noneOf(Layer.class) : EnumSet.copyOf(layers);
        more.add(layer);
        return new SnapshotOptions(instant, widthPx, dpi, view, more, range, date, version);
    }

    /** {@link #standard(ExportInstant, int, int, ViewChoice, LocalDate, String)} at a given time. */
    public static SnapshotOptions standard(double tS, int widthPx, int dpi, ViewChoice view, LocalDate date,
                                           String version) {
        return standard(new ExportInstant.At(tS), widthPx, dpi, view, date, version);
    }
}
