package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class BlockMagnetFieldTest {

    private static final long SEED = 0x5EED_0300L;
    private static final double BR = 1.2;
    private static final double ULP_LEVEL = 1e-13;
    private static final double QUADRATURE_LEVEL = 1e-10;
    /** The ribbon's closed form and its reference are both differences of four parts of this accuracy. */
    private static final double RIBBON_LEVEL = 1e-12;
    /** A 1e-12 m stand-off moves B_z by ~Br·(1e-12 m / 1 mm)·log: far below this. */
    private static final double STANDOFF_LIMIT_LEVEL = 1e-7;
    private static final double JUMP_LEVEL = 1e-6;

    /** A magnet 20 × 12 × 5 mm, below the plane at stand-off s, rotated by angle about (cx, cy). */
    private static BlockMagnetField below(double cx, double cy, double angle, double standoff) {
        return new BlockMagnetField(cx, cy, angle, 0.020, 0.012, -standoff - 0.005, -standoff, BR);
    }

    @RepeatedTest(20)
    void onAxisFieldMatchesPublishedCheckForm(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double a = r.nextDouble(0.002, 0.05);
        double b = r.nextDouble(0.002, 0.05);
        double thickness = r.nextDouble(0.001, 0.03);
        double s = r.nextDouble(0.0001, 0.05);
        // On the axis of an a×b face at distance s, thickness L (charge model; Camacho & Sosa,
        // Rev. Mex. Fís. E 59, 2013): B_z = (Br/π)[atan(ab/(2s√(4s²+a²+b²))) − atan(ab/(2(s+L)√(4(s+L)²+a²+b²)))].
        double far = s + thickness;
        double expected = BR / Math.PI * (Math.atan(a * b / (2 * s * Math.sqrt(4 * s * s + a * a + b * b)))
                - Math.atan(a * b / (2 * far * Math.sqrt(4 * far * far + a * a + b * b))));
        BlockMagnetField belowPlane = new BlockMagnetField(0.01, -0.02, 0.3, a, b, -far, -s, BR);
        BlockMagnetField abovePlane = new BlockMagnetField(0.01, -0.02, 0.3, a, b, s, far, BR);
        assertEquals(expected, belowPlane.bz(0.01, -0.02), ULP_LEVEL * expected, "seed " + seed);
        assertEquals(expected, abovePlane.bz(0.01, -0.02), ULP_LEVEL * expected, "seed " + seed);
    }

    @RepeatedTest(30)
    void offAxisFieldMatchesNumericalSurfaceChargeIntegral(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double standoff = r.nextDouble(0.002, 0.01);
        double x = r.nextDouble(-0.03, 0.03);
        double y = r.nextDouble(-0.03, 0.03);
        double zTop = -standoff;
        double zBottom = -standoff - 0.005;
        // Charge model (Furlani 2001): σ = ±M on the top and bottom faces, H = (1/4π)∬σ (r − r')/|r − r'|³;
        // outside the magnet B = μ0H, so B_z = (Br/4π)[∬_top (0 − z2)/R³ − ∬_bottom (0 − z1)/R³],
        // integrated numerically over the unrotated 20 × 12 mm faces.
        double expected = BR / (4 * Math.PI) * (faceIntegral(x, y, zTop) - faceIntegral(x, y, zBottom));
        double actual = below(0, 0, 0, standoff).bz(x, y);
        assertEquals(expected, actual, QUADRATURE_LEVEL * Math.abs(expected) + 1e-13, "seed " + seed);
    }

    @RepeatedTest(30)
    void farFieldMatchesNumericalSurfaceChargeIntegralToTheRoundingOfItsArctangents(RepetitionInfo info) {
        long seed = SEED + 1500 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double sizes = new double[] {10, 30, 100}[info.getCurrentRepetition() % 3];
        double direction = r.nextDouble(0, 2 * Math.PI);
        double distance = sizes * 0.020;
        double x = distance * Math.cos(direction);
        double y = distance * Math.sin(direction);
        double standoff = r.nextDouble(0.002, 0.01);
        // The same charge-model reference as above. Far away each face's arctangents are near ±π/2
        // and their sum, the face's solid angle, falls as (size/distance)³: rounding of the terms,
        // a few ulp of π/2, is that much larger relative to B_z.
        double expected = BR / (4 * Math.PI)
                * (faceIntegral(x, y, -standoff) - faceIntegral(x, y, -standoff - 0.005));
        BlockMagnetField magnet = below(0, 0, 0, standoff);
        double tolerance = 1e-13 * sizes * sizes * sizes * Math.abs(expected);
        assertEquals(expected, magnet.bz(x, y), tolerance, "seed " + seed + ", " + sizes + " sizes away");
        double[] jet = new double[GradientField.JET_SIZE];
        magnet.jet(x, y, jet);
        assertEquals(magnet.bz(x, y), jet[6], 0, "the jet's B_z is the field's");
    }

    private static double faceIntegral(double x, double y, double zFace) {
        double dz = -zFace;
        return NumericalReference.integrateRectangle((u, v) -> {
            double rx = x - u;
            double ry = y - v;
            double r2 = rx * rx + ry * ry + dz * dz;
            return dz / (r2 * Math.sqrt(r2));
        }, -0.010, 0.010, -0.006, 0.006, 24);
    }

    @RepeatedTest(30)
    void potentialMatchesStackOfStraightFilamentsRoundTheSides(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double standoff = r.nextDouble(0.001, 0.01);
        double angle = r.nextDouble(0, 2 * Math.PI);
        double x = r.nextDouble(-0.04, 0.04);
        double y = r.nextDouble(-0.04, 0.04);
        BlockMagnetField magnet = below(0.003, -0.001, angle, standoff);
        // Equivalent surface current K = Br/μ0 counter-clockwise round the side faces (Furlani 2001;
        // Griffiths ch. 6): filaments of current K·dz along the rotated rectangle's edges,
        // summed over the height numerically.
        double[] corners = rotatedRectangle(0.003, -0.001, angle, 0.020, 0.012);
        double[] expected = new double[2];
        for (int component = 0; component < 2; component++) {
            int c = component;
            expected[c] = NumericalReference.integrate(z -> {
                double[] a = new double[2];
                for (int i = 0; i < 4; i++) {
                    int j = (i + 1) % 4;
                    StraightFilament.addPotential(corners[2 * i], corners[2 * i + 1], corners[2 * j],
                            corners[2 * j + 1], z, BR / PhysicalConstants.MU_0, x, y, a);
                }
                return a[c];
            }, -standoff - 0.005, -standoff, 40);
        }
        double[] actual = new double[2];
        magnet.potential(x, y, actual);
        double scale = Math.hypot(expected[0], expected[1]);
        assertEquals(expected[0], actual[0], QUADRATURE_LEVEL * scale, "seed " + seed);
        assertEquals(expected[1], actual[1], QUADRATURE_LEVEL * scale, "seed " + seed);
    }

    /** Corners (x0, y0, x1, y1, ...) counter-clockwise. */
    static double[] rotatedRectangle(double cx, double cy, double angle, double sizeX, double sizeY) {
        double[] local = {-sizeX / 2, -sizeY / 2, sizeX / 2, -sizeY / 2, sizeX / 2, sizeY / 2, -sizeX / 2, sizeY / 2};
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        double[] out = new double[8];
        for (int i = 0; i < 4; i++) {
            out[2 * i] = cx + c * local[2 * i] - s * local[2 * i + 1];
            out[2 * i + 1] = cy + s * local[2 * i] + c * local[2 * i + 1];
        }
        return out;
    }

    @RepeatedTest(100)
    void ribbonClosedFormMatchesNumericalHeightIntegral(RepetitionInfo info) {
        long seed = SEED + 3000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double t1 = r.nextDouble(-0.05, 0.05);
        double t2 = t1 + r.nextDouble(0.001, 0.05);
        double c = r.nextInt(5) == 0 ? 0 : r.nextDouble(0, 0.05);
        double zLow = r.nextDouble(-0.05, 0.05);
        double zHigh = r.nextInt(5) == 0 ? 0 : zLow + r.nextDouble(0.001, 0.05);
        // The closed form G(t, c, z) = z·asinh(t/√(c²+z²)) + t·asinh(z/√(c²+t²)) − c·atan(tz/(cR))
        // against numerical integrals of the kernel asinh(t/√(c² + z²)) (fundamental theorem of
        // calculus), each taken from z = 0 where the kernel may be log-singular (c = 0).
        double[] parts = new double[4];
        double[] ts = {t2, t2, t1, t1};
        double[] zs = {zHigh, zLow, zHigh, zLow};
        double magnitude = 0;
        for (int i = 0; i < 4; i++) {
            parts[i] = kernelIntegralFromZero(ts[i], c, zs[i]);
            magnitude += Math.abs(parts[i]);
        }
        double expected = parts[0] - parts[1] - parts[2] + parts[3];
        assertEquals(expected, BlockMagnetField.ribbon(t1, t2, c, zLow, zHigh), RIBBON_LEVEL * magnitude + 1e-18,
                "seed " + seed);
    }

    /**
     * ∫₀^Z asinh(t/√(c² + z²)) dz with z = Z·u³: the kernel is log-singular at z = 0 when c = 0 and
     * peaked within |z| ≲ c otherwise, and the cubic map makes it smooth in u.
     */
    private static double kernelIntegralFromZero(double t, double c, double zEnd) {
        return NumericalReference.integrate(u -> {
            double z = zEnd * u * u * u;
            double inner = Math.sqrt(c * c + z * z);
            return inner == 0 ? 0 : asinh(t / inner) * 3 * zEnd * u * u;
        }, 0, 1, 200);
    }

    private static double asinh(double u) {
        return Math.signum(u) * Math.log(Math.abs(u) + Math.sqrt(u * u + 1));
    }

    @RepeatedTest(20)
    void reversedMagnetizationReversesTheField(RepetitionInfo info) {
        long seed = SEED + 4000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.03, 0.03);
        double y = r.nextDouble(-0.03, 0.03);
        BlockMagnetField north = new BlockMagnetField(0, 0, 0.4, 0.01, 0.02, -0.006, -0.001, BR);
        BlockMagnetField south = new BlockMagnetField(0, 0, 0.4, 0.01, 0.02, -0.006, -0.001, -BR);
        double[] an = new double[2];
        double[] as = new double[2];
        north.potential(x, y, an);
        south.potential(x, y, as);
        // Linearity of the field in the magnetization (charge and current models alike).
        assertEquals(-north.bz(x, y), south.bz(x, y), 0, "seed " + seed);
        assertEquals(-an[0], as[0], 0, "seed " + seed);
        assertEquals(-an[1], as[1], 0, "seed " + seed);
    }

    @RepeatedTest(20)
    void magnetBelowEqualsItsMirrorImageAbove(RepetitionInfo info) {
        long seed = SEED + 5000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.03, 0.03);
        double y = r.nextDouble(-0.03, 0.03);
        BlockMagnetField belowPlane = new BlockMagnetField(0.002, 0, 0.7, 0.01, 0.02, -0.006, -0.001, BR);
        BlockMagnetField abovePlane = new BlockMagnetField(0.002, 0, 0.7, 0.01, 0.02, 0.001, 0.006, BR);
        // Reflection z → −z maps a z-magnetized magnet to one with the same magnetization (M is
        // an axial vector); B_z and the in-plane A are even under it on the plane z = 0.
        double[] ab = new double[2];
        double[] aa = new double[2];
        belowPlane.potential(x, y, ab);
        abovePlane.potential(x, y, aa);
        double bz = belowPlane.bz(x, y);
        assertEquals(bz, abovePlane.bz(x, y), ULP_LEVEL * Math.abs(bz), "seed " + seed);
        assertEquals(ab[0], aa[0], ULP_LEVEL * Math.hypot(ab[0], ab[1]), "seed " + seed);
        assertEquals(ab[1], aa[1], ULP_LEVEL * Math.hypot(ab[0], ab[1]), "seed " + seed);
    }

    @RepeatedTest(20)
    void squareMagnetTurnedByQuarterTurnIsUnchanged(RepetitionInfo info) {
        long seed = SEED + 6000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.03, 0.03);
        double y = r.nextDouble(-0.03, 0.03);
        double angle = r.nextDouble(0, Math.PI);
        BlockMagnetField square = new BlockMagnetField(0.001, 0.002, angle, 0.015, 0.015, -0.008, -0.002, BR);
        BlockMagnetField turned = new BlockMagnetField(0.001, 0.002, angle + Math.PI / 2, 0.015, 0.015, -0.008,
                -0.002, BR);
        double[] as = new double[2];
        double[] at = new double[2];
        square.potential(x, y, as);
        turned.potential(x, y, at);
        double bz = square.bz(x, y);
        // A square block is symmetric under a quarter turn about its axis.
        assertEquals(bz, turned.bz(x, y), ULP_LEVEL * Math.abs(bz) + 1e-16, "seed " + seed);
        assertEquals(as[0], at[0], ULP_LEVEL * Math.hypot(as[0], as[1]), "seed " + seed);
        assertEquals(as[1], at[1], ULP_LEVEL * Math.hypot(as[0], as[1]), "seed " + seed);
    }

    @RepeatedTest(20)
    void faceInThePlaneIsTheLimitOfASmallStandoff(RepetitionInfo info) {
        long seed = SEED + 7000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.02, 0.02);
        double y = r.nextDouble(-0.02, 0.02);
        // B_z is continuous through a magnetized face (normal B continuous, Griffiths ch. 6), so
        // the field on a face lying in the plane is the limit of vanishing stand-off.
        for (boolean aboveSide : new boolean[] {false, true}) {
            double z = aboveSide ? 1 : -1;
            BlockMagnetField touching = aboveSide
                    ? new BlockMagnetField(0, 0, 0.2, 0.02, 0.012, 0, 0.005, BR)
                    : new BlockMagnetField(0, 0, 0.2, 0.02, 0.012, -0.005, -0.0, BR);
            double gap = 1e-12;
            BlockMagnetField near = aboveSide
                    ? new BlockMagnetField(0, 0, 0.2, 0.02, 0.012, gap, 0.005, BR)
                    : new BlockMagnetField(0, 0, 0.2, 0.02, 0.012, -0.005, -gap, BR);
            double[] at = new double[2];
            double[] an = new double[2];
            touching.potential(x, y, at);
            near.potential(x, y, an);
            assertEquals(near.bz(x, y), touching.bz(x, y), STANDOFF_LIMIT_LEVEL * BR, "seed " + seed + " side " + z);
            assertEquals(an[0], at[0], STANDOFF_LIMIT_LEVEL * BR * 0.01, "seed " + seed + " side " + z);
            assertEquals(an[1], at[1], STANDOFF_LIMIT_LEVEL * BR * 0.01, "seed " + seed + " side " + z);
            assertTrue(Double.isFinite(touching.bz(0.01, 0.0)), "footprint edge stays finite");
        }
    }

    @Test
    void touchingMagnetFieldJumpsByHalfTheRemanenceAtTheFootprintEdge() {
        // The side face carries a current sheet K = Br/μ0; in the plane where it ends, B_z jumps by
        // half of μ0K (Griffiths ch. 5, boundary conditions, halved by symmetry at the sheet's end).
        BlockMagnetField magnet = new BlockMagnetField(0, 0, 0, 0.020, 0.012, -0.005, -0.0, BR);
        double delta = 1e-11;
        double jump = magnet.bz(0.010 - delta, 0.001) - magnet.bz(0.010 + delta, 0.001);
        assertEquals(BR / 2, jump, JUMP_LEVEL * BR);
        double edge = magnet.bz(0.010, 0.001);
        assertEquals((magnet.bz(0.010 - delta, 0.001) + magnet.bz(0.010 + delta, 0.001)) / 2, edge, JUMP_LEVEL * BR,
                "mean on the edge");
    }

    @Test
    void fluxAndMomentsOfTouchingMagnetMatchQuadratureSplitAtTheFootprint() {
        // Stand-off 0: B_z jumps across the footprint's edges and A has logarithmic kinks there.
        // Reference: 2-D quadrature of B_z over the loop cut along the footprint lines x = ±10 mm,
        // y = ±6 mm, where B_z is smooth on each piece (Stokes' theorem).
        BlockMagnetField magnet = new BlockMagnetField(0, 0, 0, 0.020, 0.012, -0.005, -0.0, BR);
        double[] xCuts = {-0.004, 0.010, 0.025};
        double[] yCuts = {-0.013, -0.006, 0.006, 0.009};
        double expected = 0;
        double magnitude = 0;
        for (int i = 0; i + 1 < xCuts.length; i++) {
            for (int j = 0; j + 1 < yCuts.length; j++) {
                expected += NumericalReference.integrateRectangle(magnet::bz, xCuts[i], xCuts[i + 1], yCuts[j],
                        yCuts[j + 1], 8);
                magnitude += NumericalReference.integrateRectangle((x, y) -> Math.abs(magnet.bz(x, y)), xCuts[i],
                        xCuts[i + 1], yCuts[j], yCuts[j + 1], 8);
            }
        }
        double flux = magnet.flux(new double[] {-0.004, 0.025, 0.025, -0.004}, new double[] {-0.013, -0.013, 0.009, 0.009});
        assertEquals(expected, flux, QUADRATURE_LEVEL * magnitude);
        // Moments along y = 0 from x = −4 mm to 25 mm, split at the footprint edge x = 10 mm (s = 14/29).
        double[] moments = new double[2];
        magnet.bzMoments(-0.004, 0, 0.025, 0, moments);
        double cut = 14.0 / 29;
        double m0 = NumericalReference.integrate(s -> magnet.bz(-0.004 + 0.029 * s, 0), 0, cut, 20)
                + NumericalReference.integrate(s -> magnet.bz(-0.004 + 0.029 * s, 0), cut, 1, 20);
        double m1 = NumericalReference.integrate(s -> s * magnet.bz(-0.004 + 0.029 * s, 0), 0, cut, 20)
                + NumericalReference.integrate(s -> s * magnet.bz(-0.004 + 0.029 * s, 0), cut, 1, 20);
        assertEquals(m0, moments[0], QUADRATURE_LEVEL * Math.abs(m0));
        assertEquals(m1, moments[1], QUADRATURE_LEVEL * Math.abs(m0));
    }

    @Test
    void magnetReachingThroughThePlaneIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BlockMagnetField(0, 0, 0, 0.01, 0.01, -0.001, 0.002, BR));
        assertTrue(e.getMessage().contains("must not cross the drawing plane"), e.getMessage());
    }
}
