package org.kinduct.render.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The legend goes where the lines leave room for it. */
class LinePlotTest {

    private static final PlotAxis X = new PlotAxis("speed", "m/s", false, 0, 40);
    private static final PlotAxis Y = new PlotAxis("drag", "N", false, 0, 1200);

    private static LinePlot plot(double[] xs, double[] ys) {
        return new LinePlot("t", X, Y, xs, List.of(new LinePlot.Series("drag", ys)));
    }

    @Test
    void aRisingLineLeavesTheTopLeftCornerFree() {
        LinePlot rising = plot(new double[] {0, 10, 20, 30, 40}, new double[] {0, 300, 600, 900, 1200});
        assertEquals(LinePlot.Corner.TOP_LEFT, rising.clearestCorner(0.25, 0.1));
    }

    @Test
    void aCurvePeakingNearTheLeftPutsTheLegendTopRight() {
        // A brake's drag against speed: up to its peak near the left, then falling away to the right.
        double[] xs = {0, 2, 4, 6, 8, 12, 20, 30, 40};
        double[] ys = {0, 800, 1100, 1150, 1100, 950, 650, 450, 350};
        assertEquals(LinePlot.Corner.TOP_RIGHT, plot(xs, ys).clearestCorner(0.25, 0.1));
    }

    @Test
    void aLineThroughBothTopCornersSendsTheLegendToTheBottom() {
        double[] xs = {0, 20, 40};
        double[] ys = {1200, 1150, 1200};
        assertEquals(LinePlot.Corner.BOTTOM_RIGHT, plot(xs, ys).clearestCorner(0.25, 0.1));
    }
}
