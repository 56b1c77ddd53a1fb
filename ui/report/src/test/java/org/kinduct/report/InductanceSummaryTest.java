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
import org.kinduct.solver.circuit.InductanceAtStart;

/** The inductance line names every closed loop's L and every pair's M, or why one is not computed. */
class InductanceSummaryTest {

    private static Conductor.Loop square(String id, double x0, double side, WireSpec wire) {
        return Conductor.Loop.simple(id, "fixed", List.of(Conductor.Vertex.at(x0, 0), Conductor.Vertex.at(x0 + side, 0),
                Conductor.Vertex.at(x0 + side, side), Conductor.Vertex.at(x0, side)), wire);
    }

    private static Scene scene(Conductor... conductors) {
        return new Scene("s", "", List.of(), List.of(), List.of(conductors), new TimeSpan(0, 1, 0.1));
    }

    private static String summary(Scene scene) {
        return InductanceSummary.of(InductanceAtStart.of(scene, scene.time().t0S()));
    }

    @Test
    void namesSelfAndMutualInductanceOfSideBySideLoops() {
        WireSpec wire = WireSpec.awg(Material.COPPER, 24);
        Conductor.Loop a = square("a", 0, 0.02, wire);
        Conductor.Loop b = square("b", 0.03, 0.02, wire);
        String line = summary(scene(a, b));
        // Rectangle a × b of round wire radius ρ, g = √(a² + b²) (Rosa, Bull. Bur. Stand. 4, 1908;
        // Grover, Inductance Calculations, 1946): L = (μ0/π)[(a+b)ln(2ab/ρ) − a·ln(a+g) − b·ln(b+g)
        // + 2g − (7/4)(a+b)]. The line shows three significant digits.
        double side = 0.02;
        double rho = wire.diameterM() / 2;
        double g = Math.sqrt(2) * side;
        double rosa = 1.25663706212e-6 / Math.PI * (2 * side * Math.log(2 * side * side / rho)
                - 2 * side * Math.log(side + g) + 2 * g - 3.5 * side);
        assertTrue(line.contains("L a " + Units.format(rosa, Dimension.INDUCTANCE)), line + " vs Rosa "
                + Units.format(rosa, Dimension.INDUCTANCE));
        // Coplanar loops side by side, same sense: each one's return flux threads the other, so M < 0
        // (Grover, Inductance Calculations, 1946, coplanar rectangles; common practice).
        assertTrue(line.contains("M a–b −"), line);
    }

    @Test
    void saysWhyALoopOfWireThickerThanItsSidesHasNoInductance() {
        Conductor.Loop fat = square("fat", 0, 0.004, WireSpec.of(Material.COPPER, 0.003));
        String line = summary(scene(fat));
        assertTrue(line.startsWith("Inductance at t0: L fat not computed ("), line);
    }

    @Test
    void isEmptyWithoutClosedLoops() {
        assertEquals("", summary(scene(new Conductor.Wire("w", "fixed",
                List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0, 1))))));
    }

    @Test
    void namesTheMutualInductanceWithASourceCoilAsMaxwellGivesForCoaxialCircles() {
        // A 64-gon loop of radius 20 mm under a coaxial 30 mm, 10-turn coil 10 mm away; Maxwell's formula
        // (Rosa & Grover, Bull. Bur. Stand. 8, 1911) gives M = μ0·√(ab)·[(2/k − k)K − (2/k)E] per turn pair.
        WireSpec wire = WireSpec.awg(Material.COPPER, 30);
        java.util.List<Conductor.Vertex> ring = new java.util.ArrayList<>();
        for (int i = 0; i < 64; i++) {
            ring.add(Conductor.Vertex.at(0.02 * Math.cos(2 * Math.PI * i / 64), 0.02 * Math.sin(2 * Math.PI * i / 64)));
        }
        Conductor.Loop loop = Conductor.Loop.simple("ring", "fixed", ring, wire);
        org.kinduct.scene.Source coil = new org.kinduct.scene.Source.SourceCoil("drive", "fixed",
                new org.kinduct.scene.Source.CoilShape.Circle(org.kinduct.scene.Vec2.ZERO, 0.03), 10, -0.01,
                org.kinduct.scene.Source.Drive.dc(1));
        Scene scene = new Scene("s", "", List.of(), List.of(coil), List.of(loop), new TimeSpan(0, 1, 0.1));
        String line = summary(scene);
        assertTrue(line.contains("M ring–drive "), line);
        double a = 0.02;
        double b = 0.03;
        double m = 4 * a * b / ((a + b) * (a + b) + 0.01 * 0.01);
        double k = Math.sqrt(m);
        double maxwell = 10 * 1.25663706212e-6 * Math.sqrt(a * b)
                * ((2 / k - k) * org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral.bigK(m)
                - (2 / k) * org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral.bigE(m));
        // The inscribed 64-gon links a little less than the circle (area ratio 0.9984): 3 significant digits agree.
        String shown = line.substring(line.indexOf("M ring–drive ") + "M ring–drive ".length());
        assertTrue(shown.startsWith(Units.format(maxwell, Dimension.INDUCTANCE).substring(0, 3)),
                line + " vs Maxwell " + Units.format(maxwell, Dimension.INDUCTANCE));
    }
}
