package org.kinduct.solver.dynamics;

import java.util.function.DoubleConsumer;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.plate.SheetBrakes;

/**
 * The drag of the plates and channels on the run's bodies, from {@link SheetBrakes}: each sheet's
 * force and torque land on the body it rides, and minus each moving source body's share on that
 * body, with the torque moved to its pivot q: −[τ_s + ((p − q) × F_s)_z], p the sheet body's
 * pivot (Newton's third law, as for loop edges in {@link EdgeForces}). Summed filament by filament
 * this is the reaction at each filament's midpoint, so the work the reactions take is exactly the
 * moving sources' part of the Joule heat.
 */
final class SheetDrags {

    private final SceneIndex index;
    private final SheetBrakes brakes;

    /** Powers of one evaluation, watts: Joule heat, pumps' work on channel flows, AC drives' work. */
    record Power(double jouleW, double pumpW, double driveW) {
        static final Power NONE = new Power(0, 0, 0);
    }

    SheetDrags(SceneIndex index) {
        this.index = index;
        brakes = SheetBrakes.of(index.scene());
    }

    /** True when some sheet can move a free body. */
    boolean present() {
        return !brakes.isEmpty();
    }

    /** Adds the sheets' loads at (tS, poses) to {@code loads}; {@code beforeSolve} may stop the run. */
    Power apply(double tS, Pose[] poses, BodyLoads loads, DoubleConsumer beforeSolve) {
        double joule = 0;
        double pump = 0;
        double drive = 0;
        // The sheets ask for poses at tS only, so the evaluation's poses serve as the kinematics.
        for (SheetBrakes.Load load : brakes.at(tS, (bodyId, t) -> poses[index.body(bodyId)], beforeSolve)) {
            int b = index.body(load.bodyId());
            loads.fx[b] += load.forceN().x();
            loads.fy[b] += load.forceN().y();
            loads.torque[b] += load.torqueNm();
            Vec2 p = poses[b].pivot().plus(poses[b].offset());
            for (SheetBrakes.Share share : load.shares()) {
                int s = index.body(share.bodyId());
                Vec2 q = poses[s].pivot().plus(poses[s].offset());
                Vec2 f = share.forceN();
                loads.fx[s] -= f.x();
                loads.fy[s] -= f.y();
                loads.torque[s] -= share.torqueNm() + ((p.x() - q.x()) * f.y() - (p.y() - q.y()) * f.x());
            }
            joule += load.jouleW();
            pump += load.pumpW();
            drive += load.driveW();
        }
        return new Power(joule, pump, drive);
    }
}
