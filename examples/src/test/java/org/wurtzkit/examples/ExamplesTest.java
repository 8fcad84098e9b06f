package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.solvers.workflow.SpreadResult;

/**
 * Runs every example on its small settings and checks what it writes: PNGs of the expected size
 * that show something, CSV files whose headers name every column with its unit, and results that
 * hang together (the plotted tangent meets zero at the library's threshold voltage, the tables hold
 * the numbers the examples report, the design trends have the sign physics demands).
 */
class ExamplesTest {
    private static final Set<String> TEXT_COLUMNS = Set.of("status", "window", "index", "parameter_set",
            "barrier_al_fraction", "model", "definition", "members", "outer_iterations");

    private final ByteArrayOutputStream logBytes = new ByteArrayOutputStream();
    private final PrintStream log = new PrintStream(logBytes, true, StandardCharsets.UTF_8);

    private String log() {
        return logBytes.toString(StandardCharsets.UTF_8);
    }

    private static Path file(ExampleResult r, String name) {
        return r.files().stream().filter(f -> f.getFileName().toString().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError(name + " not among " + r.files()));
    }

    private static List<CSVRecord> csv(ExampleResult r, String name, String... header) throws IOException {
        List<String> h = List.of(header);
        Outputs.assertUnits(h, TEXT_COLUMNS);
        return Outputs.assertCsv(file(r, name), h);
    }

    @Test
    void gateLeakage(@TempDir Path out) throws IOException {
        GateLeakageExample.Result r = GateLeakageExample.run(out, GateLeakageExample.Settings.quick(), log);
        Outputs.assertPng(file(r, "gate-leakage.png"), GateLeakageExample.WIDTH, GateLeakageExample.HEIGHT);
        List<CSVRecord> rows = csv(r, "gate-leakage.csv", "gate_bias_V", "total_A/cm^2", "thermionic_A/cm^2",
                "tunnelling_A/cm^2", "poole_frenkel_A/cm^2", "barrier_top_eV", "status");
        assertEquals(r.wafer().size(), rows.size());
        double[] j = r.wafer().totalAPerCm2();
        double[] image = r.imageForce().totalAPerCm2();
        double[] cap = r.thickerCap().totalAPerCm2();
        assertEquals(0, j[0], "no current at 0 V");
        for (int i = 1; i < j.length; i++) {
            assertEquals(j[i], Double.parseDouble(rows.get(i).get("total_A/cm^2")));
            // reverse current, larger with image-force lowering, smaller with the thicker cap
            assertTrue(j[i] < 0 && image[i] < j[i] && cap[i] > j[i], "point " + i);
        }
        assertTrue(r.summary().get(0).contains("Gate leakage of wafer " + DemoLab.WAFER), r.summary().toString());
    }

