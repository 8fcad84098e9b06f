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
 * <p><b>Fast path</b> (with eigenvectors, {@code n >= 32}): bisection stops once an eigenvalue is
 * alone in its bracket (Sturm counts t and t+1 at its ends) and the bracket has shrunk by 2^-6;
 * the eigenvalue and its vector are then found together by Rayleigh-quotient iteration on twisted
 * factorisations, all such eigenvalues interleaved in the same sweeps, safeguarded by the
 * bracket and accepted only after an explicit residual check. Vectors of eigenvalues closer than
 * {@link #CLUSTER_RELATIVE_GAP} {@code ||T||} are orthogonalised against each other. Whatever
 * this path does not finish takes the path described here and below. The warm-started overloads
 * start the search from Weyl brackets around earlier eigenvalues, each checked by Sturm counts.
 *
 * <p><b>Eigenvectors</b> (otherwise) are computed by inverse iteration with the shifted matrix
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
    /**
     * Relative bracket width below which bisection stops trying to separate eigenvalues that
     * share a bracket (they then take the full-bisection path; no count is wasted, since that
     * path starts from the same brackets).
     */
    private static final double ISOLATION_RELATIVE_WIDTH = 1e-9;
    /**
     * Factor by which an isolated bracket is narrowed by bisection before the Rayleigh iteration
     * takes over: Sturm counts of several brackets run interleaved at about the cost of one,
     * while a Rayleigh round costs two dependent sweeps and a vector (chosen by measurement on
     * the benchmark's channel well: 2^-6 left the fewest sweeps in all).
     */
    private static final double REFINE_FACTOR = 0x1.0p-6;
    /** Below this order full bisection is cheap enough to use always. */
    private static final int RAYLEIGH_MIN_SIZE = 32;
    private static final long SEED = 0x2545F4914F6CDD1DL;
    /** Cap on the twisted Rayleigh iteration; past it the eigenvalue takes the bisection path. */
    private static final int MAX_RAYLEIGH_ITERATIONS = 40;
    /**
     * Entries of a twisted-factorisation vector below this (relative to its twist entry 1) are
     * zero: squares of smaller numbers would be subnormal, whose arithmetic is many times slower.
     */
    private static final double NEGLIGIBLE = 0x1.0p-400;

    private int capacity = -1;
    private double[] d;
    private double[] e;
    private double[] e2;
    private double[] lower;
    private double[] upper;
    private double[] scaledValues;
    /** Reciprocals of U's diagonal after factorShifted. */
    private double[] fa;
    private double[] fb;
    private double[] fc;
    private double[] fd;
    private boolean[] swapped;
    private double[] work;
    private int[] countWork;
    /** Sturm counts at lower[t] and upper[t]: the bracket holds only eigenvalue t when they are t and t+1. */
    private int[] lowerCount;
    private int[] upperCount;
    /** Start shift of the Rayleigh iteration per eigenvalue (scaled hint), NaN for the midpoint. */
    private double[] start;
    /** Per eigenvalue: bracket width at which bisection hands an isolated eigenvalue over (NaN: not yet isolated). */
    private double[] refineWidth;
    /** Ends of the hints' brackets, their pivots and Sturm counts (two per eigenvalue). */
    private double[] hintPoints;
    private double[] hintPivots;
    private int[] hintCounts;
    /** Per eigenvalue: finished (value and vector) by the twisted-factorisation Rayleigh iteration. */
    private boolean[] fast;
    /**
     * Forward ratios e_i/D+_i of the twisted factorisations and backward ratios e_i/D-_{i+1},
     * entry i of active eigenvalue a at i * (number active) + a; grown on demand to N times the
     * number of eigenvalues iterated together.
     */
    private double[] plusRatio;
    private double[] minusRatio;
    /** Per eigenvalue: the bracket that isolated it when the Rayleigh iteration started. */
    private double[] isolatedLower;
    private double[] isolatedUpper;
    /** Per eigenvalue: current shift and last residual of the Rayleigh iteration. */
    private double[] shift;
    private double[] previousResidual;
    /** Per active eigenvalue: running pivot, gamma, Sturm count, twist index, eigenvalue index. */
    private double[] rayleighQ;
    private double[] rayleighGamma;
    private int[] rayleighCount;
    private int[] rayleighTwist;
    private int[] activeIndex;

    private double scale;
    private double pivmin;
    private double tnorm;
    /** True when the prepared matrix is all zeros: every eigenvalue is exactly 0. */
    private boolean zeroMatrix;
    private double gl;
    private double gu;
    private double lastPivotMagnitude;
    private SplittableRandom rng;
    private int rejectedHints;

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
        initBrackets(n, k, gu, n, null, 0, 0.0);
        solvePrepared(n, k, valuesOut, vectorsOut);
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
        return belowPrepared(diag, off, n, bound, kMax, valuesOut, vectorsOut, null, 0, 0.0);
    }

    /**
     * Warm-started form of {@link #lowestInto(double[], double[], int, double[], double[][])}
     * for a matrix that differs from one solved before by a change of its diagonal of at most
     * {@code hintRadius} in every entry (a changed potential). By Weyl's inequality each
     * eigenvalue then moved by at most {@code hintRadius} (R. A. Horn and C. R. Johnson,
     * <i>Matrix Analysis</i>, 2nd ed., Cambridge 2013, Cor. 4.3.15 [from memory]), so
     * {@code [hints[t] - hintRadius, hints[t] + hintRadius]} brackets eigenvalue {@code t}. Every
     * such bracket is verified by two Sturm counts before it is used: a bracket that does not hold
     * (a wrong hint or too small a radius) is only a pair of counted points, which narrow the
     * cold brackets as any bisection point does, so the result never depends on the hint being
     * right; {@link #rejectedHints()} tells how many did not hold. The eigenpairs agree with the
     * cold call's to round-off (the search path differs, so not bit for bit); for fixed inputs
     * the result is deterministic.
     *
     * @param diag       diagonal, length {@code n >= 1}, finite
     * @param off        off-diagonal, length {@code n-1}, finite
     * @param k          number of eigenpairs, in {@code [1, n]}
     * @param valuesOut  output, length at least {@code k}
     * @param vectorsOut output, at least {@code k} rows of length at least {@code n}, or null
     * @param hints      earlier eigenvalues, ascending, at least {@code hintCount} of them
     * @param hintCount  number of hints used, in {@code [0, hints.length]}; hints beyond
     *                   {@code k} are ignored
     * @param hintRadius bound on the move of every eigenvalue since the hints (for a diagonal
     *                   change, its largest magnitude), finite and {@code >= 0}
     * @return {@code k}
     * @throws IllegalArgumentException on invalid arguments
     * @throws ArithmeticException      if inverse iteration fails to converge
     */
    public int lowestInto(double[] diag, double[] off, int k, double[] valuesOut, double[][] vectorsOut,
                          double[] hints, int hintCount, double hintRadius) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.inRange("k", k, 1, n);
        validateOutputs(valuesOut, vectorsOut, k, n);
        validateHints(hints, hintCount, hintRadius);
        prepare(diag, off, n);
        initBrackets(n, k, gu, n, hints, hintCount, hintRadius);
        solvePrepared(n, k, valuesOut, vectorsOut);
        return k;
    }

    /**
     * Warm-started form of {@link #belowInto(double[], double[], double, int, double[], double[][])};
     * the hints are used and checked as in
     * {@link #lowestInto(double[], double[], int, double[], double[][], double[], int, double)}.
     *
     * @param diag       diagonal, length {@code n >= 1}, finite
     * @param off        off-diagonal, length {@code n-1}, finite
     * @param bound      upper bound (not NaN; {@code +Infinity} means no bound)
     * @param kMax       largest number of eigenpairs, in {@code [1, n]}
     * @param valuesOut  output, length at least {@code kMax}
     * @param vectorsOut output, at least {@code kMax} rows of length at least {@code n}, or null
     * @param hints      earlier eigenvalues, ascending, at least {@code hintCount} of them
     * @param hintCount  number of hints used, in {@code [0, hints.length]}
     * @param hintRadius bound on the move of every eigenvalue since the hints, finite, {@code >= 0}
     * @return the number {@code m = min(countBelow(bound), kMax)} of eigenpairs written
     * @throws IllegalArgumentException on invalid arguments
     * @throws ArithmeticException      if inverse iteration fails to converge
     */
    public int belowInto(double[] diag, double[] off, double bound, int kMax, double[] valuesOut,
                         double[][] vectorsOut, double[] hints, int hintCount, double hintRadius) {
        int n = SymmetricTridiagonalMatrix.validate(diag, off);
        Require.notNaN("bound", bound);
        Require.inRange("kMax", kMax, 1, n);
        validateOutputs(valuesOut, vectorsOut, kMax, n);
        validateHints(hints, hintCount, hintRadius);
        return belowPrepared(diag, off, n, bound, kMax, valuesOut, vectorsOut, hints, hintCount, hintRadius);
    }

    /**
     * Number of hints of the last warm-started call whose Weyl bracket did not hold (0 after a
     * cold call).
     *
     * @return count in {@code [0, hintCount]}
     */
    public int rejectedHints() {
        return rejectedHints;
    }

    private int belowPrepared(double[] diag, double[] off, int n, double bound, int kMax, double[] valuesOut,
                              double[][] vectorsOut, double[] hints, int hintCount, double hintRadius) {
        prepare(diag, off, n);
        rejectedHints = 0;
        double bs = bound * scale;
        if (!(bs > gl)) {
            return 0;
        }
        double hi = Math.min(bs, gu);
        int hiCount = sturmCount(n, hi);
        int m = Math.min(hiCount, kMax);
        if (m == 0) {
            return 0;
        }
        initBrackets(n, m, hi, hiCount, hints, hintCount, hintRadius);
        solvePrepared(n, m, valuesOut, vectorsOut);
        return m;
    }

    private static void validateHints(double[] hints, int hintCount, double hintRadius) {
        if (hints == null) {
            throw Require.invalid("hints", "null", "(a non-null array)");
        }
        Require.inRange("hintCount", hintCount, 0, hints.length);
        if (!(hintRadius >= 0.0 && hintRadius < Double.POSITIVE_INFINITY)) {
            throw Require.invalid("hintRadius", hintRadius, "[0, +Infinity) (finite)");
        }
        for (int t = 0; t < hintCount; t++) {
            double h = hints[t];
            if (!(h - h == 0.0)) {
                throw Require.invalid("hints[" + t + "]", h, "(-Infinity, +Infinity) (finite values only)");
            }
            if (t > 0 && h < hints[t - 1]) {
                throw Require.invalid("hints[" + t + "]", h, "[" + hints[t - 1] + ", +Infinity) (ascending)");
            }
        }
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
        scaledValues = new double[n];
        fa = new double[n];
        fb = new double[n];
        fc = new double[n];
        fd = new double[n];
        swapped = new boolean[n];
        work = new double[n];
        countWork = new int[n];
        lowerCount = new int[n];
        start = new double[n];
        refineWidth = new double[n];
        hintPoints = new double[2 * n];
        hintPivots = new double[2 * n];
        hintCounts = new int[2 * n];
        upperCount = new int[n];
        fast = new boolean[n];
        shift = new double[n];
        isolatedLower = new double[n];
        isolatedUpper = new double[n];
        previousResidual = new double[n];
        rayleighQ = new double[n];
        rayleighGamma = new double[n];
        rayleighCount = new int[n];
        rayleighTwist = new int[n];
        activeIndex = new int[n];
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
        zeroMatrix = norm == 0.0;
        tnorm = norm > 0.0 ? norm : 1.0;
        // Widen the Gershgorin interval (as dstebz does) and verify the counts at its ends.
        double widen = 2.0 * EPS * tnorm * n + 2.0 * pivmin;
        lo -= widen;
        hi += widen;
        // both ends in one interleaved sweep (the usual case: both hold at once)
        boolean lowHolds;
        boolean highHolds;
        if (n >= 2) {
            double[] ends = fa;
            ends[0] = lo;
            ends[1] = hi;
            sturmCounts(n, ends, fb, countWork, 2);
            lowHolds = countWork[0] == 0;
            highHolds = countWork[1] == n;
        } else {
            lowHolds = sturmCount(n, lo) == 0;
            highHolds = sturmCount(n, hi) == n;
        }
        if (!lowHolds) {
            do {
                widen *= 2.0;
                lo -= widen;
            } while (sturmCount(n, lo) != 0);
        }
        if (!highHolds) {
            do {
                widen *= 2.0;
                hi += widen;
            } while (sturmCount(n, hi) != n);
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
     * Sets the brackets of the m lowest eigenvalues to [gl, hiInit] (Sturm counts 0 and hiCount)
     * and, with hints, narrows them by the counts at the ends of the hints' Weyl brackets.
     */
    private void initBrackets(int n, int m, double hiInit, int hiCount, double[] hints, int hintCount,
                              double hintRadius) {
        rejectedHints = 0;
        for (int t = 0; t < m; t++) {
            lower[t] = gl;
            upper[t] = hiInit;
            lowerCount[t] = 0;
            upperCount[t] = hiCount;
            start[t] = Double.NaN;
            refineWidth[t] = Double.NaN;
            fast[t] = false;
        }
        int h = hints == null ? 0 : Math.min(hintCount, m);
        if (h == 0 || n == 1 || zeroMatrix) {
            return;
        }
        // the radius is widened by round-off of the shifted diagonal (a few eps ||T||) and
        // the pivot floor, so that an exact Weyl bound is never rejected by rounding
        double slack = 8.0 * EPS * tnorm + 4.0 * pivmin;
        double r = hintRadius * scale + slack;
        double[] points = hintPoints;
        int[] counts = hintCounts;
        int np = 0;
        for (int t = 0; t < h; t++) {
            double c = hints[t] * scale;
            start[t] = c;
            points[np++] = Math.max(c - r, gl);
            points[np++] = Math.min(c + r, hiInit);
        }
        sturmCounts(n, points, hintPivots, counts, np);
        for (int t = 0; t < h; t++) {
            if (!(counts[2 * t] <= t && counts[2 * t + 1] > t)) {
                rejectedHints++;
                start[t] = Double.NaN;
            }
        }
        narrow(m, points, counts, np);
    }

    /**
     * Finds the m lowest eigenvalues (scaled) from the brackets of initBrackets, with vectors
     * unless vectorsOut is null, and writes them unscaled.
     *
     * <p>With vectors (and n &ge; {@link #RAYLEIGH_MIN_SIZE}), all brackets are first bisected
     * simultaneously until each holds one eigenvalue (Sturm counts t and t+1 at its ends). An
     * isolated eigenvalue is then finished by Rayleigh-quotient iteration on twisted
     * factorisations ({@link #twistedRayleigh}), which yields its vector at the same time.
     * Eigenvalues that stay in a shared bracket, whose iteration fails, or that end closer than
     * {@link #CLUSTER_RELATIVE_GAP} {@code ||T||} to a wanted neighbour, are bisected to full
     * precision and get their vectors by inverse iteration with re-orthogonalisation as before.
     */
    private void solvePrepared(int n, int m, double[] valuesOut, double[][] vectorsOut) {
        if (n == 1 || zeroMatrix) {
            // exact: a 1 x 1 matrix is its eigenvalue; an all-zero matrix has only the eigenvalue 0,
            // which bisection to the fallback norm 1 would place only within 1e-16 of it
            for (int t = 0; t < m; t++) {
                scaledValues[t] = n == 1 ? d[0] : 0.0;
            }
            finish(n, m, valuesOut, vectorsOut);
            return;
        }
        if (vectorsOut != null && n >= RAYLEIGH_MIN_SIZE) {
            bisectPass(n, m, ISOLATION_RELATIVE_WIDTH * tnorm, true);
            twistedRayleighAll(n, m, vectorsOut);
        }
        bisectPass(n, m, EPS * tnorm, false);
        for (int j = 0; j < m; j++) {
            if (fast[j]) {
                continue;
            }
            double value = 0.5 * (lower[j] + upper[j]);
            if (j > 0 && value < scaledValues[j - 1]) {
                value = scaledValues[j - 1]; // keep the order inside the bisection tolerance
            }
            scaledValues[j] = value;
        }
        finish(n, m, valuesOut, vectorsOut);
    }

    /**
     * Rayleigh-quotient iteration on twisted factorisations {@code T - sigma I = N_r Delta_r N_r^T}
     * for every eigenvalue alone in its bracket (I. S. Dhillon and B. N. Parlett, "Orthogonal
     * eigenvectors and relative gaps", SIAM J. Matrix Anal. Appl. 25, 858 (2004); B. N. Parlett
     * and I. S. Dhillon, "Fernando's solution to Wilkinson's problem: an application of double
     * factorization", Linear Algebra Appl. 267, 247 (1997) [both from memory]). One forward sweep
     * gives the pivots D+ of {@code L D+ L^T} (the Sturm pivots, so their signs count the
     * eigenvalues below sigma and narrow the bracket), one backward sweep those of
     * {@code U D- U^T}; the twist index r minimises {@code |gamma_r| = |D+_r - e_r^2 / D-_{r+1}|},
     * and the solution of {@code N_r Delta_r N_r^T z = gamma_r e_r}, {@code z_r = 1}, takes one
     * multiplication per entry. Then {@code ||(T - sigma) z|| = |gamma_r|} and the Rayleigh
     * quotient of z is {@code sigma + gamma_r / ||z||^2}, the next shift (cubic convergence); a
     * shift outside the bracket is replaced by the bracket's midpoint. An eigenvalue is done when
     * the residual {@code |gamma_r| / ||z||} has reached the inverse-iteration tolerance and the
     * correction has settled at round-off; it is accepted only if the interval of half-width the
     * residual around its value (which holds an eigenvalue) lies inside the isolating bracket (or
     * Sturm counts say it holds eigenvalue t), so that it cannot belong to a neighbour.
     *
     * <p>The eigenvalues iterate in rounds, and within a round the forward and backward sweeps of
     * all of them run interleaved (one loop over the matrix, the eigenvalues inner), so that the
     * divisions of independent recurrences overlap instead of each waiting for the previous one.
     * An eigenvalue that has not converged after {@link #MAX_RAYLEIGH_ITERATIONS} rounds stays
     * unfinished (fast false) for the bisection path.
     */
    private void twistedRayleighAll(int n, int m, double[][] vectors) {
        int na = 0;
        for (int t = 0; t < m; t++) {
            if (lowerCount[t] == t && upperCount[t] == t + 1) {
                activeIndex[na++] = t;
                double sigma = start[t];
                shift[t] = sigma > lower[t] && sigma < upper[t] ? sigma : 0.5 * (lower[t] + upper[t]);
                isolatedLower[t] = lower[t];
                isolatedUpper[t] = upper[t];
                previousResidual[t] = Double.POSITIVE_INFINITY;
            }
        }
        ensureRayleighCapacity(n, na);
        double resTol = 16.0 * EPS * tnorm * Math.max(1.0, Math.sqrt(n));
        double roundoff = 2.0 * EPS * tnorm;
        double pm = pivmin;
        double[] dp = plusRatio;
        double[] um = minusRatio;
        double[] q = rayleighQ;
        double[] g = rayleighGamma;
        int[] cnt = rayleighCount;
        int[] tw = rayleighTwist;
        int[] act = activeIndex;
        for (int round = 0; round < MAX_RAYLEIGH_ITERATIONS && na > 0; round++) {
            double d0 = d[0];
            for (int a = 0; a < na; a++) {
                double qa = d0 - shift[act[a]];
                if (Math.abs(qa) <= pm) {
                    qa = -pm;
                }
                q[a] = qa;
                cnt[a] = qa < 0.0 ? 1 : 0;
            }
            // forward sweep: only the ratios l_i = e_i / D+_i are stored; the backward sweep
            // recomputes D+_i from l_{i-1} with the same operations (so the same bits), and the
            // vector's left part needs l_i alone: one division per node fewer per round
            for (int i = 0; i < n - 1; i++) {
                double ei = e[i];
                double di = d[i + 1];
                int base = i * na;
                for (int a = 0; a < na; a++) {
                    double l = ei / q[a];
                    dp[base + a] = l;
                    double qa = di - shift[act[a]] - l * ei;
                    if (Math.abs(qa) <= pm) {
                        qa = -pm;
                    }
                    if (qa < 0.0) {
                        cnt[a]++;
                    }
                    q[a] = qa;
                }
            }
            double dl = d[n - 1];
            for (int a = 0; a < na; a++) {
                g[a] = q[a]; // D+_{n-1}
            }
            for (int a = 0; a < na; a++) {
                int t = act[a];
                double sigma = shift[t];
                if (cnt[a] <= t) {
                    if (sigma > lower[t]) {
                        lower[t] = sigma;
                        lowerCount[t] = cnt[a];
                    }
                } else if (sigma < upper[t]) {
                    upper[t] = sigma;
                    upperCount[t] = cnt[a];
                }
                double r = dl - sigma;
                if (Math.abs(r) <= pm) {
                    r = -pm;
                }
                q[a] = r;
                tw[a] = n - 1;
            }
            for (int i = n - 2; i >= 1; i--) {
                double ei = e[i];
                double di = d[i];
                double eb = e[i - 1];
                int base = i * na;
                int prev = base - na;
                for (int a = 0; a < na; a++) {
                    double u = ei / q[a];
                    um[base + a] = u;
                    double ue = u * ei;
                    double ds = di - shift[act[a]];
                    double dplus = ds - dp[prev + a] * eb; // D+_i as the forward sweep had it
                    if (Math.abs(dplus) <= pm) {
                        dplus = -pm;
                    }
                    double gi = dplus - ue;
                    if (Math.abs(gi) < Math.abs(g[a])) {
                        g[a] = gi;
                        tw[a] = i;
                    }
                    double r = ds - ue;
                    if (Math.abs(r) <= pm) {
                        r = -pm;
                    }
                    q[a] = r;
                }
            }
            {
                double e0 = e[0];
                for (int a = 0; a < na; a++) {
                    double u = e0 / q[a];
                    um[a] = u;
                    double ue = u * e0;
                    double dplus = d0 - shift[act[a]];
                    if (Math.abs(dplus) <= pm) {
                        dplus = -pm;
                    }
                    double gi = dplus - ue;
                    if (Math.abs(gi) < Math.abs(g[a])) {
                        g[a] = gi;
                        tw[a] = 0;
                    }
                }
            }
            int kept = 0;
            for (int a = 0; a < na; a++) {
                int t = act[a];
                int status = twistedStep(n, na, a, t, tw[a], g[a], vectors[t], resTol, roundoff);
                if (status == 0) {
                    act[kept++] = t;
                } else if (status > 0) {
                    fast[t] = true;
                }
            }
            na = kept;
        }
    }

    /**
     * The vector of one twisted factorisation and what follows from it for eigenvalue t:
     * 1 = converged (value and unit vector stored), -1 = given up, 0 = next shift set.
     */
    private int twistedStep(int n, int na, int a, int t, int twist, double gamma, double[] v,
                            double resTol, double roundoff) {
        double[] dp = plusRatio;
        double[] um = minusRatio;
        // z decays through barriers; entries below NEGLIGIBLE (relative to z_r = 1, far below any
        // tolerance) are set to zero, with the rest of that side, so that no arithmetic reaches
        // the slow subnormal range
        v[twist] = 1.0;
        double sum = 1.0;
        double z = 1.0;
        int i = twist - 1;
        for (; i >= 0; i--) {
            z = -dp[i * na + a] * z; // l_i = e_i / D+_i from the forward sweep
            if (Math.abs(z) < NEGLIGIBLE) {
                break;
            }
            v[i] = z;
            sum += z * z;
        }
        for (; i >= 0; i--) {
            v[i] = 0.0;
        }
        z = 1.0;
        i = twist + 1;
        for (; i < n; i++) {
            z = -um[(i - 1) * na + a] * z;
            if (Math.abs(z) < NEGLIGIBLE) {
                break;
            }
            v[i] = z;
            sum += z * z;
        }
        for (; i < n; i++) {
            v[i] = 0.0;
        }
        if (!(sum < Double.POSITIVE_INFINITY)) {
            return -1;
        }
        double sigma = shift[t];
        double norm = Math.sqrt(sum);
        double rho = Math.abs(gamma) / norm;
        double next = sigma + gamma / sum;
        boolean settled = Math.abs(gamma / sum) <= 4.0 * roundoff || rho >= 0.5 * previousResidual[t];
        double lo = lower[t];
        double hi = upper[t];
        if (rho <= resTol && settled) {
            double margin = rho + roundoff;
            // the isolating bracket (before the iteration narrowed it towards the value)
            boolean inside = next - margin >= isolatedLower[t] && next + margin <= isolatedUpper[t];
            if (!inside && !(sturmCount(n, next - margin) == t && sturmCount(n, next + margin) == t + 1)) {
                return -1;
            }
            double inv = 1.0 / norm;
            for (int c = 0; c < n; c++) {
                v[c] *= inv;
            }
            // the residual from gamma assumes exact recurrences; the explicit one also covers
            // entries set to zero and pivots replaced by the pivot floor
            if (!(residual(n, v, next) <= resTol)) {
                return -1;
            }
            fixSign(v, n);
            scaledValues[t] = next;
            return 1;
        }
        previousResidual[t] = rho;
        double s = next > lo && next < hi ? next : 0.5 * (lo + hi);
        if (!(s > lo && s < hi)) {
            return -1; // bracket exhausted in floating point without convergence
        }
        shift[t] = s;
        return 0;
    }

    private void ensureRayleighCapacity(int n, int na) {
        long need = (long) n * Math.max(na, 1);
        if (need > Integer.MAX_VALUE - 8) {
            throw new IllegalStateException("work space of " + need + " entries is too large");
        }
        if (plusRatio == null || plusRatio.length < need) {
            plusRatio = new double[(int) need];
            minusRatio = new double[(int) need];
        }
    }

    /**
     * Bisects the brackets of the eigenvalues not yet finished: down to tol, or, when
     * isolateOnly, until each holds one eigenvalue (brackets narrower than tol holding several are
     * left as they are).
     */
    private void bisectPass(int n, int m, double tol, boolean isolateOnly) {
        double[] points = fa; // reuse factorisation arrays as scratch: not needed until later
        double[] pivots = fb;
        int[] counts = countWork;
        while (true) {
            int np = 0;
            double lastLo = Double.NaN;
            double lastHi = Double.NaN;
            for (int t = 0; t < m; t++) {
                if (fast[t]) {
                    continue; // finished
                }
                double lo = lower[t];
                double hi = upper[t];
                if (isolateOnly && lowerCount[t] == t && upperCount[t] == t + 1) {
                    // isolated: a few more halvings, cheap here, spare Rayleigh rounds later
                    if (Double.isNaN(refineWidth[t])) {
                        refineWidth[t] = (hi - lo) * REFINE_FACTOR;
                    }
                    if (hi - lo <= refineWidth[t]) {
                        continue;
                    }
                }
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
            narrow(m, points, counts, np);
        }
    }

    /** Narrows every bracket with the Sturm counts at np points. */
    private void narrow(int m, double[] points, int[] counts, int np) {
        for (int a = 0; a < np; a++) {
            double x = points[a];
            int c = counts[a];
            for (int t = 0; t < m; t++) {
                if (c <= t) {
                    if (x > lower[t]) {
                        lower[t] = x;
                        lowerCount[t] = c;
                    }
                } else if (x < upper[t]) {
                    upper[t] = x;
                    upperCount[t] = c;
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
            if (fast[j]) {
                orthogonalise(n, j, clusterStart, vectorsOut);
            } else {
                inverseIteration(n, j, clusterStart, shift, vectorsOut);
            }
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
            double res = residual(n, x, lambda);
            if (res < best) {
                best = res;
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
        fixSign(v, n);
    }

    /**
     * Makes the Rayleigh-iteration vector j orthogonal to the vectors of its cluster before it
     * (modified Gram-Schmidt, twice), then unit and sign-fixed again. A vector with a residual
     * rho is off the exact eigenvector by about rho / gap, so neighbours closer than
     * {@link #CLUSTER_RELATIVE_GAP} {@code ||T||} get this correction; it moves the residual by
     * less than the removed overlap times the gap.
     */
    private void orthogonalise(int n, int j, int clusterStart, double[][] vectors) {
        if (clusterStart == j) {
            return;
        }
        double[] x = vectors[j];
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
        double inv = 1.0 / norm2(x, n);
        for (int i = 0; i < n; i++) {
            x[i] *= inv;
        }
        fixSign(x, n);
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
