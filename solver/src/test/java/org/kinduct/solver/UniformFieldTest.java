package org.kinduct.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.kinduct.solver.TestScenes.points;
import static org.kinduct.solver.TestScenes.xs;
import static org.kinduct.solver.TestScenes.ys;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.UniformField;

class UniformFieldTest {

    private static final double B = -0.35;
    private static final double EXACT = 1e-15;

    @Test
    void fluxIsFieldTimesEnclosedArea() {
        UniformField field = new UniformField(B);
        // 2 m × 3 m rectangle, counter-clockwise: Φ = B·6 m² (by hand).
        assertEquals(6 * B, field.flux(xs(points(0, 0, 2, 0, 2, 3, 0, 3)), ys(points(0, 0, 2, 0, 2, 3, 0, 3))), EXACT);
    }

    @Test
    void figureEightWithEqualLobesLinksNoFlux() {
        // Bow tie whose lobes (1 m² each) wind +1 and −1: they cancel.
        List<Vec2> eight = points(0, 0, 2, 2, 2, 0, 0, 2);
        assertEquals(0, new UniformField(B).flux(xs(eight), ys(eight)), EXACT);
    }

    @Test
    void smallLoopFarFromOriginKeepsItsDigits() {
        // A 1 µm square 1 km away: area 1e-12 m², exact in binary up to the coordinates' rounding.
        double x0 = 1000;
        List<Vec2> square = points(x0, x0, x0 + 1e-6, x0, x0 + 1e-6, x0 + 1e-6, x0, x0 + 1e-6);
        double side = (x0 + 1e-6) - x0;
        assertEquals(B * side * side, new UniformField(B).flux(xs(square), ys(square)), Math.abs(B) * 1e-12 * 1e-9);
    }

    @Test
    void segmentMomentsAreThoseOfAConstant() {
        double[] m = new double[2];
        new UniformField(B).bzMoments(3, 4, -1, 7, m);
        // ∫₀¹ B ds = B, ∫₀¹ s·B ds = B/2.
        assertEquals(B, m[0], EXACT);
        assertEquals(B / 2, m[1], EXACT);
    }

    @Test
    void potentialCirculationEqualsFluxAndIsNotPhysical() {
        UniformField field = new UniformField(B);
        List<Vec2> triangle = points(1, 1, 4, 2, 2, 5);
        // Stokes: ∮ A·dl = Φ. A is linear, so the midpoint rule per edge is exact.
        double[] a = new double[2];
        double circulation = 0;
        for (int e = 0; e < 3; e++) {
            Vec2 p = triangle.get(e);
            Vec2 q = triangle.get((e + 1) % 3);
            field.potential((p.x() + q.x()) / 2, (p.y() + q.y()) / 2, a);
            circulation += a[0] * (q.x() - p.x()) + a[1] * (q.y() - p.y());
        }
        assertEquals(field.flux(xs(triangle), ys(triangle)), circulation, 1e-14);
        assertFalse(field.hasPhysicalPotential());
    }
}
