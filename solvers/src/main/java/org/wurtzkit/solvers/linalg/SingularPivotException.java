package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Thrown by {@link Tridiagonal#solve} when Gaussian elimination without pivoting meets a zero or
 * near-zero pivot, i.e. the tridiagonal matrix is (numerically) singular or elimination without
 * row interchanges is unsafe for it. The row index of the offending pivot is available through
 * {@link #row()}. Its kind is {@link ErrorKind#SINGULAR_MATRIX}.
 *
 * <p>Elimination without pivoting is backward stable for diagonally dominant and for symmetric
 * positive definite tridiagonal matrices (Higham, <i>Accuracy and Stability of Numerical
 * Algorithms</i>, 2nd ed., SIAM 2002, Sec. 9.5 [from memory]); the Jacobians of a box-integration
 * Newton-Poisson solver are of this kind, so a pivot failure there signals a genuine defect.
 */
public final class SingularPivotException extends WurtzkitException {

    private static final long serialVersionUID = 1L;

    /** Zero-based row of the failing pivot. */
    private final int row;
    /** Value of the failing pivot. */
    private final double pivot;

    /**
     * Creates the exception.
     *
     * @param row       zero-based row of the failing pivot
     * @param pivot     value of the pivot
     * @param threshold smallest acceptable pivot magnitude for that row
     */
    SingularPivotException(int row, double pivot, double threshold) {
        super(ErrorKind.SINGULAR_MATRIX, "zero or near-zero pivot " + pivot + " in row " + row
                + " of the tridiagonal system (|pivot| must exceed " + threshold
                + "); the matrix is singular or not suitable for elimination without pivoting");
        this.row = row;
        this.pivot = pivot;
    }

    /**
     * Returns the row of the failing pivot.
     *
     * @return zero-based row index
     */
    public int row() {
        return row;
    }

    /**
     * Returns the value of the failing pivot (may be NaN if the input contained a NaN).
     *
     * @return pivot value
     */
    public double pivot() {
        return pivot;
    }
}
