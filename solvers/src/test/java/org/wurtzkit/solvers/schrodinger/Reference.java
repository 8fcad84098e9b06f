package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Shared test references: CODATA 2018 constants (E. Tiesinga, P. J. Mohr, D. B. Newell,
 * B. N. Taylor, Rev. Mod. Phys. 93, 025010 (2021)), mesh builders and the convergence-order
 * check.
 */
final class Reference {

    /** Reduced Planck constant, J s (CODATA 2018). */
    static final double HBAR = 6.62607015e-34 / (2 * Math.PI); // h is exact in the 2019 SI, so is h/(2 pi)
    /** Electron rest mass, kg (CODATA 2018). */
    static final double ELECTRON_MASS = 9.1093837015e-31;
    /** Elementary charge, C (CODATA 2018, exact). */
    static final double ELEMENTARY_CHARGE = 1.602176634e-19;
    /** hbar^2 / (2 m0 e), eV m^2. */
    static final double HBAR2_OVER_2M0_EV_M2 = HBAR * HBAR / (2 * ELECTRON_MASS * ELEMENTARY_CHARGE);

    static final double NM = 1e-9;

    private Reference() {
    }

    /** Uniform mesh with {@code cells} intervals on [a, b]. */
    static double[] uniform(double a, double b, int cells) {
        double[] z = new double[cells + 1];
        for (int i = 0; i <= cells; i++) {
            z[i] = a + (b - a) * i / cells;
        }
        z[cells] = b;
        return z;
    }

    /**
     * Geometrically graded mesh on [a, b]: z = a + (b - a)(e^{s xi} - 1)/(e^{s} - 1) with uniform
     * xi, so consecutive cells grow by the constant factor e^{s/cells} and the last cell is
     * e^{s} times the first (a smooth mapping, so halving the xi step halves every spacing).
     */
    static double[] graded(double a, double b, int cells, double s) {
        double[] z = new double[cells + 1];
        double den = Math.expm1(s);
        for (int i = 0; i <= cells; i++) {
            z[i] = a + (b - a) * Math.expm1(s * i / (double) cells) / den;
        }
        z[cells] = b;
        return z;
    }

    /**
     * Mesh symmetric about the centre of [a, b], finest in the middle: z = c + H sinh(s xi)/sinh(s),
     * xi uniform in [-1, 1].
     */
    static double[] sinhCentred(double a, double b, int cells, double s) {
        double[] z = new double[cells + 1];
        double c = 0.5 * (a + b);
        double h = 0.5 * (b - a);
        for (int i = 0; i <= cells; i++) {
            double xi = -1.0 + 2.0 * i / cells;
            z[i] = c + h * Math.sinh(s * xi) / Math.sinh(s);
        }
        z[0] = a;
        z[cells] = b;
        return z;
    }

    /** Concatenates meshes that share end points (each next one starts where the last ended). */
    static double[] concat(double[]... parts) {
        int n = 1;
        for (double[] p : parts) {
            n += p.length - 1;
        }
        double[] z = new double[n];
        int at = 0;
        z[0] = parts[0][0];
        for (double[] p : parts) {
            for (int i = 1; i < p.length; i++) {
                z[++at] = p[i];
            }
        }
        return z;
    }

    /**
     * Nodal potential from a potential that is constant on each cell: the box average
     * (V_{i-1} h_{i-1} + V_i h_i) / (h_{i-1} + h_i), the end nodes take their single cell.
     */
    static double[] boxAverage(double[] z, double[] cellValue) {
        int n = z.length;
        double[] v = new double[n];
        v[0] = cellValue[0];
        v[n - 1] = cellValue[n - 2];
        for (int i = 1; i < n - 1; i++) {
            double hl = z[i] - z[i - 1];
            double hr = z[i + 1] - z[i];
            v[i] = (cellValue[i - 1] * hl + cellValue[i] * hr) / (hl + hr);
        }
        return v;
    }

    /** Constant array. */
    static double[] filled(int n, double value) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, value);
        return a;
    }

    /**
     * Observed order of convergence log2(e_coarse / e_fine) for a refinement by 2, asserted to
     * lie in [1.8, 2.2]. Returns the order.
     */
    static double assertSecondOrder(String what, double errCoarse, double errFine) {
        double p = Math.log(Math.abs(errCoarse) / Math.abs(errFine)) / Math.log(2.0);
        assertTrue(p >= 1.8 && p <= 2.2, what + ": observed order " + p + " (errors " + errCoarse + ", " + errFine + ")");
        return p;
    }
}
