package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.Require;

/**
 * Direct O(N) solution of general (not necessarily symmetric) tridiagonal linear systems by the
 * Thomas algorithm, i.e. Gaussian elimination without row interchanges specialised to a band of
 * width one (L. H. Thomas, "Elliptic problems in linear difference equations over a network",
 * Watson Scientific Computing Laboratory report, Columbia University, 1949 [from memory]; Golub
 * &amp; Van Loan, <i>Matrix Computations</i>, 4th ed., Johns Hopkins 2013, Sec. 4.3, band
 * Gaussian elimination [from memory]).
 *
 * <p>Storage convention for an {@code n x n} matrix {@code A} (all arrays zero-based):
 * <ul>
 *   <li>{@code diag[i] = A[i][i]}, length {@code n};</li>
 *   <li>{@code sub[i] = A[i+1][i]}, length {@code n-1} (below the diagonal);</li>
 *   <li>{@code sup[i] = A[i][i+1]}, length {@code n-1} (above the diagonal).</li>
 * </ul>
 *
 * <p>No pivoting is done. The method is backward stable for diagonally dominant and symmetric
 * positive definite matrices (Higham, <i>Accuracy and Stability of Numerical Algorithms</i>,
 * 2nd ed., SIAM 2002, Sec. 9.5 [from memory]). A pivot whose magnitude does not exceed
 * {@link #PIVOT_RELATIVE_TOLERANCE} times the absolute sum of its row raises a
 * {@link SingularPivotException} naming the row.
 *
 * <p>The {@link #solve(double[], double[], double[], double[], double[], double[])} variant writes
 * into caller-provided arrays and allocates nothing, so a Newton loop can call it repeatedly.
 */
public final class Tridiagonal {

    /**
     * Relative pivot threshold: a pivot {@code p} of row {@code i} is rejected when
     * {@code |p| <= PIVOT_RELATIVE_TOLERANCE * (|sub[i-1]| + |diag[i]| + |sup[i]|)}. Its value,
     * 64 units of double roundoff, flags pivots that have lost essentially all significant
     * digits to cancellation (common practice, no source).
     */
    public static final double PIVOT_RELATIVE_TOLERANCE = 64.0 * Math.ulp(1.0);

    private Tridiagonal() {
    }

    /**
     * Solves {@code A x = rhs} and returns a newly allocated solution (convenience form of
     * {@link #solve(double[], double[], double[], double[], double[], double[])}).
     *
     * @param sub  sub-diagonal, {@code sub[i] = A[i+1][i]}, length {@code n-1}
     * @param diag diagonal, length {@code n >= 1}
     * @param sup  super-diagonal, {@code sup[i] = A[i][i+1]}, length {@code n-1}
     * @param rhs  right-hand side, length {@code n}; not modified
     * @return the solution {@code x}, length {@code n}
     * @throws IllegalArgumentException if an array is null, has the wrong length or holds a
     *                                  non-finite value
     * @throws SingularPivotException   if a zero or near-zero pivot is met
     */
    public static double[] solve(double[] sub, double[] diag, double[] sup, double[] rhs) {
        if (diag == null) {
            throw Require.invalid("diag", "null", "(a non-null array)");
        }
        int n = diag.length;
        double[] x = new double[n];
        double[] work = new double[n];
        solve(sub, diag, sup, rhs, x, work);
        return x;
    }

