package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.testing.ReferenceTable;

/**
 * Triangular well V = eFz with a hard wall at z = 0: exact E_n = -a_n (hbar² e² F² / 2m)^{1/3},
 * a_n the zeros of the Airy function Ai (T. Ando, A. B. Fowler, F. Stern, Rev. Mod. Phys. 54, 437
 * (1982), Sec. III [from memory]). The zeros are those of M. Abramowitz and I. A. Stegun,
 * <i>Handbook of Mathematical Functions</i>, NBS 1964, Table 10.13 (also DLMF Sec. 9.9), kept to 8
 * decimals in the test resource {@code reference/airy-zeros.csv} (its header says how they were
 * obtained).
 *
 * <p>m = 0.20, F = 1 MV/cm; the decay length (hbar²/(2 m e F))^{1/3} is 1.24 nm and the third
 * level's classical turning point is at 6.8 nm, so a 30 nm window makes the far Dirichlet wall
 * irrelevant (Ai ~ exp(-54) there).
 */
class TriangularWellTest {

    /** Airy zeros a_1..a_5 (A&amp;S Table 10.13), column 1 of {@code reference/airy-zeros.csv}. */
    private static final double[] AIRY_ZEROS = ReferenceTable.column("/reference/airy-zeros.csv", 1);

    private static final double MASS = 0.20;
    private static final double FIELD_V_PER_M = 1e8; // 1 MV/cm
    private static final double WINDOW = 30 * Reference.NM;

    private static double exact(int n) {
        double hbar = Reference.HBAR;
        double e = Reference.ELEMENTARY_CHARGE;
        double m = MASS * Reference.ELECTRON_MASS;
        double scaleJ = Math.cbrt(hbar * hbar * e * e * FIELD_V_PER_M * FIELD_V_PER_M / (2 * m));
        return -AIRY_ZEROS[n - 1] * scaleJ / e;
    }

    private static double[] levels(double[] z, int k) {
        double[] v = new double[z.length];
        for (int i = 0; i < z.length; i++) {
            v[i] = FIELD_V_PER_M * z[i]; // eV, since eFz / e = Fz
        }
        return EffectiveMassHamiltonian.of(z, Reference.filled(z.length - 1, MASS)).lowest(v, k).energies();
    }

    @Test
    void closedFormReproducesTheReferenceValues() {
        // Levels at m = 0.20, F = 1 MV/cm computed by the project from the exact Airy form of Ando,
        // Fowler & Stern, Rev. Mod. Phys. 54, 437 (1982), with CODATA 2018 constants (computed here;
        // guards the Airy-zero table and the constants against a typo).
        assertEquals(0.289843, exact(1), 1e-6);
        assertEquals(0.506761, exact(2), 1e-6);
        assertEquals(0.684354, exact(3), 1e-6);
    }

    @Test
    void uniformMeshIsAccurateAndSecondOrder() {
        int[] cells = {300, 600, 1200};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.uniform(0, WINDOW, cells[r]), 5);
        }
        check("uniform", e, cells);
    }

    @Test
    void wallRefinedGradedMeshIsAccurateAndSecondOrder() {
        // Geometric grading, cells 5x finer at the wall than at the far end.
        int[] cells = {250, 500, 1000};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(Reference.graded(0, WINDOW, cells[r], Math.log(5.0)), 5);
        }
        check("graded", e, cells);
    }

    private static void check(String label, double[][] e, int[] cells) {
        for (int n = 1; n <= 5; n++) {
            double ex = exact(n);
            double rel = Math.abs(e[2][n - 1] - ex) / ex;
            assertTrue(rel < 1e-3, label + " level " + n + " relative error " + rel);
            double p1 = Reference.assertSecondOrder(label + " n=" + n, e[0][n - 1] - ex, e[1][n - 1] - ex);
            double p2 = Reference.assertSecondOrder(label + " n=" + n, e[1][n - 1] - ex, e[2][n - 1] - ex);
            System.out.printf("triangular %s n=%d: E=%.9f eV exact=%.9f rel.err(%d cells)=%.2e orders %.4f %.4f%n",
                    label, n, e[2][n - 1], ex, cells[2], rel, p1, p2);
        }
    }
}
