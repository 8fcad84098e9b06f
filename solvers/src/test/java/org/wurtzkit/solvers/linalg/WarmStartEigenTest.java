// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.ejml.data.DMatrixRMaj;

/**
 * The warm-started eigen-solve ({@link SymmetricTridiagonalEigen#lowestInto(double[], double[],
 * int, double[], double[][], double[], int, double)} and its {@code belowInto} twin): after a
 * diagonal change of at most r, the previous eigenvalues with radius r bracket the new ones
 * (Weyl's inequality for Hermitian matrices, e.g. R. A. Horn and C. R. Johnson, Matrix Analysis,
 * 2nd ed., Cambridge 2013, Cor. 4.3.15 [from memory]). The result is checked against EJML's dense
 * decomposition (an independent general-purpose library) and against the cold solve; wrong hints
 * must be detected and must not change the answer.
 */
class WarmStartEigenTest {

    /** Cold solve of the old matrix, then warm solve of the perturbed one with the old values as hints. */
    @Property(tries = 60)
    void warmStartGivesTheColdEigenpairs(@ForAll TestMatrices.Kind kind,
                                         @ForAll @IntRange(min = 2, max = 300) int n,
                                         @ForAll @IntRange(min = 1, max = 12) int kRequested,
                                         @ForAll @IntRange(min = -8, max = -1) int radiusExponent,
                                         @ForAll long seed) {
        double[][] m = TestMatrices.make(kind, n, seed);
        int k = Math.min(kRequested, n);
        double[] oldValues = new SymmetricTridiagonalEigen().lowest(m[0], m[1], k).values();
        double scale = 0.0;
        for (double x : m[0]) {
            scale = Math.max(scale, Math.abs(x));
        }
        for (double x : m[1]) {
            scale = Math.max(scale, Math.abs(x));
        }
        double radius = Math.pow(10, radiusExponent) * Math.max(scale, Double.MIN_NORMAL);
        Random rnd = new Random(seed);
        double[] newDiag = m[0].clone();
        for (int i = 0; i < n; i++) {
            newDiag[i] += radius * (2.0 * rnd.nextDouble() - 1.0);
        }
        SymmetricTridiagonalEigen warmSolver = new SymmetricTridiagonalEigen();
        double[] values = new double[k];
        double[][] vectors = new double[k][n];
        warmSolver.lowestInto(newDiag, m[1], k, values, vectors, oldValues, k, radius);
        assertEquals(0, warmSolver.rejectedHints(), "an exact Weyl bracket was rejected");

        DMatrixRMaj a = DenseReference.tridiagonal(newDiag, m[1]);
        double[] dense = DenseReference.eigenvalues(a);
        DenseReference.assertLowestEigenpairs(a, dense, new EigenPairs(values, vectors, n));
        double norm = Math.max(DenseReference.norm(dense), Double.MIN_NORMAL);
        double[] cold = new SymmetricTridiagonalEigen().lowest(newDiag, m[1], k).values();
        for (int j = 0; j < k; j++) {
            // same eigenvalues as the cold solve to 1e-12 of the norm (the target of issue 18)
            assertTrue(Math.abs(values[j] - cold[j]) <= 1e-12 * norm,
                    "eigenvalue " + j + ": warm " + values[j] + " cold " + cold[j]);
        }
    }

    /** Hints shifted well beyond their radius: every bracket fails its Sturm check, the answer stays right. */
    @Property(tries = 40)
    void wrongHintsAreDetectedAndDoNotChangeTheAnswer(@ForAll TestMatrices.Kind kind,
                                                      @ForAll @IntRange(min = 2, max = 300) int n,
                                                      @ForAll @IntRange(min = 1, max = 12) int kRequested,
                                                      @ForAll long seed) {
        double[][] m = TestMatrices.make(kind, n, seed);
        int k = Math.min(kRequested, n);
        DMatrixRMaj a = DenseReference.tridiagonal(m[0], m[1]);
        double[] dense = DenseReference.eigenvalues(a);
        double norm = DenseReference.norm(dense);
        if (!(norm > 0.0)) {
            return; // an all-zero matrix has no wrong hint below its eigenvalues worth testing
        }
        double[] hints = new double[k];
        for (int j = 0; j < k; j++) {
            hints[j] = dense[j] - 3.0 * norm; // far below the whole spectrum
        }
        SymmetricTridiagonalEigen solver = new SymmetricTridiagonalEigen();
        double[] values = new double[k];
        double[][] vectors = new double[k][n];
        solver.lowestInto(m[0], m[1], k, values, vectors, hints, k, 1e-3 * norm);
        assertEquals(k, solver.rejectedHints(), "wrong brackets not detected");
        DenseReference.assertLowestEigenpairs(a, dense, new EigenPairs(values, vectors, n));
    }

    @Example
    void warmBelowIntoFindsTheSameStatesAsCold() {
        // a discrete Laplacian plus a potential (a Hamiltonian-like matrix), potential shifted by
        // up to 1e-3: the warm call returns the same count and eigenvalues as the cold call
        double[][] m = TestMatrices.make(TestMatrices.Kind.LAPLACIAN_POTENTIAL, 400, 18L);
        SymmetricTridiagonalEigen solver = new SymmetricTridiagonalEigen();
        double bound = new SymmetricTridiagonalEigen().lowest(m[0], m[1], 8).value(7) + 1e-2;
        double[] old = new double[20];
        double[][] vec = new double[20][400];
        int oldCount = solver.belowInto(m[0], m[1], bound, 20, old, vec);
        double[] diag = m[0].clone();
        for (int i = 0; i < diag.length; i++) {
            diag[i] += 1e-3 * Math.sin(0.1 * i);
        }
        double[] warm = new double[20];
        int warmCount = solver.belowInto(diag, m[1], bound, 20, warm, vec, old, oldCount, 1e-3);
        double[] cold = new double[20];
        int coldCount = new SymmetricTridiagonalEigen().belowInto(diag, m[1], bound, 20, cold, null);
        assertEquals(coldCount, warmCount);
        for (int j = 0; j < coldCount; j++) {
            assertEquals(cold[j], warm[j], 1e-12 * 8.0, "eigenvalue " + j);
        }
    }

    @Example
    void invalidHintsAreRejectedWithTheirName() {
        double[] d = {2, 2, 2};
        double[] e = {-1, -1};
        double[] out = new double[2];
        SymmetricTridiagonalEigen s = new SymmetricTridiagonalEigen();
        IllegalArgumentException negative = assertThrows(IllegalArgumentException.class,
                () -> s.lowestInto(d, e, 2, out, null, new double[] {0.5, 2}, 2, -1.0));
        assertTrue(negative.getMessage().contains("hintRadius"), negative.getMessage());
        IllegalArgumentException unsorted = assertThrows(IllegalArgumentException.class,
                () -> s.lowestInto(d, e, 2, out, null, new double[] {2, 0.5}, 2, 0.1));
        assertTrue(unsorted.getMessage().contains("hints[1]"), unsorted.getMessage());
        IllegalArgumentException count = assertThrows(IllegalArgumentException.class,
                () -> s.lowestInto(d, e, 2, out, null, new double[] {0.5}, 2, 0.1));
        assertTrue(count.getMessage().contains("hintCount"), count.getMessage());
    }
}
