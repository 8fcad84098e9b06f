package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * A gate-bias sweep of the full self-consistent solver with continuation: the first bias is solved
 * from a cold start, every further bias starts from the solution of the previous one
 * ({@link SelfConsistentSolver#solve(Structure, Solution)}), which skips the classical pre-solve of
 * a cold start and keeps the iteration on the branch of its neighbour. If a continued solve right
 * after a converged point fails, the point is retried from a cold start; if that fails too, or if
 * the point before had failed as well (then one attempt only, so a stretch that does not converge
 * costs one solve per point), the point is recorded as failed with what was tried and why
 * ({@link BiasSweepResult#failures()}) and the sweep goes on from the last converged solution.
 * The sweep stops with a {@link java.util.concurrent.CancellationException} before the next point
 * once its thread is interrupted.
 *
 * <p>Stateless and thread-safe (the solver is).
 */
public final class BiasSweep {
    private final SelfConsistentSolver solver;

    /** A sweep with the default solver. */
    public BiasSweep() {
        this(new SelfConsistentSolver());
    }

    /** @param solver the solver to use */
    public BiasSweep(SelfConsistentSolver solver) {
        this.solver = Require.nonNull("solver", solver);
    }

    /** {@return the solver} */
    public SelfConsistentSolver solver() {
        return solver;
    }

    /**
     * @param structure a stack with a Schottky gate; its own bias is replaced by each grid value
     * @param biasesV   the biases (V), in solving order
     * @return the sweep
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted
     */
    public BiasSweepResult run(Structure structure, double... biasesV) {
        return run(structure, BiasGrid.of(biasesV));
    }

    /**
     * Sweeps the gate bias. Every bias is validated (by {@link TopBoundary.Schottky}) before the
     * first solve.
     *
     * @param structure a stack with a Schottky gate; its own bias is replaced by each grid value
     * @param grid      the biases
     * @return the sweep
     * @throws InvalidParameterException if the top boundary is not a Schottky gate or a bias is out of range
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted (checked
     *         before every point; its interrupt flag stays set)
     */
    public BiasSweepResult run(Structure structure, BiasGrid grid) {
        Require.nonNull("structure", structure);
        Require.nonNull("bias grid", grid);
        if (!(structure.top() instanceof TopBoundary.Schottky gate)) {
            throw new InvalidParameterException("top boundary", String.valueOf(structure.top()),
                    "a Schottky gate (a bias sweep needs a gate)");
        }
        int n = grid.size();
        Structure[] at = new Structure[n];
        for (int i = 0; i < n; i++) {
            at[i] = structure.withTop(gate.atBiasV(grid.get(i)));
        }
        Solution[] solutions = new Solution[n];
        PointFailure.Reason[] failures = new PointFailure.Reason[n];
        Continuation.solveInOrder(solver, at, grid.values(), solutions, failures, "bias sweep");
        return new BiasSweepResult(structure, grid, solutions, failures, solver.options());
    }
}
