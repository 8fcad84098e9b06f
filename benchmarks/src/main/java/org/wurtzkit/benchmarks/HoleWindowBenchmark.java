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
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.Carrier;
import org.wurtzkit.solvers.sp.CarrierSheet;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Quantum holes against electrons only (issue 12: a stack with one electron window and one hole
 * window within 2x of an electron-only solve of the same mesh). The stack: metal-polar GaN 1 um /
 * AlN 30 nm / GaN 20 nm on relaxed GaN, free surface with 1e13 cm^-2 donors at 1.65 eV (invented
 * demo values), which holds a 2DHG of about 6e13 cm^-2 at the upper GaN/AlN interface and a 2DEG of
 * about 5.5e13 cm^-2 at the lower one; a hole window over the top 26 nm and an electron window from
 * 48 to 90 nm. Target: cold solve with {@code withQuantumHoles(true)}; baseline: the same solve with
 * classical holes (same windows, same mesh). Single-threaded, one processor, as
 * {@link ColdSolveBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 5, jvmArgsAppend = {"-XX:ActiveProcessorCount=1", "-Xms1g", "-Xmx1g"})
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 10, time = 1)
public class HoleWindowBenchmark {

    /** The stack and the two solvers. */
    @State(Scope.Thread)
    public static class Stack {
        Structure stack;
        SelfConsistentSolver quantumHoles;
        SelfConsistentSolver electronsOnly;

        @Setup(Level.Trial)
        public void setUp() {
            stack = gaNOnAlNOnGaN();
            QuantumWindows windows = QuantumWindows.explicit(new QuantumWindows.Window(0, 26e-9),
                    new QuantumWindows.Window(48e-9, 90e-9));
            SolverOptions o = SolverOptions.defaults().withQuantumWindows(windows);
            quantumHoles = new SelfConsistentSolver(o.withQuantumHoles(true));
            electronsOnly = new SelfConsistentSolver(o);
            Solution a = quantumHoles.solve(stack);
            Solution b = electronsOnly.solve(stack);
            Checks.converged("quantum holes", a);
            Checks.converged("electrons only", b);
            if (a.nodeCount() != b.nodeCount()) {
                throw new IllegalStateException("the two solves must share the mesh: " + a.nodeCount() + " against "
                        + b.nodeCount());
            }
            double holes = 0;
            for (CarrierSheet c : a.carrierSheets()) {
                if (c.carrier() == Carrier.HOLES && c.window() == 0) {
                    holes += c.sheetDensityPerCm2();
                }
            }
            if (a.holeSubbands().isEmpty() || !(holes > 3e13)) {
                throw new IllegalStateException("no 2DHG in the hole window: " + a.carrierSheets());
            }
            System.out.printf("%n[hole window] %d nodes; quantum holes: 2DHG %.4e cm^-2, %d hole subbands, %d outer / %d"
                    + " Newton; electrons only: %d outer / %d Newton%n", a.nodeCount(), holes, a.holeSubbands().size(),
                    a.convergence().iterations(), a.convergence().newtonIterations(), b.convergence().iterations(),
                    b.convergence().newtonIterations());
        }
    }

    /** {@return GaN 1 um / AlN 30 nm / GaN 20 nm on relaxed GaN under a free surface (invented demo stack)} */
    static Structure gaNOnAlNOnGaN() {
        return Structure.builder(ParameterSets.defaultSet()).onRelaxed(Composition.GAN)
                .grow(Layer.of("buffer", Composition.GAN, 1e-6)).grow(Layer.of("AlN", Composition.ALN, 30e-9))
                .grow(Layer.of("GaN", Composition.GAN, 20e-9)).top(TopBoundary.freeSurface(1.65, 1e13)).build();
    }

    /**
     * The target: cold solve with hole subbands.
     *
     * @param s state
     * @return the solution
     */
    @Benchmark
    public Solution quantumHolesColdSolve(Stack s) {
        return s.quantumHoles.solve(s.stack);
    }

    /**
     * Baseline: cold solve of the same stack and mesh with classical holes.
     *
     * @param s state
     * @return the solution
     */
    @Benchmark
    public Solution electronsOnlyColdSolve(Stack s) {
        return s.electronsOnly.solve(s.stack);
    }
}
