package org.kinduct.render.paint;

import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Pose;
import org.kinduct.solver.StreamLattice;

/**
 * A plate's or channel's drawn frame on screen: where its body's pose and the view put a point of
 * the frame (the frame its grid and {@link StreamLattice} live in), and the stream function's
 * gradient there.
 */
final class SheetFrame {

    private final Pose pose;
    private final ViewTransform view;
    private final double cos;
    private final double sin;

    SheetFrame(Pose pose, ViewTransform view) {
        this.pose = pose;
        this.view = view;
        cos = Math.cos(pose.angleRad());
        sin = Math.sin(pose.angleRad());
    }

    /** Screen x of the frame's point (qx, qy). */
    double screenX(double qx, double qy) {
        return view.screenX(pose.pivot().x() + pose.offset().x() + cos * (qx - pose.pivot().x())
                - sin * (qy - pose.pivot().y()));
    }

    double screenY(double qx, double qy) {
        return view.screenY(pose.pivot().y() + pose.offset().y() + sin * (qx - pose.pivot().x())
                + cos * (qy - pose.pivot().y()));
    }

    /** The frame's vector (vx, vy) as a unit screen direction (y down), to {@code out}. */
    void screenDirection(double vx, double vy, double[] out) {
        double sx = cos * vx - sin * vy;
        double sy = -(sin * vx + cos * vy);
        double length = Math.hypot(sx, sy);
        out[0] = length > 0 ? sx / length : 0;
        out[1] = length > 0 ? sy / length : 0;
    }

    /** The body's angle, radians counter-clockwise in the scene. */
    double angleRad() {
        return pose.angleRad();
    }

    /**
     * ∇ψ at the frame's point (qx, qy), A/m², bilinear over the lattice cell that holds it (its four
     * edge differences averaged pairwise), to {@code out}; zero outside the lattice.
     */
    static void gradient(StreamLattice psi, double qx, double qy, double[] out) {
        double fx = (qx - psi.x0M()) / psi.stepM();
        double fy = (qy - psi.y0M()) / psi.stepM();
        int i = (int) Math.floor(fx);
        int j = (int) Math.floor(fy);
        if (i < 0 || j < 0 || i >= psi.nx() - 1 || j >= psi.ny() - 1) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        double u = fx - i;
        double w = fy - j;
        double h = psi.stepM();
        out[0] = ((1 - w) * (psi.psiAPerM(i + 1, j) - psi.psiAPerM(i, j))
                + w * (psi.psiAPerM(i + 1, j + 1) - psi.psiAPerM(i, j + 1))) / h;
        out[1] = ((1 - u) * (psi.psiAPerM(i, j + 1) - psi.psiAPerM(i, j))
                + u * (psi.psiAPerM(i + 1, j + 1) - psi.psiAPerM(i + 1, j))) / h;
    }
}
