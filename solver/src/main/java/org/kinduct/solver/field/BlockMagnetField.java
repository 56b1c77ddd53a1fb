package org.kinduct.solver.field;

import org.kinduct.scene.Checks;

/**
 * A rectangular block magnet, uniformly and rigidly magnetized along +z (negative remanence:
 * along −z), recoil permeability 1, sizes a × b in its own frame, rotated by {@code angleRad}
 * about its centre (cx, cy), occupying zLow ≤ z ≤ zHigh on one side of the drawing plane.
 *
 * <p>B_z, surface-charge model (R. Engel-Herbert &amp; T. Hesjedal, J. Appl. Phys. 97, 074504,
 * 2005; E. P. Furlani, <i>Permanent Magnet and Electromechanical Devices</i>, Academic Press,
 * 2001): with the magnet over x1 &lt; x &lt; x2, y1 &lt; y &lt; y2, z1 &lt; z &lt; z2 in its own frame,
 * B_z = (Br/4π) Σ_{i,j,k ∈ {1,2}} (−1)^{i+j+k} atan[(x − x_i)(y − y_j) / ((z − z_k) R_ijk)],
 * R_ijk = √((x − x_i)² + (y − y_j)² + (z − z_k)²) (1-based indices). A face lying in the plane
 * (stand-off 0) is evaluated as the limit from outside the magnet, where B = μ0H and B_z is
 * continuous through the face; exactly on a footprint edge that face's terms take the mean
 * of the two sides.
 *
 * <p>A: the magnetization M = Br/μ0 ẑ is equivalent to a surface current K = M × n̂ = Br/μ0
 * circulating counter-clockwise round the four side faces (Furlani 2001, §3; Griffiths ch. 6).
 * Each side face is a ribbon of straight filaments (Griffiths ch. 5:
 * A = (μ0 I/4π) û [asinh(t_b/d) − asinh(t_a/d)]) stacked over the height, integrated in closed
 * form: ∫ asinh(t/√(c² + z²)) dz = G(t, c, z) with
 * G = z·asinh(t/√(c² + z²)) + t·asinh(z/√(c² + t²)) − c·atan(t z/(c R)), R = √(c² + t² + z²)
 * (derived here: by parts in z, then the elementary ∫ dz/((c² + z²)√(z² + c² + t²)); checked
 * against numerical quadrature in the tests).
 *
 * <p>Accuracy: a few ulp relative for B_z near the magnet. The closed-form A sums ribbon terms
 * that fall like 1/distance while A falls like 1/distance², so it loses about 2·log10(distance/size)
 * digits far away (measured against a numerical stack of filaments: 1e-11 relative at 100 sizes,
 * 4e-10 at 1000). With stand-off 0, B_z jumps across the footprint's edges (exactly on an edge:
 * the mean) and A has a logarithmic kink there; both stay finite.
 */
public final class BlockMagnetField extends CurrentSourceField {

    private final double cx;
    private final double cy;
    private final double cos;
    private final double sin;
    private final double halfX;
    private final double halfY;
    private final double zLowM;
    private final double zHighM;
    /** zLow² and zHigh², m²: every corner distance of the potential needs them. */
    private final double zLowSquared;
    private final double zHighSquared;
    /** z − z1 and z − z2 at the field plane z = 0, as signed zeros on the outside when 0. */
    private final double dzBottom;
    private final double dzTop;
    private final double brOver4Pi;

