// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.solvers.transport.GateLeakage;
import org.wurtzkit.solvers.transport.LeakageOptions;
import org.wurtzkit.testing.StandardStacks;

/** The trade-off workflow on a small AlGaN/GaN family (cap x Al fraction), coarse mesh. */
class DesignTradeoffTest {
    private static final double REVERSE_V = 4;
    private static final double[] CAPS = {0, 3};
    private static final double[] AL = {0.22, 0.30};
    private static final double BARRIER_NM = 20;

    private static TradeoffResult result;

    private static DesignTradeoff.Builder family() {
        return DesignTradeoff.builder(p -> StandardStacks.gatedHemt(Hemts.DEFAULT_SET, p[1], BARRIER_NM, p[0], 1.0))
                .axis(Axis.of("cap", "nm", CAPS))
                .axis(Axis.of("al_fraction", "", AL))
                .reverseBiasV(REVERSE_V)
                .stepV(0.5)
                .solver(Hemts.SOLVER);
    }

    @BeforeAll
    static void runOnce() {
        result = family().threads(1).build().run();
    }

    @Test
    void everyStackIsComputed() {
        assertEquals(4, result.size());
        assertTrue(result.failures().isEmpty(), () -> result.failures().toString());
        for (TradeoffPoint p : result.points()) {
            assertTrue(p.sheetDensityPerCm2() > 1e12 && p.sheetResistanceOhmPerSquare() > 0, p::toString);
            assertTrue(p.leakageAPerCm2() < 0, () -> "reverse bias gives a negative current: " + p);
        }
    }

    @Test
    void thickerCapLowersLeakageAndDensity() {
        // Expected from the physics of the stack (common practice, no source): a GaN cap adds to the
        // barrier the electrons must tunnel through and its polarization charge lifts the barrier,
        // so |J| falls; the same charge empties part of the 2DEG, so n_s falls (and R_sh rises).
        for (int x = 0; x < AL.length; x++) {
            TradeoffPoint thin = result.point(x);
            TradeoffPoint thick = result.point(AL.length + x);
            assertTrue(thick.leakageMagnitudeAPerCm2() < thin.leakageMagnitudeAPerCm2(), thick + " vs " + thin);
            assertTrue(thick.sheetDensityPerCm2() < thin.sheetDensityPerCm2(), thick + " vs " + thin);
            assertTrue(thick.sheetResistanceOhmPerSquare() > thin.sheetResistanceOhmPerSquare(), thick + " vs " + thin);
        }
    }

    @Test
    void moreAluminiumLowersSheetResistance() {
        // More Al: a larger polarization step gives more n_s (O. Ambacher et al., J. Appl. Phys. 87,
        // 334 (2000), n_s rising with x in AlGaN/GaN), which outweighs the stronger alloy scattering
        // at these fractions, so R_sh falls (common practice for HEMT epi, no source).
        for (int c = 0; c < CAPS.length; c++) {
            TradeoffPoint low = result.point(c * AL.length);
            TradeoffPoint high = result.point(c * AL.length + 1);
            assertTrue(high.sheetDensityPerCm2() > low.sheetDensityPerCm2(), high + " vs " + low);
            assertTrue(high.sheetResistanceOhmPerSquare() < low.sheetResistanceOhmPerSquare(), high + " vs " + low);
            // and V_th moves to more negative bias: more charge to deplete
            assertTrue(high.thresholdVoltageV() < low.thresholdVoltageV(), high + " vs " + low);
        }
    }

    @Test
    void sheetResistanceIsOneOverQNsMu() {
        // R_sh = 1 / (q n_s mu), the definition of the sheet resistance of a sheet of carriers
        // (S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley (2007), ch. 1), with the
        // exact elementary charge of the 2019 SI, 1.602176634e-19 C
        for (TradeoffPoint p : result.points()) {
            double expected = 1 / (1.602176634e-19 * p.sheetDensityPerCm2() * 1e4 * p.mobilityCm2PerVs() * 1e-4);
            assertEquals(expected, p.sheetResistanceOhmPerSquare(), 2e-3 * expected, p::toString);
        }
    }

    @Test
    void sameNumbersAsTheOneCallLeakageAndTheThresholdEvaluator() {
        // one sweep per point must give what the separate workflows give for the same stack
        var stack = StandardStacks.gatedHemt(Hemts.DEFAULT_SET, AL[1], BARRIER_NM, CAPS[1], 1.0);
        double j = GateLeakage.atReverseBias(stack, REVERSE_V, new BiasSweep(Hemts.SOLVER), LeakageOptions.defaults())
                .totalAPerCm2();
        TradeoffPoint p = result.point(3);
        assertEquals(j, p.leakageAPerCm2(), 1e-6 * Math.abs(j));
        double[] ref = new SheetDensityAndThreshold(ThresholdDefinition.constantDensity(1e11), 0.5, 1.0, 0.25)
                .evaluate(stack, Hemts.SOLVER);
        assertEquals(ref[0], p.sheetDensityPerCm2(), 1e-9 * ref[0]);
        assertEquals(ref[1], p.thresholdVoltageV(), 0.02);
        assertEquals(ref[2], result.modelThresholdVoltageV(3), 1e-12);
    }

