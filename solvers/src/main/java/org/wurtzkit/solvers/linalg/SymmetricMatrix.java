package org.wurtzkit.solvers.linalg;

/**
 * A real symmetric {@code n x n} matrix held in a sparse form, immutable. The main tree has one
 * form, {@link SymmetricTridiagonalMatrix} (two arrays); a general sparse form and a Lanczos
 * eigen-solver for it live beside the tests until a banded Hamiltonian (e.g. a multiband k.p
 * valence band) needs them. No third-party matrix type appears in it.
 */
public interface SymmetricMatrix {

    /**
     * Order {@code n} of the matrix.
     *
     * @return number of rows (= columns), at least 1
     */
    int size();

    /**
     * Half bandwidth: the largest {@code |i - j|} over the stored non-zero entries (0 for a
     * diagonal matrix, 1 for a tridiagonal one).
     *
     * @return half bandwidth
     */
    int bandwidth();

    /**
     * Entry {@code A[row][col]} (zero where nothing is stored).
     *
     * @param row row index in {@code [0, n-1]}
     * @param col column index in {@code [0, n-1]}
     * @return the entry
     * @throws IllegalArgumentException if an index is out of range
     */
    double get(int row, int col);

    /**
     * Computes {@code y = A x} in O(number of non-zeros), without allocating.
     *
     * @param x vector of length {@code n}
     * @param y output of length at least {@code n}, distinct from {@code x}
     * @throws IllegalArgumentException on null arrays, wrong lengths, or {@code y == x}
     */
    void multiply(double[] x, double[] y);

    /**
     * Lower end of the union of Gershgorin discs, {@code min_i (A_ii - sum_{j != i} |A_ij|)}, a
     * lower bound of every eigenvalue (S. Gershgorin, Izv. Akad. Nauk SSSR, Ser. Mat. 6, 749
     * (1931) [from memory]; Golub &amp; Van Loan, <i>Matrix Computations</i>, 4th ed. 2013,
     * Thm. 7.2.1 [from memory]).
     *
     * @return Gershgorin lower bound
     */
    double gershgorinLowerBound();

    /**
     * Upper end of the union of Gershgorin discs, {@code max_i (A_ii + sum_{j != i} |A_ij|)}, an
     * upper bound of every eigenvalue (same sources as {@link #gershgorinLowerBound()}).
     *
     * @return Gershgorin upper bound
     */
    double gershgorinUpperBound();

    /**
     * Infinity norm {@code max_i sum_j |A_ij|} (equal to the 1-norm by symmetry); an upper
     * bound of the spectral norm.
     *
     * @return the norm
     */
    double normInf();
}
