package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.regex.Pattern;
import java.util.stream.LongStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Texts;

/**
 * Garbled and random input: {@link SceneJson#read} must return a scene or throw
 * {@link SceneFormatException} with well-formed problems, never anything else. A scene it does
 * return must survive a write/read round trip. Each case has its own seed, printed on failure with
 * the input, so it can be replayed alone.
 */
class SceneJsonFuzzTest {

    private static final long FIRST_SEED = 91_827_364L;
    private static final int BATCHES = 8;
    private static final int CASES_PER_BATCH = 500;
    private static final int SHOWN_INPUT = 3000;
    /** JSON parsers, like editors, end a line at \r\n, \r or \n. */
    private static final Pattern LINE_BREAK = Pattern.compile("\r\n|\r|\n");

    /** Tokens that stress the reader: structure, odd numbers, unit strings, names it knows, junk. */
    private static final String[] TOKENS = {
        "{", "}", "[", "]", ",", ":", "\"", "\\", "null", "true", "false", "-", "0", "-0.0", "1e999", "-1e-999",
        "123456789012345678901234567890", "2.5", "1e5", "NaN", "Infinity", "\"x\"", "\"\"", "\"5 mm\"",
        "\"-45 µT\"", "\"600 rpm\"", "\"1e400 m\"", "\"20 degC\"", "\"fixed\"", "\"kind\"", "\"loop\"", "\"wire\"",
        "\"free\"", "\"path\"", "\"source-coil\"", "\"circle\"", "\"polygon\"", "\"body\"", "\"vertices\"", "[0, 0]",
        "{\"at\": [0, 0], \"body\": \"fixed\"}", "\u0000", "\u0007", "\uFEFF", "\uD83D\uDE00", "\uD800", "é", "//", "/*",
        "'", "\t", "\n", "\r\n", " ",
    };

    /** Names from the file format, so random trees reach deep into the reader. */
    private static final String[] NAMES = {
        "format", "version", "name", "description", "time", "gravity", "t0", "t1", "dt", "bodies", "id", "pivot", "motion",
        "kind", "velocity", "initialVelocity", "acceleration", "amplitude", "frequency", "direction", "phase",
        "omega", "startAngle", "blend", "keys", "t", "offset", "angle", "mass", "inertia", "initialOmega",
        "damping", "force", "forceAmplitude", "forceFrequency", "springs", "anchor", "body", "stiffness",
        "restLength", "sources", "outline", "bz", "center", "size", "standoff", "side", "remanence", "north",
        "radius", "height", "polygon", "circle", "turns", "z", "current", "dc", "conductors", "vertices", "at",
        "wire", "material", "awg", "diameter", "open", "load", "temperature", "colour",
    };

    private static final String[] WORDS = {
        "kinduct-scene", "still", "glide", "accelerate", "oscillate", "spin", "path", "free", "field-patch",
        "uniform-field", "block-magnet", "cylinder-magnet", "source-coil", "wire", "loop", "below", "above", "+z",
        "-z", "copper", "aluminium", "linear", "smooth", "fixed", "carriage", "b0", "s0", "c0", "12 mm", "0.5 G",
        "-45 uT", "3 km/h", "30 deg", "600 rpm", "20 g", "200 N/m", "0.5 A", "100 ohm", "20 degC", "5 mT",
        "2 g*cm^2", "0.5 N*s/m", "9.81 m/s^2", "1 ms", "50 Hz", "12 mT", "abc", "",
    };

    private static final List<String> VALID = new ArrayList<>();

