package org.wurtzkit.solvers.workflow;

import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;

/** The continuation loop shared by the sweeps. */
final class Continuation {
    /** Solutions the predictor extrapolates from: 3 gives the quadratic (second-order) predictor. */
    static final int PREDICTOR_POINTS = 3;

    private Continuation() {
    }

    /**
     * Solves the structures in order, each from a guess extrapolated through the last converged
     * solutions (the first cold; then linear from two, then quadratic from three,
     * {@link SelfConsistentSolver#extrapolate(double[], Solution[], double)}); a failed continued
     * solve is retried cold; a point that fails both ways gets a message in {@code failures} and a
     * null solution, and the predictor restarts from the last success.
     *
     * @param solver    the solver
     * @param at        the structures, in solving order
     * @param parameter the sweep parameter of each structure (bias or temperature), distinct
     * @param solutions output: converged solutions (null where failed)
     * @param failures  output: failure messages (null where converged)
     */
    static void solveInOrder(SelfConsistentSolver solver, Structure[] at, double[] parameter, Solution[] solutions,
            String[] failures) {
        // the latest consecutive successes, oldest first
        Solution[] recent = new Solution[PREDICTOR_POINTS];
        double[] recentParameter = new double[PREDICTOR_POINTS];
        int held = 0;
        for (int i = 0; i < at.length; i++) {
            Solution previous = held == 0 ? null : recent[held - 1];
            try {
                if (held >= 2) {
                    Solution[] from = java.util.Arrays.copyOf(recent, held);
                    double[] p = java.util.Arrays.copyOf(recentParameter, held);
                    double[] guess = SelfConsistentSolver.extrapolate(p, from, parameter[i]);
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
                boolean consecutive = i > 0 && solutions[i - 1] != null;
                if (!consecutive) {
                    held = 0;
                }
                if (held == PREDICTOR_POINTS) {
                    System.arraycopy(recent, 1, recent, 0, held - 1);
                    System.arraycopy(recentParameter, 1, recentParameter, 0, held - 1);
                    held--;
                }
                recent[held] = solutions[i];
                recentParameter[held] = parameter[i];
                held++;
            } else if (held > 1) {
                // continue from the last success, without a predictor
                recent[0] = recent[held - 1];
                recentParameter[0] = recentParameter[held - 1];
                held = 1;
            }
        }
    }
}
