package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.io.IOException;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Target solving. Each check re-solves the returned structure independently and compares with the
 * target; the reachable ranges are checked against direct solves at the interval ends.
 */
class TargetSearchTest {
    private static final TargetSearch SEARCH = new TargetSearch(Hemts.SOLVER, 60);

    private static double solvedSheetDensity(Structure s) {
        return Hemts.SOLVER.solve(s).sheetDensityPerCm2();
    }

    @Test
    void barrierThicknessForTargetSheetDensity() throws IOException {
        StructureFamily family = StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier");
        TargetResult r = SEARCH.sheetDensity(family, 10, 50, 1.0e13, 1e-3);
        double ns = solvedSheetDensity(r.structure());
        assertEquals(1.0e13, ns, 1e-3 * 1.0e13);
        assertEquals(ns, r.achieved());
        assertEquals(r.value() * NM, r.structure().layersTopDown().get(0).thickness(), 1e-15);
        // the analytic model of the same set: n_s = 1e13 cm^-2 needs a barrier within 10 % of the found one
        ChargeBalanceModel m = ChargeBalanceModel.fromStructure(Hemts.standard());
        double lo = 10;
        double hi = 50;
        for (int i = 0; i < 60; i++) { // bisection on the monotone analytic n_s(d)
            double mid = 0.5 * (lo + hi);
            if (m.withBarrierThickness(mid * NM).sheetDensityPerCm2() < 1e13) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        assertEquals(lo, r.value(), 0.10 * lo);
        System.out.printf("target n_s = 1e13 cm^-2: barrier %.4f nm after %d evaluations (analytic model: %.4f nm)%n",
                r.value(), r.evaluations(), lo);
        StringWriter w = new StringWriter();
        r.writeCsv(w);
        assertTrue(w.toString().startsWith("# produced by wurtzkit "), w::toString);
        assertTrue(w.toString().contains("\r\nevaluation,barrier_thickness_nm,sheet_density_cm^-2,accepted\r\n"));
        assertTrue(w.toString().contains(",yes\r\n"));
    }

    @Test
    void alFractionForTargetSheetDensity() {
        StructureFamily family = StructureFamilies.alFraction(Hemts.standard(), "barrier");
        TargetResult r = SEARCH.sheetDensity(family, 0.15, 0.35, 1.3e13, 5e-4);
        assertEquals(1.3e13, solvedSheetDensity(r.structure()), 5e-4 * 1.3e13);
        assertTrue(r.value() > 0.25 && r.value() < 0.35, "x = " + r.value());
        System.out.printf("target n_s = 1.3e13 cm^-2: x = %.5f after %d evaluations%n", r.value(), r.evaluations());
    }

    /** A GaN cap lowers n_s (Heikman et al., J. Appl. Phys. 93, 10114 (2003), trend; from memory); 0 nm removes it. */
    @Test
    void capThicknessForTargetSheetDensity() {
        Structure template = Hemts.cappedHemt(Hemts.DEFAULT_SET, 0.25, 25, 2, 1.0);
        StructureFamily family = StructureFamilies.layerThicknessNm(template, "cap");
        assertEquals(2, family.at(0).layerStates().size(), "cap of 0 nm is no cap");
        double uncapped = solvedSheetDensity(family.at(0));
        double target = 0.9 * uncapped;
        TargetResult r = SEARCH.sheetDensity(family, 0, 10, target, 1e-3);
        assertEquals(target, solvedSheetDensity(r.structure()), 1e-3 * target);
        assertTrue(r.value() > 0 && r.value() < 10);
        System.out.printf("target n_s = %.4e cm^-2: GaN cap %.4f nm%n", target, r.value());
    }

    /** V_th target by barrier thickness, V_th from a bias sweep at each evaluation. */
    @Test
    void barrierThicknessForTargetThresholdVoltage() {
        // V_th runs from about -4.6 V (15 nm) to -8.1 V (35 nm): sweep to -10 V in 0.25 V steps
        ThresholdExtraction how = new ThresholdExtraction(BiasGrid.linear(0, -10, 41),
                ThresholdDefinition.constantDensity(1e11));
        StructureFamily family = StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier");
        TargetResult r = SEARCH.thresholdVoltage(family, 15, 35, -4.0, 0.02, how);
        double vth = how.thresholdVoltage(r.structure(), new BiasSweep(Hemts.SOLVER));
        assertEquals(-4.0, vth, 0.02);
        System.out.printf("target V_th = -4 V: barrier %.4f nm after %d evaluations%n", r.value(), r.evaluations());
    }

    /** An unreachable target: the documented exception, with the reachable range from the interval ends. */
    @Test
    void unreachableTargetThrows() {
        StructureFamily family = StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier");
        TargetOutOfReachException e = assertThrows(TargetOutOfReachException.class,
                () -> SEARCH.sheetDensity(family, 10, 50, 3e13, 1e-3));
        double at10 = solvedSheetDensity(family.at(10));
        double at50 = solvedSheetDensity(family.at(50));
        assertEquals(at10, e.reachableMin());
        assertEquals(at50, e.reachableMax());
        assertEquals(3e13, e.target());
        assertEquals("barrier_thickness_nm", e.searchedParameter());
        assertTrue(e.getMessage().startsWith("target sheet_density (cm^-2) = 3.0E13 is outside the allowed range ["),
                e.getMessage());
        assertTrue(e.getMessage().contains("barrier_thickness in [10, 50] nm"), e.getMessage());
        assertTrue(e instanceof InvalidParameterException);
    }

    @Test
    void badInputIsRejected() {
        StructureFamily family = StructureFamilies.layerThicknessNm(Hemts.standard(), "barrier");
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, Double.NaN, 50, 1e13, 1e-3));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 10, Double.NaN, 1e13, 1e-3));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 50, 10, 1e13, 1e-3));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 10, 10, 1e13, 1e-3));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 10, 50, -1e13, 1e-3));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 10, 50, 1e13, 0));
        assertThrows(InvalidParameterException.class, () -> SEARCH.sheetDensity(family, 10, 50, 1e13, Double.NaN));
        assertThrows(InvalidParameterException.class, () -> new TargetSearch(Hemts.SOLVER, 1));
        assertThrows(InvalidParameterException.class, () -> StructureFamilies.layerThicknessNm(Hemts.standard(), "cap"));
        assertThrows(InvalidParameterException.class, () -> family.at(-1));
        // an interval end outside the parameter's own range is reported by the structure itself
        StructureFamily x = StructureFamilies.alFraction(Hemts.standard(), "barrier");
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> SEARCH.sheetDensity(x, 0.2, 1.2, 1e13, 1e-3));
        assertTrue(e.getMessage().contains("Al fraction x = 1.2"), e.getMessage());
        Structure twoBarriers = Structure.builder(Hemts.DEFAULT_SET)
                .grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 10 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.2), 10 * NM))
                .top(TopBoundary.schottky(1).atBiasV(0)).build();
        e = assertThrows(InvalidParameterException.class, () -> StructureFamilies.alFraction(twoBarriers, "barrier"));
        assertTrue(e.getMessage().contains("number of layers named \"barrier\" = 2"), e.getMessage());
        Structure graded = Structure.builder(Hemts.DEFAULT_SET)
                .grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.graded("barrier", Composition.alGaN(0.1), Composition.alGaN(0.3), 20 * NM))
                .top(TopBoundary.schottky(1).atBiasV(0)).build();
        assertThrows(InvalidParameterException.class, () -> StructureFamilies.alFraction(graded, "barrier"));
    }
}
