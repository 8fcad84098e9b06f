package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.BandGap;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;

/**
 * A temperature sweep of the full solver with continuation, like {@link BiasSweep}: the first
 * temperature is solved cold, each further one starts from the previous solution; a failed
 * continued solve right after a converged point is retried cold (after a failed point, one attempt
 * only), and a point that fails is recorded with what was tried and why, not dropped. An
 * interrupted thread stops the sweep before its next point.
 *
 * <p>Each point is the structure at that temperature ({@link Structure#withTemperatureK(double)}):
 * the band gaps follow each material's Varshni law ({@link BandGap}) and the band edges, Fermi
 * statistics and subband occupations are evaluated at that temperature by the solver; the
 * polarization and the lattice are those of the structure (no thermal expansion).
 *
 * <p>Stateless and thread-safe.
 */
public final class TemperatureSweep {
    private final SelfConsistentSolver solver;

    /** A sweep with the default solver. */
    public TemperatureSweep() {
        this(new SelfConsistentSolver());
    }

    /** @param solver the solver to use */
    public TemperatureSweep(SelfConsistentSolver solver) {
        this.solver = Require.nonNull("solver", solver);
    }

    /**
     * @param structure    the stack
     * @param temperatures temperatures (K) in solving order: at least one, each in (0, 2000],
     *                     strictly monotonic
     * @return the sweep
     * @throws InvalidParameterException for an empty, non-monotonic or out-of-range list
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted (checked
     *         before every point; its interrupt flag stays set)
     */
    public TemperatureSweepResult run(Structure structure, double... temperatures) {
        Require.nonNull("structure", structure);
        Require.nonNull("temperatures", temperatures);
        double[] t = temperatures.clone();
        if (t.length == 0) {
            throw new InvalidParameterException("number of temperatures", "0", "[1, ...)");
        }
        for (int i = 0; i < t.length; i++) {
            if (!(t[i] > 0 && t[i] <= BandGap.MAX_TEMPERATURE_K)) {
                throw new InvalidParameterException("temperature [" + i + "] (K)", Double.toString(t[i]),
                        "(0, " + (int) BandGap.MAX_TEMPERATURE_K + "]");
            }
        }
        if (t.length > 1) {
            boolean up = t[1] > t[0];
            for (int i = 1; i < t.length; i++) {
                if (up ? !(t[i] > t[i - 1]) : !(t[i] < t[i - 1])) {
                    throw new InvalidParameterException("temperature [" + i + "] (K)", Double.toString(t[i]),
                            (up ? "(" + t[i - 1] + ", 2000]" : "(0, " + t[i - 1] + ")")
                                    + " (temperatures must be strictly monotonic)");
                }
            }
        }
        Structure[] at = new Structure[t.length];
        for (int i = 0; i < t.length; i++) {
            at[i] = structure.withTemperatureK(t[i]);
        }
        Solution[] solutions = new Solution[t.length];
        PointFailure.Reason[] failures = new PointFailure.Reason[t.length];
        Continuation.solveInOrder(solver, at, t, solutions, failures, "temperature sweep");
        return new TemperatureSweepResult(structure, t, solutions, failures, solver.options());
    }
}
