package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/**
 * {@link EffectiveMassHamiltonian#belowInto}, the allocation-free form of {@code below} that the
 * self-consistent loop uses: same states as {@code below}, checked on the infinite square well
 * against the discrete closed form of the three-point Laplacian, E_n = (hbar²/2m)(4/h²)
 * sin²(n pi h / 2L) (R. J. LeVeque, Finite Difference Methods for Ordinary and Partial
 * Differential Equations, SIAM 2007, Sec. 2.10 [from memory]).
 */
class BelowIntoTest {

    private static final double L = 10 * Reference.NM;
    private static final double MASS = 0.2;
    private static final int CELLS = 200;

    private static double discrete(int n) {
        double h = L / CELLS;
        double s = Math.sin(n * Math.PI * h / (2 * L));
        return Reference.HBAR2_OVER_2M0_EV_M2 / MASS * 4 * s * s / (h * h);
    }

    @Test
    void writesTheStatesBelowTheBoundIntoTheCallersArrays() {
        double[] mesh = Reference.uniform(0, L, CELLS);
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(mesh, Reference.filled(CELLS, MASS));
        double[] v = new double[mesh.length];
        // bound between the 4th and 5th level: exactly four states
        double bound = 0.5 * (discrete(4) + discrete(5));
        int kMax = 8;
        double[] energies = new double[kMax];
        energies[4] = -7.0;
        double[][] psi = new double[kMax][];
        double[] reused = new double[mesh.length];
        psi[1] = reused;
        int found = h.belowInto(v, bound, kMax, energies, psi);
        assertEquals(4, found);
        for (int n = 1; n <= 4; n++) {
            assertEquals(discrete(n), energies[n - 1], 1e-11 * discrete(n), "level " + n);
        }
        assertSame(reused, psi[1], "a row of the right length is written in place");
        assertEquals(-7.0, energies[4], "entries past the count are left untouched");
        assertNull(psi[4], "no row is allocated past the count");

        BoundStates b = h.below(v, bound, kMax);
        assertEquals(found, b.size());
        for (int k = 0; k < found; k++) {
            assertEquals(b.energy(k), energies[k], 0.0, "energy " + k);
            assertArrayEquals(b.wavefunction(k), psi[k], 0.0, "wavefunction " + k);
        }

        // a second call on a different potential overwrites the same rows
        double[] tilted = new double[mesh.length];
        for (int i = 0; i < mesh.length; i++) {
            tilted[i] = 0.05 * mesh[i] / L;
        }
        double[] first = psi[0];
        int again = h.belowInto(tilted, bound, kMax, energies, psi);
        BoundStates bt = h.below(tilted, bound, kMax);
        assertEquals(bt.size(), again);
        assertSame(first, psi[0]);
        assertArrayEquals(bt.wavefunction(0), psi[0], 0.0);
        assertEquals(bt.energy(0), energies[0], 0.0);
    }

    @Test
    void outputArraysAreChecked() {
        double[] mesh = {0, 1e-9, 2e-9, 3e-9, 4e-9};
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(mesh, new double[] {0.2, 0.2, 0.2, 0.2});
        double[] v = new double[5];
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, 1.0, 2, new double[1], new double[2][]),
                "energiesOut.length = 1", "[2, ");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, 1.0, 2, null, new double[2][]),
                "energiesOut = null");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, 1.0, 2, new double[2], new double[1][]),
                "wavefunctionsOut.length = 1", "[2, ");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, 1.0, 2, new double[2], null),
                "wavefunctionsOut = null");
        EffectiveMassInputValidationTest.assertMessage(
                () -> h.belowInto(v, 1.0, 2, new double[2], new double[][] {null, new double[4]}),
                "wavefunctionsOut[1].length = 4", "[5, 5]");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, 1.0, 4, new double[4], new double[4][]),
                "kMax = 4 is outside the allowed range [1, 3]");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(v, Double.NaN, 2, new double[2], new double[2][]),
                "energyBoundEv = NaN");
        EffectiveMassInputValidationTest.assertMessage(() -> h.belowInto(new double[4], 1.0, 2, new double[2],
                new double[2][]), "potentialEv.length = 4", "[5, 5]");
    }
}
