package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.Assume;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.ejml.data.DMatrixRMaj;

/**
 * Checks {@link SymmetricTridiagonalEigen} against EJML's dense symmetric eigen-decomposition
 * (an independent general-purpose library) on random and deliberately ill-conditioned
 * (clustered, degenerate, Wilkinson) matrices.
 */
class SymmetricTridiagonalEigenTest {

    private final SymmetricTridiagonalEigen solver = new SymmetricTridiagonalEigen();

    @Property(tries = 70)
    void lowestEigenpairsAgreeWithDenseReference(@ForAll TestMatrices.Kind kind,
                                                 @ForAll @IntRange(min = 2, max = 400) int n,
                                                 @ForAll @IntRange(min = 1, max = 25) int kRequested,
                                                 @ForAll long seed) {
        double[][] m = TestMatrices.make(kind, n, seed);
        int k = n <= 40 ? n : Math.min(kRequested, n);
        DMatrixRMaj a = DenseReference.tridiagonal(m[0], m[1]);
        double[] dense = DenseReference.eigenvalues(a);
        EigenPairs p = solver.lowest(m[0], m[1], k);
        assertEquals(k, p.size());
        DenseReference.assertLowestEigenpairs(a, dense, p);
    }

    @Example
    void sturmCountOfAnAllZeroMatrixIsCheckedAwayFromThePivotFloor() {
        // the sample that once failed: REPEATED_TINY_OFF, n = 2, seed -3465 gives an all-zero matrix
        double[][] m = TestMatrices.make(TestMatrices.Kind.REPEATED_TINY_OFF, 2, -3465L);
        assertEquals(0.0, Math.abs(m[0][0]) + Math.abs(m[0][1]) + Math.abs(m[1][0]), "all-zero matrix");
        sturmCountMatchesDenseCount(TestMatrices.Kind.REPEATED_TINY_OFF, 2, -3465L);
        assertEquals(0, SymmetricTridiagonalEigen.countBelow(m[0], m[1], -1e-300));
        assertEquals(2, SymmetricTridiagonalEigen.countBelow(m[0], m[1], 1e-300));
    }

    @Example
    void anAllZeroMatrixHasExactlyZeroEigenvalues() {
        // the sample that failed a CI-like run: REPEATED_TINY_OFF, n = 2, sample seed -1082 gives an
        // all-zero matrix, whose only eigenvalue is 0 (exact, no source needed); bisection against the
        // fallback norm 1 used to return -1.1e-16, which the relative check against the dense
        // reference (norm 0) cannot accept
        double[][] m = TestMatrices.make(TestMatrices.Kind.REPEATED_TINY_OFF, 2, -1082L);
        assertEquals(0.0, Math.abs(m[0][0]) + Math.abs(m[0][1]) + Math.abs(m[1][0]), "all-zero matrix");
        EigenPairs p = new SymmetricTridiagonalEigen().lowest(m[0], m[1], 2);
        assertEquals(0.0, p.value(0), 0.0);
        assertEquals(0.0, p.value(1), 0.0);
        lowestEigenpairsAgreeWithDenseReference(TestMatrices.Kind.REPEATED_TINY_OFF, 2, 1, -1082L);
    }

    @Property(tries = 60)
    void sturmCountMatchesDenseCount(@ForAll TestMatrices.Kind kind,
                                     @ForAll @IntRange(min = 1, max = 300) int n,
                                     @ForAll long seed) {
        double[][] m = n == 1 ? new double[][] {{0.3}, {}} : TestMatrices.make(kind, n, seed);
        double[] dense = DenseReference.eigenvalues(DenseReference.tridiagonal(m[0], m[1]));
        double norm = Math.max(DenseReference.norm(dense), Double.MIN_NORMAL);
        Random rnd = new Random(seed ^ 0x5A5A5A5AL);
        for (int trial = 0; trial < 20; trial++) {
            double x = (2.6 * rnd.nextDouble() - 1.3) * norm;
            if (trial == 0) {
                x = dense[0] - 0.5 * norm; // below everything
            } else if (trial == 1) {
                x = dense[n - 1] + 0.5 * norm; // above everything
            }
            double gap = Double.POSITIVE_INFINITY;
            int expected = 0;
            for (double lambda : dense) {
                gap = Math.min(gap, Math.abs(lambda - x));
                if (lambda < x) {
                    expected++;
                }
            }
            if (gap < 1e-9 * norm || gap < 16 * Double.MIN_NORMAL) {
                // too close to an eigenvalue for an unambiguous count: relative round-off, or the
                // absolute pivot floor (about Double.MIN_NORMAL) that decides a zero pivot's sign,
                // which matters when the whole matrix is near zero (an all-zero 2x2 and
                // x = -MIN_NORMAL/2 once failed here, counted 2 instead of 0)
                continue;
            }
            assertEquals(expected, SymmetricTridiagonalEigen.countBelow(m[0], m[1], x), "count below " + x);
        }
    }

