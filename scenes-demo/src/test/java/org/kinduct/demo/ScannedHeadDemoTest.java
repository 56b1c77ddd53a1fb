package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;

/**
 * The scanned-head demo: its map file is the one {@link ScannedHeadModel} writes, the model's ideal
 * block is the closed form, and the pickup's flux over the scan is the integral of the file's own
 * samples.
 */
class ScannedHeadDemoTest {

    private static final String CSV = "/org/kinduct/demo/scanned-head.csv";

    private static String shipped() throws IOException {
        try (InputStream in = ScannedHeadDemoTest.class.getResourceAsStream(CSV)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void shippedScanIsWhatTheModelWrites() throws IOException {
        assertEquals(ScannedHeadModel.csv(), shipped(), "regenerate the scan with ScannedHeadModel's main");
    }

    @Test
    void idealBlockOnItsAxisIsTheClosedForm() {
        // B_z on the axis of a block magnet, half sides a and b, faces at distances d1 and d2:
        // (Br/π)·[atan(ab/(d1·√(a²+b²+d1²))) − atan(ab/(d2·√(a²+b²+d2²)))]
        // (Camacho & Sosa, Rev. Mex. Fís. E 59, 2013, Eq. 16).
        double a = 0.005;
        double b = 0.003;
        double d1 = 0.0015;
        double d2 = 0.0065;
        double want = 1.2 / Math.PI * (Math.atan(a * b / (d1 * Math.sqrt(a * a + b * b + d1 * d1)))
                - Math.atan(a * b / (d2 * Math.sqrt(a * a + b * b + d2 * d2))));
        assertEquals(want, ScannedHeadModel.idealBzT(0, 0), 1e-15 * want);
    }

    /**
     * When the carriage has brought the pickup over the pole (t = 125 ms: x from −4 to 4 mm, y from
     * −2 to 2 mm) its flux is the integral of B_z over that rectangle. Taken straight from the file's
     * samples (17 × 9 of them, 0.5 mm apart, no interpolation) by the composite Simpson and
     * trapezoidal rules, the two differ by 0.4 % where the field bends near the pole's edges; the
     * solver's exact integral of Keys' bicubic through the same samples (third order; Keys, IEEE
     * Trans. ASSP 29(6), 1981) must lie within that spread of Simpson's (common practice).
     */
    @Test
    void pickupFluxOverThePoleIsTheIntegralOfTheSamples() throws IOException {
        double[][] bz = new double[17][9];
        for (String line : shipped().split("\n")) {
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("x")) {
                continue;
            }
            String[] f = line.split(",");
            double x = Double.parseDouble(f[0]);
            double y = Double.parseDouble(f[1]);
            if (Math.abs(x) <= 4 && Math.abs(y) <= 2) {
                bz[(int) Math.round((x + 4) * 2)][(int) Math.round((y + 2) * 2)] = Double.parseDouble(f[2]) * 1e-3;
            }
        }
        double h = 0.0005;
        double simpson = 0;
        double trapezoid = 0;
        for (int i = 0; i <= 16; i++) {
            for (int j = 0; j <= 8; j++) {
                simpson += simpson(i, 16) * simpson(j, 8) * bz[i][j] * h * h / 9;
                trapezoid += trapezoid(i, 16) * trapezoid(j, 8) * bz[i][j] * h * h;
            }
        }
        ConductorState pickup = new SceneSolver(Demos.load("scanned-head")).at(0.125).conductor("scan-pickup")
                .orElseThrow();
        assertEquals(simpson, pickup.fluxWb(), Math.abs(simpson - trapezoid));
    }

    private static double trapezoid(int k, int n) {
        return k == 0 || k == n ? 0.5 : 1;
    }

    private static double simpson(int k, int n) {
        return k == 0 || k == n ? 1 : k % 2 == 1 ? 4 : 2;
    }
}
