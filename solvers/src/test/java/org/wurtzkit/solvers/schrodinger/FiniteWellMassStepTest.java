package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.wurtzkit.testing.ReferenceTable;

/**
 * Finite square well of width L and depth V0 with a mass step at both interfaces, against the
 * BenDaniel-Duke matching conditions (psi and psi'/m continuous; D. J. BenDaniel and C. B. Duke,
 * Phys. Rev. 152, 683 (1966) [from memory]):
 * even states (k/m_w) tan(kL/2) = kappa/m_b, odd states -(k/m_w) cot(kL/2) = kappa/m_b, with
 * k = sqrt(2 m_w E)/hbar and kappa = sqrt(2 m_b (V0 - E))/hbar. The roots are found in the test
 * with Commons Math's BrentSolver (R. P. Brent, <i>Algorithms for Minimization without
 * Derivatives</i>, Prentice-Hall 1973 [from memory]); to avoid the poles of tan and cot, both
 * equations are multiplied by cos(kL/2) resp. sin(kL/2), which changes no root (the two factors
 * never vanish together with the other term).
 *
 * <p>The cases and the table values are in the test resource {@code reference/finite-well-levels.csv};
 * they are computed (Brent roots of the matching conditions, recomputed with an independent
 * root finder), not published data.
 */
class FiniteWellMassStepTest {

    /** Barrier thickness on each side; kappa^-1 <= 2.3 nm for all states, so e^{-2 kappa B} < 1e-11. */
    private static final double BARRIER = 30 * Reference.NM;

    static List<Arguments> cases() {
        List<Arguments> list = new ArrayList<>();
        // rows of reference/finite-well-levels.csv: L (nm), V0 (eV), m_w, m_b, n, E_n (eV), grouped per case
        double[][] rows = ReferenceTable.rows("/reference/finite-well-levels.csv");
        int start = 0;
        for (int i = 1; i <= rows.length; i++) {
            boolean sameCase = i < rows.length && rows[i][0] == rows[start][0] && rows[i][1] == rows[start][1]
                    && rows[i][2] == rows[start][2] && rows[i][3] == rows[start][3];
            if (!sameCase) {
                double[] levels = new double[i - start];
                for (int j = start; j < i; j++) {
                    levels[j - start] = rows[j][5];
                }
                double[] r = rows[start];
                list.add(Arguments.of(r[0], r[1], r[2], r[3], levels));
                start = i;
            }
        }
        return list;
    }

    /** All bound-state energies from the matching conditions, ascending. */
    static double[] brentRoots(double lNm, double v0, double mw, double mb) {
        double l = lNm * Reference.NM;
        double c = Reference.HBAR2_OVER_2M0_EV_M2; // E [eV] = c k^2 / m
        DoubleUnaryOperator even = e -> {
            double k = Math.sqrt(mw * e / c);
            double kappa = Math.sqrt(mb * (v0 - e) / c);
            return (k / mw) * Math.sin(k * l / 2) - (kappa / mb) * Math.cos(k * l / 2);
        };
        DoubleUnaryOperator odd = e -> {
            double k = Math.sqrt(mw * e / c);
            double kappa = Math.sqrt(mb * (v0 - e) / c);
            return -(k / mw) * Math.cos(k * l / 2) - (kappa / mb) * Math.sin(k * l / 2);
        };
        List<Double> roots = new ArrayList<>();
        BrentSolver brent = new BrentSolver(1e-15, 1e-16);
        for (DoubleUnaryOperator f : new DoubleUnaryOperator[] {even, odd}) {
            int samples = 4000;
            double prevE = v0 * 1e-9;
            double prevF = f.applyAsDouble(prevE);
            for (int i = 1; i <= samples; i++) {
                double e = v0 * i / samples * (1 - 1e-12);
                double fe = f.applyAsDouble(e);
                if (Math.signum(fe) != Math.signum(prevF)) {
                    roots.add(brent.solve(200, f::applyAsDouble, prevE, e));
                }
                prevE = e;
                prevF = fe;
            }
        }
        return roots.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    }

