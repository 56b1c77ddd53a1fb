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
        return new Scene("Frame entering a pole", "", List.of(cart()), List.of(patch), List.of(frame, rod),
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
}
