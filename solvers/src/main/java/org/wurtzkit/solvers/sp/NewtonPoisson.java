package org.wurtzkit.solvers.sp;

import java.util.Locale;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.wurtzkit.solvers.linalg.SingularPivotException;
import org.wurtzkit.solvers.linalg.Tridiagonal;

/**
 * Damped Newton iteration on the box-integrated Poisson equation of one device, for a given charge
 * model and (optionally) a fixed set of subbands.
 *
 * <p>The unknown is the node potential phi. The residual of node i is
 * F_i = D_{i+1/2} - D_{i-1/2} - Q_i(phi_i) with D_k = -eps_k (phi_{k+1} - phi_k)/h_k + P_k (box
 * integration, S. Selberherr, Analysis and Simulation of Semiconductor Devices, Springer 1984), and
 * F = phi - phi_D on Dirichlet rows; its Jacobian is tridiagonal, so each step is one O(N) solve.
 * A step that would move some node by more than the option's maximum step is first tried with each
 * node's change clamped to that maximum (componentwise damping of the potential update, common
 * practice in device simulation, no source) and kept if it lowers the residual norm; otherwise it
 * is scaled so that no node moves more than the maximum, then halved until the residual norm shows
 * sufficient decrease (backtracking line search with the Armijo condition, J. E. Dennis and
 * R. B. Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations, SIAM
 * 1996, sec. 6.3), which keeps the iteration convergent where the Jacobian is nearly singular (e.g.
 * a free surface whose states are all full or all empty). With both boundaries free, the uniform
 * level of phi is fixed only by global neutrality: it is restored by a scalar root search (Brent)
 * before the first step and after every step that the maximum step limited, so that Newton need not
 * find it; after the first step a shift that would raise the residual norm is not taken (it would
 * undo the uniform part of the step, and Newton and the root search would cycle).
 *
 * <p>One instance per solve: it owns the scratch arrays, so repeated solves allocate nothing.
 * Not thread-safe.
 */
final class NewtonPoisson {
    /** Armijo sufficient-decrease factor: a step t is accepted when |F| falls to (1 - c t) of its value. */
    static final double ARMIJO_FACTOR = 1e-4;
    /** Factor by which the line search shortens a rejected step. */
    static final double STEP_REDUCTION = 0.5;
    /** Smallest step fraction the line search tries; below it the step is taken as it stands. */
    static final double MIN_STEP_FRACTION = 1e-6;
    /**
     * Capacitance to ground added to each diagonal, as a fraction of the node's stiffness, when both
     * boundaries are free: keeps the otherwise singular (pure Neumann) Jacobian regular without
     * moving the solution measurably.
     */
    static final double FLOATING_REGULARISATION = 1e-10;
    /** First trial shift of the neutrality bracket search (V). */
    static final double BRACKET_FIRST_STEP = 0.05;
    /** Largest trial shift of the neutrality bracket search (V); the step doubles up to it. */
    static final double BRACKET_LIMIT = 64;
    /** Relative accuracy of Brent's neutrality root. */
    static final double BRENT_RELATIVE_ACCURACY = 1e-13;
    /** Absolute accuracy of Brent's neutrality root (V). */
    static final double BRENT_ABSOLUTE_ACCURACY = 1e-12;
    /** Charge-model evaluations Brent may spend on the neutrality root. */
    static final int BRENT_MAX_EVALUATIONS = 200;

    private final Device d;
    private final ChargeModel charges;
    private final int maxSteps;
    private final double maxStep;
    private final boolean floating;
    private final double[] q;
    private final double[] dq;
    private final double[] sub;
    private final double[] diag;
    private final double[] sup;
    private final double[] rhs;
    private final double[] delta;
    private final double[] scratch;
    private final double[] backup;
    /** eps_k / h_k of every cell (F/m^2), computed once: residual and Jacobian read it every step. */
    private final double[] stiffness;
    private final PointDensities cell = new PointDensities();