    /**
     * Solves {@code A x = rhs} without allocating, using the Thomas algorithm.
     *
     * <p>Forward sweep: {@code c'_0 = sup_0/diag_0}, {@code d'_0 = rhs_0/diag_0},
     * {@code p_i = diag_i - sub_{i-1} c'_{i-1}}, {@code c'_i = sup_i/p_i},
     * {@code d'_i = (rhs_i - sub_{i-1} d'_{i-1})/p_i}; back substitution
     * {@code x_{n-1} = d'_{n-1}}, {@code x_i = d'_i - c'_i x_{i+1}} (Golub &amp; Van Loan 2013,
     * Sec. 4.3 [from memory]).
     *
     * @param sub  sub-diagonal, {@code sub[i] = A[i+1][i]}, length {@code n-1}; not modified
     * @param diag diagonal, length {@code n >= 1}; not modified
     * @param sup  super-diagonal, {@code sup[i] = A[i][i+1]}, length {@code n-1}; not modified
     * @param rhs  right-hand side, length {@code n}; not modified unless it is the same array as
     *             {@code x}
     * @param x    output, length at least {@code n}; may be the same array as {@code rhs}
     * @param work scratch, length at least {@code n}; must be distinct from the other arrays
     * @throws IllegalArgumentException if an array is null, has the wrong length, holds a
     *                                  non-finite value, or {@code work} aliases another argument
     * @throws SingularPivotException   if a zero or near-zero pivot is met (then {@code x} and
     *                                  {@code work} hold partial results)
     */
    public static void solve(double[] sub, double[] diag, double[] sup, double[] rhs,
                             double[] x, double[] work) {
        int n = Require.nonEmpty("diag", diag);
        Require.length("sub", sub, n - 1);
        Require.length("sup", sup, n - 1);
        Require.length("rhs", rhs, n);
        Require.minLength("x", x, n);
        Require.minLength("work", work, n);
        if (work == x || work == rhs || work == diag || work == sub || work == sup) {
            throw Require.invalid("work", "an array aliasing another argument",
                    "(a scratch array distinct from all other arguments)");
        }
        if (x == diag || x == sub || x == sup) {
            throw Require.invalid("x", "an array aliasing a matrix argument",
                    "(the rhs array or a distinct array)");
        }
        Require.allFinite("diag", diag, n);
        Require.allFinite("sub", sub, n - 1);
        Require.allFinite("sup", sup, n - 1);
        Require.allFinite("rhs", rhs, n);

        double p = diag[0];
        double rowScale = Math.abs(diag[0]) + (n > 1 ? Math.abs(sup[0]) : 0.0);
        checkPivot(0, p, rowScale);
        if (n > 1) {
            work[0] = sup[0] / p;
        }
        x[0] = rhs[0] / p;
        for (int i = 1; i < n; i++) {
            double a = sub[i - 1];
            p = diag[i] - a * work[i - 1];
            boolean last = i == n - 1;
            rowScale = Math.abs(a) + Math.abs(diag[i]) + (last ? 0.0 : Math.abs(sup[i]));
            checkPivot(i, p, rowScale);
            if (!last) {
                work[i] = sup[i] / p;
            }
            x[i] = (rhs[i] - a * x[i - 1]) / p;
        }
        for (int i = n - 2; i >= 0; i--) {
            x[i] -= work[i] * x[i + 1];
        }
    }

    /**
     * Computes {@code y = A x} for a tridiagonal {@code A} stored as in this class; O(N), no
     * allocation. Useful for residuals {@code rhs - A x}.
     *
     * @param sub  sub-diagonal, length {@code n-1}
     * @param diag diagonal, length {@code n >= 1}
     * @param sup  super-diagonal, length {@code n-1}
     * @param x    vector, length {@code n}
     * @param y    output, length at least {@code n}; must not be {@code x}
     * @throws IllegalArgumentException on null arrays, wrong lengths or {@code y == x}
     */
    public static void multiply(double[] sub, double[] diag, double[] sup, double[] x, double[] y) {
        int n = Require.nonEmpty("diag", diag);
        Require.length("sub", sub, n - 1);
        Require.length("sup", sup, n - 1);
        Require.length("x", x, n);
        Require.minLength("y", y, n);
        if (y == x) {
            throw Require.invalid("y", "the same array as x", "(an array distinct from x)");
        }
        if (n == 1) {
            y[0] = diag[0] * x[0];
            return;
        }
        y[0] = diag[0] * x[0] + sup[0] * x[1];
        for (int i = 1; i < n - 1; i++) {
            y[i] = sub[i - 1] * x[i - 1] + diag[i] * x[i] + sup[i] * x[i + 1];
        }
        y[n - 1] = sub[n - 2] * x[n - 2] + diag[n - 1] * x[n - 1];
    }

    private static void checkPivot(int row, double pivot, double rowScale) {
        double threshold = PIVOT_RELATIVE_TOLERANCE * rowScale;
        if (!(Math.abs(pivot) > threshold)) { // also rejects NaN
            throw new SingularPivotException(row, pivot, threshold);
        }
    }
}
