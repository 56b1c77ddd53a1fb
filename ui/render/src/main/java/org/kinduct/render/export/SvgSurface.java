package org.kinduct.render.export;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.Base64;
import java.util.Deque;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.paint.TextMetrics;

/**
 * {@link Surface} that writes an SVG 1.1 document: real vector paths and text; only rasters (the
 * heat map, the legend's colour bar) become embedded PNG {@code <image>}s as data URIs.
 *
 * <p>Our own small writer rather than Batik's {@code SVGGraphics2D}: the {@code Surface} has
 * twenty calls that map one-to-one onto SVG elements, while Batik would add a dozen jars to the
 * headless command and write text as generic Java2D output. Transforms and clips nest as
 * {@code <g>} elements that {@link #restore()} closes, so the document mirrors the drawing calls.
 * Text is measured with {@link TextMetrics}, like the PNG, and the font is named on the root.
 */
final class SvgSurface implements Surface {

    private final double width;
    private final double height;
    private final StringBuilder body = new StringBuilder(1 << 16);
    private final StringBuilder path = new StringBuilder();
    private final Deque<State> saved = new ArrayDeque<>();
    private State state = new State(0xFF000000, 0xFF000000, 1, "", 0);
    private int clips;

    /** Colours, line width, dash, and how many {@code <g>} were opened since the last save. */
    private record State(int stroke, int fill, double lineWidth, String dash, int openGroups) {
        State withGroups(int n) {
            return new State(stroke, fill, lineWidth, dash, n);
        }
    }

    /** A drawing of {@code width × height} user units (the painter's pixels). */
    SvgSurface(double width, double height) {
        this.width = width;
        this.height = height;
    }

    /** The finished document, {@code outWidthPx} wide on screen; closes what is still open. */
    String document(String title, double outWidthPx) {
        while (!saved.isEmpty()) {
            restore();
        }
        closeGroups();
        double outHeight = outWidthPx * height / width;
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" xmlns:xlink=\"http://www.w3.org/1999/xlink\""
                + " version=\"1.1\" width=\"" + num(outWidthPx) + "\" height=\"" + num(outHeight) + "\""
                + " viewBox=\"0 0 " + num(width) + " " + num(height) + "\""
                + " font-family=\"" + TextMetrics.FAMILY + ", sans-serif\" stroke-linecap=\"square\""
                + " stroke-miterlimit=\"10\">\n<title>" + escape(title) + "</title>\n" + body + "</svg>\n";
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
        saved.push(state);
        state = state.withGroups(0);
    }

    @Override
    public void restore() {
        closeGroups();
        state = saved.pop();
    }

    private void closeGroups() {
        for (int i = 0; i < state.openGroups(); i++) {
            body.append("</g>\n");
        }
        state = state.withGroups(0);
    }

    private void openGroup(String attributes) {
        body.append("<g ").append(attributes).append(">\n");
        state = state.withGroups(state.openGroups() + 1);
    }

    @Override
    public void translate(double dx, double dy) {
        openGroup("transform=\"translate(" + num(dx) + "," + num(dy) + ")\"");
    }

    @Override
    public void rotate(double angleRad) {
        openGroup("transform=\"rotate(" + num(Math.toDegrees(angleRad)) + ")\"");
    }

    @Override
    public void clipRect(double x, double y, double w, double h) {
        String id = "clip" + ++clips;
        body.append("<clipPath id=\"").append(id).append("\"><rect x=\"").append(num(x)).append("\" y=\"")
                .append(num(y)).append("\" width=\"").append(num(w)).append("\" height=\"").append(num(h))
                .append("\"/></clipPath>\n");
        openGroup("clip-path=\"url(#" + id + ")\"");
        path.setLength(0);
    }

    @Override
    public void stroke(int argb) {
        state = new State(argb, state.fill(), state.lineWidth(), state.dash(), state.openGroups());
    }

    @Override
    public void fill(int argb) {
        state = new State(state.stroke(), argb, state.lineWidth(), state.dash(), state.openGroups());
    }

    @Override
    public void lineWidth(double px) {
        state = new State(state.stroke(), state.fill(), px, state.dash(), state.openGroups());
    }

    @Override
    public void dash(double... px) {
        StringBuilder d = new StringBuilder();
        for (double v : px) {
            d.append(d.length() == 0 ? "" : ",").append(num(v));
        }
        state = new State(state.stroke(), state.fill(), state.lineWidth(), d.toString(), state.openGroups());
    }

    @Override
    public void beginPath() {
        path.setLength(0);
    }

