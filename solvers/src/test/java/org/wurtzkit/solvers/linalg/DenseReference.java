package org.wurtzkit.solvers.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Reference results from EJML's dense routines (P. Abeles, EJML, https://ejml.org, version
 * 0.46.1), used only in tests, plus the shared eigenpair assertions.
 */
final class DenseReference {

    private DenseReference() {
    }

    /** Dense copy of a symmetric tridiagonal matrix. */
    static DMatrixRMaj tridiagonal(double[] d, double[] e) {
        int n = d.length;
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        for (int i = 0; i < n; i++) {
            a.set(i, i, d[i]);
        }
        for (int i = 0; i < n - 1; i++) {
            a.set(i, i + 1, e[i]);
            a.set(i + 1, i, e[i]);
        }
        return a;
    }

    /** Dense copy of any of our symmetric matrices, through its public get(). */
    static DMatrixRMaj dense(SymmetricMatrix m) {
        int n = m.size();
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a.set(i, j, m.get(i, j));
            }
        }
        return a;
    }

    /** All eigenvalues, ascending, from EJML's dense symmetric eigen-decomposition. */
    static double[] eigenvalues(DMatrixRMaj a) {
        int n = a.numRows;
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, true, true);
        assertTrue(eig.decompose(a.copy()), "EJML dense eigen-decomposition failed");
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = eig.getEigenvalue(i).getReal();
        }
        Arrays.sort(v);
        return v;
    }

    /** Spectral norm of a symmetric matrix from its (sorted) eigenvalues. */
    static double norm(double[] sortedEigenvalues) {
        return Math.max(Math.abs(sortedEigenvalues[0]), Math.abs(sortedEigenvalues[sortedEigenvalues.length - 1]));
    }

    /**
     * Asserts that {@code p} holds the lowest {@code p.size()} eigenpairs of {@code a}:
     * eigenvalues equal the dense ones to {@code 1e-10 ||A||}, residuals
     * {@code ||A v - lambda v|| <= 1e-9 ||A||}, vectors orthonormal to 1e-10.
     *
     * @return the largest observed (eigenvalue error, residual, orthogonality error), relative
     */
    static double[] assertLowestEigenpairs(DMatrixRMaj a, double[] denseSorted, EigenPairs p) {
        int n = a.numRows;
        int k = p.size();
        double norm = Math.max(norm(denseSorted), Double.MIN_NORMAL);
        double maxValueErr = 0.0;
        double maxRes = 0.0;
        double maxOrth = 0.0;
        assertEquals(n, p.dimension());
        DMatrixRMaj v = new DMatrixRMaj(n, 1);
        DMatrixRMaj av = new DMatrixRMaj(n, 1);
        double[][] vecs = p.vectors();
        for (int j = 0; j < k; j++) {
            double err = Math.abs(p.value(j) - denseSorted[j]) / norm;
            maxValueErr = Math.max(maxValueErr, err);
            assertTrue(err <= 1e-10, "eigenvalue " + j + ": " + p.value(j) + " vs dense "
                    + denseSorted[j] + " (relative error " + err + ")");
            if (j > 0) {
                assertTrue(p.value(j) >= p.value(j - 1), "eigenvalues not ascending at " + j);
            }
            System.arraycopy(vecs[j], 0, v.data, 0, n);
            CommonOps_DDRM.mult(a, v, av);
            double res = 0.0;
            for (int i = 0; i < n; i++) {
                double t = av.data[i] - p.value(j) * vecs[j][i];
                res += t * t;
            }
            res = Math.sqrt(res) / norm;
            maxRes = Math.max(maxRes, res);
            assertTrue(res <= 1e-9, "residual of eigenpair " + j + " is " + res + " ||A||");
        }
        for (int i = 0; i < k; i++) {
            for (int j = 0; j <= i; j++) {
                double dot = 0.0;
                for (int r = 0; r < n; r++) {
                    dot += vecs[i][r] * vecs[j][r];
                }
                double err = Math.abs(dot - (i == j ? 1.0 : 0.0));
                maxOrth = Math.max(maxOrth, err);
                assertTrue(err <= 1e-10, "<v" + i + ", v" + j + "> = " + dot);
            }
        }
        return new double[] {maxValueErr, maxRes, maxOrth};
    }
}
