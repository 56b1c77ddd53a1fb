package org.kinduct.demo;

import java.util.List;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.kinduct.scene.Vec2;

/**
 * The pcb-harvester demo by hand: a linear driven oscillator (the flexure) whose damping includes the
 * coil's electrical damping, the magnet's flux through the coil from {@link DiscMagnetReference}.
 * Values from the scene file; shared by the demo's hand calculation and the report's steady-power
 * test.
 */
public final class HarvesterReference {

    /** Flexure tip mass, stiffness, damping and drive (scene file). */
    static final double TIP_MASS = 0.005;
    static final double STIFFNESS = 711;
    static final double FLEXURE_DAMPING = 0.075;
    static final double DRIVE_N = 0.1;
    static final double DRIVE_OMEGA = 2 * Math.PI * 60;
    static final int COIL_TURNS = 20;
    public static final double LOAD_OHM = 20;

    /** The coil as drawn (counter-clockwise) and the magnet at the flexure's rest position. */
    private static final List<Vec2> COIL = List.of(new Vec2(-0.006, -0.006), new Vec2(0.006, -0.006),
            new Vec2(0.006, 0.006), new Vec2(-0.006, 0.006));
    private static final DiscMagnetReference MAGNET =
            new DiscMagnetReference(new Vec2(0.006, 0), 0.005, 0.001, 0.005, -1.2);
    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();

    private HarvesterReference() {
    }

    /** Coil resistance at 25 °C: ρ20·(1 + α20·5 K)·N·perimeter/(π d²/4) (IEC 60028), Ω. */
    public static double coilResistance() {
        double rho25 = 1.0 / 58 * 1e-6 * (1 + 0.00393 * 5);
        return rho25 * COIL_TURNS * 4 * 0.012 / (Math.PI * 0.094e-3 * 0.094e-3 / 4);
    }

    /** The load's share of the coil circuit's Joule power, R_L/(R_coil + R_L). */
    public static double loadShare() {
        return LOAD_OHM / (coilResistance() + LOAD_OHM);
    }

    /**
     * Electrical damping with the magnet displaced by x from rest: c_e(x) = (N·∂Φ/∂x_c)²/(R_coil + R_load)
     * (Williams &amp; Yates, Sens. Actuators A 52, 8, 1996; quasi-static current EMF/R), N·s/m.
     */
    public static double electricalDampingAt(double x) {
        double gradient = COIL_TURNS * MAGNET.at(new Vec2(0.006 + x, 0)).fluxGradientX(COIL);
        return gradient * gradient / (coilResistance() + LOAD_OHM);
    }

    /**
     * Energy-equivalent constant damping at stroke X, one cycle's dissipation for x = X·sin θ:
     * c_eq = (2/π)∫_{−π/2}^{π/2} c_e(X sin θ)·cos²θ dθ (Gauss–Legendre, Hipparchus), N·s/m.
     */
    static double electricalDamping(double strokeM) {
        return 2 / Math.PI * GAUSS.legendre(24, -Math.PI / 2, Math.PI / 2).integrate(
                theta -> electricalDampingAt(strokeM * Math.sin(theta)) * Math.cos(theta) * Math.cos(theta));
    }

    /**
     * The flexure's damping plus the coil's equivalent damping at the stroke it gives: driven near
     * its natural frequency the oscillator settles at X = F0/(c·ω0) (Taylor, Classical Mechanics,
     * 2005, §5.5), and c_e is taken at that X (two fixed-point rounds; c_e is 0.23 % of c), N·s/m.
     */
    public static double damping() {
        double stroke = DRIVE_N / (FLEXURE_DAMPING * Math.sqrt(STIFFNESS / TIP_MASS));
        double ce = 0;
        for (int round = 0; round < 2; round++) {
            ce = electricalDamping(stroke);
            stroke = DRIVE_N / ((FLEXURE_DAMPING + ce) * Math.sqrt(STIFFNESS / TIP_MASS));
        }
        return FLEXURE_DAMPING + ce;
    }

    /**
     * Position and velocity of m·x'' + c·x' + k·x = F0·sin ωt from rest (the scene's drive), as
     * steady state plus the homogeneous transient (Taylor, Classical Mechanics, 2005, §5.4–5.5).
     */
    public static double[] fromRest(double c, double t) {
        double[] steady = steady(c, t);
        double m = TIP_MASS;
        double beta = c / (2 * m);
        double wd = Math.sqrt(STIFFNESS / m - beta * beta);
        double[] at0 = steady(c, 0);
        // Constants that cancel the steady state's position and velocity at t = 0.
        double c1 = -at0[0];
        double c2 = (beta * c1 - at0[1]) / wd;
        double decay = Math.exp(-beta * t);
        double x = steady[0] + decay * (c1 * Math.cos(wd * t) + c2 * Math.sin(wd * t));
        double v = steady[1] - beta * decay * (c1 * Math.cos(wd * t) + c2 * Math.sin(wd * t))
                + decay * wd * (-c1 * Math.sin(wd * t) + c2 * Math.cos(wd * t));
        return new double[] {x, v};
    }

    /** Position and velocity of the steady state of m·x'' + c·x' + k·x = F0·sin ωt (Taylor 2005, §5.5). */
    static double[] steady(double c, double t) {
        double m = TIP_MASS;
        double k = STIFFNESS;
        double w = DRIVE_OMEGA;
        double d = Math.pow(k - m * w * w, 2) + Math.pow(c * w, 2);
        double as = DRIVE_N * (k - m * w * w) / d;
        double ac = -DRIVE_N * c * w / d;
        return new double[] {as * Math.sin(w * t) + ac * Math.cos(w * t), as * w * Math.cos(w * t) - ac * w * Math.sin(w * t)};
    }

    /**
     * Mean load power in the steady state: R_L/(R_coil + R_L)·(1/T)∮ c_e(x)·v² dt over one period of
     * the steady motion (quasi-static current I = EMF/R, EMF = N·v·∂Φ/∂x_c, so I²·R_L =
     * R_L/R·c_e(x)·v²; mean power over a whole period, common practice), Gauss–Legendre in four
     * pieces of 24 nodes, W.
     */
    public static double steadyLoadPower() {
        double c = damping();
        double period = 2 * Math.PI / DRIVE_OMEGA;
        double sum = 0;
        for (int piece = 0; piece < 4; piece++) {
            sum += GAUSS.legendre(24, piece * period / 4, (piece + 1) * period / 4).integrate(t -> {
                double[] xv = steady(c, t);
                return electricalDampingAt(xv[0]) * xv[1] * xv[1];
            });
        }
        return loadShare() * sum / period;
    }
}
