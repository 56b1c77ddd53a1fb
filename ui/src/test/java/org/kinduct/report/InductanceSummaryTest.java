package org.kinduct.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.WireSpec;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.circuit.LoopInductance;

/** The inductance line names every closed loop's L and every pair's M, or why one is not computed. */
class InductanceSummaryTest {

    private static Conductor.Loop square(String id, double x0, double side, WireSpec wire) {
        return Conductor.Loop.simple(id, "fixed", List.of(Conductor.Vertex.at(x0, 0), Conductor.Vertex.at(x0 + side, 0),
                Conductor.Vertex.at(x0 + side, side), Conductor.Vertex.at(x0, side)), wire);
    }

    private static Scene scene(Conductor... conductors) {
        return new Scene("s", "", List.of(), List.of(), List.of(conductors), new TimeSpan(0, 1, 0.1));
    }

    @Test
    void namesSelfAndMutualInductanceOfSideBySideLoops() {
        WireSpec wire = WireSpec.awg(Material.COPPER, 24);
        Conductor.Loop a = square("a", 0, 0.02, wire);
        Conductor.Loop b = square("b", 0.03, 0.02, wire);
        String line = InductanceSummary.of(scene(a, b));
        double l = LoopInductance.self(a.vertices().stream().map(Conductor.Vertex::at).toList(), wire.diameterM() / 2, 1);
        assertTrue(line.contains("L a " + Units.format(l, Dimension.INDUCTANCE)), line);
        // Coplanar loops side by side, same sense: each one's return flux threads the other, so M < 0
        // (Grover, Inductance Calculations, 1946, coplanar rectangles; common practice).
        assertTrue(line.contains("M a–b −"), line);
    }

    @Test
    void saysWhyALoopOfWireThickerThanItsSidesHasNoInductance() {
        Conductor.Loop fat = square("fat", 0, 0.004, WireSpec.of(Material.COPPER, 0.003));
        String line = InductanceSummary.of(scene(fat));
        assertTrue(line.startsWith("Inductance at t0: L fat not computed ("), line);
    }

    @Test
    void isEmptyWithoutClosedLoops() {
        assertEquals("", InductanceSummary.of(scene(new Conductor.Wire("w", "fixed",
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0, 1))))));
    }
}
