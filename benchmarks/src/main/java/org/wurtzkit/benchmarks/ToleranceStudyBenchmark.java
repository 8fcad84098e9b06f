package org.wurtzkit.benchmarks;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
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
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.DesignMapResult;
import org.wurtzkit.solvers.workflow.Distribution;
import org.wurtzkit.solvers.workflow.Quantity;
import org.wurtzkit.solvers.workflow.SamplingPlan;
import org.wurtzkit.solvers.workflow.Tolerance;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/**
 * A Monte Carlo tolerance study of the reference HEMT's n_s against its baseline in the same run:
 * a design map with the same number of points over the same region (barrier Al fraction 0.15 ...
 * 0.35, barrier thickness 10 ... 29 nm), both cold solves on two worker threads. The study draws
 * the two barrier parameters uniformly over that region, so both sides solve the same kind of
 * stacks; the ratio study / map is the study's own cost (random numbers, inversion, rebuilding
 * the structure, statistics at the end). {@code samples} = 200 in the short pass (a 10 x 20 map),
 * 10 000 in the full run (100 x 100). Both are called from a plain application thread, as in
 * {@link DesignMapBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 3, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 4, time = 2)
@Measurement(iterations = 6, time = 2)
public class ToleranceStudyBenchmark {
    /** Worker threads of both sides. */
    static final int THREADS = 2;

    /** The study, the map of the same size, and the calling thread. */
    @State(Scope.Thread)
    public static class Pair {
        @Param({"200"})
        public int samples;

        ToleranceStudy study;
        DesignMap map;
        ExecutorService caller;

        @Setup(Level.Trial)
        public void setUp() {
            SelfConsistentSolver solver = new SelfConsistentSolver();
            int a = samples == 10_000 ? 100 : 10;
            if (samples % a != 0) {
                throw new IllegalArgumentException("samples must be a multiple of " + a + ": " + samples);
            }
            int b = samples / a;
            map = DesignMap.builder(p -> Scenarios.hemt(p[0], p[1], 0.0))
                    .axis(Axis.linear("al_fraction", "", 0.15, 0.35, a))
                    .axis(Axis.linear("barrier_thickness", "nm", 10, 29, b))
                    .quantities(Quantity.SHEET_DENSITY)
                    .solver(solver)
                    .threads(THREADS)
                    .build();
            study = ToleranceStudy.builder(Scenarios.referenceHemt())
                    .tolerance(Tolerance.alFraction("barrier", Distribution.uniform(0.15, 0.35)))
                    .tolerance(Tolerance.layerThicknessNm("barrier", Distribution.uniform(10, 29)))
                    .quantities(Quantity.SHEET_DENSITY)
                    .samples(samples)
                    .plan(SamplingPlan.MONTE_CARLO)
                    .seed(6)
                    .solver(solver)
                    .threads(THREADS)
                    .build();
            caller = Executors.newSingleThreadExecutor();
            // both sides must succeed everywhere, or the comparison is void
            DesignMapResult m = map.run();
            if (!m.failures().isEmpty()) {
                throw new IllegalStateException("design map failures: " + m.failures());
            }
            ToleranceStudyResult s = study.run();
            if (!s.failures().isEmpty()) {
                throw new IllegalStateException("tolerance study failures: " + s.failures());
            }
        }

        @TearDown(Level.Trial)
        public void tearDown() {
            caller.shutdownNow();
        }
    }

    /**
     * The tolerance study: {@code samples} Monte Carlo samples, n_s, 2 threads, with its summary
     * statistics.
     *
     * @param p state
     * @return the mean n_s (cm^-2), consumed by JMH
     * @throws Exception if the study throws
     */
    @Benchmark
    public double toleranceStudy(Pair p) throws Exception {
        try {
            return p.caller.submit(() -> p.study.run().summary(0).mean()).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }

    /**
     * The baseline: a design map of {@code samples} points, n_s, 2 threads.
     *
     * @param p state
     * @return the map, consumed by JMH
     * @throws Exception if the map throws
     */
    @Benchmark
    public DesignMapResult designMap(Pair p) throws Exception {
        try {
            return p.caller.submit(p.map::run).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }
}