    /**
     * @param cx centre x, metres
     * @param cy centre y, metres
     * @param angleRad rotation of the magnet's own x axis from +x, counter-clockwise
     * @param sizeXM edge along the magnet's own x axis, metres
     * @param sizeYM edge along its own y axis, metres
     * @param zLowM bottom face z, metres
     * @param zHighM top face z, metres; the magnet must not cross z = 0
     * @param signedRemanenceT remanence Br, tesla; positive when magnetized along +z
     */
    public BlockMagnetField(double cx, double cy, double angleRad, double sizeXM, double sizeYM,
                            double zLowM, double zHighM, double signedRemanenceT) {
        this.cx = Checks.finite(cx, "magnet centre x");
        this.cy = Checks.finite(cy, "magnet centre y");
        Checks.finite(angleRad, "magnet angle");
        this.cos = Math.cos(angleRad);
        this.sin = Math.sin(angleRad);
        this.halfX = Checks.positive(sizeXM, "magnet size x") / 2;
        this.halfY = Checks.positive(sizeYM, "magnet size y") / 2;
        requireOffPlane(zLowM, zHighM);
        this.zLowM = zLowM;
        this.zHighM = zHighM;
        this.zLowSquared = zLowM * zLowM;
        this.zHighSquared = zHighM * zHighM;
        // The outside of the bottom face is below it (z − z1 → 0⁻), of the top face above (→ 0⁺).
        this.dzBottom = zLowM == 0 ? -0.0 : -zLowM;
        this.dzTop = zHighM == 0 ? 0.0 : -zHighM;
        this.brOver4Pi = Checks.finite(signedRemanenceT, "remanence") / (4 * Math.PI);
    }

    @Override
    public EdgeQuadrature.Breaks breaks() {
        if (zLowM != 0 && zHighM != 0) {
            return Clearance.aroundDisc(cx, cy, Math.hypot(halfX, halfY), Math.min(Math.abs(zLowM), Math.abs(zHighM)));
        }
        // The footprint's corners, counter-clockwise, in scene coordinates.
        double[] px = new double[4];
        double[] py = new double[4];
        double[][] local = {{-halfX, -halfY}, {halfX, -halfY}, {halfX, halfY}, {-halfX, halfY}};
        for (int i = 0; i < 4; i++) {
            px[i] = cx + cos * local[i][0] - sin * local[i][1];
            py[i] = cy + sin * local[i][0] + cos * local[i][1];
        }
        return (ax, ay, bx, by) -> Crossings.ofPolygon(ax, ay, bx, by, px, py);
    }

    @Override
    public double bz(double x, double y) {
        double dx = x - cx;
        double dy = y - cy;
        double u = cos * dx + sin * dy;
        double v = -sin * dx + cos * dy;
        double x1 = u + halfX;
        double x2 = u - halfX;
        double y1 = v + halfY;
        double y2 = v - halfY;
        double p11 = x1 * x1 + y1 * y1;
        double p21 = x2 * x2 + y1 * y1;
        double p12 = x1 * x1 + y2 * y2;
        double p22 = x2 * x2 + y2 * y2;
        return brOver4Pi * (face(x1, x2, y1, y2, dzTop, Math.sqrt(p11 + zHighSquared), Math.sqrt(p21 + zHighSquared),
                Math.sqrt(p12 + zHighSquared), Math.sqrt(p22 + zHighSquared))
                - face(x1, x2, y1, y2, dzBottom, Math.sqrt(p11 + zLowSquared), Math.sqrt(p21 + zLowSquared),
                Math.sqrt(p12 + zLowSquared), Math.sqrt(p22 + zLowSquared)));
    }

    @Override
    public void potential(double x, double y, double[] out) {
        evaluate(x, y, out, false);
    }

    /**
     * A and its gradient from the same ribbon terms: with R(t, c) = G(t, c, zHigh) − G(t, c, zLow),
     * ∂R/∂t = asinh(zHigh/ρ) − asinh(zLow/ρ) (the {@link #faceAsinh} of the corner) and ∂R/∂c =
     * −[atan(t·zHigh/(c·r)) − atan(t·zLow/(c·r))] (G's derivatives, as in the class documentation:
     * by Euler's theorem for the degree-1 homogeneous G, G = z·∂G/∂z + t·∂G/∂t + c·∂G/∂c), so a
     * ribbon's c-derivative is minus its {@link #atanDifference}. B_z comes from the corner
     * arctangents (the class documentation's sum), sharing the corner distances.
     */
    @Override
    public void jet(double x, double y, double[] out) {
        evaluate(x, y, out, true);
    }

