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
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;

/**
 * Equilibrium solve of the reference HEMT stack ({@link Scenarios#referenceHemt()}) from a cold
 * start, single-threaded, with the JVM told it has one processor ({@code
 * -XX:ActiveProcessorCount=1}: serial GC, as an application pinned to one core would run).
 * Baselines in the same run: the classical solve of the same stack (no Schroedinger equation, the
 * cold start's first stage) and a restart from the converged solution (one outer iteration's
 * worth of work: the floor a continuation can reach). The iteration counts, deterministic, are
 * printed by the setup and by {@link RatioReport}. Run with {@code -prof gc} for the allocation
 * per solve ({@code gc.alloc.rate.norm}).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 5, jvmArgsAppend = {"-XX:ActiveProcessorCount=1", "-Xms1g", "-Xmx1g"})
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 10, time = 1)
public class ColdSolveBenchmark {

    /** The reference stack, the solvers and a converged solution to restart from. */
    @State(Scope.Thread)
    public static class Reference {
        Structure structure;
        SelfConsistentSolver solver;
        SelfConsistentSolver classical;
        Solution converged;

        @Setup(Level.Trial)
        public void setUp() {
            structure = Scenarios.referenceHemt();
            solver = new SelfConsistentSolver();
            classical = new SelfConsistentSolver(SolverOptions.defaults().withQuantumWindows(QuantumWindows.none()));
            converged = solver.solve(structure);
            Checks.converged("cold solve", converged);
            Solution restarted = solver.solve(structure, converged);
            Solution c = classical.solve(structure);
            System.out.printf("%n[reference HEMT] nodes %d, ns %.4e cm^-2; cold: %d outer / %d Newton;"
                    + " restart: %d / %d; classical: %d Newton%n", converged.nodeCount(),
                    converged.sheetDensityPerCm2(), converged.convergence().iterations(),
                    converged.convergence().newtonIterations(), restarted.convergence().iterations(),
                    restarted.convergence().newtonIterations(), c.convergence().newtonIterations());
        }
    }

    /**
     * The target: cold equilibrium solve.
     *
     * @param r state
     * @return the solution
     */
    @Benchmark
    public Solution coldSolve(Reference r) {
        return r.solver.solve(r.structure);
    }

    /**
     * Baseline: classical (Fermi-Dirac 3D electrons everywhere) solve of the same stack.
     *
     * @param r state
     * @return the solution
     */
    @Benchmark
    public Solution classicalSolve(Reference r) {
        return r.classical.solve(r.structure);
    }

    /**
     * Baseline: restart from the converged solution.
     *
     * @param r state
     * @return the solution
     */
    @Benchmark
    public Solution restartFromSolution(Reference r) {
        return r.solver.solve(r.structure, r.converged);
    }
}
