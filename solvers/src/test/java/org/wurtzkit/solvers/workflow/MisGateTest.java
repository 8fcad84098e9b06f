package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.GateStacks;
import org.wurtzkit.testing.StandardStacks;
import org.wurtzkit.units.Constants;
import org.wurtzkit.units.Units;

/** The gate-stack workflows: quasi-static and high-frequency C-V with interface states, recess and threshold targets. */
class MisGateTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver();
    private static final SelfConsistentSolver CLASSICAL = new SelfConsistentSolver(
            SolverOptions.defaults().withQuantumWindows(new QuantumWindows.None()));
    private static final ThresholdExtraction EXTRACTION = new ThresholdExtraction(BiasGrid.linear(4, -4, 81),
            new ThresholdDefinition.ConstantDensity(1e11));
    /** Gate Fermi level below the Al2O3 conduction band (eV), invented. */
    private static final double PHI_B = 3.5;

    /**
     * An Al2O3 MIS-HEMT whose fixed interface charge, +1e13 cm^-2, is of the order of the AlGaN
     * surface polarization charge, as reported for Al2O3/AlGaN (M. Matys, R. Stoklas, M. Blaho and
     * B. Adamowicz, Appl. Phys. Lett. 110, 2017, doi 10.1063/1.4986482 [verified: abstract]). Without it, holes in equilibrium
     * with the gate gather under the negative polarization sheet (see SolverOptions.holeFermiLevel).
     */
    static Structure misHemt(double qf, double toxNm) {
        return StandardStacks.misHemt(SET, 0.25, 18, InterfaceSheet.fixedPerCm2(qf), Insulators.AL2O3, toxNm, PHI_B, 0);
    }

    /**
     * Quasi-static and high-frequency C-V of a MOS capacitor on n-GaN with a uniform D_it, against
     * the textbook (S. M. Sze &amp; K. K. Ng, Physics of Semiconductor Devices, ch. 4, from memory):
     * 1/C = 1/C_ox + 1/(C_s + C_it) when the states follow the signal, 1/C = 1/C_ox + 1/C_s when
     * they do not, with C_it = e^2 D_it and C_s the depletion capacitance at the solved band bending
     * psi_s, C_s = sqrt(2 eps kT N_D) (e/kT) |e^u - 1| / (2 sqrt(e^u - u - 1)), u = psi_s / (kT/e).
     */
    @Test
    void quasiStaticAndHighFrequencyCurvesAgainstTextbook() {
        Insulator ox = Insulators.SIO2;
        double tox = 10 * NM;
        double dit = 3e12; // cm^-2 eV^-1, invented
        InterfaceSheet sheet = InterfaceSheet.of(InterfaceStates.uniformPerCm2PerEv(dit, 1.7));
        Structure mos = GateStacks.mos(SET, ox, tox, 4.0, 0, sheet);
        MisGate gate = new MisGate(CLASSICAL, EXTRACTION);
        BiasGrid grid = BiasGrid.of(-4, -2.5, -1.5);
        MisGate.CvCurve qs = gate.capacitance(mos, grid, MisGate.StateResponse.QUASI_STATIC, MisGate.DEFAULT_STEP_V);
        MisGate.CvCurve hf = gate.capacitance(mos, grid, MisGate.StateResponse.HIGH_FREQUENCY, MisGate.DEFAULT_STEP_V);
        double eps = GateStacks.unpolarizedGaN(SET).permittivityStaticAlongC() * Constants.VACUUM_PERMITTIVITY;
        double cox = ox.relativePermittivity() * Constants.VACUUM_PERMITTIVITY / tox;
        double cit = Constants.ELEMENTARY_CHARGE * Units.perCm2ToPerM2(dit);
        double kt = Constants.BOLTZMANN * 300 / Constants.ELEMENTARY_CHARGE;
        for (int i = 0; i < grid.size(); i++) {
            Solution op = CLASSICAL.solve(mos.withTop(TopBoundary.schottky(4.0, grid.get(i))));
            double[] ec = op.conductionBand();
            int surface = nodeAt(op, tox);
            double u = (ec[ec.length - 1] - ec[surface]) / kt;
            double cs = Math.sqrt(2 * eps * kt * Constants.ELEMENTARY_CHARGE * GateStacks.MOS_DONORS) / kt
                    * Math.abs(Math.expm1(u)) / (2 * Math.sqrt(Math.expm1(u) - u));
            double expectQs = 1 / (1 / cox + 1 / (cs + cit));
            double expectHf = 1 / (1 / cox + 1 / cs);
            assertEquals(expectQs, qs.capacitance()[i], 0.02 * expectQs, "quasi-static at " + grid.get(i) + " V");
            assertEquals(expectHf, hf.capacitance()[i], 0.02 * expectHf, "high-frequency at " + grid.get(i) + " V");
            assertTrue(qs.capacitance()[i] > 1.05 * hf.capacitance()[i], "states add capacitance when they follow");
        }
    }

    private static int nodeAt(Solution s, double depth) {
        double[] x = s.depth();
        for (int i = 0; i < x.length; i++) {
            if (Math.abs(x[i] - depth) < 1e-13) {
                return i;
            }
        }
        throw new AssertionError("no node at " + depth);
    }

    /**
     * Which recess depth gives V_th = +1 V (a normally-off gate)? The search's answer, re-checked by
     * an independent threshold (Brent's root of n_s = 1e11 cm^-2 in the gate bias), lies within the
     * search tolerance plus the bias grid's interpolation error (0.02 V).
     */
    @Test
    void recessDepthForNormallyOffThreshold() {
        Structure template = misHemt(1e13, 10);
        StructureFamily recess = StructureFamilies.recessDepthNm(template, "barrier");
        TargetResult r = new TargetSearch(SOLVER, 40).thresholdVoltage(recess, 0, 16, 1.0, 0.01, EXTRACTION);
        Structure found = r.structure();
        double vth = new BrentSolver(1e-10, 1e-7).solve(100,
                v -> Math.log(SOLVER.solve(found.withTop(TopBoundary.schottky(PHI_B, v))).sheetDensityPerCm2() / 1e11),
                -4, 4);
        assertEquals(1.0, vth, 0.03);
        assertTrue(r.value() > 0 && r.value() < 16, "recess " + r.value());
        assertEquals(Units.nmToM(18 - r.value()), found.layersBottomUp().get(1).thickness(), 1e-15);
        assertEquals(1, found.gateStack().size());
        assertEquals(1, found.interfaceSheets().size());
    }

    /**
     * The sweep against insulator thickness: V_th falls with t_ox when the net charge under the
     * insulator is positive (here Q_f exceeds |P_z(GaN)|/e), the gate's n_s is that of the family's
     * stack at its own bias, and the access region is the un-gated stack (common practice, no source; the slope itself is checked against
     * Gauss's law in MisHemtTest).
     */
    @Test
    void sweepGivesThresholdGateAndAccessSheetDensities() {
        Structure template = misHemt(2.5e13, 10);
        Structure access = StandardStacks.hemt(SET, 500, 0.25, 18, 0, TopBoundary.freeSurface(1.65, 1e14));
        MisGate gate = new MisGate(SOLVER, new ThresholdExtraction(BiasGrid.linear(0, -10, 51),
                new ThresholdDefinition.ConstantDensity(1e11)));
        List<MisGate.Point> pts = gate.sweep(StructureFamilies.insulatorThicknessNm(template, "Al2O3"),
                new double[] {5, 10}, access);
        assertTrue(pts.get(1).thresholdV() < pts.get(0).thresholdV(), pts.toString());
        StructureFamily thickness = StructureFamilies.insulatorThicknessNm(template, "Al2O3");
        assertEquals(SOLVER.solve(thickness.at(10)).sheetDensityPerCm2(), pts.get(1).gateSheetPerCm2(), 0);
        assertEquals(Units.nmToM(10), thickness.at(10).gateStack().get(0).thickness(), 1e-18);
        double nsAccess = SOLVER.solve(access).sheetDensityPerCm2();
        assertEquals(nsAccess, pts.get(0).accessSheetPerCm2(), 0);
        assertTrue(nsAccess > 1e12);
    }
}
