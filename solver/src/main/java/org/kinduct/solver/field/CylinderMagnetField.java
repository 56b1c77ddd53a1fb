package org.kinduct.solver.field;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.kinduct.scene.Checks;

/**
 * A cylindrical magnet of radius a, axis along z through (cx, cy), occupying zLow ≤ z ≤ zHigh on
 * one side of the drawing plane, uniformly and rigidly magnetized along +z (negative remanence:
 * −z), recoil permeability 1. Equivalent to a surface current K = Br/μ0 round its side.
 *
 * <p>B_z: N. Derby &amp; S. Olbert, "Cylindrical magnets and ideal solenoids", Am. J. Phys. 78(3),
 * 229–235 (2010), with Bulirsch's cel: for a face at height z_f let ζ = 0 − z_f,
 * β(ζ) = ζ/√(ζ² + (a + ρ)²), kc(ζ) = √((ζ² + (a − ρ)²)/(ζ² + (a + ρ)²)), γ = (a − ρ)/(a + ρ);
 * B_z = (Br/π)·a/(a + ρ)·[β(ζ_low)·cel(kc(ζ_low), γ², 1, γ) − β(ζ_high)·cel(kc(ζ_high), γ², 1, γ)].
 * On the axis it reduces to (Br/2)[(L + s)/√(a² + (L + s)²) − s/√(a² + s²)] (Camacho &amp; Sosa,
 * Rev. Mex. Fís. E 59, 8–17, 2013).
 *
 * <p>A_φ: the surface current is a stack of circular loops; with a loop's potential as the
 * integral (μ0 I a/2π)∫₀^π cos φ dφ/√(D + z²), D = a² + ρ² − 2aρ cos φ (Jackson, Classical
 * Electrodynamics, 3rd ed., §5.5), the height integral is asinh(z/√D), and integrating by parts
 * in φ, then φ = π − 2ψ, gives (derived here, checked against a numerical stack of loops in the
 * tests)
 * A_φ = (Br·a·q/π) Σ_faces ±z_f·I(z_f)/√((a + ρ)² + z_f²), + for the top face, with q = 1 − γ²
 * = 4aρ/(a + ρ)² and I = ∫₀^{π/2} sin²ψ cos²ψ dψ/[(cos²ψ + γ² sin²ψ)√(cos²ψ + kc² sin²ψ)]
 * = [cel(kc, 1, γ², 1) − γ²·cel(kc, γ², 1, 1)]/q². That difference cancels as ρ → 0
 * (relative error ~ε/q²), so for q &lt; {@value #CEL_FROM_Q} I is integrated directly with
 * {@value #NEAR_AXIS_POINTS}-point Gauss–Legendre, whose integrand is then analytic well away from
 * [0, π/2] (both denominators stay above 3/4 of their maximum), giving full double accuracy.
 *
 * <p>{@link #jet}, which the loop integrals of one instant call at every quadrature node, interpolates
 * A_φ and B_z in ρ from a table of these closed forms when no face lies in the plane
 * ({@link RadialTable}, shared by magnets of one shape): it departs from them by at most a few
 * 1e-13 of the field's size nearby, about the closed forms' own rounding where the faces' terms
 * cancel. {@link #bz}, {@link #potential} and {@link #aPhi} use the closed forms.
 *
 * <p>Accuracy: about 1e-14 relative (checked against a numerical stack of loops). A face lying in
 * the plane (stand-off 0, ζ = 0) contributes zero to both sums; there B_z jumps by Br/2 across the
 * rim (the sign change of γ in cel; exactly on the rim: the mean) and A_φ has a logarithmic kink,
 * both finite.
 */
public final class CylinderMagnetField extends CurrentSourceField {

