package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.solvers.linalg.SymmetricTridiagonalEigenTest.assertMessage;

import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/** Checks the matrix types against dense EJML products and hand-worked values. */
class SparseSymmetricMatrixTest {

    @Example
    void builderMirrorsAndSumsDuplicates() {
        SparseSymmetricMatrix m = SparseSymmetricMatrix.builder(3)
                .add(0, 0, 1.0).add(0, 0, 2.0).add(2, 1, 5.0).add(1, 1, -1.0).add(0, 2, 0.5)
                .build();
        assertEquals(3.0, m.get(0, 0), 0.0);
        assertEquals(5.0, m.get(1, 2), 0.0);
        assertEquals(5.0, m.get(2, 1), 0.0);
        assertEquals(0.5, m.get(2, 0), 0.0);
        assertEquals(0.0, m.get(1, 0), 0.0);
        assertEquals(0.0, m.get(2, 2), 0.0);
        assertEquals(2, m.bandwidth());
        assertEquals(6, m.storedEntries()); // (0,0), (1,1), (1,2), (2,1), (0,2), (2,0)
        // Row sums by hand: row0 |3|+0.5, row1 |-1|+5, row2 5+0.5.
        assertEquals(6.0, m.normInf(), 0.0);
        assertEquals(Math.min(3 - 0.5, Math.min(-1 - 5, 0 - 5.5)), m.gershgorinLowerBound(), 0.0);
        assertEquals(Math.max(3 + 0.5, Math.max(-1 + 5, 0 + 5.5)), m.gershgorinUpperBound(), 0.0);
    }

    @Property(tries = 40)
    void productAndBoundsAgreeWithDense(@ForAll @IntRange(min = 1, max = 120) int n,
                                        @ForAll @IntRange(min = 0, max = 4) int band,
                                        @ForAll long seed) {
        Random rnd = new Random(seed);
        SparseSymmetricMatrix.Builder b = SparseSymmetricMatrix.builder(n);
        for (int i = 0; i < n; i++) {
            for (int j = i; j <= Math.min(n - 1, i + band); j++) {
                b.add(i, j, 2 * rnd.nextDouble() - 1);
            }
        }
        SparseSymmetricMatrix m = b.build();
        DMatrixRMaj a = DenseReference.dense(m);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextGaussian();
        }
        double[] y = new double[n];
        m.multiply(x, y);
        DMatrixRMaj ref = new DMatrixRMaj(n, 1);
        CommonOps_DDRM.mult(a, new DMatrixRMaj(n, 1, true, x), ref);
        assertArrayEquals(ref.data, y, 1e-12 * n);
        double[] ev = DenseReference.eigenvalues(a);
        assertTrue(m.gershgorinLowerBound() <= ev[0] + 1e-12);
        assertTrue(m.gershgorinUpperBound() >= ev[n - 1] - 1e-12);
        assertTrue(m.normInf() >= DenseReference.norm(ev) - 1e-12);
        assertTrue(m.bandwidth() <= Math.min(band, n - 1));
    }

    @Example
    void tridiagonalMatrixBasics() {
        SymmetricTridiagonalMatrix t = SymmetricTridiagonalMatrix.of(new double[] {1, 2, 3}, new double[] {4, 0});
        assertEquals(4.0, t.get(1, 0), 0.0);
        assertEquals(4.0, t.get(0, 1), 0.0);
        assertEquals(0.0, t.get(0, 2), 0.0);
        assertEquals(1, t.bandwidth());
        assertEquals(0, SymmetricTridiagonalMatrix.of(new double[] {1, 2}, new double[] {0}).bandwidth());
        assertEquals(6.0, t.normInf(), 0.0);
        assertEquals(-3.0, t.gershgorinLowerBound(), 0.0);
        assertEquals(6.0, t.gershgorinUpperBound(), 0.0);
        double[] y = new double[3];
        t.multiply(new double[] {1, 1, 1}, y);
        assertArrayEquals(new double[] {5, 6, 3}, y, 0.0);
        double[] copy = t.diagonal();
        copy[0] = 99;
        assertEquals(1.0, t.get(0, 0), 0.0);
    }

    @Example
    void badInputIsRejected() {
        assertMessage(() -> SparseSymmetricMatrix.builder(0), "size = 0 is outside the allowed range [1, 2147483647]");
        assertMessage(() -> SparseSymmetricMatrix.builder(3).add(3, 0, 1.0), "row = 3 is outside the allowed range [0, 2]");
        assertMessage(() -> SparseSymmetricMatrix.builder(3).add(0, -1, 1.0), "col = -1 is outside the allowed range [0, 2]");
        assertMessage(() -> SparseSymmetricMatrix.builder(3).add(0, 1, Double.NaN), "value = NaN");
        assertMessage(() -> SymmetricTridiagonalMatrix.of(new double[] {1, 2}, new double[] {1, 2}), "off.length = 2");
        SparseSymmetricMatrix m = SparseSymmetricMatrix.builder(2).add(0, 0, 1).build();
        assertMessage(() -> m.get(2, 0), "row = 2");
        assertMessage(() -> m.multiply(new double[3], new double[3]), "x.length = 3");
    }
}
