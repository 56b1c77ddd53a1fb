package org.kinduct.render.export;

import org.kinduct.render.paint.Surface;

/**
 * A smaller box of another surface, for drawing the painter's map inside a page. The caller
 * translates the page to the box's corner first; this only reports the box's size, so the
 * painter lays out its legend and scale bar for the box.
 */
final class Viewport implements Surface {

    private final Surface page;
    private final double width;
    private final double height;

    Viewport(Surface page, double width, double height) {
        this.page = page;
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
        page.save();
    }

    @Override
    public void restore() {
        page.restore();
    }

    @Override
    public void translate(double dx, double dy) {
        page.translate(dx, dy);
    }

    @Override
    public void rotate(double angleRad) {
        page.rotate(angleRad);
    }

    @Override
    public void clipRect(double x, double y, double w, double h) {
        page.clipRect(x, y, w, h);
    }

    @Override
    public void stroke(int argb) {
        page.stroke(argb);
    }

    @Override
    public void fill(int argb) {
        page.fill(argb);
    }

    @Override
    public void lineWidth(double px) {
        page.lineWidth(px);
    }

    @Override
    public void dash(double... px) {
        page.dash(px);
    }

    @Override
    public void beginPath() {
        page.beginPath();
    }

    @Override
    public void moveTo(double x, double y) {
        page.moveTo(x, y);
    }

    @Override
    public void lineTo(double x, double y) {
        page.lineTo(x, y);
    }

    @Override
    public void closePath() {
        page.closePath();
    }

    @Override
    public void strokePath() {
        page.strokePath();
    }

    @Override
    public void fillPath() {
        page.fillPath();
    }

    @Override
    public void fillRect(double x, double y, double w, double h) {
        page.fillRect(x, y, w, h);
    }

    @Override
    public void strokeRect(double x, double y, double w, double h) {
        page.strokeRect(x, y, w, h);
    }

    @Override
    public void fillOval(double cx, double cy, double r) {
        page.fillOval(cx, cy, r);
    }

    @Override
    public void strokeOval(double cx, double cy, double r) {
        page.strokeOval(cx, cy, r);
    }

    @Override
    public void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor) {
        page.text(text, x, y, sizePx, bold, anchor);
    }

    @Override
    public double textWidth(String text, double sizePx, boolean bold) {
        return page.textWidth(text, sizePx, bold);
    }

    @Override
    public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        page.image(argb, cols, rows, x, y, w, h);
    }
}
