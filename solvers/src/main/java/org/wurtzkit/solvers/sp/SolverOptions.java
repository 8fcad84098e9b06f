package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.mesh.MeshPolicy;

/**
 * Settings of a self-consistent solve, with documented defaults ({@link #defaults()}); change one
 * with a {@code with...} method, which returns a copy.
 *
 * @param tolerance             convergence of the outer loop, max |delta phi| between iterations (V); default 1e-6, in [1e-12, 1e-2]
 * @param maxIterations         outer iterations allowed; default 100, in [1, 10000]
 * @param newtonTolerance       convergence of each Newton-Poisson solve, max |delta phi| (V); default 1e-9, in [1e-14, 1e-3]
 * @param maxNewtonIterations   Newton steps allowed per Poisson solve; default 200, in [1, 100000]
 * @param maxNewtonStep         largest change of the potential at any node in one Newton step (V); default 0.5, in [1e-3, 10]
 * @param mesh                  mesh policy; default {@link MeshPolicy#DEFAULT}
 * @param quantumRegion         where electrons are quantum; default {@link QuantumRegion#automatic()}
 * @param maxSubbands           most subbands kept per window; default 60, in [1, 2000]
 * @param subbandCutoffKT       subbands are kept up to E_F + this many kT; default 15 (a subband there holds exp(-15) = 3e-7 of one at E_F), in [1, 200]
 * @param quantumHoles          whether holes inside quantum windows come from hole subbands (three single
 *                              bands, heavy, light and crystal-field hole) instead of the classical density;
 *                              default false: the single-band hole subbands with hard-walled windows
 *                              under-count holes where a window edge cuts a neutral p-region, so they are
 *                              for hole wells (a 2DHG) and are switched on where one is expected
 * @param quasiFermiLevels      which contact electrons and holes follow in each part of the stack; default
 *                              {@link QuasiFermiLevels#defaults()} (electrons the channel; holes the gate above
 *                              the channel and the channel below it)
 *
 * <p>Physical model choices (polarization model, band line-up, strain shifts of the band edges)
 * live on the {@link org.wurtzkit.structure.Structure}; these options are numerics only.
 */
public record SolverOptions(double tolerance, int maxIterations, double newtonTolerance, int maxNewtonIterations,
        double maxNewtonStep, MeshPolicy mesh, QuantumRegion quantumRegion, int maxSubbands, double subbandCutoffKT,
        QuasiFermiLevels quasiFermiLevels, boolean quantumHoles) {

    private static final SolverOptions DEFAULTS = new SolverOptions(1e-6, 100, 1e-9, 200, 0.5, MeshPolicy.DEFAULT,
            QuantumRegion.automatic(), 60, 15, QuasiFermiLevels.defaults(), false);

    /** Validates every field. */
    public SolverOptions {
        Require.inRange("tolerance (V)", tolerance, 1e-12, 1e-2);
        Require.inRange("maxIterations", maxIterations, 1, 10000);
        Require.inRange("newtonTolerance (V)", newtonTolerance, 1e-14, 1e-3);
        Require.inRange("maxNewtonIterations", maxNewtonIterations, 1, 100000);
        Require.inRange("maxNewtonStep (V)", maxNewtonStep, 1e-3, 10);
        Require.nonNull("mesh policy", mesh);
        Require.nonNull("quantum region", quantumRegion);
        Require.inRange("maxSubbands", maxSubbands, 1, 2000);
        Require.inRange("subbandCutoffKT", subbandCutoffKT, 1, 200);
        Require.nonNull("quasi-Fermi levels", quasiFermiLevels);
    }

    /** {@return the defaults listed in the class documentation} */
    public static SolverOptions defaults() {
        return DEFAULTS;
    }

    /** @param v tolerance (V) @return a copy */
    public SolverOptions withTolerance(double v) {
        return new SolverOptions(v, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumRegion, maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v outer iteration budget @return a copy */
    public SolverOptions withMaxIterations(int v) {
        return new SolverOptions(tolerance, v, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, quantumRegion,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v Newton tolerance (V) @return a copy */
    public SolverOptions withNewtonTolerance(double v) {
        return new SolverOptions(tolerance, maxIterations, v, maxNewtonIterations, maxNewtonStep, mesh, quantumRegion,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v Newton step budget per Poisson solve @return a copy */
    public SolverOptions withMaxNewtonIterations(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, v, maxNewtonStep, mesh, quantumRegion,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v largest Newton update (V) @return a copy */
    public SolverOptions withMaxNewtonStep(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, v, mesh, quantumRegion,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v mesh policy @return a copy */
    public SolverOptions withMesh(MeshPolicy v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, v,
                quantumRegion, maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v quantum region @return a copy */
    public SolverOptions withQuantumRegion(QuantumRegion v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, v,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v most subbands per window @return a copy */
    public SolverOptions withMaxSubbands(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumRegion, v, subbandCutoffKT, quasiFermiLevels, quantumHoles);
    }

    /** @param v subband cut-off above E_F in kT @return a copy */
    public SolverOptions withSubbandCutoffKT(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumRegion, maxSubbands, v, quasiFermiLevels, quantumHoles);
    }

    /** @param v whether holes in quantum windows are quantum @return a copy */
    public SolverOptions withQuantumHoles(boolean v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumRegion, maxSubbands, subbandCutoffKT, quasiFermiLevels, v);
    }

    /** @param v the quasi-Fermi level of each carrier in each region @return a copy */
    public SolverOptions withQuasiFermiLevels(QuasiFermiLevels v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumRegion, maxSubbands, subbandCutoffKT, v, quantumHoles);
    }
}
