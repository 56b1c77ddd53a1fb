package org.kinduct.solver.dynamics;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.EdgeSums;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.field.PlaneField;

/**
 * A closed loop's edge sums per ampere-turn, source by source, so that each edge's force lands
 * on the body it rides and its reaction on the source's body: the motional EMF per turn with every
 * vertex moving with its body, the force on the whole loop, and the forces and torques on each
 * body. The per-edge formulas are {@link EdgeSums}', the ones the instant solver sums (Griffiths,
 * <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §5.1.3 and §7.1.3). The reaction on a
 * source's body is −F with the opposite torque about that body's pivot (Newton's third law holds
 * between closed circuits in magnetostatics, Griffiths §5.2). Edges whose ends ride different
 * bodies are sliding contacts: their force is taken up by whatever guides them and applied to
 * neither body.
 */
final class EdgeForces {

    private final SceneIndex index;

    EdgeForces(SceneIndex index) {
        this.index = index;
    }

    /** One loop's sums per ampere-turn, to be scaled by N·I once the current is known. */
    static final class PerAmpereTurn {
        /** Motional EMF per turn, volts. */
        double motionalV;
        /** Force on the whole loop (contacts included), newtons per ampere-turn. */
        double totalX;
        double totalY;
        final BodyLoads onBodies;

        PerAmpereTurn(int bodyCount) {
            onBodies = new BodyLoads(bodyCount);
        }

        /** Adds these sums times N·I to the bodies' loads; returns the loop's force, N. */
        Vec2 applyTo(double ampereTurns, BodyLoads loads) {
            for (int b = 0; b < onBodies.fx.length; b++) {
                loads.fx[b] += ampereTurns * onBodies.fx[b];
                loads.fy[b] += ampereTurns * onBodies.fy[b];
                loads.torque[b] += ampereTurns * onBodies.torque[b];
            }
            return new Vec2(ampereTurns * totalX, ampereTurns * totalY);
        }
    }

    /**
     * The sums for conductor {@code conductor} (a closed loop) placed at xs, ys, its vertices
     * moving with their bodies in {@code poses}, in the sources' fields; torques about the pivot
     * of the body an edge rides.
     */
    PerAmpereTurn along(int conductor, double[] xs, double[] ys, Pose[] poses, PlaneField[] fields) {
        PerAmpereTurn totals = new PerAmpereTurn(poses.length);
        BodyLoads on = totals.onBodies;
        int n = xs.length;
        double[] moments = new double[2];
        for (int e = 0; e < n; e++) {
            int e2 = (e + 1) % n;
            double dx = xs[e2] - xs[e];
            double dy = ys[e2] - ys[e];
            int body = index.vertexBody(conductor, e);
            int body2 = index.vertexBody(conductor, e2);
            boolean contact = body != body2;
            Vec2 p = poses[body].pivot().plus(poses[body].offset());
            Vec2 va = poses[body].velocityAt(new Vec2(xs[e], ys[e]));
            Vec2 vb = poses[body2].velocityAt(new Vec2(xs[e2], ys[e2]));
            for (int s = 0; s < fields.length; s++) {
                fields[s].bzMoments(xs[e], ys[e], xs[e2], ys[e2], moments);
                totals.motionalV += EdgeSums.motional(dx, dy, va.x(), va.y(), vb.x(), vb.y(), moments);
                double fX = EdgeSums.forceXPerAmpere(dy, moments);
                double fY = EdgeSums.forceYPerAmpere(dx, moments);
                totals.totalX += fX;
                totals.totalY += fY;
                if (contact) {
                    continue;
                }
                double t = EdgeSums.torquePerAmpere(xs[e] - p.x(), ys[e] - p.y(), dx, dy, moments);
                on.fx[body] += fX;
                on.fy[body] += fY;
                on.torque[body] += t;
                int sb = index.sourceBody(s);
                Vec2 q = poses[sb].pivot().plus(poses[sb].offset());
                on.fx[sb] -= fX;
                on.fy[sb] -= fY;
                // The reaction's torque about the source body's pivot q: −[t + ((p − q) × F)_z].
                on.torque[sb] -= t + ((p.x() - q.x()) * fY - (p.y() - q.y()) * fX);
            }
        }
        return totals;
    }
}
