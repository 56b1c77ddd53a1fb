package org.kinduct.render.paint;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.color.ColorSpace;
import java.awt.image.ColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.DataBufferInt;
import java.awt.image.DirectColorModel;
import java.awt.image.Raster;
import java.awt.image.WritableRaster;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * {@link Surface} on a Java2D {@link Graphics2D}, e.g. of a {@link BufferedImage} for PNG export.
 * Needs no display. Strokes use square caps and mitred joins like the JavaFX canvas, so the
 * export matches the screen.
 */
public final class Java2dSurface implements Surface {

    private static final float MITER_LIMIT = 10;
    private static volatile Opacity lastOpacity;
    private static final DirectColorModel PREMULTIPLIED = new DirectColorModel(ColorSpace.getInstance(ColorSpace.CS_sRGB),
            32, 0x00FF0000, 0x0000FF00, 0x000000FF, 0xFF000000, true, DataBuffer.TYPE_INT);

    private final Graphics2D g;
    private final double width;
    private final double height;
    private final Deque<Saved> saved = new ArrayDeque<>();
    private State state = new State(0xFF000000, 0xFF000000, 1, null);
    private Path2D.Double path = new Path2D.Double();

    /** Draws on {@code g} (whose transform may scale) in a {@code width × height} box of its user space. */
    public Java2dSurface(Graphics2D g, double width, double height) {
        this.g = g;
        this.width = width;
        this.height = height;
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    }

    /** Colours, line width and dash: what {@link #save()} keeps besides transform and clip. */
    private record State(int stroke, int fill, double lineWidth, float[] dash) {
    }

    private record Saved(State state, AffineTransform transform, Shape clip) {
    }

    @Override
    public double width() {
        return width;
    }

    @Override
    public double height() {
        return height;
    }

    @Override
    public void save() {
        saved.push(new Saved(state, g.getTransform(), g.getClip()));
    }

    @Override
    public void restore() {
        Saved s = saved.pop();
        state = s.state();
        g.setTransform(s.transform());
        g.setClip(s.clip());
    }

    @Override
    public void translate(double dx, double dy) {
        g.translate(dx, dy);
    }

    @Override
    public void rotate(double angleRad) {
        g.rotate(angleRad);
    }

    @Override
    public void clipRect(double x, double y, double w, double h) {
        g.clip(new Rectangle2D.Double(x, y, w, h));
        path = new Path2D.Double();
    }

    @Override
    public void stroke(int argb) {
        state = new State(argb, state.fill(), state.lineWidth(), state.dash());
    }

    @Override
    public void fill(int argb) {
        state = new State(state.stroke(), argb, state.lineWidth(), state.dash());
    }

    @Override
    public void lineWidth(double px) {
        state = new State(state.stroke(), state.fill(), px, state.dash());
    }

    @Override
    public void dash(double... px) {
        float[] d = null;
        if (px.length > 0) {
            d = new float[px.length];
            for (int i = 0; i < px.length; i++) {
                d[i] = (float) px[i];
            }
        }
        state = new State(state.stroke(), state.fill(), state.lineWidth(), d);
    }

    @Override
    public void beginPath() {
        path = new Path2D.Double();
    }

    @Override
    public void moveTo(double x, double y) {
        path.moveTo(x, y);
    }

    @Override
    public void lineTo(double x, double y) {
        if (path.getCurrentPoint() == null) {
            path.moveTo(x, y);
        } else {
            path.lineTo(x, y);
        }
    }

    @Override
    public void closePath() {
        if (path.getCurrentPoint() != null) {
            path.closePath();
        }
    }

    @Override
    public void strokePath() {
        draw(path);
    }

    @Override
    public void fillPath() {
        fill(path);
    }

    @Override
    public void fillRect(double x, double y, double w, double h) {
        fill(new Rectangle2D.Double(x, y, w, h));
    }

    @Override
    public void strokeRect(double x, double y, double w, double h) {
        draw(new Rectangle2D.Double(x, y, w, h));
    }

    @Override
    public void fillOval(double cx, double cy, double r) {
        fill(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    public void strokeOval(double cx, double cy, double r) {
        draw(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    public void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor) {
        g.setColor(color(state.fill()));
        g.setFont(TextMetrics.font(sizePx, bold));
        g.drawString(text, (float) (x + TextMetrics.left(text, sizePx, bold, anchor)),
                (float) (y + TextMetrics.baseline(sizePx, bold, anchor)));
    }

    @Override
    public double textWidth(String text, double sizePx, boolean bold) {
        return TextMetrics.width(text, sizePx, bold);
    }

    @Override
    public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        AffineTransform at = new AffineTransform();
        at.translate(x, y);
        at.scale(w / cols, h / rows);
        g.drawImage(wrap(argb, cols, rows), at, null);
    }

    /** An image over the caller's pixels, without copying them. */
    private static BufferedImage wrap(int[] argb, int cols, int rows) {
        // Opaque pixels are their own pre-multiplied form, which Java2D draws faster. The answer is
        // kept for the last array: the live view draws the same backdrop frame after frame.
        Opacity known = lastOpacity;
        if (known == null || known.pixels() != argb) {
            known = new Opacity(argb, opaque(argb));
            lastOpacity = known;
        }
        DirectColorModel model = known.opaque() ? PREMULTIPLIED : (DirectColorModel) ColorModel.getRGBdefault();
        return imageOver(argb, cols, rows, model);
    }

    /**
     * A Java2D image drawing straight into {@code pixels} (packed ARGB, pre-multiplied by alpha,
     * row by row): JavaFX's INT_ARGB_PRE layout, so one array can serve both.
     */
    public static BufferedImage premultipliedOver(int[] pixels, int cols, int rows) {
        return imageOver(pixels, cols, rows, PREMULTIPLIED);
    }

    private static BufferedImage imageOver(int[] pixels, int cols, int rows, DirectColorModel model) {
        WritableRaster raster = Raster.createPackedRaster(new DataBufferInt(pixels, pixels.length), cols, rows, cols,
                model.getMasks(), null);
        return new BufferedImage(model, raster, model.isAlphaPremultiplied(), null);
    }

    /** Whether every pixel of an array is opaque; arrays handed to {@link #image} never change. */
    private record Opacity(int[] pixels, boolean opaque) {
    }

    private static boolean opaque(int[] argb) {
        for (int p : argb) {
            if (p >>> 24 != 0xFF) {
                return false;
            }
        }
        return true;
    }

    private void draw(Shape shape) {
        g.setColor(color(state.stroke()));
        g.setStroke(new BasicStroke((float) state.lineWidth(), BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER,
                MITER_LIMIT, state.dash(), 0));
        g.draw(shape);
    }

    private void fill(Shape shape) {
        g.setColor(color(state.fill()));
        g.fill(shape);
    }

    private static Color color(int argb) {
        return new Color(argb, true);
    }
}
