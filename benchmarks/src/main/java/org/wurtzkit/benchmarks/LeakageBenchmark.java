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
import org.wurtzkit.solvers.transport.GateLeakage;
import org.wurtzkit.solvers.transport.LeakageCurve;
import org.wurtzkit.solvers.transport.LeakageOptions;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Structure;

/**
 * Gate leakage (issue 16): a 101-point J-V curve of the reference HEMT, 0 V down to -5 V in 50 mV
 * steps, by {@link GateLeakage#curve} with the default options (WKB, thermionic and tunnelling),
 * against its baseline in the same run: the 101-point {@link BiasSweep} that produces the band
 * diagrams under it (the same sweep as {@link SweepBenchmark#continuationWorkflow}). Target: curve
 * / sweep &le; 2. Single-threaded.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(value = 3, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
@Warmup(iterations = 6, time = 2)
@Measurement(iterations = 8, time = 2)
public class LeakageBenchmark {

    /** The sweep and its result, built once. */
    @State(Scope.Thread)
    public static class Curve {
        Structure reference;
        BiasGrid grid;
        BiasSweep sweep;
        BiasSweepResult result;
        LeakageOptions options;

        @Setup(Level.Trial)
        public void setUp() {
            reference = Scenarios.referenceHemt();
            grid = BiasGrid.linear(SweepBenchmark.FROM_V, SweepBenchmark.TO_V, SweepBenchmark.POINTS);
            sweep = new BiasSweep(new SelfConsistentSolver());
            options = LeakageOptions.defaults();
            result = sweep.run(reference, grid);
            if (!result.failures().isEmpty()) {
                throw new IllegalStateException("BiasSweep failures: " + result.failures());
            }
            // Check: every point has a current, zero at 0 V, negative (reverse) below, growing with reverse bias
            LeakageCurve c = GateLeakage.curve(result, options);
            double[] j = c.totalAPerCm2();
            if (j[0] != 0) {
                throw new IllegalStateException("leakage at 0 V is " + j[0] + " A/cm^2, not 0");
            }
            for (int i = 1; i < j.length; i++) {
                if (!(j[i] < 0) || !(j[i] <= j[i - 1])) {
                    throw new IllegalStateException("leakage at point " + i + ": " + j[i] + " A/cm^2 after "
                            + j[i - 1]);
                }
            }
            System.out.printf("%n[leakage, %d points] J(%.2f V) = %.3e A/cm^2%n", j.length, grid.get(j.length - 1),
                    j[j.length - 1]);
        }
    }

    /**
     * The J-V curve of the sweep.
     *
     * @param s state
     * @return the curve
     */
    @Benchmark
    public LeakageCurve leakageCurve(Curve s) {
        return GateLeakage.curve(s.result, s.options);
    }

    /**
     * Baseline: the bias sweep itself.
     *
     * @param s state
     * @return the sweep
     */
    @Benchmark
    public BiasSweepResult biasSweep(Curve s) {
        return s.sweep.run(s.reference, s.grid);
    }
}
