package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.kinduct.cli.CliRun.Result;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code kinduct solve} as a user runs it: results in each format, the + end and current sense
 * by the textbook cases, and exit code 1 with a located message for bad input.
 */
class SolveOutputTest {

    @TempDir
    Path dir;



    @Test
    void tableNamesThePositiveEndOfTheSenseTrace() {
        Result r = CliRun.run("solve", "--demo", "drive-sense-wire");
        assertEquals(KinductMain.OK, r.code(), r.err());
        // 0.35 T · 20 mm · 2π·20 Hz·8 mm = 7.04 mV, upper (last) end + while moving right (Griffiths ch. 7).
        assertTrue(r.out().contains("7.04 mV"), r.out());
        assertTrue(r.out().contains("+ at last end"), r.out());
    }

    @Test
    void frameFallingCentredInASymmetricGapHasNoSidewaysSpeed() {
        Result r = CliRun.run("solve", "--demo", "frame-brake");
        assertEquals(KinductMain.OK, r.code(), r.err());
        // Frame and pole gap are mirror images about x = 0, so the magnetic forces on the two
        // uprights cancel and the fall stays vertical (symmetry; common practice): the sideways
        // velocity, computed as rounding noise beside the fall, reads zero.
        assertTrue(r.out().contains("velocity (0.00 m/s, −"), r.out());
    }

    @Test
    void jsonHasOneSampleObjectPerConductorPerTimeWithTheDocumentedKeys() throws IOException {
        Path out = dir.resolve("r.json");
        Result r = CliRun.run("solve", "--demo", "rail-sled", "--t0", "50 ms", "--t1", "60 ms", "--dt", "5 ms",
                "--format", "json", "--out", out.toString());
        assertEquals(KinductMain.OK, r.code(), r.err());
        Map<String, Object> first = firstSample(Files.readString(out));
        for (String key : new String[] {"t", "id", "kind", "flux_Wb", "linkage_Wb", "emf_flux_V", "emf_motional_V",
                "emf_V", "positive_end", "current_A", "direction", "force_N"}) {
            assertTrue(first.containsKey(key), "sample lacks " + key + ": " + first.keySet());
        }
        assertEquals("rail-circuit", first.get("id"));
        assertEquals("loop", first.get("kind"));
        assertEquals("cw", first.get("direction"), "flux out of the board grows: current clockwise (Lenz)");
        // EMF = −B·w·v along the counter-clockwise vertex order (Griffiths ch. 7).
        assertEquals(-0.5 * 0.020 * 0.5, (Double) first.get("emf_V"), 1e-12);
        assertEquals((Double) first.get("emf_V"), (Double) first.get("emf_flux_V"), 1e-9);
    }

    @Test
    void plateEntriesBalanceHeatAgainstTheDragsWork() throws IOException {
        // The product path for plates: the JSON's Joule power is the mechanical power the drag takes
        // from the carriage, −F·v (energy conservation, Griffiths, Introduction to Electrodynamics,
        // 4th ed., 2013, §8.1), to the solve's residual.
        Result r = CliRun.run("solve", "--demo", "plate-brake", "--at", "20 ms", "--format", "json");
        assertEquals(KinductMain.OK, r.code(), r.err());
        JsonNode plates = new ObjectMapper().readTree(r.out()).get("plates");
        assertEquals(2, plates.size());
        for (JsonNode p : plates) {
            for (String key : new String[] {"t", "id", "kind", "drag_N", "torque_Nm", "pivot_m", "joule_W",
                    "peak_current_density_A_per_m2", "reynolds_magnetic", "resistive_limit", "mean_velocity_mps",
                    "cell_m", "induced_e_included", "electrodes", "pairs"}) {
                assertTrue(p.has(key), p.get("id") + " lacks " + key);
            }
            double heat = p.get("joule_W").asDouble();
            assertEquals(heat, -p.get("drag_N").get(0).asDouble() * 0.5, 1e-8 * heat, p.get("id") + ": P = −F·v");
            assertTrue(p.get("resistive_limit").asBoolean(), "Rm " + p.get("reynolds_magnetic"));
        }
    }