    /** A at (x, y) into out[0..1]; with {@code gradient} also out[2..6] as {@link #jet} states. */
    private void evaluate(double x, double y, double[] out, boolean gradient) {
        double dx = x - cx;
        double dy = y - cy;
        double u = cos * dx + sin * dy;
        double v = -sin * dx + cos * dy;
        // Ribbons along the magnet's x: +x at y = −b/2, −x at y = +b/2; along y: +y at x = +a/2, −y at x = −a/2.
        double tx1 = -halfX - u;
        double tx2 = halfX - u;
        double ty1 = -halfY - v;
        double ty2 = halfY - v;
        // Each corner (x_i, y_j) ends one ribbon along x and one along y, which share its distances.
        double p11 = tx1 * tx1 + ty1 * ty1;
        double p21 = tx2 * tx2 + ty1 * ty1;
        double p12 = tx1 * tx1 + ty2 * ty2;
        double p22 = tx2 * tx2 + ty2 * ty2;
        double low11 = Math.sqrt(p11 + zLowSquared);
        double low21 = Math.sqrt(p21 + zLowSquared);
        double low12 = Math.sqrt(p12 + zLowSquared);
        double low22 = Math.sqrt(p22 + zLowSquared);
        double high11 = Math.sqrt(p11 + zHighSquared);
        double high21 = Math.sqrt(p21 + zHighSquared);
        double high12 = Math.sqrt(p12 + zHighSquared);
        double high22 = Math.sqrt(p22 + zHighSquared);
        double f11 = faceAsinh(p11, high11, low11, zLowM, zHighM);
        double f21 = faceAsinh(p21, high21, low21, zLowM, zHighM);
        double f12 = faceAsinh(p12, high12, low12, zLowM, zHighM);
        double f22 = faceAsinh(p22, high22, low22, zLowM, zHighM);
        double cy1 = Math.abs(ty1);
        double cy2 = Math.abs(ty2);
        double cx2 = Math.abs(tx2);
        double cx1 = Math.abs(tx1);
        double dUy1 = atanDifference(tx1, tx2, cy1, zHighM, zLowM, high11, high21, low11, low21);
        double dUy2 = atanDifference(tx1, tx2, cy2, zHighM, zLowM, high12, high22, low12, low22);
        double dVx2 = atanDifference(ty1, ty2, cx2, zHighM, zLowM, high21, high22, low21, low22);
        double dVx1 = atanDifference(ty1, ty2, cx1, zHighM, zLowM, high11, high12, low11, low12);
        double au = brOver4Pi * (ribbon(tx1, tx2, cy1, zLowM, zHighM, low11, low21, high11, high21, f11, f21, dUy1)
                - ribbon(tx1, tx2, cy2, zLowM, zHighM, low12, low22, high12, high22, f12, f22, dUy2));
        double av = brOver4Pi * (ribbon(ty1, ty2, cx2, zLowM, zHighM, low21, low22, high21, high22, f21, f22, dVx2)
                - ribbon(ty1, ty2, cx1, zLowM, zHighM, low11, low12, high11, high12, f11, f12, dVx1));
        out[0] = cos * au - sin * av;
        out[1] = sin * au + cos * av;
        if (!gradient) {
            return;
        }
        // In the magnet's frame: t along a ribbon falls as u (or v) grows, c = |t across| grows with |t|.
        double duu = brOver4Pi * (f11 - f21 - f12 + f22);
        double duv = brOver4Pi * (Math.signum(ty1) * dUy1 - Math.signum(ty2) * dUy2);
        double dvu = brOver4Pi * (Math.signum(tx2) * dVx2 - Math.signum(tx1) * dVx1);
        // J = R·J'·Rᵀ with R the rotation by the magnet's angle; J' is traceless.
        double c2 = cos * cos - sin * sin;
        double s2 = 2 * sin * cos;
        double symmetric = 0.5 * (duv + dvu);
        double antisymmetric = 0.5 * (dvu - duv);
        double diagonal = c2 * duu - s2 * symmetric;
        double offDiagonal = s2 * duu + c2 * symmetric;
        out[2] = diagonal;
        out[3] = offDiagonal - antisymmetric;
        out[4] = offDiagonal + antisymmetric;
        out[5] = -diagonal;
        double x1 = -tx1;
        double x2 = -tx2;
        double y1 = -ty1;
        double y2 = -ty2;
        out[6] = brOver4Pi * (face(x1, x2, y1, y2, dzTop, high11, high21, high12, high22)
                - face(x1, x2, y1, y2, dzBottom, low11, low21, low12, low22));
    }

