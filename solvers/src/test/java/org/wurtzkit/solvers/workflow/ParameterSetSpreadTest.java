package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Structure;

/** The spread of n_s and V_th of Al0.25Ga0.75N (25 nm)/GaN, 1.0 eV gate, over the registered parameter sets. */
class ParameterSetSpreadTest {
    private static final Function<ParameterSet, Structure> HEMT = set -> Hemts.hemt(set, 0.25, 25, 1.0);
    private static final ThresholdExtraction HOW = new ThresholdExtraction(BiasGrid.linear(0, -8, 33),
            ThresholdDefinition.constantDensity(1e11));
    private static final ParameterSetSpread SPREAD = new ParameterSetSpread(Hemts.SOLVER, HOW);
    private static SpreadResult result;

    @BeforeAll
    static void run() {
        result = SPREAD.run(HEMT);
        System.out.println("parameter-set spread, Al0.25Ga0.75N (25 nm)/GaN, Schottky 1.0 eV, V_th at n_s = 1e11 cm^-2:");
        for (SpreadResult.Member m : result.members()) {
            System.out.printf("  %-24s n_s = %.5e cm^-2, V_th = %.4f V%n", m.parameterSet(), m.sheetDensityPerCm2(),
                    m.thresholdVoltage());
        }
        SpreadResult.Statistics n = result.sheetDensityPerCm2();
        SpreadResult.Statistics v = result.thresholdVoltage();
        System.out.printf("  n_s min / median / max = %.5e / %.5e / %.5e cm^-2 (range %.1f %% of the median)%n",
                n.min(), n.median(), n.max(), 100 * n.range() / n.median());
        System.out.printf("  V_th min / median / max = %.4f / %.4f / %.4f V%n", v.min(), v.median(), v.max());
    }

    /**
     * The spread is reported and is not zero. It should be large: the registered sets differ by
     * about 25 % in sigma (computed by the project at x = 0.25: 1.392e13 cm^-2 with the linear constants of Bernardini,
     * Fiorentini &amp; Vanderbilt, Phys. Rev. B 56, R10024 (1997), vs 1.072e13 cm^-2 with the nonlinear
     * ones of Bernardini &amp; Fiorentini, Phys. Rev. B 64, 085207 (2001); the spontaneous polarization
     * difference AlN - GaN alone differs by ~20 % between published sets), so we
     * require a range above 5 % of the median n_s.
     */
    @Test
    void spreadIsReportedAndNonZero() {
        List<ParameterSet> sets = ParameterSets.all();
        assertEquals(sets.size(), result.members().size());
        assertTrue(sets.size() >= 2, "registered sets: " + ParameterSets.names());
        assertTrue(result.failures().isEmpty(), () -> result.failures().toString());
        SpreadResult.Statistics n = result.sheetDensityPerCm2();
        assertEquals(sets.size(), n.count());
        assertTrue(n.max() > n.min());
        assertTrue(n.range() > 0.05 * n.median(), n.toString());
        double[] members = result.members().stream().mapToDouble(SpreadResult.Member::sheetDensityPerCm2).toArray();
        assertEquals(java.util.Arrays.stream(members).min().orElseThrow(), n.min(), 0.0, "min over the members");
        assertEquals(java.util.Arrays.stream(members).max().orElseThrow(), n.max(), 0.0, "max over the members");
        assertTrue(result.thresholdVoltage().max() > result.thresholdVoltage().min());
    }

    /** Each member equals a direct solve (n_s) and a direct sweep (V_th) with its set, bit for bit. */
    @Test
    void eachMemberEqualsADirectSolve() {
        for (ParameterSet set : ParameterSets.all()) {
            SpreadResult.Member m = result.member(set.name()).orElseThrow();
            Structure s = HEMT.apply(set);
            double ns = Hemts.SOLVER.solve(s).sheetDensityPerCm2();
            double vth = HOW.thresholdVoltage(s, new BiasSweep(Hemts.SOLVER));
            assertTrue(ns == m.sheetDensityPerCm2(), set.name() + ": " + ns + " vs " + m.sheetDensityPerCm2());
            assertTrue(vth == m.thresholdVoltage(), set.name() + ": " + vth + " vs " + m.thresholdVoltage());
        }
    }