    @Test
    void frontWithoutBandIsTheNonDominatedSetAndWarns() {
        int n = result.size();
        for (int i = 0; i < n; i++) {
            TradeoffPoint p = result.point(i);
            assertTrue(p.inBand());
            boolean dominated = false;
            for (int k = 0; k < n; k++) {
                TradeoffPoint q = result.point(k);
                dominated |= k != i && q.sheetResistanceOhmPerSquare() <= p.sheetResistanceOhmPerSquare()
                        && q.leakageMagnitudeAPerCm2() <= p.leakageMagnitudeAPerCm2()
                        && (q.sheetResistanceOhmPerSquare() < p.sheetResistanceOhmPerSquare()
                                || q.leakageMagnitudeAPerCm2() < p.leakageMagnitudeAPerCm2());
            }
            assertEquals(!dominated, p.onFront(), p::toString);
        }
        assertFalse(result.front().isEmpty());
        assertEquals(org.wurtzkit.warnings.WarningKind.NO_THRESHOLD_BAND, result.warnings().get(0).kind(), result.warnings()::toString);
        assertTrue(result.warnings().get(0).message().startsWith("no V_th band set"), result.warnings()::toString);
    }

    @Test
    void bandSelectsByThresholdVoltage() {
        // a band around the first stack's V_th that excludes the farthest stack
        double target = result.point(0).thresholdVoltageV();
        double far = 0;
        for (TradeoffPoint p : result.points()) {
            far = Math.max(far, Math.abs(p.thresholdVoltageV() - target));
        }
        double tol = 0.6 * far;
        TradeoffResult banded = family().threads(2).thresholdBand(target, tol).build().run();
        int in = 0;
        for (TradeoffPoint p : banded.points()) {
            assertEquals(Math.abs(p.thresholdVoltageV() - target) <= tol, p.inBand(), p::toString);
            in += p.inBand() ? 1 : 0;
            assertTrue(p.inBand() || !p.onFront(), p::toString);
        }
        assertTrue(in >= 1 && in < banded.size());
        assertTrue(banded.point(0).onFront(), "alone or best in its band? " + banded);
        // no warning about the trade-off as a whole (band, front, failures); its stacks' own warnings
        // (e.g. image-force lowering left out) are gathered after those and are allowed here
        assertTrue(banded.warnings().stream().noneMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.NO_THRESHOLD_BAND
                || w.kind() == org.wurtzkit.warnings.WarningKind.THRESHOLD_BAND_EMPTY
                || w.kind() == org.wurtzkit.warnings.WarningKind.POINTS_LEFT_OUT), banded.warnings()::toString);
        for (org.wurtzkit.warnings.Warning w : banded.warnings()) {
            assertTrue(w.message().startsWith("at "), "a stack's warning names its stack: " + w);
        }
        // the same stacks give the same numbers with 2 threads as with 1, bit for bit
        for (int i = 0; i < banded.size(); i++) {
            assertEquals(Double.doubleToRawLongBits(result.point(i).leakageAPerCm2()),
                    Double.doubleToRawLongBits(banded.point(i).leakageAPerCm2()));
            assertEquals(Double.doubleToRawLongBits(result.point(i).sheetResistanceOhmPerSquare()),
                    Double.doubleToRawLongBits(banded.point(i).sheetResistanceOhmPerSquare()));
        }
    }

    /**
     * A V_th band no depletion-mode stack of this family can reach (+3 V: these Schottky-gated AlGaN/GaN
     * stacks are normally on, V_th < 0; common practice, no source): the front is empty and the
     * result says so with a typed warning, before the stacks' own warnings.
     */
    @Test
    void aBandNoStackReachesLeavesAnEmptyFrontWithAWarning() {
        TradeoffResult r = DesignTradeoff.builder(p -> StandardStacks.gatedHemt(Hemts.DEFAULT_SET, p[0], BARRIER_NM, 0, 1.0))
                .axis(Axis.of("al_fraction", "", 0.25)).reverseBiasV(REVERSE_V).stepV(0.5)
                .thresholdBand(3, 0.1).solver(Hemts.SOLVER).threads(1).build().run();
        assertTrue(r.front().isEmpty());
        assertEquals(org.wurtzkit.warnings.WarningKind.THRESHOLD_BAND_EMPTY, r.warnings().get(0).kind(),
                r.warnings()::toString);
        assertTrue(r.toCsvString().contains("# warning: " + r.warnings().get(0)), r::toCsvString);
    }

    @Test
    void oneAndTwoThreadsAgreeBitForBit() {
        TradeoffResult two = family().threads(2).build().run();
        assertEquals(result.toCsvString(), two.toCsvString());
    }

    @Test
    void csvHasUnitsInHeadersAndMarksBandAndFront() {
        List<String> h = result.headers();
        assertEquals(List.of("cap_nm", "al_fraction", "sheet_density_cm^-2", "threshold_voltage_V",
                "model_threshold_voltage_V", "mobility_cm^2/Vs", "sheet_resistance_Ohm/sq", "gate_leakage_A/cm^2",
                "in_vth_band", "on_front", "warnings", "status"), h);
        String csv = result.toCsvString();
        assertEquals(result.size() + 1, csv.lines().filter(l -> !l.startsWith("# ")).count());
        // the provenance heads the CSV: the factory is code, the settings are exact
        org.wurtzkit.provenance.ResultProvenance p = result.provenance().orElseThrow();
        assertTrue(csv.startsWith("# " + String.join("\r\n# ", p.headerLines()) + "\r\n"), csv);
        assertEquals("design trade-off", p.run().get("computation"));
        assertEquals(Double.toString(REVERSE_V), p.run().get("reverseBiasV"));
        assertEquals("cap|nm|" + SweepProvenance.values(result.axes().get(0).values()), p.run().get("axis0"));
        assertEquals(Hemts.COARSE, org.wurtzkit.solvers.sp.SolverOptions.fromSettings(p.solverOptions()));
        assertTrue(result.toString().contains("on the front of R_sh against |J| at V_R = 4 V"), result::toString);
    }

    @Test
    void aSweepThatNeverReachesTheReverseBiasFailsEachPointWithItsKind() {
        ThresholdExtraction shortSweep = new ThresholdExtraction(BiasGrid.linear(0, -2, 5),
                ThresholdDefinition.constantDensity(1e11));
        TradeoffResult r = DesignTradeoff.builder(p -> StandardStacks.gatedHemt(Hemts.DEFAULT_SET, p[0], BARRIER_NM, 0, 1.0))
                .axis(Axis.of("al_fraction", "", 0.25, 0.30))
                .reverseBiasV(REVERSE_V)
                .sweep(shortSweep)
                .solver(Hemts.SOLVER)
                .build()
                .run();
        assertEquals(2, r.failures().size());
        for (PointFailure f : r.failures()) {
            assertEquals(ErrorKind.INVALID_PARAMETER, f.kind());
            assertTrue(f.message().contains("never reaches -4.0 V"), f::toString);
            assertTrue(f.where().startsWith("al_fraction = "), f::toString);
        }
        assertFalse(r.point(0).inBand());
        assertTrue(r.front().isEmpty());
        assertTrue(r.row(0).get(r.row(0).size() - 1).startsWith("failed: InvalidParameterException"));
    }

    @Test
    void progressOncePerStackAndInterruptionStopsTheRun() {
        List<Integer> done = new java.util.ArrayList<>();
        TradeoffResult r = family().axis(Axis.of("spare", "", 1)).threads(2)
                .progress((d, total) -> {
                    assertEquals(4, total);
                    done.add(d);
                })
                .build().run();
        assertEquals(List.of(1, 2, 3, 4), done);
        assertEquals(4, r.size());
        // a caller interrupted while waiting for the workers gets a CancellationException, flag kept
        DesignTradeoff t = family().threads(2).build();
        Thread.currentThread().interrupt();
        try {
            assertThrows(java.util.concurrent.CancellationException.class, t::run);
            assertTrue(Thread.currentThread().isInterrupted());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void pointsCompareByValue() {
        TradeoffPoint p = result.point(1);
        assertEquals(p, result.point(1));
        assertEquals(p.hashCode(), result.point(1).hashCode());
        assertFalse(p.equals(result.point(2)));
    }

    @Test
    void badSetupIsRejectedWithTheParameter() {
        assertEquals("reverse gate bias (V)", assertThrows(InvalidParameterException.class,
                () -> family().reverseBiasV(-1)).parameter());
        assertEquals("reverse gate bias (V)", assertThrows(InvalidParameterException.class,
                () -> DesignTradeoff.builder(p -> null).axis(Axis.of("cap", "nm", 1)).build()).parameter());
        assertEquals("number of trade-off axes", assertThrows(InvalidParameterException.class,
                () -> DesignTradeoff.builder(p -> null).reverseBiasV(1).build()).parameter());
        assertEquals("threshold-voltage tolerance (V)", assertThrows(InvalidParameterException.class,
                () -> family().thresholdBand(-3, 0)).parameter());
        assertEquals("first bias of the trade-off sweep (V)", assertThrows(InvalidParameterException.class,
                () -> family().sweep(new ThresholdExtraction(BiasGrid.linear(1, -5, 7),
                        ThresholdDefinition.constantDensity(1e11))).build()).parameter());
    }
}
