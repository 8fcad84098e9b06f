// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;

/**
 * toString of the solution and of every workflow result on one small stack (Al0.25Ga0.75N 25 nm
 * on GaN, coarse mesh): a summary line with units, then a table preview whose numbers read back to
 * the result's own values at six significant digits; CSV to a String equals CSV to a Writer and
 * to a file. Content and units are asserted, never a hash.
 */
class ReadableResultsTest {
    private static Solution solution;
    private static BiasSweepResult sweep;

    @BeforeAll
    static void solve() {
        solution = Hemts.SOLVER.solve(Hemts.standard());
        sweep = new BiasSweep(Hemts.SOLVER).run(Hemts.standard(), BiasGrid.linear(0, -1, 5));
        assertTrue(sweep.failures().isEmpty(), () -> sweep.failures().toString());
    }

    private static double numberAfter(String text, String label) {
        Matcher m = Pattern.compile(Pattern.quote(label) + "\\s*(-?[0-9.]+(?:e-?[0-9]+)?)").matcher(text);
        assertTrue(m.find(), () -> "\"" + label + "\" followed by a number in:\n" + text);
        return Double.parseDouble(m.group(1));
    }

    /** The cells of the preview line whose first cell is {@code first}. */
    private static String[] row(String text, String first) {
        return text.lines().filter(l -> l.startsWith(first + " ")).findFirst()
                .orElseThrow(() -> new AssertionError("no row starting with " + first + " in:\n" + text))
                .trim().split("\\s+");
    }

    private static void assertSixDigits(double expected, double printed, String what) {
        assertEquals(expected, printed, 5e-6 * Math.abs(expected), what);
    }

    /** Where binary round-off used to show: -0.5 + 1.0 * 8 / 10 is 0.30000000000000004. */
    @Test
    void linearGridsHoldTheDecimalsTheyName() {
        assertNotEquals(0.3, -0.5 + (0.5 - -0.5) * 8 / 10, "the old formula's noise, for reference");
        BiasGrid g = BiasGrid.linear(-0.5, 0.5, 11);
        assertEquals(0.3, g.get(8));
        for (int i = 0; i < g.size(); i++) {
            assertEquals(Double.toString((i - 5) / 10.0), Double.toString(g.get(i)), "bias " + i);
        }
        assertEquals("BiasGrid[11 gate biases: -0.5, -0.4, -0.3, ..., 0.5 V]", g.toString());
        assertEquals("BiasGrid[3 gate biases: 0, -0.25, -0.5 V]", BiasGrid.linear(0, -0.5, 3).toString());
        Axis x = Axis.linear("al_fraction", "", 0.1, 0.5, 5);
        assertEquals(0.3, x.get(2));
        assertEquals("Axis[al_fraction: 0.1, 0.2, 0.3, 0.4, 0.5]", x.toString());
        assertEquals("Axis[barrier_thickness: 10, 20 nm]", Axis.of("barrier_thickness", "nm", 10, 20).toString());
    }

    @Test
    void optionRecords() {
        assertEquals("mesh 0.2 nm at interfaces, growing by 1.15 to at most 100 nm", Hemts.COARSE.mesh().toString());
        assertEquals("automatic quantum windows, 40 nm on both sides of every interface",
                org.wurtzkit.solvers.sp.QuantumRegion.automatic().toString());
        assertEquals("window 0 to 40 nm", org.wurtzkit.solvers.sp.QuantumRegion.Window.nm(0, 40).toString());
        assertEquals("gate_bias (V)", Column.of("gate_bias", "V").toString());
        assertEquals("Quantity[sheet_density (cm^-2)]", Quantity.SHEET_DENSITY.toString());
    }

