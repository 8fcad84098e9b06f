package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/** The tolerance study of the invented demo wafer: its files, and a physical sanity check of its ranking. */
class ToleranceStudyExampleTest {

    /**
     * The quick run writes three panels side by side, every evaluation, the summary and the indices;
     * the summary file holds the numbers the result reports, and every sample succeeded.
     */
    @Test
    void writesHistogramsRankingAndTables(@TempDir Path out) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream log = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        ToleranceStudyExample.Settings s = ToleranceStudyExample.Settings.quick();
        ToleranceStudyExample.Result r = ToleranceStudyExample.run(out, s, log);
        Outputs.assertPng(out.resolve("tolerance-study.png"), 3 * ToleranceStudyExample.PANEL_WIDTH,
                ToleranceStudyExample.PANEL_HEIGHT);
        ToleranceStudyResult study = r.study();
        assertTrue(study.failures().isEmpty(), () -> study.failures().toString());
        assertEquals(s.rows() * 8, study.size());
        List<CSVRecord> all = Outputs.assertCsv(out.resolve("tolerance-study.csv"), List.of("evaluation", "role", "row",
                "barrier_al_fraction", "barrier_thickness_nm", "cap_thickness_nm", "buffer_thickness_nm", "gate_barrier_eV",
                "AlN_Psp_C/m^2", "sheet_density_cm^-2", "threshold_voltage_V", "status"));
        assertEquals(study.size(), all.size());
        List<CSVRecord> summary = Outputs.assertCsv(out.resolve("tolerance-study-summary.csv"), List.of("output", "unit",
                "count", "failed", "mean", "standard_deviation", "min", "p05", "p25", "median", "p75", "p95", "max"));
        assertEquals(2, summary.size());
        assertEquals(study.summary(0).mean(), Double.parseDouble(summary.get(0).get("mean")), 0.0);
        assertEquals(Integer.toString(2 * s.rows()), summary.get(1).get("count"));
        List<CSVRecord> sens = Outputs.assertCsv(out.resolve("tolerance-study-sensitivity.csv"), List.of("output",
                "input", "first_order", "first_order_standard_error", "total_effect", "rows"));
        assertEquals(2 * 6, sens.size());
        // n_s and V_th move in opposite directions with the polarization charge (common practice, no source)
        assertTrue(study.summary(0).standardDeviation() > 0 && study.summary(1).standardDeviation() > 0);
        String text = bytes.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("tolerance study"), "progress shown:\n" + text);
        assertTrue(r.summary().get(0).contains("invented"), r.summary().get(0));
    }

    /**
     * Physical sanity check (common practice, no source): the 2DEG is set by the polarization charge
     * at the barrier/spacer interfaces, which the barrier Al fraction and P_sp of AlN move directly,
     * while the buffer (1.8 um of GaN under the channel, zero field at its bottom) hardly enters. So
     * the first-order indices of n_s rank the Al fraction and P_sp(AlN) above the buffer thickness,
     * and their total effects exceed the buffer's by orders of magnitude (32 rows: the first-order
     * estimate of the Al fraction, about 0.1, still carries a standard error of about 0.06).
     */
    @Test
    void alFractionAndPolarizationDominateTheBuffer() {
        ToleranceStudy study = ToleranceStudyExample.study(new ToleranceStudyExample.Settings(32, 1.0, 2026, false), 2,
                (done, total) -> {
                });
        ToleranceStudyResult r = study.run();
        assertTrue(r.failures().isEmpty(), () -> r.failures().toString());
        ToleranceStudyResult.Sensitivity s = r.sensitivity(0);
        ToleranceStudyResult.SobolIndex al = s.index("barrier_al_fraction");
        ToleranceStudyResult.SobolIndex psp = s.index("AlN_Psp");
        ToleranceStudyResult.SobolIndex buffer = s.index("buffer_thickness");
        for (ToleranceStudyResult.SobolIndex x : List.of(al, psp)) {
            assertTrue(x.firstOrder() > buffer.firstOrder(), x + " vs " + buffer);
            // the total effect separates them by orders of magnitude, far beyond the estimates' noise
            assertTrue(x.totalEffect() > 0.02 && x.totalEffect() > 1000 * buffer.totalEffect(), x + " vs " + buffer);
        }
        List<String> ranking = s.ranking().stream().map(ToleranceStudyResult.SobolIndex::input).toList();
        assertTrue(ranking.indexOf("barrier_al_fraction") < ranking.indexOf("buffer_thickness"), ranking.toString());
        assertTrue(ranking.indexOf("AlN_Psp") < ranking.indexOf("buffer_thickness"), ranking.toString());
    }
}
