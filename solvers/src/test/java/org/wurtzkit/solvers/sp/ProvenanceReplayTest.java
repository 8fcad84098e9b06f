package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.materials.data.ProvenanceJson;
import org.wurtzkit.materials.data.StructureJson;
import org.wurtzkit.provenance.LibraryVersion;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * A result re-run from its provenance alone (written to a JSON side file or to the head of a CSV
 * file, then read back) gives the same numbers bit for bit. The solver is deterministic (the
 * reliability suite's determinism test), so bit-for-bit equality is the exact expectation; common
 * practice, no source.
 */
class ProvenanceReplayTest {
    /** Options away from the defaults, so that losing any of them would change the numbers. */
    private static final SolverOptions OPTIONS = SolverOptions.defaults().withTolerance(3e-7)
            .withMesh(new MeshPolicy(0.13e-9, 1.07, 40e-9)).withMaxSubbands(40).withSubbandCutoffKT(14.5);

    private static Structure stack() {
        return StandardStacks.hemt(ParameterSets.defaultSet(), 300, 0.27, 21, 2, TopBoundary.schottky(0.95, -0.5));
    }

    static void assertBitIdentical(Solution a, Solution b) {
        assertArrayEquals(a.depth(), b.depth());
        assertArrayEquals(a.potential(), b.potential());
        assertArrayEquals(a.conductionBand(), b.conductionBand());
        assertArrayEquals(a.electronDensity(), b.electronDensity());
        assertArrayEquals(a.holeDensity(), b.holeDensity());
        assertEquals(Double.doubleToRawLongBits(a.sheetDensityPerCm2()), Double.doubleToRawLongBits(b.sheetDensityPerCm2()));
        assertEquals(a.subbands().size(), b.subbands().size());
        for (int k = 0; k < a.subbands().size(); k++) {
            assertEquals(a.subbands().get(k).toString(), b.subbands().get(k).toString());
        }
    }

    @Test
    void aColdSolveIsRepeatedBitForBitFromItsJsonSideFile(@TempDir Path dir) throws IOException {
        Solution first = new SelfConsistentSolver(OPTIONS).solve(stack());
        ResultProvenance p = first.provenance();
        assertEquals(LibraryVersion.get(), p.libraryVersion());
        assertEquals(ParameterSetHash.sha256(ParameterSets.defaultSet()), p.parameterSetSha256());
        assertEquals("cold", p.run().get("start"));
        Path side = dir.resolve("solution.provenance.json");
        ProvenanceJson.writeFile(p, side);

        // on "another machine": nothing but the file
        ResultProvenance read = ProvenanceJson.readFile(side, StructureJson.reader());
        assertEquals(p, read);
        Solution again = new SelfConsistentSolver(SolverOptions.fromSettings(read.solverOptions())).solve(read.structure());
        assertEquals(OPTIONS, again.options());
        assertBitIdentical(first, again);
    }

    /**
     * A MIS-HEMT (gate stack of built-in Al2O3 and an invented inline liner, a fixed charge and
     * U-shaped interface states at the barrier's top face, a fully ionized buffer doping, a custom
     * critical-thickness model): format version 2 of the stack files holds all of it, so its result
     * too is repeated bit for bit from the side file, and its CSV head carries the stack as JSON.
     */
    @Test
    void aMisHemtSolveIsRepeatedBitForBitFromItsJsonSideFile(@TempDir Path dir) throws IOException {
        org.wurtzkit.material.Insulator liner = new org.wurtzkit.material.Insulator("TNL liner (invented)", 7.0, 5.1,
                2.3, "invented for a test");
        org.wurtzkit.structure.InterfaceSheet sheet = org.wurtzkit.structure.InterfaceSheet.fixedPerCm2(2.0e13)
                .withStates(new org.wurtzkit.structure.InterfaceStates(new org.wurtzkit.structure.InterfaceStates.UShaped(
                        5e15, 5e17, 0.15, 0.15), 1.8));
        Structure mis = Structure.builder(ParameterSets.defaultSet())
                .grow(org.wurtzkit.structure.Layer.of("buffer", org.wurtzkit.material.Composition.GAN, 400e-9)
                        .withDopant(org.wurtzkit.structure.Dopant.donorsPerCm3(1e15, 0.02).fullyIonized()))
                .grow(org.wurtzkit.structure.Layer.of("barrier", org.wurtzkit.material.Composition.alGaN(0.25), 18e-9))
                .sheetOnTop(sheet)
                .deposit(org.wurtzkit.structure.InsulatorLayer.ofNm(liner, 2))
                .deposit(org.wurtzkit.structure.InsulatorLayer.ofNm(org.wurtzkit.material.Insulators.AL2O3, 10))
                .criticalThicknessModel(new org.wurtzkit.strain.CriticalThicknessModel.ChannelCracking(6))
                .top(TopBoundary.schottky(3.5).atBiasV(-2)).build();
        Solution first = new SelfConsistentSolver(OPTIONS).solve(mis);
        assertTrue(first.provenance().headerLines().stream().anyMatch(l -> l.startsWith("structure: {")),
                "the CSV head holds the stack as JSON, not a summary");
        Path side = dir.resolve("mis.provenance.json");
        ProvenanceJson.writeFile(first.provenance(), side);
        ResultProvenance read = ProvenanceJson.readFile(side, StructureJson.reader());
        assertEquals(mis, read.structure());
        Solution again = new SelfConsistentSolver(SolverOptions.fromSettings(read.solverOptions())).solve(read.structure());
        assertBitIdentical(first, again);
        assertArrayEquals(first.interfaceStateCharge(), again.interfaceStateCharge());
    }

    @Test
    void aSweepIsRepeatedBitForBitFromTheHeadOfItsCsv() {
        BiasSweepResult sweep = new BiasSweep(new SelfConsistentSolver(OPTIONS)).run(stack(), 0, -0.5, -1, -1.5);
        String csv = sweep.toCsvString();
        // only the comment lines at the head of the CSV
        Map<String, String> head = new LinkedHashMap<>();
        for (String line : csv.split("\r\n")) {
            if (!line.startsWith("# ")) {
                break;
            }
            String body = line.substring(2);
            int colon = body.indexOf(": ");
            if (colon < 0) {
                continue; // "produced by wurtzkit <version>"
            }
            head.put(body.substring(0, colon), body.substring(colon + 2));
        }
        Structure structure = StructureJson.reader().read(head.get("structure"), "csv header");
        assertEquals(sweep.structure(), structure);
        SolverOptions options = SolverOptions.fromSettings(pairs(head.get("solver options")));
        Map<String, String> run = pairs(head.get("run"));
        assertEquals("bias sweep", run.get("computation"));
        double[] biases = Arrays.stream(run.get("biasesV").split(" ")).mapToDouble(Double::parseDouble).toArray();
        BiasSweepResult again = new BiasSweep(new SelfConsistentSolver(options)).run(structure, biases);
        assertEquals(csv, again.toCsvString(), "the whole CSV, provenance and every digit, is reproduced");
        for (int i = 0; i < sweep.size(); i++) {
            assertBitIdentical(sweep.solution(i).orElseThrow(), again.solution(i).orElseThrow());
        }
    }

    private static Map<String, String> pairs(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String pair : text.split("; ")) {
            int eq = pair.indexOf('=');
            m.put(pair.substring(0, eq).trim(), pair.substring(eq + 1));
        }
        return m;
    }

    @Test
    void aWarmStartedSolutionSaysItCannotBeRepeatedBitForBitAlone() {
        SelfConsistentSolver solver = new SelfConsistentSolver(OPTIONS);
        Solution cold = solver.solve(stack());
        Solution warm = solver.solve(stack().withTop(TopBoundary.schottky(0.95, -0.6)), cold);
        assertFalse(warm.coldStart());
        assertEquals("from a neighbouring solution", warm.provenance().run().get("start"));
        assertTrue(warm.provenance().warnings().stream().anyMatch(w -> w.contains("not bit for bit")));
    }

    @Test
    void everySolverOptionIsInTheSettingsAndReadsBack() {
        // a new component of SolverOptions must be added to settings(): this counts them
        RecordComponent[] components = SolverOptions.class.getRecordComponents();
        int expected = components.length + 2; // the mesh policy is written as its three numbers
        assertEquals(expected, SolverOptions.defaults().settings().size());
        for (SolverOptions o : new SolverOptions[] {SolverOptions.defaults(), OPTIONS,
            OPTIONS.withQuantumWindows(QuantumWindows.none()).withQuantumHoles(true)
                    .withDensityOfStatesMass(DensityOfStatesMass.CHANNEL),
            OPTIONS.withQuasiFermiLevels(QuasiFermiLevels.defaults()
                    .withLayer(Carrier.HOLES, "p-GaN cap", FermiContact.GATE)
                    .withDepths(Carrier.ELECTRONS, 1e-9, 2.5e-8, FermiContact.floating(-0.125))
                    .withLayer(Carrier.HOLES, "buffer", FermiContact.CHANNEL)),
            OPTIONS.withQuantumWindows(QuantumWindows.explicit(QuantumWindows.Window.nm(1.5, 40),
                    QuantumWindows.Window.nm(60, 90.25)))}) {
            assertEquals(o, SolverOptions.fromSettings(o.settings()));
        }
    }

    @Test
    void unreadableSettingsNameTheSetting() {
        Map<String, String> s = new LinkedHashMap<>(SolverOptions.defaults().settings());
        s.remove("maxSubbands");
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> SolverOptions.fromSettings(s));
        assertTrue(e.getMessage().contains("maxSubbands"), e.getMessage());
        Map<String, String> t = new LinkedHashMap<>(SolverOptions.defaults().settings());
        t.put("tolerence", "1e-6");
        assertTrue(assertThrows(InvalidParameterException.class, () -> SolverOptions.fromSettings(t)).getMessage()
                .contains("tolerence"));
        Map<String, String> u = new LinkedHashMap<>(SolverOptions.defaults().settings());
        u.put("quantumWindows", "everywhere");
        assertTrue(assertThrows(InvalidParameterException.class, () -> SolverOptions.fromSettings(u)).getMessage()
                .contains("everywhere"));
    }
}
