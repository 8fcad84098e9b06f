package org.wurtzkit.solvers.linalg;

import java.util.SplittableRandom;
import org.wurtzkit.errors.Require;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.CommonOps_DSCC;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

/**
 * Eigenpairs of a general sparse real symmetric matrix {@code A} (for example a banded
 * Hamiltonian) by shift-invert Lanczos with full re-orthogonalisation.
 *
 * <p>Method: {@code A - sigma I} is factorised once by sparse LU with partial pivoting (EJML's
 * up-looking LU, {@code LinearSolverFactory_DSCC.lu}); the Lanczos recurrence (C. Lanczos,
 * J. Res. Natl. Bur. Stand. 45, 255 (1950) [from memory]) is run on the operator
 * {@code (A - sigma I)^{-1}}, whose largest-magnitude eigenvalues {@code theta = 1/(lambda -
 * sigma)} belong to the eigenvalues {@code lambda} of {@code A} nearest to {@code sigma}
 * (T. Ericsson and A. Ruhe, Math. Comp. 35, 1251 (1980) [from memory]). Every new Lanczos vector
 * is orthogonalised against all previous ones twice (full re-orthogonalisation, Golub &amp; Van
 * Loan, <i>Matrix Computations</i>, 4th ed. 2013, Sec. 10.3 [from memory]; Parlett, <i>The
 * Symmetric Eigenvalue Problem</i>, 1980 [from memory]), so no spurious copies appear. If the
 * Krylov space becomes invariant, the recurrence is continued with a fresh random vector
 * orthogonal to the basis. The small Lanczos tridiagonal matrix is diagonalised with
 * {@link SymmetricTridiagonalEigen}. A Ritz pair is accepted when its explicit residual
 * {@code ||A y - lambda y||_2} is at most {@code relativeTolerance · ||A||_inf}.
 *
 * <p>{@link #lowest} places {@code sigma} just below the lowest eigenvalue, located by bisection
 * on the positive definiteness of {@code A - sigma I} (sparse Cholesky), so the eigenvalues nearest
 * to {@code sigma} are the lowest ones and the inverted spectrum is well separated. Limitation of single-vector Lanczos: of an eigenvalue with exact multiplicity
 * above one, copies beyond the first are found only if the Krylov space exhausts itself (the
 * restart then picks them up) or reaches the full dimension; for tridiagonal matrices with
 * non-zero off-diagonals all eigenvalues are simple.
 *
 * <p>Not thread-safe (one instance per thread); per call it allocates the Krylov basis
 * ({@code maxKrylovDimension} vectors of length n at most) and the sparse factorisation.
 */
public final class SparseLanczosEigen implements SymmetricEigenSolver {

    /**
     * Relative width, with respect to the Gershgorin interval, to which {@link #lowest} brackets
     * the lowest eigenvalue before placing its shift.
     */
    public static final double SHIFT_RESOLUTION = 1e-5;

    /**
     * Distance, relative to the Gershgorin width, that {@link #lowest} keeps between its shift and
     * the lowest eigenvalue. A closer shift separates the lowest eigenvalues better but makes
     * {@code A - sigma I} worse conditioned; the error of an eigenvalue {@code lambda} grows like
     * {@code eps (lambda - sigma)² / (lambda_min - sigma)}, which this distance keeps below
     * {@code 1e4 eps} times the Gershgorin width (common practice, no source).
     */
    public static final double SHIFT_OFFSET = 1e-4;

    /** Default relative residual tolerance. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-11;

    private static final double EPS = Math.ulp(1.0);
    private static final long SEED = 0x3C6EF372FE94F82BL;

    private final double relativeTolerance;
    private final int maxKrylovDimension;
    private final SymmetricTridiagonalEigen small = new SymmetricTridiagonalEigen();
    private SplittableRandom rng;

    /**
     * Creates a solver with {@link #DEFAULT_RELATIVE_TOLERANCE} and an automatic Krylov
     * dimension limit of {@code max(120, 20 k)} vectors (never more than the matrix order).
     */
    public SparseLanczosEigen() {
        this.relativeTolerance = DEFAULT_RELATIVE_TOLERANCE;
        this.maxKrylovDimension = 0;
    }

    /**
     * Creates a solver with explicit settings.
     *
     * @param relativeTolerance  residual tolerance relative to {@code ||A||_inf}, in
     *                           {@code [1e-14, 1e-3]}
     * @param maxKrylovDimension largest number of Lanczos vectors kept, in
     *                           {@code [1, Integer.MAX_VALUE]}; the matrix order is a further
     *                           natural limit (the Krylov space cannot be larger)
     * @throws IllegalArgumentException if a setting is out of range
     */
    public SparseLanczosEigen(double relativeTolerance, int maxKrylovDimension) {
        if (!(relativeTolerance >= 1e-14 && relativeTolerance <= 1e-3)) {
            throw Require.invalid("relativeTolerance", relativeTolerance, "[1.0E-14, 0.001]");
        }
        Require.inRange("maxKrylovDimension", maxKrylovDimension, 1, Integer.MAX_VALUE);
        this.relativeTolerance = relativeTolerance;
        this.maxKrylovDimension = maxKrylovDimension;
    }

