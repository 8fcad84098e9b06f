package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Infinite square well of width L: exact E_n = n² pi² hbar² / (2 m L²) (any quantum mechanics
 * text, e.g. D. J. Griffiths, <i>Introduction to Quantum Mechanics</i>, 2nd ed., Pearson 2005,
 * Eq. 2.27 [from memory]). The Dirichlet ends of the window are the walls.
 */
class InfiniteSquareWellTest {

    private static final double L = 10 * Reference.NM;
    private static final double MASS = 0.2;

    private static double exact(int n) {
        return n * n * Math.PI * Math.PI * Reference.HBAR2_OVER_2M0_EV_M2 / (MASS * L * L);
    }

    private static double[] levels(double[] mesh, int k) {
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(mesh, Reference.filled(mesh.length - 1, MASS));
        return h.lowest(new double[mesh.length], k).energies();
    }

    @Test
    void uniformMeshMatchesTheDiscreteClosedForm() {
        // On a uniform mesh the box scheme is the standard three-point Laplacian, whose
        // eigenvalues are (4/h²) sin²(n pi h / 2L) (R. J. LeVeque, Finite Difference Methods for
        // Ordinary and Partial Differential Equations, SIAM 2007, Sec. 2.10 [from memory]).
        int cells = 250;
        double h = L / cells;
        double[] e = levels(Reference.uniform(0, L, cells), 5);
        for (int n = 1; n <= 5; n++) {
            double s = Math.sin(n * Math.PI * h / (2 * L));
            double discrete = Reference.HBAR2_OVER_2M0_EV_M2 / MASS * 4 * s * s / (h * h);
            assertEquals(discrete, e[n - 1], 1e-11 * discrete, "level " + n);
        }
    }

    @Test
    void uniformMeshIsAccurateAndSecondOrder() {
        double[][] e = new double[3][];
        int[] cells = {100, 200, 400};
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.uniform(0, L, cells[r]), 3);
        }
        for (int n = 1; n <= 3; n++) {
            double ex = exact(n);
            double relFine = Math.abs(e[2][n - 1] - ex) / ex;
            assertTrue(relFine < 1e-3, "level " + n + " relative error " + relFine);
            double p1 = Reference.assertSecondOrder("uniform n=" + n + " (100->200)", e[0][n - 1] - ex, e[1][n - 1] - ex);
            double p2 = Reference.assertSecondOrder("uniform n=" + n + " (200->400)", e[1][n - 1] - ex, e[2][n - 1] - ex);
            System.out.printf("ISW uniform n=%d: E=%.9f eV exact=%.9f rel.err(400 cells)=%.2e orders %.4f %.4f%n",
                    n, e[2][n - 1], ex, relFine, p1, p2);
        }
    }

    @Test
    void geometricallyGradedMeshIsAccurateAndSecondOrder() {
        // Cells grow geometrically from one wall to the other, last/first = e^2.3 (about 10).
        double[][] e = new double[3][];
        int[] cells = {150, 300, 600};
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.graded(0, L, cells[r], 2.3), 3);
        }
        for (int n = 1; n <= 3; n++) {
            double ex = exact(n);
            double relFine = Math.abs(e[2][n - 1] - ex) / ex;
            assertTrue(relFine < 1e-3, "level " + n + " relative error " + relFine);
            double p1 = Reference.assertSecondOrder("graded n=" + n + " (150->300)", e[0][n - 1] - ex, e[1][n - 1] - ex);
            double p2 = Reference.assertSecondOrder("graded n=" + n + " (300->600)", e[1][n - 1] - ex, e[2][n - 1] - ex);
            System.out.printf("ISW graded n=%d: E=%.9f eV exact=%.9f rel.err(600 cells)=%.2e orders %.4f %.4f%n",
                    n, e[2][n - 1], ex, relFine, p1, p2);
        }
    }
}
