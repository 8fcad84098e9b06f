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
import org.wurtzkit.material.Insulators;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.TopBoundary;

/**
 * Cold equilibrium solve of an MIS-HEMT against the same nitride stack without the insulator
 * (issue 15: within 1.5x). The nitride stack is the reference HEMT ({@link Scenarios#referenceHemt()});
 * the MIS variant adds a fixed charge of +1.8e13 cm^-2 on the cap's top face (about the cap's own
 * polarization charge, so that the 2DEG stays of the same order; invented) and 10 nm of the built-in
 * Al2O3 under a gate whose Fermi level lies 3.5 eV below the Al2O3 conduction band (invented).
 * Single-threaded, one processor, as {@link ColdSolveBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 5, jvmArgsAppend = {"-XX:ActiveProcessorCount=1", "-Xms1g", "-Xmx1g"})
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 10, time = 1)
public class GateStackBenchmark {

    /** The two stacks and the solver. */
    @State(Scope.Thread)
    public static class Stacks {
        Structure plain;
        Structure mis;
        SelfConsistentSolver solver;

        @Setup(Level.Trial)
        public void setUp() {
            plain = Scenarios.referenceHemt();
            mis = misHemt();
            solver = new SelfConsistentSolver();
            Solution a = solver.solve(plain);
            Solution b = solver.solve(mis);
            Checks.converged("reference HEMT", a);
            Checks.converged("MIS-HEMT", b);
            System.out.printf("%n[gate stack] plain: %d nodes, ns %.4e cm^-2, %d outer / %d Newton;"
                    + " MIS: %d nodes, ns %.4e cm^-2, %d outer / %d Newton%n", a.nodeCount(), a.sheetDensityPerCm2(),
                    a.convergence().iterations(), a.convergence().newtonIterations(), b.nodeCount(),
                    b.sheetDensityPerCm2(), b.convergence().iterations(), b.convergence().newtonIterations());
        }
    }

    /** {@return the reference HEMT under 10 nm of Al2O3 with a fixed charge on the cap (invented)} */
    static Structure misHemt() {
        Structure ref = Scenarios.referenceHemt();
        Structure.Builder b = Structure.builder(ref.parameters());
        for (var l : ref.layersBottomUp()) {
            b.grow(l);
        }
        return b.sheetOnTop(InterfaceSheet.fixedPerCm2(1.8e13)).deposit(InsulatorLayer.ofNm(Insulators.AL2O3, 10))
                .top(TopBoundary.schottky(3.5)).build();
    }

    /**
     * The target: cold solve of the MIS-HEMT.
     *
     * @param s state
     * @return the solution
     */
    @Benchmark
    public Solution misHemtColdSolve(Stacks s) {
        return s.solver.solve(s.mis);
    }

    /**
     * Baseline: cold solve of the same nitride stack without the insulator.
     *
     * @param s state
     * @return the solution
     */
    @Benchmark
    public Solution withoutInsulatorColdSolve(Stacks s) {
        return s.solver.solve(s.plain);
    }
}