    @Test
    void bandDiagram(@TempDir Path out) throws IOException {
        BandDiagramExample.Result r = BandDiagramExample.run(out, log);
        Outputs.assertPng(file(r, "band-diagram.png"), BandDiagramExample.WIDTH, BandDiagramExample.HEIGHT);
        Outputs.assertPng(file(r, "band-diagram-channel.png"), BandDiagramExample.WIDTH, BandDiagramExample.HEIGHT);
        List<CSVRecord> bands = csv(r, "band-diagram.csv", "depth_nm", "conduction_band_minus_fermi_eV",
                "valence_band_minus_fermi_eV");
        assertEquals(r.solution().bandDiagram().size(), bands.size(), "one row per point of the band polyline");
        String[] nodeHeader = new String[4 + r.drawnSubbands()];
        System.arraycopy(new String[] {"depth_nm", "conduction_band_minus_fermi_eV", "valence_band_minus_fermi_eV",
            "electron_density_cm^-3"}, 0, nodeHeader, 0, 4);
        for (int k = 0; k < r.drawnSubbands(); k++) {
            // one quantum window here, so the column names the subband's index alone
            nodeHeader[4 + k] = "subband_" + k + "_psi_squared_nm^-1";
        }
        List<CSVRecord> nodes = csv(r, "band-diagram-nodes.csv", nodeHeader);
        assertEquals(r.solution().nodeCount(), nodes.size());
        // each |psi|^2 column integrates to 1 over the depth (nm), the subbands' normalisation
        for (int k = 0; k < r.drawnSubbands(); k++) {
            double integral = 0;
            for (int i = 1; i < nodes.size(); i++) {
                double h = Double.parseDouble(nodes.get(i).get(0)) - Double.parseDouble(nodes.get(i - 1).get(0));
                integral += 0.5 * h * (Double.parseDouble(nodes.get(i).get(4 + k))
                        + Double.parseDouble(nodes.get(i - 1).get(4 + k)));
            }
            assertEquals(1, integral, 0.02, "integral of |psi_" + k + "|^2");
        }
        List<CSVRecord> sub = csv(r, "subbands.csv", "window", "index", "energy_minus_fermi_eV", "occupation_cm^-2",
                "in_plane_mass_m0");
        assertEquals(r.solution().subbands().size(), sub.size());
        double sum = 0;
        for (CSVRecord row : sub) {
            sum += Double.parseDouble(row.get("occupation_cm^-2"));
        }
        double windows = 0;
        for (double v : r.solution().wellSheetDensities()) {
            windows += v * 1e-4;
        }
        assertEquals(windows, sum, 1e-9 * sum, "the subbands' occupations add up to the windows' electrons");
        // n_s is the channel's part: at 0 V the cap above the barrier holds next to nothing
        assertTrue(r.sheetDensityPerCm2() <= sum * (1 + 1e-12) && r.sheetDensityPerCm2() > sum * (1 - 1e-4),
                "n_s " + r.sheetDensityPerCm2() + " vs subbands " + sum);
        assertTrue(r.drawnSubbands() >= 1 && r.drawnSubbands() <= r.solution().subbands().size());
        assertTrue(String.join("\n", r.summary()).contains("n_s = " + BandDiagramExample.formatSheetDensity(
                r.sheetDensityPerCm2())));
        assertTrue(String.join("\n", r.summary()).contains("invented"));
    }

    @Test
    void barrierMap(@TempDir Path out) throws IOException {
        BarrierMapExample.Settings s = BarrierMapExample.Settings.quick();
        BarrierMapExample.Result r = BarrierMapExample.run(out, s, log);
        // solver, analytic model and their relative difference
        Outputs.assertPng(file(r, "barrier-map.png"), 3 * BarrierMapExample.PANEL_WIDTH,
                BarrierMapExample.PANEL_HEIGHT);
        List<CSVRecord> full = csv(r, "barrier-map-full.csv", "barrier_al_fraction", "barrier_thickness_nm",
                "sheet_density_cm^-2", "ground_subband_minus_fermi_eV", "status");
        List<CSVRecord> analytic = csv(r, "barrier-map-analytic.csv", "barrier_al_fraction", "barrier_thickness_nm",
                "sheet_density_cm^-2", "threshold_voltage_V");
        int points = s.alFractions().length * s.barrierNm().length;
        assertEquals(points, full.size());
        assertEquals(points, analytic.size());
        assertTrue(r.full().failures().isEmpty(), () -> "failed points: " + r.full().failures());
        assertTrue(log().contains(points + "/" + points + " points"), "progress reached the end:\n" + log());
        double[] ns = r.full().column("sheet_density");
        for (int i = 0; i < s.alFractions().length; i++) {
            for (int j = 0; j < s.barrierNm().length; j++) {
                double f = ns[r.full().index(i, j)];
                double a = r.analytic()[i][j];
                // the two models of the same stack agree to a few percent (A00-type charge balance)
                assertEquals(f, a, 0.10 * f, "x = " + s.alFractions()[i] + ", d = " + s.barrierNm()[j]);
                if (i > 0) {
                    assertTrue(f > ns[r.full().index(i - 1, j)], "more Al, more polarization charge, more n_s");
                }
            }
        }
    }

    @Test
    void pGanGate(@TempDir Path out) throws IOException {
        PGanGateExample.Settings s = PGanGateExample.Settings.quick();
        PGanGateExample.Result r = PGanGateExample.run(out, s, log);
        Outputs.assertPng(file(r, "p-gan-gate-vth.png"), PGanGateExample.WIDTH, PGanGateExample.HEIGHT);
        List<CSVRecord> rows = csv(r, "p-gan-gate-vth.csv", "barrier_thickness_nm", "mg_density_cm^-3",
                "threshold_voltage_V");
        assertEquals(s.mgPerCm3().length * s.barrierNm().length, rows.size());
        double[][] v = r.vthV();
        // normally-off for the 12 nm barrier (published p-GaN gate devices: about +1 V, Uemoto et al.,
        // IEEE Trans. Electron Devices 54, 3393 (2007), from memory); V_th rises with Mg and falls with
        // the barrier thickness (common practice, no source)
        assertTrue(v[0][1] > 0, "normally-off: " + v[0][1]);
        assertTrue(v[0][1] > v[0][0] && v[1][1] > v[1][0], "V_th rises with Mg");
        assertTrue(v[0][0] > v[1][0], "V_th falls with the barrier thickness");
        assertTrue(String.join("\n", r.summary()).contains("invented"));
    }

