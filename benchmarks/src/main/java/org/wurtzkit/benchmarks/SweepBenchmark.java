package org.wurtzkit.benchmarks;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * A 101-point gate sweep of the reference HEMT, 0 V down to -5 V in 50 mV steps (pinch-off of
 * this stack is below -6 V, so every point holds a 2DEG): the library's {@link BiasSweep}
 * (continuation, {@code org.wurtzkit.solvers.workflow}) and the same continuation written out
 * with {@link SelfConsistentSolver#solve(Structure, Solution)}, against the baseline of the 101
 * points solved cold, in the same run. Single-threaded.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 5, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 6, time = 2)
@Measurement(iterations = 8, time = 2)
public class SweepBenchmark {

    /** Number of gate biases. */
    public static final int POINTS = 101;
    /** First and last bias (V). */
    public static final double FROM_V = 0.0;
    /** Last bias (V). */
    public static final double TO_V = -5.0;

    /** The structures of the sweep, built once. */
    @State(Scope.Thread)
    public static class Sweep {
        Structure reference;
        BiasGrid grid;
        Structure[] at;
        SelfConsistentSolver solver;
        BiasSweep sweep;

        @Setup(Level.Trial)
        public void setUp() {
            reference = Scenarios.referenceHemt();
            grid = BiasGrid.linear(FROM_V, TO_V, POINTS);
            double[] v = grid.values();
            at = new Structure[POINTS];
            for (int i = 0; i < POINTS; i++) {
                at[i] = reference.withTop(TopBoundary.schottky(Scenarios.GATE_BARRIER_EV).atBiasV(v[i]));
            }
            solver = new SelfConsistentSolver();
            sweep = new BiasSweep(solver);
            // Check: every point converges both ways, to the same sheet density.
            Solution previous = null;
            int coldOuter = 0;
            int coldNewton = 0;
            int contOuter = 0;
            int contNewton = 0;
            for (int i = 0; i < POINTS; i++) {
                Solution cold = solver.solve(at[i]);
                Solution cont = solver.solve(at[i], previous);
                Checks.converged("cold point " + i, cold);
                Checks.converged("continued point " + i, cont);
                double a = cold.sheetDensityPerCm2();
                double b = cont.sheetDensityPerCm2();
                if (!(Math.abs(a - b) <= 1e-4 * Math.abs(a))) {
                    throw new IllegalStateException("point " + i + ": cold ns " + a + ", continued ns " + b);
                }
                coldOuter += cold.convergence().iterations();
                coldNewton += cold.convergence().newtonIterations();
                contOuter += cont.convergence().iterations();
                contNewton += cont.convergence().newtonIterations();
                previous = cont;
            }
            BiasSweepResult r = sweep.run(reference, grid);
            if (!r.failures().isEmpty()) {
                throw new IllegalStateException("BiasSweep failures: " + r.failures());
            }
            System.out.printf("%n[sweep, %d points] cold: %d outer / %d Newton; continuation: %d outer / %d Newton%n",
                    POINTS, coldOuter, coldNewton, contOuter, contNewton);
        }
    }

    /**
     * Library workflow: {@code BiasSweep.run}, continuation from point to point.
     *
     * @param s state
     * @return the sweep
     */
    @Benchmark
    public BiasSweepResult continuationWorkflow(Sweep s) {
        return s.sweep.run(s.reference, s.grid);
    }

    /**
     * The continuation loop written out with {@code solve(structure, previous)}.
     *
     * @param s  state
     * @param bh sink
     */
    @Benchmark
    public void continuationDirect(Sweep s, Blackhole bh) {
        Solution previous = null;
        for (Structure st : s.at) {
            previous = s.solver.solve(st, previous);
            bh.consume(previous);
        }
    }

    /**
     * Baseline: every point solved cold.
     *
     * @param s  state
     * @param bh sink
     */
    @Benchmark
    public void coldPoints(Sweep s, Blackhole bh) {
        for (Structure st : s.at) {
            bh.consume(s.solver.solve(st));
        }
    }
}