    /**
     * {@inheritDoc}
     *
     * <p>The shift is placed just below the lowest eigenvalue, so that the eigenvalues nearest to
     * it are the lowest ones and the inverted spectrum is well spread: {@code A - sigma I} is
     * positive definite exactly when {@code sigma < lambda_min} (Sylvester's law of inertia;
     * Golub &amp; Van Loan 2013, Sec. 8.1 [from memory]), which a sparse Cholesky factorisation
     * tests cheaply. Bisection on that test between the Gershgorin lower bound and
     * {@code min_i A_ii} (both bounds of {@code lambda_min}) narrows {@code lambda_min} to a
     * bracket {@code [lo, hi]} of width at most {@link #SHIFT_RESOLUTION} times the Gershgorin
     * width, and {@code sigma = lo - }{@link #SHIFT_OFFSET}{@code · (gu - gl)}.
     *
     * @throws ArithmeticException if the Ritz pairs do not converge within the Krylov limit
     */
    @Override
    public EigenPairs lowest(SymmetricMatrix matrix, int k) {
        if (matrix == null) {
            throw Require.invalid("matrix", "null", "(a non-null matrix)");
        }
        return solve(matrix, k, shiftBelowSpectrum(matrix));
    }

    /** Bisection on positive definiteness of A - sigma I (see {@link #lowest}). */
    private static double shiftBelowSpectrum(SymmetricMatrix matrix) {
        DMatrixSparseCSC a = toCsc(matrix);
        int n = matrix.size();
        double gl = matrix.gershgorinLowerBound();
        double gu = matrix.gershgorinUpperBound();
        double span = gu - gl;
        double scale = Math.max(matrix.normInf(), Double.MIN_NORMAL);
        if (!(span > 64.0 * EPS * scale)) {
            span = Math.max(64.0 * EPS * scale, Double.MIN_NORMAL); // (numerically) a multiple of I
        }
        double minDiagonal = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            minDiagonal = Math.min(minDiagonal, matrix.get(i, i));
        }
        double resolution = SHIFT_RESOLUTION * span;
        double lo = gl - resolution;
        double hi = Math.max(minDiagonal, lo + resolution);
        DMatrixSparseCSC identity = CommonOps_DSCC.identity(n);
        // Gershgorin guarantees definiteness at lo in exact arithmetic; step down if rounding
        // says otherwise.
        for (int guard = 0; guard < 60 && !positiveDefinite(a, identity, lo); guard++) {
            lo -= resolution * Math.scalb(1.0, guard);
        }
        while (hi - lo > resolution) {
            double mid = 0.5 * (lo + hi);
            if (!(mid > lo && mid < hi)) {
                break;
            }
            if (positiveDefinite(a, identity, mid)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo - SHIFT_OFFSET * span;
    }

    private static boolean positiveDefinite(DMatrixSparseCSC a, DMatrixSparseCSC identity, double sigma) {
        DMatrixSparseCSC shifted = CommonOps_DSCC.add(1.0, a, -sigma, identity, null, null, null);
        return LinearSolverFactory_DSCC.cholesky(FillReducing.NONE).setA(shifted);
    }

    /**
     * The {@code k} eigenpairs whose eigenvalues are nearest to {@code sigma}, returned in
     * ascending order of eigenvalue.
     *
     * @param matrix the matrix
     * @param k      number of eigenpairs, in {@code [1, min(n, maxKrylovDimension)]}
     * @param sigma  the shift; {@code A - sigma I} must be non-singular
     * @return eigenpairs, ascending
     * @throws IllegalArgumentException if an argument is invalid or {@code A - sigma I} is
     *                                  numerically singular (sigma hits an eigenvalue)
     * @throws ArithmeticException      if the Ritz pairs do not converge within the Krylov limit
     */
    public EigenPairs nearest(SymmetricMatrix matrix, int k, double sigma) {
        if (matrix == null) {
            throw Require.invalid("matrix", "null", "(a non-null matrix)");
        }
        Require.finite("sigma", sigma);
        return solve(matrix, k, sigma);
    }

    // ------------------------------------------------------------------ implementation

    private EigenPairs solve(SymmetricMatrix matrix, int k, double sigma) {
        int n = matrix.size();
        int cap = maxKrylovDimension > 0 ? Math.min(n, maxKrylovDimension) : Math.min(n, Math.max(120, 20 * k));
        Require.inRange("k", k, 1, cap);

        DMatrixSparseCSC a = toCsc(matrix);
        DMatrixSparseCSC shifted = CommonOps_DSCC.add(1.0, a, -sigma, CommonOps_DSCC.identity(n), null, null, null);
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        if (!lu.setA(shifted)) {
            throw Require.invalid("sigma", sigma, "(values for which A - sigma I is non-singular)");
        }
        DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
        DMatrixRMaj sol = new DMatrixRMaj(n, 1);

        double normA = Math.max(matrix.normInf(), Double.MIN_NORMAL);
        double normShifted = normA + Math.abs(sigma);
        double tol = relativeTolerance * normA;

        double[][] basis = new double[cap + 1][];
        double[] alpha = new double[cap];
        double[] beta = new double[cap];
        double[] topValues = new double[cap];
        double[][] topVectors = new double[Math.min(k, cap)][cap];
        double[] lowValues = new double[cap];
        double[][] lowVectors = new double[Math.min(k, cap)][cap];
        double[] w = new double[n];
        double[] av = new double[n];

        // Selected Ritz pairs of the last check.
        double[] ritzTheta = new double[k];
        double[][] ritzS = new double[k][];
        double[][] ritzVectors = new double[k][n];
        double[] ritzLambda = new double[k];

        rng = new SplittableRandom(SEED);
        basis[0] = new double[n];
        randomUnit(basis[0], n, basis, 0);
        int minSteps = Math.min(cap, Math.max(k, Math.min(n, 2 * k + 10)));
        double opScale = 0.0;

        for (int j = 0; j < cap; j++) {
            double[] vj = basis[j];
            System.arraycopy(vj, 0, rhs.data, 0, n);
            lu.solve(rhs, sol);
            System.arraycopy(sol.data, 0, w, 0, n);
            if (!allFinite(w, n)) {
                throw Require.invalid("sigma", sigma, "(values for which A - sigma I is numerically non-singular)");
            }
            double aj = dot(vj, w, n);
            axpy(-aj, vj, w, n);
            if (j > 0) {
                axpy(-beta[j - 1], basis[j - 1], w, n);
            }
            for (int pass = 0; pass < 2; pass++) {
                for (int i = 0; i <= j; i++) {
                    double c = dot(basis[i], w, n);
                    axpy(-c, basis[i], w, n);
                    if (i == j) {
                        aj += c;
                    }
                }
            }
            alpha[j] = aj;
            double bj = norm2(w, n);
            opScale = Math.max(opScale, Math.abs(aj) + bj + (j > 0 ? beta[j - 1] : 0.0));
            int m = j + 1;
            boolean breakdown = bj <= 1e3 * EPS * opScale || m == n;
            beta[j] = breakdown ? 0.0 : bj;

            if (m >= minSteps && (breakdown || m % 5 == 0 || m == cap)) {
                if (checkConverged(m, k, alpha, beta, bj, breakdown,
                        topValues, topVectors, lowValues, lowVectors, ritzTheta, ritzS,
                        normShifted, tol)) {
                    // Form the Ritz vectors and verify the true residuals.
                    boolean ok = true;
                    for (int r = 0; r < k; r++) {
                        double[] y = ritzVectors[r];
                        java.util.Arrays.fill(y, 0.0);
                        double[] s = ritzS[r];
                        for (int i = 0; i < m; i++) {
                            axpy(s[i], basis[i], y, n);
                        }
                        double ny = norm2(y, n);
                        for (int i = 0; i < n; i++) {
                            y[i] /= ny;
                        }
                        double lambda = sigma + 1.0 / ritzTheta[r];
                        ritzLambda[r] = lambda;
                        matrix.multiply(y, av);
                        double res = 0.0;
                        for (int i = 0; i < n; i++) {
                            double t = av[i] - lambda * y[i];
                            res += t * t;
                        }
                        if (!(Math.sqrt(res) <= tol)) {
                            ok = false;
                            break;
                        }
                    }
                    if (ok) {
                        return assemble(k, n, ritzLambda, ritzVectors);
                    }
                }
            }
            if (m == n) {
                break;
            }
            double[] next = new double[n];
            basis[j + 1] = next;
            if (breakdown) {
                randomUnit(next, n, basis, j + 1);
            } else {
                double inv = 1.0 / bj;
                for (int i = 0; i < n; i++) {
                    next[i] = w[i] * inv;
                }
            }
        }
        throw new EigenSolverException(-1, "shift-invert Lanczos did not reach the relative residual "
                + relativeTolerance + " for the " + k + " eigenpairs nearest to sigma = " + sigma
                + " within " + cap + " Lanczos vectors; raise maxKrylovDimension");
    }

    /**
     * Diagonalises the m x m Lanczos matrix, selects the k Ritz values of largest |theta| and
     * tests the residual estimates |beta_m s_m| ||A - sigma I|| / |theta| against tol.
     */
    private boolean checkConverged(int m, int k, double[] alpha, double[] beta, double betaLast,
                                   boolean breakdown,
                                   double[] topValues, double[][] topVectors,
                                   double[] lowValues, double[][] lowVectors,
                                   double[] ritzTheta, double[][] ritzS,
                                   double normShifted, double tol) {
        // Exact-length copies of the m x m Lanczos matrix T and of -T (one small allocation
        // per convergence check, none per Lanczos step).
        double[] diagm = new double[m];
        double[] offm = new double[m - 1];
        double[] negDiag = new double[m];
        double[] negOff = new double[m - 1];
        for (int i = 0; i < m; i++) {
            diagm[i] = alpha[i];
            negDiag[i] = -alpha[i];
        }
        for (int i = 0; i < m - 1; i++) {
            offm[i] = beta[i];
            negOff[i] = -beta[i];
        }
        // Largest theta: lowest of -T. Smallest (most negative) theta: lowest of T.
        small.lowestInto(negDiag, negOff, k, topValues, topVectors);
        small.lowestInto(diagm, offm, k, lowValues, lowVectors);
        // Merge by |theta|, largest first.
        int it = 0;
        int il = 0;
        for (int r = 0; r < k; r++) {
            double thetaTop = -topValues[it];
            double thetaLow = lowValues[il];
            boolean takeTop = thetaLow >= 0.0 || Math.abs(thetaTop) >= Math.abs(thetaLow);
            if (takeTop) {
                ritzTheta[r] = thetaTop;
                ritzS[r] = topVectors[it];
                it++;
            } else {
                ritzTheta[r] = thetaLow;
                ritzS[r] = lowVectors[il];
                il++;
            }
        }
        double coupling = breakdown ? 0.0 : betaLast;
        for (int r = 0; r < k; r++) {
            double est = Math.abs(coupling * ritzS[r][m - 1]) * normShifted / Math.abs(ritzTheta[r]);
            if (!(est <= tol) || ritzTheta[r] == 0.0) {
                return false;
            }
        }
        return true;
    }

    private static EigenPairs assemble(int k, int n, double[] lambda, double[][] vectors) {
        int[] order = new int[k];
        for (int i = 0; i < k; i++) {
            int t = i;
            while (t > 0 && lambda[order[t - 1]] > lambda[i]) { // insertion sort, k is small
                order[t] = order[t - 1];
                t--;
            }
            order[t] = i;
        }
        double[] values = new double[k];
        double[][] vecs = new double[k][];
        for (int i = 0; i < k; i++) {
            values[i] = lambda[order[i]];
            double[] v = vectors[order[i]].clone();
            SymmetricTridiagonalEigen.fixSign(v, n);
            vecs[i] = v;
        }
        return new EigenPairs(values, vecs, n);
    }

    /** The matrix in EJML compressed-column form (internal; not exposed). */
    static DMatrixSparseCSC toCsc(SymmetricMatrix matrix) {
        if (matrix instanceof SparseSymmetricMatrix) {
            return ((SparseSymmetricMatrix) matrix).cscRef();
        }
        return SparseSymmetricMatrix.of((SymmetricTridiagonalMatrix) matrix).cscRef();
    }

    /** Fills v with a random unit vector orthogonal to basis[0..count-1]. */
    private void randomUnit(double[] v, int n, double[][] basis, int count) {
        for (int attempt = 0; attempt < 10; attempt++) {
            for (int i = 0; i < n; i++) {
                v[i] = 2.0 * rng.nextDouble() - 1.0 + 0x1.0p-53;
            }
            for (int pass = 0; pass < 2; pass++) {
                for (int b = 0; b < count; b++) {
                    double c = dot(basis[b], v, n);
                    axpy(-c, basis[b], v, n);
                }
            }
            double nv = norm2(v, n);
            if (nv > 1e-8 * Math.sqrt(n)) {
                for (int i = 0; i < n; i++) {
                    v[i] /= nv;
                }
                return;
            }
        }
        throw new EigenSolverException(-1, "could not extend the Lanczos basis of " + count
                + " vectors in dimension " + n);
    }

    private static double dot(double[] a, double[] b, int n) {
        double s = 0.0;
        for (int i = 0; i < n; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    private static void axpy(double c, double[] x, double[] y, int n) {
        for (int i = 0; i < n; i++) {
            y[i] += c * x[i];
        }
    }

    private static double norm2(double[] x, int n) {
        return Math.sqrt(dot(x, x, n));
    }

    private static boolean allFinite(double[] x, int n) {
        for (int i = 0; i < n; i++) {
            if (!(x[i] - x[i] == 0.0)) {
                return false;
            }
        }
        return true;
    }
}
