package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;

class LabelPlacerTest {

    private static final SplittableRandom SEEDS = new SplittableRandom(77L);

    private static boolean overlap(LabelPlacer.Box a, LabelPlacer.Box b) {
        return a.x() < b.x() + b.w() && b.x() < a.x() + a.w() && a.y() < b.y() + b.h() && b.y() < a.y() + a.h();
    }

    @Test
    void aReservedLineIsKeptClearButLeavesRoomBesideIt() {
        LabelPlacer p = new LabelPlacer(1000, 800);
        // A diagonal conductor through the anchor, 3 px to each side.
        p.reserveLine(300, 200, 700, 600, 3);
        LabelPlacer.Box b = p.placeAround(500, 400, 60, 20);
        // Distance from each corner side of the line x − y = 100: all corners on one side, clear of it.
        double[] sides = {b.x() - b.y(), b.x() + b.w() - b.y(), b.x() - b.y() - b.h(), b.x() + b.w() - b.y() - b.h()};
        double nearest = Double.POSITIVE_INFINITY;
        boolean above = sides[0] > 100;
        for (double d : sides) {
            assertEquals(above, d > 100, "the box straddles the line: " + b);
            nearest = Math.min(nearest, Math.abs(d - 100) / Math.sqrt(2));
        }
        assertTrue(nearest >= 3, "clear of the line's width: " + b);
        assertTrue(Math.hypot(b.centerX() - 500, b.centerY() - 400) < 100, "still near its anchor: " + b);
    }

    @Test
    void labelsSharingOneAnchorDoNotOverlap() {
        LabelPlacer p = new LabelPlacer(1000, 800);
        List<LabelPlacer.Box> boxes = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            boxes.add(p.place(500, 400, 90, 40));
        }
        for (int i = 0; i < boxes.size(); i++) {
            for (int j = i + 1; j < boxes.size(); j++) {
                assertFalse(overlap(boxes.get(i), boxes.get(j)), "labels " + i + " and " + j);
            }
        }
    }

    @RepeatedTest(20)
    void labelsStayOnTheSurface() {
        long seed = SEEDS.nextLong();
        SplittableRandom r = new SplittableRandom(seed);
        LabelPlacer p = new LabelPlacer(640, 480);
        for (int i = 0; i < 12; i++) {
            LabelPlacer.Box b = p.place(r.nextDouble(-50, 700), r.nextDouble(-50, 530), 80, 36);
            assertTrue(b.x() >= 0 && b.y() >= 0 && b.x() + b.w() <= 640 && b.y() + b.h() <= 480, "seed " + seed);
        }
    }

    @Test
    void reservedAreasAreAvoided() {
        LabelPlacer p = new LabelPlacer(400, 300);
        LabelPlacer.Box legend = new LabelPlacer.Box(200, 150, 200, 150);
        p.reserve(legend);
        LabelPlacer.Box b = p.place(300, 220, 60, 30);
        assertFalse(overlap(b, legend));
    }

    @Test
    void aMarkSitsCentredOnItsAnchorWhenFreeAndStepsAsideFromWhatIsTaken() {
        LabelPlacer p = new LabelPlacer(400, 300);
        LabelPlacer.Box free = p.placeAround(100, 100, 40, 30);
        assertEquals(100, free.centerX(), 1e-12);
        assertEquals(100, free.centerY(), 1e-12);

        LabelPlacer q = new LabelPlacer(400, 300);
        LabelPlacer.Box arrow = new LabelPlacer.Box(195, 60, 10, 80);
        q.reserve(arrow);
        LabelPlacer.Box moved = q.placeAround(200, 100, 40, 30);
        assertFalse(overlap(moved, arrow));
        assertTrue(Math.hypot(moved.centerX() - 200, moved.centerY() - 100) <= 40,
                "stays near its anchor: " + moved);
    }

    @Test
    void calloutsTakeTheOrderThatKeepsTheirLeadersShortest() {
        // Free only in two slots, top and bottom, both 100 × 50; a callout anchored in the middle is as
        // near to either, one anchored in the top slot needs that one. Placed in the order given, the
        // first would take the top slot and send the second to the bottom.
        LabelPlacer p = new LabelPlacer(300, 200);
        p.reserve(new LabelPlacer.Box(0, 50, 300, 100));
        p.reserve(new LabelPlacer.Box(0, 0, 50, 50));
        p.reserve(new LabelPlacer.Box(150, 0, 150, 50));
        p.reserve(new LabelPlacer.Box(0, 150, 50, 50));
        p.reserve(new LabelPlacer.Box(150, 150, 150, 50));
        List<LabelPlacer.Box> boxes = p.placeAll(List.of(new LabelPlacer.Callout(100, 100, 80, 30),
                new LabelPlacer.Callout(100, 10, 80, 30)));
        assertTrue(boxes.get(0).y() >= 150, "the middle one goes to the bottom slot: " + boxes.get(0));
        assertTrue(boxes.get(1).y() + boxes.get(1).h() <= 50, "the top one keeps its own slot: " + boxes.get(1));
        assertFalse(overlap(boxes.get(0), boxes.get(1)));
    }
}
