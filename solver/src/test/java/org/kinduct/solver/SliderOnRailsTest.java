package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.solver.TestScenes.scene;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * A bar sliding on fixed rails closes a loop whose two right-hand vertices ride the bar. Checks
 * against the textbook slider: EMF = B·w·v, current against the flux change (Lenz), force
 * F = I·w·B opposing the motion (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013,
 * §7.1.3; common practice). Copper ρ20 = 1/58 Ω·mm²/m (IEC 60028).
 */
class SliderOnRailsTest {

    private static final double B = 0.8;
    private static final double WIDTH = 0.2;
    private static final double SPEED = 1.5;
    private static final double START = 0.3;
    private static final double WIRE_DIAMETER = 2e-3;
    /** Differences of the flux are good to ~1e-10; the motional EMF is exact to rounding. */
    private static final double RELATIVE = 1e-9;

    /**
     * Rails from x = 0 along y = 0 and y = w; the bar starts at x = START moving +x. The field
     * fills x ≥ 0.1 only, so the left end of the loop is outside it and the net force is not
     * cancelled by the far side.
     */
    private static Scene slider() {
        Body bar = new Body("bar", "bar", Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)));
        List<Conductor.Vertex> vertices = List.of(
                new Conductor.Vertex(new Vec2(0, 0), Body.FIXED),
                new Conductor.Vertex(new Vec2(START, 0), "bar"),
                new Conductor.Vertex(new Vec2(START, WIDTH), "bar"),
                new Conductor.Vertex(new Vec2(0, WIDTH), Body.FIXED));
        Conductor.Loop loop = Conductor.Loop.simple("circuit", Body.FIXED, vertices,
                WireSpec.of(Material.COPPER, WIRE_DIAMETER));
        return scene(List.of(bar), List.of(TestScenes.rectanglePatch("magnet-gap", Body.FIXED, 0.1, -1, 5, 1, B)),
                List.of(loop));
    }

    @Test
    void sliderEmfIsFieldTimesWidthTimesSpeedAgainstTheGrowingFlux() {
        double t = 0.4;
        ConductorState state = new SceneSolver(slider()).at(t).conductor("circuit").orElseThrow();
        double barX = START + SPEED * t;
        // Flux grows (B·w·(x − 0.1)), so the EMF along the counter-clockwise loop is −B·w·v.
        assertEquals(B * WIDTH * (barX - 0.1), state.fluxWb(), 1e-15);
        assertEquals(-B * WIDTH * SPEED, state.emfV(), RELATIVE * B * WIDTH * SPEED);
        assertEquals(state.emfV(), state.emfFluxV(), RELATIVE * B * WIDTH * SPEED);
    }

    @Test
    void currentOpposesTheFluxChangeAndForceOpposesTheMotion() {
        double t = 0.4;
        ConductorState state = new SceneSolver(slider()).at(t).conductor("circuit").orElseThrow();
        double barX = START + SPEED * t;
        // R = ρ·perimeter/A with ρ20 = 1/58 Ω·mm²/m (IEC 60028), the perimeter growing with the bar.
        double area = Math.PI * WIRE_DIAMETER * WIRE_DIAMETER / 4;
        double resistance = (1.0 / 58.0) * 1e-6 * 2 * (barX + WIDTH) / area;
        double current = B * WIDTH * SPEED / resistance;
        assertEquals(resistance, state.resistanceOhm(), 1e-9 * resistance);
        // Lenz: the flux out of the screen grows, so the current's own field points into it: clockwise.
        assertEquals(Circulation.CW, state.direction());
        assertEquals(-current, state.currentA(), RELATIVE * current);
        // F = I·w·B against the velocity; the rails' forces cancel pairwise in y.
        assertEquals(-current * WIDTH * B, state.forceN().x(), RELATIVE * current * WIDTH * B);
        assertEquals(0, state.forceN().y(), 1e-12 * current * WIDTH * B);
        assertTrue(state.forceN().x() * SPEED < 0);
    }
}
