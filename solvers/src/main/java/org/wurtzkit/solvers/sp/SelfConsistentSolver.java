package org.wurtzkit.solvers.sp;

import java.util.Arrays;
import java.util.Locale;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.linalg.SingularPivotException;
import org.wurtzkit.solvers.linalg.Tridiagonal;
import org.wurtzkit.structure.Structure;

/**
 * Self-consistent Schroedinger-Poisson solver for a c-plane nitride stack.
 *
 * <p>Method:
 * <ol>
 * <li>The structure is resolved once onto a non-uniform mesh ({@link org.wurtzkit.solvers.mesh.Mesh})
 * with a node on every interface.</li>
 * <li>Poisson's equation d/dx(eps dphi/dx) = -rho with the polarization in the displacement,
 * D = eps E + P, is discretised by box integration (S. Selberherr, Analysis and Simulation of
 * Semiconductor Devices, Springer 1984): the polarization sheet charges appear where P changes, at
 * interface nodes, and inside graded layers. It is solved by damped Newton iteration; each step is
 * one O(N) tridiagonal solve.</li>
 * <li>A classical solve (Fermi-Dirac electrons everywhere) gives the starting potential.</li>
 * <li>The outer loop is the predictor-corrector scheme of A. Trellakis, A. T. Galick, A. Pacelli
 * and U. Ravaioli, J. Appl. Phys. 81, 7880 (1997): the subbands of each quantum window are computed
 * for the current potential (BenDaniel-Duke effective-mass equation, lowest states by Sturm
 * bisection and inverse iteration, O(N k)); then Poisson is solved by Newton with the subband
 * density's first-order dependence on the potential; repeated until max |delta phi| falls below
 * the tolerance.</li>
 * </ol>
 *
 * <p>Stateless and thread-safe: one instance may serve many threads.
 */
public final class SelfConsistentSolver {
    /** Newton tolerance of the classical start when subbands follow (V): a good start suffices. */
    private static final double CLASSICAL_START_TOLERANCE = 1e-4;
    /** Newton tolerance of the first Schroedinger-Poisson iteration (V). */
    private static final double INITIAL_INNER_TOLERANCE = 1e-4;
    /** Outer iteration from which a stalled change triggers under-relaxation. */
    private static final int STAGNATION_START = 3;
    /** A change that shrinks by less than this factor counts as stalled. */
    private static final double STAGNATION_RATIO = 0.7;
    /** Smallest under-relaxation factor of the outer update. */
    private static final double MIN_MIXING = 0.05;
    /** Relative capacitance to ground that keeps a both-sides-free Jacobian regular. */
    private static final double FLOATING_REGULARISATION = 1e-10;
    /** Inner tolerance as a fraction of the previous outer change of the potential. */
    private static final double INNER_TOLERANCE_FACTOR = 1e-3;

    private final SolverOptions options;

    /** A solver with {@link SolverOptions#defaults()}. */
    public SelfConsistentSolver() {
        this(SolverOptions.defaults());
    }

    /** @param options settings */
    public SelfConsistentSolver(SolverOptions options) {
        this.options = Require.nonNull("solver options", options);
    }

    /** @return the settings */
    public SolverOptions options() {
        return options;
    }

    /**
     * Solves from a cold start.
     *
     * @param structure the stack
     * @return the converged solution
     * @throws NotConvergedException with the convergence record and the last iterate
     */
    public Solution solve(Structure structure) {
        return solve(structure, null);
    }

    /**
     * Solves, starting from a neighbouring solution (continuation in bias, temperature or geometry):
     * its potential, interpolated onto the new mesh, seeds the iteration.
     *
     * @param structure the stack
     * @param start     a solution of a similar stack, or null for a cold start
     * @return the converged solution
     * @throws NotConvergedException with the convergence record and the last iterate
     */
    public Solution solve(Structure structure, Solution start) {
        return start == null ? solve(structure, null, null) : solve(structure, start.depth(), start.potential());
    }

