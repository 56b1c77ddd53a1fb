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

        SnapshotPage page = export.page();
        ExportFixtures.assertRodPicture(img, page, WIDTH_PX / SnapshotPage.WIDTH, SPEED * T);
    }
}
