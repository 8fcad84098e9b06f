package org.wurtzkit.solvers.workflow;

import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;

/** The continuation loop shared by the sweeps. */
final class Continuation {
    private Continuation() {
    }

    /**
     * Solves the structures in order, each from the previous converged solution (the first cold);
     * a failed continued solve is retried cold; a point that fails both ways gets a message in
     * {@code failures} and a null solution.
     *
     * @param solver    the solver
     * @param at        the structures, in solving order
     * @param solutions output: converged solutions (null where failed)
     * @param failures  output: failure messages (null where converged)
     */
    static void solveInOrder(SelfConsistentSolver solver, Structure[] at, double[] parameter, Solution[] solutions,
            String[] failures) {
        Solution previous = null;
        Solution beforePrevious = null;
        for (int i = 0; i < at.length; i++) {
            try {
                if (beforePrevious != null) {
                    // first-order predictor from the last two points (consecutive successes)
                    double t = (parameter[i] - parameter[i - 1]) / (parameter[i - 1] - parameter[i - 2]);
                    double[] guess = SelfConsistentSolver.extrapolate(beforePrevious, previous, t);
                    solutions[i] = solver.solve(at[i], previous.depth(), guess);
                } else {
                    solutions[i] = solver.solve(at[i], previous);
                }
            } catch (RuntimeException first) {
                if (previous == null) {
                    failures[i] = PointFailure.describe(first);
                } else {
                    try {
                        solutions[i] = solver.solve(at[i]);
                    } catch (RuntimeException cold) {
                        failures[i] = "continued: " + PointFailure.describe(first) + "; cold start: "
                                + PointFailure.describe(cold);
                    }
                }
            }
            if (solutions[i] != null) {
                beforePrevious = i > 0 && solutions[i - 1] != null ? solutions[i - 1] : null;
                previous = solutions[i];
            } else {
                beforePrevious = null; // continue from the last success, without a predictor
            }
        }
    }
}
