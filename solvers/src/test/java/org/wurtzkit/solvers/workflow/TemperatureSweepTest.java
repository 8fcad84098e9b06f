package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.BandGap;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;

/** Temperature sweeps of Al0.25Ga0.75N/GaN with continuation. */
class TemperatureSweepTest {
    private static final double[] T = {150, 200, 250, 300, 350, 400, 450};
    private static TemperatureSweepResult sweep;

    @BeforeAll
    static void runSweep() {
        sweep = new TemperatureSweep(Hemts.SOLVER).run(Hemts.standard(), T);
        assertTrue(sweep.failures().isEmpty(), () -> sweep.failures().toString());
    }

    /** Continuation equals cold solves within 1e-4 relative (reasoning as in {@link BiasSweepTest}). */
    @Test
    void continuationEqualsColdSolves() {
        double[] ns = sweep.sheetDensityPerCm2();
        for (int i = 0; i < T.length; i++) {
            Solution cold = Hemts.SOLVER.solve(Hemts.standard().withTemperatureK(T[i]));
            assertEquals(cold.sheetDensityPerCm2(), ns[i], 1e-4 * cold.sheetDensityPerCm2(), "T = " + T[i]);
            assertEquals(cold.gateCharge(), sweep.gateCharge()[i], 1e-5 * Math.abs(cold.gateCharge()));
            System.out.printf("T = %.0f K: n_s = %.5e cm^-2, E_0 - E_F = %.4f eV, bottom gap = %.4f eV%n", T[i], ns[i],
                    sweep.groundSubbandMinusFermiEv()[i], sweep.bottomBandGapEv()[i]);
        }
    }

    /**
     * The gap the solver uses at the bottom (GaN buffer) follows the Varshni law with the
     * constants of I. Vurgaftman and J. R. Meyer, J. Appl. Phys. 94, 3675 (2003): E_g(0) = 3.510 eV,
     * alpha = 0.909 meV/K, beta = 830 K (from memory), to 1e-9 eV, i.e. the
     * temperature reaches the band structure without anything to set by hand; the Varshni law
     * (Y. P. Varshni, Physica 34, 149 (1967)) gives 3.438 eV at 300 K (computed, 4 digits).
     */
    @Test
    void bandGapFollowsVarshniLaw() {
        BandGap gan = Hemts.DEFAULT_SET.binary(Binary.GAN).bandGap();
        assertEquals(3.510, gan.gap0KEv(), 1e-9);
        double[] gap = sweep.bottomBandGapEv();
        for (int i = 0; i < T.length; i++) {
            double varshni = 3.510 - 0.909e-3 * T[i] * T[i] / (T[i] + 830);
            assertEquals(varshni, gap[i], 1e-9, "T = " + T[i] + " K");
        }
        assertEquals(3.438, gap[3], 0.0005);
    }

    @Test
    void csvHeaderAndFailures() throws IOException {
        StringWriter w = new StringWriter();
        sweep.writeCsv(w);
        assertTrue(w.toString().startsWith("# produced by wurtzkit "), w.toString());
        assertTrue(w.toString().contains("# run: computation=temperature sweep; temperaturesK="), w.toString());
        assertTrue(w.toString().substring(w.toString().indexOf("\r\ntemperature_K") + 2).startsWith("temperature_K,sheet_density_cm^-2,gate_charge_C/m^2,"
                + "ground_subband_minus_fermi_eV,bottom_band_gap_eV,outer_iterations,status\r\n"), w.toString());
        TemperatureSweepResult failed = new TemperatureSweep(
                new SelfConsistentSolver(Hemts.COARSE.withMaxIterations(1))).run(Hemts.standard(), 300, 350);
        assertEquals(2, failed.failures().size());
        assertTrue(Double.isNaN(failed.sheetDensityPerCm2()[1]));
        assertTrue(failed.failures().get(1).where().contains("350"));
    }

    @Test
    void badInputIsRejected() {
        TemperatureSweep s = new TemperatureSweep(Hemts.SOLVER);
        assertThrows(InvalidParameterException.class, () -> s.run(Hemts.standard()));
        assertThrows(InvalidParameterException.class, () -> s.run(Hemts.standard(), 300, Double.NaN));
        assertThrows(InvalidParameterException.class, () -> s.run(Hemts.standard(), 0));
        assertThrows(InvalidParameterException.class, () -> s.run(Hemts.standard(), 300, 2500));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> s.run(Hemts.standard(), 300, 350, 320));
        assertTrue(e.getMessage().contains("temperature [2] (K) = 320.0"), e.getMessage());
    }
}
