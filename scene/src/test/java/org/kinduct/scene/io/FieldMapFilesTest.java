package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Field-map files: both layouts, units, the scene's reference to them, and every broken grid named by line and column. */
class FieldMapFilesTest {

    private static FieldGrid points(String text) throws Exception {
        return FieldMapCsv.readPoints(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), "scan.csv");
    }

    private static String problem(String text) {
        return assertThrows(FieldMapFormatException.class, () -> points(text)).getMessage();
    }

    @Test
    void pointsInTheExportFormReadWithTheirUnits() throws Exception {
        FieldGrid g = points("x [mm],y [mm],Bz (mT)\n0,10,1\n0.5,10,2\n1,10,3\n0,10.5,4\n0.5,10.5,5\n1,10.5,6\n"
                + "0,11,7\n0.5,11,8\n1,11,9\n");
        assertEquals(3, g.nx());
        assertEquals(3, g.ny());
        assertEquals(0.0, g.x0M());
        assertEquals(0.010, g.y0M(), 1e-18);
        assertEquals(0.0005, g.dxM(), 1e-18);
        assertEquals(0.0005, g.dyM(), 1e-18);
        assertEquals(0.006, g.at(2, 1), 1e-18, "row 1 (y = 10.5 mm), column 2: 6 mT");
    }

    @Test
    void columnsMayComeInAnyOrderBesideOthers() throws Exception {
        FieldGrid g = points("# a scan\nBz_T,note,y_m,x_m\n1,a,0,0\n2,b,0,1\n3,c,0,2\n4,d,1,0\n5,e,1,1\n6,f,1,2\n"
                + "7,g,2,0\n8,h,2,1\n9,i,2,2\n");
        assertEquals(8, g.at(1, 2));
    }

    @Test
    void brokenGridsAreNamedByFileLineAndColumn() {
        assertEquals("scan.csv:1:5: column 'y' has no unit; write it as 'y_m' or 'y [mm]'", problem("x_m,y,Bz_T\n"));
        assertEquals("scan.csv:3:5: B_z is NaN; every sample must be a finite number",
                problem("x_m,y_m,Bz_T\n0,0,1\n1,0,NaN\n"));
        assertEquals("scan.csv:3:5: missing B_z", problem("x_m,y_m,Bz_T\n0,0,1\n1,0,\n"));
        assertEquals("scan.csv:6: the row at y = 1 (from line 5) has 2 samples, the first row has 3; every row needs"
                + " the same x positions", problem("x_m,y_m,Bz_T\n0,0,1\n1,0,1\n2,0,1\n0,1,1\n1,1,1\n0,2,1\n"));
        assertEquals("scan.csv:4:1: spacing is not uniform: x = 2.5 where the first two steps give 2.0 m (step 1.0 m);"
                + " a field map needs a regular grid", problem("x_m,y_m,Bz_T\n0,0,1\n1,0,1\n2.5,0,1\n"));
        assertEquals("scan.csv:3:1: x 'abc' is not a number", problem("x_m,y_m,Bz_T\n0,0,1\nabc,0,1\n"));
    }

    @Test
    void fieldsSplitAcrossReadsAndByteOrderMarkReadAsText() throws Exception {
        StringBuilder text = new StringBuilder("\uFEFFx [µm],y [µm],Bz [µT]\n");
        int n = 2000; // about 60 kB per row: fields straddle the reader's 64 kB buffer
        for (int j = 0; j < 3; j++) {
            for (int i = 0; i < n; i++) {
                text.append(i).append(".000000000000").append(',').append(j).append(",   ").append(i * 0.125 + j)
                        .append('\n');
            }
        }
        FieldGrid g = points(text.toString());
        assertEquals(n, g.nx());
        assertEquals(3, g.ny());
        assertEquals(1e-6, g.dxM(), 1e-18);
        assertEquals((1999 * 0.125 + 1) * 1e-6, g.at(1999, 1), 1e-18, "last sample, in µT");
    }

    @Test
    void columnsCountCharactersAndTextThatIsNotUtf8IsNamed() {
        assertEquals("scan.csv:1:14: column 'y' has no unit; write it as 'y_m' or 'y [mm]'",
                problem("Bz [µT],x_µm,y\n"), "µ is two bytes but one character");
        byte[] latin1 = "x_m,y_m,Bz [\u00b5T]\n0,0,1\n".getBytes(StandardCharsets.ISO_8859_1);
        assertEquals("scan.csv:1:9: the text here is not UTF-8; save the file as UTF-8", assertThrows(
                FieldMapFormatException.class, () -> FieldMapCsv.readPoints(new ByteArrayInputStream(latin1), "scan.csv"))
                .getMessage());
    }

    @Test
    void raggedMatrixIsNamedByLine() {
        String message = assertThrows(FieldMapFormatException.class, () -> FieldMapCsv.readMatrix(
                new ByteArrayInputStream("1,2,3\n4,5,6\n7,8\n".getBytes(StandardCharsets.UTF_8)), "m.csv", Vec2.ZERO,
                new Vec2(1, 1), 1)).getMessage();
        assertEquals("m.csv:3: this row has 2 values, the first row (line 1) has 3; every row of a matrix needs the"
                + " same number", message);
    }

    @Test
    void sceneReadsMapsBesideItAndWritesThemBack(@TempDir Path folder) throws Exception {
        Files.writeString(folder.resolve("head.csv"), "0,1,2\n3,4,5\n6,7,8\n");
        Path sceneFile = folder.resolve("head.json");
        Files.writeString(sceneFile, """
                {"format": "kinduct-scene", "version": 1, "sources": [
                  {"kind": "field-map", "id": "head", "file": "head.csv", "layout": "matrix",
                   "origin": ["-1 mm", "-1 mm"], "spacing": ["1 mm", "1 mm"], "bzUnit": "1 mT", "offset": ["5 mm", 0]}]}
                """);
        Scene scene = SceneFiles.read(sceneFile);
        Source.FieldMap map = (Source.FieldMap) scene.sources().get(0);
        assertEquals(0.007, map.grid().at(1, 2), 1e-18, "row 2 is the third line: y = +1 mm");
        assertEquals(-0.001, map.grid().x0M(), 1e-18);
        SceneFiles.write(scene, sceneFile);
        assertEquals(scene, SceneFiles.read(sceneFile), "written and read back: an equal scene, samples and all");
    }

    @Test
    void unreadableMapIsAProblemAtTheFileField(@TempDir Path folder) throws Exception {
        Path sceneFile = folder.resolve("s.json");
        Files.writeString(sceneFile, "{\"format\": \"kinduct-scene\", \"version\": 1, \"sources\": [\n"
                + "  {\"kind\": \"field-map\", \"id\": \"head\", \"file\": \"missing.csv\"}]}\n");
        SceneFormatException e = assertThrows(SceneFormatException.class, () -> SceneFiles.read(sceneFile));
        List<Problem> problems = e.problems();
        assertEquals(1, problems.size());
        assertEquals("sources[0].file", problems.get(0).path());
        assertEquals(2, problems.get(0).line());
        assertEquals("cannot read field map " + folder.resolve("missing.csv") + ": " + folder.resolve("missing.csv")
                + ": no such file", problems.get(0).message());
    }
}
