package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * One case per kind of error. The expected position is found independently of the reader: it is
 * where a unique anchor text starts in the document (the offending value, or the enclosing object
 * for a missing field).
 */
class SceneJsonValidationTest {

    private static final String HEAD = "{\n  \"format\": \"kinduct-scene\",\n  \"version\": 1,\n";

    /** A scene document with {@code members} after the format and version lines. */
    private static String doc(String members) {
        return HEAD + members + "\n}\n";
    }

    private static Arguments error(String what, String text, String path, String anchor, String message) {
        return Arguments.of(what, text, path, anchor, message);
    }

    static Stream<Arguments> errors() {
        return Stream.of(
                error("syntax: missing comma", "{\"format\": \"kinduct-scene\" \"version\": 1}",
                        "", "\"version\"", "JSON syntax: Unexpected character ('\"' (code 34)): was expecting comma"),
                error("syntax: double comma", doc("  \"bodies\": [{\"id\": \"a\",, }]"),
                        "bodies[0]", ", }", "was expecting double-quote to start field name"),
                error("syntax: text after the scene", "{\"format\": \"kinduct-scene\", \"version\": 1} x",
                        "", "x", "Unrecognized token 'x'"),
                // Jackson places this error just after the offending token.
                error("syntax: NaN is not JSON", doc("  \"name\": NaN"),
                        "name", "\n}\n", "Non-standard token 'NaN'"),
                error("syntax: comment", doc("  // a comment\n  \"name\": \"x\""),
                        "", "//", "(JSON has no comments)"),
                error("empty input", "", "", "", "empty input"),
                error("not an object", "[1, 2]", "", "[1, 2]", "expected a scene object { \"format\": \"kinduct-scene\", ... }, got a list of 2"),
                error("another format", "{\"format\": \"other-thing\", \"version\": 1}",
                        "", "{\"format\"", "this is not a Kinduct scene: \"format\" is 'other-thing', expected 'kinduct-scene'"),
                error("newer version", "{\"format\": \"kinduct-scene\", \"version\": 2}",
                        "", "{\"format\"", "scene file version 2 is not supported; this program reads version 1 (the file is from a newer program)"),
                error("missing version", "{\"format\": \"kinduct-scene\"}",
                        "", "{\"format\"", "missing required field 'version'"),
                error("wrong type", doc("  \"name\": 5"), "name", "5\n", "expected a text in double quotes, got '5'"),
                error("null value", doc("  \"description\": null"), "description", "null", "got null"),
                error("missing required field", doc("  \"bodies\": [{\"name\": \"no id\"}]"),
                        "bodies[0]", "{\"name\"", "missing required field 'id'"),
                error("unknown field, close to a known one",
                        doc("  \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\", \"vertexes\": [[0, 0], [1, 0]]}]"),
                        "conductors[0].vertexes", "\"vertexes\"", "unknown field 'vertexes' (did you mean 'vertices'?)"),
                error("unknown field, nothing close", doc("  \"bodies\": [{\"id\": \"a\", \"colour\": \"red\"}]"),
                        "bodies[0].colour", "\"colour\"", "unknown field 'colour'; the fields here are id, name, pivot, motion"),
                error("unknown kind", doc("  \"conductors\": [{\"kind\": \"lop\", \"id\": \"w\"}]"),
                        "conductors[0].kind", "\"lop\"", "unknown value 'lop' (did you mean 'loop'?); use one of wire, loop"),
                error("missing kind", doc("  \"sources\": [{\"id\": \"s\"}]"),
                        "sources[0]", "{\"id\"", "missing required field 'kind'"),
                error("gravity in a unit of the wrong dimension", doc("  \"gravity\": [0, \"-9.81 m/s\"]"),
                        "gravity[1]", "\"-9.81 m/s\"",
                        "expected an acceleration such as"),
                error("gravity that is not a point", doc("  \"gravity\": -9.81"),
                        "gravity", "-9.81", "expected"),
                error("unit of the wrong dimension",
                        doc("  \"sources\": [{\"kind\": \"uniform-field\", \"id\": \"e\", \"bz\": \"5 mm\"}]"),
                        "sources[0].bz", "\"5 mm\"",
                        "expected a flux density such as '5 mT', got '5 mm' (mm is a unit of length)"),
                error("vertex is not a pair",
                        doc("  \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\", \"vertices\": [[0, 0], [0.01]]}]"),
                        "conductors[0].vertices[1]", "[0.01]", "expected [x, y] in metres, got a list of 1"),
                error("vertex of another type",
                        doc("  \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\", \"vertices\": [[0, 0], 7]}]"),
                        "conductors[0].vertices[1]", "7]", "expected [x, y] in metres, or {\"at\": [x, y], \"body\": id}, got '7'"),
                error("one size of a magnet",
                        doc("  \"sources\": [{\"kind\": \"block-magnet\", \"id\": \"m\", \"center\": [0, 0],"
                                + " \"size\": [\"10 mm\", \"10 mm\", \"5 T\"], \"standoff\": 0, \"remanence\": \"1.2 T\"}]"),
                        "sources[0].size[2]", "\"5 T\"", "expected a length such as '12 mm', got '5 T' (T is a unit of flux density)"),
                error("rule of a record", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\", \"vertices\": [[0, 0], [1, 0]]}]"),
                        "conductors[0]", "{\"kind\"", "a loop needs at least 3 vertices, got 2"),
                error("rule of a nested record", doc("  \"time\": {\"t0\": \"1 s\", \"t1\": \"0.5 s\"}"),
                        "time", "{\"t0\"", "t1 must be after t0, got t0 = 1.0 s, t1 = 0.5 s"),
                error("self-crossing outline", doc("  \"sources\": [{\"kind\": \"field-patch\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [1, 1], [1, 0], [0, 1]], \"bz\": 1}]"),
                        "sources[0]", "{\"kind\"", "field patch outline must not cross itself"),
                error("unknown body", doc("  \"bodies\": [{\"id\": \"carriage\"}],\n"
                                + "  \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\", \"body\": \"carrage\", \"vertices\": [[0, 0], [1, 0]]}]"),
                        "conductors[0].body", "\"carrage\"",
                        "unknown body 'carrage' (did you mean 'carriage'?); the bodies are fixed, carriage"),
                error("unknown body of a vertex", doc("  \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\","
                                + " \"vertices\": [[0, 0], {\"at\": [1, 0], \"body\": \"bar\"}]}]"),
                        "conductors[0].vertices[1].body", "\"bar\"", "unknown body 'bar'"),
                error("id used by a source and a conductor", doc("  \"sources\": [{\"kind\": \"uniform-field\", \"id\": \"x\", \"bz\": 0}],\n"
                                + "  \"conductors\": [{\"kind\": \"wire\", \"id\": \"x\", \"vertices\": [[0, 0], [1, 0]]}]"),
                        "conductors[0].id", "\"x\", \"vertices\"", "id 'x' is already used at sources[0].id (line 4)"),
                error("body declared twice", doc("  \"bodies\": [{\"id\": \"a\"},\n    {\"id\": \"a\", \"name\": \"again\"}]"),
                        "bodies[1].id", "\"a\", \"name\"", "body id 'a' is already used at bodies[0].id (line 4)"),
                error("the fixed frame declared", doc("  \"bodies\": [{\"id\": \"fixed\"}]"),
                        "bodies[0].id", "\"fixed\"", "'fixed' is the built-in fixed frame and cannot be declared"),
                error("field given twice", doc("  \"name\": \"a\",\n  \"name\": \"b\""),
                        "name", "\"b\"", "field 'name' appears twice (first on line 4)"),
                error("number out of range", doc("  \"time\": {\"t1\": 1e400}"),
                        "time.t1", "1e400", "number '1e400' is out of range"),
                error("not a whole number", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"turns\": 2.5}]"),
                        "conductors[0].turns", "2.5", "expected a whole number, got '2.5'"),
                error("whole number too large", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"turns\": 99999999999}]"),
                        "conductors[0].turns", "99999999999", "whole number '99999999999' is out of range"),
                error("bad id", doc("  \"bodies\": [{\"id\": \"my body\"}]"),
                        "bodies[0].id", "\"my body\"", "Body id must be 1-64 letters, digits, '_', '-' or '.', got 'my body'"),
                error("spring with anchor and body", doc("  \"bodies\": [{\"id\": \"a\", \"motion\": {\"kind\": \"free\", \"mass\": 1,"
                                + " \"springs\": [{\"anchor\": [0, 0], \"body\": \"a\", \"stiffness\": 1}]}}]"),
                        "bodies[0].motion.springs[0]", "{\"anchor\"", "a spring needs either \"anchor\": [x, y] or \"body\": id (the other body's pivot), not both"),
                error("coil without a shape", doc("  \"sources\": [{\"kind\": \"source-coil\", \"id\": \"c\", \"z\": \"-3 mm\", \"current\": {\"dc\": 1}}]"),
                        "sources[0]", "{\"kind\"", "a source coil needs either \"polygon\": [[x, y], ...] or \"circle\": {...}, not neither"),
                error("wire with gauge and diameter", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"wire\": {\"awg\": 30, \"diameter\": \"1 mm\"}}]"),
                        "conductors[0].wire", "{\"awg\"", "a wire needs either \"awg\" or \"diameter\", not both"),
                error("gauge out of range", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"wire\": {\"awg\": 99}}]"),
                        "conductors[0].wire", "{\"awg\"", "AWG gauge must be from -3 (0000) to 56, got 99"),
                error("not a boolean", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"open\": \"yes\"}]"),
                        "conductors[0].open", "\"yes\"", "expected true or false, got 'yes'"),
                error("plate electrode off the edge", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [\"40 mm\", 0], [\"40 mm\", \"20 mm\"], [0, \"20 mm\"]],"
                                + " \"thickness\": \"1 mm\", \"material\": \"copper\","
                                + " \"electrodes\": [{\"name\": \"a\", \"at\": [0, \"10 mm\"]}, {\"name\": \"b\", \"at\": [\"20 mm\", \"10 mm\"]}]}]"),
                        "conductors[0].electrodes[1]", "{\"name\": \"b\"",
                        "electrode 'b' at (0.02, 0.01) m is not on the plate's edge (outline or a hole)"),
                error("pair naming an unknown electrode", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [\"40 mm\", 0], [\"40 mm\", \"20 mm\"], [0, \"20 mm\"]],"
                                + " \"thickness\": \"1 mm\", \"material\": \"copper\","
                                + " \"electrodes\": [{\"name\": \"left\", \"at\": [0, \"10 mm\"]}, {\"name\": \"right\", \"at\": [\"40 mm\", \"10 mm\"]}],"
                                + " \"pairs\": [{\"plus\": \"left\", \"minus\": \"rigth\"}]}]"),
                        "conductors[0].pairs[0].minus", "\"rigth\"",
                        "unknown electrode 'rigth' (did you mean 'right'?); the electrodes are left, right"),
                error("plate cell too fine to fit in memory", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [\"40 mm\", 0], [\"40 mm\", \"20 mm\"], [0, \"20 mm\"]],"
                                + " \"thickness\": \"1 mm\", \"material\": \"copper\", \"cell\": \"1 um\"}]"),
                        "conductors[0]", "{\"kind\": \"plate\"",
                        // 40 mm × 20 mm in 1 µm cells: 40 000 × 20 000 = 8e8 cells, above 2^21 = 2 097 152.
                        "a cell of 1.0E-6 m gives about 8.00e+08 cells over this conductor; at most 2097152 are"
                                + " allowed: choose a cell of at least 1.95e-05 m"),
                error("plate with material and conductivity", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [1, 0], [0, 1]], \"thickness\": \"1 mm\", \"material\": \"copper\","
                                + " \"conductivity\": \"58 MS/m\"}]"),
                        "conductors[0]", "{\"kind\": \"plate\"",
                        "a plate needs either \"material\" (copper, aluminium) or \"conductivity\", not both"),
                error("temperature with a given conductivity", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [1, 0], [0, 1]], \"thickness\": \"1 mm\", \"conductivity\": \"58 MS/m\","
                                + " \"temperature\": \"80 degC\"}]"),
                        "conductors[0]", "{\"kind\": \"plate\"", "a given \"conductivity\" is taken as it is"),
                error("conductivity in a unit of the wrong dimension", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [1, 0], [0, 1]], \"thickness\": \"1 mm\", \"conductivity\": \"5 mS\"}]"),
                        "conductors[0].conductivity", "\"5 mS\"",
                        "expected a conductivity such as '35 MS/m', got '5 mS' (unknown unit 'mS'"),
                error("hole outside the plate", doc("  \"conductors\": [{\"kind\": \"plate\", \"id\": \"p\","
                                + " \"outline\": [[0, 0], [1, 0], [1, 1], [0, 1]], \"holes\": [[[0.5, 0.5], [1.5, 0.5], [1.5, 0.6]]],"
                                + " \"thickness\": \"1 mm\", \"material\": \"aluminium\"}]"),
                        "conductors[0]", "{\"kind\": \"plate\"", "hole 0 must lie inside the outline"),
                error("unknown flow profile", doc("  \"conductors\": [{\"kind\": \"channel\", \"id\": \"c\","
                                + " \"start\": [0, 0], \"end\": [\"100 mm\", 0], \"width\": \"20 mm\", \"depth\": \"20 mm\","
                                + " \"conductivity\": \"500 uS/cm\", \"profile\": \"turbulant\", \"flow\": {\"kind\": \"steady\", \"velocity\": \"1 m/s\"}}]"),
                        "conductors[0].profile", "\"turbulant\"",
                        "unknown value 'turbulant' (did you mean 'turbulent'?); use one of plug, laminar, turbulent"),
                error("channel electrode off the walls", doc("  \"conductors\": [{\"kind\": \"channel\", \"id\": \"c\","
                                + " \"start\": [0, 0], \"end\": [\"100 mm\", 0], \"width\": \"20 mm\", \"depth\": \"20 mm\","
                                + " \"conductivity\": \"500 uS/cm\", \"profile\": \"plug\", \"flow\": {\"kind\": \"steady\", \"velocity\": \"1 m/s\"},"
                                + " \"electrodes\": [{\"name\": \"inlet\", \"at\": [0, 0]}]}]"),
                        "conductors[0].electrodes[0]", "{\"name\": \"inlet\"",
                        "electrode 'inlet' at (0.0, 0.0) m is not on a wall of the channel"),
                error("flow keys out of order", doc("  \"conductors\": [{\"kind\": \"channel\", \"id\": \"c\","
                                + " \"start\": [0, 0], \"end\": [\"100 mm\", 0], \"width\": \"20 mm\", \"depth\": \"20 mm\","
                                + " \"conductivity\": \"500 uS/cm\", \"profile\": \"plug\","
                                + " \"flow\": {\"kind\": \"keys\", \"keys\": [{\"t\": \"2 s\", \"velocity\": 0}, {\"t\": \"1 s\", \"velocity\": 1}]}}]"),
                        "conductors[0].flow", "{\"kind\": \"keys\"", "flow key times must increase: key 1 at 1.0 s follows 2.0 s"),
                error("unknown choice", doc("  \"sources\": [{\"kind\": \"cylinder-magnet\", \"id\": \"m\", \"center\": [0, 0],"
                                + " \"radius\": \"5 mm\", \"height\": \"3 mm\", \"standoff\": 0, \"side\": \"left\", \"remanence\": 1}]"),
                        "sources[0].side", "\"left\"", "unknown value 'left'; use one of below, above"),
                // Inputs the solver could not make sense of, refused where they are written.
                error("magnet a googol metres away", doc("  \"sources\": [{\"kind\": \"cylinder-magnet\", \"id\": \"m\","
                                + " \"center\": [1e100, 0], \"radius\": \"5 mm\", \"height\": \"3 mm\", \"standoff\": 0,"
                                + " \"remanence\": 1}]"),
                        "sources[0].center[0]", "1e100", "'1e100' is out of range: quantities are at most 1e12 in size in"
                                + " SI units (here metres)"),
                error("extreme stand-off in a unit", doc("  \"sources\": [{\"kind\": \"block-magnet\", \"id\": \"m\","
                                + " \"center\": [0, 0], \"size\": [0.01, 0.01, 0.005], \"standoff\": \"1e300 mm\","
                                + " \"remanence\": 1}]"),
                        "sources[0].standoff", "\"1e300 mm\"", "is out of range"),
                error("coil next to the plane", doc("  \"sources\": [{\"kind\": \"source-coil\", \"id\": \"c\","
                                + " \"circle\": {\"center\": [0, 0], \"radius\": 0.01}, \"z\": 1e-300, \"current\": {\"dc\": 1}}]"),
                        "sources[0]", "{\"kind\"", "a source coil's distance from the drawing plane must be at least 1 nm,"
                                + " got 1.0E-300 m"),
                error("wire thinner than an atom", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [0, 1]], \"wire\": {\"diameter\": \"1e-300 mm\"}}]"),
                        "conductors[0].wire", "{\"diameter\"", "wire diameter must be at least 1 nm, got 1.0E-303 m"),
                error("repeated vertex", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [1, 0], [1, 0], [0, 1]]}]"),
                        "conductors[0]", "{\"kind\"", "vertex 2 repeats vertex 1 at 1.0, 0.0 m"),
                error("sides closer than the wire", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [0.1, 0], [0.1, 0.002], [0.05, 0.0001], [0, 0.002]],"
                                + " \"wire\": {\"diameter\": \"1 mm\"}}]"),
                        "conductors[0]", "{\"kind\"", "side 0 and side 3 run closer than the wire radii allow (0.001 m)"),
                error("side shorter than a few wire radii", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [0.1, 0], [0.1, 0.001], [0, 0.1]], \"wire\": {\"diameter\": \"1 mm\"}}]"),
                        "conductors[0]", "{\"kind\"", "side 1 is 0.001 m long, shorter than 4.0 wire radii (0.002 m)"),
                error("sides folding back", doc("  \"conductors\": [{\"kind\": \"loop\", \"id\": \"l\","
                                + " \"vertices\": [[0, 0], [0.2, 0], [0, 0.0005], [-0.1, 0.05]], \"wire\": {\"diameter\": \"2 mm\"}}]"),
                        "conductors[0]", "{\"kind\"", "side 0 and side 1 run closer than the wire radii allow (0.002 m)"),
                error("winding colder than copper's resistivity model", doc("  \"conductors\": [{\"kind\": \"loop\","
                                + " \"id\": \"l\", \"vertices\": [[0, 0], [1, 0], [0, 1]], \"temperature\": \"-240 degC\"}]"),
                        "conductors[0]", "{\"kind\"", "temperature -240.0 °C is below the range of the linear resistivity"
                                + " model of copper, whose resistivity reaches zero at -234.45"),
                error("times too large for the step", doc("  \"time\": {\"t0\": 1e11, \"t1\": 100000000001, \"dt\": \"1 ms\"}"),
                        "time", "{\"t0\"", "times as large as 1.00000000001E11 s are resolved only to 1.52587890625E-5 s,"
                                + " too coarse for dt = 0.001 s"),
                error("free body too stiff for its window", doc("  \"time\": {\"t1\": \"1 s\"},\n  \"bodies\": [{\"id\": \"b\","
                                + " \"motion\": {\"kind\": \"free\", \"mass\": \"1 g\", \"damping\": 1e11}}]"),
                        "bodies[0].motion", "{\"id\": \"b\"", "this free body responds too fast for the time window:"
                                + " damping rate c/m and spring frequency √(k/m) reach 1.00e+14 /s"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("errors")
    void reportsEachKindOfErrorAtItsPathAndPosition(String what, String text, String path, String anchor,
                                                     String message) {
        SceneFormatException e = assertThrows(SceneFormatException.class, () -> SceneJson.read(text, "case.json"));

        List<Problem> problems = e.problems();
        Problem p = problems.stream().filter(q -> q.message().contains(message)).findFirst()
                .orElseThrow(() -> new AssertionError(what + ": no problem says \"" + message + "\" in\n" + e.getMessage()));
        int[] lineColumn = position(text, anchor, what);
        assertEquals(path, p.path(), what);
        assertEquals(lineColumn[0], p.line(), () -> what + ": line of " + p);
        assertEquals(lineColumn[1], p.column(), () -> what + ": column of " + p);
    }

    /** 1-based line and column where {@code anchor} starts; it must occur once (or be empty: 1:1). */
    private static int[] position(String text, String anchor, String what) {
        if (anchor.isEmpty()) {
            return new int[] {1, 1};
        }
        int at = text.indexOf(anchor);
        assertTrue(at >= 0, what + ": anchor not in text");
        assertEquals(-1, text.indexOf(anchor, at + 1), what + ": anchor " + anchor + " is not unique");
        String before = text.substring(0, at);
        int line = 1 + (int) before.chars().filter(c -> c == '\n').count();
        return new int[] {line, at - before.lastIndexOf('\n')};
    }

    @Test
    void reportsTooDeepNestingAsASyntaxError() {
        SceneFormatException e = assertThrows(SceneFormatException.class,
                () -> SceneJson.read("[".repeat(100), "deep.json"));

        assertEquals(1, e.problems().size());
        assertTrue(e.problems().get(0).message().contains("nesting depth (65) exceeds the maximum allowed (64)"),
                e.getMessage());
    }

    @Test
    void reportsEveryProblemOfAFileInDocumentOrder() {
        String text = doc(String.join("\n",
                "  \"name\": 1,",
                "  \"bodies\": [{\"id\": \"cart\", \"motion\": {\"kind\": \"glide\", \"velocity\": [\"1 m/s\", \"2 mm\"]}}],",
                "  \"sources\": [{\"kind\": \"uniform-field\", \"id\": \"earth\", \"bz\": \"-45 uT\", \"body\": \"cart\"}],",
                "  \"conductors\": [{\"kind\": \"wire\", \"id\": \"earth\", \"body\": \"cat\", \"vertices\": [[0, 0]]}]"));

        SceneFormatException e = assertThrows(SceneFormatException.class, () -> SceneJson.read(text, "carriage.json"));

        assertEquals(List.of(
                at(text, "1,\n  \"bodies\"") + "name: expected a text in double quotes, got '1'",
                at(text, "\"2 mm\"") + "bodies[0].motion.velocity[1]: expected a velocity such as '0.5 m/s', got '2 mm'"
                        + " (mm is a unit of length)",
                at(text, "\"body\": \"cart\"") + "sources[0].body: unknown field 'body'; the fields here are kind, id, bz, earth",
                at(text, "{\"kind\": \"wire\"") + "conductors[0]: a wire needs at least 2 vertices, got 1",
                at(text, "\"earth\", \"body\"") + "conductors[0].id: id 'earth' is already used at sources[0].id (line 6)",
                at(text, "\"cat\"") + "conductors[0].body: unknown body 'cat' (did you mean 'cart'?); the bodies are fixed, cart"),
                List.of(e.getMessage().split("\n")));
        assertEquals(6, e.problems().size());
        assertEquals("carriage.json", e.sourceName());
    }

    private static String at(String text, String anchor) {
        int[] p = position(text, anchor, anchor);
        return "carriage.json:" + p[0] + ":" + p[1] + ": ";
    }
}
