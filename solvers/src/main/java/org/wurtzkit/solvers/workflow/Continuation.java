package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.PotentialPredictor;
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
     * {@link PotentialPredictor#extrapolate(double[], Solution[], double)}); a failed continued
     * solve is retried cold; a point that fails both ways gets a message in {@code failures} and a
     * null solution, and the predictor restarts from the last success.
     *
     * @param solver    the solver
     * @param at        the structures, in solving order
     * @param parameter the sweep parameter of each structure (bias or temperature), distinct
     * @param solutions output: converged solutions (null where failed)
     * @param failures  output: why each point failed (null where converged)
     */
    static void solveInOrder(SelfConsistentSolver solver, Structure[] at, double[] parameter, Solution[] solutions,
            PointFailure.Reason[] failures) {
        Solution lastSuccess = null;
        for (int i = 0; i < at.length; i++) {
            // the predictor uses the run of consecutive successes just before this point
            int held = 0;
            while (held < PREDICTOR_POINTS && i - 1 - held >= 0 && solutions[i - 1 - held] != null) {
                held++;
            }
            try {
                if (held >= 2) {
                    Solution[] from = Arrays.copyOfRange(solutions, i - held, i);
                    double[] p = Arrays.copyOfRange(parameter, i - held, i);
                    double[] guess = PotentialPredictor.extrapolate(p, from, parameter[i]);
                    solutions[i] = solver.solve(at[i], lastSuccess.depth(), guess);
                } else {
                    // a cold start, or the last success without a predictor
                    solutions[i] = solver.solve(at[i], lastSuccess);
                }
            } catch (InvalidParameterException | WurtzkitException first) {
                if (lastSuccess == null) {
                    failures[i] = PointFailure.Reason.of(first);
                } else {
                    try {
                        solutions[i] = solver.solve(at[i]);
                    } catch (InvalidParameterException | WurtzkitException cold) {
                        failures[i] = new PointFailure.Reason(cold.kind(), "continued: "
                                + PointFailure.Reason.of(first).message() + "; cold start: "
                                + PointFailure.Reason.of(cold).message());
                    }
                }
            }
            if (solutions[i] != null) {
                lastSuccess = solutions[i];
            }
        }
    }
}
