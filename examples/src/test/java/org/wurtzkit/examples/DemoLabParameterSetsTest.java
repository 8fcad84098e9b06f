package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;

/**
 * The invented parameter set of the demo lab is found through ServiceLoader, says it is invented,
 * and differs from the set it was derived from in exactly the five values its Javadoc names.
 */
class DemoLabParameterSetsTest {
    @Test
    void registeredAndLabelledInvented() {
        assertTrue(ParameterSets.names().contains(DemoLabParameterSets.NAME), ParameterSets.names().toString());
        ParameterSet lab = ParameterSets.named(DemoLabParameterSets.NAME);
        assertTrue(lab.description().startsWith("INVENTED"), lab.description());
        assertTrue(lab.sources().stream().anyMatch(s -> s.toString().contains("INVENTED")), lab.sources().toString());
        assertEquals(DemoLabParameterSets.NAME + " (invented)", DemoLabParameterSets.label(DemoLabParameterSets.NAME));
        assertEquals(ParameterSets.DEFAULT_NAME, DemoLabParameterSets.label(ParameterSets.DEFAULT_NAME));
    }

    @Test
    void differsFromTheDefaultSetInTheFiveDocumentedValues() {
        ParameterSet lab = ParameterSets.named(DemoLabParameterSets.NAME);
        ParameterSet base = ParameterSets.defaultSet();
        Map<Binary, Set<MaterialParameter>> changed = Map.of(
                Binary.GAN, EnumSet.of(MaterialParameter.C13, MaterialParameter.C33,
                        MaterialParameter.PERMITTIVITY_STATIC),
                Binary.ALN, EnumSet.of(MaterialParameter.E33, MaterialParameter.SPONTANEOUS_POLARIZATION),
                Binary.INN, EnumSet.noneOf(MaterialParameter.class));
        for (Binary b : Binary.values()) {
            for (MaterialParameter p : MaterialParameter.values()) {
                double v = lab.binary(b).get(p);
                double w = base.binary(b).get(p);
                if (changed.get(b).contains(p)) {
                    assertTrue(v != w, b + " " + p + " is one of the invented values");
                    assertTrue(lab.binary(b).source(p).toString().contains("TNL"), lab.binary(b).source(p).toString());
                } else {
                    assertEquals(w, v, 0.0, b + " " + p + " is taken over unchanged");
                }
            }
        }
    }

    /**
     * The lab's file declares the built-in dielectrics by reference and its own invented PECVD SiN
     * with its (invented) source; a gate stack takes it by name.
     */
    @Test
    void declaresTheLabsOwnInventedInsulator() {
        ParameterSet lab = ParameterSets.named(DemoLabParameterSets.NAME);
        assertEquals(org.wurtzkit.material.Insulators.AL2O3, lab.insulator("Al2O3"));
        org.wurtzkit.material.Insulator sin = lab.insulator("TNL-SiN");
        assertEquals(7.0, sin.relativePermittivity(), 0.0);
        assertTrue(sin.source().contains("INVENTED"), sin.source());
        org.wurtzkit.structure.Structure s = org.wurtzkit.structure.Structure.builder(lab)
                .grow(org.wurtzkit.structure.Layer.of("buffer", org.wurtzkit.material.Composition.GAN, 500e-9))
                .grow(org.wurtzkit.structure.Layer.of("barrier", org.wurtzkit.material.Composition.alGaN(0.25), 20e-9))
                .depositNm("TNL-SiN", 8).top(org.wurtzkit.structure.TopBoundary.schottky(2.0)).build();
        assertEquals(sin, s.gateStack().get(0).insulator());
    }
}
