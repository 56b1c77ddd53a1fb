package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.cli.CliRun.Result;
import org.kinduct.demo.Demos;
import org.kinduct.report.metrics.MetricKind;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.path.SceneValue;
import org.kinduct.scene.path.SceneValues;
import org.kinduct.study.Row;
import org.kinduct.study.StudyJson;
import org.kinduct.study.StudyTable;

/**
 * {@code kinduct sweep} and {@code kinduct merge}: each point is what an independent
 * {@code kinduct solve} of the edited scene gives, a study run as shards and merged is the same
 * file as the study run whole, and bad input is refused with a message that says where.
 */
class SweepCommandTest {

    /**
     * Sweep point against solve: the same run of the same scene, so the numbers are the same up to
     * the order of additions in the independent metric code (measured: equal, or 1e-16 apart).
     */
    private static final double SAME_RUN = 1e-12;
    /** Samples per demo window in the property test: enough for every metric, short enough to be quick. */
    private static final int SAMPLES = 40;

    @TempDir
    Path dir;

    static LongStream seeds() {
        return LongStream.range(0, 6);
    }

    /** A demo's field maps are read beside its resource; a copy of the scene needs them beside it too. */
    private static void copyMapsBeside(Scene scene, Path dir) throws IOException {
        for (org.kinduct.scene.Source s : scene.sources()) {
            if (s instanceof org.kinduct.scene.Source.FieldMap map) {
                try (java.io.InputStream in = Demos.class.getResourceAsStream("/org/kinduct/demo/" + map.file())) {
                    Files.copy(in, dir.resolve(map.file()), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    /**
     * Random demo, random value, two random values of it: every metric that applies, for every
     * conductor and free body, equals the one computed from {@code kinduct solve --format json} of
     * the edited scene written to a file.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void everySweepPointIsWhatSolveGivesForTheEditedScene(long seed) throws IOException {
        SplittableRandom r = new SplittableRandom(seed);
        String demo = Demos.names().get(r.nextInt(Demos.names().size()));
        Scene base = Demos.load(demo);
        double t1 = base.time().t0S() + SAMPLES * base.time().dtS();
        base = SceneValues.of(base).write("time.t1", t1);
        List<String> paths = new ArrayList<>(SceneValues.of(base).paths());
        paths.removeIf(p -> p.startsWith("time.") || p.startsWith("gravity."));
        String path = null;
        double[] values = null;
        for (int attempt = 0; values == null; attempt++) {
            path = paths.get(r.nextInt(paths.size()));
            SceneValue v = SceneValues.of(base).find(path);
            double old = v.read(base);
            double[] tried = v.whole() ? new double[] {old, old + 1}
                    : new double[] {old * (1 + r.nextDouble(-0.05, 0.05)), old * (1 + r.nextDouble(-0.05, 0.05)) + 1e-4};
            try {
                v.write(base, tried[0]);
                v.write(base, tried[1]);
                values = tried;
            } catch (IllegalArgumentException refused) {
                assertTrue(attempt < 100, "no writable value found");
            }
        }
        Path scene = dir.resolve("base.json");
        copyMapsBeside(base, dir);
        SceneFiles.write(base, scene);
        List<String[]> metrics = metricsOf(base);
        List<String> args = new ArrayList<>(List.of("sweep", scene.toString(), "--vary",
                path + "=" + values[0] + "," + values[1], "--json", dir.resolve("s.json").toString()));
        for (String[] m : metrics) {
            args.add("--metric");
            args.add(m[1] == null ? m[0] : m[0] + ":" + m[1]);
        }
        Result sweep = CliRun.run(args.toArray(String[]::new));
        assertEquals(KinductMain.OK, sweep.code(), "seed " + seed + " " + demo + " " + path + ": " + sweep.err());
        StudyTable table = StudyJson.read(Files.readString(dir.resolve("s.json")), "s.json");

        for (Row row : table.rows()) {
            Scene edited = SceneValues.of(base).write(path, values[row.point()]);
            Path file = dir.resolve("point-" + row.point() + ".json");
            SceneFiles.write(edited, file);
            Result solve = CliRun.run("solve", file.toString(), "--format", "json");
            assertEquals(KinductMain.OK, solve.code(), solve.err());
            SolveJsonMetrics reference = new SolveJsonMetrics(solve.out());
            for (int m = 0; m < metrics.size(); m++) {
                String[] metric = metrics.get(m);
                double load = List.of("mean_load_power", "steady_load_power", "load_energy").contains(metric[0])
                        ? ((Conductor.Loop) edited.conductor(metric[1]).orElseThrow()).loadOhm() : Double.NaN;
                double expected = reference.metric(metric[0], metric[1], load);
                double got = row.metrics()[m];
                String what = "seed " + seed + ", " + demo + ", " + path + " = " + values[row.point()] + ": "
                        + metric[0] + (metric[1] == null ? "" : ":" + metric[1]);
                if (Double.isNaN(expected)) {
                    assertTrue(Double.isNaN(got), what + " should be empty, got " + got);
                } else {
                    assertEquals(expected, got, SAME_RUN * Math.abs(expected), what);
                }
            }
        }
    }

    /** Every metric that applies to something in the scene, as {name, id}. */
    private static List<String[]> metricsOf(Scene scene) {
        List<String[]> out = new ArrayList<>();
        for (MetricKind k : MetricKind.values()) {
            switch (k.scope()) {
                case SCENE -> out.add(new String[] {k.key(), null});
                case FREE_BODY -> scene.bodies().stream().filter(b -> b.motion() instanceof Motion.Free)
                        .forEach(b -> out.add(new String[] {k.key(), b.id()}));
                case CONDUCTOR -> scene.conductors().stream().filter(c -> !(c instanceof Conductor.Sheet))
                        .forEach(c -> out.add(new String[] {k.key(), c.id()}));
                case SHEET -> scene.conductors().stream().filter(c -> c instanceof Conductor.Sheet)
                        .forEach(c -> out.add(new String[] {k.key(), c.id()}));
                case LOOP -> scene.conductors().stream().filter(c -> c instanceof Conductor.Loop)
                        .forEach(c -> out.add(new String[] {k.key(), c.id()}));
                case CLOSED_LOOP -> scene.conductors().stream().filter(c -> c instanceof Conductor.Loop l && !l.open())
                        .forEach(c -> out.add(new String[] {k.key(), c.id()}));
            }
        }
        return out;
    }

    /** A study of 12 points run as 4 shards and merged is, byte for byte, the study run in one piece. */
    @Test
    void fourShardsMergedAreTheWholeStudyByteForByte() throws IOException {
        String[] study = {"--demo", "rail-sled", "--set", "time.t1=40 ms", "--vary", "rail-circuit.vertices[0].y=-12 mm..-8 mm:4",
            "--vary", "sled.motion.velocity.x=1 m/s,2 m/s,3 m/s", "--metric", "peak_current:rail-circuit",
            "--metric", "peak_emf:rail-circuit"};
        Result whole = sweep(study, "--json", file("whole.json"), "--csv", file("whole.csv"));
        assertEquals(KinductMain.OK, whole.code(), whole.err());
        List<String> parts = new ArrayList<>(List.of("merge"));
        for (int k = 1; k <= 4; k++) {
            Result part = sweep(study, "--shard", k + "/4", "--json", file("part" + k + ".json"));
            assertEquals(KinductMain.OK, part.code(), part.err());
            parts.add(file("part" + k + ".json"));
        }
        parts.addAll(List.of("--json", file("merged.json"), "--csv", file("merged.csv")));

        Result merged = CliRun.run(parts.toArray(String[]::new));

        assertEquals(KinductMain.OK, merged.code(), merged.err());
        assertArrayEquals(Files.readAllBytes(dir.resolve("whole.json")), Files.readAllBytes(dir.resolve("merged.json")));
        assertArrayEquals(Files.readAllBytes(dir.resolve("whole.csv")), Files.readAllBytes(dir.resolve("merged.csv")));
        assertEquals(12, StudyJson.read(Files.readString(dir.resolve("merged.json")), "m").rows().size());
    }

    @Test
    void mergeRefusesMissingRepeatedAndForeignParts() throws IOException {
        String[] study = {"--demo", "rail-sled", "--set", "time.t1=10 ms", "--vary", "sled.motion.velocity.x=1 m/s..2 m/s:3",
            "--metric", "peak_emf:rail-circuit"};
        for (int k = 1; k <= 3; k++) {
            assertEquals(KinductMain.OK, sweep(study, "--shard", k + "/3", "--json", file("p" + k + ".json")).code());
        }
        String[] other = study.clone();
        other[5] = "sled.motion.velocity.x=1 m/s..3 m/s:3";
        assertEquals(KinductMain.OK, sweep(other, "--shard", "3/3", "--json", file("q3.json")).code());

        assertMergeFails("missing part 3/3", file("p1.json"), file("p2.json"));
        assertMergeFails("is given twice", file("p1.json"), file("p2.json"), file("p2.json"));
        assertMergeFails("belongs to study", file("p1.json"), file("p2.json"), file("q3.json"));
        Files.writeString(dir.resolve("bad.json"), "{\"format\": \"kinduct-results\"}");
        assertMergeFails("bad.json: not a Kinduct study result", file("bad.json"));
    }

    @Test
    void badInputIsRefusedSayingWhatAndWhere() {
        assertFails("--vary: no value 'magnet2.standoff' in scene 'Carriage pickup over a magnet track';"
                + " nearest: magnet-2.standoff", "--vary", "magnet2.standoff=1 mm..2 mm:3", "--metric", "peak_emf:pickup");
        assertFails("give every value a unit (or none)", "--vary", "magnet-2.standoff=1..3 mm:3", "--metric",
                "peak_emf:pickup");
        assertFails("the grid has more than 1000000 points (1000 × 1001)", "--vary",
                "magnet-2.standoff=1 mm..2 mm:1000", "--vary", "magnet-3.standoff=1 mm..2 mm:1001", "--metric",
                "peak_emf:pickup");
        assertFails("a range takes 2 to 1000000 values, got 99999999999", "--vary",
                "magnet-2.standoff=1 mm..2 mm:99999999999", "--metric", "peak_emf:pickup");
        assertFails("magnet-2.standoff = −1.00 mm: stand-off must be zero or positive", "--vary",
                "magnet-2.standoff=-1 mm..2 mm:4", "--metric", "peak_emf:pickup");
        assertFails("unknown metric 'peak_emv' (did you mean peak_emf", "--vary", "magnet-2.standoff=1 mm,2 mm",
                "--metric", "peak_emv:pickup");
        assertFails("'pickup' is not a free body", "--vary", "magnet-2.standoff=1 mm,2 mm", "--metric",
                "terminal_speed:pickup");
        assertFails("--shard: shard 5/4: expected K/N with 1 ≤ K ≤ N", "--vary", "magnet-2.standoff=1 mm,2 mm",
                "--metric", "peak_emf:pickup", "--shard", "5/4");
    }

    /** Stopping a sweep (SIGTERM, as Ctrl-C sends SIGINT) leaves the finished rows, marked incomplete. */
    @Test
    void aStoppedSweepLeavesItsFinishedRowsMarkedIncomplete() throws Exception {
        Path json = dir.resolve("stopped.json");
        Path csv = dir.resolve("stopped.csv");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                System.getProperty("java.class.path"), "-Djava.awt.headless=true", KinductMain.class.getName(), "sweep",
                "--demo", "rail-sled", "--vary", "sled.motion.velocity.x=0.5 m/s..2 m/s:400", "--metric",
                "peak_emf:rail-circuit", "--threads", "1", "--json", json.toString(), "--csv", csv.toString())
                .redirectErrorStream(true).start();
        StringBuilder log = new StringBuilder();
        try (var out = new java.io.BufferedReader(new java.io.InputStreamReader(p.getInputStream(),
                java.nio.charset.StandardCharsets.UTF_8))) {
            for (String line = out.readLine(); line != null; line = out.readLine()) {
                log.append(line).append('\n');
                if (line.matches("sweep: [1-9]\\d*/400 points.*")) {
                    p.destroy();
                    break;
                }
            }
        }
        p.waitFor();
        StudyTable table = StudyJson.read(Files.readString(json), json.toString());
        assertFalse(table.complete(), log.toString());
        assertTrue(table.rows().size() >= 1 && table.rows().size() < 400, log.toString());
        String text = Files.readString(csv);
        assertTrue(text.endsWith("# incomplete: " + table.rows().size() + " of 400 points\n"), text);
        for (int k = 0; k < table.rows().size(); k++) {
            assertEquals(k, table.rows().get(k).point(), "one thread finishes points in order");
        }
    }

    private Result sweep(String[] study, String... more) {
        List<String> args = new ArrayList<>(List.of("sweep"));
        args.addAll(List.of(study));
        args.addAll(List.of(more));
        return CliRun.run(args.toArray(String[]::new));
    }

    private String file(String name) {
        return dir.resolve(name).toString();
    }

    private void assertMergeFails(String message, String... parts) {
        List<String> args = new ArrayList<>(List.of("merge"));
        args.addAll(List.of(parts));
        args.addAll(List.of("--json", file("never.json")));
        Result r = CliRun.run(args.toArray(String[]::new));
        assertEquals(KinductMain.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains(message), r.err());
        assertFalse(Files.exists(dir.resolve("never.json")));
    }

    private void assertFails(String message, String... options) {
        List<String> args = new ArrayList<>(List.of("sweep", "--demo", "carriage-pickup"));
        args.addAll(List.of(options));
        Result r = CliRun.run(args.toArray(String[]::new));
        assertEquals(KinductMain.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains(message), r.err());
        assertFalse(r.err().contains("internal error"), r.err());
    }
}
