package org.kinduct.scene;

/** Default time window and sampling step of a scene, seconds. */
public record TimeSpan(double t0S, double t1S, double dtS) {

    public TimeSpan {
        Checks.finite(t0S, "t0");
        Checks.finite(t1S, "t1");
        Checks.positive(dtS, "dt");
        if (!(t1S > t0S)) {
            throw new IllegalArgumentException("t1 must be after t0, got t0 = " + t0S + " s, t1 = " + t1S + " s");
        }
        if ((t1S - t0S) / dtS > 10_000_000) {
            throw new IllegalArgumentException("more than 10 million time steps: (t1 − t0)/dt = " + (t1S - t0S) / dtS);
        }
    }

    public int steps() {
        return (int) Math.round((t1S - t0S) / dtS);
    }
}