    /** q above which the cel form of I is used; below, its cancellation would exceed ~1e-14. */
    static final double CEL_FROM_Q = 0.25;
    static final int NEAR_AXIS_POINTS = 16;
    private static final double[] COS2 = new double[NEAR_AXIS_POINTS];
    private static final double[] SIN2 = new double[NEAR_AXIS_POINTS];
    private static final double[] WEIGHT_SIN2_COS2 = new double[NEAR_AXIS_POINTS];

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(NEAR_AXIS_POINTS, 0, Math.PI / 2);
        for (int i = 0; i < NEAR_AXIS_POINTS; i++) {
            double c = Math.cos(rule.getPoint(i));
            double s = Math.sin(rule.getPoint(i));
            COS2[i] = c * c;
            SIN2[i] = s * s;
            WEIGHT_SIN2_COS2[i] = rule.getWeight(i) * COS2[i] * SIN2[i];
        }
    }

    private final double cx;
    private final double cy;
    private final double radiusM;
    private final double zLowM;
    private final double zHighM;
    private final double remanenceT;
    /** A_φ and B_z interpolated in ρ ({@link RadialTable}); null for a face in the plane. */
    private final RadialTable table;

    /**
     * @param cx axis x, metres
     * @param cy axis y, metres
     * @param radiusM radius, metres
     * @param zLowM bottom face z, metres
     * @param zHighM top face z, metres; the magnet must not cross z = 0
     * @param signedRemanenceT remanence Br, tesla; positive when magnetized along +z
     */
    public CylinderMagnetField(double cx, double cy, double radiusM, double zLowM, double zHighM,
                               double signedRemanenceT) {
        this(cx, cy, radiusM, zLowM, zHighM, signedRemanenceT, true);
    }

    /** With {@code tabulated} false, the closed forms everywhere: what a {@link RadialTable} is made from. */
    CylinderMagnetField(double cx, double cy, double radiusM, double zLowM, double zHighM, double signedRemanenceT,
                        boolean tabulated) {
        this.cx = Checks.finite(cx, "magnet centre x");
        this.cy = Checks.finite(cy, "magnet centre y");
        this.radiusM = Checks.positive(radiusM, "magnet radius");
        requireOffPlane(zLowM, zHighM);
        this.zLowM = zLowM;
        this.zHighM = zHighM;
        this.remanenceT = Checks.finite(signedRemanenceT, "remanence");
        this.table = tabulated ? RadialTable.of(radiusM, zLowM, zHighM) : null;
    }

    @Override
    public EdgeQuadrature.Breaks breaks() {
        return zLowM == 0 || zHighM == 0
                ? (ax, ay, bx, by) -> Crossings.ofCircle(ax, ay, bx, by, cx, cy, radiusM)
                : Clearance.aroundDisc(cx, cy, radiusM, Math.min(Math.abs(zLowM), Math.abs(zHighM)));
    }

    @Override
    public double bz(double x, double y) {
        return bzAt(Axisymmetric.distance(x - cx, y - cy));
    }

    private double bzAt(double rho) {
        double sum = radiusM + rho;
        double diff = radiusM - rho;
        double gamma = diff / sum;
        double faces = faceBz(-zLowM, sum, diff, gamma) - faceBz(-zHighM, sum, diff, gamma);
        return remanenceT / Math.PI * radiusM / sum * faces;
    }

    /** β(ζ)·cel(kc(ζ), γ², 1, γ); zero for a face in the plane (β = 0, cel at most logarithmic). */
    private static double faceBz(double zeta, double sum, double diff, double gamma) {
        if (zeta == 0) {
            return 0;
        }
        double zeta2 = zeta * zeta;
        double outer2 = zeta2 + sum * sum;
        double kc = Math.sqrt((zeta2 + diff * diff) / outer2);
        return zeta / Math.sqrt(outer2) * EllipticIntegrals.cel(kc, gamma * gamma, 1, gamma);
    }

    @Override
    public void potential(double x, double y, double[] out) {
        double dx = x - cx;
        double dy = y - cy;
        double rho = Axisymmetric.distance(dx, dy);
        if (rho == 0) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        Axisymmetric.potential(dx, dy, rho, aPhi(rho), out);
    }

    /** A, its gradient from A_φ and B_z ({@link Axisymmetric#jet}), and B_z. */
    @Override
    public void jet(double x, double y, double[] out) {
        double dx = x - cx;
        double dy = y - cy;
        double rho = Axisymmetric.distance(dx, dy);
        if (rho == 0) {
            Axisymmetric.jet(dx, dy, rho, 0, bzAt(rho), out);
            return;
        }
        double[] both = new double[2];
        both(rho, both);
        Axisymmetric.jet(dx, dy, rho, both[0], both[1], out);
    }

    /** A_φ at distance ρ &gt; 0 from the axis by the closed forms, T·m; see the class documentation. */
    double aPhi(double rho) {
        double[] both = new double[2];
        exact(rho, both, false);
        return both[0];
    }

    /** A_φ and B_z at distance ρ &gt; 0 into out[0..1], from the table where it covers ρ. */
    private void both(double rho, double[] out) {
        if (table != null && table.covers(rho)) {
            table.at(rho, out);
            out[0] *= remanenceT;
            out[1] *= remanenceT;
        } else {
            exactBoth(rho, out);
        }
    }

    /**
     * A_φ and B_z at distance ρ &gt; 0 by the closed forms into out[0..1]. Away from the axis each face's three
     * elliptic integrals, cel(kc, γ², 1, γ) for B_z and cel(kc, 1, γ², 1), cel(kc, γ², 1, 1) for
     * A_φ, come from one iteration ({@link EllipticIntegrals#celBases}).
     */
    void exactBoth(double rho, double[] out) {
        exact(rho, out, true);
    }

    /** A_φ into out[0] and, when {@code withBz}, B_z into out[1] (else out[1] is not a field value). */
    private void exact(double rho, double[] out, boolean withBz) {
        double sum = radiusM + rho;
        double diff = radiusM - rho;
        double gamma = diff / sum;
        double p = gamma * gamma;
        double q = 4 * radiusM * rho / (sum * sum);
        double[] face = new double[2];
        double[] bases = new double[4];
        face(zHighM, sum, diff, gamma, p, q, withBz, bases, face);
        double aHigh = face[0];
        double bzHigh = face[1];
        face(zLowM, sum, diff, gamma, p, q, withBz, bases, face);
        out[0] = remanenceT * radiusM * q / Math.PI * (aHigh - face[0]);
        out[1] = remanenceT / Math.PI * radiusM / sum * (bzHigh - face[1]);
    }

    /**
     * A face's terms of A_φ and of B_z (each summed top minus bottom) into out[0..1]:
     * z_f·I(z_f)/√((a + ρ)² + z_f²) and z_f·cel(kc, γ², 1, γ)/√((a + ρ)² + z_f²) = −β(−z_f)·cel;
     * zero for a face in the plane.
     */
    private static void face(double zFace, double sum, double diff, double gamma, double p, double q,
                             boolean withBz, double[] bases, double[] out) {
        if (zFace == 0) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        double z2 = zFace * zFace;
        double outer2 = z2 + sum * sum;
        double kc2 = (z2 + diff * diff) / outer2;
        double kc = Math.sqrt(kc2);
        double integral;
        double bzCel;
        if (q >= CEL_FROM_Q) {
            EllipticIntegrals.celBases(kc, p, bases);
            bzCel = bases[0] + gamma * bases[1];
            integral = (p * bases[2] + bases[3] - p * (bases[0] + bases[1])) / (q * q);
        } else {
            // Near the axis B_z's cel is a call of its own: made only when asked for.
            bzCel = withBz ? EllipticIntegrals.cel(kc, p, 1, gamma) : Double.NaN;
            integral = 0;
            for (int i = 0; i < NEAR_AXIS_POINTS; i++) {
                integral += WEIGHT_SIN2_COS2[i]
                        / ((COS2[i] + p * SIN2[i]) * Math.sqrt(COS2[i] + kc2 * SIN2[i]));
            }
        }
        double outer = Math.sqrt(outer2);
        out[0] = zFace * integral / outer;
        out[1] = zFace / outer * bzCel;
    }
}
