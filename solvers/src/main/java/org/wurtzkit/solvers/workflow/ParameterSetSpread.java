package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.function.Function;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;

/**
 * Solves the same design with every parameter set and reports how far the results spread: the
 * published constants disagree (polarization, band offsets, permittivities, masses), and a designer
 * must know how far to trust one number.
 *
 * <p>For each set the factory builds the structure; the full solver gives n_s at the structure's
 * own bias (one cold solve) and V_th by a bias sweep ({@link ThresholdExtraction}). Members run in
 * parallel (each independently, so the result does not depend on the thread count); a member
 * that fails is reported with its reason and left out of the statistics.
 *
 * <p>Immutable and thread-safe.
 */
public final class ParameterSetSpread {
    private final SelfConsistentSolver solver;
    private final ThresholdExtraction threshold;
    private final int threads;
    private final ProgressListener progress;

    /**
     * @param solver    the solver
     * @param threshold how V_th is obtained for each member
     */
    public ParameterSetSpread(SelfConsistentSolver solver, ThresholdExtraction threshold) {
        this(solver, threshold, Runtime.getRuntime().availableProcessors(), ProgressListener.NONE);
    }

    private ParameterSetSpread(SelfConsistentSolver solver, ThresholdExtraction threshold, int threads,
            ProgressListener progress) {
        this.solver = Require.nonNull("solver", solver);
        this.threshold = Require.nonNull("threshold extraction", threshold);
        this.threads = Require.inRange("thread count", threads, 1, 1024);
        this.progress = Require.nonNull("progress listener", progress);
    }

    /**
     * @param n worker threads, in [1, 1024] (default: all processors)
     * @return a copy with that thread count
     */
    public ParameterSetSpread withThreads(int n) {
        return new ParameterSetSpread(solver, threshold, n, progress);
    }

    /**
     * @param p progress listener, called once per member
     * @return a copy with that listener
     */
    public ParameterSetSpread withProgress(ProgressListener p) {
        return new ParameterSetSpread(solver, threshold, threads, p);
    }

    /**
     * Runs over every registered set ({@link ParameterSets#all()}).
     *
     * @param factory the structure for a set
     * @return the spread
     */
    public SpreadResult run(Function<ParameterSet, Structure> factory) {
        return run(factory, ParameterSets.all());
    }

    /**
     * @param factory the structure for a set; must be thread-safe
     * @param sets    the sets, at least one
     * @return the spread
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted, or a
     *         worker thread was (the same rules as {@link DesignMap#run()})
     */
    public SpreadResult run(Function<ParameterSet, Structure> factory, List<ParameterSet> sets) {
        Require.nonNull("structure factory", factory);
        Require.nonNullElements("parameter sets", sets);
        if (sets.isEmpty()) {
            throw new InvalidParameterException("number of parameter sets", "0",
                    "[1, ...) (is wurtzkit-materials-data on the class path?)");
        }
        List<ParameterSet> members = List.copyOf(sets);
        BiasSweep sweep = new BiasSweep(solver);
        @SuppressWarnings("unchecked")
        List<Warning>[] memberWarnings = new List[members.size()]; // each slot written by the one worker of its member
        ParallelPoints.Outcome[] out = ParallelPoints.run(members.size(), threads, i -> {
            Structure s = factory.apply(members.get(i));
            if (s == null) {
                throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT, "the structure factory returned null");
            }
            Solution own = solver.solve(s);
            BiasSweepResult r = sweep.run(s, threshold.grid());
            Threshold t = threshold.threshold(r);
            memberWarnings[i] = Warning.union(s.warnings(), own.warnings(), r.warnings(), t.warnings());
            return new double[] {own.sheetDensityPerCm2(), t.voltageV()};
        }, progress);
        return new SpreadResult(members, out, threshold, memberWarnings, factory, solver.options());
    }
}
