package org.kinduct.demo;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;

/**
 * The gradiometer demo's stray pickup by hand: the floor coil's B_z off its axis in closed form,
 * integrated over each lobe of the figure-eight. Values from the scene file; shared by the demo's
 * hand calculation and the report's rejection test.
 */
public final class GradiometerReference {

    private static final double MU0 = 1.25663706212e-6; // CODATA 2018
    /** Floor coil: radius, turns, current amplitude, frequency, plane 0.3 m below, centre (60 mm, 0). */
    private static final double COIL_RADIUS = 0.5;
    private static final int COIL_TURNS = 10;
    private static final double COIL_AMPS = 5;
    public static final double OMEGA = 2 * Math.PI * 50;
    private static final double COIL_Z = 0.3;
    private static final double COIL_X = 0.060;
    /** Pickup turns. */
    public static final int TURNS = 30;
    /** Gauss–Legendre nodes per direction: the field varies on the coil's 0.5 m scale across a 20 mm lobe. */
    private static final GaussIntegrator NODES = new GaussIntegratorFactory().legendre(16, -1, 1);

    private GradiometerReference() {
    }

    /**
     * B_z per ampere of one circular turn of radius a at height z below, ρ off its axis:
     * B_z = μ0/(2π)·[K(m) + (a² − ρ² − z²)/((a − ρ)² + z²)·E(m)]/√((a + ρ)² + z²), m = 4aρ/((a + ρ)² + z²)
     * (Smythe, Static and Dynamic Electricity, 3rd ed., 1968, §7.10; K, E with parameter m as in
     * Abramowitz &amp; Stegun 17.3), T/A.
     */
    static double bzPerAmp(double rho) {
        double a = COIL_RADIUS;
        double z = COIL_Z;
        double far = (a + rho) * (a + rho) + z * z;
        double m = 4 * a * rho / far;
        return MU0 / (2 * Math.PI) / Math.sqrt(far) * (LegendreEllipticIntegral.bigK(m)
                + (a * a - rho * rho - z * z) / ((a - rho) * (a - rho) + z * z) * LegendreEllipticIntegral.bigE(m));
    }

    private static double bz(double x, double y) {
        return COIL_TURNS * bzPerAmp(Math.hypot(x - COIL_X, y));
    }

    /**
     * Flux per coil ampere through a lobe on side {@code side} (+1 right, −1 left) of the crossing: the
     * 20 × 20 mm rectangle 10–30 mm out plus the triangle from the crossing to its inner side
     * (vertices as drawn in the scene), Wb/A.
     */
    static double lobeFluxPerAmp(int side) {
        double rectangle = integrate(0.010, 0.030, u -> integrate(-0.010, 0.010, y -> bz(side * u, y)));
        double triangle = integrate(0, 0.010, u -> integrate(-u, u, y -> bz(side * u, y)));
        return rectangle + triangle;
    }

    private static double integrate(double lo, double hi, java.util.function.DoubleUnaryOperator f) {
        double half = (hi - lo) / 2;
        double sum = 0;
        for (int i = 0; i < NODES.getNumberOfPoints(); i++) {
            sum += NODES.getWeight(i) * f.applyAsDouble(lo + half * (NODES.getPoint(i) + 1));
        }
        return sum * half;
    }

    /** Amplitude of the EMF one lobe alone picks up (the larger, the one nearer the coil's axis), V. */
    public static double lobeAmplitudeV() {
        return TURNS * OMEGA * COIL_AMPS * Math.max(Math.abs(lobeFluxPerAmp(1)), Math.abs(lobeFluxPerAmp(-1)));
    }

    /** Amplitude of the figure-eight's EMF: its lobes are wound in opposite senses, so their fluxes subtract, V. */
    public static double loopAmplitudeV() {
        return TURNS * OMEGA * COIL_AMPS * Math.abs(lobeFluxPerAmp(1) - lobeFluxPerAmp(-1));
    }
}
