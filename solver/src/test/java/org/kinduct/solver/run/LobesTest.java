package org.kinduct.solver.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Vec2;

/** A figure-eight splits at its crossing into two lobes of opposite sense; a plain loop stays whole. */
class LobesTest {

    private static Vec2 mm(double x, double y) {
        return new Vec2(x / 1000, y / 1000);
    }

    @Test
    void aFigureEightSplitsIntoTwoLobesOfOppositeSenseWhoseAreasAddUp() {
        // The gradiometer demo's pickup: sides (−10, −10)–(10, 10) and (10, −10)–(−10, 10) cross at (0, 0).
        List<Vec2> eight = List.of(mm(-30, 10), mm(-30, -10), mm(-10, -10), mm(10, 10), mm(30, 10), mm(30, -10),
                mm(10, -10), mm(-10, 10));
        List<List<Vec2>> lobes = Lobes.of(eight);
        assertEquals(2, lobes.size());
        // Each lobe a 20 × 20 mm square and a triangle of base 20 mm, height 10 mm: 500 mm² (shoelace formula).
        double a = Polygons.signedArea(lobes.get(0));
        double b = Polygons.signedArea(lobes.get(1));
        assertEquals(500e-6, Math.abs(a), 1e-18);
        assertEquals(500e-6, Math.abs(b), 1e-18);
        assertEquals(-Math.signum(a), Math.signum(b), "the lobes are wound in opposite senses");
        // Winding-weighted area is kept: the lobes' signed areas add up to the figure-eight's.
        assertEquals(Polygons.signedArea(eight), a + b, 1e-18);
    }

    @Test
    void aLoopThatDoesNotCrossItselfIsItsOwnOnlyLobe() {
        List<Vec2> square = List.of(mm(0, 0), mm(10, 0), mm(10, 10), mm(0, 10));
        assertEquals(List.of(square), Lobes.of(square));
    }
}
