package org.wurtzkit.solvers.linalg;

import java.util.Random;

/** Families of symmetric tridiagonal test matrices {@code {diag, off}}. */
final class TestMatrices {

    private TestMatrices() {
    }

    /** Kinds of generated matrices. */
    enum Kind {
        /** Uniform random entries in [-1, 1]. */
        RANDOM,
        /**
         * Diagonal values repeated from a set of three, off-diagonals tiny (1e-14..1e-6) or
         * exactly zero: clusters of near-degenerate and exactly degenerate eigenvalues.
         */
        REPEATED_TINY_OFF,
        /**
         * Copies of Wilkinson's W21+ glued by tiny off-diagonals (1e-14..1e-8): every eigenvalue
         * of W21+ becomes a tight cluster ("glued Wilkinson matrices", a standard hard case for
         * tridiagonal eigenvector methods, e.g. in the experiments of I. S. Dhillon and
         * B. N. Parlett, Linear Algebra Appl. 387, 1 (2004) [from memory, not checked]).
         */
        GLUED_WILKINSON,
        /** Wilkinson's W_n+ pattern, diag |c - i| with c = (n-1)/2, off 1 (Wilkinson 1965 [from memory]). */
        WILKINSON,
        /** Discrete Laplacian plus random potential, -1 off-diagonal: a Hamiltonian-like matrix. */
        LAPLACIAN_POTENTIAL,
        /** Random entries scaled by 10^s, s uniform in [-30, 30]. */
        SCALED
    }

    /** Builds a matrix of the given kind and order from a seed. */
    static double[][] make(Kind kind, int n, long seed) {
        Random rnd = new Random(seed);
        double[] d = new double[n];
        double[] e = new double[n - 1];
        switch (kind) {
            case RANDOM:
                for (int i = 0; i < n; i++) {
                    d[i] = 2 * rnd.nextDouble() - 1;
                }
                for (int i = 0; i < n - 1; i++) {
                    e[i] = 2 * rnd.nextDouble() - 1;
                }
                break;
            case REPEATED_TINY_OFF: {
                double[] levels = {-1.0, 0.0, 0.5};
                for (int i = 0; i < n; i++) {
                    d[i] = levels[rnd.nextInt(3)];
                }
                for (int i = 0; i < n - 1; i++) {
                    e[i] = rnd.nextInt(5) == 0 ? 0.0
                            : (rnd.nextBoolean() ? 1 : -1) * Math.pow(10, -6 - 8 * rnd.nextDouble());
                }
                break;
            }
            case GLUED_WILKINSON: {
                double glue = Math.pow(10, -8 - 6 * rnd.nextDouble());
                for (int i = 0; i < n; i++) {
                    d[i] = Math.abs(10 - (i % 21));
                }
                for (int i = 0; i < n - 1; i++) {
                    e[i] = (i % 21 == 20) ? glue : 1.0;
                }
                break;
            }
            case WILKINSON:
                return wilkinsonPlus(n);
            case LAPLACIAN_POTENTIAL:
                for (int i = 0; i < n; i++) {
                    d[i] = 2.0 + 0.01 * rnd.nextDouble();
                }
                for (int i = 0; i < n - 1; i++) {
                    e[i] = -1.0;
                }
                break;
            case SCALED: {
                double s = Math.pow(10, -30 + 60 * rnd.nextDouble());
                for (int i = 0; i < n; i++) {
                    d[i] = s * (2 * rnd.nextDouble() - 1);
                }
                for (int i = 0; i < n - 1; i++) {
                    e[i] = s * (2 * rnd.nextDouble() - 1);
                }
                break;
            }
            default:
                throw new IllegalStateException(kind.toString());
        }
        return new double[][] {d, e};
    }

    /**
     * Wilkinson's matrix W_n+: diagonal |(n-1)/2 - i|, off-diagonal 1 (J. H. Wilkinson, <i>The
     * Algebraic Eigenvalue Problem</i>, Oxford 1965, Ch. 5 [from memory]). For n = 21 its
     * largest eigenvalues come in pairs that agree to many digits.
     */
    static double[][] wilkinsonPlus(int n) {
        double[] d = new double[n];
        double[] e = new double[n - 1];
        double c = 0.5 * (n - 1);
        for (int i = 0; i < n; i++) {
            d[i] = Math.abs(c - i);
        }
        java.util.Arrays.fill(e, 1.0);
        return new double[][] {d, e};
    }
}
