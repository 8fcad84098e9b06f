package org.wurtzkit.benchmarks;

import dev.ludovic.netlib.lapack.JavaLAPACK;
import dev.ludovic.netlib.lapack.LAPACK;
import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.netlib.util.intW;
import org.wurtzkit.solvers.linalg.EigenPairs;
import org.wurtzkit.solvers.linalg.SymmetricTridiagonalEigen;
import org.wurtzkit.solvers.schrodinger.BoundStates;
import org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian;

/**
 * Lowest 10 eigenpairs of the effective-mass tridiagonal of {@link Scenarios#channelWell(int)}:
 * the library's Sturm-bisection / inverse-iteration solver against two baselines on the same
 * matrix in the same run, EJML's dense symmetric eigen-decomposition (N &le; 2000: it is O(N^3)
 * in time and O(N^2) in memory) and Commons Math's {@code EigenDecomposition(main, secondary)}
 * (implicit QL on the tridiagonal, all eigenpairs).
 *
 * <p>Every state checks, at the end of the trial ({@code @TearDown}, so that a decomposition that
 * takes seconds is not run once more just for the check), that the last result of its benchmark
 * holds the same lowest eigenvalues as the library solver (to 1e-10 of the matrix norm): a
 * benchmark never times a wrong answer, and a wrong answer fails the run.
 *
 * <p>The annotations are the full-run settings; {@link RatioReport} overrides them for the short
 * pass.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 5, jvmArgsAppend = {"-Xms1g", "-Xmx3g"})
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 10, time = 1)
public class EigenBenchmark {

    private static final int K = Scenarios.EIGENPAIRS;

    /** The library solver on N = 500 ... 8000. */
    @State(Scope.Thread)
    public static class Tridiagonal {
        @Param({"500", "1000", "2000", "4000", "8000"})
        public int n;

        Scenarios.ChannelWell well;
        SymmetricTridiagonalEigen eigen;
        EffectiveMassHamiltonian hamiltonian;
        double[] values;
        double[][] vectors;

        @Setup(Level.Trial)
        public void setUp() {
            well = Scenarios.channelWell(n);
            eigen = new SymmetricTridiagonalEigen();
            hamiltonian = EffectiveMassHamiltonian.of(well.mesh, well.massRatio);
            values = new double[K];
            vectors = new double[K][n];
            eigen.lowestInto(well.diag, well.off, K, values, vectors);
            BoundStates states = hamiltonian.lowest(well.potentialEv, K);
            Checks.sameLowest("EffectiveMassHamiltonian", states.energies(), values, well);
            Checks.sameLowest("SymmetricTridiagonalEigen.lowest", eigen.lowest(well.diag, well.off, K).values(), values,
                    well);
        }
    }

    /** EJML dense decomposition of the same matrix, N &le; 2000. */
    @State(Scope.Thread)
    public static class Dense {
        @Param({"500", "1000", "2000"})
        public int n;

        DMatrixRMaj matrix;
        DMatrixRMaj work;
        EigenDecomposition_F64<DMatrixRMaj> decomposition;
        Scenarios.ChannelWell well;
        double[][] last;

        @Setup(Level.Trial)
        public void setUp() {
            well = Scenarios.channelWell(n);
            matrix = new DMatrixRMaj(n, n);
            for (int i = 0; i < n; i++) {
                matrix.set(i, i, well.diag[i]);
                if (i < n - 1) {
                    matrix.set(i, i + 1, well.off[i]);
                    matrix.set(i + 1, i, well.off[i]);
                }
            }
            work = matrix.copy();
            decomposition = DecompositionFactory_DDRM.eig(n, true, true);
        }

        @TearDown(Level.Trial)
        public void check() {
            Checks.sameLowest("EJML dense", Checks.ran("ejmlDense", last)[0],
                    new SymmetricTridiagonalEigen().lowest(well.diag, well.off, K).values(), well);
        }
    }

    /**
     * Commons Math's tridiagonal EigenDecomposition, N = 500 ... 4000. Not at 8000: it
     * accumulates all N eigenvectors in a dense N x N array (O(N^3) time, one decomposition took
     * 635 s at N = 4000 on the 2-core machine of the README, so about 2 to 3 hours at 8000, and
     * 0.5 GB for the vectors).
     */
    @State(Scope.Thread)
    public static class Commons {
        @Param({"500", "1000", "2000", "4000"})
        public int n;

        Scenarios.ChannelWell well;
        double[][] last;

        @Setup(Level.Trial)
        public void setUp() {
            well = Scenarios.channelWell(n);
        }

        @TearDown(Level.Trial)
        public void check() {
            Checks.sameLowest("Commons Math", Checks.ran("commonsMath", last)[0],
                    new SymmetricTridiagonalEigen().lowest(well.diag, well.off, K).values(), well);
        }
    }

    /**
     * LAPACK's bisection and inverse-iteration driver pair on the same matrix, N = 500 ... 8000:
     * {@code dstebz('I', 'E', ..., il = 1, iu = 10, abstol = 0)} for the 10 lowest eigenvalues,
     * then {@code dstein} for their vectors, the two routines that
     * {@code scipy.linalg.eigh_tridiagonal(..., select='i', lapack_driver='stebz')} calls, here
     * through the pure-Java backend of dev.ludovic.netlib (the f2j translation of the reference
     * LAPACK), so that it runs in the same JVM as the library solver. Work arrays are allocated
     * once per trial.
     */
    @State(Scope.Thread)
    public static class Lapack {
        @Param({"500", "1000", "2000", "4000", "8000"})
        public int n;

        Scenarios.ChannelWell well;
        LAPACK lapack;
        double[] w;
        int[] iblock;
        int[] isplit;
        double[] work;
        int[] iwork;
        double[] z;
        double[] steinWork;
        int[] steinIwork;
        int[] ifail;
        double[][] last;

        @Setup(Level.Trial)
        public void setUp() {
            well = Scenarios.channelWell(n);
            lapack = JavaLAPACK.getInstance();
            w = new double[n];
            iblock = new int[n];
            isplit = new int[n];
            work = new double[4 * n];
            iwork = new int[3 * n];
            z = new double[n * K];
            steinWork = new double[5 * n];
            steinIwork = new int[n];
            ifail = new int[K];
        }

        @TearDown(Level.Trial)
        public void check() {
            Checks.sameLowest("LAPACK dstebz + dstein (pure Java)", Checks.ran("lapackStebzStein", last)[0],
                    new SymmetricTridiagonalEigen().lowest(well.diag, well.off, K).values(), well);
        }
    }

    /**
     * Library solver, allocation-free form ({@code lowestInto} into reused arrays).
     *
     * @param s state
     * @param bh sink
     */
    @Benchmark
    public void tridiagonal(Tridiagonal s, Blackhole bh) {
        bh.consume(s.eigen.lowestInto(s.well.diag, s.well.off, K, s.values, s.vectors));
        bh.consume(s.values);
        bh.consume(s.vectors);
    }

    /**
     * Library solver, allocating form ({@code lowest}, new result object per call).
     *
     * @param s state
     * @return the eigenpairs
     */
    @Benchmark
    public EigenPairs tridiagonalAllocating(Tridiagonal s) {
        return s.eigen.lowest(s.well.diag, s.well.off, K);
    }

    /**
     * The Schroedinger path of the self-consistent loop: {@code EffectiveMassHamiltonian.lowest}
     * (diagonal fill, eigen-solve, wavefunctions on the nodes).
     *
     * @param s state
     * @return the states
     */
    @Benchmark
    public BoundStates hamiltonian(Tridiagonal s) {
        return s.hamiltonian.lowest(s.well.potentialEv, K);
    }

    /**
     * Baseline: EJML dense symmetric eigen-decomposition with vectors, then the lowest 10 pairs.
     *
     * @param s state
     * @return the lowest eigenvectors
     */
    @Benchmark
    public double[][] ejmlDense(Dense s) {
        s.last = denseLowest(s);
        return s.last;
    }

    /**
     * Baseline: Commons Math tridiagonal EigenDecomposition, then the lowest 10 pairs.
     *
     * @param s state
     * @return the lowest eigenvectors
     */
    @Benchmark
    public double[][] commonsMath(Commons s) {
        s.last = commonsLowest(s);
        return s.last;
    }

    /**
     * Baseline: LAPACK dstebz + dstein (pure Java), the 10 lowest eigenpairs.
     *
     * @param s state
     * @return row 0 the eigenvalues, rows 1..10 the vectors
     */
    @Benchmark
    public double[][] lapackStebzStein(Lapack s) {
        s.last = lapackLowest(s);
        return s.last;
    }

    // ------------------------------------------------------------------ baselines' bodies

    /** Row 0: the k lowest eigenvalues; rows 1..k: their eigenvectors (dstebz + dstein). */
    static double[][] lapackLowest(Lapack s) {
        int n = s.n;
        intW m = new intW(0);
        intW nsplit = new intW(0);
        intW info = new intW(0);
        // dstebz and dstein read d and e only, but copies keep the well's arrays safe from any
        // translation quirk; O(N) against the solve
        double[] d = s.well.diag.clone();
        double[] e = s.well.off.clone();
        s.lapack.dstebz("I", "B", n, 0.0, 0.0, 1, K, 0.0, d, e, m, nsplit, s.w, s.iblock, s.isplit,
                s.work, s.iwork, info);
        if (info.val != 0 || m.val != K) {
            throw new IllegalStateException("dstebz failed: info " + info.val + ", m " + m.val);
        }
        s.lapack.dstein(n, d, e, K, s.w, s.iblock, s.isplit, s.z, n, s.steinWork, s.steinIwork, s.ifail, info);
        if (info.val != 0) {
            throw new IllegalStateException("dstein failed: info " + info.val);
        }
        double[][] out = new double[K + 1][];
        out[0] = new double[K];
        System.arraycopy(s.w, 0, out[0], 0, K);
        for (int j = 0; j < K; j++) {
            out[j + 1] = new double[n];
            System.arraycopy(s.z, j * n, out[j + 1], 0, n);
        }
        return out;
    }

    /** Row 0: the k lowest eigenvalues; rows 1..k: their eigenvectors. */
    static double[][] denseLowest(Dense s) {
        s.work.setTo(s.matrix); // decompose() overwrites its input; O(N^2) against O(N^3)
        if (!s.decomposition.decompose(s.work)) {
            throw new IllegalStateException("EJML eigen-decomposition failed");
        }
        int n = s.n;
        double[] all = new double[n];
        for (int i = 0; i < n; i++) {
            all[i] = s.decomposition.getEigenvalue(i).getReal();
        }
        int[] idx = lowestIndices(all, K);
        double[][] out = new double[K + 1][];
        out[0] = new double[K];
        for (int j = 0; j < K; j++) {
            out[0][j] = all[idx[j]];
            out[j + 1] = s.decomposition.getEigenVector(idx[j]).data.clone();
        }
        return out;
    }

    static double[][] commonsLowest(Commons s) {
        EigenDecomposition ed = new EigenDecomposition(s.well.diag, s.well.off);
        double[] all = ed.getRealEigenvalues();
        int[] idx = lowestIndices(all, K);
        double[][] out = new double[K + 1][];
        out[0] = new double[K];
        for (int j = 0; j < K; j++) {
            out[0][j] = all[idx[j]];
            out[j + 1] = ed.getEigenvector(idx[j]).toArray();
        }
        return out;
    }

    /** Indices of the k smallest entries, ascending by value; O(N k). */
    static int[] lowestIndices(double[] a, int k) {
        int[] idx = new int[k];
        boolean[] taken = new boolean[a.length];
        for (int j = 0; j < k; j++) {
            int best = -1;
            for (int i = 0; i < a.length; i++) {
                if (!taken[i] && (best < 0 || a[i] < a[best])) {
                    best = i;
                }
            }
            taken[best] = true;
            idx[j] = best;
        }
        return idx;
    }
}