    @Property(tries = 40)
    void belowReturnsEveryEigenpairUnderTheBoundUpToKMax(@ForAll TestMatrices.Kind kind,
                                                         @ForAll @IntRange(min = 2, max = 300) int n,
                                                         @ForAll @IntRange(min = 1, max = 30) int kMaxRequested,
                                                         @ForAll @IntRange(min = 0, max = 1000) int boundPermille,
                                                         @ForAll long seed) {
        double[][] m = TestMatrices.make(kind, n, seed);
        int kMax = Math.min(kMaxRequested, n);
        DMatrixRMaj a = DenseReference.tridiagonal(m[0], m[1]);
        double[] dense = DenseReference.eigenvalues(a);
        double norm = DenseReference.norm(dense);
        double bound = dense[0] - 0.05 * norm + (dense[n - 1] - dense[0] + 0.1 * norm) * boundPermille / 1000.0;
        int countBelow = 0;
        double gap = Double.POSITIVE_INFINITY;
        for (double lambda : dense) {
            gap = Math.min(gap, Math.abs(lambda - bound));
            if (lambda < bound) {
                countBelow++;
            }
        }
        Assume.that(gap > 1e-9 * norm);
        EigenPairs p = solver.below(m[0], m[1], bound, kMax);
        assertEquals(Math.min(countBelow, kMax), p.size());
        if (p.size() > 0) {
            DenseReference.assertLowestEigenpairs(a, dense, p);
            assertTrue(p.value(p.size() - 1) < bound);
        }
    }

    /**
     * Wilkinson's W21+ (Wilkinson, The Algebraic Eigenvalue Problem, Oxford 1965, Ch. 5 [from
     * memory]): its largest eigenvalues form pairs agreeing to many digits; all 21 eigenpairs
     * must still come out orthonormal with small residuals.
     */
    @Example
    void wilkinsonW21PlusAllEigenpairs() {
        double[][] w = TestMatrices.wilkinsonPlus(21);
        DMatrixRMaj a = DenseReference.tridiagonal(w[0], w[1]);
        double[] dense = DenseReference.eigenvalues(a);
        // The test matrix really is nearly degenerate: the top pair agrees to better than
        // 1e-12 relative (the dense reference shows it; Wilkinson 1965 [from memory]).
        assertTrue(dense[20] - dense[19] < 1e-12 * dense[20], "top pair gap " + (dense[20] - dense[19]));
        assertTrue(dense[18] - dense[17] < 1e-9 * dense[20], "second pair gap " + (dense[18] - dense[17]));
        EigenPairs p = solver.lowest(w[0], w[1], 21);
        double[] obs = DenseReference.assertLowestEigenpairs(a, dense, p);
        // vectors of eigenvalues more than CLUSTER_RELATIVE_GAP apart are not re-orthogonalised; inverse
        // iteration leaves them orthogonal to about eps ||T|| / gap (Golub & Van Loan, sec. 8.2, from memory)
        assertTrue(obs[2] < 1e-12, "orthogonality " + obs[2]);
        // Largest eigenvalue of W21+, 10.746194182903..., (Wilkinson 1965, from memory).
        assertEquals(10.746194182903, p.value(20), 1e-11);
    }

    @Example
    void exactlyDegenerateBlocksGiveOrthonormalVectors() {
        // Three identical decoupled 2x2 blocks [[1, 1], [1, 1]]: eigenvalues 0 (x3) and 2 (x3).
        double[] d = {1, 1, 1, 1, 1, 1};
        double[] e = {1, 0, 1, 0, 1};
        DMatrixRMaj a = DenseReference.tridiagonal(d, e);
        EigenPairs p = solver.lowest(d, e, 6);
        DenseReference.assertLowestEigenpairs(a, DenseReference.eigenvalues(a), p);
        assertArrayEquals(new double[] {0, 0, 0, 2, 2, 2}, p.values(), 1e-15);
    }

