package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.kinduct.cli.CliRun.Result;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code kinduct solve} on a loop falling into a field region: the coupled run through the
 * command line, its JSON schema, and physics a reader can check by hand — the terminal speed
 * v_t = m·g·R/(N·B·w)² (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013,
 * Problem 7.11 setting) and the energy balance.
 */
class SolveCommandTest {

    private static final double B = 0.5;
    private static final double W = 0.05;
    private static final double H = 1.0;
    private static final int TURNS = 50;
    private static final double LOAD = 0.1;
    private static final double MASS = 0.01;
    private static final double G = 9.81;
    private static final double WIRE_D = 0.5e-3;
    /** Copper, IEC 60028: ρ20 = 1/58 Ω·mm²/m. */
    private static final double RHO_COPPER = 1.0 / 58 * 1e-6;
    /** After ten mechanical time constants e^{−10} of the approach is left. */
    private static final double TERMINAL_TOL = 1e-3;
    private static final double AUDIT_TOL = 1e-6;
    /** The rectangle formula and the polygon sum of side terms are the same expression; rounding only. */
    private static final double INDUCTANCE_TOL = 1e-9;
    /** Samples of one run at one instant: the same integration, interpolated at t equal to within an ulp. */
    private static final double SAME_RUN_TOL = 1e-9;

    @TempDir
    Path dir;

    private static final String SCENE = """
            {"format": "kinduct-scene", "version": 1, "name": "falling frame",
             "time": {"t0": 0, "t1": "0.6 s", "dt": "6 ms"},
             "gravity": [0, "-9.81 m/s^2"],
             "bodies": [{"id": "frame", "pivot": [0.025, 0.5], "motion": {"kind": "free", "mass": "10 g"}}],
             "sources": [{"kind": "field-patch", "id": "gap", "bz": "0.5 T",
               "outline": [[-10, -10], [10, -10], [10, 0], [-10, 0]]}],
             "conductors": [
               {"kind": "loop", "id": "coil", "body": "frame", "vertices": [[0, 0], [0.05, 0], [0.05, 1], [0, 1]],
                "turns": 50, "wire": {"material": "copper", "diameter": "0.5 mm"}, "load": "0.1 ohm"},
               {"kind": "wire", "id": "probe", "vertices": [[-0.1, -0.1], [-0.1, 0.1]]}]}
            """;



    @Test
    void fallingFrameReachesTheTerminalSpeedAndTheAuditBalancesInTheJson() throws IOException {
        Path scene = Files.writeString(dir.resolve("fall.json"), SCENE);
        Path out = dir.resolve("r.json");

        Result r = CliRun.run("solve", scene.toString(), "--format", "json", "--out", out.toString());

        assertEquals(KinductMain.OK, r.code(), r.err());
        Map<?, ?> json = (Map<?, ?>) read(Files.readString(out));
        double resistance = TURNS * 2 * (W + H) * RHO_COPPER / (Math.PI * WIRE_D * WIRE_D / 4) + LOAD;
        double vTerminal = MASS * G * resistance / Math.pow(TURNS * B * W, 2);
        List<?> bodies = (List<?>) json.get("bodies");
        Map<?, ?> last = (Map<?, ?>) bodies.get(bodies.size() - 1);
        assertEquals("frame", last.get("id"));
        double vy = ((Number) ((List<?>) last.get("velocity_mps")).get(1)).doubleValue();
        assertEquals(-vTerminal, vy, TERMINAL_TOL * vTerminal);
        assertEquals(2, ((List<?>) last.get("position_m")).size());
        assertNotNull(last.get("angle_rad"));
        assertNotNull(last.get("omega_radps"));

        Map<?, ?> audit = (Map<?, ?>) json.get("energy_audit");
        assertEquals(0, number(audit, "residual_J"), AUDIT_TOL * number(audit, "joule_J"), audit.toString());
        assertTrue(List.of("inductive", "quasi-static").contains(json.get("circuit_model")), json.toString());

        // Rectangle a × b of round wire radius ρ, g = √(a² + b²), N tightly wound turns (Rosa, Bull.
        // Bur. Stand. 4, 1908; Grover, Inductance Calculations, 1946):
        // L = N²·(μ0/π)[(a+b)ln(2ab/ρ) − a·ln(a+g) − b·ln(b+g) + 2g − (7/4)(a+b)].
        double rho = WIRE_D / 2;
        double g = Math.hypot(W, H);
        double rosa = TURNS * TURNS * 1.25663706212e-6 / Math.PI * ((W + H) * Math.log(2 * W * H / rho)
                - W * Math.log(W + g) - H * Math.log(H + g) + 2 * g - 1.75 * (W + H));
        for (Object o : (List<?>) json.get("samples")) {
            Map<?, ?> sample = (Map<?, ?>) o;
            if ("probe".equals(sample.get("id"))) {
                assertNull(sample.get("inductance_H"), "a wire has no inductance entry");
            } else {
                assertEquals(rosa, number(sample, "inductance_H"), INDUCTANCE_TOL * rosa, sample.toString());
            }
        }
    }

