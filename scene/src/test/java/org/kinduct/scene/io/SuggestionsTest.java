package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class SuggestionsTest {

    private static final List<String> FIELDS = List.of("kind", "id", "body", "vertices", "name", "turns");

    @Test
    void distanceMatchesTextbookExamples() {
        // kitten → sitting needs 3 edits (the standard Levenshtein example; from memory).
        assertEquals(3, Suggestions.distance("kitten", "sitting"));
        // A swap of neighbours costs 1; "ca" → "abc" costs 3 under optimal string alignment, which
        // may not edit a substring twice (unlike unrestricted Damerau–Levenshtein: 2; from memory).
        assertEquals(1, Suggestions.distance("nmae", "name"));
        assertEquals(3, Suggestions.distance("ca", "abc"));
        assertEquals(0, Suggestions.distance("", ""));
        assertEquals(4, Suggestions.distance("", "kind"));
    }

    @Test
    void suggestsNearbyNamesOnly() {
        assertEquals(Optional.of("vertices"), Suggestions.closest("vertexes", FIELDS));
        assertEquals(Optional.of("name"), Suggestions.closest("nmae", FIELDS));
        assertEquals(Optional.of("kind"), Suggestions.closest("Kind", FIELDS));
        assertEquals(Optional.of("turns"), Suggestions.closest("turn", FIELDS));
        assertEquals(Optional.empty(), Suggestions.closest("colour", FIELDS));
        assertEquals(Optional.empty(), Suggestions.closest("x", List.of()));
    }
}