    @Override
    public void moveTo(double x, double y) {
        path.append('M').append(num(x)).append(' ').append(num(y));
    }

    @Override
    public void lineTo(double x, double y) {
        path.append(path.length() == 0 ? 'M' : 'L').append(num(x)).append(' ').append(num(y));
    }

    @Override
    public void closePath() {
        if (path.length() > 0) {
            path.append('Z');
        }
    }

    @Override
    public void strokePath() {
        if (path.length() > 0) {
            body.append("<path d=\"").append(path).append("\" fill=\"none\"").append(strokeAttributes()).append("/>\n");
        }
    }

    @Override
    public void fillPath() {
        if (path.length() > 0) {
            body.append("<path d=\"").append(path).append('"').append(paint("fill", state.fill())).append("/>\n");
        }
    }

    @Override
    public void fillRect(double x, double y, double w, double h) {
        rect(x, y, w, h).append(paint("fill", state.fill())).append("/>\n");
    }

    @Override
    public void strokeRect(double x, double y, double w, double h) {
        rect(x, y, w, h).append(" fill=\"none\"").append(strokeAttributes()).append("/>\n");
    }

    private StringBuilder rect(double x, double y, double w, double h) {
        return body.append("<rect x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" width=\"")
                .append(num(w)).append("\" height=\"").append(num(h)).append('"');
    }

    @Override
    public void fillOval(double cx, double cy, double r) {
        circle(cx, cy, r).append(paint("fill", state.fill())).append("/>\n");
    }

    @Override
    public void strokeOval(double cx, double cy, double r) {
        circle(cx, cy, r).append(" fill=\"none\"").append(strokeAttributes()).append("/>\n");
    }

    private StringBuilder circle(double cx, double cy, double r) {
        return body.append("<circle cx=\"").append(num(cx)).append("\" cy=\"").append(num(cy)).append("\" r=\"")
                .append(num(r)).append('"');
    }

    @Override
    public void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor) {
        String align = switch (anchor) {
            case LEFT, TOP_LEFT, BOTTOM_LEFT -> "";
            case RIGHT, TOP_RIGHT, BOTTOM_RIGHT -> " text-anchor=\"end\"";
            default -> " text-anchor=\"middle\"";
        };
        body.append("<text x=\"").append(num(x)).append("\" y=\"")
                .append(num(y + TextMetrics.baseline(sizePx, bold, anchor))).append("\" font-size=\"")
                .append(num(sizePx)).append('"').append(bold ? " font-weight=\"bold\"" : "").append(align)
                .append(paint("fill", state.fill())).append('>').append(escape(text)).append("</text>\n");
    }

    @Override
    public double textWidth(String text, double sizePx, boolean bold) {
        return TextMetrics.width(text, sizePx, bold);
    }

    @Override
    public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        BufferedImage img = new BufferedImage(cols, rows, BufferedImage.TYPE_INT_ARGB);
        img.setRGB(0, 0, cols, rows, argb, 0, cols);
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", png);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot encode an embedded image", e);
        }
        body.append("<image x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" width=\"")
                .append(num(w)).append("\" height=\"").append(num(h))
                .append("\" preserveAspectRatio=\"none\" xlink:href=\"data:image/png;base64,")
                .append(Base64.getEncoder().encodeToString(png.toByteArray())).append("\"/>\n");
    }

    private String strokeAttributes() {
        String s = paint("stroke", state.stroke()) + " stroke-width=\"" + num(state.lineWidth()) + '"';
        return state.dash().isEmpty() ? s : s + " stroke-dasharray=\"" + state.dash() + '"';
    }

    /** {@code fill="#rrggbb"} (or stroke) with an opacity attribute when not opaque. */
    private static String paint(String what, int argb) {
        String s = String.format(Locale.ROOT, " %s=\"#%06x\"", what, argb & 0xFFFFFF);
        int alpha = argb >>> 24;
        return alpha == 255 ? s : s + " " + what + "-opacity=\"" + num(alpha / 255.0) + '"';
    }

    /** Two decimals are a hundredth of a painter pixel: finer than any output resolution. */
    static String num(double v) {
        long hundredths = Math.round(v * 100);
        if (hundredths % 100 == 0) {
            return Long.toString(hundredths / 100);
        }
        return String.format(Locale.ROOT, "%.2f", hundredths / 100.0).replaceAll("0+$", "");
    }

    /** XML text: markup characters escaped, characters XML 1.0 forbids dropped. */
    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                default -> {
                    if (c >= 0x20 || c == '\t' || c == '\n') {
                        out.append(c);
                    }
                }
            }
        }
        return out.toString();
    }
}