    @BeforeAll
    static void collectValidTexts() throws IOException {
        VALID.add(SceneJson.write(SampleScenes.everyVariant()));
        try (InputStream in = SceneJsonFuzzTest.class.getResourceAsStream("hand-written.json")) {
            VALID.add(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        }
        SplittableRandom r = new SplittableRandom(FIRST_SEED);
        for (int i = 0; i < 10; i++) {
            VALID.add(SceneJson.write(SampleScenes.random(r)));
        }
    }

    static LongStream batches() {
        return LongStream.range(0, BATCHES);
    }

    @ParameterizedTest
    @MethodSource("batches")
    void readOnlyEverThrowsSceneFormatException(long batch) {
        for (int i = 0; i < CASES_PER_BATCH; i++) {
            long seed = FIRST_SEED + batch * CASES_PER_BATCH + i;
            String input = input(new SplittableRandom(seed));
            try {
                check(input);
            } catch (RuntimeException | Error e) { // add the replay data to whatever went wrong
                fail("seed " + seed + " failed on input:\n" + Texts.printable(input, SHOWN_INPUT), e);
            }
        }
    }

    private static void check(String input) {
        Scene scene;
        try {
            scene = SceneJson.read(input, "fuzz.json");
        } catch (SceneFormatException e) {
            long lines = LINE_BREAK.split(input, -1).length;
            assertFalse(e.problems().isEmpty(), "no problems listed");
            for (Problem p : e.problems()) {
                assertTrue(p.line() <= lines, () -> "line beyond the text: " + p);
                assertFalse(p.message().isBlank(), () -> "blank message: " + p);
            }
            assertTrue(e.getMessage().startsWith("fuzz.json:"), e.getMessage());
            return;
        }
        try {
            assertEquals(scene, SceneJson.read(SceneJson.write(scene), "again.json"), "round trip");
        } catch (SceneFormatException e) {
            fail("a scene that was read does not read back after writing: " + e.getMessage());
        }
    }

    private static String input(SplittableRandom r) {
        switch (r.nextInt(10)) {
            case 0:
                return randomTree(r);
            case 1:
                return randomCharacters(r);
            default:
                return mutate(r, VALID.get(r.nextInt(VALID.size())));
        }
    }

    /** One to four edits: delete, duplicate, insert a token, replace a range, swap, or truncate. */
    private static String mutate(SplittableRandom r, String valid) {
        StringBuilder s = new StringBuilder(valid);
        for (int edits = 1 + r.nextInt(4); edits > 0 && s.length() > 0; edits--) {
            int at = r.nextInt(s.length());
            int end = Math.min(s.length(), at + 1 + r.nextInt(20));
            switch (r.nextInt(6)) {
                case 0:
                    s.delete(at, end);
                    break;
                case 1:
                    s.insert(at, s.substring(at, end));
                    break;
                case 2:
                    s.insert(at, TOKENS[r.nextInt(TOKENS.length)]);
                    break;
                case 3:
                    s.replace(at, end, TOKENS[r.nextInt(TOKENS.length)]);
                    break;
                case 4: {
                    char c = s.charAt(at);
                    s.setCharAt(at, s.charAt(end - 1));
                    s.setCharAt(end - 1, c);
                    break;
                }
                default:
                    s.setLength(at);
                    break;
            }
        }
        return s.toString();
    }

    /** A random JSON document, usually headed like a scene file, with names the format uses. */
    private static String randomTree(SplittableRandom r) {
        StringBuilder s = new StringBuilder("{");
        if (r.nextInt(4) > 0) {
            s.append("\"format\": \"kinduct-scene\", \"version\": 1, ");
        }
        int members = r.nextInt(6);
        for (int i = 0; i < members; i++) {
            s.append(i == 0 ? "" : ", ").append('"').append(NAMES[r.nextInt(NAMES.length)]).append("\": ");
            value(r, s, 0);
        }
        return s.append('}').toString();
    }

    private static void value(SplittableRandom r, StringBuilder s, int depth) {
        int kind = depth > 6 ? r.nextInt(4) : r.nextInt(7);
        switch (kind) {
            case 0:
                s.append(r.nextInt(5) == 0 ? r.nextInt() : (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-5, 5)));
                break;
            case 1:
                s.append('"').append(WORDS[r.nextInt(WORDS.length)]).append('"');
                break;
            case 2:
                s.append(r.nextBoolean() ? "true" : "null");
                break;
            case 3:
                s.append('[').append(r.nextDouble()).append(", ").append(-r.nextDouble()).append(']');
                break;
            case 4:
            case 5: {
                s.append('{');
                int n = r.nextInt(7);
                for (int i = 0; i < n; i++) {
                    s.append(i == 0 ? "" : ", ").append('"').append(NAMES[r.nextInt(NAMES.length)]).append("\": ");
                    value(r, s, depth + 1);
                }
                s.append('}');
                break;
            }
            default: {
                s.append('[');
                int n = r.nextInt(5);
                for (int i = 0; i < n; i++) {
                    s.append(i == 0 ? "" : ", ");
                    value(r, s, depth + 1);
                }
                s.append(']');
                break;
            }
        }
    }

    /** Arbitrary UTF-16 code units, including lone surrogates and control characters. */
    private static String randomCharacters(SplittableRandom r) {
        char[] c = new char[r.nextInt(200)];
        for (int i = 0; i < c.length; i++) {
            c[i] = r.nextBoolean() ? (char) r.nextInt(128) : (char) r.nextInt(Character.MAX_VALUE + 1);
        }
        return new String(c);
    }
}
