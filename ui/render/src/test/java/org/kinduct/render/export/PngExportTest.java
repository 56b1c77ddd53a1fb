package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/**
 * The PNG snapshot: size and resolution as asked, text large enough for print, and a golden
 * image of one demo.
 *
 * <p>Regenerate the golden image after a deliberate change of the drawing (look at it first):
 * {@code mvn -B -q -pl ui -am test -Dtest=PngExportTest -Dsurefire.failIfNoSpecifiedTests=false
 * -Dkinduct.golden.update=true}, then commit {@code ui/src/test/resources/golden/rail-sled-80ms.png}.
 */
class PngExportTest {

    /** 1 inch = 0.0254 m exactly (international inch, 1959). */
    private static final double METRES_PER_INCH = 0.0254;
    /** pHYs stores whole pixels per metre: the dpi read back is within half a pixel per metre of the asked one. */
    private static final double DPI_TOLERANCE = 0.5 * METRES_PER_INCH;
    /** 1 pt = 1/72 inch (PostScript point, common practice in typesetting). */
    private static final double MM_PER_POINT = 25.4 / 72;
    private static final double PRINT_WIDTH_MM = 160;
    private static final double MIN_BODY_POINTS = 8;
    /**
     * Mean absolute difference per channel (0–255) allowed against the golden image: room for
     * anti-aliasing and font-rasterizer differences between machines, far below what a moved
     * label, a changed colour or a missing element cause (several units over the image).
     */
    private static final double GOLDEN_MEAN_DIFF = 1.5;
    private static final String GOLDEN = "golden/rail-sled-80ms.png";

    @ParameterizedTest
    @CsvSource({"600, 72", "1500, 300", "2400, 600"})
    void pngHasTheAskedWidthAndResolution(int widthPx, int dpi) throws IOException {
        Scene scene = ExportFixtures.rodInUniformField();
        SnapshotOptions options = ExportFixtures.options(0.05, widthPx, dpi, new ViewChoice.Fit());
        Exporter export = new Exporter(scene, options);

        byte[] png = export.png();

        ImageReader reader = ImageIO.getImageReadersByFormatName("png").next();
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(png))) {
            reader.setInput(in);
            assertEquals(widthPx, reader.getWidth(0));
            SnapshotPage page = SnapshotPage.layout(scene, export.snapshot(), List.of(), options);
            assertEquals(Math.ceil(page.height() * widthPx / SnapshotPage.WIDTH), reader.getHeight(0), 1.0,
                    "height follows the page's aspect");
            Element phys = child(reader.getImageMetadata(0).getAsTree("javax_imageio_png_1.0"), "pHYs");
            assertNotNull(phys, "pHYs chunk present");
            assertEquals("meter", phys.getAttribute("unitSpecifier"));
            double dpiX = Long.parseLong(phys.getAttribute("pixelsPerUnitXAxis")) * METRES_PER_INCH;
            double dpiY = Long.parseLong(phys.getAttribute("pixelsPerUnitYAxis")) * METRES_PER_INCH;
            assertEquals(dpi, dpiX, DPI_TOLERANCE);
            assertEquals(dpi, dpiY, DPI_TOLERANCE);
        } finally {
            reader.dispose();
        }
    }

    private static Element child(Node node, String name) {
        for (Node c = node.getFirstChild(); c != null; c = c.getNextSibling()) {
            if (name.equals(c.getNodeName())) {
                return (Element) c;
            }
        }
        return null;
    }

    @Test
    void bodyAndTableTextAreAtLeastEightPointWhenPrintedSixteenCentimetresWide() {
        double pointsPerUnit = PRINT_WIDTH_MM / SnapshotPage.WIDTH / MM_PER_POINT;
        assertTrue(SnapshotPage.BODY * pointsPerUnit >= MIN_BODY_POINTS,
                "body text " + SnapshotPage.BODY * pointsPerUnit + " pt");
        assertTrue(SnapshotPage.MIN_TABLE_FONT * pointsPerUnit >= MIN_BODY_POINTS,
                "smallest table text " + SnapshotPage.MIN_TABLE_FONT * pointsPerUnit + " pt");
    }

    @Test
    void railSledSnapshotMatchesTheGoldenImage() throws IOException {
        Scene scene = Demos.load("rail-sled");
        BufferedImage actual = new Exporter(scene, ExportFixtures.options(0.08, 900, 96, new ViewChoice.Fit())).image();
        Files.createDirectories(Path.of("target"));
        ImageIO.write(actual, "png", Path.of("target", "golden-actual-rail-sled-80ms.png").toFile());
        Path goldenFile = Path.of("src", "test", "resources", GOLDEN);
        if (Boolean.getBoolean("kinduct.golden.update")) {
            ImageIO.write(actual, "png", goldenFile.toFile());
        }
        assertTrue(Files.isReadable(goldenFile), goldenFile + " missing; see this class's javadoc to create it");
        BufferedImage golden = ImageIO.read(goldenFile.toFile());
        assertEquals(golden.getWidth(), actual.getWidth(), "width");
        assertEquals(golden.getHeight(), actual.getHeight(), "height");
        double sum = 0;
        for (int y = 0; y < golden.getHeight(); y++) {
            for (int x = 0; x < golden.getWidth(); x++) {
                int a = golden.getRGB(x, y);
                int b = actual.getRGB(x, y);
                for (int shift = 0; shift <= 16; shift += 8) {
                    sum += Math.abs((a >> shift & 0xFF) - (b >> shift & 0xFF));
                }
            }
        }
        double mean = sum / (3.0 * golden.getWidth() * golden.getHeight());
        assertTrue(mean <= GOLDEN_MEAN_DIFF, "mean difference per channel " + mean
                + " (see target/golden-actual-rail-sled-80ms.png)");
    }
}