    /**
     * One face's part of the B_z sum, Σ (−1)^{i+j} atan[x_i·y_j/(dz·r_ij)] with x_i, y_j the offsets
     * from the face's corners and r_ij the distances to them: the solid angle the face subtends,
     * signed as dz. Off the plane it is the argument of the product of w_ij = dz·r_ij + i·x_i·y_j
     * (each w's argument is its arctangent, plus π when dz &lt; 0, which cancels over the four),
     * conjugated where the sign is −, so one atan2 replaces four arctangents. The argument is
     * taken in (−π, π]; a rectangle subtends more than π only from over its footprint, where
     * all four terms share dz's sign (no cancellation), and there it is moved into [0, 2π)·sign(dz).
     * A face in the plane (dz = ±0) sums {@link #corner} terms, whose signed zeros give the limit
     * from outside. The product is of degree 8 in lengths: within range for scenes from a
     * nanometre to 10¹² m.
     */
    private static double face(double x1, double x2, double y1, double y2, double dz,
                               double r11, double r21, double r12, double r22) {
        if (dz == 0) {
            return corner(x1, y1, dz, r11) - corner(x2, y1, dz, r21) - corner(x1, y2, dz, r12)
                    + corner(x2, y2, dz, r22);
        }
        double a11 = dz * r11;
        double b11 = x1 * y1;
        double a21 = dz * r21;
        double b21 = x2 * y1;
        double a12 = dz * r12;
        double b12 = x1 * y2;
        double a22 = dz * r22;
        double b22 = x2 * y2;
        // w11·conj(w21) and conj(w12)·w22, then their product.
        double pRe = a11 * a21 + b11 * b21;
        double pIm = b11 * a21 - a11 * b21;
        double qRe = a12 * a22 + b12 * b22;
        double qIm = a12 * b22 - b12 * a22;
        double angle = Arctangent.atan2(pRe * qIm + pIm * qRe, pRe * qRe - pIm * qIm);
        if (x1 > 0 && x2 < 0 && y1 > 0 && y2 < 0) {
            if (dz > 0 && angle < 0) {
                angle += 2 * Math.PI;
            } else if (dz < 0 && angle > 0) {
                angle -= 2 * Math.PI;
            }
        }
        return angle;
    }

    /** atan[X·Y/(Z·R)] given the corner distance R; Z = ±0 gives ±π/2·sign(XY), and XY = 0 gives 0 (mean of both sides). */
    private static double corner(double dx, double dy, double dz, double r) {
        double n = dx * dy;
        if (n == 0) {
            return 0;
        }
        return Arctangent.atan(n / (dz * r));
    }

    /**
     * ∫_{zLow}^{zHigh} [asinh(t2/√(c² + z²)) − asinh(t1/√(c² + z²))] dz for t1 &lt; t2: the potential
     * of a unit ribbon running from t1 to t2 along its line, c ≥ 0 the in-plane distance to that line.
     */
    static double ribbon(double t1, double t2, double c, double zLow, double zHigh) {
        double p1 = c * c + t1 * t1;
        double p2 = c * c + t2 * t2;
        double low1 = Math.sqrt(p1 + zLow * zLow);
        double low2 = Math.sqrt(p2 + zLow * zLow);
        double high1 = Math.sqrt(p1 + zHigh * zHigh);
        double high2 = Math.sqrt(p2 + zHigh * zHigh);
        return ribbon(t1, t2, c, zLow, zHigh, low1, low2, high1, high2,
                faceAsinh(p1, high1, low1, zLow, zHigh), faceAsinh(p2, high2, low2, zLow, zHigh),
                atanDifference(t1, t2, c, zHigh, zLow, high1, high2, low1, low2));
    }

