package org.kinduct.scene;

/**
 * Conductor materials, resistivity at 20 °C and its temperature coefficient;
 * ρ(T) = ρ20·[1 + α20·(T − 20 °C)].
 */
public enum Material {
    /** Annealed copper, IEC 60028 (International Annealed Copper Standard): ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /K. */
    COPPER(1.0 / 58.0 * 1e-6, 0.00393),
    /** Hard-drawn aluminium, 61 % IACS, IEC 60889 (now IEC 62641): ρ20 = 0.028264 Ω·mm²/m, α20 = 0.00403 /K (from memory). */
    ALUMINIUM(0.028264e-6, 0.00403);

    private final double rho20OhmM;
    private final double alpha20PerK;

    Material(double rho20OhmM, double alpha20PerK) {
        this.rho20OhmM = rho20OhmM;
        this.alpha20PerK = alpha20PerK;
    }

    /** Resistivity at 20 °C, Ω·m. */
    public double rho20OhmM() {
        return rho20OhmM;
    }

    public double alpha20PerK() {
        return alpha20PerK;
    }

    /** The temperature at which the linear model's resistivity reaches zero, 20 − 1/α20 °C. */
    public double zeroResistivityC() {
        return 20 - 1 / alpha20PerK;
    }

    /** Resistivity at {@code temperatureC}, Ω·m (linear model, valid over roughly −50…200 °C). */
    public double resistivityAt(double temperatureC) {
        return rho20OhmM * (1 + alpha20PerK * (temperatureC - 20));
    }
}