    @Test
    void channelPairNamesItsPositiveElectrodeInJsonAndCsv() throws IOException {
        Result json = CliRun.run("solve", "--demo", "flow-electrodes", "--at", "0.6 s", "--format", "json");
        assertEquals(KinductMain.OK, json.code(), json.err());
        JsonNode pair = new ObjectMapper().readTree(json.out()).get("plates").get(0).get("pairs").get(0);
        assertEquals("upper", pair.get("plus").asText());
        assertEquals("upper", pair.get("positive").asText(), "v × B pushes + charge to the upper wall (B into the board)");
        assertEquals(pair.get("voltage_V").asDouble() / pair.get("ideal_voltage_V").asDouble(),
                pair.get("end_shorting").asDouble(), 1e-15);
        Result csv = CliRun.run("solve", "--demo", "flow-electrodes", "--at", "0.6 s", "--format", "csv");
        List<String> lines = csv.out().lines().toList();
        assertTrue(lines.get(0).endsWith(",plus,minus,voltage_V,positive,ideal_voltage_V,end_shorting"), lines.get(0));
        assertEquals(lines.get(0).split(",", -1).length, lines.get(1).split(",", -1).length, "every row fills the header");
        assertTrue(lines.get(1).contains(",duct,channel,") && lines.get(1).contains(",resistive-limit,upper,lower,"),
                lines.get(1));
        assertEquals(pair.get("voltage_V").asDouble(), Double.parseDouble(lines.get(1).split(",", -1)[22]),
                1e-9 * pair.get("voltage_V").asDouble(), "CSV and JSON voltage");
    }

    @Test
    void tableGivesEachPlatesDragAndHeatAndEachPairsPositiveElectrode() {
        Result brake = CliRun.run("solve", "--demo", "plate-brake");
        assertEquals(KinductMain.OK, brake.code(), brake.err());
        // The demo's answer: 3.03 N and 1.51 W solid, 2.35 N and 1.18 W slotted (heat = drag × 0.5 m/s).
        assertTrue(brake.out().matches("(?s).*solid-plate +plate +3\\.03 N .* 1\\.51 W .*"), brake.out());
        assertTrue(brake.out().matches("(?s).*slotted-plate +plate +2\\.35 N .* 1\\.18 W .*"), brake.out());
        Result flow = CliRun.run("solve", "--demo", "flow-electrodes");
        assertTrue(flow.out().matches("(?s).*duct +upper − lower +14\\.9 mV .*\\+ at upper +84\\.6 %.*"), flow.out());
    }

    /** 5 mm copper at 5 m/s past a magnet, the plate on the cart or the magnet on it. */
    private Path fastPlate(String name, String plateBody, String magnetBody) throws IOException {
        return Files.writeString(dir.resolve(name + ".json"), """
                {"format": "kinduct-scene", "version": 1, "name": "fast plate", "time": {"t0": 0, "t1": "1 ms", "dt": "1 ms"},
                 "bodies": [{"id": "cart", "motion": {"kind": "glide", "velocity": ["5 m/s", 0]}}],
                 "sources": [{"kind": "block-magnet", "id": "m", "body": "%s", "center": [0, 0], "size": ["10 mm", "10 mm", "5 mm"],
                   "standoff": "2 mm", "remanence": "1.2 T"}],
                 "conductors": [{"kind": "plate", "id": "disc", "body": "%s", "thickness": "5 mm", "material": "copper",
                   "outline": [["-30 mm", "-20 mm"], ["30 mm", "-20 mm"], ["30 mm", "20 mm"], ["-30 mm", "20 mm"]]}]}
                """.formatted(magnetBody, plateBody));
    }

