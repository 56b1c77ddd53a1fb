package org.kinduct.scene;

/**
 * The Earth's field at a place, given by its geomagnetic elements, and how the board lies in it;
 * {@link #bzT()} is the component normal to the board, which is all the plan-view model uses.
 *
 * <p>Elements: total intensity F, inclination I (positive when the field points below the
 * horizontal, as in the northern hemisphere), declination D (east of true north). Their
 * north-east-down components are X = F·cos I·cos D, Y = F·cos I·sin D, Z = F·sin I (the standard
 * relations between the geomagnetic elements; e.g. Campbell, <i>Introduction to Geomagnetic
 * Fields</i>, 2nd ed., 2003, §1.2; from memory).
 *
 * <p>Board: its +x axis lies horizontal at {@code heading} (from true north, east positive). The
 * board is turned about that axis by {@code tilt}, which lifts its +y edge. With the face up, a
 * level board's normal (+z, out of the screen) points up, so B_z = −Z. In north-east-down
 * coordinates the level +y axis is u = (sin h, −cos h, 0) and the tilted normal is
 * n = cos τ·(0, 0, −1) − sin τ·u, so
 * <pre>B_z = −Z·cos τ + (Y·cos h − X·sin h)·sin τ</pre>
 * and with the face down (the board turned over) the normal and B_z change sign. Examples: level,
 * face up, B_z = −Z; tilted 90° with +x to the north (face to the east), B_z = Y.
 */
public record EarthField(double intensityT, double inclinationRad, double declinationRad, double tiltRad,
                         double headingRad, Face face) {

    /** Which side of the board the drawing is on, looking at it: the side facing up when level. */
    public enum Face {
        UP, DOWN
    }

    public EarthField {
        Checks.nonNegative(intensityT, "total intensity F");
        Checks.finite(inclinationRad, "inclination");
        if (Math.abs(inclinationRad) > Math.PI / 2 * (1 + 1e-12)) {
            throw new IllegalArgumentException("inclination must lie between -90 deg and 90 deg (positive below the"
                    + " horizontal), got " + Math.toDegrees(inclinationRad) + " deg");
        }
        Checks.finite(declinationRad, "declination");
        Checks.finite(tiltRad, "tilt");
        Checks.finite(headingRad, "heading");
        Checks.nonNull(face, "face");
    }

    /** X, the northward component, tesla. */
    public double northT() {
        return intensityT * Math.cos(inclinationRad) * Math.cos(declinationRad);
    }

    /** Y, the eastward component, tesla. */
    public double eastT() {
        return intensityT * Math.cos(inclinationRad) * Math.sin(declinationRad);
    }

    /** Z, the downward component, tesla. */
    public double downT() {
        return intensityT * Math.sin(inclinationRad);
    }

    /** The component along the board's normal (+z of the drawing), tesla. */
    public double bzT() {
        double faceUp = -downT() * Math.cos(tiltRad)
                + (eastT() * Math.cos(headingRad) - northT() * Math.sin(headingRad)) * Math.sin(tiltRad);
        return face == Face.UP ? faceUp : -faceUp;
    }
}
