// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.ParameterSetSpread;
import org.wurtzkit.solvers.workflow.PointEvaluator;
import org.wurtzkit.solvers.workflow.StructureFamilies;
import org.wurtzkit.solvers.workflow.TargetSearch;
import org.wurtzkit.solvers.workflow.TemperatureSweep;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.solvers.workflow.Distribution;
import org.wurtzkit.solvers.workflow.Tolerance;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * Interruption of the long workflows (issue #14): a design map (one thread and several), a
 * tolerance study (one thread and several), a parameter-set spread, the sweeps and a target search stop with a {@link CancellationException}
 * within one point per thread once their thread is interrupted or their future cancelled, and an
 * evaluator that restores its worker's interrupt flag (the correct reaction to an
 * {@link InterruptedException}, B. Goetz et al., Java Concurrency in Practice, Addison-Wesley 2006,
 * ch. 7; from memory) cancels the map instead of leaving a point empty. The evaluators here count
 * points and wait on a clock instead of solving, so that the counts, not timings, carry the checks;
 * the preemptive joins only guard against a hang.
 */
@Tag("reliability")
class WorkflowInterruptionTest {
    private static final long GUARD_SECONDS = 20;

    private static Structure hemt() {
        return StandardStacks.hemt(ParameterSets.defaultSet(), 1000, 0.25, 25, 0, TopBoundary.schottky(1, 0));
    }

