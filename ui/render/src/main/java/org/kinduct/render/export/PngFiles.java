package org.kinduct.render.export;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/** PNG encoding with the resolution recorded in the pHYs chunk (PNG specification, 2nd ed., W3C 2003, §11.3.5.3). */
final class PngFiles {

    private static final double METRES_PER_INCH = 0.0254;
    private static final String NATIVE_FORMAT = "javax_imageio_png_1.0";

    private PngFiles() {
    }

    /** pHYs stores whole pixels per metre; {@code dpi} is rounded to that. */
    static long pixelsPerMetre(int dpi) {
        return Math.round(dpi / METRES_PER_INCH);
    }

    static byte[] encode(BufferedImage image, int dpi) {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        try (ByteArrayOutputStream bytes = new ByteArrayOutputStream();
             ImageOutputStream out = ImageIO.createImageOutputStream(bytes)) {
            IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image), null);
            IIOMetadataNode phys = new IIOMetadataNode("pHYs");
            String ppm = Long.toString(pixelsPerMetre(dpi));
            phys.setAttribute("pixelsPerUnitXAxis", ppm);
            phys.setAttribute("pixelsPerUnitYAxis", ppm);
            phys.setAttribute("unitSpecifier", "meter");
            IIOMetadataNode root = new IIOMetadataNode(NATIVE_FORMAT);
            root.appendChild(phys);
            meta.mergeTree(NATIVE_FORMAT, root);
            writer.setOutput(out);
            writer.write(new IIOImage(image, null, meta));
            out.flush();
            return bytes.toByteArray();
        } catch (IIOInvalidTreeException e) {
            throw new IllegalStateException("the PNG writer refused the resolution metadata", e);
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a PNG in memory failed", e);
        } finally {
            writer.dispose();
        }
    }
}
