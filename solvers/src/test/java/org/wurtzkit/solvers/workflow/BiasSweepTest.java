package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.solvers.sp.PotentialPredictor;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;
import org.wurtzkit.units.Constants;

/** Bias sweeps with continuation, quasi-static C-V and threshold extraction on Al0.25Ga0.75N/GaN. */
class BiasSweepTest {
    private static final BiasSweep SWEEP = new BiasSweep(Hemts.SOLVER);
    private static BiasSweepResult sweep;

    @BeforeAll
    static void runSweep() {
        // 0 V down to -6.5 V in 0.5 V steps, through threshold (about -5.7 V for this stack)
        sweep = SWEEP.run(Hemts.standard(), BiasGrid.linear(0, -6.5, 14));
        assertTrue(sweep.failures().isEmpty(), () -> sweep.failures().toString());
    }

    /**
     * Continuation must give the cold-start answer at every point. Both solves stop when an outer
     * iteration moves the potential by less than 1e-6 V, so each is within about that much of the
     * exact fixed point. A potential error dphi changes n_s by at most n_s dphi/(kT/e) in the
     * non-degenerate tail (4e-5 relative for 1e-6 V at 300 K) and by D dphi = (m/(pi hbar^2)) dphi
     * (8e7 cm^-2, below 1e-5 relative for n_s above 1e12 cm^-2) in the degenerate gas; 1e-4
     * relative bounds both with a margin (with a floor of 1 cm^-2 where n_s is nil). The gate
     * charge moves by C dphi, about 1e-7 relative; we allow 1e-5.
     */
    @Test
    void continuationEqualsColdSolves() {
        double[] v = sweep.gateBiasV();
        double[] ns = sweep.sheetDensityPerCm2();
        double[] q = sweep.gateCharge();
        int newtonCold = 0;
        int newtonContinued = 0;
        for (int i = 0; i < v.length; i++) {
            Solution cold = Hemts.SOLVER.solve(Hemts.standard().withTop(TopBoundary.schottky(1.0).atBiasV(v[i])));
            double n = cold.sheetDensityPerCm2();
            assertEquals(n, ns[i], 1e-4 * n + 1, "n_s at " + v[i] + " V");
            assertEquals(cold.gateCharge(), q[i], 1e-5 * Math.abs(cold.gateCharge()), "Q_gate at " + v[i] + " V");
            newtonCold += cold.convergence().newtonIterations();
            newtonContinued += sweep.solution(i).orElseThrow().convergence().newtonIterations();
        }
        System.out.println("bias sweep over " + v.length + " points: Newton steps " + newtonContinued
                + " with continuation, " + newtonCold + " from cold starts");
    }

    /**
     * The quadratic predictor of the sweeps against the linear one (the sweeps' predictor before
     * it), on the same 50 mV grid from the same cold first point: from the fourth point on, where
     * both have their full history, the quadratic guess lands within the outer tolerance at most
     * points, so it needs fewer outer iterations (Schroedinger solves) and fewer Newton steps, at most
     * 1.5 outer iterations per point (deterministic counts, no timing). Each point still agrees with
     * its own cold solve (checked at both ends and in the middle).
     */
    @Test
    void quadraticPredictorSavesIterationsOverTheLinearOne() {
        BiasGrid grid = BiasGrid.linear(0, -1, 21);
        BiasSweepResult fine = SWEEP.run(Hemts.standard(), grid);
        assertTrue(fine.failures().isEmpty(), () -> fine.failures().toString());
        double[] v = grid.values();
        Solution[] linear = new Solution[v.length];
        for (int i = 0; i < v.length; i++) {
            Structure s = Hemts.standard().withTop(TopBoundary.schottky(1.0).atBiasV(v[i]));
            linear[i] = i == 0 ? Hemts.SOLVER.solve(s)
                    : i == 1 ? Hemts.SOLVER.solve(s, linear[0])
                    : Hemts.SOLVER.solve(s, linear[i - 1].depth(),
                            PotentialPredictor.extrapolate(linear[i - 2], linear[i - 1], 1.0));
        }
        int outer = 0;
        int newton = 0;
        int outerLinear = 0;
        int newtonLinear = 0;
        for (int i = 3; i < v.length; i++) {
            outer += fine.solution(i).orElseThrow().convergence().iterations();
            newton += fine.solution(i).orElseThrow().convergence().newtonIterations();
            outerLinear += linear[i].convergence().iterations();
            newtonLinear += linear[i].convergence().newtonIterations();
        }
        int points = v.length - 3;
        System.out.println("50 mV sweep, " + points + " points: quadratic predictor " + outer + " outer / " + newton
                + " Newton, linear " + outerLinear + " / " + newtonLinear);
        assertTrue(outer < outerLinear, outer + " vs " + outerLinear + " outer iterations");
        assertTrue(newton < newtonLinear, newton + " vs " + newtonLinear + " Newton steps");
        assertTrue(outer <= 1.5 * points, outer + " outer iterations for " + points + " points");
        for (int i : new int[] {0, 10, 20}) {
            Solution cold = Hemts.SOLVER.solve(Hemts.standard().withTop(TopBoundary.schottky(1.0).atBiasV(v[i])));
            double n = cold.sheetDensityPerCm2();
            assertEquals(n, fine.sheetDensityPerCm2()[i], 1e-4 * n, "n_s at " + v[i] + " V");
        }
    }

