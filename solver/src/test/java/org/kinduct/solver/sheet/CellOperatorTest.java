package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.WorkTally;

/**
 * The operator's loops, which visit only each row's span of cells, against the five-point sum
 * written out cell by cell over the whole box; and the solve's work as counted for the run's bound.
 */
class CellOperatorTest {

    /** A disc with a slot-like hole across it: rows whose spans hold cells without conductance. */
    private static final SheetShape HOLED = new SheetShape(SheetShape.regularPolygon(new Vec2(0, 0), 0.05, 40),
            List.of(List.of(new Vec2(-0.03, -0.004), new Vec2(0.03, -0.004), new Vec2(0.03, 0.004),
                    new Vec2(-0.03, 0.004))));

    /** A strip 2 mm wide along the diagonal of a 200 mm box, and a disc with a 1 m spike: a small part of their boxes. */
    private static final List<SheetShape> SPARSE = List.of(
            SheetShape.of(List.of(new Vec2(0, 0), new Vec2(0.002, 0), new Vec2(0.2, 0.198), new Vec2(0.2, 0.2),
                    new Vec2(0.198, 0.2), new Vec2(0, 0.002))),
            SheetShape.of(spikedDisc()));

    private static List<Vec2> spikedDisc() {
        List<Vec2> disc = new java.util.ArrayList<>(SheetShape.regularPolygon(new Vec2(0, 0), 0.05, 64));
        disc.set(0, new Vec2(1.0, 0));
        return disc;
    }

    @Test
    void theRowSpansGiveTheWholeBoxSum() {
        SplittableRandom random = new SplittableRandom(17);
        List<SheetShape> shapes = new java.util.ArrayList<>(SPARSE);
        shapes.add(HOLED);
        for (SheetShape shape : shapes) {
            CellOperator a = CellOperator.of(SheetGrid.withCells(shape, 400));
            double[] x = new double[a.size()];
            double[] b = new double[a.size()];
            for (int k = 0; k < x.length; k++) {
                if (a.diagonal[k] > 0) {
                    x[k] = random.nextDouble(-1, 1);
                    b[k] = random.nextDouble(-1, 1);
                }
            }
            double[] y = new double[a.size()];
            double[] r = new double[a.size()];
            a.apply(x, y);
            a.residual(b, x, r);
            double dot = 0;
            for (int j = 0; j < a.ny; j++) {
                for (int i = 0; i < a.nx; i++) {
                    int k = a.index(i, j);
                    double sum = a.east[k] * (x[k] - x[k + 1]) + a.east[k - 1] * (x[k] - x[k - 1])
                            + a.north[k] * (x[k] - x[k + a.stride]) + a.north[k - a.stride] * (x[k] - x[k - a.stride]);
                    assertEquals(sum, y[k], 1e-12 * a.diagonal[k], "A·x at cell " + i + ", " + j);
                    assertEquals(b[k] - sum, r[k], 1e-12 * (1 + a.diagonal[k]), "b − A·x at cell " + i + ", " + j);
                    dot += x[k] * b[k];
                }
            }
            assertEquals(dot, a.dot(x, b), 1e-12 * a.activeCount());
            if (shape == HOLED) {
                assertTrue(a.visitedCount() > a.activeCount(), "the hole's cells lie inside spans");
            } else {
                // These have their cells of each row side by side: a pass visits them and no more.
                assertEquals(a.activeCount(), a.visitedCount(), "of a box of " + a.nx * a.ny);
                assertTrue(a.visitedCount() < 0.15 * a.nx * a.ny, a.visitedCount() + " of a box of " + a.nx * a.ny);
            }
        }
    }

    @Test
    void everyIterationOfASolveCountsItsCellsAsFieldEvaluations() {
        CellOperator a = CellOperator.of(SheetGrid.withCells(SPARSE.get(1), 400));
        double[] b = new double[a.size()];
        double sum = 0;
        int cells = 0;
        for (int k = 0; k < b.length; k++) {
            if (a.diagonal[k] > 0) {
                b[k] = Math.sin(k);
                sum += b[k];
                cells++;
            }
        }
        for (int k = 0; k < b.length; k++) {
            if (a.diagonal[k] > 0) {
                b[k] -= sum / cells;
            }
        }
        long before = WorkTally.onThisThread();

        ConjugateGradient.Outcome outcome = ConjugateGradient.solve(a, b, new double[a.size()], new Multigrid(a), 1e-10,
                100, "test");

        long perIteration = (a.visitedCount() + 8L * a.ny) / 4;
        assertEquals(outcome.iterations() * perIteration, WorkTally.onThisThread() - before);
    }
}
