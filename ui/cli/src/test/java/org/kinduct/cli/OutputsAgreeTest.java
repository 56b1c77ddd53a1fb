package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.demo.Demos;
import org.kinduct.render.paint.Quantities;
import org.kinduct.report.Labels;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.Terminal;
import org.w3c.dom.NodeList;

/**
 * One export, one truth: {@code kinduct export --csv --json --svg} of one scene writes the same
 * EMFs, currents and senses in all three files, and the picture shows the instant of the largest
 * EMF (the default {@code --at peak}), for every demo and for a loop whose inductance
 * matters (200 turns, 100 × 100 mm, 1 mm copper wire, gliding at 1 m/s into a 0.5 T patch: L/R
 * of some milliseconds, so its current lags the EMF and the run is inductive). The picture's
 * table is read from the SVG, which is drawn from the same page as the PNG.
 */
class OutputsAgreeTest {

    /** The picture prints three significant digits. */
    private static final double PRINTED = 5e-3;
    /** What the picture's table shows in a cell that does not apply. */
    private static final String NOT_APPLICABLE = "—";
    private static final List<String> HEADINGS = List.of("conductor", "Φ per turn", "EMF", "methods agree", "I",
            "polarity / sense", "force, direction");

    @TempDir
    Path dir;

    static Stream<String> scenes() {
        return Stream.concat(Demos.names().stream(), Stream.of("inductive-loop"));
    }

    private static final String INDUCTIVE_LOOP = """
            {"format": "kinduct-scene", "version": 1, "name": "inductive loop",
             "time": {"t0": 0, "t1": "0.2 s", "dt": "2 ms"},
             "bodies": [{"id": "cart", "pivot": [0, 0], "motion": {"kind": "glide", "velocity": ["1 m/s", 0]}}],
             "sources": [{"kind": "field-patch", "id": "gap", "bz": "0.5 T",
               "outline": [[0.05, -1], [2, -1], [2, 1], [0.05, 1]]}],
             "conductors": [
               {"kind": "loop", "id": "coil", "body": "cart",
                "vertices": [[-0.1, -0.05], [0, -0.05], [0, 0.05], [-0.1, 0.05]],
                "turns": 200, "wire": {"material": "copper", "diameter": "1 mm"}}]}
            """;

    @ParameterizedTest
    @MethodSource("scenes")
    void csvJsonAndPictureShowTheSameNumbers(String name) throws Exception {
        List<String> source = new ArrayList<>();
        if (name.equals("inductive-loop")) {
            source.add(Files.writeString(dir.resolve("loop.json"), INDUCTIVE_LOOP).toString());
        } else {
            source.addAll(List.of("--demo", name));
        }
        Path json = dir.resolve(name + ".json");
        Path csv = dir.resolve(name + ".csv");
        Path svg = dir.resolve(name + ".svg");
        List<String> args = new ArrayList<>(List.of("export"));
        args.addAll(source);
        args.addAll(List.of("--json", json.toString(), "--csv", csv.toString(), "--svg", svg.toString()));
        assertEquals(KinductMain.OK, KinductMain.run(args.toArray(String[]::new)));
        JsonNode results = new ObjectMapper().readTree(json.toFile());
        JsonNode samples = results.get("samples");
        if (name.equals("inductive-loop")) {
            assertEquals("inductive", results.get("circuit_model").asText(), "the lag is what this case is about");
        }

        // CSV and JSON: identical numbers at every time (both print Java's shortest round-trip decimal).
        List<String> lines = Files.readAllLines(csv);
        List<String> header = List.of(lines.get(0).split(",", -1));
        Map<Double, Map<String, JsonNode>> byTime = new HashMap<>();
        for (JsonNode s : samples) {
            byTime.computeIfAbsent(s.get("t").asDouble(), t -> new HashMap<>()).put(s.get("id").asText(), s);
        }
        assertEquals(byTime.size(), lines.size() - 1, "one CSV row per sampled time");
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            Map<String, JsonNode> at = byTime.get(Double.parseDouble(cells[0]));
            for (int col = 1; col < cells.length; col++) {
                String[] idQuantity = header.get(col).split("\\.", 2);
                JsonNode value = at.get(idQuantity[0]).get(idQuantity[1]);
                if (value != null && !cells[col].isEmpty()) {
                    assertEquals(value.asDouble(), Double.parseDouble(cells[col]), 0.0,
                            name + " " + header.get(col) + " at t = " + cells[0]);
                }
            }
        }