    /**
     * Integrating the C-V curve gives back the gate-charge change exactly (by construction, see
     * {@link CapacitanceVoltage}); we allow only floating-point rounding, 1e-12 of the charge scale.
     */
    @Test
    void integralOfCapacitanceEqualsChargeChange() {
        CapacitanceVoltage cv = sweep.capacitanceVoltage();
        double[] q = sweep.gateCharge();
        int last = q.length - 1;
        double scale = Math.abs(q[0]);
        assertEquals(q[last] - q[0], cv.chargeChange(0, last), 1e-12 * scale);
        assertEquals(q[0] - q[last], cv.chargeChange(last, 0), 1e-12 * scale);
        assertEquals(q[9] - q[3], cv.chargeChange(3, 9), 1e-12 * scale);
        double[] rebuilt = cv.reconstructedCharge();
        for (int i = 0; i <= last; i++) {
            assertEquals(q[i], rebuilt[i], 1e-12 * scale);
        }
        assertEquals(0.0, cv.chargeChange(4, 4));
    }

    /**
     * Each interval's C is a second-order estimate of dQ/dV at its midpoint: against a fine central
     * difference (h = 0.01 V) its error is C'' (0.5 V)^2/24, which we bound by the sweep's own
     * second difference of C; the fine difference itself carries the solver noise, about
     * 2 x C x 1e-6 V / 0.01 V = 2e-4 C. In the linear region C lies below the geometric eps/d and
     * above eps/(d + 5 nm): the charge-control picture with an effective distance d + Delta d (the
     * 2DEG centroid a few nm below the interface plus the quantum-capacitance term; D. Delagebeaudeuf
     * and N. T. Linh, IEEE Trans. Electron Devices 29, 955 (1982), from memory; Fang-Howard centroid
     * 2.3 nm at 1e13 cm^-2, computed from F. F. Fang and W. E. Howard, Phys. Rev. Lett. 16, 797 (1966)).
     */
    @Test
    void capacitanceMatchesFineStepDerivative() {
        CapacitanceVoltage cv = sweep.capacitanceVoltage();
        double[] c = cv.capacitance();
        double[] mid = cv.midpointBiasV();
        double eps = Hemts.DEFAULT_SET.material(Composition.alGaN(0.25)).permittivityStatic()
                * Constants.VACUUM_PERMITTIVITY;
        for (int k : new int[] {2, 5, 8}) {
            double h = 0.01;
            double qp = Hemts.SOLVER.solve(Hemts.standard().withTop(TopBoundary.schottky(1.0).atBiasV(mid[k] + h / 2)))
                    .gateCharge();
            double qm = Hemts.SOLVER.solve(Hemts.standard().withTop(TopBoundary.schottky(1.0).atBiasV(mid[k] - h / 2)))
                    .gateCharge();
            double fine = (qp - qm) / h;
            double curvature = Math.abs(c[k + 1] - 2 * c[k] + c[k - 1]); // = C'' (0.5 V)^2
            double tol = 2 * curvature / 24 + 2e-4 * fine;
            assertEquals(fine, c[k], tol, "C at " + mid[k] + " V");
            assertTrue(c[k] < eps / (25 * NM) && c[k] > eps / (30 * NM), "C = " + c[k] + ", eps/d = " + eps / (25 * NM));
        }
        // unit conversion: 1 F/m^2 = 100 uF/cm^2
        assertEquals(100 * c[3], cv.capacitanceMicroFaradPerCm2()[3], 1e-12 * c[3]);
    }

