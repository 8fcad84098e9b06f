package org.wurtzkit.solvers.linalg;

/**
 * Computes the lowest eigenpairs of a real symmetric matrix. Implementations:
 * {@link SymmetricTridiagonalEigen} (Sturm bisection plus inverse iteration, tridiagonal input
 * only) and {@link SparseLanczosEigen} (shift-invert Lanczos, any sparse symmetric input).
 *
 * <p>Implementations keep reusable work space and are therefore not thread-safe; use one
 * instance per thread.
 */
public interface SymmetricEigenSolver {

    /**
     * The {@code k} smallest eigenvalues with orthonormal eigenvectors.
     *
     * @param matrix the matrix
     * @param k      number of eigenpairs, in {@code [1, matrix.size()]}
     * @return eigenpairs in ascending order of eigenvalue
     * @throws IllegalArgumentException if {@code matrix} is null, {@code k} is out of range, or
     *                                  the implementation cannot handle the matrix form
     */
    EigenPairs lowest(SymmetricMatrix matrix, int k);
}
