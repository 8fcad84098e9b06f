package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.solvers.linalg.SymmetricTridiagonalEigenTest.assertMessage;

import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.ejml.data.DMatrixRMaj;
import org.wurtzkit.errors.ErrorKind;

/**
 * Checks {@link SparseLanczosEigen} against {@link SymmetricTridiagonalEigen} on tridiagonal
 * input and against EJML's dense symmetric eigen-decomposition on banded (penta- and
 * heptadiagonal) input.
 */
class SparseLanczosEigenTest {

    private final SparseLanczosEigen lanczos = new SparseLanczosEigen();
    private final SymmetricTridiagonalEigen tridiagonal = new SymmetricTridiagonalEigen();

    @Property(tries = 40)
    void agreesWithTridiagonalSolverOnTridiagonalInput(@ForAll @IntRange(min = 2, max = 300) int n,
                                                       @ForAll @IntRange(min = 1, max = 8) int kRequested,
                                                       @ForAll boolean hamiltonianLike,
                                                       @ForAll long seed) {
        TestMatrices.Kind kind = hamiltonianLike ? TestMatrices.Kind.LAPLACIAN_POTENTIAL : TestMatrices.Kind.RANDOM;
        double[][] m = TestMatrices.make(kind, n, seed);
        int k = Math.min(kRequested, n);
        SymmetricTridiagonalMatrix t = SymmetricTridiagonalMatrix.of(m[0], m[1]);
        EigenPairs ref = tridiagonal.lowest(t, k);
        EigenPairs got = lanczos.lowest(t, k);
        assertEquals(k, got.size());
        double norm = t.normInf();
        for (int j = 0; j < k; j++) {
            assertEquals(ref.value(j), got.value(j), 1e-10 * norm, "eigenvalue " + j);
            // Compare vectors where the eigenvalue is well separated (then the vector is
            // determined up to sign and both solvers use the same sign rule).
            double gapBelow = j > 0 ? ref.value(j) - ref.value(j - 1) : Double.POSITIVE_INFINITY;
            double gapAbove = j < k - 1 ? ref.value(j + 1) - ref.value(j) : Double.POSITIVE_INFINITY;
            if (Math.min(gapBelow, gapAbove) > 1e-4 * norm && j < k - 1) {
                double overlap = 0.0;
                for (int i = 0; i < n; i++) {
                    overlap += ref.component(j, i) * got.component(j, i);
                }
                assertEquals(1.0, Math.abs(overlap), 1e-8, "vector overlap " + j);
            }
        }
        DMatrixRMaj a = DenseReference.tridiagonal(m[0], m[1]);
        DenseReference.assertLowestEigenpairs(a, DenseReference.eigenvalues(a), got);
    }

    @Property(tries = 30)
    void agreesWithDenseReferenceOnBandedMatrices(@ForAll @IntRange(min = 3, max = 250) int n,
                                                  @ForAll @IntRange(min = 2, max = 3) int band,
                                                  @ForAll @IntRange(min = 1, max = 8) int kRequested,
                                                  @ForAll long seed) {
        SparseSymmetricMatrix m = randomBanded(n, band, seed);
        int k = Math.min(kRequested, n);
        DMatrixRMaj a = DenseReference.dense(m);
        double[] dense = DenseReference.eigenvalues(a);
        EigenPairs got = lanczos.lowest(m, k);
        DenseReference.assertLowestEigenpairs(a, dense, got);
    }

