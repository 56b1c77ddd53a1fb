package org.kinduct.render.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;

class ViewTransformTest {

    private static final double PIXEL_TOL = 1e-6;
    private static final long SEED = 0x5EEDL;
    private static final SplittableRandom SEEDS = new SplittableRandom(SEED);

    private static ViewTransform randomView(SplittableRandom r) {
        return new ViewTransform(r.nextDouble(-1, 1), r.nextDouble(-1, 1), Math.pow(10, r.nextDouble(1, 6)),
                r.nextDouble(100, 2000), r.nextDouble(100, 1200));
    }

    @Test
    void sceneYUpIsScreenUp() {
        ViewTransform v = new ViewTransform(0, 0, 1000, 800, 600);
        assertTrue(v.screenY(0.1) < v.screenY(0), "a point higher in the scene is higher on screen (smaller y)");
        assertTrue(v.screenX(0.1) > v.screenX(0), "x grows to the right on both");
        assertEquals(400, v.screenX(0), PIXEL_TOL);
        assertEquals(300, v.screenY(0), PIXEL_TOL);
    }

    @RepeatedTest(50)
    void screenToSceneIsTheInverseOfSceneToScreen() {
        long seed = SEEDS.nextLong();
        SplittableRandom r = new SplittableRandom(seed);
        ViewTransform v = randomView(r);
        double sx = r.nextDouble(0, v.widthPx());
        double sy = r.nextDouble(0, v.heightPx());
        assertEquals(sx, v.screenX(v.sceneX(sx)), PIXEL_TOL, "seed " + seed);
        assertEquals(sy, v.screenY(v.sceneY(sy)), PIXEL_TOL, "seed " + seed);
    }

    @RepeatedTest(50)
    void zoomKeepsTheScenePointUnderTheCursor() {
        long seed = SEEDS.nextLong();
        SplittableRandom r = new SplittableRandom(seed);
        ViewTransform v = randomView(r);
        double sx = r.nextDouble(0, v.widthPx());
        double sy = r.nextDouble(0, v.heightPx());
        double factor = Math.pow(2, r.nextDouble(-3, 3));
        ViewTransform z = v.zoomedAt(sx, sy, factor);
        double tol = 1e-9 * Math.max(1, Math.abs(v.sceneX(sx)));
        assertEquals(v.sceneX(sx), z.sceneX(sx), tol, "seed " + seed);
        assertEquals(v.sceneY(sy), z.sceneY(sy), tol, "seed " + seed);
        assertEquals(v.pxPerM() * factor, z.pxPerM(), 1e-9 * z.pxPerM(), "seed " + seed);
    }

    @Test
    void panMovesContentWithTheMouse() {
        ViewTransform v = new ViewTransform(0, 0, 1000, 800, 600);
        ViewTransform p = v.pannedBy(50, -20);
        assertEquals(v.screenX(0.01) + 50, p.screenX(0.01), PIXEL_TOL);
        assertEquals(v.screenY(0.01) - 20, p.screenY(0.01), PIXEL_TOL);
    }

    @Test
    void fittingShowsTheWholeBoxInsideTheMargin() {
        ViewTransform v = new ViewTransform(5, 5, 1, 800, 600).fitting(-0.2, -0.05, 0.3, 0.1, 20);
        assertTrue(v.screenX(-0.2) >= 20 - PIXEL_TOL && v.screenX(0.3) <= 780 + PIXEL_TOL);
        assertTrue(v.screenY(0.1) >= 20 - PIXEL_TOL && v.screenY(-0.05) <= 580 + PIXEL_TOL);
    }

    @Test
    void fittingBesideTheLegendKeepsTheReservedStripFreeAndCentresInTheRest() {
        double reserved = 188;
        ViewTransform v = new ViewTransform(5, 5, 1, 800, 600).fitting(-0.2, -0.05, 0.3, 0.1, 20, reserved);
        assertTrue(v.screenX(-0.2) >= 20 - PIXEL_TOL && v.screenX(0.3) <= 800 - reserved - 20 + PIXEL_TOL,
                v.screenX(-0.2) + " … " + v.screenX(0.3));
        // The box is wider than tall here, so it fills the free width and sits centred in it.
        assertEquals(20, v.screenX(-0.2), PIXEL_TOL);
        assertEquals((800 - reserved) / 2, v.screenX(0.05), PIXEL_TOL);
        assertTrue(v.screenY(0.1) >= 20 - PIXEL_TOL && v.screenY(-0.05) <= 580 + PIXEL_TOL);
    }
}