    @Test
    void aFastThickCopperPlateIsSolvedWithItsOwnFieldOrFlaggedWhereThatModelDoesNotApply() throws IOException {
        // Rm = μ0·σ·d·v = 1.26e-6 · 5.8e7 · 0.005 · 5 = 1.8, far above 0.1. A plate gliding past a
        // still magnet has a steady state with its own field; a magnet gliding over a still plate
        // makes a field that is not still, left to the resistive limit and flagged.
        Path gliding = fastPlate("gliding", "cart", "fixed");
        Result table = CliRun.run("solve", gliding.toString());
        assertEquals(KinductMain.OK, table.code(), table.err());
        assertTrue(table.out().matches("(?s).*disc +plate .* 1\\.8  own field included\n.*"), table.out());
        JsonNode plate = new ObjectMapper().readTree(CliRun.run("solve", gliding.toString(), "--format", "json").out())
                .get("plates").get(0);
        assertFalse(plate.get("resistive_limit").asBoolean());
        assertEquals("own-field", plate.get("eddy_model").asText());
        assertEquals(1.25663706212e-6 * 5.8e7 * 0.005 * 5, plate.get("reynolds_magnetic").asDouble(), 1e-12);

        Path swept = fastPlate("swept", "fixed", "cart");
        Result flagged = CliRun.run("solve", swept.toString());
        assertTrue(flagged.out().contains("Rm 1.8 > 0.1: beyond the resistive limit"), flagged.out());
        JsonNode still = new ObjectMapper().readTree(CliRun.run("solve", swept.toString(), "--format", "json").out())
                .get("plates").get(0);
        assertEquals("resistive-limit", still.get("eddy_model").asText());
        assertEquals(1.25663706212e-6 * 5.8e7 * 0.005 * 5, still.get("reynolds_magnetic").asDouble(), 1e-12);
    }

    @Test
    void csvHeaderCarriesUnits() {
        Result r = CliRun.run("solve", "--demo", "drive-sense-wire", "--format", "csv", "--at", "0 ms");
        assertEquals(KinductMain.OK, r.code(), r.err());
        String header = r.out().lines().findFirst().orElseThrow();
        assertTrue(header.startsWith("t_s,id,kind,flux_Wb"), header);
        assertTrue(r.out().lines().skip(1).findFirst().orElseThrow().contains(",last,"), r.out());
    }

    @Test
    void malformedSceneFileExitsOneNamingLineAndPath() throws IOException {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"format\": \"kinduct-scene\", \"version\": 1,\n"
                + " \"conductors\": [{\"kind\": \"wire\", \"id\": \"w\", \"vertices\": [[0, 0], [\"3 mT\", 0]]}]}\n");
        Result r = CliRun.run("solve", bad.toString());
        assertEquals(KinductMain.BAD_INPUT, r.code());
        assertTrue(r.err().contains("bad.json:2:"), r.err());
        assertTrue(r.err().contains("conductors[0].vertices[1]"), r.err());
        assertTrue(r.out().isEmpty(), "no results on bad input");
    }

    @Test
    void badTimeUnitAndMissingFileExitOne() {
        Result unit = CliRun.run("solve", "--demo", "rail-sled", "--dt", "3 mT");
        assertEquals(KinductMain.BAD_INPUT, unit.code());
        assertTrue(unit.err().contains("--dt"), unit.err());
        Result missing = CliRun.run("solve", dir.resolve("nowhere.json").toString());
        assertEquals(KinductMain.BAD_INPUT, missing.code());
        assertFalse(missing.err().isBlank());
    }

    /** The first object of {@code samples}, scalar values only (numbers as Double, strings, null). */
    private static Map<String, Object> firstSample(String json) throws IOException {
        try (JsonParser p = new JsonFactory().createParser(json)) {
            while (p.nextToken() != null) {
                if (p.currentToken() == JsonToken.FIELD_NAME && "samples".equals(p.currentName())) {
                    p.nextToken();
                    p.nextToken();
                    Map<String, Object> sample = new HashMap<>();
                    while (p.nextToken() == JsonToken.FIELD_NAME) {
                        String name = p.currentName();
                        JsonToken value = p.nextToken();
                        if (value == JsonToken.START_ARRAY || value == JsonToken.START_OBJECT) {
                            p.skipChildren();
                            sample.put(name, "(structure)");
                        } else if (value.isNumeric()) {
                            sample.put(name, p.getDoubleValue());
                        } else {
                            sample.put(name, value == JsonToken.VALUE_NULL ? null : p.getText());
                        }
                    }
                    return sample;
                }
            }
        }
        throw new AssertionError("no samples in " + json);
    }
}
