package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;

/**
 * A design map: the full solver over the Cartesian grid of any number of structure parameters,
 * run in parallel.
 *
 * <pre>{@code
 * DesignMapResult map = DesignMap.builder((double[] p) -> hemt(p[0], p[1]))
 *         .axis(Axis.of("al_fraction", "", 0.15, 0.20, 0.25, 0.30))
 *         .axis(Axis.linear("barrier_thickness", "nm", 10, 40, 7))
 *         .progress((done, total) -> System.out.printf("%d/%d%n", done, total))
 *         .build()
 *         .run();
 * map.writeCsv(Path.of("map.csv"));
 * }</pre>
 *
 * <p><b>Order.</b> Points are numbered row-major: the last axis varies fastest.
 *
 * <p><b>Determinism.</b> Every point is built by the factory and evaluated from a cold start,
 * independently of every other point, and its result is stored in its own slot; so the map is the
 * same, bit for bit, for any thread count (given a deterministic factory and evaluator).
 *
 * <p><b>Continuation</b> ({@link Builder#continuation(boolean)}, off by default). With it, the
 * points are visited in serpentine order (along the last axis, forward in even rows and backward
 * in odd ones, so that consecutive points are neighbours), and that order is cut into chains of
 * at most {@value #MAX_CHAIN_POINTS} consecutive points, at least {@value #MIN_CHAINS} chains when
 * the map has that many points. A worker takes a whole chain: its first point is solved cold and
 * every further point starts from the solution of the one before it in the chain (the last that
 * converged), carried onto the new stack layer by layer (a thicker barrier moves the channel's
 * potential with the channel), or, when the points before it in the chain lie on the same row,
 * from the extrapolation through the last two (linear) or three (quadratic) of them, a failed
 * continued solve being retried cold. The
 * chains depend only on the axis sizes, never on the thread count or on which worker takes which
 * chain, so a continued map is also the same bit for bit for any thread count. Its values agree with those of cold solves to
 * within the solver's convergence tolerance, not bit for bit. It needs the quantities evaluator
 * ({@link Builder#quantities(Quantity...)}, the default).
 *
 * <p><b>Failures.</b> If the factory or the evaluation throws a library exception (e.g. an invalid
 * composition, or {@link org.wurtzkit.solvers.sp.NotConvergedException}), the point is recorded as
 * failed with the exception's kind, type and message ({@link DesignMapResult#failure(int)}) and the
 * map goes on. Any other exception (a null pointer, an index out of bounds) is a defect and
 * propagates.
 *
 * <p>A configured map is immutable and may be run several times, also concurrently.
 */
public final class DesignMap {
    private final StructureFactory factory;
    private final List<Axis> axes;
    private final SelfConsistentSolver solver;
    private final PointEvaluator evaluator;
    private final int threads;
    private final ProgressListener progress;
    private final boolean continuation;

    /** Fewest chains a continued map is cut into (when it has that many points): work for 16 threads. */
    public static final int MIN_CHAINS = 16;
    /** Most points in one chain of a continued map: one cold solve per this many points at most. */
    public static final int MAX_CHAIN_POINTS = 256;

    private DesignMap(Builder b) {
        this.factory = b.factory;
        if (b.axes.isEmpty()) {
            throw new InvalidParameterException("number of design-map axes", "0", "[1, ...) (add an axis)");
        }
        this.axes = List.copyOf(b.axes);
        long points = 1;
        for (Axis a : axes) {
            points *= a.size();
            if (points > Integer.MAX_VALUE - 8) {
                throw new InvalidParameterException("number of design-map points", Long.toString(points),
                        "[1, " + (Integer.MAX_VALUE - 8) + "]");
            }
        }
        this.solver = b.run.solver();
        this.evaluator = b.evaluator;
        this.threads = b.run.threads();
        this.progress = b.run.progress();
        this.continuation = b.continuation;
        if (continuation && !(evaluator instanceof QuantityEvaluator)) {
            throw new InvalidParameterException("design-map continuation", "on, with a custom point evaluator",
                    "off, or on with the quantities evaluator (Builder.quantities)");
        }
    }

    /**
     * @param factory builds a point's structure from the axis values
     * @return a builder
     */
    public static Builder builder(StructureFactory factory) {
        return new Builder(factory);
    }

    /** {@return the axes, in order} */
    public List<Axis> axes() {
        return axes;
    }

