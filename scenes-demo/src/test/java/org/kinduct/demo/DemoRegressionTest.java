package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.SceneRun;

/**
 * Regression results of the prescribed-motion demos: for wires and loops the peak EMF, when it
 * occurs, polarity or current sense there, and peak current, over each scene's own time window
 * ({@code regression.tsv}); for plates and channels the peak force and Joule power and each
 * electrode pair's peak voltage, + electrode and share of B·w·v̄ ({@code regression-sheets.tsv},
 * one quantity a row). They are our own earlier results, so this test guards against unintended
 * change only — the physics behind them is checked against published formulas in
 * {@link DemoHandCalculationTest} and the solver's own tests. After an intended change, regenerate
 * them with the command in DEVELOPERS.md ("Demo regression results") and review the diff.
 */
class DemoRegressionTest {

    /** Relative tolerance: the solver is deterministic; this leaves room for floating-point reordering. */
    private static final double RELATIVE = 1e-7;
    private static final String TABLE = "/org/kinduct/demo/regression.tsv";
    private static final String SHEET_TABLE = "/org/kinduct/demo/regression-sheets.tsv";
    /** Each demo's plates and channels measured once: every row of a demo reads the same run. */
    private static final java.util.Map<String, List<SheetValue>> MEASURED = new java.util.concurrent.ConcurrentHashMap<>();

    record Expected(String demo, String conductor, double peakEmfV, double peakTimeS, String sense,
                    double peakCurrentA) {
        static Expected parse(String line) {
            String[] f = line.split("\t");
            return new Expected(f[0], f[1], Double.parseDouble(f[2]), Double.parseDouble(f[3]), f[4],
                    Double.parseDouble(f[5]));
        }

        String line() {
            return String.format(Locale.ROOT, "%s\t%s\t%.12e\t%.9f\t%s\t%.12e", demo, conductor, peakEmfV, peakTimeS,
                    sense, peakCurrentA);
        }
    }

    /** One quantity of a plate or channel: a number, or for a pair's + electrode a name. */
    record SheetValue(String demo, String id, String quantity, String value) {
        static SheetValue parse(String line) {
            String[] f = line.split("\t");
            return new SheetValue(f[0], f[1], f[2], f[3]);
        }

        String line() {
            return demo + "\t" + id + "\t" + quantity + "\t" + value;
        }
    }

    static List<Expected> expected() throws IOException {
        return rows(TABLE).stream().map(Expected::parse).toList();
    }

    static List<SheetValue> expectedSheets() throws IOException {
        return rows(SHEET_TABLE).stream().map(SheetValue::parse).toList();
    }

    private static List<String> rows(String table) throws IOException {
        try (InputStream in = DemoRegressionTest.class.getResourceAsStream(table)) {
            List<String> rows = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(line);
                }
            }
            return rows;
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("expectedSheets")
    void plateAndChannelResultsAreUnchanged(SheetValue want) {
        SheetValue got = MEASURED.computeIfAbsent(want.demo(), DemoRegressionTest::measureSheets).stream()
                .filter(v -> v.id().equals(want.id()) && v.quantity().equals(want.quantity())).findFirst()
                .orElseThrow(() -> new AssertionError("no " + want.quantity() + " of " + want.id()));
        if (want.quantity().endsWith(":positive")) {
            assertEquals(want.value(), got.value(), "+ electrode at the peak");
        } else {
            double expected = Double.parseDouble(want.value());
            assertEquals(expected, Double.parseDouble(got.value()), RELATIVE * Math.abs(expected), want.quantity());
        }
    }

    /**
     * The figures of every plate and channel of {@code demo} over its window, as the product path
     * (the scene's one run) gives them: peak force, peak Joule power, and per pair the peak voltage
     * with its + electrode and share of B·w·v̄ there. Not the times of the peaks: on a plateau
     * (steady flow, a plate over a uniform row) rounding decides which sample is largest.
     */
    static List<SheetValue> measureSheets(String demo) {
        List<Snapshot> samples = new SceneRun(Demos.load(demo)).result().samples();
        List<SheetValue> out = new ArrayList<>();
        for (SheetState first : samples.get(0).sheets()) {
            String id = first.id();
            Snapshot peakForce = samples.get(0);
            double joule = 0;
            for (Snapshot s : samples) {
                if (s.sheet(id).orElseThrow().forceN().length() > peakForce.sheet(id).orElseThrow().forceN().length()) {
                    peakForce = s;
                }
                joule = Math.max(joule, s.sheet(id).orElseThrow().joulePowerW());
            }
            out.add(value(demo, id, "peak_force_N", peakForce.sheet(id).orElseThrow().forceN().length()));
            out.add(value(demo, id, "peak_joule_W", joule));
            for (int p = 0; p < first.pairs().size(); p++) {
                int index = p;
                Snapshot peak = samples.get(0);
                for (Snapshot s : samples) {
                    if (Math.abs(s.sheet(id).orElseThrow().pairs().get(index).voltageV())
                            > Math.abs(peak.sheet(id).orElseThrow().pairs().get(index).voltageV())) {
                        peak = s;
                    }
                }
                SheetState.Pair at = peak.sheet(id).orElseThrow().pairs().get(index);
                String pair = "pair:" + at.plus() + "-" + at.minus() + ":";
                out.add(value(demo, id, pair + "peak_voltage_V", at.voltageV()));
                out.add(new SheetValue(demo, id, pair + "positive", at.positive().orElse("none")));
                out.add(value(demo, id, pair + "end_shorting", at.endShortingRatio()));
            }
        }
        return out;
    }

