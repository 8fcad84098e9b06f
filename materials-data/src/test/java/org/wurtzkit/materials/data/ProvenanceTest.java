package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Bowing;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * Every value of every registered set has a provenance whose sources are all in the set's
 * bibliography, the bibliography has no duplicates, and every value of the built-in files carries a
 * note saying how it was taken (verified, from memory, computed or by definition).
 */
class ProvenanceTest {

    @Provide
    Arbitrary<ParameterSet> sets() {
        return Arbitraries.of(ParameterSets.all());
    }

    private static void assertCited(ParameterSet set, WurtziteMaterial m) {
        List<Source> bibliography = set.sources();
        for (MaterialParameter p : MaterialParameter.values()) {
            Provenance prov = m.source(p);
            assertFalse(prov.sources().isEmpty(), set.name() + " " + m + " " + p.key());
            assertFalse(prov.rule().isBlank(), set.name() + " " + m + " " + p.key());
            for (Source s : prov.sources()) {
                assertTrue(bibliography.contains(s), set.name() + " " + m + " " + p.key() + " cites " + s.key()
                        + " which is not in sources() " + bibliography);
            }
        }
    }

    @Property
    void binaryValuesCiteOnlyTheBibliography(@ForAll("sets") ParameterSet set) {
        for (Binary b : Binary.values()) {
            assertCited(set, set.binary(b));
        }
        for (Bowing bow : List.of(set.bowing().gapAlGaN(), set.bowing().gapInGaN(), set.bowing().gapInAlN(),
                set.bowing().polarizationAlGaN(), set.bowing().polarizationInGaN(), set.bowing().polarizationInAlN())) {
            assertTrue(set.sources().contains(bow.source()), set.name() + " bowing cites " + bow.source().key());
        }
        for (Bowing u : List.of(set.alloyScattering().alGaN(), set.alloyScattering().inGaN(),
                set.alloyScattering().inAlN())) {
            assertTrue(set.sources().contains(u.source()), set.name() + " alloy scattering cites " + u.source().key());
        }
    }

    @Property
    void alloyValuesCiteOnlyTheBibliography(@ForAll("sets") ParameterSet set,
            @ForAll @DoubleRange(min = 0, max = 1) double x, @ForAll @DoubleRange(min = 0, max = 1) double t) {
        double y = (1 - x) * t;
        assertCited(set, set.material(Composition.alInGaN(x, y)));
    }

    @Property
    void bibliographyHasNoDuplicates(@ForAll("sets") ParameterSet set) {
        Set<String> keys = new HashSet<>();
        Set<Source> all = new HashSet<>();
        for (Source s : set.sources()) {
            assertTrue(keys.add(s.key()), set.name() + " lists source key " + s.key() + " twice");
            assertTrue(all.add(s), set.name() + " lists " + s + " twice");
            assertFalse(s.citation().isBlank(), s.key());
        }
        assertFalse(set.sources().isEmpty());
    }

    @Example
    void everyBuiltInValueSaysHowItWasTaken() {
        for (FileParameterSet set : List.of(BuiltInParameterSets.vurgaftmanMeyer2003(),
                BuiltInParameterSets.ambacher2002())) {
            Map<String, String> notes = set.notes();
            // 3 binaries x every parameter (Psp_bowing from the loader) + 6 bowing values + 3 alloy
            // scattering potentials + the line-up rule where the set declares one
            int lineUp = set.conductionBandOffsetFraction().isPresent() ? 1 : 0;
            assertEquals(3 * MaterialParameter.values().length + 6 + 3 + lineUp, notes.size(), set.name());
            for (Map.Entry<String, String> n : notes.entrySet()) {
                String t = n.getValue();
                assertTrue(t.contains("from memory") || t.contains("verified") || t.contains("by definition")
                        || t.contains("computed") || t.contains("zero"),
                        set.name() + " " + n.getKey() + ": note does not say how the value was taken: " + t);
            }
            for (Source s : set.sources()) {
                assertFalse(s.note().isBlank(), set.name() + " source " + s.key() + " has no note");
            }
        }
    }

    @Example
    void computedValuesNameTheirRule() {
        FileParameterSet vm = BuiltInParameterSets.vurgaftmanMeyer2003();
        assertEquals("computed: m_hh,par = -1/(A1 + A3)",
                vm.binary(Binary.GAN).source(MaterialParameter.HEAVY_HOLE_MASS_PARALLEL).rule());
        assertEquals("computed: a_cz = a1 + D1",
                vm.binary(Binary.ALN).source(MaterialParameter.DEFORMATION_CB_PARALLEL).rule());
        assertEquals("tabulated", vm.binary(Binary.GAN).source(MaterialParameter.LATTICE_A).rule());
        FileParameterSet a = BuiltInParameterSets.ambacher2002();
        Provenance ev = a.binary(Binary.ALN).source(MaterialParameter.VALENCE_BAND_EDGE);
        assertTrue(ev.rule().startsWith("computed"), ev.rule());
        assertEquals(List.of("A00", "VM03"), ev.sources().stream().map(Source::key).toList());
        assertTrue(a.note(Binary.ALN, MaterialParameter.VALENCE_BAND_EDGE).contains("-0.822"));
    }
}
