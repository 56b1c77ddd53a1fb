package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.kinduct.render.paint.Quantities;
import org.kinduct.scene.Scene;

/**
 * The PDF export is the same page as the PNG and the SVG: one page {@link SnapshotPage#WIDTH}
 * points wide with the page's height, its text extractable and its fonts embedded, and, rendered
 * by PDFBox's own renderer (a reader's code path, not our writer's), the marks where the scene
 * puts them: the + disc at the rod's upper end, the field colours by sign.
 */
class PdfExportTest {

    private static final double T = 0.05;
    private static final int WIDTH_PX = 1200;

    @Test
    void pdfPageShowsTheRodsPolarityFieldColoursAndTextWithEmbeddedFonts() throws Exception {
        Scene scene = ExportFixtures.rodInUniformField();
        SnapshotOptions options = ExportFixtures.options(T, WIDTH_PX, 150, new ViewChoice.Fit());
        Exporter export = new Exporter(scene, options);
        SnapshotPage page = export.page();

        try (PDDocument pdf = Loader.loadPDF(export.pdf())) {
            assertEquals(1, pdf.getNumberOfPages());
            PDPage p = pdf.getPage(0);
            assertEquals(SnapshotPage.WIDTH, p.getMediaBox().getWidth(), 1e-3, "page width, points");
            assertEquals(page.height(), p.getMediaBox().getHeight(), 1e-3, "page height, points");
            for (COSName name : p.getResources().getFontNames()) {
                PDFont font = p.getResources().getFont(name);
                assertTrue(font.isEmbedded(), font.getName() + " embedded");
            }
            String text = new PDFTextStripper().getText(pdf);
            for (String expected : List.of("Rod on a cart", "rod", "ε " + Quantities.voltage(
                    ExportFixtures.B * ExportFixtures.ROD * ExportFixtures.SPEED), "+ at last end")) {
                assertTrue(text.contains(expected), expected + " in the PDF's text: " + text);
            }

            float scale = (float) (WIDTH_PX / SnapshotPage.WIDTH);
            BufferedImage img = new PDFRenderer(pdf).renderImage(0, scale);
            ImageIO.write(img, "png", Files.newOutputStream(Path.of("target", "export-rod-pdf.png")));
            ExportFixtures.assertRodPicture(img, page, scale, ExportFixtures.SPEED * T);
        }
    }
}