    private static SheetValue value(String demo, String id, String quantity, double v) {
        return new SheetValue(demo, id, quantity, String.format(Locale.ROOT, "%.12e", v));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("expected")
    void demoResultsAreUnchanged(Expected want) {
        Expected got = measure(want.demo(), want.conductor());
        assertEquals(want.peakEmfV(), got.peakEmfV(), RELATIVE * Math.abs(want.peakEmfV()), "peak EMF");
        // A flat peak (constant EMF) may be found at another sample after harmless rounding changes,
        // so the recorded instant is checked by its value and sense, not by its time.
        Expected then = measureAt(want.demo(), want.conductor(), want.peakTimeS());
        assertEquals(want.peakEmfV(), then.peakEmfV(), RELATIVE * Math.abs(want.peakEmfV()), "EMF at the recorded peak");
        assertEquals(want.sense(), then.sense(), "polarity or sense at the peak");
        assertEquals(want.peakCurrentA(), got.peakCurrentA(), RELATIVE * Math.abs(want.peakCurrentA()) + 1e-15,
                "peak current");
    }

    static Expected measureAt(String demo, String conductor, double tS) {
        return summarize(demo, conductor, List.of(new SceneSolver(Demos.load(demo)).at(tS)));
    }

    static Expected measure(String demo, String conductor) {
        Scene scene = Demos.load(demo);
        TimeSpan span = scene.time();
        return summarize(demo, conductor, new SceneSolver(scene).series(span.t0S(), span.t1S(), span.dtS()));
    }

    private static Expected summarize(String demo, String conductor, List<Snapshot> series) {
        ConductorState peak = null;
        double peakT = 0;
        double peakI = 0;
        for (Snapshot s : series) {
            ConductorState c = s.conductor(conductor).orElseThrow();
            if (peak == null || Math.abs(c.emfV()) > Math.abs(peak.emfV())) {
                peak = c;
                peakT = s.tS();
            }
            if (Math.abs(c.currentA()) > Math.abs(peakI)) {
                peakI = c.currentA();
            }
        }
        String sense = peak.kind() == ConductorState.Kind.WIRE || peak.currentA() == 0
                ? "plus-" + peak.positiveEnd().name().toLowerCase(Locale.ROOT)
                : peak.direction().name().toLowerCase(Locale.ROOT);
        return new Expected(demo, conductor, peak.emfV(), peakT, sense, peakI);
    }

    /**
     * Regenerates the tables: {@code java ... org.kinduct.demo.DemoRegressionTest OUT.tsv}, which
     * writes OUT.tsv (wires and loops) and OUT-sheets.tsv (plates and channels) beside it.
     */
    public static void main(String[] args) throws IOException {
        StringBuilder out = new StringBuilder("# demo\tconductor\tpeak_emf_V\tpeak_t_s\tsense\tpeak_current_A\n");
        StringBuilder sheets = new StringBuilder("# demo\tplate or channel\tquantity\tvalue\n");
        for (String demo : Demos.names()) {
            Scene scene = Demos.load(demo);
            if (scene.bodies().stream().anyMatch(b -> b.motion() instanceof org.kinduct.scene.Motion.Free)) {
                continue; // free-body demos are checked through the coupled simulation
            }
            scene.conductors().stream().filter(c -> !(c instanceof Conductor.Sheet))
                    .forEach(c -> out.append(measure(demo, c.id()).line()).append('\n'));
            measureSheets(demo).forEach(v -> sheets.append(v.line()).append('\n'));
        }
        Path table = Path.of(args[0]);
        Files.writeString(table, out.toString());
        Files.writeString(table.resolveSibling(table.getFileName().toString().replace(".tsv", "-sheets.tsv")),
                sheets.toString());
        PrintStream console = System.out;
        console.print(out);
        console.print(sheets);
    }
}
