package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.kinduct.cli.CliRun.Result;
import org.junit.jupiter.api.io.TempDir;

/** {@code kinduct export} through {@link KinductMain#run}: files written, and exit 1 with a message on bad input. */
class ExportCommandTest {

    @TempDir
    Path dir;



    @Test
    void exportWritesEveryAskedFileForADemo() throws Exception {
        Path png = dir.resolve("s.png");
        Path svg = dir.resolve("s.svg");
        Path csv = dir.resolve("series.csv");
        Path map = dir.resolve("map.csv");
        Path json = dir.resolve("r.json");

        Result r = CliRun.run("export", "--demo", "rail-sled", "--at", "80 ms", "--png", png.toString(), "--svg",
                svg.toString(), "--width", "640", "--dpi", "150", "--csv", csv.toString(), "--field-csv",
                map.toString(), "--json", json.toString(), "--view", "-10 cm, -6 cm, 10 cm, 6 cm");

        assertEquals(KinductMain.OK, r.code(), r.err());
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(640, img.getWidth());
        assertEquals("svg", DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(svg.toFile())
                .getDocumentElement().getNodeName());
        assertTrue(Files.readString(csv).startsWith("t_s,"), "series CSV header");
        assertTrue(Files.readString(map).startsWith("x_m,y_m,Bz_T\n"), "field CSV header");
        assertTrue(Files.readString(json).contains("\"format\" : \"kinduct-results\""), "results JSON");
    }

    @Test
    void exportWithoutAnyOutputIsBadInput() {
        Result r = CliRun.run("export", "--demo", "rail-sled");

        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("nothing to export"), r.err());
    }

    @Test
    void malformedViewIsBadInputAndWritesNothing() {
        Path png = dir.resolve("s.png");

        Result r = CliRun.run("export", "--demo", "rail-sled", "--png", png.toString(), "--view", "1 cm,2 cm,3 cm");

        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--view"), r.err());
        assertFalse(Files.exists(png));
    }

    @Test
    void invertedViewBoxIsBadInput() {
        Result r = CliRun.run("export", "--demo", "rail-sled", "--png", dir.resolve("s.png").toString(), "--view",
                "5 cm,0,1 cm,3 cm");

        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("x0 < x1"), r.err());
    }

    @Test
    void widthOutOfRangeIsBadInput() {
        Result r = CliRun.run("export", "--demo", "rail-sled", "--png", dir.resolve("s.png").toString(), "--width", "10");

        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("width"), r.err());
    }

    @Test
    void unwritableTargetIsBadInputWithTheReason() throws Exception {
        Path blocker = Files.writeString(dir.resolve("plain-file"), "");

        Result r = CliRun.run("export", "--demo", "rail-sled", "--json", blocker.resolve("r.json").toString());

        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("cannot save"), r.err());
    }
}