    /**
     * @param d       the device
     * @param charges its charge model
     * @param options maximum Newton steps per solve and maximum step per node
     */
    NewtonPoisson(Device d, ChargeModel charges, SolverOptions options) {
        this.d = d;
        this.charges = charges;
        this.maxSteps = options.maxNewtonIterations();
        this.maxStep = options.maxNewtonStep();
        this.floating = !d.topDirichlet && !d.bottomDirichlet;
        int n = d.n;
        q = new double[n];
        dq = new double[n];
        sub = new double[n - 1];
        diag = new double[n];
        sup = new double[n - 1];
        rhs = new double[n];
        delta = new double[n];
        scratch = new double[n];
        backup = new double[n];
        stiffness = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            stiffness[k] = d.eps[k] / d.h[k];
        }
    }

    /**
     * Solves Poisson for phi in place, until the largest Newton update falls below the tolerance.
     *
     * @param phi       start (Dirichlet values already set); the solution on return (V)
     * @param ref       potential at which the subbands were computed (V), or null without subbands
     * @param qs        the subbands, or null for classical electrons everywhere
     * @param tolerance on max |delta phi| of a Newton step (V)
     * @return the number of Newton steps taken
     * @throws Failure when a linear solve fails, an update is not finite, or the step budget runs
     *                 out; phi then holds the last iterate
     */
    int solve(double[] phi, double[] ref, QuantumStates qs, double tolerance) {
        return solve(phi, ref, qs, tolerance, maxSteps);
    }

    /**
     * As {@link #solve(double[], double[], QuantumStates, double)}, with its own step budget (the
     * cold start's budget grows with the potential it must carry).
     *
     * @param phi       start (Dirichlet values already set); the solution on return (V)
     * @param ref       potential at which the subbands were computed (V), or null without subbands
     * @param qs        the subbands, or null for classical electrons everywhere
     * @param tolerance on max |delta phi| of a Newton step (V)
     * @param budget    Newton steps allowed
     * @return the number of Newton steps taken
     * @throws Failure as the four-argument form
     */
    int solve(double[] phi, double[] ref, QuantumStates qs, double tolerance, int budget) {
        int n = d.n;
        int steps = 0;
        boolean limited = true;
        charges.evaluate(phi, ref, qs, q, dq, cell);
        double norm = residual(phi);
        for (int it = 0; it < budget; it++) {
            if (floating && limited) {
                System.arraycopy(phi, 0, backup, 0, n);
                if (neutralityShift(phi, ref, qs)) {
                    charges.evaluate(phi, ref, qs, q, dq, cell);
                    double shifted = residual(phi);
                    if (it == 0 || shifted <= norm) {
                        norm = shifted;
                    } else {
                        // the shift would undo the last step's uniform part and raise |F|: Newton and
                        // the neutrality root then cycle; keep the step instead
                        System.arraycopy(backup, 0, phi, 0, n);
                        charges.evaluate(phi, ref, qs, q, dq, cell);
                        norm = residual(phi);
                    }
                }
            }
            jacobian();
            if (floating) {
                for (int i = 0; i < n; i++) {
                    double stiff = (i > 0 ? stiffness[i - 1] : 0) + (i < n - 1 ? stiffness[i] : 0);
                    diag[i] += FLOATING_REGULARISATION * stiff;
                }
            }
            try {
                Tridiagonal.solve(sub, diag, sup, rhs, delta, scratch);
            } catch (SingularPivotException | IllegalArgumentException e) {
                throw new Failure("Newton-Poisson step failed: " + e.getMessage(), steps, lastIterate(phi), e);
            }
            double big = 0;
            for (int i = 0; i < n; i++) {
                big = Math.max(big, Math.abs(delta[i]));
            }
            if (Double.isNaN(big)) {
                throw new Failure("Newton-Poisson produced a non-finite update", steps, lastIterate(phi), null);
            }
            steps++;
            System.arraycopy(phi, 0, backup, 0, n);
            limited = big > maxStep;
            double t = limited ? maxStep / big : 1;
            double trialNorm = Double.NaN;
            boolean clamped = false;
            if (limited) {
                // where the Newton step would move some nodes by far more than the maximum (no charge
                // responds there in the linear model, e.g. frozen-out dopants at a few kelvin, or a
                // gate 30 V away from the start), scaling the whole step to the maximum leaves the
                // rest of the stack nearly where it was: try the step with each node's change clamped
                // to the maximum first, and keep it if it lowers |F|
                for (int i = 0; i < n; i++) {
                    phi[i] = backup[i] + Math.max(-maxStep, Math.min(maxStep, delta[i]));
                }
                charges.evaluate(phi, ref, qs, q, dq, cell);
                trialNorm = residual(phi);
                clamped = trialNorm < norm;
            }
            while (!clamped) {
                for (int i = 0; i < n; i++) {
                    phi[i] = backup[i] + t * delta[i];
                }
                charges.evaluate(phi, ref, qs, q, dq, cell);
                trialNorm = residual(phi);
                if (trialNorm <= (1 - ARMIJO_FACTOR * t) * norm || t < MIN_STEP_FRACTION || big < tolerance) {
                    break;
                }
                t *= STEP_REDUCTION;
            }
            norm = trialNorm;
            if (big < tolerance) {
                return steps;
            }
        }
        throw new Failure(String.format(Locale.ROOT, "Newton-Poisson not converged in %d steps (tolerance %.3g V)",
                budget, tolerance), steps, lastIterate(phi), null);
    }

    /**
     * Shifts phi uniformly by the s that makes the sum of all box residuals vanish,
     * sum F = D_bottom - D_top - sum Q(phi + s) = 0 (global charge neutrality with both boundaries
     * free); sum Q falls monotonically with s, so a bracket and Brent's method
     * (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, via Commons Math) find it.
     *
     * @return whether a shift was applied
     */
    private boolean neutralityShift(double[] phi, double[] ref, QuantumStates qs) {
        int n = d.n;
        double[] trial = scratch;
        double target = d.px[n - 2]; // D at the zero-field bottom; D = 0 above a free surface
        UnivariateFunction g = s -> {
            for (int i = 0; i < n; i++) {
                trial[i] = phi[i] + s;
            }
            charges.evaluate(trial, ref, qs, q, dq, cell);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += q[i];
            }
            return target - sum;
        };
        double g0 = g.value(0);
        if (g0 == 0 || !Double.isFinite(g0)) {
            return false;
        }
        double dir = g0 < 0 ? 1 : -1; // g grows with s
        double lo = 0;
        double glo = g0;
        double step = BRACKET_FIRST_STEP;
        double hi = Double.NaN;
        while (step <= BRACKET_LIMIT) {
            double s = dir * step;
            double gs = g.value(s);
            if (!Double.isFinite(gs)) {
                break;
            }
            if (Math.signum(gs) != Math.signum(g0)) {
                hi = s;
                break;
            }
            lo = s;
            glo = gs;
            step *= 2;
        }
        if (Double.isNaN(hi) || glo == 0) {
            return false;
        }
        double root = new BrentSolver(BRENT_RELATIVE_ACCURACY, BRENT_ABSOLUTE_ACCURACY)
                .solve(BRENT_MAX_EVALUATIONS, g, Math.min(lo, hi), Math.max(lo, hi));
        for (int i = 0; i < n; i++) {
            phi[i] += root;
        }
        return true;
    }

    /**
     * Writes -F into rhs, F_i = D_{i+1/2} - D_{i-1/2} - Q_i with D_k = -eps_k (phi_{k+1} - phi_k)/h_k + P_k
     * (Dirichlet rows: F = phi - phi_D), and returns the Euclidean norm of F over the non-Dirichlet rows.
     */
    private double residual(double[] phi) {
        int n = d.n;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            if ((i == 0 && d.topDirichlet) || (i == n - 1 && d.bottomDirichlet)) {
                rhs[i] = -(phi[i] - (i == 0 ? d.phiTop : d.phiBottom));
                continue;
            }
            double f = -q[i];
            if (i > 0) {
                f += stiffness[i - 1] * (phi[i] - phi[i - 1]) - d.px[i - 1];
            }
            if (i < n - 1) {
                f += -stiffness[i] * (phi[i + 1] - phi[i]) + d.px[i];
            } else {
                f += d.px[n - 2]; // zero field: D at the bottom is the bulk polarization
            }
            rhs[i] = -f;
            sum += f * f;
        }
        return Math.sqrt(sum);
    }

    /** The tridiagonal Jacobian dF/dphi, from the charge derivatives dq. */
    private void jacobian() {
        int n = d.n;
        for (int i = 0; i < n; i++) {
            if ((i == 0 && d.topDirichlet) || (i == n - 1 && d.bottomDirichlet)) {
                diag[i] = 1;
                if (i < n - 1) {
                    sup[i] = 0;
                }
                if (i > 0) {
                    sub[i - 1] = 0;
                }
                continue;
            }
            double jd = -dq[i];
            if (i > 0) {
                double c = stiffness[i - 1];
                jd += c;
                sub[i - 1] = -c;
            }
            if (i < n - 1) {
                double c = stiffness[i];
                jd += c;
                sup[i] = -c;
            }
            diag[i] = jd;
        }
    }

    /** A copy of phi with every non-finite value replaced by the step's start (or 0). */
    private double[] lastIterate(double[] phi) {
        double[] last = phi.clone();
        for (int i = 0; i < last.length; i++) {
            if (!Double.isFinite(last[i])) {
                last[i] = Double.isFinite(backup[i]) ? backup[i] : 0;
            }
        }
        return last;
    }

    /**
     * A Newton-Poisson solve that failed: why, the steps it took, and its last finite iterate. The
     * caller adds the outer context and turns it into a {@link NotConvergedException}.
     */
    static final class Failure extends RuntimeException {
        private static final long serialVersionUID = 1L;
        /** Newton steps taken before the failure. */
        final int steps;
        /** The last iterate, non-finite values replaced (V). */
        final transient double[] lastIterate;

        Failure(String reason, int steps, double[] lastIterate, Throwable cause) {
            super(reason, cause, false, false);
            this.steps = steps;
            this.lastIterate = lastIterate;
        }
    }
}
