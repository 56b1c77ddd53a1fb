package org.kinduct.solver.plate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;

/** The automatic cell size keeps the grid over a plate's bounding box within what memory allows. */
class CellSizeTest {

    @Test
    void aSliverAcrossAWideBoxGetsAtMostTheCellsAFileMayAskFor() {
        // Three vertices of a 200 × 40 mm plate and a fourth moved 1.4 km away (found by the fuzzer):
        // by its area alone it asked for 3e9 cells over its box, 4 GB per array.
        List<Vec2> sliver = List.of(new Vec2(-0.1, 0.01), new Vec2(0.1, 0.01), new Vec2(0.1, 0.05),
                new Vec2(1000, -1000));
        Conductor.Plate plate = PlateScenes.plate("sliver", "fixed", sliver, List.of(), 0.002, List.of(), List.of(),
                OptionalDouble.empty());
        Scene scene = PlateScenes.scene(List.of(), List.of(), List.of(plate));

        double h = CellSize.automatic(plate, scene);

        double boxArea = (1000 + 0.1) * (1000 + 0.05);
        assertEquals(Conductor.Sheet.MOST_CELLS, boxArea / (h * h), 1e-6 * Conductor.Sheet.MOST_CELLS);
    }
}
