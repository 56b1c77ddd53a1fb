package org.kinduct.solver.plate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.SourceFields;
import org.kinduct.solver.SourceReach;
import org.kinduct.solver.field.PhysicalSources;
import org.kinduct.solver.field.PlaneField;
import org.kinduct.solver.field.WorkTally;

/**
 * Every source of a scene placed at one instant, with what the sheets need of it at a point of
 * the plane: B_z, and the part of −∂A/∂t that drives current (see the package comment): for a
 * source whose body moves with velocity field w, −w × B = (−w_y·B_z, w_x·B_z) in the plane; for an
 * AC-driven coil, −(di/dt)·A₁. The gradient part ∇(w·A) is left to {@link #gaugeV}, which the
 * electrodes' potentials add. Immutable; safe to share between the sheets of one instant.
 */
final class PlacedSources {

    /**
     * One placed source: its field (null where only its AC part is kept), its body's motion when it
     * moves, and for an AC-driven coil its field per ampere and the drive's rate of change.
     */
    private record Placed(String body, PlaneField field, boolean jumps, Pose moving, PlaneField perAmpere,
                          double rateAPerS) {
    }

    private final Placed[] sources;
    private final boolean inducedKnown;

    private PlacedSources(Placed[] sources, boolean inducedKnown) {
        this.sources = sources;
        this.inducedKnown = inducedKnown;
    }

    static PlacedSources at(Scene scene, Kinematics kinematics, double tS) {
        List<Placed> placed = new ArrayList<>();
        boolean known = true;
        for (Source s : scene.sources()) {
            Pose pose = kinematics.poseAt(s.body(), tS);
            PlaneField field = SourceFields.place(s, pose, tS);
            boolean moves = !(s instanceof Source.UniformField)
                    && (pose.omegaRadPerS() != 0 || !pose.velocity().equals(Vec2.ZERO));
            PlaneField perAmpere = null;
            double rate = 0;
            if (s instanceof Source.SourceCoil coil && coil.alternates()) {
                perAmpere = PhysicalSources.coil(new Source.SourceCoil(coil.id(), coil.body(), coil.shape(),
                        coil.turns(), coil.planeZM(), Source.Drive.dc(1)), pose, tS);
                rate = coil.drive().rateAt(tS);
            }
            known &= !moves || field.hasPhysicalPotential();
            placed.add(new Placed(s.body(), field, SourceReach.of(s).jumps(), moves ? pose : null, perAmpere, rate));
        }
        return new PlacedSources(placed.toArray(Placed[]::new), known);
    }

    /** The sources riding body {@code bodyId} alone. */
    PlacedSources riding(String bodyId) {
        return new PlacedSources(Arrays.stream(sources).filter(p -> p.body().equals(bodyId)).toArray(Placed[]::new),
                inducedKnown);
    }

    /**
     * The AC-driven coils' −(di/dt)·A₁ alone, no B_z and no moving-source part: the share of the
     * drive their drives supply.
     */
    PlacedSources alternatingOnly() {
        return new PlacedSources(Arrays.stream(sources).filter(p -> p.perAmpere() != null)
                .map(p -> new Placed(p.body(), null, false, null, p.perAmpere(), p.rateAPerS())).toArray(Placed[]::new),
                inducedKnown);
    }

    /**
     * The fastest speed, over {@code pointsNow}, of material moving as {@code body} relative to a
     * moving source, m/s; 0 when no source moves. Both motions are rigid, so the relative velocity
     * is affine in position and its largest magnitude over a polygon is at a vertex.
     */
    double fastestRelativeSpeed(List<Vec2> pointsNow, Pose body) {
        double fastest = 0;
        for (Placed p : sources) {
            if (p.moving() != null) {
                for (Vec2 r : pointsNow) {
                    fastest = Math.max(fastest, body.velocityAt(r).minus(p.moving().velocityAt(r)).length());
                }
            }
        }
        return fastest;
    }

    /** True when some source is an AC-driven coil. */
    boolean alternates() {
        return Arrays.stream(sources).anyMatch(p -> p.perAmpere() != null);
    }

    /**
     * For the segment a → b (a point where a = b), in scene coordinates: {@code out[0]} = B_z (T)
     * at its midpoint, or its mean along the segment for sources whose B_z jumps in the plane (a
     * patch's rim, a map's edge: see {@link org.kinduct.solver.sheet.SheetDrive#bzAlongT}), and
     * {@code out[1..2]} = the current-driving part of −∂A/∂t (V/m) at the midpoint, a moving
     * source's −w × B taken with that same B_z.
     */
    void sample(double ax, double ay, double bx, double by, double[] out, double[] scratch) {
        double x = 0.5 * (ax + bx);
        double y = 0.5 * (ay + by);
        double bz = 0;
        double ex = 0;
        double ey = 0;
        for (Placed p : sources) {
            double b = bzOf(p, ax, ay, bx, by, scratch);
            bz += b;
            if (p.moving() != null) {
                Pose pose = p.moving();
                double armX = x - pose.pivot().x() - pose.offset().x();
                double armY = y - pose.pivot().y() - pose.offset().y();
                double wx = pose.velocity().x() - pose.omegaRadPerS() * armY;
                double wy = pose.velocity().y() + pose.omegaRadPerS() * armX;
                ex -= wy * b;
                ey += wx * b;
            }
            if (p.perAmpere() != null) {
                p.perAmpere().potential(x, y, scratch);
                ex -= p.rateAPerS() * scratch[0];
                ey -= p.rateAPerS() * scratch[1];
            }
        }
        out[0] = bz;
        out[1] = ex;
        out[2] = ey;
        WorkTally.add(sources.length);
    }

    /** One source's B_z for the segment a → b, as {@link #sample} states; {@code scratch} takes two numbers. */
    private static double bzOf(Placed p, double ax, double ay, double bx, double by, double[] scratch) {
        if (p.field() == null) {
            return 0;
        }
        if (p.jumps() && (ax != bx || ay != by)) {
            p.field().bzMoments(ax, ay, bx, by, scratch);
            return scratch[0];
        }
        return p.field().bz(0.5 * (ax + bx), 0.5 * (ay + by));
    }

    /** B_z at (x, y), tesla. */
    double bzT(double x, double y) {
        double bz = 0;
        for (Placed p : sources) {
            bz += p.field().bz(x, y);
        }
        return bz;
    }

    /**
     * Σ w·A over the moving physical sources at (x, y), volts: the gradient part of their induced
     * field, which the potential carries (φ = φ' + w·A, see the package comment).
     */
    double gaugeV(double x, double y) {
        double sum = 0;
        double[] a = new double[2];
        for (Placed p : sources) {
            if (p.moving() != null && p.field().hasPhysicalPotential()) {
                Vec2 w = p.moving().velocityAt(new Vec2(x, y));
                p.field().potential(x, y, a);
                sum += w.x() * a[0] + w.y() * a[1];
            }
        }
        return sum;
    }

    /** False when a moving field patch's w·A, unknown from B_z, is missing from the potentials. */
    boolean inducedKnown() {
        return inducedKnown;
    }
}
