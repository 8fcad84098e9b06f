package org.wurtzkit.solvers.sp;

import java.util.Arrays;
import org.wurtzkit.errors.Require;

/**
 * Predictors of a continuation sweep (bias, temperature, geometry): the potential at the next point,
 * extrapolated through the latest converged solutions, to seed
 * {@link SelfConsistentSolver#solve(org.wurtzkit.structure.Structure, double[], double[])}. Pure
 * functions of their arguments; the returned array is new and the caller's to keep.
 */
public final class PotentialPredictor {
    private PotentialPredictor() {
    }

    /**
     * Linear extrapolation of the potential to a new point of a sweep: phi_b + t (phi_b - phi_a), with
     * t the ratio of the next step to the last (e.g. (V_next - V_b)/(V_b - V_a)). A first-order
     * predictor in the sense of continuation methods (E. L. Allgower and K. Georg, Introduction to
     * Numerical Continuation Methods, SIAM 2003, ch. 2; from memory); falls back to phi_b when the two
     * solutions do not share a mesh. The two-point case of
     * {@link #extrapolate(double[], Solution[], double)}, with a at parameter -1 and b at 0.
     *
     * @param a the solution before b
     * @param b the latest solution
     * @param t step ratio, finite
     * @return the predicted potential on b's mesh (V)
     */
    public static double[] extrapolate(Solution a, Solution b, double t) {
        Require.finite("extrapolation step ratio", t);
        return extrapolate(new double[] {-1, 0}, new Solution[] {a, b}, t);
    }

    /**
     * Polynomial extrapolation of the potential to a new point of a sweep through the latest
     * solutions: the Lagrange polynomial of degree m - 1 in the sweep parameter through the m given
     * points, evaluated at {@code target} (a predictor of order m - 1 in the sense of continuation
     * methods: E. L. Allgower and K. Georg, Introduction to Numerical Continuation Methods, SIAM
     * 2003, ch. 2; from memory). With m = 3 on a uniform grid this is 3 phi_c - 3 phi_b + phi_a, whose
     * error is third order in the step, against second order for the linear predictor
     * {@link #extrapolate(Solution, Solution, double)}: in a 50 mV gate sweep of a HEMT it brings
     * most points within the outer tolerance at the first iteration. Falls back to the latest
     * solution's potential when the solutions do not all share its mesh.
     *
     * @param parameters the sweep parameter of each solution (e.g. gate bias, V), finite and distinct,
     *                   1 to 4 of them, the latest last
     * @param solutions  the solutions at those parameters, same count
     * @param target     the parameter of the point to predict, finite
     * @return the predicted potential on the latest solution's mesh (V)
     * @throws org.wurtzkit.errors.InvalidParameterException on a count out of range, mismatched lengths,
     *                                                      non-finite or repeated parameters, or a target
     *                                                      so far from closely spaced parameters that the
     *                                                      extrapolation overflows
     */
    public static double[] extrapolate(double[] parameters, Solution[] solutions, double target) {
        Require.nonNull("extrapolation parameters", parameters);
        Require.nonNull("extrapolation solutions", solutions);
        int m = solutions.length;
        if (m < 1 || m > 4 || parameters.length != m) {
            throw new org.wurtzkit.errors.InvalidParameterException("extrapolation points",
                    m + " solutions, " + parameters.length + " parameters", "1 to 4 solutions with one parameter each");
        }
        Require.finite("extrapolation target parameter", target);
        for (int j = 0; j < m; j++) {
            Require.nonNull("extrapolation solution " + j, solutions[j]);
            Require.finite("extrapolation parameter " + j, parameters[j]);
            for (int k = 0; k < j; k++) {
                if (parameters[k] == parameters[j]) {
                    throw new org.wurtzkit.errors.InvalidParameterException("extrapolation parameter " + j,
                            Double.toString(parameters[j]), "distinct from the other parameters");
                }
            }
        }
        Solution latest = solutions[m - 1];
        double[] out = latest.potential();
        double[] z = latest.depth();
        for (int j = 0; j < m - 1; j++) {
            if (!Arrays.equals(solutions[j].depth(), z)) {
                return out;
            }
        }
        double[] weight = new double[m];
        for (int j = 0; j < m; j++) {
            double l = 1;
            for (int k = 0; k < m; k++) {
                if (k != j) {
                    l *= (target - parameters[k]) / (parameters[j] - parameters[k]);
                }
            }
            weight[j] = l;
            if (!Double.isFinite(l)) {
                throw new org.wurtzkit.errors.InvalidParameterException("extrapolation target parameter",
                        Double.toString(target), "a value whose Lagrange weights through the parameters "
                                + Arrays.toString(parameters) + " are finite (it lies too many parameter spacings away)");
            }
        }
        for (int i = 0; i < out.length; i++) {
            out[i] *= weight[m - 1];
        }
        for (int j = 0; j < m - 1; j++) {
            double[] pj = solutions[j].potential();
            for (int i = 0; i < out.length; i++) {
                out[i] += weight[j] * pj[i];
            }
        }
        for (int i = 0; i < out.length; i++) {
            if (!Double.isFinite(out[i])) {
                throw new org.wurtzkit.errors.InvalidParameterException("extrapolation target parameter",
                        Double.toString(target), "a value whose extrapolated potential through the parameters "
                                + Arrays.toString(parameters) + " is finite (the weights overflow the potential at node "
                                + i + ")");
            }
        }
        return out;
    }
}