    /** {@return the number of points, the product of the axis sizes} */
    public int size() {
        int n = 1;
        for (Axis a : axes) {
            n *= a.size();
        }
        return n;
    }

    /** {@return whether neighbouring points start from each other's solutions (see the class notes)} */
    public boolean continuation() {
        return continuation;
    }

    /** {@return the thread count the map runs with} */
    public int threads() {
        return threads;
    }

    /**
     * @param index a point index
     * @return the axis values of that point
     */
    double[] parameters(int index) {
        double[] p = new double[axes.size()];
        int rest = index;
        for (int a = axes.size() - 1; a >= 0; a--) {
            Axis axis = axes.get(a);
            p[a] = axis.get(rest % axis.size());
            rest /= axis.size();
        }
        return p;
    }

    /**
     * Runs the map. Blocks until every point is done.
     *
     * @return the map
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted (with one
     *         thread checked before every point; with several the wait ends at once and the workers are
     *         interrupted; the flag stays set), or if a worker thread was interrupted, e.g. by an
     *         evaluator that caught {@link InterruptedException} and restored the flag
     */
    public DesignMapResult run() {
        int n = size();
        int width = evaluator.columns().size();
        @SuppressWarnings("unchecked")
        List<Warning>[] pointWarnings = new List[n]; // each slot written by the one worker of its point
        ParallelPoints.Outcome[] out;
        if (continuation) {
            QuantityEvaluator q = (QuantityEvaluator) evaluator;
            int[] order = serpentine();
            int[] start = chainStarts(n);
            out = ParallelPoints.run(n, order, start, threads, c -> {
                // the chain's last converged solutions, newest first, and their point indices
                Solution[] last = new Solution[Continuation.PREDICTOR_POINTS];
                int[] at = new int[Continuation.PREDICTOR_POINTS];
                return i -> {
                    Structure s = structureAt(i);
                    Solution sol;
                    if (last[0] == null) {
                        sol = solver.solve(s);
                    } else {
                        try {
                            sol = continued(s, i, last, at);
                        } catch (InvalidParameterException | WurtzkitException e) {
                            sol = solver.solve(s); // continued solve failed: cold, as a map without continuation
                        }
                    }
                    for (int k = last.length - 1; k > 0; k--) {
                        last[k] = last[k - 1];
                        at[k] = at[k - 1];
                    }
                    last[0] = sol;
                    at[0] = i;
                    PointEvaluator.Evaluated e = q.read(s, sol);
                    pointWarnings[i] = e.warnings();
                    return e.values();
                };
            }, progress);
        } else {
            out = ParallelPoints.run(n, threads, i -> pointValues(structureAt(i), width, pointWarnings, i), progress);
        }
        double[][] params = new double[n][];
        for (int i = 0; i < n; i++) {
            params[i] = parameters(i);
        }
        return new DesignMapResult(axes, evaluator.columns(), params, out, pointWarnings,
                new DesignMapResult.Setup(factory, solver.options(), evaluator.description()
                        + (continuation ? "; continued along serpentine chains (DesignMap.Builder.continuation)" : "")));
    }

    /**
     * A continued solve of point i: extrapolated through the chain's last solutions that lie on
     * the same row (the last axis) as i, up to {@link Continuation#PREDICTOR_POINTS} of them
     * (quadratic through three, linear through two), else from the last solution alone; all
     * carried onto the point's stack layer by layer.
     */
    private Solution continued(Structure s, int i, Solution[] last, int[] at) {
        Axis axis = axes.get(axes.size() - 1);
        int row = axis.size();
        int held = 0;
        while (held < last.length && last[held] != null && at[held] / row == i / row) {
            held++;
        }
        if (held >= 2) {
            Solution[] from = new Solution[held];
            double[] p = new double[held];
            for (int k = 0; k < held; k++) {
                from[held - 1 - k] = last[k];
                p[held - 1 - k] = axis.get(at[k] % row);
            }
            double[][] guess = Continuation.alignedGuess(from, p, axis.get(i % row), s);
            return solver.solve(s, guess[0], guess[1]);
        }
        return solver.solve(s, Continuation.alignedDepth(last[0], s), last[0].potential());
    }

