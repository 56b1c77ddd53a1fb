package org.kinduct.solver.baseline;

import org.kinduct.scene.Conductor;

/**
 * Series resistance of a loop: R = N·perimeter·ρ(T)/A_wire + R_load, with ρ(T) from the wire's
 * material ({@link org.kinduct.scene.Material#resistivityAt}; IEC 60028 for annealed copper).
 * The one copy of this rule: the instant solver and the coupled simulation both call it.
 */
public final class LoopResistance {

    private LoopResistance() {
    }

    /**
     * Resistance of the loop's whole winding, ohms.
     *
     * @param perimeterM length of one turn where the loop is now, metres
     * @throws IllegalArgumentException when the resistivity model gives no positive resistance
     *         (a winding far below −234 °C)
     */
    public static double ohms(Conductor.Loop loop, double perimeterM) {
        double r = loop.turns() * perimeterM * loop.wire().material().resistivityAt(loop.temperatureC())
                / loop.wire().crossSectionM2() + loop.loadOhm();
        if (!(r > 0)) {
            throw new IllegalArgumentException("loop '" + loop.id() + "' has no positive resistance at "
                    + loop.temperatureC() + " °C (" + r + " Ω): the resistivity model does not reach there");
        }
        return r;
    }
}
