package org.kinduct.render.paint;

/**
 * The few drawing calls the {@link ScenePainter} needs, in screen pixels (y down). Adapters exist
 * for the live JavaFX canvas and may exist for raster or vector export; the painter knows nothing
 * else, so every surface shows the same picture.
 *
 * <p>Colours are packed {@code 0xAARRGGBB}.
 */
public interface Surface {

    /** Text anchor: which point of the text's box lies at the given position. */
    enum Anchor { CENTER, LEFT, RIGHT, TOP_LEFT, TOP_CENTER, BOTTOM_CENTER, TOP_RIGHT, BOTTOM_LEFT, BOTTOM_RIGHT }

    double width();

    double height();

    /** Pushes stroke, fill, line width, dash, clip and transform. */
    void save();

    void restore();

    void translate(double dx, double dy);

    /** Rotates later drawing by {@code angleRad} about the current origin (clockwise on screen for positive). */
    void rotate(double angleRad);

    void clipRect(double x, double y, double w, double h);

    void stroke(int argb);

    void fill(int argb);

    void lineWidth(double px);

    /** Dash pattern in pixels; none for a solid line. */
    void dash(double... px);

    void beginPath();

    void moveTo(double x, double y);

    void lineTo(double x, double y);

    void closePath();

    void strokePath();

    void fillPath();

    void fillRect(double x, double y, double w, double h);

    void strokeRect(double x, double y, double w, double h);

    void fillOval(double cx, double cy, double r);

    void strokeOval(double cx, double cy, double r);

    /** Draws {@code text} in the current fill colour. */
    void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor);

    /** Width of {@code text} at {@code sizePx}, pixels. */
    double textWidth(String text, double sizePx, boolean bold);

    /**
     * Draws a {@code cols × rows} raster of {@code 0xAARRGGBB} pixels (row 0 at the top) stretched
     * over the screen box, smoothing allowed. The array must not change afterwards: a surface may
     * keep what it learnt of it (the live view draws the same field backdrop frame after frame).
     */
    void image(int[] argb, int cols, int rows, double x, double y, double w, double h);
}
