package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kinduct.scene.Vec2;

/** Cut-cell areas and apertures against sums done here by hand, and the shape's validation. */
class SheetGridTest {

    private static List<Vec2> points(double... xy) {
        List<Vec2> list = new ArrayList<>();
        for (int k = 0; k < xy.length; k += 2) {
            list.add(new Vec2(xy[k], xy[k + 1]));
        }
        return list;
    }

    /** Shoelace area of a simple polygon. */
    private static double area(List<Vec2> loop) {
        double twice = 0;
        for (int k = 0; k < loop.size(); k++) {
            twice += loop.get(k).cross(loop.get((k + 1) % loop.size()));
        }
        return Math.abs(twice) / 2;
    }

    /** Length of the vertical line x = c inside a simple polygon: even–odd crossings, paired. */
    private static double chord(List<Vec2> loop, double c) {
        List<Double> ys = new ArrayList<>();
        for (int k = 0; k < loop.size(); k++) {
            Vec2 a = loop.get(k);
            Vec2 b = loop.get((k + 1) % loop.size());
            if ((a.x() < c) != (b.x() < c)) {
                ys.add(a.y() + (c - a.x()) * (b.y() - a.y()) / (b.x() - a.x()));
            }
        }
        ys.sort(Double::compare);
        double length = 0;
        for (int k = 0; k + 1 < ys.size(); k += 2) {
            length += ys.get(k + 1) - ys.get(k);
        }
        return length;
    }

