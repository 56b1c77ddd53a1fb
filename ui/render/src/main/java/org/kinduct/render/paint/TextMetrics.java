package org.kinduct.render.paint;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.AffineTransform;
import java.io.IOException;
import java.io.InputStream;

/**
 * Font choice and text measurement shared by every surface (raster, SVG, PDF, the live view), so
 * all lay out text identically. The faces are DejaVu Sans and DejaVu Sans Bold shipped with
 * Kinduct (resources {@code org/kinduct/render/fonts}, Bitstream Vera licence, see
 * {@code LICENSE-DejaVu.txt} there): the same metrics on every machine whatever fonts it has, and
 * the files a PDF embeds. Uses AWT fonts, which work with {@code java.awt.headless=true}.
 */
public final class TextMetrics {

    /** The family name, as the SVG declares it. */
    public static final String FAMILY = "DejaVu Sans";
    private static final String REGULAR_FILE = "/org/kinduct/render/fonts/DejaVuSans.ttf";
    private static final String BOLD_FILE = "/org/kinduct/render/fonts/DejaVuSans-Bold.ttf";
    private static final Font REGULAR = load(REGULAR_FILE);
    private static final Font BOLD = load(BOLD_FILE);
    private static final FontRenderContext CONTEXT = new FontRenderContext(new AffineTransform(), true, true);

    private TextMetrics() {
    }

    public static Font font(double sizePx, boolean bold) {
        return (bold ? BOLD : REGULAR).deriveFont((float) sizePx);
    }

    /** The TrueType file of the regular or bold face, for surfaces that embed it. */
    public static InputStream fontFile(boolean bold) {
        return TextMetrics.class.getResourceAsStream(bold ? BOLD_FILE : REGULAR_FILE);
    }

    private static Font load(String resource) {
        try (InputStream in = TextMetrics.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("font " + resource + " is missing from this build");
            }
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException | FontFormatException e) {
            throw new IllegalStateException("font " + resource + " cannot be read: " + e.getMessage(), e);
        }
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
