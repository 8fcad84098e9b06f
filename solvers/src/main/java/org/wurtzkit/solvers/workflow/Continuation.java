package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.PotentialPredictor;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.Layer;
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
     * {@link PotentialPredictor#extrapolate(double[], Solution[], double)}). A failed continued
     * solve right after a converged point is retried cold once; a point after a failed one costs a
     * single bounded attempt (continued from the last success), so a stretch of a sweep where the
     * stack does not converge costs one solve per point, not two. A failed point gets a message in
     * {@code failures} saying what was tried and why it failed, and a null solution; the predictor
     * restarts from the last success. The calling thread's interrupt flag is checked before every
     * point.
     *
     * @param solver    the solver
     * @param at        the structures, in solving order
     * @param parameter the sweep parameter of each structure (bias or temperature), distinct
     * @param solutions output: converged solutions (null where failed)
     * @param failures  output: why each point failed, saying what was tried (null where converged)
     * @param what      the sweep's name for the interruption message, e.g. "bias sweep"
     * @throws CancellationException if the calling thread is interrupted (its flag stays set); the
     *                               points before it are solved, the rest are not
     */
    static void solveInOrder(SelfConsistentSolver solver, Structure[] at, double[] parameter, Solution[] solutions,
            PointFailure.Reason[] failures, String what) {
        Solution lastSuccess = null;
        for (int i = 0; i < at.length; i++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException(String.format(Locale.ROOT, "%s interrupted after %d of %d points", what,
                        i, at.length));
            }
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
                } else if (i > 0 && solutions[i - 1] == null) {
                    failures[i] = new PointFailure.Reason(first.kind(), "continued from the last converged point: "
                            + PointFailure.Reason.of(first).message() + " (no cold retry: the point before failed too)");
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

    /**
     * The depths of a neighbouring solution's nodes carried onto another stack of the same layer
     * sequence, layer by layer: a node a fraction t through layer k of the old stack lands a
     * fraction t through layer k of the new one (below the last interface, the old offset is
     * kept). So a guess for a stack with a thicker barrier puts the old channel's potential at the
     * new channel, not 1 nm off it; with a plain depth interpolation the polarization step of the
     * guess would sit beside the interface's, and the first outer iteration would have to move it.
     * A stack with another number of layers gets the old depths unchanged.
     *
     * @param previous the neighbouring solution
     * @param next     the stack to be solved
     * @return strictly increasing depths (m) at which {@code previous.potential()} is the guess
     */
    static double[] alignedDepth(Solution previous, Structure next) {
        double[] z = previous.depth();
        double[] from = interfaces(previous.structure());
        double[] to = interfaces(next);
        if (from.length != to.length) {
            return z;
        }
        double[] out = new double[z.length];
        int k = 0;
        int last = from.length - 1;
        for (int i = 0; i < z.length; i++) {
            while (k < last && z[i] > from[k + 1]) {
                k++;
            }
            if (k == last) {
                out[i] = z[i] + (to[last] - from[last]);
            } else {
                out[i] = to[k] + (z[i] - from[k]) * (to[k + 1] - to[k]) / (from[k + 1] - from[k]);
            }
        }
        return out;
    }

    /**
     * A guess extrapolated through two or three neighbouring solutions on a line of points, all
     * carried onto the new stack layer by layer ({@link #alignedDepth}): the Lagrange polynomial
     * through them in the line's parameter p (linear through two, quadratic through three),
     * evaluated at the new point's p, at the carried depths of the newest one; the older ones are
     * interpolated there linearly (and held at their end values beyond their range).
     *
     * @param from   the solutions, oldest first, the newest last
     * @param p      their parameters, distinct
     * @param target the parameter of the point to be solved
     * @param next   the stack to be solved
     * @return {depths (m), potential (V)} of the guess
     */
    static double[][] alignedGuess(Solution[] from, double[] p, double target, Structure next) {
        int m = from.length;
        int newest = m - 1;
        double[] z = alignedDepth(from[newest], next);
        double[] guess = new double[z.length];
        for (int j = 0; j < m; j++) {
            double w = 1;
            for (int k = 0; k < m; k++) {
                if (k != j) {
                    w *= (target - p[k]) / (p[j] - p[k]);
                }
            }
            double[] v = from[j].potential();
            if (j == newest) {
                for (int i = 0; i < z.length; i++) {
                    guess[i] += w * v[i];
                }
                continue;
            }
            double[] zo = alignedDepth(from[j], next);
            int a = 0;
            for (int i = 0; i < z.length; i++) {
                double x = z[i];
                while (a < zo.length - 2 && zo[a + 1] < x) {
                    a++;
                }
                double u = Math.max(0, Math.min(1, (x - zo[a]) / (zo[a + 1] - zo[a])));
                guess[i] += w * (v[a] + u * (v[a + 1] - v[a]));
            }
        }
        return new double[][] {z, guess};
    }

    /** Depths of the top, every interface and the bottom of a stack (m), gate stack first. */
    private static double[] interfaces(Structure s) {
        List<InsulatorLayer> gate = s.gateStack();
        List<Layer> layers = s.layersTopDown();
        double[] b = new double[gate.size() + layers.size() + 1];
        int j = 0;
        for (InsulatorLayer g : gate) {
            b[j + 1] = b[j] + g.thickness();
            j++;
        }
        for (Layer l : layers) {
            b[j + 1] = b[j] + l.thickness();
            j++;
        }
        return b;
    }
}
