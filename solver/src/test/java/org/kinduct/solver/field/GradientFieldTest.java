package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link GradientField#jet} of every physical source: A as {@link PlaneField#potential} gives it,
 * the gradient against an independent numerical derivative of that potential, B_z as
 * {@link PlaneField#bz} gives it, and the identities of a Coulomb-gauge potential of in-plane
 * currents (zero divergence, curl = B_z; Griffiths, <i>Introduction to Electrodynamics</i>, 4th
 * ed., 2013, §5.4.1). Seeded random points in and around the sources.
 */
class GradientFieldTest {

    private static final long SEED = 0x6AAD_1700L;
    private static final int CASES = 40;
    /** Step of the central difference, metres: 1e-6 of the ~1 cm sources. */
    private static final double STEP_M = 1e-8;
    /**
     * The six-point central difference leaves O(h⁶·A⁽⁷⁾) ≈ (1e-6)⁶ relative, and rounding
     * ε·|A|/h ≈ 1e-16·|A|/1e-8 m: a few 1e-9 of the gradient scale |A|/(1 cm).
     */
    private static final double GRADIENT_LEVEL = 1e-6;
    /** A and B_z: the same closed forms, summed in another order at most. */
    private static final double SAME_FORM_LEVEL = 1e-13;
    /**
     * A cylinder magnet's jet interpolates its closed forms ({@link RadialTable}): relative to the
     * field's size there (the gradient's, which stays finite where B_z crosses zero); the table's own
     * test bounds it against the closed forms.
     */
    private static final double TABLE_LEVEL = 1e-12;
    /** Curl and divergence against B_z: the jet's own rounding. */
    private static final double IDENTITY_LEVEL = 1e-11;

    static Stream<Named<GradientField>> fields() {
        return Stream.of(
                Named.of("pentagon coil above", new PolygonCoilField(new double[] {-0.01, 0.012, 0.015, 0.0, -0.014},
                        new double[] {-0.012, -0.01, 0.008, 0.016, 0.004}, 0.004, 10)),
                Named.of("circle coil below", new CircleCoilField(0.002, -0.001, 0.012, -0.005, 7)),
                Named.of("rotated block magnet below",
                        new BlockMagnetField(0.001, 0.002, 0.4, 0.02, 0.012, -0.009, -0.004, 1.2)),
                Named.of("block magnet above, magnetized -z",
                        new BlockMagnetField(-0.003, 0.001, 0, 0.01, 0.01, 0.0015, 0.0055, -1.25)),
                Named.of("cylinder magnet above, magnetized -z",
                        new CylinderMagnetField(-0.002, 0.001, 0.008, 0.003, 0.01, -1.1)),
                Named.of("cylinder magnet below", new CylinderMagnetField(0.001, 0.0, 0.008, -0.007, -0.002, 1.2)));
    }

    @ParameterizedTest
    @MethodSource("fields")
    void jetMatchesPotentialItsNumericalGradientAndBz(GradientField field) {
        SplittableRandom r = new SplittableRandom(SEED);
        double[] jet = new double[GradientField.JET_SIZE];
        double[] a = new double[2];
        for (int c = 0; c < CASES; c++) {
            double x = r.nextDouble(-0.03, 0.03);
            double y = r.nextDouble(-0.03, 0.03);
            String where = "seed " + SEED + " case " + c + " at (" + x + ", " + y + ")";
            field.jet(x, y, jet);
            field.potential(x, y, a);
            double aScale = Math.hypot(a[0], a[1]);
            double bz = field.bz(x, y);
            double jetScale = Math.abs(jet[2]) + Math.abs(jet[3]) + Math.abs(jet[4]) + Math.abs(jet[5]);
            boolean tabulated = field instanceof CylinderMagnetField;
            double aLevel = (tabulated ? TABLE_LEVEL : SAME_FORM_LEVEL) * aScale;
            assertEquals(a[0], jet[0], aLevel, where);
            assertEquals(a[1], jet[1], aLevel, where);
            assertEquals(bz, jet[6], tabulated ? TABLE_LEVEL * jetScale : SAME_FORM_LEVEL * Math.abs(bz) + 1e-18, where);

            double[] ddx = derivative(field, x, y, 1, 0);
            double[] ddy = derivative(field, x, y, 0, 1);
            double scale = Math.abs(ddx[0]) + Math.abs(ddx[1]) + Math.abs(ddy[0]) + Math.abs(ddy[1]);
            assertEquals(ddx[0], jet[2], GRADIENT_LEVEL * scale, "∂A_x/∂x " + where);
            assertEquals(ddy[0], jet[3], GRADIENT_LEVEL * scale, "∂A_x/∂y " + where);
            assertEquals(ddx[1], jet[4], GRADIENT_LEVEL * scale, "∂A_y/∂x " + where);
            assertEquals(ddy[1], jet[5], GRADIENT_LEVEL * scale, "∂A_y/∂y " + where);
            assertEquals(0, jet[2] + jet[5], IDENTITY_LEVEL * jetScale, "divergence " + where);
            assertEquals(bz, jet[4] - jet[3], IDENTITY_LEVEL * jetScale, "curl " + where);
        }
    }

    /**
     * ∂A/∂(ex, ey) by the six-point central difference
     * [45(f₁ − f₋₁) − 9(f₂ − f₋₂) + (f₃ − f₋₃)]/(60h) (Abramowitz &amp; Stegun 1964, eq. 25.3.6 family;
     * from memory).
     */
    private static double[] derivative(PlaneField field, double x, double y, double ex, double ey) {
        double[] d = new double[2];
        double[] p = new double[2];
        double[] m = new double[2];
        int[] weights = {45, -9, 1};
        for (int k = 1; k <= 3; k++) {
            field.potential(x + k * STEP_M * ex, y + k * STEP_M * ey, p);
            field.potential(x - k * STEP_M * ex, y - k * STEP_M * ey, m);
            d[0] += weights[k - 1] * (p[0] - m[0]);
            d[1] += weights[k - 1] * (p[1] - m[1]);
        }
        d[0] /= 60 * STEP_M;
        d[1] /= 60 * STEP_M;
        return d;
    }
}
