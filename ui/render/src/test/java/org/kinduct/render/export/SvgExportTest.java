package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.render.export.ExportFixtures.B;
import static org.kinduct.render.export.ExportFixtures.ROD;
import static org.kinduct.render.export.ExportFixtures.SPEED;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Scene;
import org.kinduct.render.paint.Quantities;
import org.kinduct.render.view.ViewTransform;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/**
 * The SVG snapshot is well-formed XML, carries the solver's numbers as text, and renders (with
 * Apache Batik, independent of our code) to a picture whose marks sit where the scene puts them.
 *
 * <p>Reference: a rod of length L moving at v across a uniform B has EMF of magnitude B·L·v
 * (D. J. Griffiths, Introduction to Electrodynamics, 4th ed., 2013, eq. 7.13, motional EMF);
 * with B into the screen and v along +x, v × B points +y, so the upper end is + (ibid., §7.1.3).
 */
class SvgExportTest {

    private static final double T = 0.05;
    private static final int WIDTH_PX = 1200;
    /** Channel levels counted as the painter's ink (#1e1e1e) and as white paper; the field colours are neither. */
    private static final int INK_MAX = 70;
    private static final int PAPER_MIN = 225;
    /** The polarity discs sit just beyond a wire's ends: the strip searched, page units from the end. */
    private static final double STRIP_START = 4;
    private static final double STRIP_END = 32;
    private static final double STRIP_HALF_WIDTH = 12;
    /** A disc of radius 6 to 11 units covers more than this many units², even minus its glyph. */
    private static final double MIN_DISC_AREA = 60;

    @TempDir
    Path dir;

    private static List<String> texts(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add(nodes.item(i).getTextContent());
        }
        return out;
    }

    @Test
    void svgIsXmlAndShowsTheRodsLabelEmfAndPolarity() throws Exception {
        Scene scene = ExportFixtures.rodInUniformField();
        Exporter export = new Exporter(scene, ExportFixtures.options(T, WIDTH_PX, 150, new ViewChoice.Fit()));

        List<String> texts = texts(export.svg());

        double emf = export.snapshot().conductor("rod").orElseThrow().emfV();
        assertEquals(B * ROD * SPEED, emf, 1e-9 * B * ROD * SPEED, "motional EMF B·L·v, upper end +");
        String callout = "ε " + Quantities.voltage(B * ROD * SPEED);
        assertTrue(texts.contains("rod"), "conductor label in " + texts);
        assertTrue(texts.contains(callout), callout + " in " + texts);
        assertTrue(texts.contains("+ at last end"), "polarity in " + texts);
        assertTrue(texts.contains(Quantities.voltage(emf)), "table EMF in " + texts);
        assertTrue(texts.contains("Rod on a cart"), "title in " + texts);
    }

    /**
     * The rotor demo's coil is centred over its magnet at t = 0, where by symmetry Φ(θ) = Φ(−θ)
     * and the EMF is zero (common practice): its callout reads zero, not the rounding noise of the
     * flux difference, while elsewhere in the run the EMF is large.
     */
    @Test
    void calloutsReadRoundingNoiseAsZero() throws Exception {
        Scene scene = org.kinduct.demo.Demos.load("spinning-coil-generator");
        Exporter export = new Exporter(scene, ExportFixtures.options(0, WIDTH_PX, 150, new ViewChoice.Fit()));
        List<String> callouts = texts(export.svg()).stream().filter(t -> t.startsWith("ε ")).toList();
        assertTrue(!callouts.isEmpty(), "a callout per conductor");
        for (String c : callouts) {
            assertTrue(!c.contains("e-"), "no floating-point noise in " + c);
        }
    }

    @Test
    void renderedSvgShowsThePlusMarkAtTheUpperEndAndFieldColoursBySign() throws Exception {
        Scene scene = ExportFixtures.rodInUniformField();
        SnapshotOptions options = ExportFixtures.options(T, WIDTH_PX, 150, new ViewChoice.Fit());
        Exporter export = new Exporter(scene, options);
        Path svg = dir.resolve("rod.svg");
        Files.writeString(svg, export.svg());

        Path rendered = ExportFixtures.renderSvg(svg, WIDTH_PX);
        Files.copy(rendered, Path.of("target", "export-rod-svg.png"), StandardCopyOption.REPLACE_EXISTING);
        BufferedImage img = ImageIO.read(rendered.toFile());

        SnapshotPage page = SnapshotPage.layout(scene, export.snapshot(), List.of(), options);
        double k = WIDTH_PX / SnapshotPage.WIDTH;
        ViewTransform v = page.mapView();
        double rodX = SPEED * T;
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