    @Test
    void capTradeoff(@TempDir Path out) throws IOException {
        CapTradeoffExample.Settings s = CapTradeoffExample.Settings.quick();
        CapTradeoffExample.Result r = CapTradeoffExample.run(out, s, log);
        // two panels stacked over the shared x axis, the title above and the axis below
        Outputs.assertPng(file(r, "cap-tradeoff.png"), CapTradeoffExample.WIDTH, 2 * CapTradeoffExample.PANEL_HEIGHT
                + org.wurtzkit.plot.TradeoffPlot.TITLE_HEIGHT_PX + org.wurtzkit.plot.TradeoffPlot.AXIS_HEIGHT_PX);
        List<CSVRecord> rows = csv(r, "cap-tradeoff.csv", "cap_thickness_nm", "sheet_density_cm^-2",
                "sheet_density_analytic_cm^-2", "barrier_field_along_depth_MV/cm", "status");
        csv(r, "cap-tradeoff-map.csv", "cap_thickness_nm", "sheet_density_cm^-2", "barrier_field_along_depth_MV/cm",
                "status");
        assertEquals(s.capNm().length, rows.size());
        double[] ns = r.map().column("sheet_density");
        double[] field = r.map().column("barrier_field_along_depth");
        for (int i = 1; i < ns.length; i++) {
            // the cap's negative interface charge depletes the channel and raises the barrier field
            assertTrue(ns[i] < ns[i - 1], "n_s falls with the cap thickness");
            assertTrue(Math.abs(field[i]) > Math.abs(field[i - 1]), "|E| in the barrier grows with the cap");
            assertTrue(field[i] < 0, "the barrier field points toward the surface");
        }
        for (int i = 0; i < ns.length; i++) {
            assertEquals(ns[i], Double.parseDouble(rows.get(i).get("sheet_density_cm^-2")), 0.0, "table = result");
        }
    }

    /**
     * The MIS-HEMT example: its plot and tables, and the sign of dV_th/dt_ox that Gauss's law gives,
     * -(P_z(GaN) + e Q_f)/eps_ox: rising with thickness when the fixed charge is below |P_z(GaN)|/e,
     * falling above it (derived; the slope itself is checked in MisHemtTest).
     */
    @Test
    void misHemt(@TempDir Path out) throws IOException {
        MisHemtExample.Result r = MisHemtExample.run(out, MisHemtExample.Settings.quick(), log);
        Outputs.assertPng(file(r, "mis-hemt.png"), 2 * MisHemtExample.PANEL_WIDTH, MisHemtExample.PANEL_HEIGHT);
        List<CSVRecord> th = csv(r, "mis-hemt-threshold.csv", "insulator_thickness_nm", "fixed_charge_cm^-2",
                "threshold_voltage_V");
        assertEquals(2 * MisHemtExample.Settings.quick().thicknessesNm().length, th.size());
        List<CSVRecord> cv = csv(r, "mis-hemt-cv.csv", "gate_bias_V", "capacitance_no_states_uF/cm^2",
                "capacitance_states_quasi_static_uF/cm^2", "capacitance_states_high_frequency_uF/cm^2");
        assertEquals(r.cv().get(0).biasV().length, cv.size());
        double pzGaN = MisHemtExample.misHemt(1e13, null, 10).layerStates().get(2).top().alongGrowth();
        for (int c = 0; c < 2; c++) {
            double net = pzGaN + org.wurtzkit.units.Constants.ELEMENTARY_CHARGE
                    * org.wurtzkit.units.Units.perCm2ToPerM2(MisHemtExample.FIXED_CHARGES[c]);
            double[] v = r.thresholdV()[c];
            assertTrue(Math.signum(v[v.length - 1] - v[0]) == -Math.signum(net),
                    "Q_f = " + MisHemtExample.FIXED_CHARGES[c] + ": " + java.util.Arrays.toString(v));
        }
    }

