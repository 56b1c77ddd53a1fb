package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.solver.TestScenes.points;
import static org.kinduct.solver.TestScenes.scene;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * Winding resistance R = N·perimeter·ρ(T)/A + R_load against the annealed-copper standard
 * IEC 60028: ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /K, R(T) = R20·[1 + α20·(T − 20 °C)].
 */
class LoopResistanceTest {

    private static final double RHO20_OHM_MM2_PER_M = 1.0 / 58.0;
    private static final double ALPHA20_PER_K = 0.00393;
    private static final double RELATIVE = 1e-12;

    private static ConductorState squareCoil(int turns, double temperatureC, double loadOhm, boolean open) {
        // 0.1 m square of AWG 24 copper (0.511 mm, ASTM B258).
        Conductor.Loop coil = new Conductor.Loop("coil", Body.FIXED,
                TestScenes.vertices(points(0, 0, 0.1, 0, 0.1, 0.1, 0, 0.1)), turns,
                WireSpec.awg(Material.COPPER, 24), open, loadOhm, temperatureC);
        return new SceneSolver(scene(List.of(), List.of(), List.of(coil))).at(0).conductor("coil").orElseThrow();
    }

    private static double r20PerTurn() {
        double diameterMm = 0.127 * Math.pow(92, (36 - 24) / 39.0);
        double areaMm2 = Math.PI * diameterMm * diameterMm / 4;
        return RHO20_OHM_MM2_PER_M * 0.4 / areaMm2;
    }

    @Test
    void copperLoopAt20CelsiusMatchesTheStandardResistivity() {
        assertEquals(r20PerTurn(), squareCoil(1, 20, 0, false).resistanceOhm(), RELATIVE * r20PerTurn());
        // AWG 24 is 0.511 mm in the standard's table: about 0.0336 Ω for 0.4 m (from the rounded table value).
        assertEquals(0.0336, squareCoil(1, 20, 0, false).resistanceOhm(), 0.0002);
    }

    @Test
    void copperLoopAt70CelsiusRisesByTheTemperatureCoefficient() {
        double expected = 25 * r20PerTurn() * (1 + ALPHA20_PER_K * (70 - 20)) + 4.7;
        assertEquals(expected, squareCoil(25, 70, 4.7, false).resistanceOhm(), RELATIVE * expected);
    }

    @Test
    void openLoopReportsItsWindingResistanceButCarriesNoCurrent() {
        ConductorState state = squareCoil(3, 20, 0, true);
        assertEquals(3 * r20PerTurn(), state.resistanceOhm(), RELATIVE * r20PerTurn());
        assertEquals(0, state.currentA());
        assertEquals(Vec2.ZERO, state.forceN());
    }

    @Test
    void temperatureBelowTheResistivityModelIsRejected() {
        // ρ(T) = ρ20·[1 + α20·(T − 20 °C)] reaches zero at 20 − 1/α20 = −234.45 °C (IEC 60028 coefficient).
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> squareCoil(1, -270, 0, false));
        assertTrue(e.getMessage().startsWith("temperature -270.0 °C is below the range of the linear resistivity"
                + " model of copper, whose resistivity reaches zero at -234.45"), e.getMessage());
    }
}
