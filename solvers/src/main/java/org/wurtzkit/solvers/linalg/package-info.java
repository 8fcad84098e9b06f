/**
 * Sparse linear algebra for the 1D device solvers: O(N) tridiagonal linear systems
 * ({@link org.wurtzkit.solvers.linalg.Tridiagonal}), the lowest eigenpairs of symmetric
 * tridiagonal matrices by Sturm bisection and inverse iteration
 * ({@link org.wurtzkit.solvers.linalg.SymmetricTridiagonalEigen}).
 *
 * <p>Matrices enter through this package's own immutable type
 * ({@link org.wurtzkit.solvers.linalg.SymmetricTridiagonalMatrix}) or plain {@code double[]} arrays;
 * results are {@link org.wurtzkit.solvers.linalg.EigenPairs}. No third-party type appears in the
 * public signatures. Invalid arguments raise {@link java.lang.IllegalArgumentException} with a
 * message naming the parameter, the value and the allowed range.
 */
package org.wurtzkit.solvers.linalg;
