package org.kinduct.demo;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.kinduct.scene.Vec2;

/**
 * B_z in the drawing plane below (or above) an axially magnetized disc magnet, for hand
 * calculations written apart from the solver, which uses Derby &amp; Olbert's closed form.
 *
 * <p>A uniformly magnetized cylinder (rigid magnetization M = Br/μ0) is equivalent to a surface
 * current K = M round its side face (the equivalent-current model, e.g. Furlani, <i>Permanent
 * Magnet and Electromechanical Devices</i>, 2001; section not checked), i.e. a stack of circular loops carrying
 * K·dh. Each loop's B_z is the off-axis formula of Simpson, Lane, Immer &amp; Youngquist, "Simple
 * analytic expressions for the magnetic field of a circular current loop", NASA technical report
 * 20010038494 (2001): B_z = μ0·I/(2π·α²·β)·[(a² − ρ² − z²)·E(m) + α²·K(m)], α² = a² + ρ² + z² − 2aρ,
 * β² = a² + ρ² + z² + 2aρ, m = 1 − α²/β² (K, E with the parameter m, as Hipparchus'
 * {@link LegendreEllipticIntegral#bigK(double)} takes it). Summed over the height,
 * B_z = (Br/π)·∫ dh [(a² − ρ² − h²)·E(m) + α²·K(m)]/(2α²β), here by Gauss–Legendre quadrature
 * (Hipparchus) in h, and line integrals of B_z by Gauss–Legendre pieces cut where the line crosses
 * the rim circle (where B_z changes fastest).
 */
final class DiscMagnetReference {

    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();
    /**
     * Gauss–Legendre nodes over the height and per line piece. Doubling both changes the demo
     * tests' values by less than 1e-12 relative (checked when they were written).
     */
    private static final int HEIGHT_NODES = 40;
    private static final int LINE_NODES = 48;

    private final double cx;
    private final double cy;
    private final double radiusM;
    private final double nearM;
    private final double farM;
    private final double remanenceT;

    /**
     * @param center     magnet axis in the plane, metres
     * @param radiusM    magnet radius, metres
     * @param standoffM  distance from the plane to the near face, metres
     * @param heightM    magnet height, metres
     * @param remanenceT Br, tesla, signed: positive when north faces +z
     */
    DiscMagnetReference(Vec2 center, double radiusM, double standoffM, double heightM, double remanenceT) {
        this.cx = center.x();
        this.cy = center.y();
        this.radiusM = radiusM;
        this.nearM = standoffM;
        this.farM = standoffM + heightM;
        this.remanenceT = remanenceT;
    }

    /** The same magnet moved to {@code center}. */
    DiscMagnetReference at(Vec2 center) {
        return new DiscMagnetReference(center, radiusM, nearM, farM - nearM, remanenceT);
    }

    /** B_z at (x, y) in the plane, tesla. */
    double bz(double x, double y) {
        double rho = Math.hypot(x - cx, y - cy);
        double a = radiusM;
        GaussIntegrator height = GAUSS.legendre(HEIGHT_NODES, nearM, farM);
        double integral = height.integrate(h -> {
            double alpha2 = a * a + rho * rho + h * h - 2 * a * rho;
            double beta2 = a * a + rho * rho + h * h + 2 * a * rho;
            double m = 1 - alpha2 / beta2;
            double k = LegendreEllipticIntegral.bigK(m);
            double e = LegendreEllipticIntegral.bigE(m);
            return ((a * a - rho * rho - h * h) * e + alpha2 * k) / (2 * alpha2 * Math.sqrt(beta2));
        });
        return remanenceT / Math.PI * integral;
    }

    /** ∫ B_z ds along the segment p→q, T·m. */
    double lineIntegral(Vec2 p, Vec2 q) {
        double dx = q.x() - p.x();
        double dy = q.y() - p.y();
        double length = Math.hypot(dx, dy);
        // Cut where |p + s(q − p) − c| = radius: a quadratic in s.
        List<Double> cuts = new ArrayList<>(List.of(0.0, 1.0));
        double fx = p.x() - cx;
        double fy = p.y() - cy;
        double qa = dx * dx + dy * dy;
        double qb = 2 * (fx * dx + fy * dy);
        double qc = fx * fx + fy * fy - radiusM * radiusM;
        double disc = qb * qb - 4 * qa * qc;
        if (disc > 0) {
            for (double s : new double[] {(-qb - Math.sqrt(disc)) / (2 * qa), (-qb + Math.sqrt(disc)) / (2 * qa)}) {
                if (s > 0 && s < 1) {
                    cuts.add(s);
                }
            }
        }
        cuts.sort(Double::compare);
        double sum = 0;
        for (int i = 0; i + 1 < cuts.size(); i++) {
            GaussIntegrator piece = GAUSS.legendre(LINE_NODES, cuts.get(i), cuts.get(i + 1));
            sum += piece.integrate(s -> bz(p.x() + s * dx, p.y() + s * dy));
        }
        return sum * length;
    }

    /**
     * ∂Φ/∂x_c of the flux through the closed polygon (positive counter-clockwise) as the magnet
     * moves along x: Φ = ∬ B_z(x − x_c, y) dA, so ∂Φ/∂x_c = −∬ ∂B_z/∂x dA = −∮ B_z dy (Gauss), Wb/m.
     */
    double fluxGradientX(List<Vec2> polygon) {
        double sum = 0;
        int n = polygon.size();
        for (int i = 0; i < n; i++) {
            Vec2 p = polygon.get(i);
            Vec2 q = polygon.get((i + 1) % n);
            double length = Math.hypot(q.x() - p.x(), q.y() - p.y());
            if (q.y() != p.y()) {
                sum -= (q.y() - p.y()) / length * lineIntegral(p, q);
            }
        }
        return sum;
    }
}
