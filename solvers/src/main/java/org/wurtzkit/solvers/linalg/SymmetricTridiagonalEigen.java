package org.wurtzkit.solvers.linalg;

import java.util.SplittableRandom;
import org.wurtzkit.errors.Require;

/**
 * Lowest eigenpairs of a real symmetric tridiagonal matrix {@code T}, given by its diagonal
 * {@code diag[0..n-1]} and off-diagonal {@code off[0..n-2]}, in O(N·k) operations (plus
 * O(N·k²) for re-orthogonalisation inside clusters of close eigenvalues).
 *
 * <p><b>Eigenvalues</b> are located by Sturm-sequence bisection (W. Barth, R. S. Martin and
 * J. H. Wilkinson, "Calculation of the eigenvalues of a symmetric tridiagonal matrix by the
 * method of bisection", Numer. Math. 9, 386 (1967) [from memory]). The number of eigenvalues
 * below {@code x} equals the number of negative pivots {@code q_i} of the LDL<sup>T</sup>
 * factorisation of {@code T - xI}, {@code q_0 = d_0 - x}, {@code q_i = d_i - x - e_{i-1}²/q_{i-1}}.
 * A pivot with {@code |q_i| <= pivmin} is replaced by {@code -pivmin}, with
 * {@code pivmin = safmin · max(1, max e_i²)} evaluated on the matrix scaled by a power of two to
 * unit max-norm, so that {@code pivmin} is a tiny number relative to the norm; this is the rule of
 * LAPACK's {@code dstebz}/{@code dlaebz} (E. Anderson et al., <i>LAPACK Users' Guide</i>, 3rd ed.,
 * SIAM 1999 [from memory]). The search starts from the Gershgorin interval; all wanted eigenvalues
 * are bisected simultaneously (one sweep evaluates the counts at the midpoints of all distinct
 * brackets, as in LAPACK's {@code dlaebz}), every count narrows all brackets, and each eigenvalue
 * is bisected until its bracket is no wider than {@code 2 eps |lambda| + eps ||T||} (or cannot
 * be split in floating point).
 *
 * <p><b>Eigenvectors</b> are computed by inverse iteration with the shifted matrix
 * {@code T - sigma I}, factorised once per eigenvalue by Gaussian elimination with partial
 * pivoting (pivots below {@code eps ||T||} are perturbed to that size), from a pseudo-random
 * start vector (Golub &amp; Van Loan, <i>Matrix Computations</i>, 4th ed., Johns Hopkins 2013,
 * Sec. 8.2.2 and 8.4 [from memory]; J. H. Wilkinson, <i>The Algebraic Eigenvalue Problem</i>,
 * Oxford 1965, Ch. 9 [from memory]). The shift {@code sigma} is the bisection eigenvalue, except
 * that coincident eigenvalues get shifts separated by {@code 10 eps max(|lambda|, 1e-3 ||T||)}
 * (the shift-perturbation rule of LAPACK's {@code dstein}); the residual is always measured
 * against the bisection eigenvalue. Eigenvalues closer than {@link #CLUSTER_RELATIVE_GAP}
 * {@code · ||T||} to their predecessor form a cluster (the clustering rule of {@code dstein};
 * LAPACK Users' Guide, 1999 [from memory]), and each iterate is orthogonalised against the
 * cluster's earlier vectors by modified Gram-Schmidt, applied twice ("twice is enough": B. N.
 * Parlett, <i>The Symmetric Eigenvalue Problem</i>, Prentice-Hall 1980, Sec. 6.9 [from memory]).
 * Iteration stops one step after the explicit residual {@code ||T v - lambda v||} has reached
 * roundoff level (as {@code dstein} iterates further after its growth test), keeping the iterate
 * with the smallest residual. The returned vectors are therefore orthonormal also for
 * (near-)degenerate eigenvalues.
 *
 * <p>Instances keep work arrays between calls (no allocation once they have grown to the
 * problem size, except for the result objects of the allocating methods) and are not
 * thread-safe. Results are deterministic: the pseudo-random start vectors use a fixed seed.
 */
public final class SymmetricTridiagonalEigen {

