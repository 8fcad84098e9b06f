package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntFunction;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Runs independent points on a fixed number of threads. Each point's result lands in its own
 * slot, so the outcome does not depend on the thread count or the scheduling: a point's numbers
 * are computed by the same code from the same inputs whichever thread runs it.
 */
final class ParallelPoints {
    private ParallelPoints() {
    }

    /**
     * One point's computation; a library exception ({@link InvalidParameterException} or
     * {@link WurtzkitException}) marks the point failed, any other exception is a defect and
     * propagates.
     */
    @FunctionalInterface
    interface Task {
        double[] run(int index);
    }

    /** A point's values, or (values null) why it failed. */
    record Outcome(double[] values, PointFailure.Reason failure) {
    }

    private static final AtomicInteger POOL_COUNT = new AtomicInteger();

    /**
     * @param count    number of points, &ge; 1
     * @param threads  worker threads, &ge; 1 (1: run in the calling thread)
     * @param task     the computation
     * @param progress receives (done, total), serialized
     * @return one outcome per point
     * @throws CancellationException if the calling thread is interrupted (checked before every point
     *                               with one thread; with several, the wait ends at once and the
     *                               workers are interrupted), or a worker thread was interrupted
     */
    static Outcome[] run(int count, int threads, Task task, ProgressListener progress) {
        int[] order = new int[count];
        int[] start = new int[count + 1];
        for (int i = 0; i < count; i++) {
            order[i] = i;
            start[i + 1] = i + 1;
        }
        return run(count, order, start, threads, c -> task, progress);
    }

    /**
     * Runs chains of points: a worker takes a whole chain and runs its points in the chain's order
     * with one task made for that chain ({@code taskOfChain}), which may carry state from one
     * point to the next (e.g. the previous point's solution as the next one's start). Since a
     * chain's points see only their own chain, the outcome does not depend on the thread count or
     * on which worker takes which chain, as long as the chains do not depend on the thread count.
     *
     * @param count       number of points, &ge; 1
     * @param order       every point index in [0, count) once, chain after chain
     * @param chainStart  chain c is {@code order[chainStart[c] .. chainStart[c + 1])}; length = chains + 1
     * @param threads     worker threads, &ge; 1 (1: run in the calling thread)
     * @param taskOfChain makes the task of chain c; called once per chain, on the thread that runs it
     * @param progress    receives (done, total) once per point, serialized
     * @return one outcome per point
     * @throws CancellationException as {@link #run(int, int, Task, ProgressListener)}
     */
    static Outcome[] run(int count, int[] order, int[] chainStart, int threads, IntFunction<Task> taskOfChain,
            ProgressListener progress) {
        Outcome[] out = new Outcome[count];
        Object lock = new Object();
        int[] done = {0};
        Runnable tick = () -> {
            synchronized (lock) {
                done[0]++;
                progress.progress(done[0], count);
            }
        };
        int chains = chainStart.length - 1;
        int workers = Math.min(threads, chains);
        if (workers <= 1) {
            for (int c = 0; c < chains; c++) {
                Task task = null;
                for (int k = chainStart[c]; k < chainStart[c + 1]; k++) {
                    int i = order[k];
                    if (Thread.currentThread().isInterrupted()) {
                        int finished;
                        synchronized (lock) {
                            finished = done[0];
                        }
                        throw interrupted(finished, count, null);
                    }
                    if (task == null) {
                        task = taskOfChain.apply(c);
                    }
                    out[i] = one(task, i);
                    tick.run();
                }
            }
            return out;
        }
        int pool = POOL_COUNT.incrementAndGet();
        AtomicInteger threadNo = new AtomicInteger();
        ThreadFactory factory = r -> {
            Thread t = new Thread(r, "wurtzkit-workflow-" + pool + "-" + threadNo.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
        ExecutorService exec = Executors.newFixedThreadPool(workers, factory);
        AtomicInteger next = new AtomicInteger();
        AtomicBoolean stop = new AtomicBoolean();
        List<Future<?>> futures = new ArrayList<>(workers);
        try {
            for (int w = 0; w < workers; w++) {
                futures.add(exec.submit(() -> {
                    // the flag is checked before every point; a worker whose flag is set (a task
                    // restored it, or shutdownNow) stops every worker before its next point, and
                    // the map reports the points not done
                    while (true) {
                        if (Thread.currentThread().isInterrupted()) {
                            stop.set(true);
                        }
                        if (stop.get()) {
                            return;
                        }
                        int c = next.getAndIncrement();
                        if (c >= chains) {
                            return;
                        }
                        Task task = taskOfChain.apply(c);
                        for (int k = chainStart[c]; k < chainStart[c + 1]; k++) {
                            int i = order[k];
                            if (Thread.currentThread().isInterrupted()) {
                                stop.set(true);
                            }
                            if (stop.get()) {
                                return;
                            }
                            out[i] = one(task, i);
                            tick.run();
                        }
                    }
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            int finished;
            synchronized (lock) {
                finished = done[0];
            }
            throw interrupted(finished, count, e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new AssertionError("a workflow task threw a checked exception", cause);
        } finally {
            exec.shutdownNow();
        }
        for (int i = 0; i < count; i++) {
            if (out[i] == null) {
                // a worker thread was interrupted (e.g. a task caught InterruptedException and
                // restored the flag, as it should): the workflow was cancelled from inside
                int finished;
                synchronized (lock) {
                    finished = done[0];
                }
                CancellationException c = new CancellationException(String.format(Locale.ROOT,
                        "workflow interrupted: point %d of %d not computed because its worker thread was interrupted "
                                + "(%d points done)", i, count, finished));
                throw c;
            }
        }
        return out;
    }

    /** The exception of an interrupted workflow, with how far it got. */
    private static CancellationException interrupted(int finished, int count, InterruptedException cause) {
        CancellationException c = new CancellationException(String.format(Locale.ROOT,
                "workflow interrupted after %d of %d points", finished, count));
        if (cause != null) {
            c.initCause(cause);
        }
        return c;
    }

    private static Outcome one(Task task, int i) {
        try {
            return new Outcome(task.run(i), null);
        } catch (InvalidParameterException | WurtzkitException e) {
            return new Outcome(null, PointFailure.Reason.of(e));
        }
    }
}
