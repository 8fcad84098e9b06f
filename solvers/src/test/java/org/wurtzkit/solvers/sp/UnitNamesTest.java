package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.TemperatureSweepResult;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InterfaceCharge;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * Every non-SI number says its unit in the method's name, and every per-cm^2 or per-cm^3
 * accessor has an SI twin (common practice, no source: the project's unit convention).
 * 1 cm^-2 = 1e4 m^-2 and 1 cm^-3 = 1e6 m^-3 exactly.
 */
class UnitNamesTest {

    @Test
    void everyPerCmAccessorHasAnSiTwin() {
        List<String> missing = new ArrayList<>();
        for (Class<?> c : List.of(Solution.class, Subband.class, BiasSweepResult.class, TemperatureSweepResult.class,
                ChargeBalanceModel.class, InterfaceCharge.class, DeltaDoping.class, Dopant.class)) {
            for (Method m : c.getMethods()) {
                String name = m.getName();
                if (Modifier.isStatic(m.getModifiers()) || m.getParameterCount() != 0
                        || !(name.endsWith("PerCm2") || name.endsWith("PerCm3"))) {
                    continue;
                }
                String stem = name.substring(0, name.length() - "PerCm2".length());
                String si = stem + (name.endsWith("2") ? "PerM2" : "PerM3");
                if (!hasNoArg(c, stem) && !hasNoArg(c, si)) {
                    missing.add(c.getSimpleName() + "." + name + " (no " + stem + "() nor " + si + "())");
                }
            }
        }
        assertEquals(List.of(), missing);
    }

    private static boolean hasNoArg(Class<?> c, String name) {
        try {
            c.getMethod(name);
            return true;
        } catch (NoSuchMethodException e) {
            return false;
        }
    }

    @Test
    void sheetDensityTwinsAgreeOnASolution() {
        Structure s = StandardStacks.hemt(ParameterSets.defaultSet(), 500, 0.25, 25, 0,
                TopBoundary.freeSurfacePerCm2(1.65, 0));
        Solution sol = new SelfConsistentSolver(SolverOptions.defaults()
                .withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM))).solve(s);
        assertTrue(sol.holeSheetDensity() > 1e15, "a bare free surface holds holes");
        assertEquals(sol.holeSheetDensity() * 1e-4, sol.holeSheetDensityPerCm2(), 1e-12 * sol.holeSheetDensityPerCm2());
        assertEquals(sol.sheetDensity() * 1e-4, sol.sheetDensityPerCm2(), 1e-12 * sol.sheetDensityPerCm2());
        assertEquals(sol.electronSheetDensity() * 1e-4, sol.electronSheetDensityPerCm2(),
                1e-12 * sol.electronSheetDensityPerCm2());
    }

    @Test
    void factoriesNameTheirUnits() {
        DeltaDoping sheet = DeltaDoping.donorsPerCm2(5e12, 0.015).atOffsetNm(3);
        assertEquals(5e16, sheet.sheetDensityPerM2(), 1);
        assertEquals(3e-9, sheet.offsetFromLayerTop(), 1e-24);
        assertEquals(sheet, DeltaDoping.donorsPerCm2(5e12, 0.015).atOffset(3 * NM));
        assertEquals(5e12, sheet.sheetDensityPerCm2(), 1e-3);
        assertEquals(Dopant.Kind.ACCEPTOR, DeltaDoping.acceptorsPerCm2(1e12, 0.2).kind());
        assertEquals(Dopant.donorsPerCm3(1e18, 0.03), Dopant.donorsPerM3(1e24, 0.03));
        assertEquals(Dopant.acceptorsPerCm3(1e18, 0.17), Dopant.acceptorsPerM3(1e24, 0.17));
        TopBoundary.Schottky g = TopBoundary.schottky(1.2).atBiasV(-2);
        assertEquals(1.2, g.barrierHeightEv());
        assertEquals(-2, g.biasV());
        assertEquals(TopBoundary.freeSurfacePerCm2(1.65, 1.6e13).donorDensityPerM2(), 1.6e17, 1);
        assertEquals(TopBoundary.freeSurfacePerM2(1.65, 1.6e17), TopBoundary.freeSurfacePerCm2(1.65, 1.6e13));
        Structure s = StandardStacks.hemt(ParameterSets.defaultSet(), 500, 0.25, 25, 0, g);
        assertEquals(450, s.withTemperatureK(450).temperatureK());
        assertEquals(77, s.toBuilder().temperatureK(77).build().temperatureK());
    }
}
