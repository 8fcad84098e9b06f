package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Structure;

/**
 * Finds the value of one structure parameter (barrier thickness, Al fraction, cap thickness, or
 * any {@link StructureFamily}) at which the full solver gives a target sheet density or threshold
 * voltage.
 *
 * <p>Method: the quantity is evaluated at both ends of the given interval. If the target lies
 * outside the range spanned by these two values, {@link TargetOutOfReachException} says so, with
 * the reachable range; the quantity is assumed monotonic on the interval (true for n_s and V_th
 * against barrier thickness, Al fraction and cap thickness in the usual ranges), so a
 * non-monotonic quantity might be reachable inside although the ends do not bracket it. Otherwise
 * the root of quantity - target is searched with Brent's method (R. P. Brent, Algorithms for
 * Minimization without Derivatives, Prentice-Hall 1973; {@link BrentSolver} of Commons Math 3),
 * stopping as soon as an evaluated point lies within the tolerance. Every evaluation is a cold
 * solve (or a bias sweep), so the result does not depend on the search path.
 *
 * <p>Stateless and thread-safe.
 */
public final class TargetSearch {
    private static final Column SHEET = Column.of("sheet_density", "cm^-2");
    private static final Column THRESHOLD = Column.of("threshold_voltage", "V");

    private final SelfConsistentSolver solver;
    private final int maxEvaluations;

    /** A search with the default solver and at most 60 evaluations. */
    public TargetSearch() {
        this(new SelfConsistentSolver(), 60);
    }

    /**
     * @param solver         the solver
     * @param maxEvaluations most evaluations of the quantity per search, in [3, 10000]
     */
    public TargetSearch(SelfConsistentSolver solver, int maxEvaluations) {
        this.solver = Require.nonNull("solver", solver);
        this.maxEvaluations = Require.inRange("maximum number of evaluations", maxEvaluations, 3, 10000);
    }

    /**
     * Finds the parameter value whose solved 2DEG sheet density ({@code Solution#sheetDensityPerCm2()}
     * at the structure's own bias) is within {@code relativeTolerance} of the target.
     *
     * @param family            the structures to search
     * @param lower             lower end of the interval, finite
     * @param upper             upper end, finite and &gt; lower
     * @param targetPerCm2      the target n_s (cm^-2), finite and &gt; 0
     * @param relativeTolerance accepted |n_s - target| / target, in [1e-9, 0.5]
     * @return the result
     * @throws TargetOutOfReachException if the ends of the interval do not bracket the target
     * @throws WurtzkitException         of kind NOT_CONVERGED if a solve fails or the tolerance
     *                                   cannot be met within the evaluation budget
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted
     *                                   (checked before every evaluation; the flag stays set)
     */
    public TargetResult sheetDensity(StructureFamily family, double lower, double upper, double targetPerCm2,
            double relativeTolerance) {
        Require.positive("target sheet density (cm^-2)", targetPerCm2);
        Require.inRange("relative tolerance on the sheet density", relativeTolerance, 1e-9, 0.5);
        return search(family, lower, upper, SHEET, targetPerCm2, relativeTolerance * targetPerCm2,
                s -> solver.solve(s).sheetDensityPerCm2(), null, relativeTolerance);
    }

    /**
     * Finds the parameter value whose threshold voltage (from a bias sweep per evaluation) is
     * within {@code toleranceV} of the target.
     *
     * @param family     the structures to search (Schottky gate)
     * @param lower      lower end of the interval, finite
     * @param upper      upper end, finite and &gt; lower
     * @param targetV    the target V_th (V), finite
     * @param toleranceV accepted |V_th - target| (V), in [1e-9, 10]
     * @param extraction the bias sweep and threshold definition used at every evaluation
     * @return the result
     * @throws TargetOutOfReachException if the ends of the interval do not bracket the target
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted
     *                                   (checked before every evaluation and every sweep point)
     */
    public TargetResult thresholdVoltage(StructureFamily family, double lower, double upper, double targetV,
            double toleranceV, ThresholdExtraction extraction) {
        Require.finite("target threshold voltage (V)", targetV);
        Require.inRange("tolerance on the threshold voltage (V)", toleranceV, 1e-9, 10);
        Require.nonNull("threshold extraction", extraction);
        BiasSweep sweep = new BiasSweep(solver);
        return search(family, lower, upper, THRESHOLD, targetV, toleranceV,
                s -> extraction.thresholdVoltage(s, sweep), extraction, Double.NaN);
    }

    @FunctionalInterface
    private interface Measure {
        double of(Structure s);
    }

    /** Thrown inside the objective to stop Brent's method at an accepted point. */
    private static final class Accepted extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final double parameter;

