package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.nio.charset.StandardCharsets;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/** A parameter set declares its band line-up rule, and a structure built on it uses that rule by default. */
class SetBandLineUpTest {

    private static Structure hemt(ParameterSet set) {
        return Structure.builder(set).grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.3), 25 * NM)).top(TopBoundary.schottky(1.0)).build();
    }

    private static double conductionOffset(Structure s) {
        BandEdges barrier = s.bandEdgesAt(s.layerStates().get(0).top());
        BandEdges buffer = s.bandEdgesAt(s.layerStates().get(1).top());
        return barrier.conductionEv() - buffer.conductionEv();
    }

    private static double gapOffset(Structure s) {
        BandEdges barrier = s.bandEdgesAt(s.layerStates().get(0).top());
        BandEdges buffer = s.bandEdgesAt(s.layerStates().get(1).top());
        return barrier.gapEv() - buffer.gapEv();
    }

    /**
     * The ambacher-2002 set follows O. Ambacher et al., J. Appl. Phys. 87, 334 (2000), whose line-up
     * puts 70 % of the (bowed) gap difference into the conduction band (from memory). With the
     * tabulated valence-band edges interpolated linearly, all of the bowing would go to the
     * conduction band instead: dE_c(Al0.3Ga0.7N) = 358 meV against 0.7 dE_g = 423 meV.
     */
    @Test
    void theAmbacherSetLinesUpItsAlloysByItsPapersRule() {
        ParameterSet set = BuiltInParameterSets.ambacher2002();
        assertEquals(OptionalDouble.of(0.7), set.conductionBandOffsetFraction());
        Structure byDefault = hemt(set);
        assertEquals(BandAlignment.conductionBandFraction(0.7), byDefault.bandAlignment());
        assertEquals(0.7 * gapOffset(byDefault), conductionOffset(byDefault), 1e-12);
        assertEquals(0.423, conductionOffset(byDefault), 0.005);
        Structure table = hemt(set).toBuilder().bandAlignment(BandAlignment.valenceBandTable()).build();
        assertEquals(0.358, conductionOffset(table), 0.005);
    }

    @Test
    void aSetWithoutARuleKeepsItsTabulatedValenceBandEdges() {
        ParameterSet set = BuiltInParameterSets.vurgaftmanMeyer2003();
        assertEquals(OptionalDouble.empty(), set.conductionBandOffsetFraction());
        assertEquals(BandAlignment.valenceBandTable(), hemt(set).bandAlignment());
        ParameterSet derived = BuiltInParameterSets.ambacher2002().derive("ambacher-variant").build();
        assertEquals(OptionalDouble.of(0.7), derived.conductionBandOffsetFraction());
    }

    @Test
    void aFractionOutsideZeroToOneIsAFormatError() throws Exception {
        String text;
        try (var in = SetBandLineUpTest.class.getResourceAsStream("/org/wurtzkit/materials/data/ambacher-2002.json")) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        String bad = text.replace("\"conductionBandOffsetFraction\": { \"value\": 0.7,",
                "\"conductionBandOffsetFraction\": { \"value\": 1.3,");
        assertTrue(!bad.equals(text));
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> TestText.read(bad, "ambacher-2002.json"));
        assertTrue(e.getMessage().contains("conductionBandOffsetFraction"), e.getMessage());
        assertTrue(e.getMessage().contains("[0, 1]"), e.getMessage());
    }
}