        // The picture shows, by default, the peak |EMF|: of the samples within 1e-6 of it (a flat top),
        // the earliest where every conductor's flux rule is a check, else the earliest.
        Map<Double, Double> largest = new java.util.TreeMap<>();
        Map<Double, Boolean> comparable = new java.util.TreeMap<>();
        for (JsonNode s : samples) {
            double at = s.get("t").asDouble();
            largest.merge(at, Math.abs(s.get("emf_V").asDouble()), Math::max);
            comparable.merge(at, !s.get("disagreement").isNull(), Boolean::logicalAnd);
        }
        double peak = largest.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        List<Double> flatTop = largest.entrySet().stream().filter(e -> e.getValue() >= (1 - 1e-6) * peak)
                .map(Map.Entry::getKey).toList();
        double t = flatTop.stream().filter(comparable::get).findFirst().orElse(flatTop.get(0));
        List<String> texts = texts(Files.readString(svg));
        assertTrue(texts.contains("t = " + Quantities.time(t)), name + ": the picture shows the peak at t = " + t);
        Map<String, Map<String, String>> table = table(texts);
        for (JsonNode s : samples) {
            if (s.get("t").asDouble() != t) {
                continue;
            }
            String id = s.get("id").asText();
            Map<String, String> row = table.get(id);
            assertTrue(row != null, name + ": a table row for " + id + " in " + table);
            boolean closedLoop = row.containsKey("I") && !row.get("I").equals(NOT_APPLICABLE);
            String sense = closedLoop ? Labels.sense(circulation(s.get("direction").asText()))
                    : Labels.polarity(terminal(s.get("positive_end").asText()), s.get("kind").asText().equals("loop"));
            assertEquals(sense, row.get("polarity / sense"), name + " " + id + " sense or polarity at t = " + t);
            assertPrinted(s.get("emf_V").asDouble(), largest(samples, "emf_V"), row.get("EMF"), Dimension.VOLTAGE,
                    name + " " + id + " EMF");
            if (closedLoop) {
                assertPrinted(s.get("current_A").asDouble(), largest(samples, "current_A"), row.get("I"),
                        Dimension.CURRENT, name + " " + id + " current");
            }
        }
    }

    /** The picture's results table: conductor id → column heading → cell (columns without any value are left out). */
    private static Map<String, Map<String, String>> table(List<String> texts) {
        int start = texts.indexOf("conductor");
        int columns = 0;
        while (HEADINGS.contains(texts.get(start + columns))) {
            columns++;
        }
        Map<String, Map<String, String>> rows = new HashMap<>();
        for (int at = start + columns; at + columns <= texts.size(); at += columns) {
            Map<String, String> row = new HashMap<>();
            for (int c = 0; c < columns; c++) {
                row.put(texts.get(start + c), texts.get(at + c));
            }
            if (row.get("polarity / sense") == null || !row.get("polarity / sense").matches("[+↺↻n].*")) {
                break;
            }
            rows.put(texts.get(at), row);
        }
        return rows;
    }

    /**
     * The printed value equals the exact one to its three significant digits; a printed 0 stands
     * for rounding noise, at most a billionth of the run's largest value (the reporting rule).
     */
    private static void assertPrinted(double exact, double largest, String printed, Dimension unit, String what) {
        double shown = Units.parse(printed.replace(" *", "").replace('−', '-'), unit);
        if (shown == 0) {
            assertTrue(Math.abs(exact) <= 1e-9 * largest, what + ": printed 0 for " + exact);
            return;
        }
        assertEquals(exact, shown, PRINTED * Math.abs(exact), what + ": printed " + printed);
    }

    private static double largest(JsonNode samples, String key) {
        double m = 0;
        for (JsonNode s : samples) {
            if (s.hasNonNull(key)) {
                m = Math.max(m, Math.abs(s.get(key).asDouble()));
            }
        }
        return m;
    }

    private static Circulation circulation(String json) {
        return switch (json) {
            case "ccw" -> Circulation.CCW;
            case "cw" -> Circulation.CW;
            default -> Circulation.NONE;
        };
    }

    private static Terminal terminal(String json) {
        return switch (json) {
            case "first" -> Terminal.FIRST;
            case "last" -> Terminal.LAST;
            default -> Terminal.NONE;
        };
    }

    private static List<String> texts(String svg) throws Exception {
        var f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        NodeList nodes = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)))
                .getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add(nodes.item(i).getTextContent());
        }
        return out;
    }

}
