// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/** n_s and V_th of every design-map point in one call, the bias range placed by the closed-form model. */
class SheetDensityAndThresholdTest {
    private static final StructureFactory HEMT = p -> Hemts.hemt(Hemts.DEFAULT_SET, p[0], p[1], 1.0);
    private static final ThresholdDefinition LEVEL = ThresholdDefinition.constantDensity(1e11);

    /**
     * Each point equals what a user would compute by hand: n_s bit for bit equal to a cold solve at
     * the structure's bias, V_th bit for bit equal to a threshold extraction over the same grid, the
     * model column equal to the closed-form model. Outside check: the full V_th lies within 10 % of
     * the closed-form V_th of the model of O. Ambacher et al., J. Appl. Phys. 87, 334 (2000), with the
     * same parameters (the criterion of FullSolverVersusAnalyticTest, which finds about 1 % at this
     * level).
     */
    @Test
    void eachPointEqualsTheHandMadeComputation() {
        SheetDensityAndThreshold eval = PointEvaluator.sheetDensityAndThreshold(LEVEL);
        DesignMapResult r = DesignMap.builder(HEMT)
                .axis(Axis.of("al_fraction", "", 0.2, 0.3)).axis(Axis.of("barrier_thickness", "nm", 20))
                .solver(Hemts.SOLVER).evaluator(eval).threads(2).build().run();
        assertTrue(r.failures().isEmpty(), () -> r.failures().toString());
        assertEquals(List.of("sheet_density_cm^-2", "threshold_voltage_V", "model_threshold_voltage_V"),
                r.quantities().stream().map(Column::header).toList());
        for (int i = 0; i < r.size(); i++) {
            Structure s = HEMT.at(r.parameters(i));
            double ns = Hemts.SOLVER.solve(s).sheetDensityPerCm2();
            assertTrue(ns == r.value(i, 0), ns + " vs " + r.value(i, 0));
            BiasGrid grid = eval.biasGrid(s, Hemts.SOLVER);
            double vth = new ThresholdExtraction(grid, LEVEL).thresholdVoltage(s, new BiasSweep(Hemts.SOLVER));
            assertTrue(vth == r.value(i, 1), vth + " vs " + r.value(i, 1));
            double model = ChargeBalanceModel.fromStructure(s).thresholdVoltage();
            assertEquals(model, r.value(i, 2));
            assertEquals(model, vth, 0.10 * Math.abs(model), "V_th at point " + i);
            // the grid: from the structure's bias down in 0.25 V steps to at least 1 V below the model
            assertEquals(0.0, grid.get(0));
            assertEquals(-0.25, grid.get(1));
            assertTrue(grid.get(grid.size() - 1) <= model - 1.0, grid.toString());
            assertTrue(grid.get(grid.size() - 2) > model - Math.max(1.0, 0.25 * Math.abs(model)), grid.toString());
        }
        assertTrue(r.value(1, 1) < r.value(0, 1), "more Al, deeper threshold");
    }

    @Test
    void pointsTheModelCannotHoldFailWithTheReason() {
        Structure free = StandardStacks.hemt(Hemts.DEFAULT_SET, 500, 0.25, 25, 0, TopBoundary.freeSurfacePerCm2(1.65, 1.6e13));
        SheetDensityAndThreshold eval = SheetDensityAndThreshold.of(LEVEL);
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> eval.evaluate(free, Hemts.SOLVER));
        assertEquals("top boundary", e.parameter());

        Structure doped = Structure.builder(Hemts.DEFAULT_SET)
                .grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM)
                        .withDopant(org.wurtzkit.structure.Dopant.donorsPerCm3(1e18, 0.03)))
                .top(TopBoundary.schottky(1.0))
                .build();
        DesignMapResult r = DesignMap.builder(p -> doped).axis(Axis.of("run", "", 1)).solver(Hemts.SOLVER)
                .evaluator(eval).threads(1).build().run();
        assertFalse(r.succeeded(0));
        assertTrue(r.failure(0).orElseThrow().message().contains("barrier"), r.failure(0).orElseThrow().toString());
    }

    @Test
    void settingsAreCheckedAndPrinted() {
        assertThrows(InvalidParameterException.class, () -> new SheetDensityAndThreshold(LEVEL, 0, 1, 0.25));
        assertThrows(InvalidParameterException.class, () -> new SheetDensityAndThreshold(LEVEL, 0.25, -1, 0.25));
        assertThrows(InvalidParameterException.class, () -> new SheetDensityAndThreshold(null, 0.25, 1, 0.25));
        assertEquals("n_s and V_th (threshold at n_s = 1e11 cm^-2), steps of 0.25 V, margin 1 V or 25 %",
                SheetDensityAndThreshold.of(LEVEL).toString());
    }
}
