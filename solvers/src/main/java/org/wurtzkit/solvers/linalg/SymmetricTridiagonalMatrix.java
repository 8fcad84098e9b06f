package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.Require;

/**
 * Immutable real symmetric tridiagonal matrix given by its diagonal {@code diag[0..n-1]} and its
 * off-diagonal {@code off[0..n-2]} ({@code off[i] = A[i][i+1] = A[i+1][i]}).
 */
public final class SymmetricTridiagonalMatrix implements SymmetricMatrix {

    private final double[] diag;
    private final double[] off;

    private SymmetricTridiagonalMatrix(double[] diag, double[] off) {
        this.diag = diag;
        this.off = off;
    }

    /**
     * Creates the matrix from copies of the arrays.
     *
     * @param diag diagonal, length {@code n >= 1}, finite
     * @param off  off-diagonal, length {@code n-1}, finite
     * @return the matrix
     * @throws IllegalArgumentException on null arrays, wrong lengths or non-finite entries
     */
    public static SymmetricTridiagonalMatrix of(double[] diag, double[] off) {
        validate(diag, off);
        return new SymmetricTridiagonalMatrix(diag.clone(), off.clone());
    }

    /**
     * The one check of a symmetric tridiagonal matrix given by its arrays, shared with
     * {@link SymmetricTridiagonalEigen}.
     *
     * @param diag diagonal, length n &ge; 1, finite
     * @param off  off-diagonal, length n - 1, finite
     * @return n
     */
    static int validate(double[] diag, double[] off) {
        int n = Require.nonEmpty("diag", diag);
        Require.length("off", off, n - 1);
        Require.allFinite("diag", diag, n);
        Require.allFinite("off", off, n - 1);
        return n;
    }

    /**
     * The diagonal.
     *
     * @return a copy, length {@code n}
     */
    public double[] diagonal() {
        return diag.clone();
    }

    /**
     * The off-diagonal, {@code off[i] = A[i][i+1]}.
     *
     * @return a copy, length {@code n-1}
     */
    public double[] offDiagonal() {
        return off.clone();
    }

    /** Internal, uncopied access for the solvers of this package. */
    double[] diagRef() {
        return diag;
    }

    /** Internal, uncopied access for the solvers of this package. */
    double[] offRef() {
        return off;
    }

    /** {@inheritDoc} */
    @Override
    public int size() {
        return diag.length;
    }

    /**
     * {@inheritDoc}
     *
     * @return 0 if every off-diagonal entry is zero, otherwise 1
     */
    @Override
    public int bandwidth() {
        for (double v : off) {
            if (v != 0.0) {
                return 1;
            }
        }
        return 0;
    }

    /** {@inheritDoc} */
    @Override
    public double get(int row, int col) {
        int n = diag.length;
        Require.inRange("row", row, 0, n - 1);
        Require.inRange("col", col, 0, n - 1);
        if (row == col) {
            return diag[row];
        }
        if (row == col + 1) {
            return off[col];
        }
        if (col == row + 1) {
            return off[row];
        }
        return 0.0;
    }

    /** {@inheritDoc} */
    @Override
    public void multiply(double[] x, double[] y) {
        Tridiagonal.multiply(off, diag, off, x, y);
    }

    /** {@inheritDoc} */
    @Override
    public double gershgorinLowerBound() {
        int n = diag.length;
        double lo = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double r = (i > 0 ? Math.abs(off[i - 1]) : 0.0) + (i < n - 1 ? Math.abs(off[i]) : 0.0);
            lo = Math.min(lo, diag[i] - r);
        }
        return lo;
    }

    /** {@inheritDoc} */
    @Override
    public double gershgorinUpperBound() {
        int n = diag.length;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double r = (i > 0 ? Math.abs(off[i - 1]) : 0.0) + (i < n - 1 ? Math.abs(off[i]) : 0.0);
            hi = Math.max(hi, diag[i] + r);
        }
        return hi;
    }

    /** {@inheritDoc} */
    @Override
    public double normInf() {
        int n = diag.length;
        double norm = 0.0;
        for (int i = 0; i < n; i++) {
            double r = (i > 0 ? Math.abs(off[i - 1]) : 0.0) + (i < n - 1 ? Math.abs(off[i]) : 0.0);
            norm = Math.max(norm, Math.abs(diag[i]) + r);
        }
        return norm;
    }
}