    /**
     * The two threshold definitions on the same sweep; an ascending sweep over the same biases must
     * give the same values (the extraction sorts by bias; the solutions agree within the solver
     * tolerance, hence 1e-3 V).
     */
    @Test
    void thresholdDefinitionsAndSweepDirection() {
        double cc = sweep.thresholdVoltage(ThresholdDefinition.constantDensity(1e11));
        double lin = sweep.thresholdVoltage(ThresholdDefinition.linearExtrapolation());
        System.out.printf("bias sweep Al0.25Ga0.75N 25 nm: V_th = %.4f V (n_s = 1e11), %.4f V (extrapolation)%n", cc,
                lin);
        BiasSweepResult up = SWEEP.run(Hemts.standard(), BiasGrid.linear(-6.5, 0, 14));
        assertEquals(cc, up.thresholdVoltage(ThresholdDefinition.constantDensity(1e11)), 1e-3);
        assertEquals(lin, up.thresholdVoltage(ThresholdDefinition.linearExtrapolation()), 1e-3);
        // the extrapolated line passes through the two points of largest slope, which lie above threshold
        assertTrue(lin > cc - 1 && lin < 0);
        // the level must be crossed inside the sweep
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> sweep.thresholdVoltage(ThresholdDefinition.constantDensity(1e15)));
        assertTrue(e.getMessage().contains("threshold sheet-density level"), e.getMessage());
    }

    /**
     * Issue #14: in a stretch of a sweep that does not converge, each point costs one bounded attempt
     * and says what was tried. With three outer iterations allowed, pinch-off (-8 V, no 2DEG)
     * converges cold and -7.9 V continued; 0 V fails continued and cold (a cold HEMT solve needs
     * five), and the points after it are tried once, continued from -7.9 V, without a cold retry.
     */
    @Test
    void aFailingStretchCostsOneAttemptPerPointAndSaysWhy() {
        Structure s = StandardStacks.hemt(org.wurtzkit.material.ParameterSets.defaultSet(), 1000, 0.25, 25, 0,
                TopBoundary.schottky(1, 0));
        BiasSweepResult r = new BiasSweep(new SelfConsistentSolver(
                org.wurtzkit.solvers.sp.SolverOptions.defaults().withMaxIterations(3))).run(s, -8, -7.9, 0, 0.05, 0.1);
        assertTrue(r.succeeded(0) && r.succeeded(1), () -> r.failures().toString());
        assertEquals(3, r.failures().size(), () -> r.failures().toString());
        String first = r.failures().get(0).message();
        assertTrue(first.startsWith("continued: NotConvergedException") && first.contains("; cold start: "), first);
        for (int i = 1; i < 3; i++) {
            String m = r.failures().get(i).message();
            assertTrue(m.startsWith("continued from the last converged point: NotConvergedException")
                    && m.endsWith("(no cold retry: the point before failed too)") && !m.contains("cold start:"), m);
        }
    }

    /** A point that fails is kept with its reason; nothing is dropped (solver limited to one outer iteration). */
    @Test
    void failedPointsAreReported() {
        BiasSweep starved = new BiasSweep(new SelfConsistentSolver(Hemts.COARSE.withMaxIterations(1)));
        BiasSweepResult r = starved.run(Hemts.standard(), -1.0, -2.0, -3.0);
        assertEquals(3, r.failures().size());
        assertEquals(3, r.size());
        for (int i = 0; i < 3; i++) {
            assertFalse(r.succeeded(i));
            assertEquals(ErrorKind.NOT_CONVERGED, r.failure(i).orElseThrow().kind());
            assertEquals(r.failures().get(i), r.failure(i).orElseThrow());
            assertTrue(Double.isNaN(r.sheetDensityPerCm2()[i]));
            assertTrue(r.failures().get(i).message().contains("NotConvergedException"), r.failures().get(i).message());
            assertTrue(r.row(i).get(5).startsWith("failed: "));
        }
        assertTrue(Double.isNaN(r.capacitanceVoltage().capacitance()[0]));
        assertThrows(InvalidParameterException.class,
                () -> r.thresholdVoltage(ThresholdDefinition.linearExtrapolation()));
    }

    /** The CSV names each column and its unit, and reads back to the identical doubles. */
    @Test
    void csvRoundTrip() throws IOException {
        StringWriter w = new StringWriter();
        sweep.writeCsv(w);
        String text = w.toString();
        // the provenance comment lines come first, then the header
        String table = text.substring(text.indexOf("\r\ngate_bias_V") + 2);
        assertTrue(text.startsWith("# produced by wurtzkit "), text);
        assertTrue(table.startsWith(
                "gate_bias_V,sheet_density_cm^-2,gate_charge_C/m^2,electrons_total_cm^-2,outer_iterations,status\r\n"),
                text);
        List<CSVRecord> rows;
        try (CSVParser p = CSVParser.parse(new StringReader(text),
                CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get())) {
            rows = p.getRecords();
        }
        assertEquals(sweep.size(), rows.size());
        double[] ns = sweep.sheetDensityPerCm2();
        double[] q = sweep.gateCharge();
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(sweep.gateBiasV()[i], Double.parseDouble(rows.get(i).get("gate_bias_V")));
            assertEquals(ns[i], Double.parseDouble(rows.get(i).get("sheet_density_cm^-2")));
            assertEquals(q[i], Double.parseDouble(rows.get(i).get("gate_charge_C/m^2")));
            assertEquals("ok", rows.get(i).get("status"));
        }
        StringWriter cvText = new StringWriter();
        sweep.capacitanceVoltage().writeCsv(cvText);
        String cvTable = cvText.toString().substring(cvText.toString().indexOf("\r\ninterval_start_V") + 2);
        assertTrue(cvText.toString().startsWith("# produced by wurtzkit "), cvText.toString());
        assertTrue(cvTable.startsWith("interval_start_V,interval_end_V,gate_bias_midpoint_V,capacitance_F/m^2,"
                + "capacitance_uF/cm^2,status\r\n"), cvText.toString());
        assertEquals(sweep.size(), cvTable.split("\r\n").length); // header + (points - 1) intervals
    }

    @Test
    void badInputIsRejected() {
        assertThrows(InvalidParameterException.class, () -> BiasGrid.of());
        assertThrows(InvalidParameterException.class, () -> BiasGrid.of(-1.0));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.of(-1.0, -1.0));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.of(0, -1, -0.5));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.of(0, Double.NaN));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.linear(-2, -2, 5));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.linear(Double.NaN, 0, 5));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.linear(0, Double.POSITIVE_INFINITY, 5));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.linear(0, -1, 1));
        assertThrows(InvalidParameterException.class, () -> BiasGrid.linear(0, -1, 0));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> SWEEP.run(Hemts.standard(), 0, 30));
        assertTrue(e.getMessage().contains("gate bias (V) = 30.0"), e.getMessage());
        Structure free = StandardStacks.hemt(Hemts.DEFAULT_SET, 500, 0.25, 25, 0, TopBoundary.freeSurfacePerCm2(1.65, 1e14));
        e = assertThrows(InvalidParameterException.class, () -> SWEEP.run(free, 0, -1));
        assertTrue(e.getMessage().contains("top boundary"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> ThresholdDefinition.constantDensity(0));
        assertThrows(InvalidParameterException.class, () -> ThresholdDefinition.constantDensity(Double.NaN));
        assertThrows(InvalidParameterException.class, () -> sweep.capacitanceVoltage().chargeChange(0, 99));
    }
}
