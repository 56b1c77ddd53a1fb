package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;

class DemoBrowserModelTest {

    @Test
    void listsEveryShippedDemoWithItsTitleAndASummaryThatOpensItsDescription() {
        DemoBrowserModel m = DemoBrowserModel.shipped();
        assertEquals(Demos.names(), m.entries().stream().map(DemoBrowserModel.Entry::name).toList());
        for (DemoBrowserModel.Entry e : m.entries()) {
            Scene s = Demos.load(e.name());
            assertEquals(s.name(), e.title());
            assertFalse(e.summary().isBlank(), e.name() + " has a summary");
            String opening = e.summary().endsWith("…") ? e.summary().substring(0, e.summary().length() - 1)
                    : e.summary();
            assertTrue(s.description().replaceAll("\\s+", " ").startsWith(opening), e.name() + ": " + e.summary());
            assertTrue(e.summary().length() <= DemoBrowserModel.SUMMARY_MAX_CHARS, e.summary());
        }
    }

    @Test
    void summaryStopsAtTheSentenceThatReachesTheMinimumLengthAndKeepsDecimalPointsInside() {
        String first = "A coil rides a carriage at 0.25 m/s, 1.5 mm above a track of six blocks with alternating "
                + "poles at a 15 mm pitch.";
        String text = first + " Question: what voltage does it give? More text follows here.";
        assertTrue(first.length() >= DemoBrowserModel.SUMMARY_MIN_CHARS, "the case needs a long first sentence");
        assertEquals(first, DemoBrowserModel.summary(text));
        assertEquals("Short. Also short.", DemoBrowserModel.summary("Short.   Also short."));
    }

    @Test
    void anOverlongSentenceIsCutAtAWordWithAnEllipsis() {
        String words = "word ".repeat(100).strip();
        String s = DemoBrowserModel.summary(words);
        assertTrue(s.endsWith("word…"), s);
        assertTrue(s.length() <= DemoBrowserModel.SUMMARY_MAX_CHARS, s);
    }

    @Test
    void thumbnailsArriveThroughTheUiExecutorAndAFailedOneIsLeftOut() {
        Scene good = Scene.empty("good");
        Scene bad = Scene.empty("bad");
        DemoBrowserModel m = new DemoBrowserModel(List.of("a", "b"), n -> n.equals("a") ? good : bad);
        List<Runnable> uiQueue = new ArrayList<>();
        m.renderThumbnails(s -> {
            if (s == bad) {
                throw new IllegalStateException("cannot draw");
            }
            return new BufferedImage(4, 3, BufferedImage.TYPE_INT_RGB);
        }, Runnable::run, uiQueue::add);
        assertTrue(m.thumbnails().isEmpty(), "nothing is published before the UI runs it");
        uiQueue.forEach(Runnable::run);
        assertEquals(java.util.Set.of("a"), m.thumbnails().keySet());
        assertEquals(4, m.thumbnails().get("a").getWidth());
    }
}
