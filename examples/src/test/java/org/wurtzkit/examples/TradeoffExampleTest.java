// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.solvers.workflow.TradeoffPoint;
import org.wurtzkit.solvers.workflow.TradeoffResult;

/**
 * The trade-off example on its small family: the plot and the table it writes, the table holding the
 * result's numbers, the band and front marked as the result says, and the design trends with the sign
 * the physics of the stack demands.
 */
class TradeoffExampleTest {
    private static final TradeoffExample.Settings QUICK = TradeoffExample.Settings.quick();
    @TempDir
    static Path out;
    private static TradeoffExample.Result run;
    private static String logText;

    @BeforeAll
    static void runOnce() throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        run = TradeoffExample.run(out, QUICK, new PrintStream(bytes, true, StandardCharsets.UTF_8));
        logText = bytes.toString(StandardCharsets.UTF_8);
    }

    @Test
    void writesThePlotAndTheTable() throws IOException {
        TradeoffExample.Settings s = QUICK;
        TradeoffExample.Result r = run;
        TradeoffResult t = r.tradeoff();
        Outputs.assertPng(r.files().get(0), TradeoffExample.WIDTH, TradeoffExample.HEIGHT);
        assertEquals("tradeoff.png", r.files().get(0).getFileName().toString());
        List<CSVRecord> rows = Outputs.assertCsv(r.files().get(1), List.of("cap_nm", "al_fraction", "barrier_nm",
                "sheet_density_cm^-2", "threshold_voltage_V", "model_threshold_voltage_V", "mobility_cm^2/Vs",
                "sheet_resistance_Ohm/sq", "gate_leakage_A/cm^2", "in_vth_band", "on_front", "warnings", "status"));
        assertEquals(s.capNm().length * s.alloy().length * s.barrierNm().length, rows.size());
        assertTrue(t.failures().isEmpty(), t.failures()::toString);
        for (int i = 0; i < rows.size(); i++) {
            TradeoffPoint p = t.point(i);
            CSVRecord row = rows.get(i);
            assertEquals(p.sheetResistanceOhmPerSquare(), Double.parseDouble(row.get("sheet_resistance_Ohm/sq")), 0.0);
            assertEquals(p.leakageAPerCm2(), Double.parseDouble(row.get("gate_leakage_A/cm^2")), 0.0);
            assertEquals(Boolean.toString(p.inBand()), row.get("in_vth_band"));
            assertEquals(Boolean.toString(p.onFront()), row.get("on_front"));
            assertEquals(Math.abs(p.thresholdVoltageV() - TradeoffExample.TARGET_THRESHOLD_V)
                    <= TradeoffExample.BAND_TOLERANCE_V, p.inBand(), p::toString);
        }
        assertFalse(t.front().isEmpty(), t::toString);
        assertTrue(String.join("\n", r.summary()).contains("invented demo data"));
        assertTrue(logText.contains("points"), "progress on the log");
    }

    @Test
    void capAndAluminiumMoveTheStackTheWayThePhysicsSays() {
        TradeoffExample.Settings s = QUICK;
        TradeoffResult t = run.tradeoff();
        int nx = s.alloy().length;
        int nb = s.barrierNm().length;
        for (int x = 0; x < nx; x++) {
            for (int b = 0; b < nb; b++) {
                // Thicker GaN cap: lower leakage (a thicker, higher barrier between gate and channel) and
                // higher R_sh (its polarization charge depletes the 2DEG) - the physics of the stack,
                // common practice for HEMT epi, no source.
                TradeoffPoint thin = t.point(x * nb + b);
                TradeoffPoint thick = t.point((s.capNm().length - 1) * nx * nb + x * nb + b);
                assertTrue(thick.leakageMagnitudeAPerCm2() < thin.leakageMagnitudeAPerCm2(), thick + " vs " + thin);
                assertTrue(thick.sheetResistanceOhmPerSquare() > thin.sheetResistanceOhmPerSquare(), thick + " vs " + thin);
            }
        }
        for (int c = 0; c < s.capNm().length; c++) {
            for (int b = 0; b < nb; b++) {
                // More Al: more n_s from the larger polarization step (O. Ambacher et al., J. Appl. Phys.
                // 87, 334 (2000)), hence lower R_sh at these fractions (common practice, no source).
                TradeoffPoint low = t.point(c * nx * nb + b);
                TradeoffPoint high = t.point(c * nx * nb + (nx - 1) * nb + b);
                assertTrue(high.sheetDensityPerCm2() > low.sheetDensityPerCm2(), high + " vs " + low);
                assertTrue(high.sheetResistanceOhmPerSquare() < low.sheetResistanceOhmPerSquare(), high + " vs " + low);
            }
        }
    }
}
