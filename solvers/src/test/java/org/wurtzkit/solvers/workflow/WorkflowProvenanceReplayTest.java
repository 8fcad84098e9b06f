package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.materials.data.ProvenanceJson;
import org.wurtzkit.materials.data.StructureJson;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.WarningKind;

/**
 * A design map, a tolerance study and a target search re-run from their provenance alone (the head
 * of their CSV, or a JSON side file) give the same table bit for bit. The solver is deterministic
 * (the reliability suite's determinism test), so bit-for-bit equality is the exact expectation;
 * common practice, no source. What cannot be data (a map's structure factory, the tolerances'
 * Java objects) is rebuilt by the test's code, and the test checks that the rebuilt pieces match
 * what the provenance recorded of them.
 */
class WorkflowProvenanceReplayTest {
    /** Options away from the defaults (and from the coarse test mesh), so that losing any changes the numbers. */
    private static final SolverOptions OPTIONS = Hemts.COARSE.withTolerance(3e-7)
            .withMesh(new MeshPolicy(0.21e-9, 1.14, 90e-9)).withSubbandCutoffKT(14.5);

    /** The map's factory: code, which the provenance says it cannot hold. */
    private static final StructureFactory FACTORY = p -> Hemts.hemt(Hemts.DEFAULT_SET, p[0], p[1], 1.0);

    /** The head of a CSV: each "# key: value" comment line as key, value. */
    static Map<String, String> head(String csv) {
        Map<String, String> head = new LinkedHashMap<>();
        List<String> warnings = new ArrayList<>();
        for (String line : csv.split("\r\n")) {
            if (!line.startsWith("# ")) {
                break;
            }
            String body = line.substring(2);
            int colon = body.indexOf(": ");
            if (colon < 0) {
                continue; // "produced by wurtzkit <version>"
            }
            String key = body.substring(0, colon);
            if (key.equals("warning")) {
                warnings.add(body.substring(colon + 2));
            } else {
                head.put(key, body.substring(colon + 2));
            }
        }
        head.put("warnings", String.join("\n", warnings));
        return head;
    }

