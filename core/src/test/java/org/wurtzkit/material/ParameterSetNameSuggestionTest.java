// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.material;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The "did you mean" of ParameterSets.named: Levenshtein distance and the choice of the nearest names. */
class ParameterSetNameSuggestionTest {
    /**
     * Distances of the usual worked examples (common practice, no source): kitten/sitting 3
     * (two substitutions and an insertion), flaw/lawn 2, identical strings 0, against the empty
     * string the length.
     */
    @Test
    void levenshteinDistances() {
        assertEquals(3, ParameterSets.levenshtein("kitten", "sitting"));
        assertEquals(3, ParameterSets.levenshtein("sitting", "kitten"));
        assertEquals(2, ParameterSets.levenshtein("flaw", "lawn"));
        assertEquals(0, ParameterSets.levenshtein("ambacher-2002", "ambacher-2002"));
        assertEquals(5, ParameterSets.levenshtein("", "abcde"));
        assertEquals(5, ParameterSets.levenshtein("abcde", ""));
        // a transposition costs two edits in Levenshtein's measure
        assertEquals(2, ParameterSets.levenshtein("2003", "2030"));
    }

    @Test
    void nearestNamesWithinTheLimit() {
        List<String> names = List.of("vurgaftman-meyer-2003", "ambacher-2002", "tarnwick-lab-2025");
        assertEquals(List.of("vurgaftman-meyer-2003"), ParameterSets.nearest("vurgaftman-meyer-2030", names));
        assertEquals(List.of("vurgaftman-meyer-2003"), ParameterSets.nearest("Vurgaftman-Meyer-2003", names));
        assertEquals(List.of("ambacher-2002"), ParameterSets.nearest("ambacher2002", names));
        assertEquals(List.of(), ParameterSets.nearest("no-such-set", names));
        assertEquals(List.of(), ParameterSets.nearest("x", names));
        // ties are all offered, in registration order
        assertEquals(List.of("set-a", "set-b"), ParameterSets.nearest("set-c", List.of("set-a", "set-b", "other")));
    }
}
