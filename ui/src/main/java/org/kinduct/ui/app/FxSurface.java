package org.kinduct.ui.app;

import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;
import org.kinduct.ui.paint.Surface;

/** {@link Surface} on a JavaFX canvas. */
final class FxSurface implements Surface {

    private static final String FAMILY = "DejaVu Sans";

    private final GraphicsContext g;
    private final double width;
    private final double height;
    private final Text measure = new Text();

    FxSurface(GraphicsContext g, double width, double height) {
        this.g = g;
        this.width = width;
        this.height = height;
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
        g.save();
    }

    @Override
    public void restore() {
        g.restore();
    }

    @Override
    public void translate(double dx, double dy) {
        g.translate(dx, dy);
    }

    @Override
    public void rotate(double angleRad) {
        g.rotate(Math.toDegrees(angleRad));
    }

    @Override
    public void clipRect(double x, double y, double w, double h) {
        g.beginPath();
        g.rect(x, y, w, h);
        g.clip();
        g.beginPath();
    }

    @Override
    public void stroke(int argb) {
        g.setStroke(color(argb));
    }

    @Override
    public void fill(int argb) {
        g.setFill(color(argb));
    }

    @Override
    public void lineWidth(double px) {
        g.setLineWidth(px);
    }

    @Override
    public void dash(double... px) {
        g.setLineDashes(px.length == 0 ? null : px);
    }

    @Override
    public void beginPath() {
        g.beginPath();
    }

    @Override
    public void moveTo(double x, double y) {
        g.moveTo(x, y);
    }

    @Override
    public void lineTo(double x, double y) {
        g.lineTo(x, y);
    }

    @Override
    public void closePath() {
        g.closePath();
    }

    @Override
    public void strokePath() {
        g.stroke();
    }

    @Override
    public void fillPath() {
        g.fill();
    }

    @Override
    public void fillRect(double x, double y, double w, double h) {
        g.fillRect(x, y, w, h);
    }

    @Override
    public void strokeRect(double x, double y, double w, double h) {
        g.strokeRect(x, y, w, h);
    }

    @Override
    public void fillOval(double cx, double cy, double r) {
        g.fillOval(cx - r, cy - r, 2 * r, 2 * r);
    }

    @Override
    public void strokeOval(double cx, double cy, double r) {
        g.strokeOval(cx - r, cy - r, 2 * r, 2 * r);
    }

    @Override
    public void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor) {
        g.setFont(font(sizePx, bold));
        g.setTextAlign(switch (anchor) {
            case LEFT, TOP_LEFT, BOTTOM_LEFT -> TextAlignment.LEFT;
            case RIGHT, TOP_RIGHT, BOTTOM_RIGHT -> TextAlignment.RIGHT;
            default -> TextAlignment.CENTER;
        });
        g.setTextBaseline(switch (anchor) {
            case TOP_LEFT, TOP_CENTER, TOP_RIGHT -> VPos.TOP;
            case BOTTOM_LEFT, BOTTOM_CENTER, BOTTOM_RIGHT -> VPos.BOTTOM;
            default -> VPos.CENTER;
        });
        g.fillText(text, x, y);
    }

    @Override
    public double textWidth(String text, double sizePx, boolean bold) {
        measure.setFont(font(sizePx, bold));
        measure.setText(text);
        return measure.getLayoutBounds().getWidth();
    }

    @Override
    public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        // A fresh image per call: the canvas renders later and must not see the pixels change.
        WritableImage image = new WritableImage(cols, rows);
        image.getPixelWriter().setPixels(0, 0, cols, rows, PixelFormat.getIntArgbInstance(), argb, 0, cols);
        g.setImageSmoothing(true);
        g.drawImage(image, x, y, w, h);
    }

    private static Font font(double size, boolean bold) {
        return Font.font(FAMILY, bold ? FontWeight.BOLD : FontWeight.NORMAL, size);
    }

    private static Color color(int argb) {
        return Color.rgb((argb >> 16) & 0xFF, (argb >> 8) & 0xFF, argb & 0xFF, ((argb >>> 24) & 0xFF) / 255.0);
    }
}