    /**
     * Hamiltonian-like banded matrix: the fourth-order five-point second-difference stencil
     * (-1/12, 4/3, -5/2, 4/3, -1/12) (B. Fornberg, Math. Comp. 51, 699 (1988) [from memory]),
     * negated, plus a small random potential. Its lowest eigenvalues are crowded (spacing about
     * (pi/n)²) while the Gershgorin bound lies far below them, the hard case for shift-invert
     * Lanczos with a Gershgorin shift.
     */
    @Property(tries = 15)
    void agreesWithDenseReferenceOnAFivePointHamiltonian(@ForAll @IntRange(min = 5, max = 400) int n,
                                                         @ForAll @IntRange(min = 1, max = 10) int kRequested,
                                                         @ForAll long seed) {
        Random rnd = new Random(seed);
        SparseSymmetricMatrix.Builder b = SparseSymmetricMatrix.builder(n);
        for (int i = 0; i < n; i++) {
            b.add(i, i, 2.5 + 0.05 * rnd.nextDouble());
            if (i + 1 < n) {
                b.add(i, i + 1, -4.0 / 3.0);
            }
            if (i + 2 < n) {
                b.add(i, i + 2, 1.0 / 12.0);
            }
        }
        SparseSymmetricMatrix m = b.build();
        int k = Math.min(kRequested, n);
        DMatrixRMaj a = DenseReference.dense(m);
        DenseReference.assertLowestEigenpairs(a, DenseReference.eigenvalues(a), lanczos.lowest(m, k));
    }