    /**
     * Solves, starting from a given potential profile, e.g. one extrapolated from two neighbouring
     * solutions of a sweep ({@link PotentialPredictor#extrapolate(Solution, Solution, double)}).
     *
     * @param structure the stack
     * @param depth     depths of the guess (m), increasing, or null for a cold start
     * @param potential potential of the guess at those depths (V), finite, or null for a cold start
     * @return the converged solution
     * @throws NotConvergedException with the convergence record and the last iterate
     */
    public Solution solve(Structure structure, double[] depth, double[] potential) {
        Require.nonNull("structure", structure);
        if ((depth == null) != (potential == null) || (depth != null && depth.length != potential.length)) {
            throw new org.wurtzkit.errors.InvalidParameterException("initial guess",
                    (depth == null ? "null" : depth.length) + " depths, " + (potential == null ? "null" : potential.length)
                            + " potentials", "both null, or arrays of equal length");
        }
        if (depth != null) {
            if (depth.length < 2) {
                throw new org.wurtzkit.errors.InvalidParameterException("initial guess length",
                        Integer.toString(depth.length), "[2, ...) points");
            }
            for (int i = 0; i < depth.length; i++) {
                Require.finite("initial guess potential[" + i + "] (V)", potential[i]);
                Require.finite("initial guess depth[" + i + "] (m)", depth[i]);
                if (i > 0 && !(depth[i] > depth[i - 1])) {
                    throw new org.wurtzkit.errors.InvalidParameterException("initial guess depth[" + i + "] (m)",
                            Double.toString(depth[i]), "(" + depth[i - 1] + ", ...) (strictly increasing)");
                }
            }
        }
        Device d = new Device(structure, options);
        Work w = new Work(d);
        boolean cold = depth == null;
        double[] phi = cold ? coldStart(d) : interpolate(depth, potential, d);
        applyDirichlet(d, phi);
        ChargeModel charges = new ChargeModel(d);
        int[] newtonCount = {0};
        double[] history = new double[options.maxIterations()];
        int nw = d.windowStart.length;
        if (cold || nw == 0) {
            newton(d, charges, phi, null, null, w, newtonCount, history, 0,
                    nw == 0 ? options.newtonTolerance() : CLASSICAL_START_TOLERANCE);
        }
        if (nw == 0) {
            ConvergenceRecord rec = new ConvergenceRecord(true, 0, newtonCount[0], new double[0],
                    "classical solve converged");
            return new Solution(d, phi, null, null, charges.report(phi, null, null), rec);
        }
        QuantumStates qs = new QuantumStates(d);
        double[] ref = new double[d.n];
        double mixing = 1;
        for (int it = 0; it < options.maxIterations(); it++) {
            qs.update(d, phi);
            System.arraycopy(phi, 0, ref, 0, d.n);
            // inexact inner solves while the outer loop is far from converged (cf. inexact Newton,
            // R. S. Dembo, S. C. Eisenstat and T. Steihaug, SIAM J. Numer. Anal. 19, 400 (1982)); the
            // final iterations are solved to the full Newton tolerance
            double inner = it == 0 ? INITIAL_INNER_TOLERANCE
                    : Math.max(options.newtonTolerance(), INNER_TOLERANCE_FACTOR * history[it - 1]);
            newton(d, charges, phi, ref, qs, w, newtonCount, history, it, Math.min(inner, INITIAL_INNER_TOLERANCE));
            double delta = 0;
            for (int i = 0; i < d.n; i++) {
                delta = Math.max(delta, Math.abs(phi[i] - ref[i]));
            }
            history[it] = delta;
            if (it >= STAGNATION_START && delta > STAGNATION_RATIO * history[it - 1]) {
                // charge sloshing between coupled wells: the predictor over-corrects; under-relax
                // the outer update, more each time the change fails to shrink
                mixing = Math.max(MIN_MIXING, 0.5 * mixing);
            }
            if (mixing < 1) {
                for (int i = 0; i < d.n; i++) {
                    phi[i] = ref[i] + mixing * (phi[i] - ref[i]);
                }
            }
            if (delta < options.tolerance()) {
                // the subbands of the last iteration, with the predictor's first-order shift to phi,
                // are the converged density: no further Schroedinger solve is needed
                ConvergenceRecord rec = new ConvergenceRecord(true, it + 1, newtonCount[0],
                        Arrays.copyOf(history, it + 1), String.format(Locale.ROOT,
                                "converged: max |delta phi| = %.3g V < %.3g V after %d iterations", delta,
                                options.tolerance(), it + 1));
                return new Solution(d, phi, ref, qs, charges.report(phi, ref, qs), rec);
            }
        }
        int m = options.maxIterations();
        ConvergenceRecord rec = new ConvergenceRecord(false, m, newtonCount[0], history, String.format(Locale.ROOT,
                "Schroedinger-Poisson loop not converged after %d iterations: max |delta phi| = %.3g V, tolerance %.3g V",
                m, history[m - 1], options.tolerance()));
        throw new NotConvergedException(rec.message(), rec, d.x, phi);
    }