    /** The "k=v; k=v" pairs of a header line. */
    static Map<String, String> pairs(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String pair : text.split("; ")) {
            int eq = pair.indexOf('=');
            m.put(pair.substring(0, eq).trim(), pair.substring(eq + 1));
        }
        return m;
    }

    @Test
    void aDesignMapIsRepeatedBitForBitFromTheHeadOfItsCsv() {
        DesignMapResult map = DesignMap.builder(FACTORY)
                .axis(Axis.of("al_fraction", "", 0.22, 0.3))
                .axis(Axis.of("barrier_thickness", "nm", 18, 26.5))
                .solver(new SelfConsistentSolver(OPTIONS)).threads(2).build().run();
        String csv = map.toCsvString();
        Map<String, String> head = head(csv);
        Map<String, String> run = pairs(head.get("run"));
        assertEquals("design map", run.get("computation"));
        assertTrue(run.get("structureFamily").startsWith("code"), run.toString());
        // the recorded structure is the factory's output at the recorded point
        Structure recorded = StructureJson.reader().read(head.get("structure"), "csv header");
        int at = Integer.parseInt(run.get("structureAtPoint"));
        assertEquals(FACTORY.at(map.parameters(at)), recorded);

        // a re-run: the same factory, the axes and the solver options of the provenance, one thread
        DesignMap.Builder again = DesignMap.builder(FACTORY)
                .solver(new SelfConsistentSolver(SolverOptions.fromSettings(pairs(head.get("solver options")))))
                .threads(1);
        for (int a = 0; run.containsKey("axis" + a); a++) {
            String[] parts = run.get("axis" + a).split("\\|", -1);
            again.axis(Axis.of(parts[0], parts[1], SweepProvenance.parseValues(parts[2])));
        }
        assertEquals(csv, again.build().run().toCsvString(), "the whole CSV, provenance and every digit");
    }

    @Test
    void aToleranceStudyIsRepeatedBitForBitFromItsJsonSideFile(@TempDir Path dir) throws IOException {
        List<Tolerance> tolerances = List.of(
                Tolerance.alFraction("barrier", Distribution.normalWithin(0.25, 0.01, 3)),
                Tolerance.layerThicknessNm("barrier", Distribution.uniform(23, 27)));
        ToleranceStudy.Builder b = ToleranceStudy.builder(Hemts.standard()).samples(5).seed(20261205L)
                .plan(SamplingPlan.LATIN_HYPERCUBE).solver(new SelfConsistentSolver(OPTIONS)).threads(2);
        tolerances.forEach(b::tolerance);
        ToleranceStudyResult study = b.build().run();
        ResultProvenance p = study.provenance().orElseThrow();
        Path side = dir.resolve("study.provenance.json");
        ProvenanceJson.writeFile(p, side);

        // on "another machine": the file, and the tolerances rebuilt by code, checked against its text
        ResultProvenance read = ProvenanceJson.readFile(side, StructureJson.reader());
        assertEquals(p, read);
        Map<String, String> run = read.run();
        assertEquals("tolerance study", run.get("computation"));
        ToleranceStudy.Builder again = ToleranceStudy.builder(read.structure())
                .samples(Integer.parseInt(run.get("samples"))).seed(Long.parseLong(run.get("seed")))
                .plan(SamplingPlan.valueOf(run.get("plan"))).sensitivity(Boolean.parseBoolean(run.get("sensitivity")))
                .solver(new SelfConsistentSolver(SolverOptions.fromSettings(read.solverOptions()))).threads(1);
        for (int i = 0; i < tolerances.size(); i++) {
            assertEquals(tolerances.get(i).toString(), run.get("tolerance" + i));
            again.tolerance(tolerances.get(i));
        }
        assertEquals(PointEvaluator.solve(Quantity.SHEET_DENSITY).description(), run.get("evaluator0"));
        ToleranceStudyResult repeated = again.build().run();
        assertEquals(study.toCsvString(), repeated.toCsvString(), "the whole CSV, provenance and every digit");
        assertEquals(study.summaryTable().toCsvString(), repeated.summaryTable().toCsvString());
    }

    @Test
    void aTargetSearchOverAReadyMadeFamilyIsRepeatedFromDataAlone() {
        StructureFamily family = StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier");
        TargetResult r = new TargetSearch(new SelfConsistentSolver(OPTIONS), 60).sheetDensity(family, 10, 40, 1.0e13,
                1e-3);
        String csv = r.toCsvString();
        Map<String, String> head = head(csv);
        Map<String, String> run = pairs(head.get("run"));
        assertEquals("template of the family", run.get("structureRole"));
        assertEquals("StructureFamilies.layerThicknessNm(template, \"barrier\")", run.get("structureFamily"));
        Structure template = StructureJson.reader().read(head.get("structure"), "csv header");
        String layer = run.get("structureFamily").replaceAll(".*\"(.*)\".*", "$1");
        TargetResult again = new TargetSearch(
                new SelfConsistentSolver(SolverOptions.fromSettings(pairs(head.get("solver options")))),
                Integer.parseInt(run.get("maxEvaluations")))
                .sheetDensity(StructureFamilies.layerThicknessNm(template, layer),
                        Double.parseDouble(run.get("lowerEnd")), Double.parseDouble(run.get("upperEnd")),
                        Double.parseDouble(run.get("target")),
                        Double.parseDouble(run.get("relativeTolerance")));
        assertEquals(csv, again.toCsvString());
        assertEquals(r.structure(), again.structure());
    }

    @Test
    void aMapGathersItsPointsWarningsByKindAndWritesThemInItsCsv() {
        // A Schottky gate conducts forward once V_g reaches the barrier height phi_B (S. M. Sze and
        // K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, sec. 3.2): two of the three
        // biases below sit at or above phi_B = 1.0 eV, one well below it
        DesignMapResult map = DesignMap.builder(p -> StandardStacksAtBias.at(p[0]))
                .axis(Axis.of("gate_bias", "V", -1, 1.0, 1.05))
                .solver(Hemts.SOLVER).threads(1).build().run();
        assertEquals(List.of(WarningKind.GATE_BIAS_AT_OR_ABOVE_BARRIER),
                map.warnings().stream().map(org.wurtzkit.warnings.Warning::kind).toList(), map.toString());
        String message = map.warnings().get(0).message();
        assertTrue(message.startsWith("at gate_bias = 1.0 V: "), message);
        assertTrue(message.endsWith("(and at 1 other point)"), message);
        assertTrue(head(map.toCsvString()).get("warnings").contains("GATE_BIAS_AT_OR_ABOVE_BARRIER"));
        assertTrue(map.toString().contains("warning: at gate_bias = 1.0 V"), map.toString());

        DesignMapResult calm = DesignMap.builder(p -> StandardStacksAtBias.at(p[0]))
                .axis(Axis.of("gate_bias", "V", -1, 0)).solver(Hemts.SOLVER).threads(1).build().run();
        assertEquals(List.of(), calm.warnings(), calm.toString());
        assertEquals("", head(calm.toCsvString()).get("warnings"));
    }

    /** The standard stack at a gate bias. */
    private static final class StandardStacksAtBias {
        static Structure at(double biasV) {
            return Hemts.standard().withTop(org.wurtzkit.structure.TopBoundary.schottky(1.0, biasV));
        }
    }
}
