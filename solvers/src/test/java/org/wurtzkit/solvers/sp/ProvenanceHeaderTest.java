package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.materials.data.StructureJson;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/** The CSV header lines of a provenance: one line each, the structure as JSON when the format holds it. */
class ProvenanceHeaderTest {
    private static final double NM = 1e-9;

    @Test
    void theHeaderNamesEverythingOnSingleLinesAndTheStructureReadsBack() {
        Structure s = Structure.builder(ParameterSets.defaultSet()).grow(Layer.of("buffer", Composition.GAN, 300 * NM))
                .grow(Layer.of("barrier\nwith a line break in its name", Composition.alGaN(0.25), 20 * NM))
                .top(TopBoundary.schottky(1)).build();
        ResultProvenance p = ResultProvenance.of(s, SolverOptions.defaults().settings(),
                java.util.Map.of("computation", "test"), List.of("first\nwarning"));
        List<String> lines = p.headerLines();
        lines.forEach(l -> assertTrue(!l.contains("\n") && !l.contains("\r"), l));
        assertTrue(lines.get(0).startsWith("produced by wurtzkit "));
        assertTrue(lines.contains("warning: first warning"), lines.toString());
        String structure = lines.get(lines.size() - 1);
        assertTrue(structure.startsWith("structure: {"), structure);
        assertEquals(s, StructureJson.reader().read(structure.substring("structure: ".length()), "header"));
    }

    @Test
    void aCustomMaterialIsWrittenWholeIntoTheHeader() {
        Structure s = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("own", ParameterSets.defaultSet().binary(Binary.GAN), 300 * NM))
                .top(TopBoundary.schottky(1)).build();
        List<String> lines = ResultProvenance.of(s, SolverOptions.defaults().settings(), java.util.Map.of(), List.of())
                .headerLines();
        String last = lines.get(lines.size() - 1);
        assertTrue(last.startsWith("structure: {"), last);
        assertEquals(s, StructureJson.reader().read(last.substring("structure: ".length()), "header"));
    }

    /**
     * The one stack the format cannot hold: a custom material whose per-binary gap has a binary that
     * is itself per-binary (no rule of the library makes one; built here by hand).
     */
    @Test
    void aStackTheFormatCannotHoldIsSummarisedWithTheReason() {
        org.wurtzkit.material.WurtziteMaterial gan = ParameterSets.defaultSet().binary(Binary.GAN);
        org.wurtzkit.material.BandGap inner = new org.wurtzkit.material.BandGap(3.51, 0.909e-3, 830,
                new org.wurtzkit.material.BandGap.PerBinary(new double[] {1}, new org.wurtzkit.material.BandGap[] {
                    gan.bandGap()}, 0));
        org.wurtzkit.material.WurtziteMaterial nested = gan.toBuilder("nested gap form")
                .perBinaryGap(new org.wurtzkit.material.BandGap.PerBinary(new double[] {1},
                        new org.wurtzkit.material.BandGap[] {inner}, 0))
                .build();
        Structure s = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("own", nested, 300 * NM))
                .top(TopBoundary.schottky(1)).build();
        List<String> lines = ResultProvenance.of(s, SolverOptions.defaults().settings(), java.util.Map.of(), List.of())
                .headerLines();
        String last = lines.get(lines.size() - 1);
        assertTrue(last.startsWith("structure (summary; ") && last.contains("custom material")
                && last.contains("itself per-binary"), last);
    }
}
