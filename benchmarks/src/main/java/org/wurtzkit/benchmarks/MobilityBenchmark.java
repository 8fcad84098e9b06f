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
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.transport.mobility.Mobility;
import org.wurtzkit.solvers.transport.mobility.MobilityOptions;
import org.wurtzkit.solvers.transport.mobility.MobilityResult;
import org.wurtzkit.structure.Structure;

/**
 * The 2DEG mobility (all seven default mechanisms, every subband) of a converged solution of the
 * reference HEMT stack ({@link Scenarios#referenceHemt()}, 300 K), against its baseline in the same
 * run: the cold self-consistent solve of the same stack. Target of issue #16: mobility at most 0.5x
 * the solve. Single-threaded, one processor, as {@link ColdSolveBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 3, jvmArgsAppend = {"-XX:ActiveProcessorCount=1", "-Xms1g", "-Xmx1g"})
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 8, time = 1)
public class MobilityBenchmark {

    /** The stack, the solver and a converged solution. */
    @State(Scope.Thread)
    public static class Reference {
        Structure structure;
        SelfConsistentSolver solver;
        Solution converged;
        MobilityOptions options;

        @Setup(Level.Trial)
        public void setUp() {
            structure = Scenarios.referenceHemt();
            solver = new SelfConsistentSolver();
            converged = solver.solve(structure);
            Checks.converged("mobility reference solve", converged);
            options = MobilityOptions.defaults();
            MobilityResult r = Mobility.of(converged, options);
            System.out.printf("%n[reference HEMT] nodes %d, subbands %d, %s%n", converged.nodeCount(),
                    converged.subbands().size(), r);
        }
    }

    /**
     * The target: mobility of the converged solution.
     *
     * @param r state
     * @return the result
     */
    @Benchmark
    public MobilityResult mobility(Reference r) {
        return Mobility.of(r.converged, r.options);
    }

    /**
     * Baseline: the cold solve that produced the solution.
     *
     * @param r state
     * @return the solution
     */
    @Benchmark
    public Solution solve(Reference r) {
        return r.solver.solve(r.structure);
    }
}
