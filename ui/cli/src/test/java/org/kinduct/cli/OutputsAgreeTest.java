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
 * EMFs, currents and senses, and the same drags and electrode voltages of plates and channels, in
 * all three files, and the picture shows the instant of the largest EMF or electrode voltage (the
 * default {@code --at peak}; the largest Joule power where there is no voltage), for every demo and for a
 * loop whose inductance matters (200 turns, 100 × 100 mm, 1 mm copper wire, gliding at 1 m/s into a
 * 0.5 T patch: L/R of some milliseconds, so its current lags the EMF and the run is inductive). The
 * picture's tables are read from the SVG, which is drawn from the same page as the PNG.
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
        JsonNode plates = results.get("plates");
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
        for (JsonNode p : plates) {
            byTime.computeIfAbsent(p.get("t").asDouble(), t -> new HashMap<>()).put(p.get("id").asText(), p);
        }
        assertEquals(byTime.size(), lines.size() - 1, "one CSV row per sampled time");
        int compared = 0;
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            Map<String, JsonNode> at = byTime.get(Double.parseDouble(cells[0]));
            for (int col = 1; col < cells.length; col++) {
                String[] idQuantity = header.get(col).split("\\.", 2);
                JsonNode value = jsonValue(at.get(idQuantity[0]), idQuantity[1]);
                if (value != null && !cells[col].isEmpty()) {
                    assertEquals(value.asDouble(), Double.parseDouble(cells[col]), 0.0,
                            name + " " + header.get(col) + " at t = " + cells[0]);
                    compared++;
                }
            }
        }
        assertTrue(compared >= lines.size() - 1, name + ": compared " + compared + " values");

        // The picture shows, by default, the earliest sample of largest |EMF| or pair voltage (of
        // largest Joule power without either); its tables hold the JSON's values there.
        double t = peakTime(samples, plates);
        List<String> texts = texts(Files.readString(svg));
        assertTrue(texts.contains("t = " + Quantities.time(t)), name + ": the picture shows the peak at t = " + t);
        checkPlates(name, plates, t, texts);
        if (samples.isEmpty()) {
            return;
        }
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

    /**
     * The value a wide-CSV column names in a JSON entry: a key of it, a component of the drag, or
     * the voltage of the pair {@code plus-minus}; null where the entry has none.
     */
    private static JsonNode jsonValue(JsonNode entry, String quantity) {
        if (quantity.equals("drag_x_N") || quantity.equals("drag_y_N")) {
            return entry.get("drag_N").get(quantity.equals("drag_x_N") ? 0 : 1);
        }
        if (quantity.endsWith(".voltage_V")) {
            String[] electrodes = quantity.substring(0, quantity.length() - ".voltage_V".length()).split("-", 2);
            for (JsonNode pair : entry.get("pairs")) {
                if (pair.get("plus").asText().equals(electrodes[0]) && pair.get("minus").asText().equals(electrodes[1])) {
                    return pair.get("voltage_V");
                }
            }
            return null;
        }
        return entry.get(quantity);
    }

    /**
     * The instant the picture shows by default (ExportInstant.Peak's rule, from the JSON alone): the
     * largest |EMF| or |pair voltage| (else the plates' Joule power); of the samples within 1e-6 of it (a plateau),
     * the earliest where no loop is at a field edge (every disagreement a number), else the earliest.
     */
    private static double peakTime(JsonNode samples, JsonNode plates) {
        boolean volts = !samples.isEmpty();
        for (JsonNode p : plates) {
            volts |= !p.get("pairs").isEmpty();
        }
        Map<Double, Double> largest = new java.util.TreeMap<>();
        Map<Double, Boolean> checked = new HashMap<>();
        for (JsonNode s : samples) {
            double t = s.get("t").asDouble();
            largest.merge(t, Math.abs(s.get("emf_V").asDouble()), Math::max);
            checked.merge(t, !s.get("disagreement").isNull(), Boolean::logicalAnd);
        }
        for (JsonNode p : plates) {
            double t = p.get("t").asDouble();
            double value = p.get("joule_W").asDouble();
            if (volts) {
                value = 0;
                for (JsonNode pair : p.get("pairs")) {
                    value = Math.max(value, Math.abs(pair.get("voltage_V").asDouble()));
                }
            }
            largest.merge(t, value, Math::max);
            checked.putIfAbsent(t, true);
        }
        double peak = largest.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        Double first = null;
        for (Map.Entry<Double, Double> e : largest.entrySet()) {
            if (e.getValue() >= (1 - 1e-6) * peak) {
                if (checked.get(e.getKey())) {
                    return e.getKey();
                }
                first = first == null ? e.getKey() : first;
            }
        }
        return first;
    }

    /**
     * The picture's plate table (force and its direction) and electrode table (voltage and +
     * electrode) hold what the JSON has at {@code t}.
     */
    private static void checkPlates(String name, JsonNode plates, double t, List<String> texts) {
        double largestDrag = 0;
        double largestVoltage = 0;
        for (JsonNode p : plates) {
            largestDrag = Math.max(largestDrag, Math.hypot(p.get("drag_N").get(0).asDouble(),
                    p.get("drag_N").get(1).asDouble()));
            for (JsonNode pair : p.get("pairs")) {
                largestVoltage = Math.max(largestVoltage, Math.abs(pair.get("voltage_V").asDouble()));
            }
        }
        for (JsonNode p : plates) {
            if (p.get("t").asDouble() != t) {
                continue;
            }
            String id = p.get("id").asText();
            int row = texts.lastIndexOf(id);
            assertTrue(row > texts.indexOf("plate/channel"), name + ": a plate table row for " + id);
            double drag = Math.hypot(p.get("drag_N").get(0).asDouble(), p.get("drag_N").get(1).asDouble());
            assertPrinted(drag, largestDrag, texts.get(row + 1).replaceAll(" ∠.*", ""), Dimension.FORCE,
                    name + " " + id + " drag");
            for (JsonNode pair : p.get("pairs")) {
                int at = texts.indexOf(id + ": " + pair.get("plus").asText() + " − " + pair.get("minus").asText());
                assertTrue(at > 0, name + ": an electrode row for " + id + " in " + texts);
                assertPrinted(pair.get("voltage_V").asDouble(), largestVoltage, texts.get(at + 1), Dimension.VOLTAGE,
                        name + " " + id + " voltage");
                String positive = pair.get("positive").asText();
                assertEquals(Labels.positiveElectrode(positive.equals("none") ? java.util.Optional.empty()
                        : java.util.Optional.of(positive)), texts.get(at + 2), name + " " + id + " + electrode");
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
