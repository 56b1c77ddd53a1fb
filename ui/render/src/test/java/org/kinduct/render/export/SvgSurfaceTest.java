package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;
import org.kinduct.render.paint.Surface;
import org.w3c.dom.Document;

/**
 * The SVG writer: any text a scene may carry (names with markup characters, control characters)
 * comes back from an XML parser (javax.xml, independent of the writer) as written, minus the
 * characters XML 1.0 forbids; numbers keep two decimals.
 */
class SvgSurfaceTest {

    private static final long SEED = 0x5EED_5AFEL;
    private static final String ALPHABET = "aZ09 <>&\"'\t\n\u0001\u001f→⊙⊗µΦε";

    private static String randomText(SplittableRandom r) {
        StringBuilder s = new StringBuilder();
        int n = 1 + r.nextInt(40);
        for (int i = 0; i < n; i++) {
            s.append(ALPHABET.charAt(r.nextInt(ALPHABET.length())));
        }
        return s.toString();
    }

    @RepeatedTest(50)
    void textSurvivesAnXmlParserExceptForbiddenCharacters(RepetitionInfo info) throws Exception {
        long seed = SEED + info.getCurrentRepetition();
        String text = randomText(new SplittableRandom(seed));
        SvgSurface s = new SvgSurface(100, 50);
        s.save();
        s.translate(3, 4);
        s.clipRect(0, 0, 50, 20);
        s.text(text, 1, 2, 12, true, Surface.Anchor.CENTER);

        String svg = s.document(text, 200);

        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        String expected = text.replaceAll("[\\x00-\\x08\\x0B-\\x1F]", "");
        assertEquals(expected, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text").item(0)
                .getTextContent(), "seed " + seed);
        assertEquals(expected, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "title").item(0)
                .getTextContent(), "seed " + seed);
    }

    @Test
    void numbersAreWrittenWithAtMostTwoDecimals() {
        assertEquals("3", SvgSurface.num(3.0004));
        assertEquals("-0.5", SvgSurface.num(-0.5));
        assertEquals("12.35", SvgSurface.num(12.345001));
        assertEquals("-1", SvgSurface.num(-0.999));
    }
}
