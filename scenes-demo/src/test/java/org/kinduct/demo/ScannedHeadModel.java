package org.kinduct.demo;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * The "scan" of the scanned-head demo, made from a model of our own: B_z in the plane 1.5 mm above
 * a 10 × 6 × 5 mm block magnet (Br 1.2 T, north up), shaped as a soft-iron pole piece would shape
 * it (flux drawn toward the pole's middle, then saturating), plus deterministic probe noise. The
 * shipped CSV must equal what this writes ({@code ScannedHeadDemoTest}); regenerate it with
 * {@code java ... org.kinduct.demo.ScannedHeadModel scenes-demo/src/main/resources/org/kinduct/demo/scanned-head.csv}.
 *
 * <p>The ideal block's B_z is that of its two charged faces, σ = ±Br/μ0: a rectangle of charge at
 * height distance d gives ∫∫ d/R³ dA = Σ ±atan(u·v/(d·R)) over its corners (u, v from the point
 * to the corner, R their distance), so B_z = Br/(4π)·[S(d_top) − S(d_bottom)] (Furlani, Permanent
 * Magnet and Electromechanical Devices, 2001, §4.3; Camacho & Sosa, Rev. Mex. Fís. E 59, 2013).
 */
public final class ScannedHeadModel {

    static final double BR_T = 1.2;
    static final double HALF_X_M = 0.005;
    static final double HALF_Y_M = 0.003;
    static final double HEIGHT_M = 0.005;
    static final double STANDOFF_M = 0.0015;
    /** The pole piece draws up to 30 % more flux to its middle, within about 2.5 × 1.5 mm. */
    private static final double CONCENTRATION = 0.3;
    private static final double SPREAD_X_M = 0.0025;
    private static final double SPREAD_Y_M = 0.0015;
    /** Soft iron saturates: B → B_s·tanh(B/B_s). */
    private static final double SATURATION_T = 0.45;
    /** Probe noise, uniform in ±0.8 mT, from a fixed seed. */
    private static final double NOISE_T = 0.8e-3;
    private static final long SEED = 20261205L;
    static final double STEP_M = 0.0005;
    static final int NX = 121;
    static final int NY = 61;

    private ScannedHeadModel() {
    }

    /** B_z of the ideal block magnet in the scan plane, tesla. */
    static double idealBzT(double x, double y) {
        return BR_T / (4 * Math.PI) * (faces(x, y, STANDOFF_M) - faces(x, y, STANDOFF_M + HEIGHT_M));
    }

    private static double faces(double x, double y, double d) {
        double sum = 0;
        for (int i = 0; i < 2; i++) {
            double u = (i == 0 ? -HALF_X_M : HALF_X_M) - x;
            for (int j = 0; j < 2; j++) {
                double v = (j == 0 ? -HALF_Y_M : HALF_Y_M) - y;
                double sign = i == j ? 1 : -1;
                sum += sign * StrictMath.atan(u * v / (d * StrictMath.sqrt(u * u + v * v + d * d)));
            }
        }
        return sum;
    }

    /** The shaped field without noise, tesla. */
    static double shapedBzT(double x, double y) {
        double gather = 1 + CONCENTRATION * StrictMath.exp(-0.5 * (x * x / (SPREAD_X_M * SPREAD_X_M)
                + y * y / (SPREAD_Y_M * SPREAD_Y_M)));
        return SATURATION_T * StrictMath.tanh(idealBzT(x, y) * gather / SATURATION_T);
    }

    /** The file's text: header, then x fastest, rows from the lowest y. */
    static String csv() {
        SplittableRandom noise = new SplittableRandom(SEED);
        StringBuilder out = new StringBuilder("# Kinduct demo: modelled scan of a pole-piece head (see ScannedHeadModel)\n")
                .append("x_mm,y_mm,Bz_mT\n");
        for (int j = 0; j < NY; j++) {
            double y = (j - (NY - 1) / 2) * STEP_M;
            for (int i = 0; i < NX; i++) {
                double x = (i - (NX - 1) / 2) * STEP_M;
                double bz = shapedBzT(x, y) + NOISE_T * (2 * noise.nextDouble() - 1);
                out.append(String.format(Locale.ROOT, "%.1f,%.1f,%.4f\n", x * 1e3, y * 1e3, bz * 1e3));
            }
        }
        return out.toString();
    }

    public static void main(String[] args) throws IOException {
        Files.writeString(Path.of(args[0]), csv(), StandardCharsets.UTF_8);
    }
}
