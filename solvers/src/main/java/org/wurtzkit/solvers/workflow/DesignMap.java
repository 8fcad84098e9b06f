package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
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
        ParallelPoints.Outcome[] out = ParallelPoints.run(n, threads, i -> {
            Structure s = factory.at(parameters(i));
            if (s == null) {
                throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT, "the structure factory returned null");
            }
            PointEvaluator.Evaluated e = evaluator.evaluateWithWarnings(s, solver);
            double[] v = e == null ? null : e.values();
            if (v == null || v.length != width) {
                throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT,
                        "the evaluator returned " + (v == null ? "null" : v.length + " values")
                        + ", expected " + width);
            }
            pointWarnings[i] = e.warnings();
            return v.clone();
        }, progress);
        double[][] params = new double[n][];
        for (int i = 0; i < n; i++) {
            params[i] = parameters(i);
        }
        return new DesignMapResult(axes, evaluator.columns(), params, out, pointWarnings,
                new DesignMapResult.Setup(factory, solver.options(), evaluator.description()));
    }

    /** Mutable builder. */
    public static final class Builder {
        private final StructureFactory factory;
        private final List<Axis> axes = new ArrayList<>();
        private PointEvaluator evaluator = PointEvaluator.solve(Quantity.SHEET_DENSITY, Quantity.GATE_CHARGE);
        private RunSettings run = RunSettings.defaults();

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
         * {@return the map}
         *
         * @throws InvalidParameterException if there is no axis
         */
        public DesignMap build() {
            return new DesignMap(this);
        }
    }
}
