package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Harmonic oscillator V = m omega² z² / 2: exact E_n = hbar omega (n + 1/2) (Griffiths,
 * <i>Introduction to Quantum Mechanics</i>, 2nd ed. 2005, Eq. 2.61 [from memory]). With
 * hbar omega = 0.1 eV and m = 0.2 the oscillator length sqrt(hbar/(m omega)) is about 1.95 nm, so
 * the +-20 nm window (about 10 lengths) makes the Dirichlet truncation negligible
 * (psi ~ exp(-50) at the ends).
 */
class HarmonicOscillatorTest {

    private static final double MASS = 0.2;
    private static final double HBAR_OMEGA_EV = 0.1;
    private static final double HALF_WIDTH = 20 * Reference.NM;

    private static double[] levels(double[] z, int k) {
        double omega = HBAR_OMEGA_EV * Reference.ELEMENTARY_CHARGE / Reference.HBAR;
        double[] v = new double[z.length];
        for (int i = 0; i < z.length; i++) {
            v[i] = 0.5 * MASS * Reference.ELECTRON_MASS * omega * omega * z[i] * z[i] / Reference.ELEMENTARY_CHARGE;
        }
        return EffectiveMassHamiltonian.of(z, Reference.filled(z.length - 1, MASS)).lowest(v, k).energies();
    }

    private static void check(String label, double[][] e, int[] cells) {
        for (int n = 0; n < 4; n++) {
            double ex = HBAR_OMEGA_EV * (n + 0.5);
            double relFine = Math.abs(e[2][n] - ex) / ex;
            assertTrue(relFine < 1e-3, label + " level " + n + " relative error " + relFine);
            double p1 = Reference.assertSecondOrder(label + " n=" + n, e[0][n] - ex, e[1][n] - ex);
            double p2 = Reference.assertSecondOrder(label + " n=" + n, e[1][n] - ex, e[2][n] - ex);
            System.out.printf("HO %s n=%d: E=%.9f eV exact=%.9f rel.err(%d cells)=%.2e orders %.4f %.4f%n",
                    label, n, e[2][n], ex, cells[2], relFine, p1, p2);
        }
    }

    @Test
    void uniformMeshIsAccurateAndSecondOrder() {
        int[] cells = {200, 400, 800};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.uniform(-HALF_WIDTH, HALF_WIDTH, cells[r]), 4);
        }
        check("uniform", e, cells);
    }

    @Test
    void centreRefinedMeshIsAccurateAndSecondOrder() {
        // sinh mapping: spacing cosh(2) = 3.76 times finer at the centre than at the window edges.
        int[] cells = {200, 400, 800};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.sinhCentred(-HALF_WIDTH, HALF_WIDTH, cells[r], 2.0), 4);
        }
        check("sinh-graded", e, cells);
    }
}
