package org.wurtzkit.solvers.sp;

import org.wurtzkit.units.Decimals;

/**
 * What an iterative solve did: whether it converged, how many outer (Schroedinger-Poisson)
 * iterations and inner Newton steps it took, and the outer residual history max |delta phi| (V).
 *
 * @param converged        whether the tolerance was met
 * @param iterations       outer iterations performed (0 for a purely classical solve)
 * @param newtonIterations Newton steps summed over every Poisson solve
 * @param residualHistory  max |phi_new - phi_old| after each outer iteration (V)
 * @param message          why it stopped
 */
public record ConvergenceRecord(boolean converged, int iterations, int newtonIterations, double[] residualHistory,
        String message) {
    /** Copies the history. */
    public ConvergenceRecord {
        residualHistory = residualHistory.clone();
    }

    /** {@return a copy of the residual history (V)} */
    @Override
    public double[] residualHistory() {
        return residualHistory.clone();
    }

    /** {@return the last residual (V), or 0 when there was no outer iteration} */
    public double finalResidual() {
        return residualHistory.length == 0 ? 0 : residualHistory[residualHistory.length - 1];
    }

    /**
     * @return e.g. {@code "converged after 6 iterations (34 Newton steps), last change 4.1e-7 V"}, or
     *         {@code "NOT converged after ..."} followed by the reason it stopped
     */
    @Override
    public String toString() {
        return (converged ? "converged" : "NOT converged") + " after " + iterations + " iteration"
                + (iterations == 1 ? "" : "s") + " (" + newtonIterations + " Newton steps), last change "
                + Decimals.format(finalResidual(), "V") + (converged ? "" : ": " + message);
    }
}
