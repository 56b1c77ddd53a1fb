package org.kinduct.solver.plate;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.sheet.ChannelFlow;
import org.kinduct.solver.sheet.SheetDrive;

/**
 * The drive of a sheet at one instant in its body's drawn frame, where its grid was built: each
 * point q of the frame is where the body's pose puts it now, r = P(q) = p + o + R(θ)(q − p), and the
 * fields are taken there. Vectors turn into the frame by R(−θ); EMFs, powers, potentials and |J|
 * are scalars and do not change, so the frame's solve is the scene's, rotated (see the package
 * comment). The material's velocity in the frame is the body's rigid motion,
 * R(−θ)V + ω ẑ × (q − p), linear in q, plus a channel's flow along its walls, which is fixed in
 * the frame.
 *
 * <p>The solver asks for B_z along a segment and then the induced field at its midpoint; the
 * second comes from the evaluation the first made. One drive per sheet and instant, used by one thread.
 */
final class FrameDrive implements SheetDrive {

    private final PlacedSources sources;
    private final ChannelFlow flow;
    private final double cos;
    private final double sin;
    private final double pivotX;
    private final double pivotY;
    private final double nowX;
    private final double nowY;
    /** Rigid velocity in the frame: R(−θ)V and ω. */
    private final double vx;
    private final double vy;
    private final double omega;
    private final double[] sample = new double[3];
    private final double[] scratch = new double[2];
    private double lastX = Double.NaN;
    private double lastY = Double.NaN;

    /**
     * @param pose the sheet's body now
     * @param flow a channel's flow in the drawn frame, or null for a plate
     */
    FrameDrive(PlacedSources sources, Pose pose, ChannelFlow flow) {
        this.sources = sources;
        this.flow = flow;
        cos = Math.cos(pose.angleRad());
        sin = Math.sin(pose.angleRad());
        pivotX = pose.pivot().x();
        pivotY = pose.pivot().y();
        nowX = pivotX + pose.offset().x();
        nowY = pivotY + pose.offset().y();
        vx = cos * pose.velocity().x() + sin * pose.velocity().y();
        vy = -sin * pose.velocity().x() + cos * pose.velocity().y();
        omega = pose.omegaRadPerS();
    }

    /** Where the frame's point q is now. */
    Vec2 place(double qx, double qy) {
        return new Vec2(worldX(qx, qy), worldY(qx, qy));
    }

    private double worldX(double qx, double qy) {
        return nowX + cos * (qx - pivotX) - sin * (qy - pivotY);
    }

    private double worldY(double qx, double qy) {
        return nowY + sin * (qx - pivotX) + cos * (qy - pivotY);
    }

    /** A vector of the frame as seen in the scene: R(θ)·v. */
    Vec2 toScene(Vec2 v) {
        return new Vec2(cos * v.x() - sin * v.y(), sin * v.x() + cos * v.y());
    }

    @Override
    public double bzT(double x, double y) {
        return bzAlongT(x, y, x, y);
    }

    @Override
    public double bzAlongT(double ax, double ay, double bx, double by) {
        sources.sample(worldX(ax, ay), worldY(ax, ay), worldX(bx, by), worldY(bx, by), sample, scratch);
        lastX = 0.5 * (ax + bx);
        lastY = 0.5 * (ay + by);
        return sample[0];
    }

    @Override
    public void inducedField(double x, double y, double[] out) {
        if (x != lastX || y != lastY) {
            bzT(x, y);
        }
        out[0] = cos * sample[1] + sin * sample[2];
        out[1] = -sin * sample[1] + cos * sample[2];
    }

    @Override
    public void velocity(double x, double y, double[] out) {
        double ux = 0;
        double uy = 0;
        if (flow != null) {
            flow.velocity(x, y, out);
            ux = out[0];
            uy = out[1];
        }
        out[0] = ux + vx - omega * (y - pivotY);
        out[1] = uy + vy + omega * (x - pivotX);
    }

    /** The rigid part at the segment's midpoint (exact: linear in q) plus a channel's exact profile flow. */
    @Override
    public double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
        double mx = 0.5 * (ax + bx);
        double my = 0.5 * (ay + by);
        double rigid = (vx - omega * (my - pivotY)) * (by - ay) - (vy + omega * (mx - pivotX)) * (bx - ax);
        return flow == null ? rigid : rigid + flow.flowAcrossM2PerS(ax, ay, bx, by);
    }
}
