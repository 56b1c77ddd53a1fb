package org.kinduct.solver.circuit;

/**
 * A straight current filament from (ax, ay, az) to (bx, by, bz), metres. Current flows from the
 * first end to the second; the drawing plane is z = 0.
 */
public record Filament(double ax, double ay, double az, double bx, double by, double bz) {

    public Filament {
        if (!(Double.isFinite(ax) && Double.isFinite(ay) && Double.isFinite(az)
                && Double.isFinite(bx) && Double.isFinite(by) && Double.isFinite(bz))) {
            throw new IllegalArgumentException("filament ends must be finite");
        }
        if (ax == bx && ay == by && az == bz) {
            throw new IllegalArgumentException("a filament needs two distinct ends, got (" + ax + ", " + ay
                    + ", " + az + ") twice");
        }
    }

    /** A filament in the plane z = {@code zM}. */
    public static Filament inPlane(double ax, double ay, double bx, double by, double zM) {
        return new Filament(ax, ay, zM, bx, by, zM);
    }

    public double length() {
        return Math.sqrt(sq(bx - ax) + sq(by - ay) + sq(bz - az));
    }

    /** Cosine of the angle between this filament's current direction and {@code o}'s. */
    public double cosAngleTo(Filament o) {
        double dot = (bx - ax) * (o.bx - o.ax) + (by - ay) * (o.by - o.ay) + (bz - az) * (o.bz - o.az);
        return dot / (length() * o.length());
    }

    private static double sq(double v) {
        return v * v;
    }
}
