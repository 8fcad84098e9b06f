package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * Which input values a Monte Carlo study evaluates: n samples of k uncertain inputs, drawn by
 * {@link SamplingPlan#MONTE_CARLO} or {@link SamplingPlan#LATIN_HYPERCUBE} from a seed, optionally
 * arranged as the design of a variance-based sensitivity analysis.
 *
 * <p><b>Evaluations.</b> Without sensitivity analysis the design has n evaluations, evaluation r
 * being sample r. With it ({@link #sensitivity()}), it follows A. Saltelli et al., "Variance based
 * sensitivity analysis of model output. Design and estimator for the total sensitivity index",
 * Comput. Phys. Commun. 181, 259 (2010): two independent n &times; k sample matrices A and B, and
 * for each input i the matrix A<sub>B</sub><sup>(i)</sup>, which is A with column i taken from B.
 * That is n (k + 2) evaluations, numbered row by row: evaluation j belongs to row r = j / (k + 2)
 * and slot s = j mod (k + 2); slot 0 is row r of A, slot 1 row r of B, slot 2 + i row r of
 * A<sub>B</sub><sup>(i)</sup>. The statistics of the outputs use the 2n rows of A and B, which
 * are independent samples.
 *
 * <p><b>Random numbers, reproducible one sample at a time.</b> The uniform number of sample row r
 * and coordinate d is drawn from a stream of its own: the stream's seed is the (r + 1)-th output of
 * SplitMix64 started at the study's seed, and the number is the (d + 1)-th output of SplitMix64
 * started at the stream's seed (G. L. Steele, D. Lea, C. H. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014, 453 [from memory]; the same generator as
 * {@link java.util.SplittableRandom} created from a seed, which a test checks). The 52 high bits
 * give u = (m + 1/2) 2<sup>-52</sup>, strictly inside (0, 1). Every number is thus a pure function
 * of (seed, r, d): any evaluation can be recomputed alone, on any thread or machine, with the same
 * bits; the order in which evaluations run never matters. Coordinates 0..k-1 are the row of A (or
 * of the plain sample), k..2k-1 the row of B.
 *
 * <p><b>Latin hypercube.</b> For coordinate d, the stratum of row r is &pi;<sub>d</sub>(r), a
 * permutation of {0, ..., n-1} computed per row, not stored: a four-round Feistel network on the
 * smallest even power of two &ge; n, keyed from (seed, d), with cycle walking back into [0, n)
 * (J. Black, P. Rogaway, "Ciphers with arbitrary finite domains", CT-RSA 2002, LNCS 2271, 114
 * [from memory]); u = (&pi;<sub>d</sub>(r) + v) / n with v the row's uniform number for d. So a
 * Latin hypercube of 10<sup>7</sup> rows needs no memory beyond one sample.
 *
 * <p>Immutable and thread-safe.
 */
public final class SampleDesign {
    /** The golden-ratio increment of SplitMix64, 2^64 / phi rounded to odd. */
    static final long GOLDEN_GAMMA = 0x9E3779B97F4A7C15L;
    /** The largest double below 1. */
    private static final double BELOW_ONE = Math.nextDown(1.0);
    /** Largest number of evaluations (the index is an int). */
    static final int MAX_EVALUATIONS = Integer.MAX_VALUE - 8;

    private final List<UncertainInput> inputs;
    private final int samples;
    private final SamplingPlan plan;
    private final long seed;
    private final boolean sensitivity;

    /**
     * @param inputs      the uncertain inputs, at least one, names unique
     * @param samples     n, the number of sample rows, &ge; 2 (&ge; 2 rows of A and B with sensitivity)
     * @param plan        the sampling plan
     * @param seed        the seed of every random number
     * @param sensitivity whether to lay the evaluations out as the design of Saltelli et al. (2010)
     */
    public SampleDesign(List<UncertainInput> inputs, int samples, SamplingPlan plan, long seed, boolean sensitivity) {
        Require.nonNull("uncertain inputs", inputs);
        if (inputs.isEmpty()) {
            throw new InvalidParameterException("number of uncertain inputs", "0", "[1, ...) (add a tolerance)");
        }
        List<String> names = new ArrayList<>();
        for (UncertainInput in : inputs) {
            String name = Require.nonNull("uncertain input", in).column().name();
            if (names.contains(name)) {
                throw new InvalidParameterException("name of uncertain input " + (names.size() + 1), "\"" + name + "\"",
                        "a name not used by another input " + names);
            }
            names.add(name);
        }
        this.inputs = List.copyOf(inputs);
        this.plan = Require.nonNull("sampling plan", plan);
        this.seed = seed;
        this.sensitivity = sensitivity;
        long per = sensitivity ? inputs.size() + 2L : 1L;
        Require.inRange("number of samples", samples, 2, (int) (MAX_EVALUATIONS / per));
        this.samples = samples;
    }

    /** @return the inputs, in order */
    public List<UncertainInput> inputs() {
        return inputs;
    }

    /** @return n, the number of sample rows */
    public int samples() {
        return samples;
    }

    /** @return the sampling plan */
    public SamplingPlan plan() {
        return plan;
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    /** @return whether the evaluations form the Sobol design (A, B and A_B^(i)) */
    public boolean sensitivity() {
        return sensitivity;
    }

    /** @return the number of evaluations: n, or n (k + 2) with sensitivity */
    public int evaluations() {
        return sensitivity ? samples * (inputs.size() + 2) : samples;
    }

    /**
     * @param evaluation an evaluation index in [0, {@link #evaluations()})
     * @return its sample row (its index itself without sensitivity)
     */
    public int row(int evaluation) {
        check(evaluation);
        return sensitivity ? evaluation / (inputs.size() + 2) : evaluation;
    }

    /**
     * @param evaluation an evaluation index
     * @return its slot: 0 for A (or a plain sample), 1 for B, 2 + i for A_B^(i)
     */
    public int slot(int evaluation) {
        check(evaluation);
        return sensitivity ? evaluation % (inputs.size() + 2) : 0;
    }

    /**
     * @param evaluation an evaluation index
     * @return its matrix: "A", "B" or "A_B(name of input i)"; "sample" without sensitivity
     */
    public String role(int evaluation) {
        if (!sensitivity) {
            check(evaluation);
            return "sample";
        }
        int s = slot(evaluation);
        return s == 0 ? "A" : s == 1 ? "B" : "A_B(" + inputs.get(s - 2).column().name() + ")";
    }

    /**
     * The input values of one evaluation, a pure function of (seed, evaluation).
     *
     * @param evaluation an evaluation index in [0, {@link #evaluations()})
     * @return one value per input, in input order (a fresh array)
     */
    public double[] values(int evaluation) {
        int r = row(evaluation);
        int s = slot(evaluation);
        int k = inputs.size();
        double[] x = new double[k];
        for (int i = 0; i < k; i++) {
            boolean fromB = s == 1 || s == 2 + i;
            x[i] = inputs.get(i).distribution().quantile(uniform(r, fromB ? k + i : i));
        }
        return x;
    }

    /**
     * A function of the inputs evaluated over a design: must be thread-safe and deterministic; an
     * exception it throws marks the evaluation failed.
     */
    @FunctionalInterface
    public interface Response {
        /**
         * @param inputs one value per input (a fresh array)
         * @return one value per output
         */
        double[] values(double[] inputs);
    }

    /**
     * Evaluates a function of the inputs at every evaluation of the design, in parallel; the
     * result does not depend on the thread count. The statistics and sensitivity indices of
     * {@link ToleranceStudy} are computed by the same code.
     *
     * @param outputs  the columns the response returns, at least one
     * @param response the function
     * @param threads  worker threads, in [1, 1024]
     * @param progress progress listener
     * @return the result
     */
    public ToleranceStudyResult run(List<Column> outputs, Response response, int threads, ProgressListener progress) {
        Require.nonNull("output columns", outputs);
        Require.nonNull("response", response);
        Require.inRange("thread count", threads, 1, 1024);
        Require.nonNull("progress listener", progress);
        int width = outputs.size();
        ParallelPoints.Outcome[] out = ParallelPoints.run(evaluations(), threads, j -> {
            double[] v = response.values(values(j));
            if (v == null || v.length != width) {
                throw new IllegalStateException("the response returned " + (v == null ? "null" : v.length + " values")
                        + ", expected " + width);
            }
            return v.clone();
        }, progress);
        return ToleranceStudyResult.of(this, outputs, out);
    }

    /**
     * @param row        a sample row
     * @param coordinate a coordinate, 0..k-1 for A, k..2k-1 for B
     * @return the row's uniform number in (0, 1) for that coordinate
     */
    double uniform(int row, int coordinate) {
        double v = openUnit(streamDraw(stream(seed, row), coordinate));
        if (plan == SamplingPlan.MONTE_CARLO) {
            return v;
        }
        long key = stream(seed ^ 0x5DEECE66DL, -1 - coordinate);
        int stratum = permute(row, samples, key);
        // (n - 1 + v) / n rounds to 1.0 when n is large and v near 1: keep the open interval
        return Math.min((stratum + v) / samples, BELOW_ONE);
    }

    /**
     * The finalizer (mixing function) of SplitMix64, "mix64" of Steele, Lea &amp; Flood (2014).
     *
     * @param z a 64-bit value
     * @return its mix
     */
    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /**
     * @param seed the study's seed
     * @param row  a row (or a negative key number)
     * @return the seed of that row's stream: output row + 1 of SplitMix64 started at seed
     */
    static long stream(long seed, long row) {
        return mix64(seed + (row + 1) * GOLDEN_GAMMA);
    }

    /**
     * @param streamSeed a stream's seed
     * @param draw       the draw's number, from 0
     * @return output draw + 1 of SplitMix64 started at streamSeed
     */
    static long streamDraw(long streamSeed, int draw) {
        return mix64(streamSeed + (draw + 1L) * GOLDEN_GAMMA);
    }

    /**
     * @return (top 52 bits + 1/2) 2^-52, in [2^-53, 1 - 2^-53]: exact, since m + 1/2 for m &lt; 2^52
     *         needs 53 significant bits (with 53 bits, m + 1/2 would round and could give 1.0)
     */
    static double openUnit(long bits) {
        return ((bits >>> 12) + 0.5) * 0x1.0p-52;
    }

    /**
     * A keyed permutation of [0, n): a four-round balanced Feistel network on 2^(2h) &ge; n values
     * with round function mix64, and cycle walking (re-encrypting until the value falls below n).
     * A Feistel network is a bijection of its domain for any round function, and cycle walking
     * restricts a bijection to a subset; the domain is less than 4n, so fewer than four walks are
     * needed on average.
     *
     * @param x   a value in [0, n)
     * @param n   the domain size, &ge; 1
     * @param key the permutation's key
     * @return &pi;(x) in [0, n)
     */
    static int permute(int x, int n, long key) {
        int bits = Math.max(2, 64 - Long.numberOfLeadingZeros(n - 1L));
        int half = (bits + 1) / 2;
        long mask = (1L << half) - 1;
        long y = x;
        do {
            long left = y >>> half;
            long right = y & mask;
            for (int round = 0; round < 4; round++) {
                long f = mix64(right + key + round * GOLDEN_GAMMA) & mask;
                long next = left ^ f;
                left = right;
                right = next;
            }
            y = (left << half) | right;
        } while (y >= n);
        return (int) y;
    }

    private void check(int evaluation) {
        Require.inRange("evaluation index", evaluation, 0, evaluations() - 1);
    }

    @Override
    public String toString() {
        return "SampleDesign[" + samples + " samples, " + plan + ", seed " + seed + (sensitivity ? ", Sobol design" : "")
                + ", inputs " + inputs.stream().map(i -> i.column().name()).toList() + "]";
    }
}
