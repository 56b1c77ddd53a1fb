package org.kinduct.solver.baseline;

/** Sense of a loop current as seen on screen (z out of the screen). */
public enum Circulation {
    CW, CCW, NONE;

    /**
     * The sense on screen of a current along a loop's vertex order. The one rule for every path
     * (instants and coupled runs): no sense for a current at or below {@code noiseA}, the current
     * the EMF's reporting threshold would drive through the loop, so rounding noise never gets a
     * direction.
     *
     * @param signedAreaM2 the loop's signed area as placed (positive when its vertex order runs
     *        counter-clockwise)
     */
    public static Circulation of(double currentA, double signedAreaM2, double noiseA) {
        if (!(Math.abs(currentA) > noiseA) || signedAreaM2 == 0) {
            return NONE;
        }
        return Math.signum(currentA) * Math.signum(signedAreaM2) > 0 ? CCW : CW;
    }
}