        Accepted(double parameter) {
            super(null, null, false, false);
            this.parameter = parameter;
        }
    }

    /** Memo of the evaluations, in order; the Brent solver asks for the end points again. */
    private static final class Evaluations {
        final StructureFamily family;
        final Measure measure;
        final Column quantity;
        double[] p = new double[8];
        double[] v = new double[8];
        Structure[] s = new Structure[8];
        int n;

        Evaluations(StructureFamily family, Measure measure, Column quantity) {
            this.family = family;
            this.measure = measure;
            this.quantity = quantity;
        }

        int index(double parameter) {
            for (int i = 0; i < n; i++) {
                if (p[i] == parameter) {
                    return i;
                }
            }
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException(String.format(Locale.ROOT,
                        "target search interrupted after %d evaluations", n));
            }
            Structure st = family.at(parameter);
            double value;
            try {
                value = measure.of(st);
            } catch (WurtzkitException e) {
                throw new WurtzkitException(e.kind(), String.format(Locale.ROOT,
                        "target search: evaluating %s at %s = %s%s failed: %s", quantity.name(),
                        family.parameter().name(), parameter, unit(family.parameter()), e.getMessage()), e);
            }
            if (n == p.length) {
                p = Arrays.copyOf(p, 2 * n);
                v = Arrays.copyOf(v, 2 * n);
                s = Arrays.copyOf(s, 2 * n);
            }
            p[n] = parameter;
            v[n] = value;
            s[n] = st;
            return n++;
        }
    }

    private static String unit(Column c) {
        return c.unit().isEmpty() ? "" : " " + c.unit();
    }

    private TargetResult search(StructureFamily family, double lower, double upper, Column quantity, double target,
            double tolerance, Measure measure, ThresholdExtraction extraction, double relativeTolerance) {
        Require.nonNull("structure family", family);
        TargetResult.Setup setup = new TargetResult.Setup(family, solver.options(), lower, upper, maxEvaluations,
                extraction, relativeTolerance);
        String name = family.parameter().name();
        Require.finite("lower end of the " + name + " interval", lower);
        Require.finite("upper end of the " + name + " interval", upper);
        if (!(upper > lower)) {
            throw new InvalidParameterException("upper end of the " + name + " interval", Double.toString(upper),
                    "(" + lower + ", +inf) (above the lower end)");
        }
        Evaluations ev = new Evaluations(family, measure, quantity);
        int lo = ev.index(lower);
        int hi = ev.index(upper);
        double vLo = ev.v[lo];
        double vHi = ev.v[hi];
        if (Math.abs(vLo - target) <= tolerance) {
            return result(ev, lo, quantity, target, tolerance, setup);
        }
        if (Math.abs(vHi - target) <= tolerance) {
            return result(ev, hi, quantity, target, tolerance, setup);
        }
        double min = Math.min(vLo, vHi);
        double max = Math.max(vLo, vHi);
        if (!(target >= min && target <= max)) {
            throw new TargetOutOfReachException(quantity, target, min, max, family.parameter(), lower, upper);
        }
        BrentSolver brent = new BrentSolver(1e-12, 1e-12 * (upper - lower));
        double root;
        try {
            root = brent.solve(maxEvaluations, x -> {
                int i = ev.index(x);
                double g = ev.v[i] - target;
                if (Math.abs(g) <= tolerance) {
                    throw new Accepted(x);
                }
                return g;
            }, lower, upper);
        } catch (Accepted a) {
            return result(ev, ev.index(a.parameter), quantity, target, tolerance, setup);
        } catch (TooManyEvaluationsException e) {
            throw new WurtzkitException(ErrorKind.NOT_CONVERGED, String.format(Locale.ROOT,
                    "target search for %s = %s%s over %s in [%s, %s]%s: tolerance %s not met in %d evaluations",
                    quantity.name(), target, unit(quantity), name, lower, upper, unit(family.parameter()), tolerance,
                    maxEvaluations), e);
        }
        int i = ev.index(root);
        if (Math.abs(ev.v[i] - target) <= tolerance) {
            return result(ev, i, quantity, target, tolerance, setup);
        }
        throw new WurtzkitException(ErrorKind.NOT_CONVERGED, String.format(Locale.ROOT,
                "target search for %s = %s%s: the interval of %s shrank to %s%s, where the value is %s, "
                        + "outside the tolerance %s (is the quantity monotonic and smooth on [%s, %s]?)",
                quantity.name(), target, unit(quantity), name, root, unit(family.parameter()), ev.v[i], tolerance,
                lower, upper));
    }

    private static TargetResult result(Evaluations ev, int i, Column quantity, double target, double tolerance,
            TargetResult.Setup setup) {
        return new TargetResult(ev.family.parameter(), quantity, target, tolerance, ev.p[i], ev.v[i], ev.s[i],
                Arrays.copyOf(ev.p, ev.n), Arrays.copyOf(ev.v, ev.n), setup);
    }
}
