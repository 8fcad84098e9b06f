package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;

/**
 * How a multi-point workflow runs, the settings that the builders of {@link DesignMap},
 * {@link DesignTradeoff} and {@link ToleranceStudy} share: the solver, the number of worker threads
 * and the progress listener. Each builder keeps one and its public setters delegate to the
 * {@code with...} methods here, the one home of their checks and defaults.
 *
 * @param solver   the solver of every point
 * @param threads  worker threads, in [1, {@value #MAX_THREADS}]
 * @param progress the progress listener
 */
record RunSettings(SelfConsistentSolver solver, int threads, ProgressListener progress) {
    /** Most worker threads a workflow accepts. */
    static final int MAX_THREADS = 1024;

    /**
     * {@return the defaults: the default solver, one thread per available processor, no progress listener}
     */
    static RunSettings defaults() {
        return new RunSettings(new SelfConsistentSolver(), Runtime.getRuntime().availableProcessors(),
                ProgressListener.NONE);
    }

    /**
     * @param s the solver
     * @return these settings with that solver
     * @throws InvalidParameterException if s is null
     */
    RunSettings withSolver(SelfConsistentSolver s) {
        return new RunSettings(Require.nonNull("solver", s), threads, progress);
    }

    /**
     * @param n worker threads, in [1, {@value #MAX_THREADS}]
     * @return these settings with that many threads
     * @throws InvalidParameterException if n is outside that range
     */
    RunSettings withThreads(int n) {
        return new RunSettings(solver, Require.inRange("thread count", n, 1, MAX_THREADS), progress);
    }

    /**
     * @param p the progress listener
     * @return these settings with that listener
     * @throws InvalidParameterException if p is null
     */
    RunSettings withProgress(ProgressListener p) {
        return new RunSettings(solver, threads, Require.nonNull("progress listener", p));
    }
}