    /** Builds the well: barrier | well | barrier, with cell-wise potential and mass. */
    static double[][] structure(double lNm, double v0, double mw, double mb, double hNm, boolean gradedBarriers) {
        double l = lNm * Reference.NM;
        double h = hNm * Reference.NM;
        int wellCells = (int) Math.round(l / h);
        double[] left;
        double[] right;
        if (gradedBarriers) {
            // Cells grow geometrically away from each interface (ratio e^3 over the barrier).
            int barrierCells = (int) Math.round(BARRIER / h / 4);
            double[] g = Reference.graded(0, BARRIER, barrierCells, 3.0);
            left = new double[g.length];
            right = new double[g.length];
            for (int i = 0; i < g.length; i++) {
                left[i] = -l / 2 - g[g.length - 1 - i];
                right[i] = l / 2 + g[i];
            }
        } else {
            int barrierCells = (int) Math.round(BARRIER / h);
            left = Reference.uniform(-l / 2 - BARRIER, -l / 2, barrierCells);
            right = Reference.uniform(l / 2, l / 2 + BARRIER, barrierCells);
        }
        double[] z = Reference.concat(left, Reference.uniform(-l / 2, l / 2, wellCells), right);
        int cells = z.length - 1;
        double[] cellV = new double[cells];
        double[] mass = new double[cells];
        for (int i = 0; i < cells; i++) {
            boolean inWell = i >= left.length - 1 && i < left.length - 1 + wellCells;
            cellV[i] = inWell ? 0.0 : v0;
            mass[i] = inWell ? mw : mb;
        }
        return new double[][] {z, Reference.boxAverage(z, cellV), mass};
    }

    static double[] levels(double[][] s, double v0, int expected) {
        BoundStates b = EffectiveMassHamiltonian.of(s[0], s[2]).below(s[1], v0, 10);
        assertEquals(expected, b.size(), "number of bound states below V0");
        return b.energies();
    }

    @ParameterizedTest(name = "L={0} nm, V0={1} eV, m_w={2}, m_b={3}")
    @MethodSource("cases")
    void brentRootsReproduceTheReferenceTable(double lNm, double v0, double mw, double mb, double[] table) {
        double[] roots = brentRoots(lNm, v0, mw, mb);
        assertEquals(table.length, roots.length, "number of bound states");
        for (int i = 0; i < roots.length; i++) {
            assertEquals(table[i], roots[i], 1e-5, "state " + i);
        }
    }

    @ParameterizedTest(name = "uniform mesh: L={0} nm, V0={1} eV, m_w={2}, m_b={3}")
    @MethodSource("cases")
    void uniformMeshIsAccurateAndSecondOrder(double lNm, double v0, double mw, double mb, double[] table) {
        double[] exact = brentRoots(lNm, v0, mw, mb);
        double[] spacingsNm = {0.1, 0.05, 0.025};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(structure(lNm, v0, mw, mb, spacingsNm[r], false), v0, exact.length);
        }
        report("uniform", lNm, mb, exact, e);
    }

    @ParameterizedTest(name = "graded barriers: L={0} nm, V0={1} eV, m_w={2}, m_b={3}")
    @MethodSource("cases")
    void gradedBarrierMeshIsAccurateAndSecondOrder(double lNm, double v0, double mw, double mb, double[] table) {
        double[] exact = brentRoots(lNm, v0, mw, mb);
        double[] spacingsNm = {0.1, 0.05, 0.025};
        double[][] e = new double[3][];
        for (int r = 0; r < 3; r++) {
            e[r] = levels(structure(lNm, v0, mw, mb, spacingsNm[r], true), v0, exact.length);
        }
        report("graded", lNm, mb, exact, e);
    }

    private static void report(String label, double lNm, double mb, double[] exact, double[][] e) {
        for (int n = 0; n < exact.length; n++) {
            double rel = Math.abs(e[2][n] - exact[n]) / exact[n];
            assertTrue(rel < 1e-3, label + " state " + n + " relative error " + rel);
            double p1 = Reference.assertSecondOrder(label + " state " + n, e[0][n] - exact[n], e[1][n] - exact[n]);
            double p2 = Reference.assertSecondOrder(label + " state " + n, e[1][n] - exact[n], e[2][n] - exact[n]);
            System.out.printf("finite well %s L=%.0f nm m_b=%.2f n=%d: E=%.9f eV Brent=%.9f rel.err=%.2e orders %.4f %.4f%n",
                    label, lNm, mb, n, e[2][n], exact[n], rel, p1, p2);
        }
    }
}
