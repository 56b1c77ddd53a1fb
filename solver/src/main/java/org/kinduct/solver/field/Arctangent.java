package org.kinduct.solver.field;

/**
 * atan and atan2 in plain Java, bit for bit what {@link StrictMath} returns. On Java 17 both
 * {@link Math#atan2} and {@link Math#atan} are calls into the native fdlibm (no intrinsic), and the
 * block magnet's closed forms take six of them at every quadrature node; the same algorithm
 * compiled as Java runs about 1.7 times faster on the smooth arguments the kernels give (and 1.1
 * times on random ones). Hipparchus' {@code FastMath.atan2} was measured too: 1.7 times slower
 * than the native one here, as it carries extra precision.
 *
 * <p>Method and constants: fdlibm 5.3, {@code s_atan.c} and {@code e_atan2.c} (Sun Microsystems,
 * 1993: "Permission to use, copy, modify, and distribute this software is freely granted,
 * provided that this notice is preserved"), which {@code StrictMath} is specified to follow. atan
 * reduces |x| to |t| ≤ 7/16 with atan(x) = atan(c) + atan((x − c)/(1 + c·x)) for c = 1/2, 1, 3/2, ∞
 * (Abramowitz &amp; Stegun, <i>Handbook of Mathematical Functions</i>, 1964, eq. 4.4.34), then a
 * degree-23 odd polynomial, with atan(c) split into high and low parts; error below one ulp.
 * atan2 adds the quadrant and the IEEE special cases (signed zeros, infinities).
 */
final class Arctangent {

    /** atan(1/2), atan(1), atan(3/2), atan(∞): high parts, and what they miss. */
    private static final double[] ATAN_HI = {4.63647609000806093515e-01, 7.85398163397448278999e-01,
        9.82793723247329054082e-01, 1.57079632679489655800e+00};
    private static final double[] ATAN_LO = {2.26987774529616870924e-17, 3.06161699786838301793e-17,
        1.39033110312309984516e-17, 6.12323399573676603587e-17};
    private static final double T0 = 3.33333333333329318027e-01;
    private static final double T1 = -1.99999999998764832476e-01;
    private static final double T2 = 1.42857142725034663711e-01;
    private static final double T3 = -1.11111104054623557880e-01;
    private static final double T4 = 9.09088713343650656196e-02;
    private static final double T5 = -7.69187620504482999495e-02;
    private static final double T6 = 6.66107313738753120669e-02;
    private static final double T7 = -5.83357013379057348645e-02;
    private static final double T8 = 4.97687799461593236017e-02;
    private static final double T9 = -3.65315727442169155270e-02;
    private static final double T10 = 1.62858201153657823623e-02;
    private static final double PI = 3.1415926535897931160e+00;
    /** π − PI. */
    private static final double PI_LO = 1.2246467991473531772e-16;
    private static final double HALF_PI = 1.5707963267948965580e+00;
    private static final double QUARTER_PI = 7.8539816339744827900e-01;

    private Arctangent() {
    }

    /** atan(x), as {@link StrictMath#atan}. */
    static double atan(double x) {
        double ax = Math.abs(x);
        if (!(ax < 0x1p66)) {
            return Double.isNaN(x) ? x : Math.copySign(ATAN_HI[3] + ATAN_LO[3], x);
        }
        int id;
        double t;
        if (ax < 0.4375) {
            if (ax < 0x1p-27) {
                return x;
            }
            id = -1;
            t = x;
        } else if (ax < 0.6875) {
            id = 0;
            t = (2.0 * ax - 1.0) / (2.0 + ax);
        } else if (ax < 1.1875) {
            id = 1;
            t = (ax - 1.0) / (ax + 1.0);
        } else if (ax < 2.4375) {
            id = 2;
            t = (ax - 1.5) / (1.0 + 1.5 * ax);
        } else {
            id = 3;
            t = -1.0 / ax;
        }
        double z = t * t;
        double w = z * z;
        // Odd and even coefficients summed apart, as fdlibm does (the same roundings).
        double s1 = z * (T0 + w * (T2 + w * (T4 + w * (T6 + w * (T8 + w * T10)))));
        double s2 = w * (T1 + w * (T3 + w * (T5 + w * (T7 + w * T9))));
        if (id < 0) {
            return t - t * (s1 + s2);
        }
        double r = ATAN_HI[id] - ((t * (s1 + s2) - ATAN_LO[id]) - t);
        return x < 0 ? -r : r;
    }

    /** The angle of (x, y) in (−π, π], as {@link StrictMath#atan2}. */
    static double atan2(double y, double x) {
        if (Double.isNaN(x) || Double.isNaN(y)) {
            return x + y;
        }
        if (x == 1.0) {
            return atan(y);
        }
        boolean yNegative = Math.copySign(1.0, y) < 0;
        boolean xNegative = Math.copySign(1.0, x) < 0;
        if (y == 0) {
            return xNegative ? (yNegative ? -PI : PI) : y;
        }
        if (x == 0) {
            return yNegative ? -HALF_PI : HALF_PI;
        }
        if (Double.isInfinite(x)) {
            double angle = Double.isInfinite(y) ? (xNegative ? 3 * QUARTER_PI : QUARTER_PI) : (xNegative ? PI : 0.0);
            return yNegative ? -angle : angle;
        }
        if (Double.isInfinite(y)) {
            return yNegative ? -HALF_PI : HALF_PI;
        }
        // fdlibm's exponent difference, from the high words with their leading mantissa bits.
        int k = (highWord(y) - highWord(x)) >> 20;
        double z;
        if (k > 60) {
            z = HALF_PI + 0.5 * PI_LO;
        } else if (xNegative && k < -60) {
            z = 0.0;
        } else {
            z = atan(Math.abs(y / x));
        }
        if (!xNegative) {
            return yNegative ? -z : z;
        }
        return yNegative ? (z - PI_LO) - PI : PI - (z - PI_LO);
    }

    /** The upper 32 bits of |v|. */
    private static int highWord(double v) {
        return (int) (Double.doubleToRawLongBits(v) >>> 32) & 0x7fffffff;
    }
}
