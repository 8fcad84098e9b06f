// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSets;

/** A misspelt set name gets a "did you mean" naming the registered set it is nearest to. */
class NameSuggestionTest {
    @Test
    void misspeltNameSuggestsTheRegisteredOne() {
        WurtzkitException e = assertThrows(WurtzkitException.class, () -> ParameterSets.named("vurgaftman-meyer-2030"));
        assertEquals(ErrorKind.UNKNOWN_PARAMETER_SET, e.kind());
        assertTrue(e.getMessage().startsWith("no parameter set named \"vurgaftman-meyer-2030\" is registered"
                + " (did you mean \"vurgaftman-meyer-2003\"?); registered sets: ["), e.getMessage());
        assertTrue(e.getMessage().contains("ambacher-2002"), e.getMessage());

        WurtzkitException upper = assertThrows(WurtzkitException.class, () -> ParameterSets.named("Ambacher-2002"));
        assertTrue(upper.getMessage().contains("(did you mean \"ambacher-2002\"?)"), upper.getMessage());
    }

    @Test
    void unrelatedNameGetsNoGuess() {
        WurtzkitException e = assertThrows(WurtzkitException.class, () -> ParameterSets.named("gallium"));
        assertFalse(e.getMessage().contains("did you mean"), e.getMessage());
        assertTrue(e.getMessage().contains("registered sets: ["), e.getMessage());
    }
}