    /**
     * Relative gap, with respect to the Gershgorin norm {@code max(|gl|, |gu|)}, below which two
     * consecutive eigenvalues are treated as one cluster for re-orthogonalisation. LAPACK
     * {@code dstein} uses 1e-3 [from memory]; inverse iteration leaves two vectors non-orthogonal
     * by about eps ||T|| / gap, so 1e-4 still keeps them orthogonal to ~2e-12 while sparing the
     * Gram-Schmidt sweeps over the well-separated subbands of a quantum well (whose spacing is
     * often below 1e-3 of a norm dominated by the kinetic term of a fine mesh).
     */
    public static final double CLUSTER_RELATIVE_GAP = 1e-4;

    private static final double EPS = Math.ulp(1.0);
    private static final double SAFE_MIN = Double.MIN_NORMAL;
    private static final int MAX_INVERSE_ITERATIONS = 12;
    /** Iterations done after the residual test first passes (dstein does two [from memory]). */
    private static final int EXTRA_ITERATIONS = 1;
    /** Relative bracket width at which a well-separated eigenvalue leaves bisection. */
    private static final double COARSE_RELATIVE_TOLERANCE = 1e-9;
    /** Below this order full bisection is cheap enough to use always. */
    private static final int COARSE_MIN_SIZE = 32;
    /** A coarse bracket counts as separated when its neighbours are this many coarse widths away. */
    private static final double COARSE_SEPARATION = 1e3;
    private static final long SEED = 0x2545F4914F6CDD1DL;

    private int capacity = -1;
    private double[] d;
    private double[] e;
    private double[] e2;
    private double[] lower;
    private double[] upper;
    /** Per eigenvalue: bisected only to the coarse tolerance, to be finished by a Rayleigh quotient. */
    private boolean[] coarse;
    private double[] scaledValues;
    /** Reciprocals of U's diagonal after factorShifted. */
    private double[] fa;
    private double[] fb;
    private double[] fc;
    private double[] fd;
    private boolean[] swapped;
    private double[] work;
    private int[] countWork;

    private double scale;
    private double pivmin;
    private double tnorm;
    private double gl;
    private double gu;
    private double lastPivotMagnitude;
    private SplittableRandom rng;

    /** Creates a solver with empty work space (it grows on first use). */
    public SymmetricTridiagonalEigen() {
    }

    // ------------------------------------------------------------------ public API

