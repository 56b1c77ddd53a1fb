package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * When a loop edge crosses a field-patch edge, flux has a kink in time and −dλ/dt is not defined
 * there: the comparison of the two methods must say "not comparable" (NaN) instead of reporting a
 * false disagreement, and must stay a real comparison a moment later.
 */
class FluxKinkTest {

    private static final double AGREEMENT = 1e-6;

    /** A 10 mm square loop gliding at 1 m/s; its leading edge reaches the patch edge x = 0 at t = 10 ms. */
    private static Scene scene() {
        Body cart = new Body("cart", null, Vec2.ZERO, new Motion.Glide(new Vec2(1, 0)));
        Source patch = new Source.FieldPatch("patch", Body.FIXED,
                List.of(new Vec2(0, -0.1), new Vec2(0.2, -0.1), new Vec2(0.2, 0.1), new Vec2(0, 0.1)), 0.3);
        Conductor loop = Conductor.Loop.simple("loop", "cart", List.of(Conductor.Vertex.at(-0.02, -0.005),
                Conductor.Vertex.at(-0.01, -0.005), Conductor.Vertex.at(-0.01, 0.005), Conductor.Vertex.at(-0.02, 0.005)),
                WireSpec.awg(Material.COPPER, 24));
        return new Scene("kink", "", List.of(cart), List.of(patch), List.of(loop), new TimeSpan(0, 0.05, 0.001));
    }

    @Test
    void edgeCrossingInstantIsMarkedNotComparable() {
        ConductorState at = new SceneSolver(scene()).at(0.010).conductor("loop").orElseThrow();
        assertTrue(Double.isNaN(at.disagreement()), "disagreement at the crossing: " + at.disagreement());
    }

    @Test
    void aMomentAfterTheCrossingBothMethodsAgreeOnBLv() {
        ConductorState after = new SceneSolver(scene()).at(0.012).conductor("loop").orElseThrow();
        assertTrue(after.disagreement() <= AGREEMENT, "disagreement " + after.disagreement());
        // Leading edge inside, flux growing: EMF = −B·w·v (Griffiths, Introduction to Electrodynamics, ch. 7).
        assertEquals(-0.3 * 0.010 * 1.0, after.emfFluxV(), 1e-9);
    }
}
