package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.testing.StandardStacks;

/**
 * The subband density against its definition, n_i = sum_k g_k ln(1 + e^eta) |psi_k,i|^2 (the
 * order-0 Fermi-Dirac integral in closed form, T. Ando, A. B. Fowler and F. Stern, Rev. Mod. Phys.
 * 54, 437 (1982)), evaluated here term by term with the JDK's log1p and exp, and the sheet densities
 * against the box integral of the node densities (exact arithmetic identities, no source needed).
 */
class SubbandDensityTest {
    private static final SolverOptions OPTIONS = SolverOptions.defaults();

    private static Device device() {
        return new Device(StandardStacks.gatedHemt(ParameterSets.defaultSet(), 0.3, 20, 0, 1.0), OPTIONS);
    }

    /** A potential with a triangular well at the interface, so that several subbands are bound. */
    private static double[] wellPotential(Device d, double depth) {
        double[] phi = new double[d.n];
        double itf = 20 * NM;
        for (int i = 0; i < d.n; i++) {
            phi[i] = d.ec[Math.min(i, d.n - 2)] - 0.05 + depth * Math.exp(-Math.abs(d.x[i] - itf) / (8 * NM));
        }
        return phi;
    }

    @Test
    void nodeDensityAndDerivativeFollowTheDefinition() {
        Device d = device();
        QuantumStates qs = new QuantumStates(d);
        double[] ref = wellPotential(d, 0.4);
        qs.update(d, ref);
        assertTrue(qs.count[0] >= 2, "bound subbands " + qs.count[0]);
        PointDensities out = new PointDensities();
        int checked = 0;
        for (double dphi : new double[] {-0.2, -0.03, 0, 0.03, 0.2}) {
            for (int i = d.windowStart[0] + 1; i < d.windowEnd[0]; i++) {
                SubbandDensity.atNode(d, qs, i, ref[i] + dphi, ref[i], out);
                double n = 0;
                double dn = 0;
                for (int k = 0; k < qs.count[0]; k++) {
                    double psi = qs.psi[0][k][i - d.windowStart[0]];
                    double eta = (-qs.energy[0][k] + dphi) / d.vt;
                    n += qs.dos[0][k] * psi * psi * Math.log1p(Math.exp(eta));
                    dn += qs.dos[0][k] * psi * psi / (d.vt * (1 + Math.exp(-eta)));
                }
                assertEquals(n, out.n, 1e-13 * n + 1e-300, "n at node " + i + ", shift " + dphi);
                assertEquals(dn, out.dn, 1e-13 * dn + 1e-300, "dn/dphi at node " + i + ", shift " + dphi);
                checked++;
            }
        }
        assertTrue(checked > 100);
        // outside every window interior there are no subband electrons
        SubbandDensity.atNode(d, qs, d.windowStart[0], ref[0], ref[0], out);
        assertEquals(0.0, out.n);
        assertEquals(0.0, out.dn);
    }

    /** Far below E_F, ln(1 + e^eta) = eta to round-off, and nothing overflows (eta ~ 1000). */
    @Test
    void degenerateLimitDoesNotOverflow() {
        Device d = device();
        QuantumStates qs = new QuantumStates(d);
        double[] ref = wellPotential(d, 0.4);
        qs.update(d, ref);
        int i = d.windowStart[0] + (d.windowEnd[0] - d.windowStart[0]) / 3;
        double shift = 1000 * d.vt;
        PointDensities out = new PointDensities();
        SubbandDensity.atNode(d, qs, i, ref[i] + shift, ref[i], out);
        double n = 0;
        double dn = 0;
        for (int k = 0; k < qs.count[0]; k++) {
            double psi = qs.psi[0][k][i - d.windowStart[0]];
            n += qs.dos[0][k] * psi * psi * ((-qs.energy[0][k] + shift) / d.vt);
            dn += qs.dos[0][k] * psi * psi / d.vt;
        }
        assertTrue(Double.isFinite(out.n) && out.n > 0);
        assertEquals(n, out.n, 1e-12 * n);
        assertEquals(dn, out.dn, 1e-12 * dn);
    }

    /** Per-subband sheets add up to the box integral of the node densities over the window. */
    @Test
    void sheetsAddUpToTheIntegralOfTheNodeDensity() {
        Device d = device();
        QuantumStates qs = new QuantumStates(d);
        double[] ref = wellPotential(d, 0.4);
        qs.update(d, ref);
        double[] phi = ref.clone();
        for (int i = 0; i < d.n; i++) {
            phi[i] += 0.01 * Math.cos(0.1 * i);
        }
        double sheets = 0;
        for (int k = 0; k < qs.count[0]; k++) {
            sheets += SubbandDensity.sheet(d, qs, 0, k, phi, ref);
        }
        double integral = 0;
        PointDensities out = new PointDensities();
        for (int i = d.windowStart[0] + 1; i < d.windowEnd[0]; i++) {
            SubbandDensity.atNode(d, qs, i, phi[i], ref[i], out);
            integral += out.n * d.box(i);
        }
        assertTrue(sheets > 1e15, "sheet " + sheets + " m^-2");
        assertEquals(integral, sheets, 1e-13 * integral);
    }
}