    @Example
    void zeroMatrixAndOneByOne() {
        EigenPairs z = solver.lowest(new double[4], new double[3], 4);
        assertArrayEquals(new double[4], z.values(), 1e-15); // bisection tolerance eps·max(norm, 1)
        // Any orthonormal basis is an eigenbasis of the zero matrix: check orthonormality.
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                double dot = 0.0;
                for (int r = 0; r < 4; r++) {
                    dot += z.component(i, r) * z.component(j, r);
                }
                assertEquals(i == j ? 1.0 : 0.0, dot, 1e-14);
            }
        }
        EigenPairs one = solver.lowest(new double[] {-2.5}, new double[0], 1);
        assertEquals(-2.5, one.value(0), 0.0);
        assertArrayEquals(new double[] {1.0}, one.vector(0), 0.0);
        assertEquals(1, SymmetricTridiagonalEigen.countBelow(new double[] {-2.5}, new double[0], 0.0));
    }

    @Example
    void hardCaseTwoByTwo() {
        // [[2, 1], [1, 2]] has eigenvalues 1 and 3 with vectors (1, -1)/sqrt2 and (1, 1)/sqrt2
        // (worked by hand).
        EigenPairs p = solver.lowest(new double[] {2, 2}, new double[] {1}, 2);
        assertEquals(1.0, p.value(0), 1e-15);
        assertEquals(3.0, p.value(1), 1e-15);
        double r = Math.sqrt(0.5);
        assertEquals(r, Math.abs(p.component(0, 0)), 1e-15);
        assertEquals(-p.component(0, 0), p.component(0, 1), 1e-15);
        assertArrayEquals(new double[] {r, r}, p.vector(1), 1e-15);
    }

    @Example
    void intoVariantReusesCallerArraysAndAgrees() {
        double[][] m = TestMatrices.make(TestMatrices.Kind.RANDOM, 150, 42L);
        double[] values = new double[8];
        double[][] vectors = new double[8][150];
        assertEquals(5, solver.lowestInto(m[0], m[1], 5, values, vectors));
        EigenPairs p = solver.lowest(m[0], m[1], 5);
        for (int j = 0; j < 5; j++) {
            assertEquals(p.value(j), values[j], 0.0);
            assertArrayEquals(p.vector(j), vectors[j], 0.0);
        }
        // Eigenvalues only: full bisection, while the eigenpair path finishes isolated eigenvalues by
        // their Rayleigh quotient; both are accurate to a few ulp of the norm.
        double[] only = new double[5];
        solver.lowestInto(m[0], m[1], 5, only, null);
        double norm = SymmetricTridiagonalMatrix.of(m[0], m[1]).normInf();
        assertArrayEquals(p.values(), only, 8 * Math.ulp(norm));
        // A different matrix in the same arrays.
        double[][] m2 = TestMatrices.make(TestMatrices.Kind.LAPLACIAN_POTENTIAL, 90, 7L);
        int got = solver.belowInto(m2[0], m2[1], 0.1, 8, values, vectors);
        EigenPairs q = solver.below(m2[0], m2[1], 0.1, 8);
        assertEquals(q.size(), got);
        for (int j = 0; j < got; j++) {
            assertEquals(q.value(j), values[j], 0.0);
        }
    }

    @Example
    void matrixInterfaceAcceptsTridiagonalFormsOnly() {
        double[][] m = TestMatrices.make(TestMatrices.Kind.RANDOM, 30, 3L);
        SymmetricTridiagonalMatrix t = SymmetricTridiagonalMatrix.of(m[0], m[1]);
        EigenPairs viaMatrix = solver.lowest(t, 4);
        EigenPairs viaSparse = solver.lowest(SparseSymmetricMatrix.of(t), 4);
        EigenPairs viaArrays = solver.lowest(m[0], m[1], 4);
        assertArrayEquals(viaArrays.values(), viaMatrix.values(), 0.0);
        assertArrayEquals(viaArrays.values(), viaSparse.values(), 0.0);
        assertEquals(viaArrays.size(), solver.below(t, 10.0, 4).size());

        SparseSymmetricMatrix penta = SparseSymmetricMatrix.builder(5)
                .add(0, 0, 1).add(1, 1, 1).add(2, 2, 1).add(3, 3, 1).add(4, 4, 1).add(0, 2, 0.1).build();
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, () -> solver.lowest(penta, 2));
        assertTrue(ex.getMessage().contains("bandwidth = 2"), ex.getMessage());
        assertTrue(ex.getMessage().contains("[0, 1]"), ex.getMessage());
        assertTrue(ex.getMessage().contains("tridiagonal matrices only"), ex.getMessage());
    }

    @Example
    void badInputIsRejectedWithNamedParameterValueAndRange() {
        double[] d = {1, 2, 3};
        double[] e = {1, 1};
        assertMessage(() -> solver.lowest(d, e, 0), "k = 0 is outside the allowed range [1, 3]");
        assertMessage(() -> solver.lowest(d, e, 4), "k = 4 is outside the allowed range [1, 3]");
        assertMessage(() -> solver.below(d, e, 1.0, 0), "kMax = 0 is outside the allowed range [1, 3]");
        assertMessage(() -> solver.lowest(d, new double[] {1}, 1), "off.length = 1 is outside the allowed range [2, 2]");
        assertMessage(() -> solver.lowest(new double[] {1, Double.NaN, 3}, e, 1), "diag[1] = NaN");
        assertMessage(() -> solver.lowest(d, new double[] {1, Double.POSITIVE_INFINITY}, 1), "off[1] = Infinity");
        assertMessage(() -> solver.below(d, e, Double.NaN, 1), "bound = NaN");
        assertMessage(() -> SymmetricTridiagonalEigen.countBelow(d, e, Double.NaN), "x = NaN");
        assertMessage(() -> solver.lowest(new double[0], new double[0], 1), "diag.length = 0");
        assertMessage(() -> solver.lowestInto(d, e, 2, new double[1], null), "valuesOut.length = 1");
        assertMessage(() -> solver.lowestInto(d, e, 2, new double[2], new double[][] {new double[3], new double[2]}),
                "vectorsOut[1].length = 2");
        assertMessage(() -> EigenPairs.of(new double[] {2, 1}, new double[][] {{1}, {1}}), "values[1] = 1.0");
    }

    static void assertMessage(org.junit.jupiter.api.function.Executable call, String expectedPart) {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, call);
        assertTrue(ex.getMessage().contains(expectedPart), "message '" + ex.getMessage() + "' lacks '" + expectedPart + "'");
    }
}
