package org.wurtzkit.benchmarks;

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
import org.openjdk.jmh.annotations.Warmup;
import org.wurtzkit.solvers.linalg.Tridiagonal;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;

/**
 * The linear solve inside one Newton-Poisson step: {@link Tridiagonal#solve(double[], double[],
 * double[], double[], double[], double[])} (allocation-free Thomas algorithm, with its argument
 * checks) on a box-integrated Poisson Jacobian of order N, beside a baseline measured in the same
 * run: one plain tridiagonal matrix-vector product written in this class (three reads and one
 * write per row, the memory-traffic floor of any O(N) step on this machine). The rest of the
 * step (charge model, residual, Jacobian assembly, line search) is package-private to the solver
 * ({@code org.wurtzkit.solvers.sp.NewtonPoisson}); it is reached whole through {@link #classicalSolve}, the
 * classical (no Schroedinger) solve of the reference HEMT on a mesh refined to about N nodes,
 * whose Newton step count does not depend on N (14 on every mesh), so that its time divided by
 * that count, reported by {@link RatioReport}, is the cost of one complete Newton-Poisson step
 * plus an O(N) share of mesh set-up and result copies.
 *
 * <p>The Jacobian is that of an invented 2 um layer on a uniform mesh with a permittivity of
 * 9.5 eps0 and a density derivative rising towards one end, as electrons near a channel would
 * give; diagonally dominant, like the solver's.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(5)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 10, time = 1)
public class NewtonStepBenchmark {

    /** One Jacobian, right-hand side and work space of order n. */
    @State(Scope.Thread)
    public static class Step {
        @Param({"500", "1000", "2000", "4000", "8000"})
        public int n;

        double[] sub;
        double[] diag;
        double[] sup;
        double[] rhs;
        double[] x;
        double[] work;

        @Setup(Level.Trial)
        public void setUp() {
            double h = 2e-6 / (n - 1);
            double c = 9.5 * org.wurtzkit.units.Constants.VACUUM_PERMITTIVITY / h;
            sub = new double[n - 1];
            sup = new double[n - 1];
            diag = new double[n];
            rhs = new double[n];
            x = new double[n];
            work = new double[n];
            for (int i = 0; i < n - 1; i++) {
                sub[i] = -c;
                sup[i] = -c;
            }
            for (int i = 0; i < n; i++) {
                double dq = 1e-3 * c * Math.exp(-8.0 * i / n); // dQ/dphi * box width
                diag[i] = (i > 0 ? c : 0) + (i < n - 1 ? c : 0) + dq;
                rhs[i] = Math.sin(0.01 * i) * 1e-3 * c;
            }
            diag[0] = 1; // Dirichlet row at the gate, as the solver writes it
            sup[0] = 0;
            rhs[0] = 0;
            Tridiagonal.solve(sub, diag, sup, rhs, x, work);
            double[] y = new double[n];
            Tridiagonal.multiply(sub, diag, sup, x, y);
            for (int i = 0; i < n; i++) {
                if (!(Math.abs(y[i] - rhs[i]) <= 1e-9 * (Math.abs(rhs[i]) + c * 1e-3))) {
                    throw new IllegalStateException("Thomas solve residual at row " + i + ": " + (y[i] - rhs[i]));
                }
            }
        }
    }

    /** The reference HEMT, classical electrons, on a mesh of about n nodes. */
    @State(Scope.Thread)
    public static class Classical {
        @Param({"500", "1000", "2000", "4000", "8000"})
        public int n;

        Structure structure;
        SelfConsistentSolver solver;
        /** Nodes of the refined mesh. */
        public int nodes;
        /** Newton steps of one solve. */
        public int newtonSteps;

        @Setup(Level.Trial)
        public void setUp() {
            structure = Scenarios.referenceHemt();
            solver = classicalSolver(n);
            Solution s = solver.solve(structure);
            Checks.converged("classical solve", s);
            nodes = s.nodeCount();
            newtonSteps = s.convergence().newtonIterations();
            System.out.printf("%n[classical solve] %d nodes, %d Newton steps%n", nodes, newtonSteps);
        }
    }

    /**
     * A classical solver on the reference HEMT's mesh refined to about n nodes.
     *
     * @param n wanted node count
     * @return the solver
     */
    public static SelfConsistentSolver classicalSolver(int n) {
        SolverOptions base = SolverOptions.defaults().withQuantumWindows(QuantumWindows.none());
        int nodes = new SelfConsistentSolver(base).solve(Scenarios.referenceHemt()).nodeCount();
        double factor = Math.max(1.0, (double) n / nodes);
        return new SelfConsistentSolver(base.withMesh(MeshPolicy.DEFAULT.refined(factor)));
    }

    /**
     * Library, whole Newton loop: classical solve on about n nodes (divide by the Newton count).
     *
     * @param c state
     * @return the solution
     */
    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 10, time = 1)
    public Solution classicalSolve(Classical c) {
        return c.solver.solve(c.structure);
    }

    /**
     * Library: Thomas solve into reused arrays.
     *
     * @param s state
     * @return the solution (reused array)
     */
    @Benchmark
    public double[] thomasSolve(Step s) {
        Tridiagonal.solve(s.sub, s.diag, s.sup, s.rhs, s.x, s.work);
        return s.x;
    }

    /**
     * Baseline: one tridiagonal matrix-vector product in a plain loop (no checks).
     *
     * @param s state
     * @return the product (reused array)
     */
    @Benchmark
    public double[] baselineMatVec(Step s) {
        double[] sub = s.sub;
        double[] diag = s.diag;
        double[] sup = s.sup;
        double[] v = s.rhs;
        double[] y = s.work;
        int n = s.n;
        y[0] = diag[0] * v[0] + sup[0] * v[1];
        for (int i = 1; i < n - 1; i++) {
            y[i] = sub[i - 1] * v[i - 1] + diag[i] * v[i] + sup[i] * v[i + 1];
        }
        y[n - 1] = sub[n - 2] * v[n - 2] + diag[n - 1] * v[n - 1];
        return y;
    }
}
