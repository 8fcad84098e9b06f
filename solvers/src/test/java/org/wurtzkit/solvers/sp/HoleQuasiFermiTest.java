package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * Holes and acceptors at their own quasi-Fermi level ({@link QuasiFermiLevels}): the p-GaN gate
 * reproducer of issue 12 (defect 1) and a buried p-type layer (defect 3).
 */
class HoleQuasiFermiTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver();
    private static final double MG_PER_CM3 = 3e19;
    private static final double MG_IONIZATION_EV = 0.17;

    /** GaN 1 um / Al0.2Ga0.8N 15 nm / p-GaN 70 nm (Mg 3e19 cm^-3, 0.17 eV) under a 3.3 eV Schottky gate. */
    static Structure pGanGate(double biasV) {
        return StandardStacks.pGanGate(SET, 0.2, 15, 70, Dopant.acceptorsPerCm3(MG_PER_CM3, MG_IONIZATION_EV), 3.3, biasV);
    }

    /** Index of the node nearest a depth. */
    static int nodeAt(Solution s, double depth) {
        double[] x = s.depth();
        int best = 0;
        for (int i = 1; i < x.length; i++) {
            if (Math.abs(x[i] - depth) < Math.abs(x[best] - depth)) {
                best = i;
            }
        }
        return best;
    }

    /**
     * Neutral p-GaN: N_A^- = p at every gate bias (charge neutrality with the Mg level occupied at the
     * hole quasi-Fermi level; S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley
     * 2007, ch. 1, the neutrality condition with incomplete ionization). The value itself: with
     * Boltzmann statistics the neutrality condition p = N_A / (1 + g p e^{E_A/kT} / N_v) is the
     * quadratic p^2 + c p - c N_A = 0, c = (N_v/g) e^{-E_A/kT}, whose root the solver must meet to
     * within the Boltzmann error (p / N_v / 2^{3/2}, about 1 % here) plus 1 %.
     */
    @ParameterizedTest(name = "V_g = {0} V")
    @ValueSource(doubles = {-3, 0, 1, 3})
    void neutralPGanKeepsIonizedAcceptorsEqualToHolesAtEveryGateBias(double biasV) {
        Solution s = SOLVER.solve(pGanGate(biasV));
        int i = nodeAt(s, 35 * NM); // the middle of the p-GaN, 30 nm from either depletion edge
        double p = s.holeDensity()[i];
        double na = s.ionizedAcceptors()[i];
        // the depletion tails at either edge decay as exp(-d/L_D), L_D = (eps kT/q^2 p)^(1/2) = 6.5 nm
        // here: 35 nm from each edge they leave e^-5.4 = 0.5 % of charge imbalance; 1 % allowed
        assertEquals(p, na, 1e-2 * p, "N_A- = p in neutral p-GaN at " + biasV + " V");
        // the hole level of the p-GaN is the gate's (a p-layer touching the gate follows the gate)
        assertEquals(-biasV, s.holeFermiLevel()[i], 1e-15);
        double pBoltzmann = neutralHoles(MG_PER_CM3, MG_IONIZATION_EV);
        assertEquals(pBoltzmann, p, 0.025 * pBoltzmann, "neutral hole density at " + biasV + " V");
        assertTrue(p > 1e23 && p < 3e24, "a few 1e17 cm^-3, not 3e19: " + p * 1e-6 + " cm^-3");
    }

    /**
     * Neutral hole density in GaN at 300 K with Boltzmann statistics: the root of p^2 + c p - c N_A = 0,
     * c = (N_v/g) e^{-E_A/kT} (Sze and Ng, ch. 1, as above), in m^-3.
     */
    static double neutralHoles(double acceptorsPerCm3, double ionizationEv) {
        double kT = org.wurtzkit.units.Constants.thermalVoltage(300);
        // N_v of the three valence bands (ValenceBands, checked against its formulas in materials-data)
        double nv = ValenceBands.of(SET.material(Composition.GAN)).effectiveDensityOfStates(300);
        double c = nv / Dopant.ACCEPTOR_DEGENERACY * Math.exp(-ionizationEv / kT);
        double nA = acceptorsPerCm3 * 1e6;
        return 0.5 * (-c + Math.sqrt(c * c + 4 * c * nA));
    }

    /**
     * A buried p-type layer under the channel follows the channel's contact: its neutral hole density
     * does not move with the gate between -6 and +1 V (before issue 12 it went 5e16 -> 1e-83 ->
     * 1e18 cm^-3 following the gate). Common practice, no source: a layer with no path to the gate
     * keeps the Fermi level of the contacts it is tied to.
     */
    @Test
    void buriedPLayerHoleDensityDoesNotFollowTheGate() {
        double[] p = new double[3];
        double[] biases = {0, -6, 1};
        for (int b = 0; b < 3; b++) {
            Structure s = Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                    .grow(Layer.of("back barrier", Composition.GAN, 200 * NM).withDopant(Dopant.acceptorsPerCm3(1e18, 0.17)))
                    .grow(Layer.of("channel", Composition.GAN, 300 * NM))
                    .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM))
                    .top(TopBoundary.schottky(1.0, biases[b])).build();
            Solution sol = SOLVER.solve(s);
            int i = nodeAt(sol, 25 * NM + 300 * NM + 100 * NM);
            p[b] = sol.holeDensity()[i];
            assertEquals(0.0, sol.holeFermiLevel()[i], 0.0, "the buried p-layer's holes follow the channel");
            // 100 nm from the layer's edges, L_D = 16 nm: the depletion tails leave e^-6 = 0.25 %; 1 % allowed
            assertEquals(p[b], sol.ionizedAcceptors()[i], 1e-2 * p[b], "neutral at " + biases[b] + " V");
        }
        // the gate may move the upper depletion edge by a few nm, whose tail reaches the middle
        // attenuated by e^-6; following the gate would change p by orders of magnitude
        assertEquals(p[0], p[1], 1e-3 * p[0], "0 V vs -6 V");
        assertEquals(p[0], p[2], 1e-3 * p[0], "0 V vs +1 V");
        double pBoltzmann = neutralHoles(1e18, 0.17);
        assertEquals(pBoltzmann, p[0], 0.025 * pBoltzmann, "neutral hole density " + p[0] * 1e-6 + " cm^-3");
    }

    /**
     * Compensated p-GaN as grown (Mg with the screened level of {@link Dopant#magnesiumInGaNPerCm3},
     * 1e18 cm^-3 shallow donors): the neutral hole density is the root of
     * p (p + N_D) = c (N_A - N_D - p), c = (N_v/g) e^{-E_A/kT} (S. M. Sze and K. K. Ng, Physics of
     * Semiconductor Devices, 3rd ed., 2007, ch. 1, compensation; from memory), donors fully ionized.
     */
    @Test
    void compensatedPGanHoldsTheTextbookHoleDensity() {
        Dopant mg = Dopant.magnesiumInGaNPerCm3(1e19);
        double nd = 1e18 * 1e6;
        Structure s = Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.2), 15 * NM))
                .grow(Layer.of("p-GaN", Composition.GAN, 100 * NM).withDopant(mg).withDopant(Dopant.donorsPerCm3(1e18, 0.015)))
                .top(TopBoundary.schottky(3.3, 0)).build();
        Solution sol = SOLVER.solve(s);
        int i = nodeAt(sol, 50 * NM);
        double kT = org.wurtzkit.units.Constants.thermalVoltage(300);
        double nv = ValenceBands.of(SET.material(Composition.GAN)).effectiveDensityOfStates(300);
        double c = nv / Dopant.ACCEPTOR_DEGENERACY * Math.exp(-mg.ionizationEnergyEv() / kT);
        double b = nd + c;
        double expected = 0.5 * (-b + Math.sqrt(b * b + 4 * c * (mg.densityPerM3() - nd)));
        double p = sol.holeDensity()[i];
        // Boltzmann vs Fermi-Dirac (p / N_v / 2^(3/2) < 1 %) and the depletion tails (50 nm from the
        // edges, L_D about 5 nm): 2.5 % allowed
        assertEquals(expected, p, 0.025 * expected, "compensated neutral hole density");
        assertEquals(p + sol.ionizedDonors()[i], sol.ionizedAcceptors()[i], 1e-2 * p, "neutrality with compensation");
    }
}
