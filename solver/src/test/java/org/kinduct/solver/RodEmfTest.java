package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.solver.TestScenes.scene;
import static org.kinduct.solver.TestScenes.wire;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Straight rods in uniform fields: EMF = B·L·v, and ½·B·ω·L² for a rod turning about one end
 * (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, ch. 7; common practice).
 */
class RodEmfTest {

    private static final double RELATIVE = 1e-12;

    private static ConductorState solve(Scene scene, double tS) {
        return new SceneSolver(scene).at(tS).conductor("rod").orElseThrow();
    }

    @Test
    void rodMovingRightThroughFieldIntoScreenHasUpperEndPositive() {
        double b = 0.4;
        double length = 0.25;
        double v = 3;
        // Rod along +y (first vertex at the bottom), moving +x, B into the screen (B_z < 0):
        // v × B points +y, so the upper (last) end is + and EMF = B·L·v.
        Scene scene = scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(v, 0)))),
                List.of(new Source.UniformField("earth", -b)), List.of(wire("rod", "cart", 0, 0, 0, length)));
        ConductorState rod = solve(scene, 0.3);
        assertEquals(b * length * v, rod.emfV(), RELATIVE * b * length * v);
        assertEquals(Terminal.LAST, rod.positiveEnd());
        assertTrue(rod.inducedFieldIncluded());
        assertEquals(0, rod.currentA());
    }

    @Test
    void reversingTheRodSwapsTheSignButNotThePhysicalEnd() {
        Scene scene = scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(3, 0)))),
                List.of(new Source.UniformField("earth", -0.4)), List.of(wire("rod", "cart", 0, 0.25, 0, 0)));
        ConductorState rod = solve(scene, 0.3);
        assertEquals(-0.4 * 0.25 * 3, rod.emfV(), RELATIVE * 0.3);
        // The + end is now the first vertex, which is still the upper one.
        assertEquals(Terminal.FIRST, rod.positiveEnd());
    }

    @Test
    void rodSlidingAlongItsOwnLengthHasNoEmf() {
        Scene scene = scene(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(0, 2)))),
                List.of(new Source.UniformField("earth", 0.4)), List.of(wire("rod", "cart", 0, 0, 0, 1)));
        ConductorState rod = solve(scene, 0.5);
        assertEquals(0, rod.emfV(), 1e-15);
        assertEquals(Terminal.NONE, rod.positiveEnd());
    }

    @Test
    void rodTurningAboutOneEndHasHalfBOmegaLSquared() {
        double b = 0.9;
        double omega = 12;
        double length = 0.3;
        // Counter-clockwise spin about the first vertex, B out of the screen: v × B = ω r B
        // points outward along the rod, so the far (last) end is + with EMF = ½·B·ω·L².
        Scene scene = scene(List.of(new Body("arm", "arm", Vec2.ZERO, new Motion.Spin(omega, 0))),
                List.of(new Source.UniformField("field", b)), List.of(wire("rod", "arm", 0, 0, length, 0)));
        ConductorState rod = solve(scene, 0.17);
        double expected = 0.5 * b * omega * length * length;
        assertEquals(expected, rod.emfV(), RELATIVE * expected);
        assertEquals(Terminal.LAST, rod.positiveEnd());
    }

    @Test
    void rodPastAMovingPatchSaysItsInducedFieldIsMissing() {
        // The patch moves, the rod is still: an ideal patch has no physical A, so −∂A/∂t is not known.
        Scene scene = scene(List.of(new Body("carrier", "carrier", Vec2.ZERO, new Motion.Glide(new Vec2(1, 0)))),
                List.of(TestScenes.rectanglePatch("patch", "carrier", -1, -1, 1, 1, 0.5)),
                List.of(wire("rod", Body.FIXED, 0, -2, 0, 2)));
        ConductorState rod = solve(scene, 0.2);
        assertFalse(rod.inducedFieldIncluded());
        assertEquals(0, rod.emfV());
    }
}