    /** Scratch arrays of one solve. */
    private static final class Work {
        final double[] q;
        final double[] dq;
        final double[] sub;
        final double[] diag;
        final double[] sup;
        final double[] rhs;
        final double[] delta;
        final double[] scratch;
        final double[] backup;
        final PointDensities cell = new PointDensities();

        Work(Device d) {
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
        }
    }

    /**
     * Flat bands at the bottom layer's level: E_c - E_F = 0.25 eV (or the fixed bottom value) at
     * every node, offsets included; Newton carries it from there.
     */
    private static double[] coldStart(Device d) {
        double level = d.bottomDirichlet ? d.phiBottom : d.ec[d.n - 2] - 0.25;
        double[] phi = new double[d.n];
        Arrays.fill(phi, level);
        return phi;
    }

    private static double[] interpolate(double[] z, double[] v, Device d) {
        double[] phi = new double[d.n];
        int j = 0;
        for (int i = 0; i < d.n; i++) {
            double x = d.x[i];
            while (j < z.length - 2 && z[j + 1] < x) {
                j++;
            }
            double t = (x - z[j]) / (z[j + 1] - z[j]);
            t = Math.max(0, Math.min(1, t));
            phi[i] = v[j] + t * (v[j + 1] - v[j]);
        }
        return phi;
    }

    private static void applyDirichlet(Device d, double[] phi) {
        if (d.topDirichlet) {
            phi[0] = d.phiTop;
        }
        if (d.bottomDirichlet) {
            phi[d.n - 1] = d.phiBottom;
        }
    }

    /**
     * Damped Newton on the box-integrated Poisson equation; each step is one tridiagonal solve. The
     * step is first limited so that no node moves more than {@code maxNewtonStep}, then halved until
     * the residual norm decreases (backtracking line search, J. E. Dennis and R. B. Schnabel,
     * Numerical Methods for Unconstrained Optimization and Nonlinear Equations, SIAM 1996, sec. 6.3),
     * which keeps the iteration convergent where the Jacobian is nearly singular (e.g. a free surface
     * whose states are all full or all empty).
     */
    private void newton(Device d, ChargeModel charges, double[] phi, double[] ref, QuantumStates qs, Work w,
            int[] count, double[] history, int outer, double tolerance) {
        int n = d.n;
        double maxStep = options.maxNewtonStep();
        boolean floating = !d.topDirichlet && !d.bottomDirichlet;
        boolean limited = true;
        charges.evaluate(phi, ref, qs, w.q, w.dq, w.cell);
        double norm = residual(d, phi, w.q, w.rhs);
        for (int it = 0; it < options.maxNewtonIterations(); it++) {
            if (floating && limited) {
                // Both boundaries free: the uniform shift of the potential is fixed only by the total
                // charge, whose capacitance freezes out at low temperature. Restore global neutrality
                // by a monotone scalar root search first, so the Newton step need not find it.
                if (neutralityShift(d, charges, phi, ref, qs, w)) {
                    charges.evaluate(phi, ref, qs, w.q, w.dq, w.cell);
                    norm = residual(d, phi, w.q, w.rhs);
                }
            }
            jacobian(d, w.dq, w.sub, w.diag, w.sup);
            if (floating) {
                // a capacitance to ground of 1e-10 of the local stiffness keeps the matrix regular
                for (int i = 0; i < n; i++) {
                    double stiff = (i > 0 ? d.eps[i - 1] / d.h[i - 1] : 0) + (i < n - 1 ? d.eps[i] / d.h[i] : 0);
                    w.diag[i] += FLOATING_REGULARISATION * stiff;
                }
            }
            try {
                Tridiagonal.solve(w.sub, w.diag, w.sup, w.rhs, w.delta, w.scratch);
            } catch (SingularPivotException | IllegalArgumentException e) {
                throw failure(d, phi, w, count, history, outer, "Newton-Poisson step failed: " + e.getMessage());
            }
            double big = 0;
            for (int i = 0; i < n; i++) {
                big = Math.max(big, Math.abs(w.delta[i]));
            }
            if (Double.isNaN(big)) {
                throw failure(d, phi, w, count, history, outer, "Newton-Poisson produced a non-finite update");
            }
            count[0]++;
            System.arraycopy(phi, 0, w.backup, 0, n);
            limited = big > maxStep;
            double t = limited ? maxStep / big : 1;
            double trialNorm;
            while (true) {
                for (int i = 0; i < n; i++) {
                    phi[i] = w.backup[i] + t * w.delta[i];
                }
                charges.evaluate(phi, ref, qs, w.q, w.dq, w.cell);
                trialNorm = residual(d, phi, w.q, w.rhs);
                if (trialNorm <= (1 - 1e-4 * t) * norm || t < 1e-6 || big < tolerance) {
                    break;
                }
                t *= 0.5;
            }
            norm = trialNorm;
            if (big < tolerance) {
                return;
            }
        }
        throw failure(d, phi, w, count, history, outer, String.format(Locale.ROOT,
                "Newton-Poisson not converged in %d steps (tolerance %.3g V)", options.maxNewtonIterations(),
                tolerance));
    }