    /**
     * The ribbon given at both ends the distances r = √(ρ² + z²) to each face's corner and
     * F = asinh(zHigh/ρ) − asinh(zLow/ρ) ({@link #faceAsinh}), ρ = √(c² + t²): [G(t2, c, z) −
     * G(t1, c, z)] between the faces, G the antiderivative in the class documentation, with the terms
     * of both faces that share t paired so that each pair takes one logarithm, t·F, and the c·atan
     * terms as one arctangent ({@link #atanDifference}, given). G(t, c, 0) = 0.
     */
    private static double ribbon(double t1, double t2, double c, double zLow, double zHigh, double low1, double low2,
                                 double high1, double high2, double f1, double f2, double atans) {
        double g = t2 * f2 - t1 * f1;
        if (zHigh != 0) {
            g += zHigh * StraightFilament.asinhDifference(t2, t1, high2, high1, c * c + zHigh * zHigh, t2 - t1);
        }
        if (zLow != 0) {
            g -= zLow * StraightFilament.asinhDifference(t2, t1, low2, low1, c * c + zLow * zLow, t2 - t1);
        }
        return g - c * atans;
    }

    /**
     * asinh(zHigh/ρ) − asinh(zLow/ρ) at in-plane distance ρ = √rho2 from a corner, r = √(ρ² + z²)
     * at each face: one log of a ratio ({@link StraightFilament#asinhDifference}, free of
     * cancellation). 0 at the corner itself (ρ = 0), where it only ever multiplies t = 0.
     */
    private static double faceAsinh(double rho2, double rHigh, double rLow, double zLow, double zHigh) {
        if (rho2 == 0) {
            return 0;
        }
        return StraightFilament.asinhDifference(zHigh, zLow, rHigh, rLow, rho2, zHigh - zLow);
    }

    /**
     * The four arctangents of both faces, [atan(t2·z/(c·r2)) − atan(t1·z/(c·r1))] at zHigh minus the
     * same at zLow, for c &gt; 0, t1 &lt; t2, r_i = √(c² + t_i² + z²), as one atan2. By the subtraction
     * formula arctan α − arctan β = arctan[(α − β)/(1 + αβ)] (Abramowitz &amp; Stegun, <i>Handbook of
     * Mathematical Functions</i>, 1964, eq. 4.4.34; from memory) each face's pair is the angle of the
     * vector (X, Y) = c²·r1·r2·(1 + αβ, α − β), scaled by c²·r1·r2 &gt; 0 to stay finite for small c;
     * its t2·r1 − t1·r2 is taken as (c² + z²)(t2 − t1)(t2 + t1)/(t2·r1 + t1·r2) when t1, t2 share a
     * sign, free of cancellation. Both faces' angles lie in (0, π) for z &gt; 0 and in (−π, 0) for
     * z &lt; 0 (0 for z = 0), and the faces do not straddle the plane, so their difference lies in
     * (−π, π) and is the angle of (X_h·X_l + Y_h·Y_l, Y_h·X_l − X_h·Y_l). Rounding moves the result
     * by a few ulp of π, as it would each of the four arctangents. 0 for c = 0, the limit from
     * either side (zHigh and zLow share a sign, so the four ±π/2 cancel).
     */
    private static double atanDifference(double t1, double t2, double c, double zHigh, double zLow,
                                         double r1High, double r2High, double r1Low, double r2Low) {
        if (c == 0) {
            return 0;
        }
        double xHigh = c * c * r1High * r2High + t1 * t2 * zHigh * zHigh;
        double yHigh = c * zHigh * cross(t1, t2, c, zHigh, r1High, r2High);
        double xLow = c * c * r1Low * r2Low + t1 * t2 * zLow * zLow;
        double yLow = c * zLow * cross(t1, t2, c, zLow, r1Low, r2Low);
        return Arctangent.atan2(yHigh * xLow - xHigh * yLow, xHigh * xLow + yHigh * yLow);
    }

    /** t2·r1 − t1·r2 without cancellation; see {@link #atanDifference}. */
    private static double cross(double t1, double t2, double c, double z, double r1, double r2) {
        return t1 * t2 > 0 ? (c * c + z * z) * (t2 - t1) * (t2 + t1) / (t2 * r1 + t1 * r2) : t2 * r1 - t1 * r2;
    }
}
