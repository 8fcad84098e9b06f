package org.wurtzkit.solvers.workflow;

/**
 * Receives the progress of a parallel workflow, e.g. to drive a progress bar. Calls are made from
 * the worker threads, but never concurrently: they are serialized, and {@code done} rises by one
 * from call to call, from 1 to {@code total}. Failed points count as done. The listener should
 * return quickly; an exception it throws aborts the run and is rethrown to the caller.
 */
@FunctionalInterface
public interface ProgressListener {
    /** A listener that ignores progress. */
    ProgressListener NONE = (done, total) -> {
    };

    /**
     * @param done  points finished so far, in [1, total]
     * @param total points in the run
     */
    void progress(int done, int total);
}