    @Test
    void solutionSummary() {
        String text = solution.toString();
        List<String> lines = text.lines().toList();
        assertTrue(lines.get(0).startsWith("Solution (Schottky gate, barrier 1 eV, bias 0 V; 300 K; "
                + solution.nodeCount() + " nodes over 525 nm):"), lines.get(0));
        assertTrue(lines.get(1).startsWith("  n_s = "), lines.get(1));
        assertSixDigits(solution.sheetDensityPerCm2(), numberAfter(text, "n_s = "), text);
        assertTrue(lines.get(1).contains(" cm^-2 (2DEG, " + solution.subbands().size() + " subband"), lines.get(1));
        List<Subband> bands = solution.subbands();
        assertTrue(bands.size() > 4, "the test stack has more subbands than the summary lists: " + bands.size());
        for (int k = 0; k < 4; k++) {
            String line = lines.get(2 + k);
            assertTrue(line.startsWith("  subband " + bands.get(k).index() + " of window " + bands.get(k).window()
                    + ": E - E_F = "), line);
            assertSixDigits(bands.get(k).energyEv(), numberAfter(line, "E - E_F = "), line);
            assertSixDigits(bands.get(k).sheetDensityPerCm2(), numberAfter(line, "eV, "), line);
            assertTrue(line.contains(" cm^-2, in-plane mass ") && line.endsWith(" m0"), line);
        }
        String rest = lines.get(6);
        assertTrue(rest.startsWith("  ... " + (bands.size() - 4) + " more subbands, "), rest);
        double restSum = 0;
        for (int k = 4; k < bands.size(); k++) {
            restSum += bands.get(k).sheetDensityPerCm2();
        }
        assertSixDigits(restSum, numberAfter(rest, "more subbands, "), rest);
        assertTrue(rest.endsWith(" cm^-2 together"), rest);
        String conv = lines.get(7);
        assertTrue(conv.startsWith("  converged after " + solution.convergence().iterations() + " iteration"), conv);
        assertTrue(conv.contains(" Newton steps), last change ") && conv.endsWith(" V"), conv);
        assertSixDigits(solution.convergence().finalResidual(), numberAfter(conv, "last change "), conv);
        assertEquals(8, lines.size(), text);
    }

    @Test
    void biasSweepAndCapacitanceVoltage() {
        String text = sweep.toString();
        List<String> lines = text.lines().toList();
        assertTrue(lines.get(0).startsWith("Bias sweep: 5 gate biases from 0 V to -1 V, 5 converged; n_s from "),
                lines.get(0));
        assertTrue(lines.get(0).endsWith(" cm^-2"), lines.get(0));
        assertTrue(lines.get(1).startsWith("gate_bias_V  sheet_density_cm^-2"), lines.get(1));
        assertEquals(1 + 1 + 5, lines.size(), text);
        assertTrue(lines.get(3).startsWith("-0.25  "), lines.get(3));
        assertSixDigits(sweep.sheetDensityPerCm2()[1], Double.parseDouble(row(text, "-0.25")[1]), text);

        String cv = sweep.capacitanceVoltage().toString();
        assertTrue(cv.startsWith("C-V: 4 bias intervals from 0 V to -1 V, C from "), cv);
        assertTrue(cv.lines().findFirst().orElseThrow().endsWith(" uF/cm^2"), cv);
        double[] c = sweep.capacitanceVoltage().capacitanceMicroFaradPerCm2();
        double lo = Math.min(Math.min(c[0], c[1]), Math.min(c[2], c[3]));
        assertSixDigits(lo, numberAfter(cv, "C from "), cv);
    }

    @Test
    void csvToStringWriterAndFileAgree(@TempDir Path dir) throws IOException {
        StringWriter w = new StringWriter();
        sweep.writeCsv(w);
        String csv = sweep.toCsvString();
        assertEquals(w.toString(), csv);
        Path file = dir.resolve("sweep.csv");
        sweep.writeCsv(file);
        assertEquals(csv, Files.readString(file, StandardCharsets.UTF_8));
        assertTrue(csv.startsWith("gate_bias_V,sheet_density_cm^-2,"), csv);
        assertTrue(csv.contains("\r\n-0.75,"), csv);
        // CSV keeps every digit: the cell reads back to the identical double
        String[] row = csv.split("\r\n")[2].split(",");
        assertEquals(sweep.sheetDensityPerCm2()[1], Double.parseDouble(row[1]));
    }

    @Test
    void previewOfALongTableShowsBothEnds() {
        BiasSweepResult many = new BiasSweep(Hemts.SOLVER).run(Hemts.standard(), BiasGrid.linear(0, -0.6, 13));
        String p = many.preview(4);
        List<String> lines = p.lines().toList();
        assertEquals(1 + 2 + 1 + 2, lines.size(), p);
        assertTrue(lines.get(1).startsWith("0  "), p);
        assertTrue(lines.get(2).startsWith("-0.05  "), p);
        assertEquals("... (9 more rows)", lines.get(3));
        assertTrue(lines.get(4).startsWith("-0.55  "), p);
        assertTrue(lines.get(5).startsWith("-0.6  "), p);
    }

