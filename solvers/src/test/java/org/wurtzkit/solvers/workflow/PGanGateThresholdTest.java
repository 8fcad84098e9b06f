package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InterfaceCharge;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.testing.StandardStacks;
import org.wurtzkit.units.Constants;

/**
 * Threshold voltage of a p-GaN gate HEMT (gate / p-GaN:Mg / AlGaN / GaN) from the full solver, with
 * the holes and the Mg of the p-GaN at the gate's quasi-Fermi level (the default) and the existing
 * threshold workflow (constant channel density 1e11 cm^-2).
 */
class PGanGateThresholdTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final ThresholdExtraction VTH = new ThresholdExtraction(BiasGrid.linear(-1, 4, 26),
            ThresholdDefinition.constantDensity(1e11));
    private static final BiasSweep SWEEP = new BiasSweep();
    /** Gate metal on p-GaN: 3.3 eV to the conduction band, i.e. nearly ohmic for holes (common practice, no source). */
    private static final double PHI_B = 3.3;

    static Structure pGanGate(double mgPerCm3, double pGanNm, double x, double barrierNm) {
        return StandardStacks.pGanGate(SET, x, barrierNm, pGanNm, Dopant.magnesiumInGaNPerCm3(mgPerCm3), PHI_B, 0);
    }

    static double vth(double mg, double pNm, double x, double dNm) {
        return VTH.thresholdVoltage(pGanGate(mg, pNm, x, dNm), SWEEP);
    }

    /**
     * Normally-off: the usual design (Mg 3e19 cm^-3, 70 nm p-GaN on Al0.2Ga0.8N 12 nm) gives a
     * positive V_th in the +0.5 to +2 V range of published p-GaN gate devices (e.g. about +1 V for the
     * gate injection transistor of Y. Uemoto et al., IEEE Trans. Electron Devices 54, 3393 (2007);
     * from memory, the design details differ).
     */
    @Test
    void theUsualDesignIsNormallyOff() {
        double v = vth(3e19, 70, 0.2, 12);
        assertTrue(v > 0.5 && v < 2.0, "V_th = " + v + " V");
    }

    /**
     * Trends: V_th rises with the Mg density (a higher acceptor level pins the p-GaN side closer to
     * E_v) and does not depend on the p-GaN thickness once the layer is thicker than its depletion
     * (common practice, no source); it falls with the barrier thickness d at the rate of the
     * polarization dipole across the barrier, dV_th/dd = -sigma/eps_barrier (the electrostatics of
     * O. Ambacher et al., J. Appl. Phys. 87, 334 (2000), for a barrier between two opposite sheets;
     * 10 % allowed for the 2DEG's centroid and the p-side depletion charge, which move with d).
     */
    @Test
    void thresholdTrendsWithMagnesiumThicknessAndBarrier() {
        double low = vth(1e18, 70, 0.2, 15);
        double mid = vth(1e19, 70, 0.2, 15);
        double high = vth(3e19, 70, 0.2, 15);
        assertTrue(low < mid && mid < high, "V_th rises with Mg: " + low + ", " + mid + ", " + high);
        assertEquals(high, vth(3e19, 100, 0.2, 15), 0.01, "p-GaN 100 nm vs 70 nm");
        double thin = vth(3e19, 70, 0.2, 12);
        double slope = (high - thin) / (3 * NM);
        Structure s = pGanGate(3e19, 70, 0.2, 15);
        double sigma = 0;
        for (InterfaceCharge c : s.interfaceCharges()) {
            sigma = Math.max(sigma, c.sigma()); // the barrier/buffer sheet, sigma > 0
        }
        double eps = SET.material(Composition.alGaN(0.2)).permittivityStatic() * Constants.VACUUM_PERMITTIVITY;
        assertEquals(-sigma / eps, slope, 0.1 * sigma / eps, "dV_th/dd (V/m)");
    }
}