    /**
     * Sturm count: the number of eigenvalues of {@code T} smaller than {@code x} (an eigenvalue
     * within a few units of roundoff times {@code ||T||} of {@code x} may be counted either way,
     * and so may one within about {@link Double#MIN_NORMAL} of it: a pivot that small counts as
     * negative, which matters only for a matrix whose entries are near underflow).
     * O(N), no allocation. The pivot rule is that described in the class documentation.
     *
     * @param diag diagonal, length {@code n >= 1}, finite
     * @param off  off-diagonal, length {@code n-1}, finite
     * @param x    the point (not NaN; infinities allowed)
     * @return count in {@code [0, n]}
     * @throws IllegalArgumentException on null arrays, wrong lengths, non-finite entries or NaN x
     */
    public static int countBelow(double[] diag, double[] off, double x) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.notNaN("x", x);
        double s = scaleFor(maxAbs(diag, off, n));
        double maxE2 = 0.0;
        for (int i = 0; i < n - 1; i++) {
            double ei = off[i] * s;
            maxE2 = Math.max(maxE2, ei * ei);
        }
        double pmin = SAFE_MIN * Math.max(1.0, maxE2);
        double xs = x * s;
        double q = diag[0] * s - xs;
        if (Math.abs(q) <= pmin) {
            q = -pmin;
        }
        int count = q < 0.0 ? 1 : 0;
        for (int i = 1; i < n; i++) {
            double ei = off[i - 1] * s;
            q = diag[i] * s - xs - (ei * ei) / q;
            if (Math.abs(q) <= pmin) {
                q = -pmin;
            }
            if (q < 0.0) {
                count++;
            }
        }
        return count;
    }

    /**
     * The {@code k} smallest eigenpairs.
     *
     * @param diag diagonal, length {@code n >= 1}, finite
     * @param off  off-diagonal, length {@code n-1}, finite
     * @param k    number of eigenpairs, in {@code [1, n]}
     * @return eigenpairs, ascending
     * @throws IllegalArgumentException on invalid arrays or {@code k} out of range
     * @throws ArithmeticException      if inverse iteration fails to converge (not expected for
     *                                  finite input)
     */
    public EigenPairs lowest(double[] diag, double[] off, int k) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.inRange("k", k, 1, n);
        double[] values = new double[k];
        double[][] vectors = new double[k][n];
        lowestInto(diag, off, k, values, vectors);
        return new EigenPairs(values, vectors, n);
    }

    /**
     * All eigenpairs with eigenvalue below {@code bound}, at most {@code kMax} of them (the
     * lowest ones if there are more). The result may be empty.
     *
     * @param diag  diagonal, length {@code n >= 1}, finite
     * @param off   off-diagonal, length {@code n-1}, finite
     * @param bound upper energy bound (not NaN; {@code +Infinity} means no bound)
     * @param kMax  largest number of eigenpairs returned, in {@code [1, n]}
     * @return eigenpairs, ascending, {@code size() = min(countBelow(bound), kMax)}
     * @throws IllegalArgumentException on invalid arrays, NaN bound or {@code kMax} out of range
     * @throws ArithmeticException      if inverse iteration fails to converge
     */
    public EigenPairs below(double[] diag, double[] off, double bound, int kMax) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.notNaN("bound", bound);
        Require.inRange("kMax", kMax, 1, n);
        double[] values = new double[kMax];
        double[][] vectors = new double[kMax][n];
        int m = belowInto(diag, off, bound, kMax, values, vectors);
        double[] v = new double[m];
        System.arraycopy(values, 0, v, 0, m);
        double[][] vec = new double[m][];
        System.arraycopy(vectors, 0, vec, 0, m);
        return new EigenPairs(v, vec, n);
    }

    /**
     * Allocation-free form of {@link #lowest(double[], double[], int)}: writes the {@code k}
     * smallest eigenvalues into {@code valuesOut[0..k-1]} and, unless {@code vectorsOut} is null,
     * the unit eigenvectors into {@code vectorsOut[j][0..n-1]}.
     *
     * @param diag       diagonal, length {@code n >= 1}, finite
     * @param off        off-diagonal, length {@code n-1}, finite
     * @param k          number of eigenpairs, in {@code [1, n]}
     * @param valuesOut  output, length at least {@code k}
     * @param vectorsOut output, at least {@code k} rows of length at least {@code n}, or null for
     *                   eigenvalues only
     * @return {@code k}
     * @throws IllegalArgumentException on invalid arguments
     * @throws ArithmeticException      if inverse iteration fails to converge
     */
    public int lowestInto(double[] diag, double[] off, int k, double[] valuesOut, double[][] vectorsOut) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.inRange("k", k, 1, n);
        validateOutputs(valuesOut, vectorsOut, k, n);
        prepare(diag, off, n);
        bisect(n, k, gu, vectorsOut != null);
        finish(n, k, valuesOut, vectorsOut);
        return k;
    }

    /**
     * Allocation-free form of {@link #below(double[], double[], double, int)}.
     *
     * @param diag       diagonal, length {@code n >= 1}, finite
     * @param off        off-diagonal, length {@code n-1}, finite
     * @param bound      upper bound (not NaN; {@code +Infinity} means no bound)
     * @param kMax       largest number of eigenpairs, in {@code [1, n]}
     * @param valuesOut  output, length at least {@code kMax}
     * @param vectorsOut output, at least {@code kMax} rows of length at least {@code n}, or null
     *                   for eigenvalues only
     * @return the number {@code m = min(countBelow(bound), kMax)} of eigenpairs written
     * @throws IllegalArgumentException on invalid arguments
     * @throws ArithmeticException      if inverse iteration fails to converge
     */
    public int belowInto(double[] diag, double[] off, double bound, int kMax,
                         double[] valuesOut, double[][] vectorsOut) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.notNaN("bound", bound);
        Require.inRange("kMax", kMax, 1, n);
        validateOutputs(valuesOut, vectorsOut, kMax, n);
        prepare(diag, off, n);
        double s = scale;
        double bs = bound * s;
        if (!(bs > gl)) {
            return 0;
        }
        double hi = Math.min(bs, gu);
        int m = Math.min(sturmCount(n, hi), kMax);
        if (m == 0) {
            return 0;
        }
        bisect(n, m, hi, vectorsOut != null);
        finish(n, m, valuesOut, vectorsOut);
        return m;
    }

    /**
     * The {@code k} lowest eigenpairs of a matrix, ascending.
     *
     * <p>Accepts a {@link SymmetricTridiagonalMatrix}, or any {@link SymmetricMatrix} whose
     * {@link SymmetricMatrix#bandwidth() bandwidth} is at most 1 (its entries are read with
     * {@link SymmetricMatrix#get}).
     *
     * @param matrix a tridiagonal symmetric matrix
     * @param k      number of eigenpairs, in {@code [1, n]}
     * @return eigenpairs, ascending
     * @throws IllegalArgumentException if the matrix is not tridiagonal (bandwidth above 1) or
     *                                  {@code k} is out of range
     */
    public EigenPairs lowest(SymmetricMatrix matrix, int k) {
        double[][] t = tridiagonalArrays(matrix);
        return lowest(t[0], t[1], k);
    }

    /**
     * Matrix form of {@link #below(double[], double[], double, int)}; accepts the same matrices
     * as {@link #lowest(SymmetricMatrix, int)}.
     *
     * @param matrix a tridiagonal symmetric matrix
     * @param bound  upper bound (not NaN)
     * @param kMax   largest number of eigenpairs, in {@code [1, n]}
     * @return eigenpairs, ascending, possibly empty
     * @throws IllegalArgumentException if the matrix is not tridiagonal or an argument is invalid
     */
    public EigenPairs below(SymmetricMatrix matrix, double bound, int kMax) {
        double[][] t = tridiagonalArrays(matrix);
        return below(t[0], t[1], bound, kMax);
    }

    // ------------------------------------------------------------------ validation

    private static void validateOutputs(double[] valuesOut, double[][] vectorsOut, int k, int n) {
        Require.minLength("valuesOut", valuesOut, k);
        if (vectorsOut != null) {
            if (vectorsOut.length < k) {
                throw Require.invalid("vectorsOut.length", vectorsOut.length, "[" + k + ", " + Integer.MAX_VALUE + "]");
            }
            for (int j = 0; j < k; j++) {
                Require.minLength("vectorsOut[" + j + "]", vectorsOut[j], n);
            }
        }
    }

    private static double[][] tridiagonalArrays(SymmetricMatrix matrix) {
        if (matrix == null) {
            throw Require.invalid("matrix", "null", "(a non-null matrix)");
        }
        if (matrix instanceof SymmetricTridiagonalMatrix) {
            SymmetricTridiagonalMatrix t = (SymmetricTridiagonalMatrix) matrix;
            return new double[][] {t.diagRef(), t.offRef()};
        }
        if (matrix.bandwidth() > 1) {
            throw Require.invalid("matrix bandwidth", matrix.bandwidth(),
                    "[0, 1]: SymmetricTridiagonalEigen accepts tridiagonal matrices only");
        }
        int n = matrix.size();
        double[] dd = new double[n];
        double[] ee = new double[n - 1];
        for (int i = 0; i < n; i++) {
            dd[i] = matrix.get(i, i);
            if (i + 1 < n) {
                ee[i] = matrix.get(i + 1, i);
            }
        }
        return new double[][] {dd, ee};
    }

    // ------------------------------------------------------------------ preparation

    private static double maxAbs(double[] diag, double[] off, int n) {
        double m = 0.0;
        for (int i = 0; i < n; i++) {
            m = Math.max(m, Math.abs(diag[i]));
        }
        for (int i = 0; i < n - 1; i++) {
            m = Math.max(m, Math.abs(off[i]));
        }
        return m;
    }

    /** Power of two that brings the largest entry into [1, 2); exact, so no rounding. */
    private static double scaleFor(double maxAbs) {
        if (maxAbs == 0.0) {
            return 1.0;
        }
        return Math.scalb(1.0, -Math.getExponent(maxAbs));
    }

    private void ensureCapacity(int n) {
        if (n <= capacity) {
            return;
        }
        capacity = n;
        d = new double[n];
        e = new double[n];
        e2 = new double[n];
        lower = new double[n];
        upper = new double[n];
        coarse = new boolean[n];
        scaledValues = new double[n];
        fa = new double[n];
        fb = new double[n];
        fc = new double[n];
        fd = new double[n];
        swapped = new boolean[n];
        work = new double[n];
        countWork = new int[n];
    }

    /** Copies and scales the matrix; computes pivmin and a safe Gershgorin bracket. */
    private void prepare(double[] diag, double[] off, int n) {
        ensureCapacity(n);
        double s = scaleFor(maxAbs(diag, off, n));
        scale = s;
        double maxE2 = 0.0;
        for (int i = 0; i < n; i++) {
            d[i] = diag[i] * s;
        }
        for (int i = 0; i < n - 1; i++) {
            double ei = off[i] * s;
            e[i] = ei;
            e2[i] = ei * ei;
            maxE2 = Math.max(maxE2, e2[i]);
        }
        pivmin = SAFE_MIN * Math.max(1.0, maxE2);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double r = (i > 0 ? Math.abs(e[i - 1]) : 0.0) + (i < n - 1 ? Math.abs(e[i]) : 0.0);
            lo = Math.min(lo, d[i] - r);
            hi = Math.max(hi, d[i] + r);
        }
        double norm = Math.max(Math.abs(lo), Math.abs(hi));
        tnorm = norm > 0.0 ? norm : 1.0;
        // Widen the Gershgorin interval (as dstebz does) and verify the counts at its ends.
        double widen = 2.0 * EPS * tnorm * n + 2.0 * pivmin;
        lo -= widen;
        hi += widen;
        while (sturmCount(n, lo) != 0) {
            widen *= 2.0;
            lo -= widen;
        }
        while (sturmCount(n, hi) != n) {
            widen *= 2.0;
            hi += widen;
        }
        gl = lo;
        gu = hi;
    }

    /** Sturm count on the prepared (scaled) matrix. */
    private int sturmCount(int n, double x) {
        double pm = pivmin;
        double q = d[0] - x;
        if (Math.abs(q) <= pm) {
            q = -pm;
        }
        int count = q < 0.0 ? 1 : 0;
        for (int i = 1; i < n; i++) {
            q = d[i] - x - e2[i - 1] / q;
            if (Math.abs(q) <= pm) {
                q = -pm;
            }
            if (q < 0.0) {
                count++;
            }
        }
        return count;
    }

    // ------------------------------------------------------------------ bisection

    /**
     * Bisection on Sturm counts for the m lowest eigenvalues below hiInit (scaled), into
     * scaledValues. All unfinished eigenvalues are bisected simultaneously: one sweep over the
     * matrix evaluates the Sturm counts at the midpoints of all distinct open brackets, as LAPACK's
     * dlaebz does, so the k independent recurrences interleave, and every count narrows the
     * brackets of all wanted eigenvalues. When eigenvectors follow, an eigenvalue
     * whose bracket is well separated from its neighbours is bisected only to
     * {@link #COARSE_RELATIVE_TOLERANCE} of the norm and finished by the Rayleigh quotient of its
     * inverse-iteration vector, whose error is of the order of the squared residual over the gap
     * (B. N. Parlett, The Symmetric Eigenvalue Problem, SIAM 1998, sec. 4.6; from memory). Clustered
     * eigenvalues are bisected to full precision.
     */
    private void bisect(int n, int m, double hiInit, boolean vectorsFollow) {
        if (n == 1) {
            scaledValues[0] = d[0]; // exact
            coarse[0] = false;
            return;
        }
        for (int t = 0; t < m; t++) {
            lower[t] = gl;
            upper[t] = hiInit;
            coarse[t] = vectorsFollow && n >= COARSE_MIN_SIZE;
        }
        double absTol = EPS * tnorm;
        if (vectorsFollow && n >= COARSE_MIN_SIZE) {
            double coarseTol = COARSE_RELATIVE_TOLERANCE * tnorm;
            bisectPass(n, m, coarseTol);
            double guard = COARSE_SEPARATION * coarseTol;
            for (int t = 0; t < m; t++) {
                boolean isolatedBelow = t == 0 || lower[t] - upper[t - 1] > guard; // nothing lies below the lowest
                boolean isolatedAbove = t == m - 1 ? true : lower[t + 1] - upper[t] > guard;
                if (t == m - 1 && m < n) {
                    // the next eigenvalue (not wanted) may sit just above: check its Sturm count
                    isolatedAbove = sturmCount(n, upper[t] + guard) == t + 1;
                }
                coarse[t] = isolatedBelow && isolatedAbove;
            }
        }
        bisectPass(n, m, absTol);
        for (int j = 0; j < m; j++) {
            double value = 0.5 * (lower[j] + upper[j]);
            if (j > 0 && value < scaledValues[j - 1]) {
                value = scaledValues[j - 1]; // keep the order inside the bisection tolerance
            }
            scaledValues[j] = value;
        }
    }

    /** Bisects every bracket not marked coarse (all of them while tol is coarse) down to tol. */
    private void bisectPass(int n, int m, double tol) {
        double[] points = fa; // reuse factorisation arrays as scratch: not needed until later
        double[] pivots = fb;
        int[] counts = countWork;
        boolean full = tol <= EPS * tnorm;
        while (true) {
            int np = 0;
            double lastLo = Double.NaN;
            double lastHi = Double.NaN;
            for (int t = 0; t < m; t++) {
                if (full && coarse[t]) {
                    continue; // finished by its Rayleigh quotient
                }
                double lo = lower[t];
                double hi = upper[t];
                if (lo == lastLo && hi == lastHi) {
                    continue; // same bracket as the previous eigenvalue: one evaluation serves both
                }
                lastLo = lo;
                lastHi = hi;
                double mid = 0.5 * (lo + hi);
                if (hi - lo <= tol + 2.0 * EPS * Math.max(Math.abs(lo), Math.abs(hi))
                        || !(mid > lo && mid < hi)) {
                    continue; // converged
                }
                points[np++] = mid;
            }
            if (np == 0) {
                break;
            }
            sturmCounts(n, points, pivots, counts, np);
            for (int a = 0; a < np; a++) {
                double x = points[a];
                int c = counts[a];
                for (int t = 0; t < m; t++) {
                    if (c <= t) {
                        if (x > lower[t]) {
                            lower[t] = x;
                        }
                    } else if (x < upper[t]) {
                        upper[t] = x;
                    }
                }
            }
        }
    }

    /** Sturm counts at np points in one sweep (independent recurrences, interleaved). */
    private void sturmCounts(int n, double[] x, double[] q, int[] count, int np) {
        double pm = pivmin;
        double d0 = d[0];
        for (int a = 0; a < np; a++) {
            double qa = d0 - x[a];
            if (Math.abs(qa) <= pm) {
                qa = -pm;
            }
            q[a] = qa;
            count[a] = qa < 0.0 ? 1 : 0;
        }
        for (int i = 1; i < n; i++) {
            double di = d[i];
            double ei = e2[i - 1];
            for (int a = 0; a < np; a++) {
                double qa = di - x[a] - ei / q[a];
                if (Math.abs(qa) <= pm) {
                    qa = -pm;
                }
                q[a] = qa;
                if (qa < 0.0) {
                    count[a]++;
                }
            }
        }
    }

    // ------------------------------------------------------------------ inverse iteration

    private void finish(int n, int m, double[] valuesOut, double[][] vectorsOut) {
        double inv = 1.0 / scale;
        if (vectorsOut == null) {
            for (int j = 0; j < m; j++) {
                valuesOut[j] = scaledValues[j] * inv;
            }
            return;
        }
        rng = new SplittableRandom(SEED);
        double clusterGap = CLUSTER_RELATIVE_GAP * tnorm;
        int clusterStart = 0;
        double previousShift = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < m; j++) {
            double lambda = scaledValues[j];
            if (j > 0 && lambda - scaledValues[j - 1] > clusterGap) {
                clusterStart = j;
            }
            // Separate coincident shifts (dstein's rule): otherwise the directions found before
            // are amplified far more than the wanted one and cancel in the Gram-Schmidt step.
            double pertol = 10.0 * EPS * Math.max(Math.abs(lambda), 1e-3 * tnorm);
            double shift = lambda - previousShift < pertol ? previousShift + pertol : lambda;
            previousShift = shift;
            inverseIteration(n, j, clusterStart, shift, vectorsOut);
        }
        for (int j = 0; j < m; j++) {
            valuesOut[j] = scaledValues[j] * inv;
        }
    }

    private void inverseIteration(int n, int j, int clusterStart, double shift, double[][] vectors) {
        double lambda = scaledValues[j];
        double[] v = vectors[j];
        if (n == 1) {
            v[0] = 1.0;
            return;
        }
        factorShifted(n, shift);
        double[] x = work;
        randomUnit(x, n);
        double resTol = 16.0 * EPS * tnorm * Math.max(1.0, Math.sqrt(n));
        double best = Double.POSITIVE_INFINITY;
        double bestLambda = lambda;
        double startScale = Math.max(EPS, lastPivotMagnitude) * tnorm;
        double extraScale = 1.0;
        int extra = 0;
        for (int it = 0; it < MAX_INVERSE_ITERATIONS; it++) {
            double sc = startScale * extraScale;
            for (int i = 0; i < n; i++) {
                x[i] *= sc;
            }
            solveFactored(n, x);
            for (int pass = 0; pass < 2; pass++) {
                for (int c = clusterStart; c < j; c++) {
                    double[] q = vectors[c];
                    double dot = 0.0;
                    for (int i = 0; i < n; i++) {
                        dot += q[i] * x[i];
                    }
                    for (int i = 0; i < n; i++) {
                        x[i] -= dot * q[i];
                    }
                }
            }
            double norm = norm2(x, n);
            if (!(norm > 0.0) || Double.isInfinite(norm) || Double.isNaN(norm)) {
                // Overflow or total cancellation: restart from a fresh vector with more headroom.
                extraScale *= 1e-100;
                randomUnit(x, n);
                continue;
            }
            double invNorm = 1.0 / norm;
            for (int i = 0; i < n; i++) {
                x[i] *= invNorm;
            }
            if (coarse[j]) {
                double rq = rayleighQuotient(n, x);
                // inside the Sturm bracket (widened by round-off; neighbours are far beyond it), the
                // bracket guarantees which eigenvalue the quotient belongs to
                double slack = 4.0 * EPS * Math.max(Math.abs(lower[j]), Math.abs(upper[j])) + EPS * tnorm;
                if (rq >= lower[j] - slack && rq <= upper[j] + slack) {
                    lambda = rq;
                }
            }
            double res = residual(n, x, lambda);
            if (res < best) {
                best = res;
                bestLambda = lambda;
                System.arraycopy(x, 0, v, 0, n);
            }
            if (res <= resTol) {
                if (++extra > EXTRA_ITERATIONS) {
                    break;
                }
            }
        }
        if (!(best <= 1e3 * resTol)) {
            throw new EigenSolverException(j, "inverse iteration did not converge for eigenvalue #" + j
                    + " = " + lambda / scale + ": relative residual " + best / tnorm
                    + " after " + MAX_INVERSE_ITERATIONS + " iterations");
        }
        scaledValues[j] = bestLambda;
        fixSign(v, n);
    }

    /** x^T T x for a unit vector x (scaled matrix). */
    private double rayleighQuotient(int n, double[] x) {
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double r = d[i] * x[i];
            if (i > 0) {
                r += e[i - 1] * x[i - 1];
            }
            if (i < n - 1) {
                r += e[i] * x[i + 1];
            }
            sum += x[i] * r;
        }
        return sum;
    }

    /**
     * LU factorisation with partial pivoting of T - sigma I (scaled), stored as U (reciprocal
     * diagonal fa, superdiagonals fb and fd), multipliers fc and interchange flags; tiny pivots of
     * U are perturbed to eps*||T|| before they are inverted.
     */
    private void factorShifted(int n, double sigma) {
        for (int i = 0; i < n; i++) {
            fa[i] = d[i] - sigma;
        }
        for (int i = 0; i < n - 1; i++) {
            fb[i] = e[i];
            fc[i] = e[i];
        }
        double pivTol = EPS * tnorm;
        for (int k = 0; k < n - 1; k++) {
            double ak = fa[k];
            double ck = fc[k];
            if (Math.abs(ak) >= Math.abs(ck)) {
                double mult = ak == 0.0 ? 0.0 : ck / ak;
                fc[k] = mult;
                fa[k + 1] -= mult * fb[k];
                fd[k] = 0.0;
                swapped[k] = false;
            } else {
                double mult = ak / ck;
                fa[k] = ck;
                double t = fa[k + 1];
                fa[k + 1] = fb[k] - mult * t;
                if (k < n - 2) {
                    fd[k] = fb[k + 1];
                    fb[k + 1] = -mult * fd[k];
                } else {
                    fd[k] = 0.0;
                }
                fb[k] = t;
                fc[k] = mult;
                swapped[k] = true;
            }
            if (Math.abs(fa[k]) < pivTol) {
                fa[k] = fa[k] < 0.0 ? -pivTol : pivTol;
            }
        }
        lastPivotMagnitude = Math.abs(fa[n - 1]);
        if (Math.abs(fa[n - 1]) < pivTol) {
            fa[n - 1] = fa[n - 1] < 0.0 ? -pivTol : pivTol;
        }
        // Each factorisation serves several solves: keep 1/u_kk so that the back substitution
        // multiplies instead of divides. |u_kk| >= eps*||T|| here, so the reciprocal is finite.
        for (int k = 0; k < n; k++) {
            fa[k] = 1.0 / fa[k];
        }
    }

    /** Solves (T - sigma I) y = x in place with the factors of factorShifted. */
    private void solveFactored(int n, double[] x) {
        for (int k = 0; k < n - 1; k++) {
            if (swapped[k]) {
                double t = x[k];
                x[k] = x[k + 1];
                x[k + 1] = t - fc[k] * x[k];
            } else {
                x[k + 1] -= fc[k] * x[k];
            }
        }
        x[n - 1] *= fa[n - 1];
        x[n - 2] = (x[n - 2] - fb[n - 2] * x[n - 1]) * fa[n - 2];
        for (int k = n - 3; k >= 0; k--) {
            x[k] = (x[k] - fb[k] * x[k + 1] - fd[k] * x[k + 2]) * fa[k];
        }
    }

    /** ||T v - lambda v||_2 on the scaled matrix. */
    private double residual(int n, double[] v, double lambda) {
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double r = (d[i] - lambda) * v[i];
            if (i > 0) {
                r += e[i - 1] * v[i - 1];
            }
            if (i < n - 1) {
                r += e[i] * v[i + 1];
            }
            sum += r * r;
        }
        return Math.sqrt(sum);
    }

    private static double norm2(double[] x, int n) {
        double max = 0.0;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, Math.abs(x[i]));
        }
        if (max == 0.0 || Double.isInfinite(max) || Double.isNaN(max)) {
            return max;
        }
        double inv = 1.0 / max;
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double t = x[i] * inv;
            sum += t * t;
        }
        return max * Math.sqrt(sum);
    }

    /** Makes the component of largest magnitude (first on ties) positive. */
    static void fixSign(double[] v, int n) {
        int imax = 0;
        double amax = -1.0;
        for (int i = 0; i < n; i++) {
            double a = Math.abs(v[i]);
            if (a > amax) {
                amax = a;
                imax = i;
            }
        }
        if (v[imax] < 0.0) {
            for (int i = 0; i < n; i++) {
                v[i] = -v[i];
            }
        }
    }

    /**
     * Fills x[0..n-1] with a unit vector of pseudo-random components in (-1, 1]: the JDK's
     * SplitMix64 generator ({@link SplittableRandom}), so the start vectors are fixed by the seed.
     */
    private void randomUnit(double[] x, int n) {
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double r = 2.0 * rng.nextDouble() - 1.0 + 0x1.0p-53;
            x[i] = r;
            sum += r * r;
        }
        double inv = 1.0 / Math.sqrt(sum);
        for (int i = 0; i < n; i++) {
            x[i] *= inv;
        }
    }
}