    @Test
    void designMapTemperatureSweepAndTarget() {
        DesignMapResult map = DesignMap.builder(p -> Hemts.hemt(Hemts.DEFAULT_SET, p[0], p[1], 1.0))
                .axis(Axis.of("al_fraction", "", 0.2, 0.3)).axis(Axis.of("barrier_thickness", "nm", 25))
                .solver(Hemts.SOLVER).quantities(Quantity.SHEET_DENSITY).threads(1).build().run();
        String m = map.toString();
        assertTrue(m.startsWith("Design map: 2 points over al_fraction (2 values, 0.2 to 0.3) x barrier_thickness"
                + " (1 value, 25 to 25 nm); [sheet_density_cm^-2], 0 failed\n"), m);
        assertTrue(m.contains("\nal_fraction  barrier_thickness_nm  sheet_density_cm^-2  status\n0.2  "), m);
        assertEquals("25", row(m, "0.3")[1], m);
        assertSixDigits(map.value(1, 0), Double.parseDouble(row(m, "0.3")[2]), m);
        assertEquals("ok", row(m, "0.3")[3], m);

        TemperatureSweepResult t = new TemperatureSweep(Hemts.SOLVER).run(Hemts.standard(), 250, 300);
        String ts = t.toString();
        assertTrue(ts.startsWith("Temperature sweep: 2 temperatures from 250 K to 300 K, 2 converged\n"
                + "temperature_K"), ts);
        assertSixDigits(t.sheetDensityPerCm2()[0], Double.parseDouble(row(ts, "250")[1]), ts);

        TargetResult r = new TargetSearch(Hemts.SOLVER, 60).sheetDensity(
                StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier"), 10, 50, 1.0e13, 1e-3);
        String tr = r.toString();
        assertTrue(tr.startsWith("Target sheet_density = 1e13 cm^-2 (tolerance 1e10 cm^-2): barrier_thickness = "), tr);
        assertSixDigits(r.value(), numberAfter(tr, "barrier_thickness = "), tr);
        assertTrue(tr.contains(" nm gives ") && tr.contains(" cm^-2 after " + r.evaluations() + " evaluations\n"), tr);
    }

    @Test
    void spreadAndThresholdDefinitions() {
        ThresholdExtraction how = new ThresholdExtraction(BiasGrid.linear(0, -8, 17),
                ThresholdDefinition.constantDensity(1e11));
        assertEquals("threshold at n_s = 1e11 cm^-2, over 17 gate biases from 0 V to -8 V", how.toString());
        assertEquals("threshold by linear extrapolation at maximum slope",
                ThresholdDefinition.linearExtrapolation().toString());
        SpreadResult s = new ParameterSetSpread(Hemts.SOLVER, how).run(set -> Hemts.hemt(set, 0.25, 25, 1.0),
                ParameterSets.all().subList(0, 2));
        String text = s.toString();
        List<String> lines = text.lines().toList();
        assertEquals("Parameter-set spread over 2 sets (" + how + "):", lines.get(0));
        for (int i = 0; i < 2; i++) {
            SpreadResult.Member member = s.members().get(i);
            assertTrue(lines.get(1 + i).startsWith("  " + member.parameterSet() + ": n_s = "), lines.get(1 + i));
            assertSixDigits(member.sheetDensityPerCm2(), numberAfter(lines.get(1 + i), "n_s = "), lines.get(1 + i));
            assertSixDigits(member.thresholdVoltage(), numberAfter(lines.get(1 + i), "V_th = "), lines.get(1 + i));
            assertTrue(lines.get(1 + i).endsWith(" V"), lines.get(1 + i));
        }
        assertTrue(lines.get(3).startsWith("  n_s: min ") && lines.get(3).endsWith(" cm^-2 (2 sets)"), lines.get(3));
        assertTrue(lines.get(4).startsWith("  V_th: min ") && lines.get(4).endsWith(" V (2 sets)"), lines.get(4));
        assertFalse(text.contains("E1") || text.contains("0000000"), text);
    }
}
