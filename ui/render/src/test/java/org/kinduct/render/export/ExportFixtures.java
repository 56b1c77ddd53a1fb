package org.kinduct.render.export;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import org.apache.batik.transcoder.SVGAbstractTranscoder;
import org.apache.batik.transcoder.TranscoderException;
import org.apache.batik.transcoder.TranscoderInput;
import org.apache.batik.transcoder.TranscoderOutput;
import org.apache.batik.transcoder.image.PNGTranscoder;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/** Scenes with textbook answers, and helpers to look at rendered pixels. */
final class ExportFixtures {

    /** |B_z| of the fields below, tesla. */
    static final double B = 0.5;
    /** Speed of the cart, m/s, along +x. */
    static final double SPEED = 2.0;
    /** Length of the rod, metres. */
    static final double ROD = 0.08;
    /** Side of the frame loop across the motion, metres. */
    static final double FRAME_H = 0.04;
    static final LocalDate DATE = LocalDate.of(2026, 1, 15);

    private ExportFixtures() {
    }

    private static Body cart() {
        return new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)));
    }

    /**
     * A rod along y (first vertex at the bottom) on a cart moving +x through a uniform field into
     * the screen (B_z = −B), and a field patch of +2B above its path, so the map shows both signs:
     * B_z = +B inside the patch, −B elsewhere.
     */
    static Scene rodInUniformField() {
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(Conductor.Vertex.at(0, -ROD / 2),
                Conductor.Vertex.at(0, ROD / 2)));
        Source.FieldPatch patch = new Source.FieldPatch("lid", Body.FIXED, List.of(new Vec2(0, 0.1), new Vec2(0.2, 0.1),
                new Vec2(0.2, 0.16), new Vec2(0, 0.16)), 2 * B);
        return new Scene("Rod on a cart", "A rod crosses a uniform field into the screen.", List.of(cart()),
                List.of(new Source.UniformField("earth", -B), patch), List.of(rod), new TimeSpan(0, 0.1, 0.01));
    }

    /**
     * A counter-clockwise frame loop straddling the left edge (x = 0) of a field patch B_z = +B
     * and moving into it, and a rod inside the patch, both on the cart.
     */
    static Scene frameEnteringPatch() {
        double h = FRAME_H / 2;
        Conductor.Loop frame = Conductor.Loop.simple("frame", "cart", List.of(Conductor.Vertex.at(-0.05, -h),
                Conductor.Vertex.at(0.05, -h), Conductor.Vertex.at(0.05, h), Conductor.Vertex.at(-0.05, h)),
                WireSpec.of(Material.COPPER, 0.5e-3));
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(Conductor.Vertex.at(0.3, -ROD / 2),
                Conductor.Vertex.at(0.3, ROD / 2)));
        Source.FieldPatch patch = new Source.FieldPatch("pole", Body.FIXED, List.of(new Vec2(0, -0.5), new Vec2(1, -0.5),
                new Vec2(1, 0.5), new Vec2(0, 0.5)), B);
        return new Scene("Picture entering a pole", "", List.of(cart()), List.of(patch), List.of(frame, rod),
                new TimeSpan(0, 0.02, 0.001));
    }

    static SnapshotOptions options(double tS, int widthPx, int dpi, ViewChoice view) {
        return SnapshotOptions.standard(tS, widthPx, dpi, view, DATE, "test");
    }

    /**
     * Renders {@code svg} to a PNG {@code widthPx} wide with Apache Batik's transcoder, an SVG
     * renderer independent of our code (test scope only; no external program needed).
     */
    static Path renderSvg(Path svg, int widthPx) throws IOException {
        Path png = svg.resolveSibling(svg.getFileName() + ".png");
        PNGTranscoder transcoder = new PNGTranscoder();
        transcoder.addTranscodingHint(SVGAbstractTranscoder.KEY_WIDTH, (float) widthPx);
        try (OutputStream out = Files.newOutputStream(png)) {
            transcoder.transcode(new TranscoderInput(svg.toUri().toString()), new TranscoderOutput(out));
        } catch (TranscoderException e) {
            throw new IOException("Batik could not render " + svg + ": " + e.getMessage(), e);
        }
        return png;
    }

    /** Mean luminance (ITU-R BT.601 weights) over a disc of {@code r} pixels, 0–255. */
    static double luminance(BufferedImage img, double cx, double cy, double r) {
        double sum = 0;
        int n = 0;
        for (int y = (int) Math.floor(cy - r); y <= cy + r; y++) {
            for (int x = (int) Math.floor(cx - r); x <= cx + r; x++) {
                if (x >= 0 && y >= 0 && x < img.getWidth() && y < img.getHeight()
                        && Math.hypot(x - cx, y - cy) <= r) {
                    int rgb = img.getRGB(x, y);
                    sum += 0.299 * (rgb >> 16 & 0xFF) + 0.587 * (rgb >> 8 & 0xFF) + 0.114 * (rgb & 0xFF);
                    n++;
                }
            }
        }
        return sum / n;
    }

    private static final int INK_MAX = 70;
    private static final int PAPER_MIN = 225;
    /** The polarity discs sit just beyond a wire's ends: the strip searched, page units from the end. */
    private static final double STRIP_START = 4;
    private static final double STRIP_END = 32;
    private static final double STRIP_HALF_WIDTH = 12;
    /** A disc of radius 6 to 11 units covers more than this many units², even minus its glyph. */
    private static final double MIN_DISC_AREA = 60;

    /**
     * The picture of {@link #rodInUniformField()} rendered from an export ({@code k} output pixels
     * per page unit): the dark + disc beyond the rod's upper end and the white − disc beyond its
     * lower end (v × B points up: upper end positive), amber inside the +B patch, blue in the −B
     * field around it.
     */
    static void assertRodPicture(BufferedImage img, SnapshotPage page, double k, double rodX) {
        ViewTransform v = page.mapView();
        double[] upper = marks(img, page, k, rodX, ROD / 2, -1);
        double[] lower = marks(img, page, k, rodX, -ROD / 2, +1);
        assertTrue(upper[0] > MIN_DISC_AREA && upper[0] > 2 * lower[0],
                "dark + disc beyond the upper end: ink areas upper " + upper[0] + ", lower " + lower[0]);
        assertTrue(lower[1] > MIN_DISC_AREA && lower[1] > 2 * upper[1],
                "white − disc beyond the lower end: paper areas lower " + lower[1] + ", upper " + upper[1]);

        // Points off the grid lines (every 10 mm) and clear of the rod's marks and callout.
        int out = img.getRGB((int) (v.screenX(0.137) * k), (int) ((page.mapTop() + v.screenY(0.123)) * k));
        int in = img.getRGB((int) (v.screenX(rodX - 0.033) * k), (int) ((page.mapTop() + v.screenY(-0.027)) * k));
        assertTrue((out >> 16 & 0xFF) > (out & 0xFF) + 40, "amber inside the +B patch: " + Integer.toHexString(out));
        assertTrue((in & 0xFF) > (in >> 16 & 0xFF) + 40, "blue in the −B field: " + Integer.toHexString(in));
    }

    /**
     * Areas (page units²) of ink-dark and of paper-white pixels just beyond a wire end (scene
     * point x, y), in a strip along the screen direction {@code dirY} (−1 up, +1 down).
     */
    private static double[] marks(BufferedImage img, SnapshotPage page, double k, double x, double y, int dirY) {
        ViewTransform v = page.mapView();
        double sx = v.screenX(x) * k;
        double sy = (page.mapTop() + v.screenY(y)) * k;
        int ink = 0;
        int paper = 0;
        for (double d = STRIP_START * k; d <= STRIP_END * k; d++) {
            for (double lateral = -STRIP_HALF_WIDTH * k; lateral <= STRIP_HALF_WIDTH * k; lateral++) {
                int rgb = img.getRGB((int) (sx + lateral), (int) (sy + dirY * d));
                int r = rgb >> 16 & 0xFF;
                int g = rgb >> 8 & 0xFF;
                int b = rgb & 0xFF;
                ink += r < INK_MAX && g < INK_MAX && b < INK_MAX ? 1 : 0;
                paper += r > PAPER_MIN && g > PAPER_MIN && b > PAPER_MIN ? 1 : 0;
            }
        }
        return new double[] {ink / (k * k), paper / (k * k)};
    }
}
