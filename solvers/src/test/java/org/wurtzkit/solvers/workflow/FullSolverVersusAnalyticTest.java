package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.solvers.analytic.Ambacher2000;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.testing.A00TestSet;
import org.wurtzkit.units.Constants;

/**
 * The full Schroedinger-Poisson solver against the closed-form charge balance of O. Ambacher et
 * al., J. Appl. Phys. 87, 334 (2000) (formulas from memory; the paper was
 * not at hand), on standard metal-face AlGaN/GaN stacks without cap.
 */
class FullSolverVersusAnalyticTest {
    private static final ThresholdDefinition LEVEL = ThresholdDefinition.constantDensity(1e11);
    private static final ThresholdDefinition EXTRAPOLATION = ThresholdDefinition.linearExtrapolation();

    /** A sweep from 0 V to 0.5-1 V below the analytic threshold in 0.25 V steps. */
    private static BiasSweepResult sweepThroughThreshold(SelfConsistentSolver solver, Structure s, double vthAnalytic) {
        double last = Math.floor(vthAnalytic) - 0.5;
        int points = (int) Math.round(-last / 0.25) + 1;
        BiasSweepResult r = new BiasSweep(solver).run(s, BiasGrid.linear(0, last, points));
        assertTrue(r.failures().isEmpty(), () -> r.failures().toString());
        return r;
    }

    /**
     * Default set (VM03 with BFV97 polarization), Schottky barrier 1.0 eV: the full solver's V_th by
     * both definitions within 10 % of the analytic V_th computed from the same set (the issue's
     * criterion). The constant-density definition at 1e11 cm^-2 (a level about 1 % of the working
     * density, common practice, no source) lands within 1 % while writing this test; the
     * extrapolation within 5 %, less negative because the tangent at the top of the sweep is flatter
     * than the ideal charge-control line (effective distance d + Delta d, see
     * {@link BiasSweepTest#capacitanceMatchesFineStepDerivative()}).
     */
    @ParameterizedTest(name = "x = {0}, d = {1} nm")
    @CsvSource({"0.20, 20", "0.20, 30", "0.30, 20", "0.30, 30"})
    void thresholdAgreesWithAnalyticForTheDefaultSet(double x, double dNm) {
        Structure s = Hemts.hemt(Hemts.DEFAULT_SET, x, dNm, 1.0);
        double analytic = ChargeBalanceModel.fromStructure(s).thresholdVoltage();
        BiasSweepResult r = sweepThroughThreshold(Hemts.SOLVER, s, analytic);
        double level = r.thresholdVoltage(LEVEL);
        double lin = r.thresholdVoltage(EXTRAPOLATION);
        System.out.printf("V_th %s x=%.2f d=%.0f nm: analytic %.3f V, full (n_s=1e11) %.3f V (%+.1f %%), "
                + "full (extrapolation) %.3f V (%+.1f %%)%n", Hemts.DEFAULT_SET.name(), x, dNm, analytic, level,
                100 * (level / analytic - 1), lin, 100 * (lin / analytic - 1));
        assertEquals(analytic, level, 0.10 * Math.abs(analytic));
        assertEquals(analytic, lin, 0.10 * Math.abs(analytic));
    }

    /**
     * A00's own constants (core's {@code A00TestSet}, A00's dE_c = 0.7 dE_g line-up) and A00's Ni
     * barrier phi_b(x) = 1.3x + 0.84 eV: the full solver against the analytic V_th evaluated from
     * the {@link Ambacher2000} expressions directly, within 10 %.
     */
    @ParameterizedTest(name = "x = {0}, d = {1} nm")
    @CsvSource({"0.20, 20", "0.25, 25", "0.30, 30"})
    void thresholdAgreesWithA00Expressions(double x, double dNm) {
        ParameterSet set = A00TestSet.INSTANCE;
        SolverOptions options = Hemts.COARSE;
        double phi = Ambacher2000.schottkyBarrierEv(x);
        Structure s = Hemts.hemt(set, x, dNm, phi).toBuilder()
                .bandAlignment(BandAlignment.conductionBandFraction(0.7)).build();
        double analytic = Ambacher2000.model(x, dNm * 1e-9).thresholdVoltage();
        BiasSweepResult r = sweepThroughThreshold(new SelfConsistentSolver(options), s, analytic);
        double level = r.thresholdVoltage(LEVEL);
        double lin = r.thresholdVoltage(EXTRAPOLATION);
        System.out.printf("V_th A00 constants x=%.2f d=%.0f nm: A00 expressions %.3f V, full %.3f V (n_s=1e11), "
                + "%.3f V (extrapolation)%n", x, dNm, analytic, level, lin);
        assertEquals(analytic, level, 0.10 * Math.abs(analytic));
        assertEquals(analytic, lin, 0.10 * Math.abs(analytic));
    }