    /** Median of an even count is the mean of the middle two; statistics leave failed members out. */
    @Test
    void statisticsAndFailedMembers() {
        SpreadResult.Statistics s = SpreadResult.Statistics.of(new double[] {3, 1, Double.NaN, 4, 2});
        assertEquals(1, s.min());
        assertEquals(2.5, s.median());
        assertEquals(4, s.max());
        assertEquals(4, s.count());
        assertEquals(2, SpreadResult.Statistics.of(new double[] {3, 1, 2}).median());

        String failing = ParameterSets.all().get(0).name();
        SpreadResult r = SPREAD.withThreads(1).run(set -> {
            if (set.name().equals(failing)) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "no structure for " + set.name());
            }
            return HEMT.apply(set);
        });
        assertEquals(1, r.failures().size());
        PointFailure why = r.member(failing).orElseThrow().failure();
        assertTrue(why.message().contains("no structure for " + failing), why.message());
        assertEquals(ErrorKind.INVALID_STRUCTURE, why.kind());

        // a programming error in the caller's factory is not a point failure: it propagates
        assertThrows(NullPointerException.class, () -> SPREAD.withThreads(1).run(set -> {
            throw new NullPointerException("a defect in the caller's factory");
        }));
        assertEquals(ParameterSets.all().size() - 1, r.sheetDensityPerCm2().count());
    }

    @Test
    void csvTables() throws IOException {
        StringWriter w = new StringWriter();
        result.writeCsv(w);
        String[] lines = w.toString().lines().filter(l -> !l.startsWith("# ")).toArray(String[]::new);
        assertEquals("parameter_set,sheet_density_cm^-2,threshold_voltage_V,status", lines[0]);
        assertEquals(result.members().size() + 1, lines.length);
        assertTrue(lines[1].startsWith(result.members().get(0).parameterSet() + ","));
        StringWriter sum = new StringWriter();
        result.summary().writeCsv(sum);
        String[] s = sum.toString().lines().filter(l -> !l.startsWith("# ")).toArray(String[]::new);
        assertEquals("statistic,sheet_density_cm^-2,threshold_voltage_V", s[0]);
        assertEquals("min," + result.sheetDensityPerCm2().min() + "," + result.thresholdVoltage().min(), s[1]);
    }

    /**
     * Both tables start with the spread's provenance, which names every member with its content
     * hash, so that a re-run finds the same sets by name and can check their values are unchanged;
     * the factory is code and the provenance says so. Common practice, no source.
     */
    @Test
    void theTablesStartWithTheProvenanceThatNamesEverySetAndItsHash() {
        org.wurtzkit.provenance.ResultProvenance p = result.provenance().orElseThrow();
        assertEquals("parameter-set spread", p.run().get("computation"));
        assertTrue(p.run().get("structureFamily").startsWith("code"), p.run().toString());
        for (int i = 0; i < result.members().size(); i++) {
            String name = result.members().get(i).parameterSet();
            assertEquals(name + " sha256 " + org.wurtzkit.material.ParameterSetHash.sha256(ParameterSets.named(name)),
                    p.run().get("set" + i));
        }
        int at = Integer.parseInt(p.run().get("structureOfMember"));
        assertEquals(HEMT.apply(ParameterSets.named(result.members().get(at).parameterSet())), p.structure());
        assertArrayEquals(HOW.grid().values(), SweepProvenance.parseValues(p.run().get("thresholdBiasesV")));
        assertEquals(Hemts.COARSE, org.wurtzkit.solvers.sp.SolverOptions.fromSettings(p.solverOptions()));
        String head = String.join("\n", p.headerLines());
        assertTrue(result.toCsvString().startsWith("# " + p.headerLines().get(0) + "\r\n"), head);
        assertTrue(result.summary().toCsvString().startsWith("# " + p.headerLines().get(0) + "\r\n"));
        for (org.wurtzkit.warnings.Warning x : result.warnings()) {
            assertTrue(p.warnings().contains(x.toString()), p.warnings().toString());
        }
    }

    @Test
    void badInputIsRejected() {
        assertThrows(InvalidParameterException.class, () -> SPREAD.run(HEMT, List.of()));
        assertThrows(InvalidParameterException.class, () -> SPREAD.run(null));
        assertThrows(InvalidParameterException.class, () -> SPREAD.withThreads(0));
        assertThrows(InvalidParameterException.class, () -> new ParameterSetSpread(Hemts.SOLVER, null));
    }
}
