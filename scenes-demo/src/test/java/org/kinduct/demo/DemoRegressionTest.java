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
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;

/**
 * Regression results of the prescribed-motion demos: peak EMF, when it occurs, polarity or
 * current sense there, and peak current, over each scene's own time window. The expected values
 * live in {@code regression.tsv} beside this class; they are our own earlier results, so this test
 * guards against unintended change only — the physics behind them is checked against published
 * formulas in {@link DemoHandCalculationTest} and the solver's own tests. After an intended
 * change, regenerate them with the command in DEVELOPERS.md ("Demo regression results") and
 * review the diff.
 */
class DemoRegressionTest {

    /** Relative tolerance: the solver is deterministic; this leaves room for floating-point reordering. */
    private static final double RELATIVE = 1e-7;
    private static final String TABLE = "/org/kinduct/demo/regression.tsv";

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

    static List<Expected> expected() throws IOException {
        try (InputStream in = DemoRegressionTest.class.getResourceAsStream(TABLE)) {
            List<Expected> rows = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(Expected.parse(line));
                }
            }
            return rows;
        }
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

    /** Regenerates the table: {@code java ... org.kinduct.demo.DemoRegressionTest OUT.tsv}. */
    public static void main(String[] args) throws IOException {
        StringBuilder out = new StringBuilder("# demo\tconductor\tpeak_emf_V\tpeak_t_s\tsense\tpeak_current_A\n");
        for (String demo : Demos.names()) {
            Scene scene = Demos.load(demo);
            if (scene.bodies().stream().anyMatch(b -> b.motion() instanceof org.kinduct.scene.Motion.Free)) {
                continue; // free-body demos are checked through the coupled simulation
            }
            scene.conductors().forEach(c -> out.append(measure(demo, c.id()).line()).append('\n'));
        }
        Files.writeString(Path.of(args[0]), out.toString());
        PrintStream console = System.out;
        console.print(out);
    }
}
