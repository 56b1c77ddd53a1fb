package org.kinduct.render.paint;

import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.AffineTransform;

/**
 * Font choice and text measurement shared by the raster and the vector surface, so both lay out
 * text identically. Uses AWT fonts, which work with {@code java.awt.headless=true}.
 */
public final class TextMetrics {

    /** The family the live canvas uses too; fontconfig falls back to a sans face when it is missing. */
    public static final String FAMILY = "DejaVu Sans";
    private static final FontRenderContext CONTEXT = new FontRenderContext(new AffineTransform(), true, true);

    private TextMetrics() {
    }

    public static Font font(double sizePx, boolean bold) {
        return new Font(FAMILY, bold ? Font.BOLD : Font.PLAIN, 1).deriveFont((float) sizePx);
    }

    public static double width(String text, double sizePx, boolean bold) {
        return text.isEmpty() ? 0 : font(sizePx, bold).getStringBounds(text, CONTEXT).getWidth();
    }

    /** Horizontal shift from the anchor point to the text's left end. */
    public static double left(String text, double sizePx, boolean bold, Surface.Anchor anchor) {
        return switch (anchor) {
            case LEFT, TOP_LEFT, BOTTOM_LEFT -> 0;
            case RIGHT, TOP_RIGHT, BOTTOM_RIGHT -> -width(text, sizePx, bold);
            default -> -width(text, sizePx, bold) / 2;
        };
    }

    /**
     * Vertical shift from the anchor point to the baseline: the box is ascent over descent, as
     * the JavaFX canvas centres text with {@code VPos.CENTER}.
     */
    public static double baseline(double sizePx, boolean bold, Surface.Anchor anchor) {
        LineMetrics m = font(sizePx, bold).getLineMetrics("Hg", CONTEXT);
        return switch (anchor) {
            case TOP_LEFT, TOP_CENTER, TOP_RIGHT -> m.getAscent();
            case BOTTOM_LEFT, BOTTOM_CENTER, BOTTOM_RIGHT -> -m.getDescent();
            default -> (m.getAscent() - m.getDescent()) / 2;
        };
    }
}
