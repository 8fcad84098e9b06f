package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
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
     */
    static Outcome[] run(int count, int threads, Task task, ProgressListener progress) {
        Outcome[] out = new Outcome[count];
        Object lock = new Object();
        int[] done = {0};
        Runnable tick = () -> {
            synchronized (lock) {
                done[0]++;
                progress.progress(done[0], count);
            }
        };
        int workers = Math.min(threads, count);
        if (workers <= 1) {
            for (int i = 0; i < count; i++) {
                out[i] = one(task, i);
                tick.run();
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
        List<Future<?>> futures = new ArrayList<>(workers);
        try {
            for (int w = 0; w < workers; w++) {
                futures.add(exec.submit(() -> {
                    for (int i = next.getAndIncrement(); i < count; i = next.getAndIncrement()) {
                        if (Thread.currentThread().isInterrupted()) {
                            return;
                        }
                        out[i] = one(task, i);
                        tick.run();
                    }
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            CancellationException c = new CancellationException("workflow interrupted");
            c.initCause(e);
            throw c;
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
        return out;
    }

    private static Outcome one(Task task, int i) {
        try {
            return new Outcome(task.run(i), null);
        } catch (InvalidParameterException | WurtzkitException e) {
            return new Outcome(null, PointFailure.Reason.of(e));
        }
    }
}