    /**
     * n_s at zero bias, full solver against the analytic model from the same set, Al0.25Ga0.75N,
     * 1.0 eV gate. Both tend to sigma/e as d grows, and their difference is
     * Delta n = C Delta E / e with C = eps/d, where Delta E is the difference between the
     * self-consistent Fermi level above the well bottom and the model's one-subband triangular
     * estimate E_0 + pi hbar^2 n_s/m*; so the relative gap shrinks roughly as 1/d. Delta E comes from:
     * the real subband ladder (several subbands are occupied, which lowers E_F, while the
     * self-consistent E_0 lies above the triangular estimate, which raises it: the Fang-Howard E_0 at
     * 1e13 cm^-2 is 0.37 eV against 0.27 eV for the triangular one, computed from F. F. Fang and W. E. Howard, Phys. Rev.
     * Lett. 16, 797 (1966));
     * the 300 K Fermi tail; wavefunction penetration into the barrier. The band offset, permittivities
     * and masses are the set's in both, so they do not contribute here (they do between sets, see
     * {@link ParameterSetSpreadTest}). Observed while writing this test: +2.0 % at 10 nm, +1.0 % at 25
     * nm, +0.36 % at 50 nm, -0.01 % at 100 nm, i.e. Delta E = +0.031, +0.053, +0.042, -0.003 eV. We
     * require the 100 nm gap below 0.5 %, the 10 nm gap below 3 %, a shrinking gap from 10 to 50 nm,
     * and |Delta E| below 0.15 eV throughout (the order of the 0.1 eV by which the triangular E_0
     * falls short of the Fang-Howard one at 1e13 cm^-2).
     */
    @Test
    void sheetDensityApproachesAnalyticForThickBarriers() {
        double[] thickness = {10, 25, 50, 100};
        double[] rel = new double[thickness.length];
        for (int i = 0; i < thickness.length; i++) {
            Structure s = Hemts.hemt(Hemts.DEFAULT_SET, 0.25, thickness[i], 1.0);
            ChargeBalanceModel m = ChargeBalanceModel.fromStructure(s);
            double analytic = m.sheetDensityPerCm2();
            double full = Hemts.SOLVER.solve(s).sheetDensityPerCm2();
            rel[i] = full / analytic - 1;
            double deltaE = (full - analytic) * 1e4 * Constants.ELEMENTARY_CHARGE / m.gateCapacitance();
            double sigma = s.interfaceCharges().get(0).sheetDensityPerCm2();
            System.out.printf("n_s d=%.0f nm: full %.5e, analytic %.5e cm^-2 (%+.2f %%), Delta E = %+.4f eV, "
                    + "sigma/e = %.5e%n", thickness[i], full, analytic, 100 * rel[i], deltaE, sigma);
            assertTrue(Math.abs(deltaE) < 0.15, "Delta E = " + deltaE + " eV at d = " + thickness[i] + " nm");
            assertTrue(full < sigma && analytic < sigma);
        }
        assertTrue(Math.abs(rel[0]) < 0.03, "10 nm: " + rel[0]);
        assertTrue(Math.abs(rel[2]) < Math.abs(rel[1]) && Math.abs(rel[1]) < Math.abs(rel[0]),
                "gap shrinks from 10 to 50 nm: " + java.util.Arrays.toString(rel));
        assertTrue(Math.abs(rel[3]) < 0.005, "100 nm: " + rel[3]);
    }
}
