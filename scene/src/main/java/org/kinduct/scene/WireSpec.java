package org.kinduct.scene;

/**
 * Round wire of a material and bare diameter. {@code awg} is kept when the user gave a gauge,
 * so a saved file says what was typed.
 */
public record WireSpec(Material material, double diameterM, Integer awg) {

    public WireSpec {
        Checks.nonNull(material, "material");
        Checks.size(diameterM, "wire diameter");
        if (awg != null && Math.abs(awgDiameterM(awg) - diameterM) > 1e-12) {
            throw new IllegalArgumentException("AWG " + awg + " is " + awgDiameterM(awg) + " m, not " + diameterM);
        }
    }

    public static WireSpec of(Material material, double diameterM) {
        return new WireSpec(material, diameterM, null);
    }

    public static WireSpec awg(Material material, int gauge) {
        return new WireSpec(material, awgDiameterM(gauge), gauge);
    }

    /**
     * Bare diameter of an AWG gauge, ASTM B258: d = 0.127 mm · 92^((36 − n)/39);
     * the gauges 0, 00, 000 and 0000 are n = 0, −1, −2 and −3.
     */
    public static double awgDiameterM(int gauge) {
        if (gauge < -3 || gauge > 56) {
            throw new IllegalArgumentException("AWG gauge must be from -3 (0000) to 56, got " + gauge);
        }
        return 0.127e-3 * Math.pow(92, (36 - gauge) / 39.0);
    }

    public double crossSectionM2() {
        return Math.PI * diameterM * diameterM / 4;
    }
}