    @Property(tries = 20)
    void nearestToAnInteriorShiftAgreesWithDense(@ForAll @IntRange(min = 10, max = 200) int n,
                                                 @ForAll @IntRange(min = 1, max = 6) int k,
                                                 @ForAll long seed) {
        SparseSymmetricMatrix m = randomBanded(n, 2, seed);
        DMatrixRMaj a = DenseReference.dense(m);
        double[] dense = DenseReference.eigenvalues(a);
        double norm = DenseReference.norm(dense);
        // Shift halfway between two eigenvalues near the middle of the spectrum.
        int mid = n / 2;
        double sigma = 0.5 * (dense[mid] + dense[mid + 1 < n ? mid + 1 : mid - 1]);
        EigenPairs got = lanczos.nearest(m, k, sigma);
        // Expected: the k dense eigenvalues nearest to sigma, ascending.
        double[] byDistance = dense.clone();
        Integer[] idx = new Integer[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        java.util.Arrays.sort(idx, (p, q) -> Double.compare(Math.abs(dense[p] - sigma), Math.abs(dense[q] - sigma)));
        // Skip ties at the boundary of the selection (ambiguous choice).
        double dk = Math.abs(dense[idx[k - 1]] - sigma);
        double dk1 = k < n ? Math.abs(dense[idx[k]] - sigma) : Double.POSITIVE_INFINITY;
        net.jqwik.api.Assume.that(dk1 - dk > 1e-8 * norm);
        double[] expected = new double[k];
        for (int i = 0; i < k; i++) {
            expected[i] = byDistance[idx[i]];
        }
        java.util.Arrays.sort(expected);
        for (int i = 0; i < k; i++) {
            assertEquals(expected[i], got.value(i), 1e-10 * norm, "eigenvalue " + i);
        }
    }

    @Example
    void wilkinsonW21PlusFullSpectrum() {
        double[][] w = TestMatrices.wilkinsonPlus(21);
        SymmetricTridiagonalMatrix t = SymmetricTridiagonalMatrix.of(w[0], w[1]);
        DMatrixRMaj a = DenseReference.tridiagonal(w[0], w[1]);
        DenseReference.assertLowestEigenpairs(a, DenseReference.eigenvalues(a), lanczos.lowest(t, 21));
    }

    @Example
    void exhaustedKrylovSpaceRestartsAndFindsDegenerateCopies() {
        // Block-diagonal with two identical blocks: the eigenvalue 1 - sqrt(2) appears twice.
        SparseSymmetricMatrix m = SparseSymmetricMatrix.builder(6)
                .add(0, 0, 1).add(1, 1, 1).add(2, 2, 1).add(0, 1, 1).add(1, 2, 1)
                .add(3, 3, 1).add(4, 4, 1).add(5, 5, 1).add(3, 4, 1).add(4, 5, 1)
                .build();
        DMatrixRMaj a = DenseReference.dense(m);
        EigenPairs p = lanczos.lowest(m, 4);
        DenseReference.assertLowestEigenpairs(a, DenseReference.eigenvalues(a), p);
        assertEquals(1 - Math.sqrt(2), p.value(1), 1e-13); // by hand: eigenvalues 1, 1 +- sqrt2
    }

    @Example
    void tinyMatrices() {
        // 1x1 and [[2, 1], [1, 2]] (eigenvalues 1 and 3, worked by hand).
        EigenPairs one = lanczos.lowest(SparseSymmetricMatrix.builder(1).add(0, 0, -4.0).build(), 1);
        assertEquals(-4.0, one.value(0), 1e-14);
        assertEquals(1.0, one.component(0, 0), 1e-14);
        EigenPairs two = lanczos.lowest(SymmetricTridiagonalMatrix.of(new double[] {2, 2}, new double[] {1}), 2);
        assertEquals(1.0, two.value(0), 1e-12);
        assertEquals(3.0, two.value(1), 1e-12);
        assertEquals(Math.sqrt(0.5), two.component(1, 0), 1e-12);
        assertEquals(Math.sqrt(0.5), two.component(1, 1), 1e-12);
    }

    @Example
    void badInputIsRejected() {
        SparseSymmetricMatrix m = randomBanded(10, 2, 1L);
        assertMessage(() -> lanczos.lowest(m, 0), "k = 0 is outside the allowed range [1, 10]");
        assertMessage(() -> lanczos.lowest(m, 11), "k = 11 is outside the allowed range [1, 10]");
        assertMessage(() -> lanczos.lowest(null, 1), "matrix = null");
        assertMessage(() -> lanczos.nearest(m, 1, Double.NaN), "sigma = NaN");
        assertMessage(() -> new SparseLanczosEigen(0.0, 10), "relativeTolerance = 0.0 is outside the allowed range");
        assertMessage(() -> new SparseLanczosEigen(1e-10, 0), "maxKrylovDimension = 0 is outside the allowed range");
        assertMessage(() -> new SparseLanczosEigen(1e-10, 4).lowest(m, 5), "k = 5 is outside the allowed range [1, 4]");
        // sigma exactly on an eigenvalue: diag(1, 2, 3) with sigma = 2.
        SparseSymmetricMatrix d = SparseSymmetricMatrix.builder(3).add(0, 0, 1).add(1, 1, 2).add(2, 2, 3).build();
        assertMessage(() -> lanczos.nearest(d, 1, 2.0), "sigma = 2.0");
    }

    @Example
    void tooSmallKrylovLimitReportsNonConvergence() {
        SymmetricTridiagonalMatrix t = SymmetricTridiagonalMatrix.of(
                TestMatrices.make(TestMatrices.Kind.LAPLACIAN_POTENTIAL, 400, 5L)[0],
                TestMatrices.make(TestMatrices.Kind.LAPLACIAN_POTENTIAL, 400, 5L)[1]);
        EigenSolverException ex = assertThrows(EigenSolverException.class,
                () -> new SparseLanczosEigen(1e-12, 6).lowest(t, 3));
        assertTrue(ex.getMessage().contains("maxKrylovDimension"), ex.getMessage());
        assertEquals(ErrorKind.EIGEN_SOLVER_FAILED, ex.kind());
    }

    static SparseSymmetricMatrix randomBanded(int n, int band, long seed) {
        Random rnd = new Random(seed);
        SparseSymmetricMatrix.Builder b = SparseSymmetricMatrix.builder(n);
        for (int i = 0; i < n; i++) {
            b.add(i, i, 2 * rnd.nextDouble() - 1);
            for (int j = i + 1; j <= Math.min(n - 1, i + band); j++) {
                b.add(i, j, 2 * rnd.nextDouble() - 1);
            }
        }
        return b.build();
    }
}
