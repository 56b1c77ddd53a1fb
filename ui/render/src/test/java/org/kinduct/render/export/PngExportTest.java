package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/**
 * The PNG snapshot: size and resolution as asked, text large enough for print, and a golden
 * image of one demo.
 *
 * <p>The golden comparison works tile by tile: every 12 × 12 pixel square (overlapping, every 6
 * pixels) must keep its average colour within {@link #TILE_BOUND} levels per channel. Erasing
 * any text block or callout box empties some tile of its ink and fails; anti-aliasing noise, which
 * moves coverage between neighbouring edge pixels, leaves tile averages nearly alone and passes.
 * The test proves both on the image it renders (erased title line, callout box and legend label
 * fail; seeded edge noise passes).
 *
 * <p>Regenerate the golden image after a deliberate change of the drawing. Look at the rendered
 * {@code ui/render/target/golden-actual-rail-sled-80ms.png} first, then run (from the repository root)
 * {@code mvn -B -q -pl ui/render -am test -Dtest=PngExportTest -Dsurefire.failIfNoSpecifiedTests=false
 * -Dkinduct.golden.update=true} and commit {@code ui/render/src/test/resources/golden/rail-sled-80ms.png}.
 * If the layout moved, also update the rectangles in {@link #ERASURES} (the test says when one no
 * longer covers its element).
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
    private static final String GOLDEN = "golden/rail-sled-80ms.png";
    /** Side of a comparison tile, pixels. */
    private static final int TILE = 12;
    /** Tiles start every half tile, so any element at least this wide and tall lies wholly in one. */
    private static final int TILE_STRIDE = TILE / 2;
    /**
     * Largest change of a tile's average colour, per channel (0–255). Measured on this snapshot:
     * erasing its smallest text block tried (the "0.00 m" axis label) moves a tile by 53.6, a
     * single legend digit 65, the "out of screen" legend label 74, the callout box 117, the title
     * line 170; random ±80 on every anti-aliased edge pixel moves a tile by at most 21.4, and a
     * shift of the whole drawing by one pixel 21.0. (The whole-image mean difference this replaces,
     * allowed 1.5, moved by 1.0 for an erased title line and 0.1 for an erased legend label, but by
     * 1.7 for ±16 of edge noise.)
     */
    private static final double TILE_BOUND = 32;
    /** Amplitude of the edge noise that must pass, levels: a quarter of full coverage and more. */
    private static final int NOISE_LEVELS = 64;

    /**
     * Elements of the 900-pixel rail-sled snapshot to erase, each with a point of the background
     * colour to paint over it with: {x0, y0, x1, y1, backgroundX, backgroundY}, pixels.
     */
    private static final Map<String, int[]> ERASURES = Map.of(
            "title line", new int[] {20, 24, 500, 54, 10, 10},
            "callout box", new int[] {360, 311, 492, 394, 520, 300},
            "legend label 'out of screen'", new int[] {665, 381, 776, 401, 850, 450});

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
            SnapshotPage page = export.page();
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

    private static BufferedImage renderRailSled() {
        Scene scene = Demos.load("rail-sled");
        return new Exporter(scene, ExportFixtures.options(0.08, 900, 96, new ViewChoice.Fit())).image();
    }

    private static BufferedImage golden(BufferedImage actual) throws IOException {
        Path goldenFile = Path.of("src", "test", "resources", GOLDEN);
        if (Boolean.getBoolean("kinduct.golden.update")) {
            ImageIO.write(actual, "png", goldenFile.toFile());
        }
        assertTrue(Files.isReadable(goldenFile), goldenFile + " missing; see this class's javadoc to create it");
        return ImageIO.read(goldenFile.toFile());
    }

    /** A tile at (x, y) whose average colour changed by {@code levels} on some channel. */
    record TileChange(int x, int y, double levels) {
        @Override
        public String toString() {
            return String.format("tile at (%d, %d) px: average colour changed by %.1f levels (bound %.0f)",
                    x, y, levels, TILE_BOUND);
        }
    }

    /**
     * The first tile whose average colour differs by more than {@link #TILE_BOUND} on some channel,
     * or empty when every tile agrees. The images must have the same size.
     */
    static Optional<TileChange> firstChangedTile(BufferedImage golden, BufferedImage actual) {
        assertEquals(golden.getWidth(), actual.getWidth(), "width");
        assertEquals(golden.getHeight(), actual.getHeight(), "height");
        for (int y0 = 0; y0 + TILE <= golden.getHeight(); y0 += TILE_STRIDE) {
            for (int x0 = 0; x0 + TILE <= golden.getWidth(); x0 += TILE_STRIDE) {
                long[] sum = new long[3];
                for (int y = y0; y < y0 + TILE; y++) {
                    for (int x = x0; x < x0 + TILE; x++) {
                        int a = golden.getRGB(x, y);
                        int b = actual.getRGB(x, y);
                        for (int c = 0; c < 3; c++) {
                            sum[c] += (a >> (8 * c) & 0xFF) - (b >> (8 * c) & 0xFF);
                        }
                    }
                }
                for (int c = 0; c < 3; c++) {
                    double change = Math.abs(sum[c]) / (double) (TILE * TILE);
                    if (change > TILE_BOUND) {
                        return Optional.of(new TileChange(x0, y0, change));
                    }
                }
            }
        }
        return Optional.empty();
    }

    private static BufferedImage copy(BufferedImage image) {
        BufferedImage copy = new BufferedImage(image.getWidth(), image.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = copy.createGraphics();
        g.drawImage(image, 0, 0, null);
        g.dispose();
        return copy;
    }

    @Test
    void railSledSnapshotMatchesTheGoldenImage() throws IOException {
        BufferedImage actual = renderRailSled();
        Files.createDirectories(Path.of("target"));
        ImageIO.write(actual, "png", Path.of("target", "golden-actual-rail-sled-80ms.png").toFile());
        BufferedImage golden = golden(actual);
        Optional<TileChange> change = firstChangedTile(golden, actual);
        assertTrue(change.isEmpty(), change + " (see target/golden-actual-rail-sled-80ms.png)");
    }

    @ParameterizedTest
    @ValueSource(strings = {"title line", "callout box", "legend label 'out of screen'"})
    void goldenComparisonFailsWhenAnElementIsErased(String element) throws IOException {
        BufferedImage actual = renderRailSled();
        BufferedImage golden = golden(actual);
        int[] r = ERASURES.get(element);
        BufferedImage erased = copy(actual);
        Graphics2D g = erased.createGraphics();
        g.setColor(new Color(actual.getRGB(r[4], r[5])));
        g.fillRect(r[0], r[1], r[2] - r[0], r[3] - r[1]);
        g.dispose();
        // Guard: the rectangle must still cover its element (a fifth of its pixels were not background).
        long inked = 0;
        for (int y = r[1]; y < r[3]; y++) {
            for (int x = r[0]; x < r[2]; x++) {
                inked += actual.getRGB(x, y) != erased.getRGB(x, y) ? 1 : 0;
            }
        }
        long area = (long) (r[2] - r[0]) * (r[3] - r[1]);
        assertTrue(inked >= area / 5, element + ": only " + inked + " of " + area
                + " pixels differ from the background; update ERASURES to the new layout");

        Optional<TileChange> change = firstChangedTile(golden, erased);
        assertTrue(change.isPresent(), "erasing the " + element + " must fail the golden comparison");
        // …and it fails where the element was.
        TileChange tile = change.orElseThrow();
        assertTrue(tile.x() + TILE > r[0] && tile.x() < r[2] && tile.y() + TILE > r[1] && tile.y() < r[3],
                element + ": " + tile);
    }

    @Test
    void goldenComparisonPassesAntiAliasingNoise() throws IOException {
        BufferedImage actual = renderRailSled();
        BufferedImage golden = golden(actual);
        // Every pixel that differs from a neighbour (an anti-aliased edge, of text or of a line) gets
        // up to ±NOISE_LEVELS on all channels, as another rasterizer's coverage would give it.
        long seed = 0x90_1d_e7L;
        SplittableRandom random = new SplittableRandom(seed);
        BufferedImage noisy = copy(actual);
        for (int y = 1; y < actual.getHeight() - 1; y++) {
            for (int x = 1; x < actual.getWidth() - 1; x++) {
                int p = actual.getRGB(x, y);
                if (p == actual.getRGB(x + 1, y) && p == actual.getRGB(x - 1, y)
                        && p == actual.getRGB(x, y + 1) && p == actual.getRGB(x, y - 1)) {
                    continue;
                }
                int delta = random.nextInt(-NOISE_LEVELS, NOISE_LEVELS + 1);
                int rgb = 0;
                for (int c = 0; c < 3; c++) {
                    rgb |= Math.max(0, Math.min(255, (p >> (8 * c) & 0xFF) + delta)) << (8 * c);
                }
                noisy.setRGB(x, y, rgb);
            }
        }
        Optional<TileChange> change = firstChangedTile(golden, noisy);
        assertTrue(change.isEmpty(), "seed " + seed + ": " + change);
    }
}
