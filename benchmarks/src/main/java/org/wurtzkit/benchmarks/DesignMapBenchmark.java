package org.wurtzkit.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
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
import org.wurtzkit.structure.Structure;

/**
 * A 200-point design map of an invented demo family around the reference HEMT: Al fraction
 * 0.15 ... 0.35 (10 values) times barrier thickness 10 ... 29 nm (20 values), cold solves, on
 * {@code threads} = 1 and 2 worker threads; the 1-thread map is the baseline of the 2-thread
 * one in the same run; the same map with continuation between neighbours ({@link #continuedMap})
 * beside the cold one. Two forms: the library's {@link DesignMap} ({@code
 * org.wurtzkit.solvers.workflow}) and a plain fixed thread pool over the same prebuilt
 * structures (the bare scaling of the solver, without the workflow's bookkeeping).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 5, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 5, time = 2)
@Measurement(iterations = 8, time = 2)
public class DesignMapBenchmark {

    /** Aluminium fractions of the map. */
    static final Axis AL_FRACTION = Axis.linear("al_fraction", "", 0.15, 0.35, 10);
    /** Barrier thicknesses of the map (nm). */
    static final Axis BARRIER = Axis.linear("barrier_thickness", "nm", 10, 29, 20);

    /** The map, its structures and a pool of {@code threads} workers. */
    @State(Scope.Thread)
    public static class Map {
        @Param({"1", "2"})
        public int threads;

        DesignMap map;
        /** The same map with continuation between neighbouring points (issue 18). */
        DesignMap continued;
        Structure[] structures;
        SelfConsistentSolver solver;
        ExecutorService pool;
        /** The application thread that calls {@code DesignMap.run()}, the same for every thread count. */
        ExecutorService caller;

        @Setup(Level.Trial)
        public void setUp() {
            solver = new SelfConsistentSolver();
            map = DesignMap.builder(p -> Scenarios.hemt(p[0], p[1], 0.0))
                    .axis(AL_FRACTION)
                    .axis(BARRIER)
                    .solver(solver)
                    .threads(threads)
                    .build();
            continued = DesignMap.builder(p -> Scenarios.hemt(p[0], p[1], 0.0))
                    .axis(AL_FRACTION)
                    .axis(BARRIER)
                    .solver(solver)
                    .threads(threads)
                    .continuation(true)
                    .build();
            structures = new Structure[AL_FRACTION.size() * BARRIER.size()];
            int k = 0;
            for (int i = 0; i < AL_FRACTION.size(); i++) {
                for (int j = 0; j < BARRIER.size(); j++) {
                    structures[k++] = Scenarios.hemt(AL_FRACTION.get(i), BARRIER.get(j), 0.0);
                }
            }
            DesignMapResult r = map.run();
            if (!r.failures().isEmpty()) {
                throw new IllegalStateException("design map failures: " + r.failures());
            }
            DesignMapResult rc = continued.run();
            if (!rc.failures().isEmpty()) {
                throw new IllegalStateException("continued design map failures: " + rc.failures());
            }
            double worst = 0;
            for (int i = 0; i < r.size(); i++) {
                worst = Math.max(worst, Math.abs(rc.value(i, 0) / r.value(i, 0) - 1));
            }
            if (!(worst <= 1e-6)) {
                throw new IllegalStateException("continued map differs from the cold map: n_s by " + worst + " relative");
            }
            System.out.printf("%n[design map] continued vs cold: largest relative difference in n_s %.2e%n", worst);
            pool = Executors.newFixedThreadPool(threads);
            caller = Executors.newSingleThreadExecutor();
        }

        @TearDown(Level.Trial)
        public void tearDown() {
            pool.shutdownNow();
            caller.shutdownNow();
        }
    }

    /**
     * Library workflow: {@code DesignMap.run()} with {@code threads} workers, called from a plain
     * application thread (not JMH's benchmark thread), as an application would call it. With 1
     * thread the map runs its points in the calling thread; called from JMH's own thread, that loop
     * ran about 30 % slower (1000 against 770 ms per map on the machine of the README) than the same
     * 200 solves on a pool thread ({@link #executorMap}) or than {@code DesignMap.run()} called from
     * the main thread of a plain JVM: an artefact of how the JIT compiles the serial loop inside
     * JMH's measurement loop, which would inflate the 2-thread speed-up. The hand-over costs
     * microseconds against a map of several hundred milliseconds.
     *
     * @param m state
     * @return the map
     * @throws Exception if the map throws
     */
    @Benchmark
    public DesignMapResult workflowMap(Map m) throws Exception {
        try {
            return m.caller.submit(m.map::run).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }

    /**
     * Library workflow with continuation ({@code DesignMap.Builder.continuation(true)}): chains of
     * neighbouring points, each point started from its predecessor's solution; called as
     * {@link #workflowMap}, whose cold map is its baseline in the same run.
     *
     * @param m state
     * @return the map
     * @throws Exception if the map throws
     */
    @Benchmark
    public DesignMapResult continuedMap(Map m) throws Exception {
        try {
            return m.caller.submit(m.continued::run).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }

    /**
     * The same 200 cold solves on a plain fixed pool of {@code threads} workers pulling indices
     * from a shared counter.
     *
     * @param m state
     * @return sum of the sheet densities (cm^-2), consumed by JMH
     * @throws Exception if a solve fails
     */
    @Benchmark
    public double executorMap(Map m) throws Exception {
        Structure[] s = m.structures;
        double[] ns = new double[s.length];
        AtomicInteger next = new AtomicInteger();
        List<Future<?>> futures = new ArrayList<>(m.threads);
        for (int w = 0; w < m.threads; w++) {
            futures.add(m.pool.submit(() -> {
                for (int i = next.getAndIncrement(); i < s.length; i = next.getAndIncrement()) {
                    ns[i] = m.solver.solve(s[i]).sheetDensityPerCm2();
                }
            }));
        }
        for (Future<?> f : futures) {
            try {
                f.get();
            } catch (ExecutionException e) {
                throw new IllegalStateException(e.getCause());
            }
        }
        double sum = 0;
        for (double v : ns) {
            sum += v;
        }
        return sum;
    }
}
