package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.solvers.sp.InterfaceEdges;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.WellMinimum;
import org.wurtzkit.structure.Structure;

/** The typed read-outs of a solution: interface edges, well minima and the band table. */
class BandTableTest {
    private static final Structure HEMT = Hemts.cappedHemt(Hemts.DEFAULT_SET, 0.25, 25, 2, 1.0);
    private static final Solution SOLVED = Hemts.SOLVER.solve(HEMT);

    /**
     * The potential is continuous, so the step of E_c at each interface is the conduction-band
     * offset of the structure's line-up between the two layers (an exact property of the model).
     * For Al0.25Ga0.75N/GaN, published offsets lie between 0.3 and 0.45 eV (O. Ambacher et al., J.
     * Phys.: Condens. Matter 14, 3399 (2002), from memory).
     */
    @Test
    void interfaceEdgesStepByTheBandOffsets() {
        List<InterfaceEdges> edges = SOLVED.interfaceEdges();
        assertEquals(2, edges.size());
        InterfaceEdges cap = edges.get(0);
        InterfaceEdges channel = edges.get(1);
        assertEquals("cap", cap.upperLayer());
        assertEquals("barrier", channel.upperLayer());
        assertEquals("buffer", channel.lowerLayer());
        assertEquals(27, channel.depthNm(), 1e-9);
        for (InterfaceEdges e : edges) {
            BandEdges up = HEMT.bandEdgesAt(HEMT.layerStates().get(e.index()).bottom());
            BandEdges low = HEMT.bandEdgesAt(HEMT.layerStates().get(e.index() + 1).top());
            assertEquals(up.conductionEv() - low.conductionEv(), e.conductionStepEv(), 1e-12, e.toString());
            assertEquals(up.valenceEv() - low.valenceEv(), e.valenceStepEv(), 1e-12, e.toString());
        }
        assertTrue(channel.conductionStepEv() > 0.3 && channel.conductionStepEv() < 0.45, channel.toString());
    }

    /**
     * The 2DEG well of a metal-face HEMT bottoms out at the channel interface, on the GaN side, below
     * the Fermi level (common practice, no source).
     */
    @Test
    void theWellMinimumSitsAtTheChannelInterface() {
        List<WellMinimum> wells = SOLVED.wellMinima();
        assertEquals(SOLVED.quantumWindows().size(), wells.size());
        WellMinimum w = wells.get(0);
        InterfaceEdges channel = SOLVED.interfaceEdges().get(1);
        assertEquals(channel.depth(), w.depth(), 0);
        assertEquals(channel.conductionBelowEv(), w.conductionEv(), 0);
        assertTrue(w.conductionEv() < 0, w.toString());
        double[] ec = SOLVED.conductionBand();
        for (double e : ec) {
            assertTrue(e >= w.conductionEv() - 1e-15, "no node of the window lies lower");
        }
    }

    @Test
    void theBandTableHoldsTheSolutionOnItsNodesAndWritesCsv() throws Exception {
        BandTable t = BandTable.of(SOLVED);
        assertEquals(SOLVED.nodeCount(), t.rowCount());
        assertArrayEquals(SOLVED.depthNm(), t.depthNm(), 1e-12);
        assertArrayEquals(SOLVED.conductionBand(), t.conductionBandEv(), 0);
        assertArrayEquals(SOLVED.valenceBand(), t.valenceBandEv(), 0);
        assertArrayEquals(SOLVED.electronDensity(), t.electronDensity(), 0);
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true)
                .get().parse(new StringReader(t.toCsvString())).getRecords();
        assertEquals(t.rowCount(), rows.size());
        // the table starts with its solution's provenance, from which a cold solve repeats it bit for
        // bit (the solver is deterministic; common practice, no source)
        org.wurtzkit.provenance.ResultProvenance p = t.provenance().orElseThrow();
        assertEquals(SOLVED.provenance(), p);
        assertTrue(t.toCsvString().startsWith("# produced by wurtzkit "));
        assertEquals(t.toCsvString(), BandTable.of(new org.wurtzkit.solvers.sp.SelfConsistentSolver(
                org.wurtzkit.solvers.sp.SolverOptions.fromSettings(p.solverOptions())).solve(p.structure())).toCsvString());
        assertEquals(List.of("depth_nm", "conduction_band_eV", "valence_band_eV", "electrons_cm^-3", "holes_cm^-3",
                "ionized_donors_cm^-3", "ionized_acceptors_cm^-3"), t.headers());
        int peak = 0;
        double[] n = t.electronDensityPerCm3();
        for (int i = 1; i < n.length; i++) {
            peak = n[i] > n[peak] ? i : peak;
        }
        CSVRecord r = rows.get(peak);
        assertEquals(t.depthNm()[peak], Double.parseDouble(r.get("depth_nm")), 0);
        assertEquals(t.conductionBandEv()[peak], Double.parseDouble(r.get("conduction_band_eV")), 0);
        assertEquals(n[peak], Double.parseDouble(r.get("electrons_cm^-3")), 0);
        assertEquals(SOLVED.electronDensity()[peak] * 1e-6, n[peak], 1e-15 * n[peak]);
    }
}
