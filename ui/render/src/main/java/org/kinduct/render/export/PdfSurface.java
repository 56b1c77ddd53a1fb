package org.kinduct.render.export;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.image.LosslessFactory;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState;
import org.apache.pdfbox.util.Matrix;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.paint.TextMetrics;

/**
 * {@link Surface} that writes one PDF page with Apache PDFBox: vector paths, text in the embedded
 * (subset) DejaVu faces that {@link TextMetrics} measures with, so the layout is the PNG's and the
 * SVG's; rasters (the heat map, the legend's colour bar) become lossless images.
 *
 * <p>One drawing unit is one point. The page is flipped once (y down, as the painter draws); text
 * and images are flipped back where they are placed. Paths are kept until painted because the
 * painter fills and then strokes one path, while a PDF path is consumed by its first painting.
 */
final class PdfSurface implements Surface {

    /** A Bézier quarter circle's control distance, 4(√2 − 1)/3 (common practice). */
    private static final double KAPPA = 0.5522847498307936;

    private final PDDocument document;
    private final PDPageContentStream out;
    private final double width;
    private final double height;
    private final PDFont regular;
    private final PDFont bold;
    private final Map<Integer, PDExtendedGraphicsState> alphas = new HashMap<>();
    private final List<double[]> path = new ArrayList<>();
    private final List<int[]> savedColours = new ArrayList<>();
    private int stroke = 0xFF000000;
    private int fill = 0xFF000000;

    /** A page of {@code width × height} points, titled {@code title} in the document's information. */
    PdfSurface(double width, double height, String title) {
        this.width = width;
        this.height = height;
        document = new PDDocument();
        try {
            PDPage page = new PDPage(new PDRectangle((float) width, (float) height));
            document.addPage(page);
            PDDocumentInformation info = document.getDocumentInformation();
            info.setTitle(title);
            info.setCreator("Kinduct");
            regular = embed(false);
            bold = embed(true);
            out = new PDPageContentStream(document, page);
            out.transform(new Matrix(1, 0, 0, -1, 0, (float) height));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot start a PDF page", e);
        }
    }

    private PDFont embed(boolean boldFace) throws IOException {
        try (InputStream in = TextMetrics.fontFile(boldFace)) {
            return PDType0Font.load(document, in, true);
        }
    }

    /** The finished document's bytes; the surface cannot be drawn on afterwards. */
    byte[] finish() {
        try {
            out.close();
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            document.save(bytes);
            document.close();
            return bytes.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("writing the PDF to memory failed", e);
        }
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
        run(out::saveGraphicsState);
        savedColours.add(new int[] {stroke, fill});
    }

    @Override
    public void restore() {
        run(out::restoreGraphicsState);
        int[] c = savedColours.remove(savedColours.size() - 1);
        stroke = c[0];
        fill = c[1];
    }

    @Override
    public void translate(double dx, double dy) {
        run(() -> out.transform(Matrix.getTranslateInstance((float) dx, (float) dy)));
    }

    @Override
    public void rotate(double angleRad) {
        run(() -> out.transform(Matrix.getRotateInstance(angleRad, 0, 0)));
    }

    @Override
    public void clipRect(double x, double y, double w, double h) {
        run(() -> {
            out.addRect((float) x, (float) y, (float) w, (float) h);
            out.clip();
        });
    }

    @Override
    public void stroke(int argb) {
        stroke = argb;
    }

    @Override
    public void fill(int argb) {
        fill = argb;
    }

    @Override
    public void lineWidth(double px) {
        run(() -> out.setLineWidth((float) px));
    }

    @Override
    public void dash(double... px) {
        float[] pattern = new float[px.length];
        for (int i = 0; i < px.length; i++) {
            pattern[i] = (float) px[i];
        }
        run(() -> out.setLineDashPattern(pattern, 0));
    }

    @Override
    public void beginPath() {
        path.clear();
    }

    @Override
    public void moveTo(double x, double y) {
        path.add(new double[] {'M', x, y});
    }

    @Override
    public void lineTo(double x, double y) {
        path.add(new double[] {'L', x, y});
    }

    @Override
    public void closePath() {
        path.add(new double[] {'Z'});
    }

    @Override
    public void strokePath() {
        paint(false);
    }

    @Override
    public void fillPath() {
        paint(true);
    }