    /**
     * Shifts phi uniformly by the s that makes the sum of all box residuals vanish,
     * sum F = D_bottom - D_top - sum Q(phi + s) = 0 (global charge neutrality with both boundaries
     * free); sum Q falls monotonically with s, so a bracket and Brent's method
     * (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, via Commons Math) find it.
     *
     * @return whether a shift was applied
     */
    private static boolean neutralityShift(Device d, ChargeModel charges, double[] phi, double[] ref, QuantumStates qs,
            Work w) {
        int n = d.n;
        double[] trial = w.scratch;
        double target = d.px[n - 2]; // D at the zero-field bottom; D = 0 above a free surface
        org.apache.commons.math3.analysis.UnivariateFunction g = s -> {
            for (int i = 0; i < n; i++) {
                trial[i] = phi[i] + s;
            }
            charges.evaluate(trial, ref, qs, w.q, w.dq, w.cell);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += w.q[i];
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
        double step = 0.05;
        double hi = Double.NaN;
        while (step <= 64) {
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
        double root = new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-13, 1e-12)
                .solve(200, g, Math.min(lo, hi), Math.max(lo, hi));
        for (int i = 0; i < n; i++) {
            phi[i] += root;
        }
        return true;
    }

    /**
     * Writes -F into rhs, F_i = D_{i+1/2} - D_{i-1/2} - Q_i with D_k = -eps_k (phi_{k+1} - phi_k)/h_k + P_k
     * (Dirichlet rows: F = phi - phi_D), and returns the Euclidean norm of F over the non-Dirichlet rows.
     */
    private static double residual(Device d, double[] phi, double[] q, double[] rhs) {
        int n = d.n;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            if ((i == 0 && d.topDirichlet) || (i == n - 1 && d.bottomDirichlet)) {
                rhs[i] = -(phi[i] - (i == 0 ? d.phiTop : d.phiBottom));
                continue;
            }
            double f = -q[i];
            if (i > 0) {
                f += d.eps[i - 1] / d.h[i - 1] * (phi[i] - phi[i - 1]) - d.px[i - 1];
            }
            if (i < n - 1) {
                f += -d.eps[i] / d.h[i] * (phi[i + 1] - phi[i]) + d.px[i];
            } else {
                f += d.px[n - 2]; // zero field: D at the bottom is the bulk polarization
            }
            rhs[i] = -f;
            sum += f * f;
        }
        return Math.sqrt(sum);
    }

    /** The tridiagonal Jacobian dF/dphi. */
    private static void jacobian(Device d, double[] dq, double[] sub, double[] diag, double[] sup) {
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
                double c = d.eps[i - 1] / d.h[i - 1];
                jd += c;
                sub[i - 1] = -c;
            }
            if (i < n - 1) {
                double c = d.eps[i] / d.h[i];
                jd += c;
                sup[i] = -c;
            }
            diag[i] = jd;
        }
    }

    private static NotConvergedException failure(Device d, double[] phi, Work w, int[] count, double[] history,
            int outer, String why) {
        double[] last = phi.clone();
        for (int i = 0; i < last.length; i++) {
            if (!Double.isFinite(last[i])) {
                last[i] = Double.isFinite(w.backup[i]) ? w.backup[i] : 0;
            }
        }
        ConvergenceRecord rec = new ConvergenceRecord(false, outer, count[0], Arrays.copyOf(history, outer), why);
        return new NotConvergedException(why, rec, d.x, last);
    }
}
