package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;

/**
 * Input at the format's limits is read or refused in seconds: every check is O(n log n) or
 * better in the size of the file. (A 64 MiB file of 160 such outlines reads in about 3 s of
 * processor time; with the pairwise outline check it took minutes.)
 */
class LoadTimeTest {

    private static final int VERTICES = ReadContext.MAX_ITEMS;
    private static final int PATCHES = 16;
    /** The pairwise check spent about 2 s per outline here, 30 s in all. */
    private static final Duration LIMIT = Duration.ofSeconds(10);

    @Test
    void patchesWithOutlinesOfTheLargestListReadInSeconds() {
        String text = patches(PATCHES, VERTICES);
        Scene scene = assertTimeoutPreemptively(LIMIT, () -> SceneJson.read(text, "outlines.json"));
        assertEquals(PATCHES, scene.sources().size());
    }

    /** Star-shaped, hence simple, outlines about the origin. */
    private static String patches(int count, int vertices) {
        StringBuilder s = new StringBuilder("{\"format\": \"kinduct-scene\", \"version\": 1, \"sources\": [");
        for (int p = 0; p < count; p++) {
            s.append(p == 0 ? "" : ", ").append("{\"kind\": \"field-patch\", \"id\": \"p").append(p)
                    .append("\", \"bz\": \"5 mT\", \"outline\": [");
            for (int i = 0; i < vertices; i++) {
                double angle = 2 * Math.PI * i / vertices;
                double r = 0.5 + 0.25 * Math.sin(7 * angle + p);
                s.append(i == 0 ? "" : ", ").append('[').append(r * Math.cos(angle)).append(", ")
                        .append(r * Math.sin(angle)).append(']');
            }
            s.append("]}");
        }
        return s.append("]}").toString();
    }
}
