package org.kinduct.render.paint;

/**
 * Diverging colour scale for B_z, centred on zero: negative (into the screen, ⊗) in teal-blue,
 * positive (out of the screen, ⊙) in amber-brown, near-white at zero.
 *
 * <p>Built in CIELAB: each half runs on a straight line from the light neutral centre
 * (L* = 97) to its end colour, so lightness falls monotonically and equally fast with |B_z| on
 * both sides and the two halves read as equal steps. The blue/orange hue pair stays distinct for
 * the common red–green colour-vision deficiencies (common practice in scientific colour maps; see
 * K. Moreland, "Diverging Color Maps for Scientific Visualization", ISVC 2009, for the approach).
 * CIELAB → sRGB uses the D65 white and the sRGB transfer curve of IEC 61966-2-1:1999.
 */
public final class DivergingScale {

    private static final int SIZE = 513;
    private static final double[] CENTER = {97, 0, 4};
    /** L*, a*, b* of the negative end (deep teal-blue). */
    private static final double[] NEGATIVE = {34, -6, -44};
    /** L*, a*, b* of the positive end (deep amber-brown). */
    private static final double[] POSITIVE = {40, 30, 52};

    private static final int[] LUT = buildLut();

    private DivergingScale() {
    }

    /** Colour for {@code value} on a symmetric scale [−limit, +limit]; values beyond are clamped in colour only. */
    public static int argb(double value, double limit) {
        double f = limit > 0 ? value / limit : 0;
        if (Double.isNaN(f)) {
            return 0x00000000;
        }
        f = Math.max(-1, Math.min(1, f));
        return LUT[(int) Math.round((f + 1) * 0.5 * (SIZE - 1))];
    }

    /** L*, a*, b* beyond the ends: the end colours darker, for saturated values. */
    private static final double[] NEGATIVE_BEYOND = {20, -4, -32};
    private static final double[] POSITIVE_BEYOND = {24, 20, 30};
    private static final int SATURATED_NEGATIVE = labToArgb(NEGATIVE_BEYOND);
    private static final int SATURATED_POSITIVE = labToArgb(POSITIVE_BEYOND);

    /** The colour of values beyond the scale's positive or negative end. */
    public static int saturated(boolean positive) {
        return positive ? SATURATED_POSITIVE : SATURATED_NEGATIVE;
    }

    /** Colour at fraction f ∈ [−1, 1] of the scale. */
    public static int argbAt(double f) {
        return argb(f, 1);
    }

    /** CIELAB lightness at fraction f ∈ [−1, 1], for checks. */
    public static double lightnessAt(double f) {
        return lab(f)[0];
    }

    private static int[] buildLut() {
        int[] lut = new int[SIZE];
        for (int i = 0; i < SIZE; i++) {
            double f = 2.0 * i / (SIZE - 1) - 1;
            lut[i] = labToArgb(lab(f));
        }
        return lut;
    }

    private static double[] lab(double f) {
        double[] end = f < 0 ? NEGATIVE : POSITIVE;
        double s = Math.abs(f);
        return new double[] {
            CENTER[0] + (end[0] - CENTER[0]) * s,
            CENTER[1] + (end[1] - CENTER[1]) * s,
            CENTER[2] + (end[2] - CENTER[2]) * s};
    }

    /** CIE 1976 L*a*b* (D65) to opaque sRGB, CIE 15:2004 inverse formulas and IEC 61966-2-1. */
    static int labToArgb(double[] lab) {
        double fy = (lab[0] + 16) / 116;
        double fx = fy + lab[1] / 500;
        double fz = fy - lab[2] / 200;
        double x = 0.95047 * finv(fx);
        double y = 1.00000 * finv(fy);
        double z = 1.08883 * finv(fz);
        double r = 3.2404542 * x - 1.5371385 * y - 0.4985314 * z;
        double g = -0.9692660 * x + 1.8760108 * y + 0.0415560 * z;
        double b = 0.0556434 * x - 0.2040259 * y + 1.0572252 * z;
        return 0xFF000000 | (channel(r) << 16) | (channel(g) << 8) | channel(b);
    }

    private static double finv(double t) {
        double delta = 6.0 / 29;
        return t > delta ? t * t * t : 3 * delta * delta * (t - 4.0 / 29);
    }

    private static int channel(double linear) {
        double c = Math.max(0, Math.min(1, linear));
        double srgb = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
        return (int) Math.round(srgb * 255);
    }
}
