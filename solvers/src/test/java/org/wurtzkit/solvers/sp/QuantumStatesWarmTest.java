// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The warm update of the subbands (previous energies as Weyl brackets, Horn and Johnson, Matrix
 * Analysis, 2nd ed., Cambridge 2013, Cor. 4.3.15 [from memory]) against a cold update of the same
 * potential: same subband count, energies to 1e-12 eV, wavefunctions to 1e-8 of their largest
 * entry (a consequence of the eigenpair accuracy, common practice, no source).
 */
class QuantumStatesWarmTest {

    private static Device device() {
        return new Device(Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.3), 20 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(0)).build(), SolverOptions.defaults());
    }

    private static double[] wellPotential(Device d, double depth) {
        double[] phi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            phi[i] = d.ec[Math.min(i, d.n - 2)] - 0.05 + depth * Math.exp(-Math.abs(d.x[i] - 20 * NM) / (8 * NM));
        }
        return phi;
    }

    @Test
    void warmUpdateAfterAPotentialChangeEqualsTheColdUpdate() {
        Device d = device();
        QuantumStates warm = new QuantumStates(d);
        warm.update(d, wellPotential(d, 0.40), true); // first update: nothing to start from, cold
        double[] next = wellPotential(d, 0.43);
        warm.update(d, next, true);
        QuantumStates cold = new QuantumStates(d);
        cold.update(d, next);
        int bound = 0;
        for (int w = 0; w < d.windowStart.length; w++) {
            assertEquals(cold.count[w], warm.count[w], "subbands in window " + w);
            for (int k = 0; k < cold.count[w]; k++) {
                assertEquals(cold.energy[w][k], warm.energy[w][k], 1e-12, "energy " + k);
                double max = 0;
                double diff = 0;
                for (int j = 0; j < cold.psi[w][k].length; j++) {
                    max = Math.max(max, Math.abs(cold.psi[w][k][j]));
                    diff = Math.max(diff, Math.abs(cold.psi[w][k][j] - warm.psi[w][k][j]));
                }
                assertTrue(diff <= 1e-8 * max, "wavefunction " + k + " differs by " + diff / max);
                bound++;
            }
        }
        assertTrue(bound >= 2, "the test well should hold several subbands, found " + bound);
    }
}