    /**
     * An evaluator that counts its points, calls {@code atPoint} at each, and then waits
     * {@code millis}; an interrupt during the wait is caught and the flag restored.
     */
    private static PointEvaluator counting(AtomicInteger count, long millis, java.util.function.IntConsumer atPoint) {
        return new PointEvaluator() {
            @Override
            public List<Column> columns() {
                return List.of(Column.of("index", ""));
            }

            @Override
            public double[] evaluate(Structure structure, SelfConsistentSolver solver) {
                int k = count.incrementAndGet();
                atPoint.accept(k);
                if (millis > 0) {
                    try {
                        Thread.sleep(millis);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                }
                return new double[] {k};
            }
        };
    }

    private static DesignMap map(int threads, int points, PointEvaluator e) {
        return DesignMap.builder(p -> hemt()).axis(Axis.linear("x", "", 0, 1, points)).threads(threads).evaluator(e)
                .build();
    }

    /**
     * A one-thread map whose evaluator interrupts its own thread at point 3 (as a task that caught
     * an InterruptedException and restored the flag would): the map stops before point 4 and throws
     * CancellationException, leaving the flag set. (Found: the one-thread map ignored interruption.)
     */
    @Test
    void oneThreadMapStopsAtTheNextPoint() {
        AtomicInteger count = new AtomicInteger();
        DesignMap m = map(1, 50, counting(count, 0, k -> {
            if (k == 3) {
                Thread.currentThread().interrupt();
            }
        }));
        CancellationException e = assertThrows(CancellationException.class, m::run);
        assertTrue(Thread.interrupted(), "the interrupt flag stays set (and is cleared here)");
        assertEquals(3, count.get(), "points evaluated");
        assertTrue(e.getMessage().contains("after 3 of 50 points"), e.getMessage());
    }

    /**
     * A map on several threads whose evaluator restores its worker's interrupt flag at point 5.
     * Found: a NullPointerException from the result, because the worker stopped after claiming its
     * next point and left it empty. Now: a CancellationException naming the point not computed.
     */
    @ParameterizedTest(name = "{0} threads")
    @ValueSource(ints = {2, 4})
    void workerThatRestoresItsFlagCancelsTheMap(int threads) {
        AtomicInteger count = new AtomicInteger();
        DesignMap m = map(threads, 40, counting(count, 0, k -> {
            if (k == 5) {
                Thread.currentThread().interrupt();
            }
        }));
        CancellationException e = assertThrows(CancellationException.class, m::run);
        assertTrue(e.getMessage().contains("worker thread was interrupted"), e.getMessage());
        assertFalse(Thread.currentThread().isInterrupted(), "the caller's thread was not interrupted");
    }

    /**
     * A map running in its own thread is interrupted from outside after 4 points: it throws
     * CancellationException and every worker stops after the point it is on, so at most one more
     * point per thread is evaluated.
     */
    @ParameterizedTest(name = "{0} threads")
    @ValueSource(ints = {1, 2, 3})
    void mapInterruptedFromOutsideStopsWithinOnePointPerThread(int threads) throws InterruptedException {
        AtomicInteger count = new AtomicInteger();
        CountDownLatch fourDone = new CountDownLatch(4);
        DesignMap m = map(threads, 200, counting(count, 20, k -> fourDone.countDown()));
        interruptFromOutside(m::run, "map", count, fourDone, threads);
    }

    /**
     * A map submitted to an executor and cancelled through its future (cancel(true) interrupts the
     * running thread) stops within one point per thread.
     */
    @ParameterizedTest(name = "{0} threads")
    @ValueSource(ints = {1, 2})
    void cancelledFutureStopsTheMap(int threads) throws Exception {
        AtomicInteger count = new AtomicInteger();
        CountDownLatch threeDone = new CountDownLatch(3);
        DesignMap m = map(threads, 200, counting(count, 20, k -> threeDone.countDown()));
        ExecutorService exec = Executors.newSingleThreadExecutor();
        try {
            Future<?> f = exec.submit(m::run);
            assertTrue(threeDone.await(GUARD_SECONDS, TimeUnit.SECONDS));
            int atCancel = count.get();
            assertTrue(f.cancel(true));
            exec.shutdown();
            assertTrue(exec.awaitTermination(GUARD_SECONDS, TimeUnit.SECONDS), "the map did not stop");
            Thread.sleep(200);
            assertTrue(count.get() <= atCancel + threads,
                    count.get() + " points evaluated, " + atCancel + " when cancelled, " + threads + " threads");
        } finally {
            exec.shutdownNow();
        }
    }

    private static ToleranceStudy study(int threads, int samples, PointEvaluator e) {
        return ToleranceStudy.builder(hemt()).tolerance(Tolerance.layerThicknessNm("barrier", Distribution.uniform(20, 30)))
                .samples(samples).seed(731).threads(threads).evaluators(e).build();
    }

    /**
     * A one-thread tolerance study whose evaluator interrupts its own thread at its third sample
     * stops before the fourth with a CancellationException, leaving the flag set (the study runs its
     * samples through the map's worker code).
     */
    @Test
    void oneThreadToleranceStudyStopsAtTheNextSample() {
        AtomicInteger count = new AtomicInteger();
        ToleranceStudy st = study(1, 40, counting(count, 0, k -> {
            if (k == 3) {
                Thread.currentThread().interrupt();
            }
        }));
        CancellationException e = assertThrows(CancellationException.class, st::run);
        assertTrue(Thread.interrupted(), "the interrupt flag stays set (and is cleared here)");
        assertEquals(3, count.get(), "samples evaluated");
        assertTrue(e.getMessage().contains("after 3 of " + st.size() + " points"), e.getMessage());
    }

    /**
     * A tolerance study running in its own thread is interrupted from outside after 4 samples: it
     * throws CancellationException and evaluates at most one more sample per thread.
     */
    @ParameterizedTest(name = "{0} threads")
    @ValueSource(ints = {1, 2, 3})
    void toleranceStudyInterruptedFromOutsideStopsWithinOneSamplePerThread(int threads) throws InterruptedException {
        AtomicInteger count = new AtomicInteger();
        CountDownLatch fourDone = new CountDownLatch(4);
        ToleranceStudy st = study(threads, 200, counting(count, 20, k -> fourDone.countDown()));
        interruptFromOutside(st::run, "tolerance study", count, fourDone, threads);
        assertTrue(count.get() < st.size(), count.get() + " of " + st.size() + " samples evaluated");
    }

    /**
     * A bias sweep and a temperature sweep whose thread is already interrupted solve nothing and say
     * so. (Found: sweeps could not be interrupted at all.)
     */
    @Test
    void interruptedSweepsSolveNothing() {
        Thread.currentThread().interrupt();
        CancellationException e = assertThrows(CancellationException.class,
                () -> new BiasSweep().run(hemt(), BiasGrid.linear(0, -2, 11)));
        assertTrue(Thread.interrupted());
        assertEquals("bias sweep interrupted after 0 of 11 points", e.getMessage());
        Thread.currentThread().interrupt();
        CancellationException f = assertThrows(CancellationException.class,
                () -> new TemperatureSweep().run(hemt(), 300, 350, 400));
        assertTrue(Thread.interrupted());
        assertEquals("temperature sweep interrupted after 0 of 3 points", f.getMessage());
    }

    /** A target search whose thread is interrupted makes no evaluation and says so. */
    @Test
    void interruptedTargetSearchEvaluatesNothing() {
        Thread.currentThread().interrupt();
        CancellationException e = assertThrows(CancellationException.class, () -> new TargetSearch().sheetDensity(
                StructureFamilies.layerThicknessNm(hemt(), "barrier"), 10, 40, 1e13, 1e-3));
        assertTrue(Thread.interrupted());
        assertEquals("target search interrupted after 0 evaluations", e.getMessage());
    }

    /**
     * A long bias sweep interrupted from outside stops before its next point: it throws
     * CancellationException after fewer points than it has, and the thread ends.
     */
    @Test
    void biasSweepInterruptedFromOutsideStops() throws InterruptedException {
        AtomicReference<Throwable> thrown = new AtomicReference<>();
        CountDownLatch started = new CountDownLatch(1);
        Thread t = new Thread(() -> {
            started.countDown();
            try {
                new BiasSweep().run(hemt(), BiasGrid.linear(0, -4, 400));
            } catch (Throwable x) {
                thrown.set(x);
            }
        });
        t.start();
        assertTrue(started.await(GUARD_SECONDS, TimeUnit.SECONDS));
        Thread.sleep(300);
        t.interrupt();
        t.join(TimeUnit.SECONDS.toMillis(GUARD_SECONDS));
        assertFalse(t.isAlive(), "the sweep did not stop");
        assertInstanceOf(CancellationException.class, thrown.get(), String.valueOf(thrown.get()));
        assertTrue(thrown.get().getMessage().matches("bias sweep interrupted after \\d+ of 400 points"),
                thrown.get().getMessage());
    }

    /**
     * A spread (one bias sweep per parameter set, through the same worker code as the map) whose
     * thread is interrupted stops, one thread and several.
     */
    @ParameterizedTest(name = "{0} threads")
    @ValueSource(ints = {1, 2})
    void interruptedSpreadStops(int threads) {
        ParameterSetSpread spread = new ParameterSetSpread(new SelfConsistentSolver(),
                new ThresholdExtraction(BiasGrid.linear(-6, 0, 4), ThresholdDefinition.linearExtrapolation()))
                .withThreads(threads);
        Thread.currentThread().interrupt();
        assertThrows(CancellationException.class, () -> spread.run(ReliabilityStructures::forSet,
                List.of(ParameterSets.defaultSet(), ParameterSets.named("ambacher-2002"))));
        assertTrue(Thread.interrupted(), "the interrupt flag stays set (and is cleared here)");
    }

    /**
     * Runs a workflow in its own thread, interrupts that thread once four items are done, and checks
     * that it stops with CancellationException after at most one more item per worker thread.
     */
    private static void interruptFromOutside(Runnable run, String what, AtomicInteger count, CountDownLatch fourDone,
            int threads) throws InterruptedException {
        AtomicReference<Throwable> thrown = new AtomicReference<>();
        Thread t = new Thread(() -> {
            try {
                run.run();
            } catch (Throwable x) {
                thrown.set(x);
            }
        });
        t.start();
        assertTrue(fourDone.await(GUARD_SECONDS, TimeUnit.SECONDS));
        int atInterrupt = count.get();
        t.interrupt();
        t.join(TimeUnit.SECONDS.toMillis(GUARD_SECONDS));
        assertFalse(t.isAlive(), "the " + what + " did not stop");
        assertInstanceOf(CancellationException.class, thrown.get(), String.valueOf(thrown.get()));
        // the workers of a pool may still be finishing their item when run() has returned
        Thread.sleep(200);
        assertTrue(count.get() <= atInterrupt + threads,
                count.get() + " items evaluated, " + atInterrupt + " when interrupted, " + threads + " threads");
    }
}