    @Test
    void bothCircuitModelsCanBeChosenAndTheTableShowsTheAudit() throws IOException {
        Path scene = Files.writeString(dir.resolve("fall.json"), SCENE);
        for (String model : List.of("inductive", "quasi-static")) {
            Path out = dir.resolve(model + ".txt");

            Result r = CliRun.run("solve", scene.toString(), "--circuit", model, "--out", out.toString());

            assertEquals(KinductMain.OK, r.code(), r.err());
            String table = Files.readString(out);
            assertTrue(table.contains("(coupled run, " + model + " circuits)"), table);
            assertTrue(table.contains("Free body frame at the end: speed"), table);
            assertTrue(table.contains("Energy residual:"), table);
        }
    }

    /** A scene with a free body has one truth at t: the run from t0, sampled there exactly. */
    @Test
    void anInstantOfASceneWithAFreeBodyIsTheRunsStateThere() throws IOException {
        Path scene = Files.writeString(dir.resolve("fall.json"), SCENE);
        Path window = dir.resolve("window.json");
        Path instant = dir.resolve("instant.json");

        Result all = CliRun.run("solve", scene.toString(), "--format", "json", "--out", window.toString());
        Result one = CliRun.run("solve", scene.toString(), "--at", "0.12 s", "--format", "json", "--out",
                instant.toString());

        assertEquals(KinductMain.OK, all.code(), all.err());
        assertEquals(KinductMain.OK, one.code(), one.err());
        Map<?, ?> atGrid = null;
        for (Object o : (List<?>) ((Map<?, ?>) read(Files.readString(window))).get("samples")) {
            Map<?, ?> sample = (Map<?, ?>) o;
            if ("coil".equals(sample.get("id")) && Math.abs(number(sample, "t") - 0.12) < 1e-12) {
                atGrid = sample;
            }
        }
        List<?> onlyOne = (List<?>) ((Map<?, ?>) read(Files.readString(instant))).get("samples");
        Map<?, ?> asked = (Map<?, ?>) onlyOne.stream().filter(o -> "coil".equals(((Map<?, ?>) o).get("id")))
                .findFirst().orElseThrow();
        assertNotNull(atGrid, "the window samples t = 0.12 s (20 steps of 6 ms)");
        for (String key : List.of("current_A", "emf_V", "flux_Wb")) {
            assertEquals(number(atGrid, key), number(asked, key), SAME_RUN_TOL * Math.abs(number(atGrid, key)), key);
        }
        assertEquals(atGrid.get("direction"), asked.get("direction"));
    }

    @Test
    void anUnknownCircuitModelIsRefused() throws IOException {
        Path scene = Files.writeString(dir.resolve("fall.json"), SCENE);

        Result r = CliRun.run("solve", scene.toString(), "--circuit", "stiff");

        assertTrue(r.code() != KinductMain.OK, r.err());
        assertTrue(r.err().contains("auto, inductive, quasi-static"), r.err());
    }

    @Test
    void csvCarriesTheInductanceColumn() throws IOException {
        Path scene = Files.writeString(dir.resolve("fall.json"), SCENE);
        Path out = dir.resolve("r.csv");

        Result r = CliRun.run("solve", scene.toString(), "--format", "csv", "--t1", "12 ms", "--out", out.toString());

        assertEquals(KinductMain.OK, r.code(), r.err());
        List<String> lines = Files.readAllLines(out);
        assertTrue(lines.get(0).endsWith(",inductance_H"), lines.get(0));
        assertTrue(lines.stream().filter(l -> l.contains(",probe,")).allMatch(l -> l.endsWith(",")), "wire: empty cell");
    }

    private static double number(Map<?, ?> object, String key) {
        return ((Number) object.get(key)).doubleValue();
    }

    /** A JSON document as maps, lists, strings, numbers, booleans and nulls. */
    private static Object read(String text) throws IOException {
        try (JsonParser p = new JsonFactory().createParser(text)) {
            p.nextToken();
            return value(p);
        }
    }

    private static Object value(JsonParser p) throws IOException {
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT -> {
                Map<String, Object> map = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    p.nextToken();
                    map.put(name, value(p));
                }
                return map;
            }
            case START_ARRAY -> {
                List<Object> list = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    list.add(value(p));
                }
                return list;
            }
            case VALUE_STRING -> {
                return p.getText();
            }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
                return p.getDoubleValue();
            }
            case VALUE_TRUE, VALUE_FALSE -> {
                return p.getBooleanValue();
            }
            case VALUE_NULL -> {
                return null;
            }
            default -> throw new IOException("unexpected " + t);
        }
    }
}