    @Test
    void gateSweep(@TempDir Path out) throws IOException {
        GateSweepExample.Result r = GateSweepExample.run(out, GateSweepExample.Settings.quick(), log);
        Outputs.assertPng(file(r, "gate-sweep.png"), 2 * GateSweepExample.PANEL_WIDTH, GateSweepExample.PANEL_HEIGHT);
        List<CSVRecord> sweep = csv(r, "gate-sweep.csv", "gate_bias_V", "sheet_density_cm^-2", "gate_charge_C/m^2",
                "electrons_total_cm^-2", "outer_iterations", "status");
        List<CSVRecord> cv = csv(r, "gate-sweep-cv.csv", "interval_start_V", "interval_end_V", "gate_bias_midpoint_V",
                "capacitance_F/m^2", "capacitance_uF/cm^2", "status");
        csv(r, "gate-sweep-threshold.csv", "model", "definition", "threshold_voltage_V");
        assertEquals(r.sweep().size(), sweep.size());
        assertEquals(r.sweep().size() - 1, cv.size());
        assertTrue(r.sweep().failures().isEmpty(), () -> "failed points: " + r.sweep().failures());
        // the drawn tangent is the library's definition: it meets n_s = 0 at the reported V_th
        assertEquals(r.thresholdLinearV(), r.tangentZeroV(), 1e-9);
        // the sweep must reach below threshold, and the analytic model lands near the solver
        double[] v = r.sweep().gateBiasV();
        assertTrue(v[v.length - 1] < r.thresholdLinearV() && r.thresholdLinearV() < v[0]);
        assertEquals(r.thresholdLinearV(), r.thresholdAnalyticV(), 0.5);
        assertTrue(Math.abs(r.thresholdLevelV() - r.thresholdLinearV()) < 1.0);
    }

    @Test
    void parameterSpread(@TempDir Path out) throws IOException {
        ParameterSpreadExample.Settings s = ParameterSpreadExample.Settings.quick();
        ParameterSpreadExample.Result r = ParameterSpreadExample.run(out, s, log);
        Outputs.assertPng(file(r, "parameter-spread.png"), 2 * ParameterSpreadExample.PANEL_WIDTH,
                ParameterSpreadExample.PANEL_HEIGHT);
        List<CSVRecord> members = csv(r, "parameter-spread.csv", "barrier_al_fraction", "parameter_set",
                "sheet_density_cm^-2", "threshold_voltage_V", "status");
        csv(r, "parameter-spread-summary.csv", "barrier_al_fraction", "sheet_density_min_cm^-2",
                "sheet_density_median_cm^-2", "sheet_density_max_cm^-2", "threshold_voltage_min_V",
                "threshold_voltage_median_V", "threshold_voltage_max_V", "members");
        assertTrue(r.sets().size() >= 3, "two built-in sets and the demo lab's: " + r.sets());
        assertEquals(DemoLabParameterSets.NAME, r.sets().get(r.sets().size() - 1), "the invented set comes last");
        assertEquals(s.alFractions().length * r.sets().size(), members.size());
        for (SpreadResult spread : r.spreads()) {
            assertTrue(spread.failures().isEmpty(), () -> "failed members: " + spread.failures());
            SpreadResult.Statistics n = spread.sheetDensityPerCm2();
            double[] values = spread.members().stream().mapToDouble(SpreadResult.Member::sheetDensityPerCm2).toArray();
            assertEquals(java.util.Arrays.stream(values).min().orElseThrow(), n.min(), 0.0, "min over the members");
            assertEquals(java.util.Arrays.stream(values).max().orElseThrow(), n.max(), 0.0, "max over the members");
            assertTrue(n.range() > 0, "published parameter sets disagree");
        }
        // the invented set is labelled as such wherever it is written out
        assertTrue(members.stream().anyMatch(m -> m.get("parameter_set").equals(DemoLabParameterSets.NAME + " (invented)")),
                "invented set labelled in parameter-spread.csv");
        assertTrue(members.stream().noneMatch(m -> m.get("parameter_set").equals(DemoLabParameterSets.NAME)),
                "no unlabelled invented set in parameter-spread.csv");
        assertTrue(log().contains("parameter-set spread"), "progress shown:\n" + log());
    }
}