    @ParameterizedTest
    @ValueSource(ints = {7, 20, 61})
    void areasAndAperturesMatchTheShape(int cells) {
        List<Vec2> outline = SheetShape.regularPolygon(new Vec2(0.003, -0.001), 0.05, 37);
        List<Vec2> hole = SheetShape.regularPolygon(new Vec2(0.012, 0.004), 0.013, 7);
        SheetGrid grid = SheetGrid.withCells(new SheetShape(outline, List.of(hole)), cells);
        double h = grid.cellM();
        double sum = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                sum += grid.areaFraction(i, j) * h * h;
            }
        }
        assertEquals(area(outline) - area(hole), sum, 1e-12 * area(outline), "cell areas add up to the sheet's");
        for (int i = 1; i < grid.nx(); i++) {
            double open = 0;
            for (int j = 0; j < grid.ny(); j++) {
                open += grid.apertureX(i, j) * h;
            }
            double x = grid.originXM() + i * h;
            assertEquals(chord(outline, x) - chord(hole, x), open, 1e-10 * h, "open length along x = " + x);
        }
    }

    @Test
    void anEdgeOnAGridLineClosesThePartOfTheFaceItCovers() {
        // Unit cells on [0, 4]²; a slot y ∈ (0.5, 1.5) cut in from the right edge to x = 2, so
        // the slot's end x = 2 lies on a grid line with conductor on both sides in part.
        SheetGrid grid = SheetGrid.withCellSize(SheetShape.of(points(0, 0, 4, 0, 4, 0.5, 2, 0.5, 2, 1.5, 4, 1.5, 4, 4,
                0, 4)), 1);
        assertEquals(4, grid.nx());
        assertEquals(0, grid.originXM(), 0);
        assertEquals(0.5, grid.areaFraction(2, 0), 1e-15);
        assertEquals(0.5, grid.areaFraction(3, 1), 1e-15);
        assertEquals(0.5, grid.apertureX(2, 0), 1e-15, "below the slot");
        assertEquals(0.5, grid.apertureX(2, 1), 1e-15, "above the slot");
        assertEquals(0.5, grid.apertureX(3, 0), 1e-15);
        assertEquals(0, grid.apertureY(2, 1), 0, "across the slot");
        assertEquals(1, grid.apertureX(1, 0), 0);
        assertEquals(1, grid.apertureY(1, 1), 0);
        assertEquals(0, grid.apertureX(0, 0), 0, "the grid's border");
    }

    @Test
    void cellsTheEdgeOnlyGrazesAreLeftOut() {
        // A spike 1e-4 high and 0.01 wide pokes above y = 2 into cells (1, 2) and (2, 2), each
        // holding 2.5e-7 of its area, below SMALL_CELL_FRACTION.
        SheetGrid grid = SheetGrid.withCellSize(SheetShape.of(points(0, 0, 4, 0, 4, 4, 3, 4, 3, 2, 2.005, 2, 2, 2.0001,
                1.995, 2, 0, 2)), 1);
        assertTrue(2.5e-7 < SheetGrid.SMALL_CELL_FRACTION);
        assertEquals(0, grid.areaFraction(1, 2), 0);
        assertEquals(0, grid.areaFraction(2, 2), 0);
        assertEquals(0, grid.apertureY(1, 2), 0);
        assertEquals(0, grid.apertureY(2, 2), 0);
        assertEquals(10, grid.activeCount(), "two full rows and the column up the right");
    }

    @Test
    void aNeckThinnerThanTheSmallCellsSplitsTheSheet() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SheetGrid.withCellSize(
                SheetShape.of(points(0, 0, 1, 0, 1, 2, 3, 2, 3, 0, 4, 0, 4, 4, 3, 4, 3, 2.0000001, 1, 2.0000001, 1, 4,
                        0, 4)), 1));
        assertTrue(e.getMessage().contains("split the sheet into separate pieces"), e.getMessage());
    }

    @Test
    void aGridBeyondItsMostCellsIsRefusedBeforeAnyArrayIsMade() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SheetGrid.withCellSize(
                SheetShape.of(points(0, 0, 1, 0, 1, 1, 0, 1)), 1e-4));
        assertEquals("cell size 1.0E-4 m gives 10000 × 10000 cells over the outline's box, more than the 8388608 a"
                + " grid may have", e.getMessage());
    }

    @Test
    void invalidShapesAreRejectedWithTheRuleTheyBreak() {
        List<Vec2> square = points(0, 0, 1, 0, 1, 1, 0, 1);
        assertRejected("outline needs at least 3 vertices", () -> SheetShape.of(points(0, 0, 1, 0)));
        assertRejected("repeats vertex 1", () -> SheetShape.of(points(0, 0, 1, 0, 1, 0, 0, 1)));
        assertRejected("outline is not simple", () -> SheetShape.of(points(0, 0, 1, 1, 1, 0, 0, 1)));
        assertRejected("fold back over each other", () -> SheetShape.of(points(0, 0, 1, 0, 2, 0)));
        // Thinner than the precision context can hold as a region (area below 1e-10 of extent²).
        assertRejected("encloses no area", () -> SheetShape.of(points(0, 0, 1, 0, 0.5, 1.5e-10)));
        assertRejected("must lie strictly inside the outline",
                () -> new SheetShape(square, List.of(points(0.5, 0.5, 1.5, 0.5, 1.5, 0.8))));
        assertRejected("must lie strictly inside the outline",
                () -> new SheetShape(square, List.of(points(0.2, 0.2, 0.8, 0.2, 0.5, 1))));
        // A U-shaped outline: the hole's corners are all inside, its top edge crosses the notch.
        List<Vec2> u = points(0, 0, 3, 0, 3, 3, 2, 3, 2, 1, 1, 1, 1, 3, 0, 3);
        assertRejected("touches the outline", () -> new SheetShape(u, List.of(points(0.5, 2, 1.5, 0.5, 2.5, 2))));
        assertRejected("must not overlap or nest", () -> new SheetShape(square,
                List.of(points(0.1, 0.1, 0.9, 0.1, 0.9, 0.9, 0.1, 0.9), points(0.3, 0.3, 0.6, 0.3, 0.6, 0.6))));
        assertRejected("touches hole 0", () -> new SheetShape(square,
                List.of(points(0.1, 0.1, 0.5, 0.1, 0.5, 0.5), points(0.5, 0.3, 0.9, 0.3, 0.9, 0.8))));
        assertRejected("cell size must be positive", () -> SheetGrid.withCellSize(SheetShape.of(square), 0));
    }

    private static void assertRejected(String message, Runnable build) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, build::run);
        assertTrue(e.getMessage().contains(message), e.getMessage());
    }
}
