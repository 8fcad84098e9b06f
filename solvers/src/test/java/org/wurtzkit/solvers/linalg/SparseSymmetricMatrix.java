package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.Require;

import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.CommonOps_DSCC;

/**
 * Immutable real symmetric sparse matrix (for example a banded Hamiltonian), assembled from
 * triplets with a {@link Builder} and stored internally in compressed sparse column form. Both
 * triangles are stored, so the matrix is exactly symmetric by construction.
 *
 * <p>Assembly follows the usual triplet-then-compress idiom: entries are collected as
 * {@code (row, col, value)} triplets, duplicates are summed, and the result is compressed
 * column-wise (T. A. Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, Ch. 2
 * [from memory]).
 */
public final class SparseSymmetricMatrix implements SymmetricMatrix {

    private final DMatrixSparseCSC csc;
    private final int bandwidth;
    private final double gershgorinLower;
    private final double gershgorinUpper;
    private final double normInf;

    private SparseSymmetricMatrix(DMatrixSparseCSC csc) {
        this.csc = csc;
        int n = csc.numCols;
        double[] radius = new double[n];
        double[] diagonal = new double[n];
        int band = 0;
        for (int col = 0; col < n; col++) {
            for (int p = csc.col_idx[col]; p < csc.col_idx[col + 1]; p++) {
                int row = csc.nz_rows[p];
                double v = csc.nz_values[p];
                if (row == col) {
                    diagonal[row] += v;
                } else {
                    radius[row] += Math.abs(v);
                    if (v != 0.0) {
                        band = Math.max(band, Math.abs(row - col));
                    }
                }
            }
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        double norm = 0.0;
        for (int i = 0; i < n; i++) {
            lo = Math.min(lo, diagonal[i] - radius[i]);
            hi = Math.max(hi, diagonal[i] + radius[i]);
            norm = Math.max(norm, Math.abs(diagonal[i]) + radius[i]);
        }
        this.bandwidth = band;
        this.gershgorinLower = lo;
        this.gershgorinUpper = hi;
        this.normInf = norm;
    }

    /**
     * Starts the assembly of an {@code size x size} matrix.
     *
     * @param size order {@code n >= 1}
     * @return an empty builder
     * @throws IllegalArgumentException if {@code size < 1}
     */
    public static Builder builder(int size) {
        Require.inRange("size", size, 1, Integer.MAX_VALUE);
        return new Builder(size);
    }

    /**
     * Creates a sparse copy of a tridiagonal matrix.
     *
     * @param m the tridiagonal matrix
     * @return the same matrix in sparse storage
     * @throws IllegalArgumentException if {@code m} is null
     */
    public static SparseSymmetricMatrix of(SymmetricTridiagonalMatrix m) {
        if (m == null) {
            throw Require.invalid("m", "null", "(a non-null matrix)");
        }
        double[] d = m.diagRef();
        double[] e = m.offRef();
        Builder b = builder(d.length);
        for (int i = 0; i < d.length; i++) {
            b.add(i, i, d[i]);
        }
        for (int i = 0; i < e.length; i++) {
            b.add(i, i + 1, e[i]);
        }
        return b.build();
    }

    /** Internal, uncopied access for the solvers of this package. */
    DMatrixSparseCSC cscRef() {
        return csc;
    }

    /**
     * Writes the diagonal and first off-diagonal into the arrays (used when the matrix is
     * tridiagonal).
     */
    void copyTridiagonal(double[] d, double[] e) {
        int n = csc.numCols;
        java.util.Arrays.fill(d, 0, n, 0.0);
        java.util.Arrays.fill(e, 0, n - 1, 0.0);
        for (int col = 0; col < n; col++) {
            for (int p = csc.col_idx[col]; p < csc.col_idx[col + 1]; p++) {
                int row = csc.nz_rows[p];
                if (row == col) {
                    d[col] += csc.nz_values[p];
                } else if (row == col + 1) {
                    e[col] += csc.nz_values[p];
                }
            }
        }
    }

    /**
     * Number of stored entries (both triangles, after summing duplicates).
     *
     * @return stored entry count
     */
    public int storedEntries() {
        return csc.nz_length;
    }

    /** {@inheritDoc} */
    @Override
    public int size() {
        return csc.numCols;
    }

    /** {@inheritDoc} */
    @Override
    public int bandwidth() {
        return bandwidth;
    }

    /** {@inheritDoc} */
    @Override
    public double get(int row, int col) {
        int n = csc.numCols;
        Require.inRange("row", row, 0, n - 1);
        Require.inRange("col", col, 0, n - 1);
        return csc.get(row, col);
    }

    /** {@inheritDoc} */
    @Override
    public void multiply(double[] x, double[] y) {
        int n = csc.numCols;
        Require.length("x", x, n);
        Require.minLength("y", y, n);
        if (x == y) {
            throw Require.invalid("y", "the same array as x", "(an array distinct from x)");
        }
        java.util.Arrays.fill(y, 0, n, 0.0);
        int[] colIdx = csc.col_idx;
        int[] rows = csc.nz_rows;
        double[] vals = csc.nz_values;
        for (int col = 0; col < n; col++) {
            double xc = x[col];
            for (int p = colIdx[col]; p < colIdx[col + 1]; p++) {
                y[rows[p]] += vals[p] * xc;
            }
        }
    }

    /** {@inheritDoc} */
    @Override
    public double gershgorinLowerBound() {
        return gershgorinLower;
    }

    /** {@inheritDoc} */
    @Override
    public double gershgorinUpperBound() {
        return gershgorinUpper;
    }

    /** {@inheritDoc} */
    @Override
    public double normInf() {
        return normInf;
    }

    /**
     * Collects entries of a symmetric matrix. Each call to {@link #add} adds its value to
     * {@code A[row][col]} <em>and</em> to {@code A[col][row]} (once if {@code row == col}), so
     * every off-diagonal coupling is entered exactly once, from either triangle; repeated calls
     * for the same position are summed. Not thread-safe.
     */
    public static final class Builder {

        private final int size;
        private final DMatrixSparseTriplet triplets;

        private Builder(int size) {
            this.size = size;
            this.triplets = new DMatrixSparseTriplet(size, size, 4 + 3 * Math.min(size, 1 << 16));
        }

        /**
         * Adds {@code value} to {@code A[row][col]} and to {@code A[col][row]}.
         *
         * @param row   row index in {@code [0, size-1]}
         * @param col   column index in {@code [0, size-1]}
         * @param value finite value
         * @return this builder
         * @throws IllegalArgumentException if an index is out of range or the value is not finite
         */
        public Builder add(int row, int col, double value) {
            Require.inRange("row", row, 0, size - 1);
            Require.inRange("col", col, 0, size - 1);
            Require.finite("value", value);
            triplets.addItem(row, col, value);
            if (row != col) {
                triplets.addItem(col, row, value);
            }
            return this;
        }

        /**
         * Compresses the collected entries into an immutable matrix. The builder can be used
         * further; later additions do not affect matrices already built.
         *
         * @return the matrix
         */
        public SparseSymmetricMatrix build() {
            DMatrixSparseCSC csc = DConvertMatrixStruct.convert(triplets, (DMatrixSparseCSC) null);
            csc.sortIndices(null);
            CommonOps_DSCC.duplicatesAdd(csc, null);
            return new SparseSymmetricMatrix(csc);
        }
    }
}
