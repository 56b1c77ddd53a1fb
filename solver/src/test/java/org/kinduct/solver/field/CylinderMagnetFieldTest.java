package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class CylinderMagnetFieldTest {

    private static final long SEED = 0x5EED_0400L;
    private static final double BR = 1.3;
    private static final double RADIUS = 0.01;
    private static final double ULP_LEVEL = 1e-13;
    private static final double STACK_LEVEL = 1e-11;
    /** See BlockMagnetFieldTest: a 1e-12 m stand-off changes the field far below this. */
    private static final double STANDOFF_LIMIT_LEVEL = 1e-7;
    private static final double JUMP_LEVEL = 1e-6;
    /** The two forms of A_φ at their seam, each ~1e-14 accurate, plus a 2e-14 step in ρ. */
    private static final double SEAM_LEVEL = 1e-13;
    /** Richardson over N = 256, 512 leaves O(1/N⁴) ≈ 1e-9 (see CoilFieldsTest). */
    private static final double EXTRAPOLATED_LEVEL = 1e-8;
    /** Composite Gauss–Legendre on [0, a] and [a, b], 20 panels each, of a piecewise smooth B_z. */
    private static final double RADIAL_QUADRATURE_LEVEL = 1e-10;

    @RepeatedTest(20)
    void onAxisFieldMatchesPublishedForm(RepetitionInfo info) {
        long seed = SEED + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double s = r.nextDouble(0, 0.05);
        double length = r.nextDouble(0.001, 0.04);
        // On the axis (Camacho & Sosa, Rev. Mex. Fís. E 59, 8–17, 2013):
        // B_z = (Br/2)[(L + s)/√(R² + (L + s)²) − s/√(R² + s²)].
        double expected = BR / 2 * ((length + s) / Math.hypot(RADIUS, length + s) - s / Math.hypot(RADIUS, s));
        CylinderMagnetField belowPlane = new CylinderMagnetField(0.004, 0.002, RADIUS, -s - length, -s, BR);
        CylinderMagnetField abovePlane = new CylinderMagnetField(0.004, 0.002, RADIUS, s, s + length, BR);
        assertEquals(expected, belowPlane.bz(0.004, 0.002), ULP_LEVEL * expected, "seed " + seed);
        assertEquals(expected, abovePlane.bz(0.004, 0.002), ULP_LEVEL * expected, "seed " + seed);
    }

    /** ρ spread over [0, 3a] with extra draws near the axis and near the rim. */
    private static double drawRho(SplittableRandom r) {
        return switch (r.nextInt(3)) {
            case 0 -> RADIUS * Math.pow(10, r.nextDouble(-6, 0));
            case 1 -> RADIUS * (1 + (r.nextBoolean() ? 1 : -1) * Math.pow(10, r.nextDouble(-4, -1)));
            default -> r.nextDouble(0, 3 * RADIUS);
        };
    }

    @RepeatedTest(100)
    void offAxisFieldMatchesStackOfCircularFilaments(RepetitionInfo info) {
        long seed = SEED + 1000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double rho = drawRho(r);
        double standoff = r.nextDouble(0.001, 0.01);
        double length = r.nextDouble(0.002, 0.02);
        CylinderMagnetField magnet = new CylinderMagnetField(0, 0, RADIUS, -standoff - length, -standoff, BR);
        // The equivalent surface current K = Br/μ0 (Griffiths ch. 6) as loops of current K·dz
        // (B_z of each by Simpson et al. 2001, itself checked against Biot–Savart), summed over
        // the height numerically: the check Derby & Olbert's form needs.
        double expected = NumericalReference.integrate(
                z -> CircularFilament.bz(RADIUS, -z, BR / PhysicalConstants.MU_0, rho),
                -standoff - length, -standoff, 200);
        assertEquals(expected, magnet.bz(rho, 0), STACK_LEVEL * Math.abs(expected) + 1e-15,
                "seed " + seed + " rho/a " + rho / RADIUS);
    }

    @RepeatedTest(100)
    void potentialMatchesStackOfCircularFilaments(RepetitionInfo info) {
        long seed = SEED + 2000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double rho = drawRho(r);
        double standoff = r.nextDouble(0.001, 0.01);
        double length = r.nextDouble(0.002, 0.02);
        CylinderMagnetField magnet = new CylinderMagnetField(0, 0, RADIUS, standoff, standoff + length, BR);
        // Loops of current K·dz with A_φ of each from Jackson eq. 5.37 (checked against dl/r above).
        double expected = NumericalReference.integrate(
                z -> CircularFilament.aPhi(RADIUS, -z, BR / PhysicalConstants.MU_0, rho),
                standoff, standoff + length, 200);
        double[] a = new double[2];
        magnet.potential(0, rho, a);
        // At (0, ρ) the azimuthal direction is −x.
        assertEquals(expected, -a[0], STACK_LEVEL * Math.abs(expected), "seed " + seed + " rho/a " + rho / RADIUS);
        assertEquals(0, a[1], 0, "seed " + seed);
    }

    @Test
    void nearAxisQuadratureAndEllipticFormsAgreeAtTheSwitch() {
        // q = 4aρ/(a + ρ)² = 1/4 at ρ = a(7 − 4√3) = a/(7 + 4√3); step just across it. The two
        // forms are each checked against the stack of loops above; here the seam.
        double rhoBelow = RADIUS / (7 + 4 * Math.sqrt(3)) * (1 - 1e-14);
        double rhoAbove = RADIUS / (7 + 4 * Math.sqrt(3)) * (1 + 1e-14);
        assertTrue(q(rhoBelow) < CylinderMagnetField.CEL_FROM_Q && q(rhoAbove) >= CylinderMagnetField.CEL_FROM_Q);
        CylinderMagnetField magnet = new CylinderMagnetField(0, 0, RADIUS, -0.008, -0.003, BR);
        double below = magnet.aPhi(rhoBelow);
        double above = magnet.aPhi(rhoAbove);
        assertEquals(below, above, SEAM_LEVEL * Math.abs(below));
    }

    private static double q(double rho) {
        return 4 * RADIUS * rho / ((RADIUS + rho) * (RADIUS + rho));
    }

    @RepeatedTest(20)
    void magnetBelowEqualsItsMirrorImageAboveAndFlipsWithMagnetization(RepetitionInfo info) {
        long seed = SEED + 3000 + info.getCurrentRepetition();
        SplittableRandom r = new SplittableRandom(seed);
        double x = r.nextDouble(-0.03, 0.03);
        double y = r.nextDouble(-0.03, 0.03);
        CylinderMagnetField belowPlane = new CylinderMagnetField(0.001, 0, RADIUS, -0.007, -0.002, BR);
        CylinderMagnetField abovePlane = new CylinderMagnetField(0.001, 0, RADIUS, 0.002, 0.007, BR);
        CylinderMagnetField flipped = new CylinderMagnetField(0.001, 0, RADIUS, -0.007, -0.002, -BR);
        // Mirror symmetry z → −z of a z-magnetized magnet, and linearity in the magnetization.
        double bz = belowPlane.bz(x, y);
        assertEquals(bz, abovePlane.bz(x, y), ULP_LEVEL * Math.abs(bz), "seed " + seed);
        assertEquals(-bz, flipped.bz(x, y), 0, "seed " + seed);
        double[] ab = new double[2];
        double[] aa = new double[2];
        belowPlane.potential(x, y, ab);
        abovePlane.potential(x, y, aa);
        assertEquals(ab[0], aa[0], ULP_LEVEL * Math.hypot(ab[0], ab[1]), "seed " + seed);
        assertEquals(ab[1], aa[1], ULP_LEVEL * Math.hypot(ab[0], ab[1]), "seed " + seed);
    }

    @RepeatedTest(20)
    void faceInThePlaneIsTheLimitOfASmallStandoff(RepetitionInfo info) {
        long seed = SEED + 4000 + info.getCurrentRepetition();
        double rho = new SplittableRandom(seed).nextDouble(0, 2 * RADIUS);
        // B_z continuous through a magnetized face (normal B continuous, Griffiths ch. 6).
        CylinderMagnetField touching = new CylinderMagnetField(0, 0, RADIUS, -0.005, -0.0, BR);
        CylinderMagnetField near = new CylinderMagnetField(0, 0, RADIUS, -0.005, -1e-12, BR);
        double[] at = new double[2];
        double[] an = new double[2];
        touching.potential(rho, 0, at);
        near.potential(rho, 0, an);
        assertEquals(near.bz(rho, 0), touching.bz(rho, 0), STANDOFF_LIMIT_LEVEL * BR, "seed " + seed);
        assertEquals(an[1], at[1], STANDOFF_LIMIT_LEVEL * BR * RADIUS, "seed " + seed);
        assertTrue(Double.isFinite(touching.bz(RADIUS, 0)), "rim stays finite");
    }

    @Test
    void touchingMagnetFieldJumpsByHalfTheRemanenceAtTheRim() {
        // A current sheet K makes the tangential B jump by μ0K across it (Griffiths ch. 5, boundary
        // conditions); in the plane where the sheet ends, by symmetry half of that: μ0K/2 = Br/2.
        CylinderMagnetField magnet = new CylinderMagnetField(0, 0, RADIUS, -0.006, -0.0, BR);
        double delta = 1e-9 * RADIUS;
        double jump = magnet.bz(RADIUS - delta, 0) - magnet.bz(RADIUS + delta, 0);
        assertEquals(BR / 2, jump, JUMP_LEVEL * BR);
        double rim = magnet.bz(RADIUS, 0);
        assertEquals((magnet.bz(RADIUS - delta, 0) + magnet.bz(RADIUS + delta, 0)) / 2, rim, JUMP_LEVEL * BR, "mean on the rim");
    }

    @Test
    void fluxOfTouchingMagnetThroughCoaxialPolygonMatchesRadialQuadrature() {
        // Stand-off 0: B_z jumps at the rim ρ = a. Reference: Φ(b) = ∫₀^b 2πρ B_z(ρ) dρ split at
        // ρ = a, for a circle of radius b = 1.6a; the polygon's defect is removed as in the coil
        // tests (regular N-gons inscribed in the circle, Richardson over N = 256 and 512). The
        // rim lies inside the loop, so the loop's edges stay where A is smooth.
        CylinderMagnetField magnet = new CylinderMagnetField(0, 0, RADIUS, -0.006, -0.0, BR);
        double b = 1.6 * RADIUS;
        double expected = NumericalReference.integrate(rho -> 2 * Math.PI * rho * magnet.bz(rho, 0), 0, RADIUS, 20)
                + NumericalReference.integrate(rho -> 2 * Math.PI * rho * magnet.bz(rho, 0), RADIUS, b, 20);
        double[][] p1 = CoilFieldsTest.regularPolygon(0, 0, b, 256);
        double[][] p2 = CoilFieldsTest.regularPolygon(0, 0, b, 512);
        double extrapolated = (4 * magnet.flux(p2[0], p2[1]) - magnet.flux(p1[0], p1[1])) / 3;
        assertEquals(expected, extrapolated, EXTRAPOLATED_LEVEL * Math.abs(expected));
        // Stokes on the circle itself: 2πb·A_φ(b).
        assertEquals(expected, 2 * Math.PI * b * magnet.aPhi(b), RADIAL_QUADRATURE_LEVEL * Math.abs(expected));
    }

    @Test
    void magnetReachingThroughThePlaneIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CylinderMagnetField(0, 0, RADIUS, -0.001, 0.002, BR));
        assertTrue(e.getMessage().contains("must not cross the drawing plane"), e.getMessage());
    }
}