    private Structure structureAt(int i) {
        Structure s = factory.at(parameters(i));
        if (s == null) {
            throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT, "the structure factory returned null");
        }
        return s;
    }

    /**
     * The point indices in serpentine order: rows along the last axis, even rows forward and odd
     * rows backward.
     */
    int[] serpentine() {
        int n = size();
        int row = axes.get(axes.size() - 1).size();
        int[] order = new int[n];
        for (int p = 0; p < n; p++) {
            int r = p / row;
            int j = p % row;
            order[p] = r * row + (r % 2 == 0 ? j : row - 1 - j);
        }
        return order;
    }

    /**
     * Chain boundaries in the serpentine order: chains of equal length (the last may be shorter),
     * at most {@link #MAX_CHAIN_POINTS} points each and at least {@link #MIN_CHAINS} chains when
     * there are that many points. A function of the point count alone.
     *
     * @param n the point count
     * @return chain c is positions [start[c], start[c + 1]) of the serpentine order
     */
    static int[] chainStarts(int n) {
        int length = (int) Math.max(1, Math.min(MAX_CHAIN_POINTS, (n + (long) MIN_CHAINS - 1) / MIN_CHAINS));
        int chains = (n + length - 1) / length;
        int[] start = new int[chains + 1];
        for (int c = 0; c <= chains; c++) {
            start[c] = Math.min(n, c * length);
        }
        return start;
    }

    private double[] pointValues(Structure s, int width, List<Warning>[] pointWarnings, int i) {
        PointEvaluator.Evaluated e = evaluator.evaluateWithWarnings(s, solver);
        double[] v = e == null ? null : e.values();
        if (v == null || v.length != width) {
            throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT,
                    "the evaluator returned " + (v == null ? "null" : v.length + " values") + ", expected " + width);
        }
        pointWarnings[i] = e.warnings();
        return v.clone();
    }

    /** Mutable builder. */
    public static final class Builder {
        private final StructureFactory factory;
        private final List<Axis> axes = new ArrayList<>();
        private PointEvaluator evaluator = PointEvaluator.solve(Quantity.SHEET_DENSITY, Quantity.GATE_CHARGE);
        private RunSettings run = RunSettings.defaults();
        private boolean continuation;

        private Builder(StructureFactory factory) {
            this.factory = Require.nonNull("structure factory", factory);
        }

        /**
         * @param axis the next axis
         * @return this builder
         */
        public Builder axis(Axis axis) {
            axes.add(Require.nonNull("axis", axis));
            return this;
        }

        /**
         * @param s the solver (default: {@link SelfConsistentSolver#SelfConsistentSolver()})
         * @return this builder
         */
        public Builder solver(SelfConsistentSolver s) {
            run = run.withSolver(s);
            return this;
        }

        /**
         * One cold solve per point, from which these quantities are read; replaces an evaluator
         * set before.
         *
         * @param q the quantities to read from each point's solution (default: sheet density and
         *          gate charge)
         * @return this builder
         */
        public Builder quantities(Quantity... q) {
            this.evaluator = PointEvaluator.solve(q);
            return this;
        }

        /**
         * @param e what to compute at each point; replaces quantities set before
         * @return this builder
         */
        public Builder evaluator(PointEvaluator e) {
            this.evaluator = Require.nonNull("point evaluator", e);
            return this;
        }

        /**
         * @param n worker threads, in [1, 1024] (default: {@link Runtime#availableProcessors()});
         *          1 runs every point in the calling thread
         * @return this builder
         */
        public Builder threads(int n) {
            run = run.withThreads(n);
            return this;
        }

        /**
         * @param p progress listener (default: none)
         * @return this builder
         */
        public Builder progress(ProgressListener p) {
            run = run.withProgress(p);
            return this;
        }

        /**
         * Continuation between neighbouring points (see the class notes): each point of a chain
         * starts from its predecessor's solution instead of a cold start, which needs fewer
         * iterations; the map stays bit-for-bit the same for any thread count, and its values agree
         * with cold solves to within the solver's tolerance. Default off: every point is then
         * bit-for-bit the direct cold solve of its structure.
         *
         * @param on whether to continue from neighbours; needs the quantities evaluator
         * @return this builder
         */
        public Builder continuation(boolean on) {
            this.continuation = on;
            return this;
        }

        /**
         * {@return the map}
         *
         * @throws InvalidParameterException if there is no axis, or continuation is on with a custom
         *                                   evaluator
         */
        public DesignMap build() {
            return new DesignMap(this);
        }
    }
}
