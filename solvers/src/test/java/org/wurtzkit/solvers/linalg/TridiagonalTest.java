package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
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
import org.ejml.dense.row.CommonOps_DDRM;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitError;

/** Checks {@link Tridiagonal} by hand-worked cases and against EJML's dense LU solver. */
class TridiagonalTest {

    @Example
    void handWorkedSymmetricCase() {
        // [[2,-1,0],[-1,2,-1],[0,-1,2]] x = [1,0,1] has x = [1,1,1] (worked by hand).
        double[] x = Tridiagonal.solve(new double[] {-1, -1}, new double[] {2, 2, 2}, new double[] {-1, -1},
                new double[] {1, 0, 1});
        assertArrayEquals(new double[] {1, 1, 1}, x, 1e-15);
    }

    @Example
    void handWorkedNonSymmetricCase() {
        // A = [[4,1,0],[2,5,1],[0,3,6]], x = [1,2,3] gives rhs = [6, 15, 24] (worked by hand).
        // Thomas: c'0 = 1/4, d'0 = 6/4; p1 = 5 - 2/4 = 4.5, c'1 = 1/4.5, d'1 = (15 - 3)/4.5 = 8/3;
        // p2 = 6 - 3/4.5 = 16/3, d'2 = (24 - 8)/(16/3) = 3; x1 = 8/3 - 3/4.5 = 2; x0 = 1.5 - 0.5 = 1.
        double[] x = Tridiagonal.solve(new double[] {2, 3}, new double[] {4, 5, 6}, new double[] {1, 1},
                new double[] {6, 15, 24});
        assertArrayEquals(new double[] {1, 2, 3}, x, 1e-14);
    }

    @Property(tries = 80)
    void agreesWithDenseLuOnRandomDiagonallyDominantSystems(@ForAll @IntRange(min = 1, max = 300) int n,
                                                            @ForAll long seed) {
        Random rnd = new Random(seed);
        double[] sub = new double[n - 1];
        double[] sup = new double[n - 1];
        double[] diag = new double[n];
        double[] rhs = new double[n];
        for (int i = 0; i < n - 1; i++) {
            sub[i] = 2 * rnd.nextDouble() - 1;
            sup[i] = 2 * rnd.nextDouble() - 1;
        }
        for (int i = 0; i < n; i++) {
            double off = (i > 0 ? Math.abs(sub[i - 1]) : 0) + (i < n - 1 ? Math.abs(sup[i]) : 0);
            diag[i] = (rnd.nextBoolean() ? 1 : -1) * (off + 0.01 + rnd.nextDouble());
            rhs[i] = 10 * rnd.nextDouble() - 5;
        }
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        for (int i = 0; i < n; i++) {
            a.set(i, i, diag[i]);
            if (i < n - 1) {
                a.set(i, i + 1, sup[i]);
                a.set(i + 1, i, sub[i]);
            }
        }
        DMatrixRMaj b = new DMatrixRMaj(n, 1, true, rhs);
        DMatrixRMaj ref = new DMatrixRMaj(n, 1);
        assertTrue(CommonOps_DDRM.solve(a, b, ref), "EJML dense LU failed");

        double[] x = new double[n];
        double[] work = new double[n + 3]; // longer than needed is allowed
        Tridiagonal.solve(sub, diag, sup, rhs, x, work);
        double scale = 0.0;
        for (int i = 0; i < n; i++) {
            scale = Math.max(scale, Math.abs(ref.data[i]));
        }
        for (int i = 0; i < n; i++) {
            assertEquals(ref.data[i], x[i], 1e-12 * Math.max(scale, 1.0), "x[" + i + "]");
        }
        // Residual through the library's own product, and in-place solution (x aliasing rhs).
        double[] y = new double[n];
        Tridiagonal.multiply(sub, diag, sup, x, y);
        for (int i = 0; i < n; i++) {
            assertEquals(rhs[i], y[i], 1e-12 * 10);
        }
        double[] inPlace = rhs.clone();
        Tridiagonal.solve(sub, diag, sup, inPlace, inPlace, work);
        assertArrayEquals(x, inPlace, 0.0);
    }

    @Example
    void zeroAndNearZeroPivotsNameTheRow() {
        SingularPivotException first = assertThrows(SingularPivotException.class,
                () -> Tridiagonal.solve(new double[] {1}, new double[] {0, 1}, new double[] {1}, new double[] {1, 1}));
        assertEquals(0, first.row());
        assertTrue(first.getMessage().contains("row 0"), first.getMessage());

        // [[1,1],[1,1]] is singular: the second pivot is 1 - 1*1 = 0.
        SingularPivotException second = assertThrows(SingularPivotException.class,
                () -> Tridiagonal.solve(new double[] {1}, new double[] {1, 1}, new double[] {1}, new double[] {1, 2}));
        assertEquals(1, second.row());
        assertEquals(0.0, second.pivot(), 0.0);

        // Near-singular: second pivot 1e-17 relative to a row of size ~2.
        SingularPivotException near = assertThrows(SingularPivotException.class,
                () -> Tridiagonal.solve(new double[] {1}, new double[] {1, 1 + 1e-17}, new double[] {1},
                        new double[] {1, 2}));
        assertEquals(1, near.row());
        // one error family: a library exception with a kind, not a bare ArithmeticException
        assertEquals(ErrorKind.SINGULAR_MATRIX, near.kind());
        assertTrue(near instanceof WurtzkitError);
    }

    @Example
    void badInputIsRejected() {
        double[] d = {2, 2, 2};
        double[] o = {-1, -1};
        double[] r = {1, 1, 1};
        assertMessage(() -> Tridiagonal.solve(new double[] {-1}, d, o, r), "sub.length = 1 is outside the allowed range [2, 2]");
        assertMessage(() -> Tridiagonal.solve(o, d, new double[3], r), "sup.length = 3 is outside the allowed range [2, 2]");
        assertMessage(() -> Tridiagonal.solve(o, d, o, new double[2]), "rhs.length = 2");
        assertMessage(() -> Tridiagonal.solve(o, new double[] {2, Double.NaN, 2}, o, r), "diag[1] = NaN");
        assertMessage(() -> Tridiagonal.solve(o, d, o, new double[] {1, 1, Double.NEGATIVE_INFINITY}), "rhs[2] = -Infinity");
        assertMessage(() -> Tridiagonal.solve(o, d, o, r, new double[3], new double[2]), "work.length = 2");
        double[] w = new double[3];
        assertMessage(() -> Tridiagonal.solve(o, d, o, r, w, w), "work");
        assertMessage(() -> Tridiagonal.solve(o, new double[0], o, r), "diag.length = 0");
        assertMessage(() -> Tridiagonal.multiply(o, d, o, r, r), "y = the same array as x");
    }

    @Example
    void workArraysCanBeReusedAcrossSolves() {
        double[] work = new double[5];
        double[] x = new double[5];
        double[] sub = {1, 1, 1, 1};
        double[] sup = {1, 1, 1, 1};
        double[] d1 = {4, 4, 4, 4, 4};
        double[] d2 = {-5, -5, -5, -5, -5};
        double[] rhs = {1, 2, 3, 4, 5};
        Tridiagonal.solve(sub, d1, sup, rhs, x, work);
        double[] x1 = x.clone();
        Tridiagonal.solve(sub, d2, sup, rhs, x, work);
        assertArrayEquals(Tridiagonal.solve(sub, d1, sup, rhs), x1, 0.0);
        assertArrayEquals(Tridiagonal.solve(sub, d2, sup, rhs), x, 0.0);
    }
}
