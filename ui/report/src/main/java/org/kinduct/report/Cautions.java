package org.kinduct.report;

/** Safety wording shared by the CLI, the UI and exports. */
public final class Cautions {

    /** Extra-low voltage limit, ripple-free DC, IEC 61140:2016. */
    public static final double ELV_DC_V = 120;
    /** Extra-low voltage limit, AC rms, IEC 61140:2016. */
    public static final double ELV_AC_RMS_V = 50;
    /**
     * Magnet remanence above which a scene is flagged as holding strong magnets: sintered NdFeB
     * runs 1.0–1.4 T, ferrite 0.2–0.4 T (plausible ranges; common practice to treat NdFeB as strong).
     */
    public static final double STRONG_MAGNET_T = 0.8;

    /**
     * Measured B_z above which a field map is taken to come from strong magnets: half the largest
     * ferrite remanence above. B_z on the face of a uniformly magnetized body never exceeds Br/2
     * (charge model, the pole face of a semi-infinite block: the on-axis block formula of Camacho &amp;
     * Sosa, Rev. Mex. Fís. E 59, 2013, at zero distance, (Br/π)·atan(∞)), so a ferrite magnet stays
     * below 0.2 T and a field above it takes a stronger magnet (or an electromagnet).
     */
    public static final double STRONG_MAP_FIELD_T = 0.2;

    public static final String VOLTAGE = "CAUTION: induced voltage above extra-low-voltage levels"
            + " (IEC 61140: 50 V AC rms, 120 V ripple-free DC). Follow local electrical codes and licensed practice.";

    public static final String MAGNETS = "CAUTION: strong magnets pinch and fly together, and can upset implanted"
            + " medical devices. Follow local rules and licensed practice.";

    public static final String FLOW = "CAUTION: flow sensing on people or for medical use must meet the applicable"
            + " medical-device standards; these are plan-view design estimates.";

    public static final String GENERAL = "Kinduct gives plan-view estimates for design sketches, not safety"
            + " ratings. Strong magnets can pinch, shatter and turn tools into projectiles, and can disturb"
            + " pacemakers and other implanted devices (the 0.5 mT line is a common caution contour). Induced"
            + " voltages above extra-low-voltage levels (IEC 61140: 50 V AC rms, 120 V ripple-free DC) can"
            + " shock. Flow sensing on people or for medical use must meet the applicable medical-device"
            + " standards. Follow local codes and licensed practice.";

    private Cautions() {
    }
}
