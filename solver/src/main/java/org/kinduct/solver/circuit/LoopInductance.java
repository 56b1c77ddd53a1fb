package org.kinduct.solver.circuit;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireClearance;
import org.kinduct.solver.field.CircularFilament;

/**
 * Self- and mutual inductance of polygon loops of round wire in the drawing plane z = 0, and
 * their mutual inductance to thin-filament source coils in parallel planes (low frequency, μr = 1).
 *
 * <p><b>Self-inductance</b> by Grover's method for polygons (Grover, <i>Inductance Calculations</i>,
 * 1946): L₁ = Σ_i L_i + Σ_{i≠j} M_ij with Rosa's straight-wire self term L_i and the Neumann
 * mutual terms M_ij of the sides as filaments ({@link SegmentInductance}). The result carries
 * the internal inductance of uniform current (the 1/4 in Rosa's −3/4) and ignores the current
 * crowding at corners; its relative error is of order ρ/l for sides of length l.
 * <b>N turns</b> are modelled as tightly wound, all turns on the same path: L_N = N²·L₁. This
 * holds while the winding's cross-section is small against the loop (a bundle a few wire
 * diameters across); it overstates L for spread-out windings and says nothing about
 * inter-turn capacitance (low frequency only).
 *
 * <p><b>Mutual inductance</b> between two loops: M = N₁·N₂·Σ_{i,j} M_ij over their sides.
 *
 * <p><b>Wires closer than their radii.</b> The filament model fails where two wires run side by
 * side closer than the sum of their radii, and for sides only a few radii long: such geometry is
 * refused with an {@link IllegalArgumentException} naming the sides, by the rule the scene file
 * reader applies too ({@link WireClearance}). Sides that cross steeply (a figure-eight, or one
 * wire passing over another) are accepted: Neumann's integral stays finite there and is the limit
 * of wires passing close over each other.
 *
 * <p><b>Source coils</b> (filaments, no radius, at z ≠ 0): M = N_loop·N_coil·(flux of the coil
 * through the loop per ampere) = N·N_c·∮_loop A·dl. Polygon coils use the filament sums; circular
 * coils the closed-form potential of a circular filament ({@link CircularFilament#aPhi}, Jackson eq. 5.37) integrated
 * along the loop sides by adaptive Gauss–Legendre. Accurate to about 1e-9 relative while the
 * coil's plane is not much closer to the loop than 1e-3 of the loop size.
 */
public final class LoopInductance {

    private static final double REL_TOL = 1e-11;

    private LoopInductance() {
    }

    /** Self-inductance of a closed polygon of round wire (radius {@code wireRadiusM}) with N turns, henries. */
    public static double self(List<Vec2> vertices, double wireRadiusM, int turns) {
        List<Filament> sides = sides(vertices, 0);
        WireClearance.requireRoom(vertices, wireRadiusM);
        int n = sides.size();
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += SegmentInductance.roundWireSelf(sides.get(i).length(), wireRadiusM);
            for (int j = i + 1; j < n; j++) {
                sum += 2 * SegmentInductance.mutual(sides.get(i), sides.get(j));
            }
        }
        return (double) turns * turns * sum;
    }

    /** Mutual inductance of two polygon loops in the plane z = 0, henries; positive when aligned. */
    public static double mutual(List<Vec2> a, double wireRadiusA, int turnsA,
                                List<Vec2> b, double wireRadiusB, int turnsB) {
        List<Filament> sa = sides(a, 0);
        List<Filament> sb = sides(b, 0);
        WireClearance.requireApart(a, wireRadiusA, b, wireRadiusB);
        double sum = 0;
        for (Filament f : sa) {
            for (Filament g : sb) {
                sum += SegmentInductance.mutual(f, g);
            }
        }
        return (double) turnsA * turnsB * sum;
    }

    /** Mutual inductance between a loop (z = 0) and a polygon source coil in the plane z = {@code coilZM}, henries. */
    public static double mutualToPolygonCoil(List<Vec2> loop, int turns, List<Vec2> coil, double coilZM,
                                             int coilTurns) {
        requireOffPlane(coilZM);
        double sum = 0;
        for (Filament f : sides(loop, 0)) {
            for (Filament g : sides(coil, coilZM)) {
                sum += SegmentInductance.mutual(f, g);
            }
        }
        return (double) turns * coilTurns * sum;
    }

    /**
     * Mutual inductance between a loop (z = 0) and a circular source coil (centre, radius, plane
     * z = {@code coilZM}, current counter-clockwise seen from +z), henries.
     */
    public static double mutualToCircleCoil(List<Vec2> loop, int turns, Vec2 center, double radiusM,
                                            double coilZM, int coilTurns) {
        requireOffPlane(coilZM);
        double flux = 0;
        int n = loop.size();
        for (int i = 0; i < n; i++) {
            Vec2 p = loop.get(i).minus(center);
            Vec2 d = loop.get((i + 1) % n).minus(loop.get(i));
            // A = (A_φ/ρ)·(ẑ × r), so A·dl = (A_φ/ρ)·(x·dy − y·dx) with r along the side; a side
            // on a line through the axis (cross = 0) links nothing and would put ρ = 0 at a node.
            double cross = p.cross(d);
            if (cross == 0) {
                continue;
            }
            flux += cross * AdaptiveGauss.integrate(s -> {
                double rho = Math.hypot(p.x() + s * d.x(), p.y() + s * d.y());
                return CircularFilament.aPhi(radiusM, coilZM, 1, rho) / rho;
            }, 0, 1, REL_TOL, 0);
        }
        return (double) turns * coilTurns * flux;
    }

    /** The sides of a closed polygon as filaments in the plane z = {@code zM}, in vertex order. */
    static List<Filament> sides(List<Vec2> vertices, double zM) {
        int n = vertices.size();
        if (n < 3) {
            throw new IllegalArgumentException("a loop needs at least 3 vertices, got " + n);
        }
        List<Filament> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            Vec2 p = vertices.get(i);
            Vec2 q = vertices.get((i + 1) % n);
            out.add(Filament.inPlane(p.x(), p.y(), q.x(), q.y(), zM));
        }
        return out;
    }

    private static void requireOffPlane(double coilZM) {
        if (coilZM == 0 || !Double.isFinite(coilZM)) {
            throw new IllegalArgumentException("a source coil must sit off the drawing plane (z ≠ 0), got " + coilZM);
        }
    }
}
