package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * An abrupt GaN p-n homojunction in equilibrium against the textbook formulas of S. M. Sze and
 * K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 2 (abrupt junction; formulas
 * from memory): built-in potential qV_bi = E_g - kT ln(N_c/n_n) - kT ln(N_v/p_p) (Boltzmann
 * statistics in the neutral regions) and the depletion widths with the majority-carrier tail
 * correction, W = [2 eps (V_bi - 2kT/q)/q (N_A + N_D)/(N_A N_D)]^(1/2), x_n = W N_A/(N_A + N_D),
 * x_p = W N_D/(N_A + N_D), the widths read from the solution as depletion charge / (q N).
 */
class PnJunctionTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final double ND = 2e17;
    private static final double NA = 1e17;
    /** Shallow levels (1 meV) so that the dopants are fully ionized, as the textbook case assumes. */
    private static final double SHALLOW = 0.001;

    @Test
    void builtInPotentialAndDepletionWidthsFollowTheTextbookFormulas() {
        double t = 300;
        double kT = Constants.thermalVoltage(t);
        // flat-band contacts on both sides: the top (p) and bottom (n) contacts sit at the bulk levels
        // of a first solve with generous layers; the bulk levels are read from the solution itself
        Structure s = Structure.builder(SET)
                .grow(Layer.of("n-GaN", Composition.GAN, 800 * NM).withDopant(new Dopant(Dopant.Kind.DONOR, ND * 1e6, SHALLOW,
                        Dopant.DONOR_DEGENERACY)))
                .grow(Layer.of("p-GaN", Composition.GAN, 800 * NM).withDopant(new Dopant(Dopant.Kind.ACCEPTOR, NA * 1e6, SHALLOW,
                        Dopant.ACCEPTOR_DEGENERACY)))
                .top(TopBoundary.schottky(3.3, 0)).bottom(BottomBoundary.fixedFermiLevel(0.05)).build();
        Solution sol = new SelfConsistentSolver(SolverOptions.defaults().withQuantumWindows(QuantumWindows.none())).solve(s);
        double[] x = sol.depth();
        double[] ec = sol.conductionBand();
        double[] ev = sol.valenceBand();
        double[] n = sol.electronDensity();
        double[] p = sol.holeDensity();
        double[] rho = sol.chargeDensity();
        int iP = HoleQuasiFermiTest.nodeAt(sol, 400 * NM); // neutral p side
        int iN = HoleQuasiFermiTest.nodeAt(sol, 1200 * NM); // neutral n side
        double junction = 800 * NM;
        double eg = ec[iN] - ev[iN];
        double nc = n[iN] / Math.exp(-ec[iN] / kT); // Boltzmann in the neutral n side
        double nv = p[iP] / Math.exp(ev[iP] / kT);
        double vbiTextbook = eg - kT * Math.log(nc / n[iN]) - kT * Math.log(nv / p[iP]);
        double vbiSolved = ec[iP] - ec[iN];
        assertEquals(vbiTextbook, vbiSolved, 0.02 * vbiTextbook, "V_bi (V)");
        // depletion charge on each side, from the node charge densities (box integration)
        double qn = 0;
        double qp = 0;
        for (int i = 0; i < x.length; i++) {
            double w = (i > 0 ? 0.5 * (x[i] - x[i - 1]) : 0) + (i < x.length - 1 ? 0.5 * (x[i + 1] - x[i]) : 0);
            if (x[i] > 200 * NM && x[i] < 1400 * NM) {
                if (x[i] > junction) {
                    qn += rho[i] * w;
                } else if (x[i] < junction) {
                    qp -= rho[i] * w;
                }
            }
        }
        double q = Constants.ELEMENTARY_CHARGE;
        double xn = qn / (q * ND * 1e6);
        double xp = qp / (q * NA * 1e6);
        double eps = SET.material(Composition.GAN).permittivityStatic() * Constants.VACUUM_PERMITTIVITY;
        double na = NA * 1e6;
        double nd = ND * 1e6;
        double w = Math.sqrt(2 * eps * (vbiSolved - 2 * kT) / q * (na + nd) / (na * nd));
        assertEquals(w * na / (na + nd), xn, 0.02 * w * na / (na + nd), "x_n (m)");
        assertEquals(w * nd / (na + nd), xp, 0.02 * w * nd / (na + nd), "x_p (m)");
    }
}
