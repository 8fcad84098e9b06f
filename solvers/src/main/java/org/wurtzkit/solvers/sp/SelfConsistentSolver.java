package org.wurtzkit.solvers.sp;

import java.util.Arrays;
import java.util.Locale;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.linalg.EigenSolverException;
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
 * interface nodes, and inside graded layers. It is solved by damped Newton iteration with a
 * backtracking line search ({@code NewtonPoisson}); each step is one O(N) tridiagonal solve.</li>
 * <li>A classical solve (Fermi-Dirac electrons everywhere) gives the starting potential. It starts
 * from flat bands at the bottom level; its Newton budget is the option's plus
 * {@value #COLD_START_STEPS_PER_MAX_STEP} steps per maximum step of the potential between that start
 * and a Dirichlet contact beyond {@value #COLD_START_FREE_CARRY} V, so that a gate at -100 V gets the
 * steps it needs to be reached.</li>
 * <li>The outer loop is the predictor-corrector scheme of A. Trellakis, A. T. Galick, A. Pacelli
 * and U. Ravaioli, J. Appl. Phys. 81, 7880 (1997): the subbands of each quantum window are computed
 * for the current potential (BenDaniel-Duke effective-mass equation, lowest states by Sturm
 * bisection and inverse iteration, O(N k)); then Poisson is solved by Newton with the subband
 * density's first-order dependence on the potential; repeated until max |delta phi| falls below
 * the tolerance. From the first iteration (after the third) where the change shrinks by less than
 * a factor 0.7, the next input is given by Anderson mixing (D. G. Anderson, J. ACM 12, 547 (1965);
 * H. F. Walker and P. Ni, SIAM J. Numer. Anal. 49, 1715 (2011)) of depth
 * {@value #ANDERSON_DEPTH} and mixing parameter {@value #ANDERSON_BETA}, restarted when the change
 * grows. A converged solve returns the Newton-Poisson solution of its last iteration, never a mixed
 * potential, so Gauss's law holds to the Newton tolerance and the change it reports is that of the
 * potential it returns.</li>
 * </ol>
 *
 * <p>Every failure inside a solve (a Newton-Poisson solve that does not converge or meets a singular
 * pivot, an eigen-solver that does not converge) ends it with a {@link NotConvergedException} that
 * carries the convergence record so far and the last finite iterate.
 *
 * <p>Stateless and thread-safe: one instance may serve many threads.
 */
public final class SelfConsistentSolver {
    /** Newton tolerance of the classical start when subbands follow (V): a good start suffices. */
    private static final double CLASSICAL_START_TOLERANCE = 1e-4;
    /** Newton tolerance of the first Schroedinger-Poisson iteration (V). */
    private static final double INITIAL_INNER_TOLERANCE = 1e-4;
    /** Outer iteration from which a stalled change switches on Anderson mixing. */
    private static final int STAGNATION_START = 3;
    /**
     * Outer iteration from which a slow change switches on Anderson mixing when a window holds hole
     * subbands. Measured on a GaN/AlN/GaN stack with a 2DHG (6e13 cm^-2) and a 2DEG: the hole
     * subbands converge linearly under the predictor, with a change that shrinks by about 0.3 per
     * iteration (10 iterations against 5 without quantum holes); mixing from the third iteration
     * with {@link #HOLE_ANDERSON_BETA} takes 7.
     */
    static final int HOLE_MIXING_START = 2;
    /** With hole subbands, a change that shrinks by less than this factor switches on Anderson mixing. */
    static final double HOLE_STAGNATION_RATIO = 0.2;
    /**
     * Mixing parameter of the Anderson update with hole subbands: the full new residual (the
     * predictor's steady contraction of about 0.3 needs no damping; 0.5 took 8 iterations, 1.0 took 7
     * on the stack of {@link #HOLE_MIXING_START}).
     */
    static final double HOLE_ANDERSON_BETA = 1.0;
    /** A change that shrinks by less than this factor counts as stalled. */
    private static final double STAGNATION_RATIO = 0.7;
    /**
     * Differences kept by the Anderson mixing of the outer loop: a small history, restarted on
     * failure. Measured on the wide fuzz of issue #14 and its stalling reproducer: depths 3-6 and
     * beta 0.3-0.5 all converge; depth 3 with beta 0.5 took the fewest iterations.
     */
    static final int ANDERSON_DEPTH = 3;
    /** Mixing parameter beta of the Anderson update: half of the new residual enters each step. */
    static final double ANDERSON_BETA = 0.5;
    /**
     * Potential the cold start's plain Newton budget carries between its flat start and a Dirichlet
     * contact (V): with steps clamped to the 0.5 V default, a -30 V gate takes about 60 of the 200
     * default steps, so the first 10 V need no extra steps.
     */
    static final double COLD_START_FREE_CARRY = 10;
    /**
     * Extra cold-start Newton steps per maximum step of carry beyond {@link #COLD_START_FREE_CARRY}:
     * two, one to move and one for a step the line search halves.
     */
    static final double COLD_START_STEPS_PER_MAX_STEP = 2;
    /** Inner tolerance as a fraction of the previous outer change of the potential. */
    private static final double INNER_TOLERANCE_FACTOR = 1e-3;

    /**
     * Largest |potential| accepted in an initial guess (V): gate biases are within [-100, 20] V and
     * band offsets a few eV, so a potential beyond 1000 V is no guess of any stack.
     */
    public static final double MAX_GUESS_POTENTIAL = 1000;
    /**
     * Lowest temperature the solver accepts (K). Solves are checked down to 4 K by the fuzz and at
     * 1 K on a HEMT with a gate and with a free surface; far below, kT (86 ueV at 1 K) vanishes
     * against the band energies it divides (at 1e-300 K it underflows and the statistics turn NaN).
     */
    public static final double MIN_TEMPERATURE = 1;

    private final SolverOptions options;

    /** A solver with {@link SolverOptions#defaults()}. */
    public SelfConsistentSolver() {
        this(SolverOptions.defaults());
    }

    /** @param options settings */
    public SelfConsistentSolver(SolverOptions options) {
        this.options = Require.nonNull("solver options", options);
    }

    /** {@return the settings} */
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
     * @param potential potential of the guess at those depths (V), within +-{@link #MAX_GUESS_POTENTIAL},
     *                  or null for a cold start
     * @return the converged solution
     * @throws NotConvergedException with the convergence record and the last iterate
     */
    public Solution solve(Structure structure, double[] depth, double[] potential) {
        Require.nonNull("structure", structure);
        if (!(structure.temperatureK() >= MIN_TEMPERATURE)) {
            throw new org.wurtzkit.errors.InvalidParameterException("temperature of the structure (K)",
                    Double.toString(structure.temperatureK()), "[" + MIN_TEMPERATURE + ", 2000] (the solver's range)");
        }
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
                Require.inRange("initial guess potential[" + i + "] (V)", potential[i], -MAX_GUESS_POTENTIAL,
                        MAX_GUESS_POTENTIAL);
                Require.finite("initial guess depth[" + i + "] (m)", depth[i]);
                if (i > 0 && !(depth[i] > depth[i - 1])) {
                    throw new org.wurtzkit.errors.InvalidParameterException("initial guess depth[" + i + "] (m)",
                            Double.toString(depth[i]), "(" + depth[i - 1] + ", ...) (strictly increasing)");
                }
            }
        }
        Device d = new Device(structure, options);
        boolean cold = depth == null;
        double[] phi = cold ? coldStart(d) : interpolate(depth, potential, d);
        applyDirichlet(d, phi);
        ChargeModel charges = new ChargeModel(d);
        NewtonPoisson poisson = new NewtonPoisson(d, charges, options);
        double[] history = new double[options.maxIterations()];
        int newtonSteps = 0;
        int nw = d.windowStart.length;
        if (cold || nw == 0) {
            // classical start: Fermi-Dirac electrons everywhere
            double tolerance = nw == 0 ? options.newtonTolerance() : CLASSICAL_START_TOLERANCE;
            int budget = options.maxNewtonIterations();
            if (cold) {
                budget = coldStartBudget(d, phi, budget, options.maxNewtonStep());
            }
            newtonSteps += poisson(d, poisson, phi, null, null, tolerance, budget, 0, newtonSteps, history);
            if (nw == 0) {
                // the forward-bias split of QuasiFermiLevels on the classical potential: re-solved
                // until the split stays (it moves at most FORWARD_SPLIT_MAX_MOVES times)
                while (d.updateGateSideSplit(phi)) {
                    newtonSteps += poisson(d, poisson, phi, null, null, tolerance, options.maxNewtonIterations(), 0,
                            newtonSteps, history);
                }
            }
        }
        if (nw == 0) {
            ConvergenceRecord rec = new ConvergenceRecord(true, 0, newtonSteps, new double[0],
                    "classical solve converged");
            return SolutionAssembler.assemble(d, phi, null, null, charges.report(phi, null, null), rec, cold);
        }
        QuantumStates qs = new QuantumStates(d);
        double[] ref = new double[d.n];
        int mixingFrom = -1;
        AndersonMixing mixing = null;
        for (int it = 0; it < options.maxIterations(); it++) {
            // 0. the forward-bias split of QuasiFermiLevels on the current potential, frozen once
            // the outer loop is near convergence so that it cannot oscillate
            if (it > 0 && history[it - 1] < QuasiFermiLevels.FORWARD_SPLIT_FREEZE_V) {
                d.freezeGateSideSplit();
            }
            d.updateGateSideSplit(phi);
            // 1. subbands of every window for the current potential; from the second iteration on
            // each eigen-solve starts from the previous iteration's energies (Weyl brackets)
            try {
                qs.update(d, phi, it > 0);
            } catch (EigenSolverException | InvalidParameterException e) {
                throw eigenFailure(d, phi, it, newtonSteps, history, e);
            }
            System.arraycopy(phi, 0, ref, 0, d.n);
            // 2. Poisson with the predictor density n(phi) of those subbands; inexact inner solves
            // while the outer loop is far from converged (cf. inexact Newton, R. S. Dembo,
            // S. C. Eisenstat and T. Steihaug, SIAM J. Numer. Anal. 19, 400 (1982)); the final
            // iterations are solved to the full Newton tolerance
            double inner = it == 0 ? INITIAL_INNER_TOLERANCE
                    : Math.max(options.newtonTolerance(), INNER_TOLERANCE_FACTOR * history[it - 1]);
            newtonSteps += poisson(d, poisson, phi, ref, qs, Math.min(inner, INITIAL_INNER_TOLERANCE),
                    options.maxNewtonIterations(), it, newtonSteps, history);
            // 3. the outer change G(ref) - ref
            double delta = 0;
            for (int i = 0; i < d.n; i++) {
                delta = Math.max(delta, Math.abs(phi[i] - ref[i]));
            }
            history[it] = delta;
            // 4. converged when the potential no longer moves; phi is then the unmixed Newton-Poisson
            // solution for the subbands at ref, so it satisfies Gauss's law to the Newton tolerance
            if (delta < options.tolerance()) {
                // the subbands of the last iteration, with the predictor's first-order shift to phi,
                // are the converged density: no further Schroedinger solve is needed
                ConvergenceRecord rec = new ConvergenceRecord(true, it + 1, newtonSteps,
                        Arrays.copyOf(history, it + 1), String.format(Locale.ROOT,
                                "converged: max |delta phi| = %.3g V < %.3g V after %d iterations%s", delta,
                                options.tolerance(), it + 1, mixing == null ? ""
                                        : String.format(Locale.ROOT, " (Anderson mixing from iteration %d)",
                                                mixingFrom + 1)));
                return SolutionAssembler.assemble(d, phi, ref, qs, charges.report(phi, ref, qs), rec, cold);
            }
            // 5. a change that stalls (charge sloshing between coupled wells, or a degenerate gas in
            // many subbands, where the predictor over- or under-corrects) switches on Anderson mixing
            // for the rest of the solve; it replaces phi by the next input
            // hole subbands (quantum holes with a hole well) converge linearly under the predictor,
            // with a ratio of about 0.3 per iteration: Anderson mixing from the third iteration on
            boolean holeWells = qs.holes != null && qs.holes.any();
            if (mixing == null && holeWells && it >= HOLE_MIXING_START && delta > HOLE_STAGNATION_RATIO * history[it - 1]) {
                mixing = new AndersonMixing(d.n, ANDERSON_DEPTH, HOLE_ANDERSON_BETA);
                mixingFrom = it;
            }
            if (mixing == null && it >= STAGNATION_START && delta > STAGNATION_RATIO * history[it - 1]) {
                mixing = new AndersonMixing(d.n, ANDERSON_DEPTH, ANDERSON_BETA);
                mixingFrom = it;
            }
            if (mixing != null) {
                mixing.next(ref, phi);
                applyDirichlet(d, phi);
            }
        }
        int m = options.maxIterations();
        ConvergenceRecord rec = new ConvergenceRecord(false, m, newtonSteps, history, String.format(Locale.ROOT,
                "Schroedinger-Poisson loop not converged after %d iterations: max |delta phi| = %.3g V, tolerance %.3g V",
                m, history[m - 1], options.tolerance()));
        throw new NotConvergedException(rec.message(), rec, d.x, phi);
    }

    /**
     * One Newton-Poisson solve inside outer iteration {@code outer}.
     *
     * @return the Newton steps it took
     * @throws NotConvergedException when it fails, with the record so far and the last iterate
     */
    private static int poisson(Device d, NewtonPoisson poisson, double[] phi, double[] ref, QuantumStates qs, double tolerance,
            int budget, int outer, int stepsBefore, double[] history) {
        try {
            return poisson.solve(phi, ref, qs, tolerance, budget);
        } catch (NewtonPoisson.Failure f) {
            ConvergenceRecord rec = new ConvergenceRecord(false, outer, stepsBefore + f.steps,
                    Arrays.copyOf(history, outer), f.getMessage());
            NotConvergedException e = new NotConvergedException(f.getMessage(), rec, d.x, f.lastIterate);
            if (f.getCause() != null) {
                e.initCause(f.getCause());
            }
            throw e;
        }
    }

    /**
     * The eigen-solver failed inside outer iteration {@code outer} (e.g. inverse iteration did not
     * converge): a failed solve with the record so far and the potential it was given.
     */
    static NotConvergedException eigenFailure(Device d, double[] phi, int outer, int newtonSteps, double[] history,
            RuntimeException cause) {
        String why = String.format(Locale.ROOT, "Schroedinger step failed in outer iteration %d: %s", outer + 1,
                cause.getMessage());
        ConvergenceRecord rec = new ConvergenceRecord(false, outer, newtonSteps, Arrays.copyOf(history, outer), why);
        NotConvergedException e = new NotConvergedException(why, rec, d.x, phi);
        e.initCause(cause);
        return e;
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

    /**
     * The Newton budget of the cold start: the option's budget plus
     * {@link #COLD_START_STEPS_PER_MAX_STEP} steps per maximum step of the carry beyond
     * {@link #COLD_START_FREE_CARRY}, the carry being the potential between the flat start and the
     * farther Dirichlet contact. A gate at -100 V (the bottom of its range) is about 100 V away from
     * the flat start and needs some 200 steps of 0.5 V; the plain default budget is 200.
     */
    static int coldStartBudget(Device d, double[] phi, int budget, double maxStep) {
        double carry = 0;
        if (d.topDirichlet) {
            carry = Math.max(carry, Math.abs(d.phiTop - phi[1]));
        }
        if (d.bottomDirichlet) {
            carry = Math.max(carry, Math.abs(d.phiBottom - phi[d.n - 2]));
        }
        double extra = Math.ceil(COLD_START_STEPS_PER_MAX_STEP * Math.max(0, carry - COLD_START_FREE_CARRY) / maxStep);
        return (int) Math.min(Integer.MAX_VALUE, budget + extra);
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
}
