package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.ServiceLoader;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;
import org.wurtzkit.material.ParameterSets;

/** ServiceLoader discovery of the built-in sets (and of the team provider on the test class path). */
class DiscoveryTest {

    @Test
    void serviceLoaderFindsTheBuiltInProviderAndBothSets() {
        List<String> names = new ArrayList<>();
        boolean builtIn = false;
        for (ParameterSetProvider p : ServiceLoader.load(ParameterSetProvider.class)) {
            builtIn |= p instanceof BuiltInParameterSets;
            for (ParameterSet s : p.parameterSets()) {
                names.add(s.name());
            }
        }
        assertTrue(builtIn, "BuiltInParameterSets is not registered");
        assertTrue(names.contains("vurgaftman-meyer-2003"), names.toString());
        assertTrue(names.contains("ambacher-2002"), names.toString());
        assertEquals(List.of("vurgaftman-meyer-2003", "ambacher-2002"),
                new BuiltInParameterSets().parameterSets().stream().map(ParameterSet::name).toList());
    }

    @Test
    void parameterSetsRegistryKnowsBothAndTheDefault() {
        assertTrue(ParameterSets.names().containsAll(List.of("vurgaftman-meyer-2003", "ambacher-2002")),
                ParameterSets.names().toString());
        assertEquals("vurgaftman-meyer-2003", ParameterSets.defaultSet().name());
        assertEquals(ParameterSets.DEFAULT_NAME, BuiltInParameterSets.VURGAFTMAN_MEYER_2003);
        assertSame(BuiltInParameterSets.vurgaftmanMeyer2003(), ParameterSets.defaultSet());
        assertSame(BuiltInParameterSets.ambacher2002(), ParameterSets.named("ambacher-2002"));
    }

    @Test
    void theTeamProviderOnTheTestClassPathIsDiscoveredToo() {
        assertTrue(ParameterSets.names().contains("example-lab-2025"), ParameterSets.names().toString());
    }

    @Test
    void unknownNameListsTheRegisteredSets() {
        WurtzkitException e = assertThrows(WurtzkitException.class, () -> ParameterSets.named("vurgaftman-meyer-2001"));
        assertEquals(ErrorKind.UNKNOWN_PARAMETER_SET, e.kind());
        assertTrue(e.getMessage().contains("vurgaftman-meyer-2001"), e.getMessage());
        assertTrue(e.getMessage().contains("vurgaftman-meyer-2003") && e.getMessage().contains("ambacher-2002"),
                e.getMessage());
    }
}
