package org.kinduct.solver.sheet;

import java.util.function.DoubleBinaryOperator;

/** {@link SheetDrive#rigid}: v = V + ω ẑ × (r − p), linear in r, so the midpoint flow is exact. */
record RigidDrive(DoubleBinaryOperator bz, double vx, double vy, double omega, double px, double py)
        implements SheetDrive {

    RigidDrive {
        if (!Double.isFinite(vx) || !Double.isFinite(vy) || !Double.isFinite(omega)) {
            throw new IllegalArgumentException("rigid motion needs a finite velocity and angular velocity, got ("
                    + vx + ", " + vy + ") m/s and " + omega + " rad/s");
        }
    }

    @Override
    public double bzT(double x, double y) {
        return bz.applyAsDouble(x, y);
    }

    @Override
    public void velocity(double x, double y, double[] out) {
        out[0] = vx - omega * (y - py);
        out[1] = vy + omega * (x - px);
    }

    @Override
    public double flowAcrossM2PerS(double ax, double ay, double bx, double by) {
        double mx = 0.5 * (ax + bx);
        double my = 0.5 * (ay + by);
        return (vx - omega * (my - py)) * (by - ay) - (vy + omega * (mx - px)) * (bx - ax);
    }
}
