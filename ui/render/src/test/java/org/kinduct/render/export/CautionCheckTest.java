package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.report.CautionCheck;
import org.kinduct.report.Cautions;

/**
 * The snapshot carries the caution lines when due: strong magnets by remanence, and induced
 * voltage above the extra-low-voltage limit of IEC 61140 (120 V ripple-free DC), here from a rod
 * whose EMF B·L·v is known in closed form (Griffiths, Introduction to Electrodynamics, 4th ed.,
 * 2013, eq. 7.13).
 */
class CautionCheckTest {

    private static Scene magnet(double remanenceT) {
        Source.BlockMagnet m = new Source.BlockMagnet("m", Body.FIXED, Vec2.ZERO, 0.01, 0.01, 0.004, 0, 0.001,
                Source.Side.BELOW, remanenceT, Source.Magnetization.PLUS_Z);
        return Scene.empty("magnet").withSources(List.of(m));
    }

    /** A 1 m rod at {@code speed} m/s across 1 T: EMF = speed volts. */
    private static Scene fastRod(double speed) {
        Body cart = new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(speed, 0)));
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(Conductor.Vertex.at(0, -0.5),
                Conductor.Vertex.at(0, 0.5)));
        return new Scene("fast rod", "", List.of(cart), List.of(new Source.UniformField("b", -1)), List.of(rod),
                new TimeSpan(0, 0.01, 0.001));
    }

    @ParameterizedTest
    @CsvSource({"0.35, false", "0.79, false", "0.8, true", "1.3, true"})
    void strongMagnetCautionFollowsTheRemanenceThreshold(double remanenceT, boolean cautioned) {
        Exporter export = new Exporter(magnet(remanenceT), ExportFixtures.options(0, 600, 96, new ViewChoice.Fit()));

        assertEquals(cautioned, CautionCheck.lines(magnet(remanenceT), export.result().samples()).contains(Cautions.MAGNETS));
    }

    @ParameterizedTest
    @CsvSource({"100, false", "150, true"})
    void steadyVoltageCautionAppearsAboveTheDcExtraLowVoltageLimit(double speed, boolean cautioned) {
        Scene scene = fastRod(speed);
        Exporter export = new Exporter(scene, ExportFixtures.options(0, 600, 96, new ViewChoice.Fit()));

        assertEquals(speed, export.snapshot().conductor("rod").orElseThrow().emfV(), 1e-9 * speed, "B·L·v");
        assertEquals(cautioned, CautionCheck.lines(scene, export.result().samples()).contains(Cautions.VOLTAGE));
    }

    /** A 1 m rod oscillating across 1 T with peak speed {@code peak} m/s at 50 Hz: EMF = peak·cos(ωt) volts. */
    private static Scene oscillatingRod(double peak) {
        double f = 50;
        Body cart = new Body("cart", "cart", Vec2.ZERO, new Motion.Oscillate(peak / (2 * Math.PI * f), f, 0, 0));
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(Conductor.Vertex.at(0, -0.5),
                Conductor.Vertex.at(0, 0.5)));
        return new Scene("ac rod", "", List.of(cart), List.of(new Source.UniformField("b", -1)), List.of(rod),
                new TimeSpan(0, 1 / f, 1 / f / 200));
    }

    /** A sinusoid of peak P has RMS P/√2: 60 V peak is 42 V rms (below 50 V), 100 V peak is 71 V rms (above). */
    @ParameterizedTest
    @CsvSource({"60, false", "100, true"})
    void alternatingVoltageCautionFollowsTheAcRmsLimit(double peak, boolean cautioned) {
        Scene scene = oscillatingRod(peak);
        Exporter export = new Exporter(scene, ExportFixtures.options(0, 600, 96, new ViewChoice.Fit()));

        double emfPeak = export.result().samples().stream().mapToDouble(s -> Math.abs(s.conductors().get(0).emfV())).max()
                .orElseThrow();
        assertEquals(peak, emfPeak, 1e-3 * peak, "peak EMF B·L·v_max");
        assertEquals(cautioned, CautionCheck.lines(scene, export.result().samples()).contains(Cautions.VOLTAGE));
    }

    @Test
    void cautionIsWrittenInTheSvg() {
        Scene scene = fastRod(150);
        String svg = new Exporter(scene, ExportFixtures.options(0, 600, 96, new ViewChoice.Fit())).svg();

        assertTrue(svg.contains(">CAUTION: induced voltage above"), "caution line in the SVG");
    }
}
