package org.kinduct.solver.circuit;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Vec2;
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
 * side closer than the sum of their radii: such geometry is refused with an
 * {@link IllegalArgumentException} naming the sides. Sides that cross at an angle of at least
 * {@code asin(}{@value #MIN_CROSSING_SIN}{@code )} (a figure-eight, or one wire passing over
 * another) are accepted: Neumann's integral stays finite there and is the limit of wires passing
 * close over each other. Sides shorter than {@link SegmentInductance#MIN_LENGTH_RADII} radii are
 * refused (Rosa's formula assumes l ≫ ρ).
 *
 * <p><b>Source coils</b> (filaments, no radius, at z ≠ 0): M = N_loop·N_coil·(flux of the coil
 * through the loop per ampere) = N·N_c·∮_loop A·dl. Polygon coils use the filament sums; circular
 * coils the closed-form potential of a circular filament ({@link CircularFilament#aPhi}, Jackson eq. 5.37) integrated
 * along the loop sides by adaptive Gauss–Legendre. Accurate to about 1e-9 relative while the
 * coil's plane is not much closer to the loop than 1e-3 of the loop size.
 */
public final class LoopInductance {

    /** Sides closer than the wire radii are accepted only when they cross at least this steeply. */
    public static final double MIN_CROSSING_SIN = 0.1;

    private static final double REL_TOL = 1e-11;

    private LoopInductance() {
    }

    /** Self-inductance of a closed polygon of round wire (radius {@code wireRadiusM}) with N turns, henries. */
    public static double self(List<Vec2> vertices, double wireRadiusM, int turns) {
        List<Filament> sides = sides(vertices, 0);
        int n = sides.size();
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += SegmentInductance.roundWireSelf(sides.get(i).length(), wireRadiusM);
            for (int j = i + 1; j < n; j++) {
                boolean adjacent = j == i + 1 || (i == 0 && j == n - 1);
                checkClearance(sides.get(i), sides.get(j), adjacent, 2 * wireRadiusM, "side " + i, "side " + j);
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
        double sum = 0;
        for (int i = 0; i < sa.size(); i++) {
            for (int j = 0; j < sb.size(); j++) {
                checkClearance(sa.get(i), sb.get(j), false, wireRadiusA + wireRadiusB,
                        "side " + i + " of the first loop", "side " + j + " of the second loop");
                sum += SegmentInductance.mutual(sa.get(i), sb.get(j));
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

    /**
     * Refuses two sides whose wires (radii summing to {@code clearanceM}) run closer than that
     * side by side: for adjacent sides, when the shorter one's free end lies within the clearance
     * of the other (folded back); otherwise when their nearest distance is below the clearance and
     * they are not crossing steeply.
     */
    private static void checkClearance(Filament f, Filament g, boolean adjacent, double clearanceM,
                                       String whatF, String whatG) {
        double sin = Math.sqrt(Math.max(0, 1 - sq(f.cosAngleTo(g))));
        boolean tooClose;
        if (adjacent) {
            Filament shorter = f.length() <= g.length() ? f : g;
            Filament longer = f.length() <= g.length() ? g : f;
            // The shared end is at distance 0; the larger distance is the free end's.
            tooClose = Math.max(pointToFilament(shorter.ax(), shorter.ay(), shorter.az(), longer),
                    pointToFilament(shorter.bx(), shorter.by(), shorter.bz(), longer)) < clearanceM;
        } else {
            tooClose = sin < MIN_CROSSING_SIN && !boxesApart(f, g, clearanceM) && distance(f, g) < clearanceM;
        }
        if (tooClose) {
            throw new IllegalArgumentException(whatF + " and " + whatG + " run closer than the wire radii allow ("
                    + clearanceM + " m); the filament model does not hold there");
        }
    }

    /** True when the filaments' bounding boxes are more than {@code gapM} apart along x, y or z (a cheap early out). */
    private static boolean boxesApart(Filament f, Filament g, double gapM) {
        return Math.min(f.ax(), f.bx()) - Math.max(g.ax(), g.bx()) > gapM
                || Math.min(g.ax(), g.bx()) - Math.max(f.ax(), f.bx()) > gapM
                || Math.min(f.ay(), f.by()) - Math.max(g.ay(), g.by()) > gapM
                || Math.min(g.ay(), g.by()) - Math.max(f.ay(), f.by()) > gapM
                || Math.min(f.az(), f.bz()) - Math.max(g.az(), g.bz()) > gapM
                || Math.min(g.az(), g.bz()) - Math.max(f.az(), f.bz()) > gapM;
    }

    private static double distance(Filament f, Filament g) {
        double s = SegmentInductance.nearestParameter(f, g);
        if (Double.isNaN(s)) {
            return 0;
        }
        return pointToFilament(f.ax() + s * (f.bx() - f.ax()), f.ay() + s * (f.by() - f.ay()),
                f.az() + s * (f.bz() - f.az()), g);
    }

    private static double pointToFilament(double x, double y, double z, Filament g) {
        double dx = g.bx() - g.ax();
        double dy = g.by() - g.ay();
        double dz = g.bz() - g.az();
        double t = ((x - g.ax()) * dx + (y - g.ay()) * dy + (z - g.az()) * dz) / (dx * dx + dy * dy + dz * dz);
        t = Math.max(0, Math.min(1, t));
        return Math.sqrt(sq(g.ax() + t * dx - x) + sq(g.ay() + t * dy - y) + sq(g.az() + t * dz - z));
    }

    private static void requireOffPlane(double coilZM) {
        if (coilZM == 0 || !Double.isFinite(coilZM)) {
            throw new IllegalArgumentException("a source coil must sit off the drawing plane (z ≠ 0), got " + coilZM);
        }
    }

    private static double sq(double v) {
        return v * v;
    }
}