    private void paint(boolean filled) {
        run(() -> {
            colour(filled);
            for (double[] p : path) {
                switch ((char) p[0]) {
                    case 'M' -> out.moveTo((float) p[1], (float) p[2]);
                    case 'L' -> out.lineTo((float) p[1], (float) p[2]);
                    default -> out.closePath();
                }
            }
            if (filled) {
                out.fill();
            } else {
                out.stroke();
            }
        });
    }

    @Override
    public void fillRect(double x, double y, double w, double h) {
        run(() -> {
            colour(true);
            out.addRect((float) x, (float) y, (float) w, (float) h);
            out.fill();
        });
    }

    @Override
    public void strokeRect(double x, double y, double w, double h) {
        run(() -> {
            colour(false);
            out.addRect((float) x, (float) y, (float) w, (float) h);
            out.stroke();
        });
    }

    @Override
    public void fillOval(double cx, double cy, double r) {
        run(() -> {
            colour(true);
            circle(cx, cy, r);
            out.fill();
        });
    }

    @Override
    public void strokeOval(double cx, double cy, double r) {
        run(() -> {
            colour(false);
            circle(cx, cy, r);
            out.stroke();
        });
    }

    /** Four cubic Bézier quarters (their radius is off by at most 0.03 %; common practice). */
    private void circle(double cx, double cy, double r) throws IOException {
        float k = (float) (KAPPA * r);
        float x = (float) cx;
        float y = (float) cy;
        float q = (float) r;
        out.moveTo(x + q, y);
        out.curveTo(x + q, y + k, x + k, y + q, x, y + q);
        out.curveTo(x - k, y + q, x - q, y + k, x - q, y);
        out.curveTo(x - q, y - k, x - k, y - q, x, y - q);
        out.curveTo(x + k, y - q, x + q, y - k, x + q, y);
        out.closePath();
    }

    @Override
    public void text(String text, double x, double y, double sizePx, boolean boldFace, Anchor anchor) {
        if (text.isEmpty()) {
            return;
        }
        double left = x + TextMetrics.left(text, sizePx, boldFace, anchor);
        double baseline = y + TextMetrics.baseline(sizePx, boldFace, anchor);
        run(() -> {
            colour(true);
            out.beginText();
            out.setFont(boldFace ? bold : regular, (float) sizePx);
            // The page is flipped (y down); flip the glyphs back about their baseline.
            out.setTextMatrix(new Matrix(1, 0, 0, -1, (float) left, (float) baseline));
            out.showText(text);
            out.endText();
        });
    }

    @Override
    public double textWidth(String text, double sizePx, boolean boldFace) {
        return TextMetrics.width(text, sizePx, boldFace);
    }

    @Override
    public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        BufferedImage img = new BufferedImage(cols, rows, BufferedImage.TYPE_INT_ARGB);
        img.setRGB(0, 0, cols, rows, argb, 0, cols);
        run(() -> {
            PDImageXObject image = LosslessFactory.createFromImage(document, img);
            out.saveGraphicsState();
            // Image space is the unit square with row 0 at its top; the flipped page needs it mirrored.
            out.transform(new Matrix((float) w, 0, 0, (float) -h, (float) x, (float) (y + h)));
            out.drawImage(image, 0, 0, 1, 1);
            out.restoreGraphicsState();
        });
    }

    /** Sets the stroking or non-stroking colour, with its alpha through a cached graphics state. */
    private void colour(boolean filled) throws IOException {
        int argb = filled ? fill : stroke;
        float r = ((argb >> 16) & 0xFF) / 255f;
        float g = ((argb >> 8) & 0xFF) / 255f;
        float b = (argb & 0xFF) / 255f;
        int alpha = (argb >>> 24) & 0xFF;
        PDExtendedGraphicsState state = alphas.computeIfAbsent(alpha, a -> {
            PDExtendedGraphicsState s = new PDExtendedGraphicsState();
            s.setStrokingAlphaConstant(a / 255f);
            s.setNonStrokingAlphaConstant(a / 255f);
            return s;
        });
        out.setGraphicsStateParameters(state);
        if (filled) {
            out.setNonStrokingColor(r, g, b);
        } else {
            out.setStrokingColor(r, g, b);
        }
    }

    /** A step of writing the content stream; PDFBox's calls throw checked exceptions. */
    private interface Writing {
        void run() throws IOException;
    }

    private static void run(Writing w) {
        try {
            w.run();
        } catch (IOException e) {
            throw new UncheckedIOException("writing the PDF page failed", e);
        }
    }
}
